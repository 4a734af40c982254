/**
 * Shop units in, SI out.
 *
 * Every quantity is stored in SI: kg, m³, kg/m³, °C (our stored temperature unit), m and s. The API
 * accepts the units shops actually use and converts them here, through mathjs, whose definitions are
 * pinned by the reference checks to the exact ones of NIST SP 811 / NIST Handbook 44
 * (1 lb = 0.45359237 kg, 1 in = 0.0254 m, 1 US gal = 231 in³).
 *
 * Temperature *differences* (tolerance bands, window widths) never go through mathjs: it would treat
 * them as absolute temperatures and add the 32 °F offset. They convert by ×5/9 alone.
 */
import { create, all } from 'mathjs';

const math = create(all, {});

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
  /** How mathjs spells it; absent for temperature differences, which use `differenceFactor`. */
  readonly mathjs?: string;
  /** Kelvin (= °C) per one of this unit, for temperature differences only. */
  readonly differenceFactor?: number;
}

const RULES: Readonly<Record<Dimension, readonly UnitRule[]>> = {
  mass: [
    { symbol: 'g', label: 'gram', aliases: ['gram', 'grams'], mathjs: 'g' },
    { symbol: 'kg', label: 'kilogram', aliases: ['kilogram', 'kilograms'], mathjs: 'kg' },
    { symbol: 'lb', label: 'pound (avoirdupois)', aliases: ['lbs', 'pound', 'pounds'], mathjs: 'lb' },
    { symbol: 'oz', label: 'ounce (avoirdupois)', aliases: ['ounce', 'ounces'], mathjs: 'oz' },
  ],
  volume: [
    { symbol: 'mL', label: 'millilitre', aliases: ['millilitre', 'milliliter'], mathjs: 'mL' },
    { symbol: 'L', label: 'litre', aliases: ['litre', 'liter'], mathjs: 'L' },
    { symbol: 'cm3', label: 'cubic centimetre', aliases: ['cm³', 'cm^3', 'cc'], mathjs: 'cm^3' },
    { symbol: 'm3', label: 'cubic metre', aliases: ['m³', 'm^3'], mathjs: 'm^3' },
    { symbol: 'in3', label: 'cubic inch', aliases: ['in³', 'in^3', 'cu in'], mathjs: 'in^3' },
    { symbol: 'ft3', label: 'cubic foot', aliases: ['ft³', 'ft^3', 'cu ft'], mathjs: 'ft^3' },
    { symbol: 'gal', label: 'US gallon (231 in³)', aliases: ['US gal', 'gallon'], mathjs: 'gal' },
    { symbol: 'floz', label: 'US fluid ounce (1/128 US gal)', aliases: ['fl oz', 'US fl oz'], mathjs: 'floz' },
  ],
  density: [
    { symbol: 'kg/m3', label: 'kilogram per cubic metre', aliases: ['kg/m³', 'kg/m^3'], mathjs: 'kg/m^3' },
    { symbol: 'g/cm3', label: 'gram per cubic centimetre', aliases: ['g/cm³', 'g/cm^3', 'g/cc'], mathjs: 'g/cm^3' },
    { symbol: 'lb/ft3', label: 'pound per cubic foot (pcf)', aliases: ['lb/ft³', 'lb/ft^3', 'pcf'], mathjs: 'lb/ft^3' },
  ],
  temperature: [
    { symbol: 'degC', label: 'degree Celsius', aliases: ['°C', 'C', 'celsius'], mathjs: 'degC' },
    { symbol: 'degF', label: 'degree Fahrenheit', aliases: ['°F', 'F', 'fahrenheit'], mathjs: 'degF' },
    { symbol: 'K', label: 'kelvin', aliases: ['kelvin'], mathjs: 'K' },
  ],
  temperature_difference: [
    { symbol: 'degC', label: 'degree Celsius (difference)', aliases: ['°C', 'C', 'celsius'], differenceFactor: 1 },
    { symbol: 'degF', label: 'degree Fahrenheit (difference)', aliases: ['°F', 'F', 'fahrenheit'], differenceFactor: 5 / 9 },
    { symbol: 'K', label: 'kelvin (difference)', aliases: ['kelvin'], differenceFactor: 1 },
  ],
  length: [
    { symbol: 'mm', label: 'millimetre', aliases: ['millimetre', 'millimeter'], mathjs: 'mm' },
    { symbol: 'cm', label: 'centimetre', aliases: ['centimetre', 'centimeter'], mathjs: 'cm' },
    { symbol: 'm', label: 'metre', aliases: ['metre', 'meter'], mathjs: 'm' },
    { symbol: 'in', label: 'inch', aliases: ['inch', 'inches', '"'], mathjs: 'in' },
    { symbol: 'ft', label: 'foot', aliases: ['foot', 'feet', "'"], mathjs: 'ft' },
  ],
  time: [
    { symbol: 's', label: 'second', aliases: ['sec', 'second', 'seconds'], mathjs: 's' },
    { symbol: 'min', label: 'minute', aliases: ['minute', 'minutes'], mathjs: 'min' },
    { symbol: 'h', label: 'hour', aliases: ['hr', 'hour', 'hours'], mathjs: 'h' },
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

/**
 * The factor to SI of each unit that is a pure multiple of it (mass, length, volume, density),
 * found once with mathjs: a reading's conversion is then one multiplication, not a unit parse.
 * Units with an offset (°F, °C to K) keep going through mathjs.
 */
const SI_FACTORS = new Map<string, number | null>();
function siFactor(dimension: Dimension, rule: UnitRule): number | null {
  const key = `${dimension}\u0000${rule.symbol}`;
  let f = SI_FACTORS.get(key);
  if (f === undefined) {
    const si = ruleFor(dimension, SI_UNITS[dimension]);
    const zero = math.unit(0, rule.mathjs!).toNumber(si.mathjs!);
    f = zero === 0 ? math.unit(1, rule.mathjs!).toNumber(si.mathjs!) : null;
    SI_FACTORS.set(key, f);
  }
  return f;
}

/** A value in any accepted unit of a dimension, in that dimension's SI unit (see SI_UNITS). */
export function toSI(dimension: Dimension, value: number, unit: string): number {
  if (dimension === 'temperature_difference') return temperatureDifferenceToSI(value, unit);
  requireFinite(dimension, value, unit);
  const rule = ruleFor(dimension, unit);
  const factor = siFactor(dimension, rule);
  if (factor !== null) return trimFloat(value * factor);
  const si = ruleFor(dimension, SI_UNITS[dimension]);
  return trimFloat(math.unit(value, rule.mathjs!).toNumber(si.mathjs!));
}

/** A value in the dimension's SI unit, expressed in another accepted unit of that dimension. */
export function fromSI(dimension: Dimension, value: number, unit: string): number {
  if (dimension === 'temperature_difference') return temperatureDifferenceFromSI(value, unit);
  requireFinite(dimension, value, unit);
  const rule = ruleFor(dimension, unit);
  const si = ruleFor(dimension, SI_UNITS[dimension]);
  return trimFloat(math.unit(value, si.mathjs!).toNumber(rule.mathjs!));
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
