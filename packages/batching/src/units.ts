/**
 * Shop units in, SI out.
 *
 * Every quantity is stored in SI: kg, m³, kg/m³, °C (our stored temperature unit), m and s. The API
 * accepts the units shops actually use and converts them here, by the exact definitions of NIST
 * SP 811 / NIST Handbook 44 (1 lb = 0.45359237 kg, 1 in = 0.0254 m, 1 US gal = 231 in³), pinned
 * by the reference checks; units.spec.ts also checks every factor against mathjs's unit definitions.
 * (mathjs did the conversions at run time before; loading it cost each API process ~85 MiB.)
 *
 * Temperature *differences* (tolerance bands, window widths) are not absolute temperatures: they
 * convert by ×5/9 alone, without the 32 °F offset.
 */
const LB = 0.45359237; // kg, exact (NIST SP 811 B.8)
const IN = 0.0254; // m, exact
const FT = 0.3048; // m, exact
const US_GAL = 231 * IN ** 3; // m³, exact by definition

export type Dimension =
  | 'mass'
  | 'volume'
  | 'density'
  | 'temperature'
  | 'temperature_difference'
  | 'length'
  | 'time';

export const DIMENSIONS: readonly Dimension[] = [
  'mass',
  'volume',
  'density',
  'temperature',
  'temperature_difference',
  'length',
  'time',
];

/** The symbol each dimension is stored in. */
export const SI_UNITS: Readonly<Record<Dimension, string>> = {
  mass: 'kg',
  volume: 'm3',
  density: 'kg/m3',
  temperature: 'degC',
  temperature_difference: 'degC',
  length: 'm',
  time: 's',
};

/** One accepted unit, as the API names it (`symbol`) and as people may type it (`aliases`). */
export interface UnitDefinition {
  readonly symbol: string;
  readonly label: string;
  readonly aliases: readonly string[];
}

interface UnitRule extends UnitDefinition {
  /**
   * SI per one of this unit (absent for temperature differences, which use `differenceFactor`);
   * a temperature first adds `offset` (°F: −32; K: −273.15), then scales: °C = (°F − 32) × 5/9.
   */
  readonly toSI?: number;
  readonly offset?: number;
  /** Kelvin (= °C) per one of this unit, for temperature differences only. */
  readonly differenceFactor?: number;
}

const RULES: Readonly<Record<Dimension, readonly UnitRule[]>> = {
  mass: [
    { symbol: 'g', label: 'gram', aliases: ['gram', 'grams'], toSI: 0.001 },
    { symbol: 'kg', label: 'kilogram', aliases: ['kilogram', 'kilograms'], toSI: 1 },
    { symbol: 'lb', label: 'pound (avoirdupois)', aliases: ['lbs', 'pound', 'pounds'], toSI: LB },
    { symbol: 'oz', label: 'ounce (avoirdupois)', aliases: ['ounce', 'ounces'], toSI: LB / 16 },
  ],
  volume: [
    { symbol: 'mL', label: 'millilitre', aliases: ['millilitre', 'milliliter'], toSI: 1e-6 },
    { symbol: 'L', label: 'litre', aliases: ['litre', 'liter'], toSI: 0.001 },
    { symbol: 'cm3', label: 'cubic centimetre', aliases: ['cm³', 'cm^3', 'cc'], toSI: 1e-6 },
    { symbol: 'm3', label: 'cubic metre', aliases: ['m³', 'm^3'], toSI: 1 },
    { symbol: 'in3', label: 'cubic inch', aliases: ['in³', 'in^3', 'cu in'], toSI: IN ** 3 },
    { symbol: 'ft3', label: 'cubic foot', aliases: ['ft³', 'ft^3', 'cu ft'], toSI: FT ** 3 },
    { symbol: 'gal', label: 'US gallon (231 in³)', aliases: ['US gal', 'gallon'], toSI: US_GAL },
    { symbol: 'floz', label: 'US fluid ounce (1/128 US gal)', aliases: ['fl oz', 'US fl oz'], toSI: US_GAL / 128 },
  ],
  density: [
    { symbol: 'kg/m3', label: 'kilogram per cubic metre', aliases: ['kg/m³', 'kg/m^3'], toSI: 1 },
    { symbol: 'g/cm3', label: 'gram per cubic centimetre', aliases: ['g/cm³', 'g/cm^3', 'g/cc'], toSI: 1000 },
    { symbol: 'lb/ft3', label: 'pound per cubic foot (pcf)', aliases: ['lb/ft³', 'lb/ft^3', 'pcf'], toSI: LB / FT ** 3 },
  ],
  temperature: [
    { symbol: 'degC', label: 'degree Celsius', aliases: ['°C', 'C', 'celsius'], toSI: 1, offset: 0 },
    { symbol: 'degF', label: 'degree Fahrenheit', aliases: ['°F', 'F', 'fahrenheit'], toSI: 5 / 9, offset: -32 },
    { symbol: 'K', label: 'kelvin', aliases: ['kelvin'], toSI: 1, offset: -273.15 },
  ],
  temperature_difference: [
    { symbol: 'degC', label: 'degree Celsius (difference)', aliases: ['°C', 'C', 'celsius'], differenceFactor: 1 },
    { symbol: 'degF', label: 'degree Fahrenheit (difference)', aliases: ['°F', 'F', 'fahrenheit'], differenceFactor: 5 / 9 },
    { symbol: 'K', label: 'kelvin (difference)', aliases: ['kelvin'], differenceFactor: 1 },
  ],
  length: [
    { symbol: 'mm', label: 'millimetre', aliases: ['millimetre', 'millimeter'], toSI: 0.001 },
    { symbol: 'cm', label: 'centimetre', aliases: ['centimetre', 'centimeter'], toSI: 0.01 },
    { symbol: 'm', label: 'metre', aliases: ['metre', 'meter'], toSI: 1 },
    { symbol: 'in', label: 'inch', aliases: ['inch', 'inches', '"'], toSI: IN },
    { symbol: 'ft', label: 'foot', aliases: ['foot', 'feet', "'"], toSI: FT },
  ],
  time: [
    { symbol: 's', label: 'second', aliases: ['sec', 'second', 'seconds'], toSI: 1 },
    { symbol: 'min', label: 'minute', aliases: ['minute', 'minutes'], toSI: 60 },
    { symbol: 'h', label: 'hour', aliases: ['hr', 'hour', 'hours'], toSI: 3600 },
  ],
};

/** The accepted units of every dimension, with the SI symbol each is stored in. */
export const UNIT_CATALOG: Readonly<
  Record<Dimension, { readonly si: string; readonly units: readonly UnitDefinition[] }>
> = Object.freeze(
  Object.fromEntries(
    DIMENSIONS.map((dimension) => [
      dimension,
      Object.freeze({
        si: SI_UNITS[dimension],
        units: Object.freeze(
          RULES[dimension].map(({ symbol, label, aliases }) =>
            Object.freeze({ symbol, label, aliases: Object.freeze([...aliases]) }),
          ),
        ),
      }),
    ]),
  ) as Record<Dimension, { si: string; units: readonly UnitDefinition[] }>,
);

export type UnitErrorCode = 'UNKNOWN_UNIT' | 'UNKNOWN_DIMENSION' | 'VALUE_NOT_FINITE';

/** A unit the API does not accept for a dimension; carries what it does accept, for a 422. */
export class UnitError extends Error {
  override readonly name = 'UnitError';
  constructor(
    readonly code: UnitErrorCode,
    readonly unit: string,
    readonly dimension: string,
    readonly accepted: readonly string[],
    message?: string,
  ) {
    super(
      message ??
        (code === 'UNKNOWN_DIMENSION'
          ? `"${dimension}" is not a known dimension; use one of ${accepted.join(', ')}.`
          : code === 'VALUE_NOT_FINITE'
            ? `A ${dimension} value in ${unit} must be a finite number.`
            : `"${unit}" is not an accepted ${dimension.replace('_', ' ')} unit; use one of ${accepted.join(', ')}.`),
    );
  }
}

/** The symbols accepted for a dimension, canonical first (the list a 422 offers). */
export function acceptedUnits(dimension: Dimension): string[] {
  return rulesOf(dimension).map((rule) => rule.symbol);
}

function rulesOf(dimension: Dimension): readonly UnitRule[] {
  const rules = Object.prototype.hasOwnProperty.call(RULES, dimension) ? RULES[dimension] : undefined;
  if (!rules) throw new UnitError('UNKNOWN_DIMENSION', '', String(dimension), DIMENSIONS);
  return rules;
}

/**
 * The unit a string names within a dimension. Symbols match exactly first, then symbols and aliases
 * without regard to case ("ml", "LB"); no case folding can cross dimensions because each lookup is
 * confined to one, which is also why "C" can mean °C here although mathjs reads it as the coulomb.
 */
export function resolveUnit(dimension: Dimension, unit: string): UnitDefinition {
  const rules = rulesOf(dimension);
  const typed = typeof unit === 'string' ? unit.trim() : '';
  const exact = rules.find((rule) => rule.symbol === typed || rule.aliases.includes(typed));
  const folded = typed.toLowerCase();
  const found =
    exact ??
    rules.find(
      (rule) => rule.symbol.toLowerCase() === folded || rule.aliases.some((a) => a.toLowerCase() === folded),
    );
  if (!found || typed === '') {
    throw new UnitError('UNKNOWN_UNIT', String(unit), dimension, rules.map((rule) => rule.symbol));
  }
  return UNIT_CATALOG[dimension].units.find((u) => u.symbol === found.symbol)!;
}

function ruleFor(dimension: Dimension, unit: string): UnitRule {
  const symbol = resolveUnit(dimension, unit).symbol;
  return rulesOf(dimension).find((rule) => rule.symbol === symbol)!;
}

function requireFinite(dimension: Dimension, value: number, unit: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new UnitError('VALUE_NOT_FINITE', unit, dimension, acceptedUnits(dimension));
  }
}

/**
 * Binary floating point leaves junk in the 16th–17th digit of a conversion (1 g/cm³ comes back as
 * 999.9999999999999 kg/m³). Fifteen significant digits are all a double carries reliably, and far
 * more than any shop measurement, so results are cut there.
 */
export function trimFloat(value: number): number {
  return value === 0 ? 0 : Number(value.toPrecision(15));
}

/** A temperature difference (band, window width) to °C (= K) by ×5/9 for °F, with no offset. */
export function temperatureDifferenceToSI(value: number, unit: string): number {
  requireFinite('temperature_difference', value, unit);
  const rule = ruleFor('temperature_difference', unit);
  return trimFloat(value * rule.differenceFactor!);
}

/** A temperature difference in °C (= K) to another unit of difference, with no offset. */
export function temperatureDifferenceFromSI(value: number, unit: string): number {
  requireFinite('temperature_difference', value, unit);
  const rule = ruleFor('temperature_difference', unit);
  return trimFloat(value / rule.differenceFactor!);
}

/** A value in any accepted unit of a dimension, in that dimension's SI unit (see SI_UNITS). */
export function toSI(dimension: Dimension, value: number, unit: string): number {
  if (dimension === 'temperature_difference') return temperatureDifferenceToSI(value, unit);
  requireFinite(dimension, value, unit);
  const rule = ruleFor(dimension, unit);
  return trimFloat(rule.offset ? (value + rule.offset) * rule.toSI! : value * rule.toSI!);
}

/** A value in the dimension's SI unit, expressed in another accepted unit of that dimension. */
export function fromSI(dimension: Dimension, value: number, unit: string): number {
  if (dimension === 'temperature_difference') return temperatureDifferenceFromSI(value, unit);
  requireFinite(dimension, value, unit);
  const rule = ruleFor(dimension, unit);
  return trimFloat(rule.offset ? value / rule.toSI! - rule.offset : value / rule.toSI!);
}

/** A value from one accepted unit to another of the same dimension. */
export function convert(dimension: Dimension, value: number, from: string, to: string): number {
  return fromSI(dimension, toSI(dimension, value, from), to);
}

export type UnitSystem = 'metric' | 'imperial';

const DISPLAY_UNITS: Readonly<Record<UnitSystem, Readonly<Record<Dimension, string>>>> = {
  // Grams and litres are what a metric bench reads; kg/m³ is how metric foam data sheets give density.
  metric: {
    mass: 'g',
    volume: 'L',
    density: 'kg/m3',
    temperature: 'degC',
    temperature_difference: 'degC',
    length: 'mm',
    time: 'min',
  },
  // US shops weigh in pounds, size molds in inches and cubic inches, and speak of density in pcf.
  imperial: {
    mass: 'lb',
    volume: 'in3',
    density: 'lb/ft3',
    temperature: 'degF',
    temperature_difference: 'degF',
    length: 'in',
    time: 'min',
  },
};

/** The unit each dimension is shown in for a metric or an imperial (US customary) user. */
export function displayUnits(system: UnitSystem): Readonly<Record<Dimension, string>> {
  const units = Object.prototype.hasOwnProperty.call(DISPLAY_UNITS, system) ? DISPLAY_UNITS[system] : undefined;
  if (!units) throw new RangeError(`Unknown unit system "${String(system)}"; use metric or imperial.`);
  return units;
}
