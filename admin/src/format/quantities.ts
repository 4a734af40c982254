/**
 * The one place the console turns numbers into text: masses, volumes, densities, temperatures,
 * lengths, percents and durations. Every screen formats through these functions, so a figure reads
 * the same on the review queue, a batch, the pour sheet and the overview.
 *
 * Units: the API writes symbols in ASCII (`degC`, `kg/m3`) and converts every `{ value, unit }` it
 * receives itself; the factors here (NIST SP 811 / Handbook 44: 1 in = 0.0254 m,
 * 1 lb = 0.45359237 kg, 1 US gal = 231 in³, °F = °C × 9/5 + 32) only show SI figures in the
 * person's units and drive the live helpers (mold volume) before anything is saved.
 */
import type { UnitSystem } from '../auth/me';

export type { UnitSystem };
export type Dimension = 'mass' | 'volume' | 'density' | 'temperature' | 'length' | 'time';

interface UnitDef {
  /** The symbol the API takes. */
  id: string;
  /** How a person reads it in a unit picker. */
  name: string;
  toSI: (v: number) => number;
  fromSI: (v: number) => number;
}

const IN = 0.0254;
const FT = 0.3048;
const LB = 0.45359237;
const OZ = LB / 16;
const linear = (id: string, name: string, factor: number): UnitDef => ({ id, name, toSI: (v) => v * factor, fromSI: (v) => v / factor });

export const UNITS: Readonly<Record<Dimension, readonly UnitDef[]>> = {
  length: [linear('mm', 'mm', 0.001), linear('cm', 'cm', 0.01), linear('m', 'm', 1), linear('in', 'in', IN), linear('ft', 'ft', FT)],
  mass: [linear('g', 'g', 0.001), linear('kg', 'kg', 1), linear('lb', 'lb', LB), linear('oz', 'oz', OZ)],
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

/** The choices of a unit picker for one dimension. */
export function unitChoices(dimension: Dimension) {
  return UNITS[dimension].map((u) => ({ id: u.id, name: u.name }));
}

function findUnit(unit: string, dimension?: Dimension): UnitDef | undefined {
  const dims = dimension ? [dimension] : (Object.keys(UNITS) as Dimension[]);
  for (const d of dims) {
    const u = UNITS[d].find((x) => x.id === unit);
    if (u) return u;
  }
  return undefined;
}

/** SI value of `{ value, unit }`, or null when the value is missing or the unit unknown. */
export function toSI(dimension: Dimension, value: unknown, unit: string): number | null {
  const n = typeof value === 'string' ? (value.trim() === '' ? NaN : Number(value)) : typeof value === 'number' ? value : NaN;
  const u = findUnit(unit, dimension);
  if (!u || !Number.isFinite(n)) return null;
  return u.toSI(n);
}

export function fromSI(dimension: Dimension, si: number, unit: string): number {
  const u = findUnit(unit, dimension);
  if (!u) throw new RangeError(`${unit} is not a ${dimension} unit`);
  return u.fromSI(si);
}

/** The unit each dimension is shown in, per unit system (inputs and read-outs). */
export const DISPLAY_UNITS: Readonly<Record<UnitSystem, Record<Dimension, string>>> = {
  metric: { length: 'mm', mass: 'kg', volume: 'L', density: 'kg/m3', temperature: 'degC', time: 's' },
  imperial: { length: 'in', mass: 'lb', volume: 'in3', density: 'lb/ft3', temperature: 'degF', time: 's' },
};

const SIGNS: Readonly<Record<string, string>> = {
  degC: '°C',
  degF: '°F',
  'kg/m3': 'kg/m³',
  'lb/ft3': 'lb/ft³',
  pcf: 'lb/ft³',
  'g/cm3': 'g/cm³',
  m3: 'm³',
  cm3: 'cm³',
  in3: 'in³',
  ft3: 'ft³',
  gal: 'US gal',
  '%RH': '% RH',
  percent: '%',
  d: 'days',
  '1': '',
};

/** The sign of a unit as printed after a number: `degC` → `°C`, `1` (a pure number) → nothing. */
export function unitLabel(unit: string | null | undefined): string {
  if (unit === null || unit === undefined) return '';
  return SIGNS[unit] ?? unit;
}

/** Decimals shown when nothing better (a scale's readability) is known. */
const DECIMALS: Readonly<Record<string, number>> = {
  kg: 3,
  g: 1,
  lb: 3,
  oz: 2,
  degC: 1,
  degF: 1,
  '%': 2,
  '%RH': 0,
  'kg/m3': 1,
  'lb/ft3': 2,
  'g/cm3': 3,
  L: 2,
  mL: 0,
  m3: 4,
  cm3: 0,
  in3: 1,
  ft3: 3,
  gal: 3,
  mm: 1,
  cm: 1,
  m: 3,
  in: 2,
  ft: 2,
  s: 0,
  min: 1,
  h: 1,
  d: 0,
  '1': 2,
};

export function defaultDecimals(unit: string | null | undefined): number {
  return unit ? (DECIMALS[unit] ?? 2) : 2;
}

/** Decimals that show one scale division: 0.1 g → 1, 0.0022 lb → 3, 5 g → 0. */
export function decimalsForStep(step: number | null | undefined): number | undefined {
  if (!step || !Number.isFinite(step) || step <= 0) return undefined;
  return Math.min(6, Math.max(0, Math.ceil(-Math.log10(step) - 1e-9)));
}

export interface NumberFormat {
  /** A fixed number of decimals (2 unless `significant` is given). */
  decimals?: number;
  /** At most this many significant digits instead of fixed decimals (read-outs of computed figures). */
  significant?: number;
  /** Always show + or − (for errors and deviations). */
  signed?: boolean;
  locale?: string;
  /** Drop trailing zeros after the decimal point (7.50 → 7.5). */
  trim?: boolean;
}

/**
 * Beyond this magnitude a figure is shown as "1.23 × 10¹²": a value no scale or mold produces
 * (the API refuses most of them) must not become a 300-digit string that pushes a column off-screen.
 */
export const LARGEST_PLAIN = 1e9;
const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function scientific(value: number, locale: string | undefined): string {
  const exp = Math.floor(Math.log10(Math.abs(value)));
  let mantissa = Math.abs(value) / 10 ** exp;
  let e = exp;
  if (Number(mantissa.toFixed(2)) >= 10) {
    mantissa /= 10;
    e += 1;
  }
  const m = new Intl.NumberFormat(locale ?? 'en-GB', { maximumFractionDigits: 2 }).format(mantissa);
  const sup = String(Math.abs(e))
    .split('')
    .map((d) => SUPERSCRIPT[Number(d)])
    .join('');
  return `${m} × 10${e < 0 ? '⁻' : ''}${sup}`;
}

/** A number with a real minus sign (U+2212), grouping, and fixed decimals or significant digits. */
export function formatNumber(value: number | null | undefined, opts: NumberFormat = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const locale = opts.locale ?? 'en-GB';
  if (Math.abs(value) >= LARGEST_PLAIN) {
    const sign = value < 0 ? '−' : opts.signed ? '+' : '';
    return `${sign}${scientific(value, locale)}`;
  }
  let decimals: number;
  let trim = opts.trim ?? false;
  if (opts.significant !== undefined) {
    const abs = Math.abs(value);
    decimals = abs === 0 ? 0 : Math.max(0, Math.min(6, opts.significant - 1 - Math.floor(Math.log10(abs))));
    trim = true;
  } else {
    decimals = opts.decimals ?? 2;
  }
  const rounded = Number(value.toFixed(decimals));
  const abs = Math.abs(rounded);
  const text = new Intl.NumberFormat(locale, { minimumFractionDigits: trim ? 0 : decimals, maximumFractionDigits: decimals }).format(abs);
  const sign = rounded < 0 ? '−' : opts.signed && rounded > 0 ? '+' : '';
  return `${sign}${text}`;
}

/**
 * A value as a device sent it, every decimal it gave (`412.63 g`), but never a 300-digit string: past
 * `LARGEST_PLAIN` it reads in powers of ten like every other figure.
 */
export function formatAsSent(value: number | null | undefined, unit: string | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const given = /\.(\d+)$/.exec(String(value));
  return formatQuantity(value, unit, { decimals: Math.min(6, given ? given[1]!.length : 0) });
}

/** `16.2 °C`, `486.7 g`, `−7.88 %`, `1.80` (a pure number): a value already in `unit`. */
export function formatQuantity(value: number | null | undefined, unit: string | null | undefined, opts: NumberFormat = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const n = formatNumber(value, opts.significant !== undefined ? opts : { ...opts, decimals: opts.decimals ?? defaultDecimals(unit) });
  const sign = unitLabel(unit);
  return sign ? `${n} ${sign}` : n;
}

/** An SI value shown in a chosen unit: `formatSiAs(28, 'lb/ft3')` → `1.748 lb/ft³` (4 significant digits unless told). */
export function formatSiAs(si: number | null | undefined, unit: string, opts: NumberFormat = {}): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '—';
  const u = findUnit(unit);
  if (!u) return formatQuantity(si, unit, opts);
  const o = opts.decimals === undefined && opts.significant === undefined ? { ...opts, significant: 4 } : opts;
  return formatQuantity(u.fromSI(si), unit, o);
}

/**
 * Below this many pounds an imperial mass reads in ounces: a bench scale's 0.010 lb is 0.16 oz,
 * the figure a person can compare with the display (common practice: 16 oz = 1 lb).
 */
export const SMALL_MASS_LB = 1;

/** How a small mass reads in imperial: ounces unless the organization chose grams. */
export type SmallMassUnit = 'oz' | 'g';
let smallMassUnit: SmallMassUnit = 'oz';

/** The organization's choice for small imperial masses (the session sets it when the API says). */
export function setSmallMassUnit(unit: SmallMassUnit): void {
  smallMassUnit = unit;
}

/** A mass in pounds, moved to ounces (or grams) when it is under a pound; decimals follow the move. */
function smallMass(lb: number, decimals: number | undefined): { value: number; unit: string; decimals: number | undefined } {
  // judged as it will read: 0.9998 lb at three decimals (or three significant digits) reads 1.000 lb, not 16.00 oz
  const reads = decimals === undefined ? Number(lb.toPrecision(3)) : Number(lb.toFixed(decimals));
  if (Math.abs(reads) >= SMALL_MASS_LB) return { value: lb, unit: 'lb', decimals };
  if (smallMassUnit === 'g') return { value: lb * LB * 1000, unit: 'g', decimals: decimals === undefined ? undefined : Math.max(0, decimals - 2) };
  // 16 oz to the pound: one more order of magnitude, so one decimal fewer shows the same step
  return { value: lb * 16, unit: 'oz', decimals: decimals === undefined ? undefined : Math.max(0, decimals - 1) };
}

/** A value in SI (kg, °C, …) moved into the person's unit system, with the unit it is now in. */
export function siToDisplay(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  switch (siUnit) {
    case 'kg':
      if (system === 'imperial') {
        const m = smallMass(value / LB, undefined);
        return { value: m.value, unit: m.unit };
      }
      return Math.abs(value) < 1 ? { value: value * 1000, unit: 'g' } : { value, unit: 'kg' };
    case 'degC':
      return system === 'imperial' ? { value: (value * 9) / 5 + 32, unit: 'degF' } : { value, unit: 'degC' };
    case 'kg/m3':
      // 1 lb/ft³ = 0.45359237 kg ÷ (0.3048 m)³ = 16.018463… kg/m³ (exact definitions)
      return system === 'imperial' ? { value: value / (LB / FT ** 3), unit: 'lb/ft3' } : { value, unit: 'kg/m3' };
    case 'm3':
      return system === 'imperial' ? { value: value / IN ** 3, unit: 'in3' } : { value: value * 1000, unit: 'L' };
    default:
      return { value, unit: siUnit };
  }
}

/** An SI value shown in the person's units: `0.2904 kg` → `290.4 g` (metric) or `10.24 oz`. */
export function formatSi(value: number | null | undefined, siUnit: string | null | undefined, system: UnitSystem, opts: NumberFormat = {}): string {
  if (value === null || value === undefined || !siUnit) return formatQuantity(value, siUnit, opts);
  const d = siToDisplay(value, siUnit, system);
  return formatQuantity(d.value, d.unit, opts);
}

/** A quantity as the API's display figures carry it: `{ value, unit, si }`. */
export interface DisplayQuantity {
  value: number;
  unit: string;
  si?: { value: number; unit: string };
}

/**
 * A figure the API already put in the person's units. Durations read in the unit that fits them
 * (75 s, 8 min, 24 h) whatever the API chose; pounds under one pound read in ounces.
 */
export function formatDisplay(q: DisplayQuantity | null | undefined, opts: NumberFormat = {}): string {
  if (!q) return '—';
  if (q.si?.unit === 's') return formatSeconds(q.si.value);
  if (q.unit === 'lb') {
    const m = smallMass(q.value, opts.decimals);
    return formatQuantity(m.value, m.unit, { ...opts, decimals: m.decimals });
  }
  return formatQuantity(q.value, q.unit, opts);
}

/**
 * The unit a pair of figures (a band's low and high) share: ounces for both when the larger is
 * under a pound, so "0.14–0.16 oz" never reads "0.14 oz – 1.02 lb".
 */
export function formatDisplayBand(low: DisplayQuantity, high: DisplayQuantity, opts: NumberFormat = {}): string {
  if (low.unit === 'lb' && high.unit === 'lb' && Math.max(Math.abs(low.value), Math.abs(high.value)) < SMALL_MASS_LB) {
    const a = smallMass(low.value, opts.decimals);
    const b = smallMass(high.value, opts.decimals);
    return `${formatNumber(a.value, { ...opts, decimals: a.decimals ?? defaultDecimals(a.unit) })}–${formatQuantity(b.value, b.unit, { ...opts, decimals: b.decimals })}`;
  }
  if (low.unit === high.unit && low.unit !== 'lb' && low.si?.unit !== 's') {
    return `${formatNumber(low.value, { ...opts, decimals: opts.decimals ?? defaultDecimals(low.unit) })}–${formatQuantity(high.value, high.unit, opts)}`;
  }
  return `${formatDisplay(low, opts)} – ${formatDisplay(high, opts)}`;
}

/** A duration in seconds as a shop reads it: "75 s", "1 min", "2 min 30 s", "8 min", "24 h". */
export function formatSeconds(s: number | null | undefined): string {
  if (s === null || s === undefined || !Number.isFinite(s)) return '—';
  if (Math.abs(s) >= LARGEST_PLAIN) return `${formatNumber(s / 3600, { significant: 3 })} h`;
  if (s < 120 && !(s >= 60 && s % 60 === 0)) return `${formatNumber(s, { significant: 3 })} s`;
  if (s < 3 * 3600) {
    const m = Math.floor(s / 60);
    const rest = Math.round(s - m * 60);
    return rest ? `${m} min ${rest} s` : `${m} min`;
  }
  return `${formatNumber(s / 3600, { significant: 3 })} h`;
}

/** Seconds as the friendliest whole `{ value, unit }` for an input (480 s → 8 min). */
export function secondsForInput(s: number | null | undefined): { value: number | null; unit: string } {
  if (s === null || s === undefined) return { value: null, unit: 's' };
  if (s >= 3600 && s % 3600 === 0) return { value: s / 3600, unit: 'h' };
  if (s >= 60 && s % 60 === 0) return { value: s / 60, unit: 'min' };
  return { value: s, unit: 's' };
}

/** A span in words, for grace periods and lifetimes in sentences: "1 hour", "7 days", "90 seconds". */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds <= 0) return 'no overlap';
  const units: [number, string][] = [
    [86_400, 'day'],
    [3_600, 'hour'],
    [60, 'minute'],
    [1, 'second'],
  ];
  for (const [size, name] of units) {
    if (seconds >= size && seconds % size === 0) {
      const n = seconds / size;
      return `${n} ${name}${n === 1 ? '' : 's'}`;
    }
  }
  return `${Math.round(seconds)} seconds`;
}

/** A percent figure: `−7.9 %`, `+0.4 %` (signed for errors and deviations). */
export function formatPercent(value: number | null | undefined, opts: NumberFormat = {}): string {
  return formatQuantity(value, '%', { decimals: 1, ...opts });
}
