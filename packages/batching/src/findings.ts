/**
 * One vocabulary of findings: the codes a batch warning, a reading's reason and a cup test's verdict
 * share (schemas/finding-code.schema.json lists the same codes), and the sentences for a person,
 * written in the reader's unit system and rounded to the scale (or a sensible precision), with
 * signs in words ("part B heavy by 4.98 %", never "off by −4.98 %").
 *
 * A finding keeps its figures in SI (`measured`, `limit`, `unit`) and the few facts its sentence
 * needs (`facts`), so the sentence can be written again for another reader (`describeFinding`).
 */
import { displayUnits, fromSI, type UnitSystem } from './units.js';

export const FINDING_CODES = [
  // the device
  'SCALE_NOT_STABLE',
  'CALIBRATION_OVERDUE',
  'OVER_CAPACITY',
  // masses and the ratio
  'RATIO_ISOCYANATE_HEAVY',
  'RATIO_POLYOL_HEAVY',
  'PART_A_MASS_LOW',
  'PART_A_MASS_HIGH',
  'PART_B_MASS_LOW',
  'PART_B_MASS_HIGH',
  'PART_NOT_WEIGHED',
  'SHORT_SHOT',
  'TOTAL_MASS_LOW',
  'TOTAL_MASS_HIGH',
  'PIGMENT_MASS_LOW',
  'PIGMENT_MASS_HIGH',
  'PIGMENT_OVER_LIMIT',
  // conditions
  'TEMPERATURE_BELOW_WINDOW',
  'TEMPERATURE_ABOVE_WINDOW',
  'MOLD_TEMPERATURE_BELOW_WINDOW',
  'MOLD_TEMPERATURE_ABOVE_WINDOW',
  'AMBIENT_TEMPERATURE_BELOW_WINDOW',
  'AMBIENT_TEMPERATURE_ABOVE_WINDOW',
  'HUMIDITY_ABOVE_LIMIT',
  // times
  'POT_LIFE_EXCEEDED',
  'DEMOLDED_EARLY',
  // planning a batch
  'PACK_FACTOR_BELOW_ONE',
  'PACK_FACTOR_MARGINAL',
  'PACK_FACTOR_ABOVE_LIMIT',
  'TOLERANCE_BELOW_SCALE_RESOLUTION',
  'EXOTHERM_RISK_MASS',
  'LOT_EXPIRED',
  // cup tests (ASTM D7487 terms)
  'CREAM_TIME_BELOW_WINDOW',
  'CREAM_TIME_ABOVE_WINDOW',
  'RISE_TIME_BELOW_WINDOW',
  'RISE_TIME_ABOVE_WINDOW',
  'TACK_FREE_TIME_BELOW_WINDOW',
  'TACK_FREE_TIME_ABOVE_WINDOW',
  'FREE_RISE_DENSITY_BELOW_BAND',
  'FREE_RISE_DENSITY_ABOVE_BAND',
] as const;

export type FindingCode = (typeof FINDING_CODES)[number];

/** `caution` for a marginal condition, `warning` for an engineer to look at, `danger` where it can hurt someone or scrap the work. */
export type FindingSeverity = 'caution' | 'warning' | 'danger';

export type SystemKind = 'flexible' | 'integral-skin' | 'other';

/** What a sentence needs beyond the two figures. */
export interface FindingFacts {
  readonly part?: 'A' | 'B' | 'pigment';
  readonly side?: 'isocyanate' | 'polyol';
  readonly kind?: SystemKind;
  /** The target the mass band is about, kg. */
  readonly target?: number;
  /** Scale readability, kg: masses are rounded to it. */
  readonly readability?: number;
  /** The ± band, percent (or pbw when `unit` is pbw). */
  readonly tolerance?: number;
  /** A window's other edge (the finding's limit is the edge crossed). */
  readonly otherEdge?: number;
  readonly date?: string;
  readonly lot?: string;
  readonly basis?: string;
  readonly divisions?: number;
  readonly minimum?: number;
}

export interface Finding {
  readonly code: FindingCode;
  readonly message: string;
  readonly measured: number | null;
  readonly limit: number | null;
  /** SI: kg, degC, s, kg/m3, '%', 'pbw', '1' (a pure number), 'd' (days); null when there is no figure. */
  readonly unit: string | null;
  readonly facts?: FindingFacts;
}

const sig = (x: number, digits: number): number => Number(x.toPrecision(digits));
const trim = (x: number, decimals: number): string => String(Number(x.toFixed(decimals)));

/** Figures for one reader: the unit system's display units, rounded to what the reading can tell. */
export class Formatter {
  constructor(readonly system: UnitSystem = 'metric') {}

  /** A mass rounded to the scale's readability when known, else to 4 significant figures. */
  mass(kg: number, readability?: number): string {
    if (this.system === 'imperial') {
      const lb = fromSI('mass', kg, 'lb');
      const step = readability ? fromSI('mass', readability, 'lb') : 0;
      return `${step > 0 ? trim(lb, Math.min(6, Math.max(0, Math.ceil(-Math.log10(step))))) : String(sig(lb, 4))} lb`;
    }
    const big = Math.abs(kg) >= 1;
    const value = big ? kg : kg * 1000;
    const step = readability ? (big ? readability : readability * 1000) : 0;
    const text = step > 0 ? trim(value, Math.min(6, Math.max(0, Math.ceil(-Math.log10(step) - 1e-9)))) : String(sig(value, 4));
    return `${text} ${big ? 'kg' : 'g'}`;
  }

  temperature(c: number): string {
    return this.system === 'imperial' ? `${trim(fromSI('temperature', c, 'degF'), 1)} °F` : `${trim(c, 1)} °C`;
  }

  density(kgM3: number): string {
    const unit = displayUnits(this.system).density;
    return `${sig(fromSI('density', kgM3, unit), 3)} ${unit === 'kg/m3' ? 'kg/m³' : 'lb/ft³'}`;
  }

  /** Seconds under 2 minutes, minutes (one decimal) above. */
  time(s: number): string {
    return Math.abs(s) < 120 ? `${trim(s, 1)} s` : `${trim(s / 60, 1)} min`;
  }

  percent(p: number): string {
    return `${trim(p, Math.abs(p) >= 10 ? 1 : 2)} %`;
  }

  number(x: number): string {
    return String(sig(x, 4));
  }

  /** A figure in its SI unit, written for this reader. */
  figure(value: number, unit: string | null, readability?: number): string {
    switch (unit) {
      case 'kg':
        return this.mass(value, readability);
      case 'degC':
        return this.temperature(value);
      case 'kg/m3':
        return this.density(value);
      case 's':
        return this.time(value);
      case '%':
        return this.percent(value);
      case 'pbw':
        return `${trim(value, 2)} pbw`;
      case 'd':
        return `${value} day${value === 1 ? '' : 's'}`;
      default:
        return this.number(value);
    }
  }
}

/** What an excess of each side does, worded for the kind of foam (common practice). */
export function offRatioEffect(side: 'isocyanate' | 'polyol', kind: SystemKind = 'other'): string {
  if (kind === 'flexible') {
    return side === 'isocyanate'
      ? 'the foam will be firmer and harsher to the touch, weaker in tear and elongation.'
      : 'the foam will be softer and tackier, weaker, slow to cure and prone to shrink.';
  }
  if (kind === 'integral-skin') {
    return side === 'isocyanate'
      ? 'the skin will be harder (higher Shore hardness) and brittle, the core harsher.'
      : 'the skin will be softer (lower Shore hardness) and tacky, slow to demold.';
  }
  return side === 'isocyanate'
    ? 'the foam tends to be harder and more brittle.'
    : 'the foam tends to be softer and tackier, and slower to cure.';
}

const PART_NAME = (part: FindingFacts['part']) => (part === 'pigment' ? 'the pigment' : part ? `part ${part}` : 'the part');

/** The sentence for a finding, for one reader. */
export function describeFinding(f: Omit<Finding, 'message'>, system: UnitSystem = 'metric'): string {
  const fmt = new Formatter(system);
  const x = f.facts ?? {};
  const m = f.measured ?? NaN;
  const l = f.limit ?? NaN;
  const fig = (v: number) => fmt.figure(v, f.unit, x.readability);
  // "18–27 °C", not "18 °C–27 °C"
  const range = (lo: string, hi: string) => {
    const unit = (t: string) => t.slice(t.lastIndexOf(' '));
    return unit(lo) === unit(hi) ? `${lo.slice(0, lo.lastIndexOf(' '))}–${hi}` : `${lo}–${hi}`;
  };
  const window = (what: string, below: boolean, effect: string) =>
    `${what} ${fig(m)} is ${below ? 'below' : 'above'} the window of ${range(fig(below ? l : (x.otherEdge ?? l)), fig(below ? (x.otherEdge ?? l) : l))}: ${effect}`;
  const band = (what: string, low: boolean, effect: string) => {
    const target = x.target ?? NaN;
    const off = Math.abs(m / target - 1) * 100;
    return `${what} is ${fmt.mass(m, x.readability)}, ${fmt.percent(off)} ${low ? 'under' : 'over'} its target of ${fmt.mass(target, x.readability)} (±${fmt.percent(x.tolerance ?? NaN)}): ${effect}`;
  };
  switch (f.code) {
    case 'SCALE_NOT_STABLE':
      return 'The scale had not settled; the reading is kept but not judged.';
    case 'CALIBRATION_OVERDUE':
      return `The device was due for calibration on ${x.date}${f.measured ? `, ${fig(m)} ago` : ''}: its readings cannot be trusted until it is calibrated.`;
    case 'OVER_CAPACITY':
      return `${fmt.mass(m)} is over the scale's capacity of ${fmt.mass(l)}: split the pour or use a larger scale.`;
    case 'RATIO_ISOCYANATE_HEAVY':
    case 'RATIO_POLYOL_HEAVY': {
      const side = f.code === 'RATIO_ISOCYANATE_HEAVY' ? 'isocyanate' : 'polyol';
      const by = f.unit === 'pbw' ? `${trim(Math.abs(m), 2)} pbw` : fmt.percent(Math.abs(m));
      const tol = f.unit === 'pbw' ? `±${trim(Math.abs(l), 2)} pbw` : `±${fmt.percent(Math.abs(l))}`;
      return `Part ${x.part} (the ${side} side) is heavy by ${by}, outside ${tol}: ${offRatioEffect(side, x.kind)}`;
    }
    case 'PART_A_MASS_LOW':
    case 'PART_B_MASS_LOW':
      return band(`Part ${f.code[5]}`, true, 'short of its target even if the ratio holds; the part will be under-filled.');
    case 'PART_A_MASS_HIGH':
    case 'PART_B_MASS_HIGH':
      return band(`Part ${f.code[5]}`, false, 'over its target; more mix than the mold needs (flash, higher exotherm).');
    case 'PART_NOT_WEIGHED':
      return `${PART_NAME(x.part).replace(/^p/, 'P')} ${f.measured === 0 ? 'weighed 0' : 'has no stable weighing'}: the ratio cannot be judged without both parts.`;
    case 'SHORT_SHOT':
      return `Short shot: ${x.part && x.part !== 'pigment' ? `part ${x.part}` : 'the mixed shot'} is ${fmt.mass(m, x.readability)}, ${fmt.percent((1 - m / (x.target ?? NaN)) * 100)} under its target of ${fmt.mass(x.target ?? NaN, x.readability)}: the part will be short (voids, unfilled corners).`;
    case 'TOTAL_MASS_LOW':
      return band('The mixed shot', true, 'the part will be short (voids, under-filled corners).');
    case 'TOTAL_MASS_HIGH':
      return band('The mixed shot', false, 'more than the mold needs: overpacking, flash and a higher exotherm.');
    case 'PIGMENT_MASS_LOW':
      return band('The pigment', true, 'the colour will be lighter than the standard.');
    case 'PIGMENT_MASS_HIGH':
      return band('The pigment', false, 'the colour will be deeper than the standard.');
    case 'PIGMENT_OVER_LIMIT':
      return `Pigment at ${fmt.percent(m)} of ${x.basis ?? 'A + B'} is above the system's maximum of ${fmt.percent(l)}: too much carrier can upset the cure and the cell structure.`;
    case 'TEMPERATURE_BELOW_WINDOW':
      return window('The component at', true, 'condition the components before pouring (slower rise, higher density).');
    case 'TEMPERATURE_ABOVE_WINDOW':
      return window('The component at', false, 'the pot life will be shorter and the rise faster.');
    case 'MOLD_TEMPERATURE_BELOW_WINDOW':
      return window('The mold at', true, 'expect a thick, soft skin, voids and a longer demold.');
    case 'MOLD_TEMPERATURE_ABOVE_WINDOW':
      return window('The mold at', false, 'expect a thin skin, blisters and a faster cure near the surface.');
    case 'AMBIENT_TEMPERATURE_BELOW_WINDOW':
      return window('The shop air at', true, 'the mix and the mold cool; expect slower rise and cure.');
    case 'AMBIENT_TEMPERATURE_ABOVE_WINDOW':
      return window('The shop air at', false, 'the pot life will be shorter.');
    case 'HUMIDITY_ABOVE_LIMIT':
      return `Relative humidity ${fmt.percent(m)} is above the limit of ${fmt.percent(l)}: moisture reacts with the isocyanate side (bubbles, a poorer skin). Keep containers closed.`;
    case 'POT_LIFE_EXCEEDED':
      return `Poured ${fmt.time(m)} after mix start, past the pot life of ${fmt.time(l)}: the mix was already gelling (poor flow, knit lines, voids).`;
    case 'DEMOLDED_EARLY':
      return `Demolded ${fmt.time(m)} after the pour, before the demold time of ${fmt.time(l)}: the part may tear, distort or take a set.`;
    case 'PACK_FACTOR_BELOW_ONE':
      return `Pack factor ${fmt.number(m)} against ${x.basis ?? 'the free-rise density'} is below 1: the foam cannot fill the cavity (short fill, voids). Do not pour this batch as planned.`;
    case 'PACK_FACTOR_MARGINAL':
      return `Pack factor ${fmt.number(m)} against ${x.basis ?? 'the free-rise density'} is barely above 1 (under ${fmt.number(l)}): a slightly cold or aged component leaves the cavity short. Consider more packing.`;
    case 'PACK_FACTOR_ABOVE_LIMIT':
      return `Pack factor ${fmt.number(m)} against ${x.basis ?? 'the free-rise density'} is above the system's limit of ${fmt.number(l)}: expect high mold pressure, flash or a mold that opens.`;
    case 'TOLERANCE_BELOW_SCALE_RESOLUTION':
      return `The ratio tolerance on part ${x.part} is ±${fmt.mass(m)}, only ${fmt.number(x.divisions ?? NaN)} divisions of a ${fmt.mass(x.readability ?? NaN)} scale (at least ${x.minimum} needed): the scale cannot resolve the band. Mix a larger batch or use a finer scale.`;
    case 'EXOTHERM_RISK_MASS':
      return `A single pour of ${fmt.mass(m)} is above ${fmt.mass(l)}: a large mass of mixed foam can overheat from its own exotherm (scorch, smoke, fire). Pour in layers or smaller shots and keep within the supplier's guidance (TDS/SDS).`;
    case 'LOT_EXPIRED':
      return `The ${x.part === 'pigment' ? 'pigment' : `part ${x.part}`} ${x.lot ? `lot ${x.lot}` : 'lot'} expired on ${x.date}, ${fig(m)} ago.`;
    case 'CREAM_TIME_BELOW_WINDOW':
    case 'RISE_TIME_BELOW_WINDOW':
    case 'TACK_FREE_TIME_BELOW_WINDOW':
    case 'CREAM_TIME_ABOVE_WINDOW':
    case 'RISE_TIME_ABOVE_WINDOW':
    case 'TACK_FREE_TIME_ABOVE_WINDOW': {
      const what = f.code.startsWith('CREAM') ? 'Cream time' : f.code.startsWith('RISE') ? 'Rise time' : 'Tack-free time';
      const below = f.code.endsWith('BELOW_WINDOW');
      return window(what, below, below ? 'the lot reacts faster than the system should (catalysis, warm material).' : 'the lot reacts slower than the system should (aged or moist components, cold material).');
    }
    case 'FREE_RISE_DENSITY_BELOW_BAND':
    case 'FREE_RISE_DENSITY_ABOVE_BAND': {
      const below = f.code.endsWith('BELOW_BAND');
      return `Free-rise density ${fmt.density(m)} (corrected to the reference temperature) is ${below ? 'below' : 'above'} the band of ${range(fmt.density(below ? l : (x.otherEdge ?? l)), fmt.density(below ? (x.otherEdge ?? l) : l))}: ${below ? 'the lot blows more than it should (extra water or blowing agent).' : 'the lot blows less than it should (moisture-damaged isocyanate, aged polyol).'}`;
    }
  }
}

/** A finding with its sentence written for a metric reader (the stored form). */
export function finding(code: FindingCode, numbers: { measured?: number | null; limit?: number | null; unit?: string | null } = {}, facts?: FindingFacts): Finding {
  const f = { code, measured: numbers.measured ?? null, limit: numbers.limit ?? null, unit: numbers.unit ?? null, facts: facts ?? {} };
  return { ...f, message: describeFinding(f, 'metric') };
}

/** The same findings written again for a reader of another unit system. */
export function forReader<T extends { code: string; message: string; measured?: number | null; limit?: number | null; unit?: string | null; facts?: FindingFacts }>(findings: readonly T[], system: UnitSystem): T[] {
  // findings stored before they kept their facts keep their sentence as written
  return findings.map((f) =>
    (FINDING_CODES as readonly string[]).includes(f.code) && f.facts !== undefined && system !== 'metric'
      ? { ...f, message: describeFinding({ code: f.code as FindingCode, measured: f.measured ?? null, limit: f.limit ?? null, unit: f.unit ?? null, facts: f.facts }, system) }
      : f,
  );
}
