/**
 * Units as people on the shop floor read them. The API writes unit symbols in ASCII (`degC`,
 * `kg/m3`); the console shows the usual signs and a sensible number of decimals per unit, and can
 * move an SI value into the person's unit system (absolute temperatures: °F = °C × 9/5 + 32).
 */
import type { UnitSystem } from '../auth/me';

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
  s: 0,
  min: 1,
  h: 1,
  d: 0,
  '1': 2,
};

/** The sign of a unit as printed after a number: `degC` → `°C`, `1` (a pure number) → nothing. */
export function unitLabel(unit: string | null | undefined): string {
  if (unit === null || unit === undefined) return '';
  return SIGNS[unit] ?? unit;
}

export function defaultDecimals(unit: string | null | undefined): number {
  return unit ? (DECIMALS[unit] ?? 2) : 2;
}

/** Decimals that show one scale division: 0.1 g → 1, 0.0022 lb → 4, 5 g → 0. */
export function decimalsForStep(step: number | null | undefined): number | undefined {
  if (!step || !Number.isFinite(step) || step <= 0) return undefined;
  return Math.min(6, Math.max(0, Math.ceil(-Math.log10(step) - 1e-9)));
}

export interface NumberFormat {
  decimals?: number;
  /** Always show + or − (for errors and deviations). */
  signed?: boolean;
  locale?: string;
  /** Drop trailing zeros after the decimal point (7.50 → 7.5). */
  trim?: boolean;
}

/** A number with a real minus sign (U+2212), grouping and a fixed number of decimals. */
export function formatNumber(value: number, opts: NumberFormat = {}): string {
  if (!Number.isFinite(value)) return '—';
  const decimals = opts.decimals ?? 2;
  const rounded = Number(value.toFixed(decimals));
  const abs = Math.abs(rounded);
  const text = new Intl.NumberFormat(opts.locale ?? 'en-GB', {
    minimumFractionDigits: opts.trim ? 0 : decimals,
    maximumFractionDigits: decimals,
  }).format(abs);
  const sign = rounded < 0 ? '−' : opts.signed && rounded > 0 ? '+' : '';
  return `${sign}${text}`;
}

/** `16.2 °C`, `486.7 g`, `−7.88 %`, `1.8` (a pure number). */
export function formatQuantity(value: number | null | undefined, unit: string | null | undefined, opts: NumberFormat = {}): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const decimals = opts.decimals ?? defaultDecimals(unit);
  const n = formatNumber(value, { ...opts, decimals });
  const sign = unitLabel(unit);
  return sign ? `${n} ${sign}` : n;
}

/** A value in SI (kg, °C, …) moved into the person's unit system, with the unit it is now in. */
export function siToDisplay(value: number, siUnit: string, system: UnitSystem): { value: number; unit: string } {
  switch (siUnit) {
    case 'kg':
      if (system === 'imperial') return { value: value / 0.45359237, unit: 'lb' };
      return Math.abs(value) < 1 ? { value: value * 1000, unit: 'g' } : { value, unit: 'kg' };
    case 'degC':
      return system === 'imperial' ? { value: (value * 9) / 5 + 32, unit: 'degF' } : { value, unit: 'degC' };
    case 'kg/m3':
      // 1 lb/ft³ = 0.45359237 kg ÷ (0.3048 m)³ = 16.018463… kg/m³ (exact definitions)
      return system === 'imperial' ? { value: value / (0.45359237 / 0.3048 ** 3), unit: 'lb/ft3' } : { value, unit: 'kg/m3' };
    case 'm3':
      return system === 'imperial' ? { value: value / 0.0254 ** 3, unit: 'in3' } : { value: value * 1000, unit: 'L' };
    default:
      return { value, unit: siUnit };
  }
}

/** An SI value shown in the person's units: `0.2904 kg` → `290.4 g` (metric) or `0.640 lb`. */
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

export function formatDisplay(q: DisplayQuantity | null | undefined, opts: NumberFormat = {}): string {
  if (!q) return '—';
  // durations read best in the unit that fits them (75 s, 8 min, 24 h), whatever the API chose
  if (q.si?.unit === 's') return formatSeconds(q.si.value);
  return formatQuantity(q.value, q.unit, opts);
}

/** Durations of pot life, demold and cure: `75 s`, `8 min`, `24 h`. */
export function formatSeconds(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return '—';
  if (seconds < 120) return `${formatNumber(seconds, { decimals: 0 })} s`;
  if (seconds < 3 * 3600) return `${formatNumber(seconds / 60, { decimals: 1, trim: true })} min`;
  return `${formatNumber(seconds / 3600, { decimals: 1, trim: true })} h`;
}
