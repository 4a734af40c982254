/**
 * A verdict's reasons in plain words. The API gives each reason a stable code, a sentence, and where
 * a number was compared with a limit both numbers in SI; this turns them into a short title, the
 * measured value and the limit as a person reads them, and one line to scan in a list.
 */
import type { UnitSystem } from '../auth/me';
import { formatNumber, formatSeconds, formatSi } from '../format/quantities';
import type { ReadingReason } from '../views/sdk';

export type Reason = ReadingReason;

export interface ReasonView {
  code: string;
  /** A few words: "Isocyanate side heavy". */
  title: string;
  /** "−7.88 %", "16.2 °C", or null when nothing was measured. */
  measured: string | null;
  /** "limit ±5 %", "at least 18 °C", or null. */
  limit: string | null;
  /** "A:B ratio off: isocyanate side heavy: −7.88 %, limit ±5 %". */
  line: string;
  /** The API's own sentence (it names the usual consequence, e.g. harder foam). */
  sentence: string;
}

interface CodeText {
  title: string;
  /** How the limit reads: a band, a floor or a ceiling. */
  limit?: 'band' | 'floor' | 'ceiling';
}

export const REASON_TEXT: Readonly<Record<string, CodeText>> = {
  RATIO_ISOCYANATE_HEAVY: { title: 'A:B ratio off: isocyanate side heavy', limit: 'band' },
  RATIO_POLYOL_HEAVY: { title: 'A:B ratio off: polyol side heavy', limit: 'band' },
  RATIO_WITHIN_TOLERANCE: { title: 'A:B ratio within tolerance', limit: 'band' },
  RATIO_ON_TARGET: { title: 'A:B ratio on target' },
  TEMPERATURE_BELOW_WINDOW: { title: 'Component too cold', limit: 'floor' },
  TEMPERATURE_ABOVE_WINDOW: { title: 'Component too warm', limit: 'ceiling' },
  OVER_CAPACITY: { title: 'Over the scale’s capacity', limit: 'ceiling' },
  MOLD_TEMPERATURE_BELOW_WINDOW: { title: 'Mold too cold', limit: 'floor' },
  MOLD_TEMPERATURE_ABOVE_WINDOW: { title: 'Mold too hot', limit: 'ceiling' },
  AMBIENT_TEMPERATURE_BELOW_WINDOW: { title: 'Shop air too cold', limit: 'floor' },
  AMBIENT_TEMPERATURE_ABOVE_WINDOW: { title: 'Shop air too warm', limit: 'ceiling' },
  HUMIDITY_ABOVE_LIMIT: { title: 'Air too humid', limit: 'ceiling' },
  TOTAL_MASS_LOW: { title: 'Mixed shot too light', limit: 'floor' },
  TOTAL_MASS_HIGH: { title: 'Mixed shot too heavy', limit: 'ceiling' },
  PIGMENT_MASS_LOW: { title: 'Too little pigment', limit: 'floor' },
  PIGMENT_MASS_HIGH: { title: 'Too much pigment', limit: 'ceiling' },
  PIGMENT_OVER_LIMIT: { title: 'Pigment over the system’s limit', limit: 'ceiling' },
  POT_LIFE_EXCEEDED: { title: 'Poured after the pot life', limit: 'ceiling' },
  DEMOLDED_EARLY: { title: 'Demolded before the demold time', limit: 'floor' },
  CALIBRATION_OVERDUE: { title: 'Scale past its calibration date' },
  SCALE_NOT_STABLE: { title: 'Scale had not settled' },
};

/** Codes the review queue can filter by, in the order the filter lists them. */
export const REASON_FILTER_CODES = [
  'RATIO_ISOCYANATE_HEAVY',
  'RATIO_POLYOL_HEAVY',
  'TEMPERATURE_BELOW_WINDOW',
  'TEMPERATURE_ABOVE_WINDOW',
  'MOLD_TEMPERATURE_BELOW_WINDOW',
  'MOLD_TEMPERATURE_ABOVE_WINDOW',
  'AMBIENT_TEMPERATURE_BELOW_WINDOW',
  'AMBIENT_TEMPERATURE_ABOVE_WINDOW',
  'HUMIDITY_ABOVE_LIMIT',
  'TOTAL_MASS_LOW',
  'TOTAL_MASS_HIGH',
  'PIGMENT_MASS_LOW',
  'PIGMENT_MASS_HIGH',
  'PIGMENT_OVER_LIMIT',
  'POT_LIFE_EXCEEDED',
  'DEMOLDED_EARLY',
  'OVER_CAPACITY',
  'CALIBRATION_OVERDUE',
] as const;

/** `SOME_NEW_CODE` → "Some new code", for codes this console does not know yet. */
export function humaniseCode(code: string): string {
  const words = code.toLowerCase().split(/[_\s]+/).filter(Boolean).join(' ');
  return words ? words[0]!.toUpperCase() + words.slice(1) : code;
}

export function reasonTitle(code: string): string {
  return REASON_TEXT[code]?.title ?? humaniseCode(code);
}

function limitText(kind: CodeText['limit'], limit: number, unit: string | null, system: UnitSystem): string {
  if (unit === '%' && kind === 'band') return `limit ±${formatNumber(Math.abs(limit), { decimals: 2, trim: true })} %`;
  const value = unit === '%' ? `${formatNumber(limit, { decimals: 2, trim: true })} %` : unit === 's' ? formatSeconds(limit) : formatSi(limit, unit, system);
  if (kind === 'floor') return `at least ${value}`;
  if (kind === 'ceiling') return `at most ${value}`;
  return `limit ${value}`;
}

/** One reason for a person; masses and temperatures in their unit system. */
export function describeReason(r: Reason, system: UnitSystem = 'metric'): ReasonView {
  const text = REASON_TEXT[r.code];
  const title = text?.title ?? humaniseCode(r.code);
  const measured =
    r.measured === null || r.measured === undefined
      ? null
      : r.unit === '%'
        ? `${formatNumber(r.measured, { decimals: 2, signed: text?.limit === 'band', trim: true })} %`
        : r.unit === 's'
          ? formatSeconds(r.measured)
          : formatSi(r.measured, r.unit, system);
  const limit = r.limit === null || r.limit === undefined ? null : limitText(text?.limit, r.limit, r.unit, system);
  const numbers = [measured, limit].filter(Boolean).join(', ');
  return { code: r.code, title, measured, limit, line: numbers ? `${title}: ${numbers}` : title, sentence: r.message };
}

/** The reasons of one reading as one line: "Component too cold: 16.2 °C, at least 18 °C; …". */
export function reasonsLine(reasons: readonly Reason[] | null | undefined, system: UnitSystem = 'metric'): string {
  if (!reasons?.length) return 'No reason given';
  return reasons.map((r) => describeReason(r, system).line).join('; ');
}
