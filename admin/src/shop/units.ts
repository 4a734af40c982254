/**
 * The shop units the console offers in its inputs and read-outs, with their exact SI factors
 * (NIST SP 811 / Handbook 44: 1 in = 0.0254 m, 1 lb = 0.45359237 kg, 1 US gal = 231 in³). The API
 * converts every `{ value, unit }` it receives itself; these only show SI figures in shop units and
 * drive the live helpers (mold volume) before anything is saved.
 */
export type Dimension = 'mass' | 'volume' | 'density' | 'temperature' | 'length' | 'time';

interface UnitDef {
  /** The symbol the API takes. */
  id: string;
  /** How a person reads it. */
  name: string;
  toSI: (v: number) => number;
  fromSI: (v: number) => number;
}

const IN = 0.0254;
const FT = 0.3048;
const LB = 0.45359237;
const linear = (id: string, name: string, factor: number): UnitDef => ({ id, name, toSI: (v) => v * factor, fromSI: (v) => v / factor });

export const UNITS: Readonly<Record<Dimension, readonly UnitDef[]>> = {
  length: [linear('mm', 'mm', 0.001), linear('cm', 'cm', 0.01), linear('m', 'm', 1), linear('in', 'in', IN), linear('ft', 'ft', FT)],
  mass: [linear('g', 'g', 0.001), linear('kg', 'kg', 1), linear('lb', 'lb', LB), linear('oz', 'oz', LB / 16)],
  volume: [
    linear('mL', 'mL', 1e-6),
    linear('L', 'L', 0.001),
    linear('cm3', 'cm³', 1e-6),
    linear('m3', 'm³', 1),
    linear('in3', 'in³', IN ** 3),
    linear('ft3', 'ft³', FT ** 3),
    linear('gal', 'US gal', 231 * IN ** 3),
  ],
  density: [linear('kg/m3', 'kg/m³', 1), linear('g/cm3', 'g/cm³', 1000), linear('lb/ft3', 'lb/ft³ (pcf)', LB / FT ** 3)],
  temperature: [
    { id: 'degC', name: '°C', toSI: (v) => v, fromSI: (v) => v },
    { id: 'degF', name: '°F', toSI: (v) => ((v - 32) * 5) / 9, fromSI: (v) => (v * 9) / 5 + 32 },
  ],
  time: [linear('s', 's', 1), linear('min', 'min', 60), linear('h', 'h', 3600)],
};

export function unitChoices(dimension: Dimension) {
  return UNITS[dimension].map((u) => ({ id: u.id, name: u.name }));
}

function unitOf(dimension: Dimension, unit: string): UnitDef | undefined {
  return UNITS[dimension].find((u) => u.id === unit);
}

/** SI value of `{ value, unit }`, or null when the value is missing or the unit unknown. */
export function toSI(dimension: Dimension, value: unknown, unit: string): number | null {
  const n = typeof value === 'string' ? (value.trim() === '' ? NaN : Number(value)) : typeof value === 'number' ? value : NaN;
  const u = unitOf(dimension, unit);
  if (!u || !Number.isFinite(n)) return null;
  return u.toSI(n);
}

export function fromSI(dimension: Dimension, si: number, unit: string): number {
  const u = unitOf(dimension, unit);
  if (!u) throw new RangeError(`${unit} is not a ${dimension} unit`);
  return u.fromSI(si);
}

export function unitLabel(dimension: Dimension, unit: string): string {
  return unitOf(dimension, unit)?.name ?? unit;
}

export type UnitSystem = 'metric' | 'imperial';

/** The unit each dimension is shown in, per unit system. */
export const DISPLAY_UNITS: Readonly<Record<UnitSystem, Record<Dimension, string>>> = {
  metric: { length: 'mm', mass: 'kg', volume: 'L', density: 'kg/m3', temperature: 'degC', time: 's' },
  imperial: { length: 'in', mass: 'lb', volume: 'in3', density: 'lb/ft3', temperature: 'degF', time: 's' },
};

/** A number with at most `digits` significant digits, in the person's locale ("1 234.5"). */
export function formatNumber(value: number, digits = 4, locale?: string): string {
  if (!Number.isFinite(value)) return '—';
  const abs = Math.abs(value);
  const fraction = abs === 0 ? 0 : Math.max(0, Math.min(6, digits - 1 - Math.floor(Math.log10(abs))));
  return new Intl.NumberFormat(locale, { maximumFractionDigits: fraction }).format(value);
}

/** "28 kg/m³", "1.75 lb/ft³ (pcf)" is too long for tables: the short name without the bracket. */
export function formatQuantity(si: number | null | undefined, dimension: Dimension, unit: string, digits = 4, locale?: string): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  const label = unitLabel(dimension, unit).replace(/ \(.*\)$/, '');
  return `${formatNumber(fromSI(dimension, si, unit), digits, locale)} ${label}`;
}

/** A duration in seconds as a shop reads it: "75 s", "8 min", "24 h", "1 min 15 s". */
export function formatSeconds(s: number | null | undefined): string {
  if (s === null || s === undefined || !Number.isFinite(s)) return '—';
  if (s < 120 && !(s >= 60 && s % 60 === 0)) return `${formatNumber(s, 3)} s`;
  if (s < 3 * 3600) {
    const m = Math.floor(s / 60);
    const rest = Math.round(s - m * 60);
    return rest ? `${m} min ${rest} s` : `${m} min`;
  }
  return `${formatNumber(s / 3600, 3)} h`;
}

/** Seconds as the friendliest whole `{ value, unit }` for an input (480 s → 8 min). */
export function secondsForInput(s: number | null | undefined): { value: number | null; unit: string } {
  if (s === null || s === undefined) return { value: null, unit: 's' };
  if (s >= 3600 && s % 3600 === 0) return { value: s / 3600, unit: 'h' };
  if (s >= 60 && s % 60 === 0) return { value: s / 60, unit: 'min' };
  return { value: s, unit: 's' };
}
