/**
 * Warnings raised with batch targets. Each has a stable code (clients switch on it), a severity, a
 * sentence for a person, and — where a number was compared with a limit — both numbers in SI.
 *
 * Severity: `danger` where going ahead can hurt someone or is likely to scrap the batch or damage a
 * mold; `warning` where an engineer should look before pouring.
 */
import { finding, type FindingCode, type FindingFacts, type FindingSeverity } from './findings.js';
import { isoDateToDayNumber } from './validation.js';

export type WarningSeverity = FindingSeverity;

export type WarningCode = Extract<
  FindingCode,
  | 'PACK_FACTOR_BELOW_ONE'
  | 'PACK_FACTOR_MARGINAL'
  | 'PACK_FACTOR_ABOVE_LIMIT'
  | 'TOLERANCE_BELOW_SCALE_RESOLUTION'
  | 'PIGMENT_OVER_LIMIT'
  | 'EXOTHERM_RISK_MASS'
  | 'LOT_EXPIRED'
  | 'CALIBRATION_OVERDUE'
  | 'OVER_CAPACITY'
  | 'TEMPERATURE_BELOW_WINDOW'
  | 'TEMPERATURE_ABOVE_WINDOW'
>;

export interface BatchWarning {
  readonly code: WarningCode;
  readonly severity: WarningSeverity;
  readonly message: string;
  readonly measured?: number;
  readonly limit?: number;
  /** Unit of `measured` and `limit`: SI (kg, degC, '1' for a pure number, '%' for percents, 'd' for days). */
  readonly unit?: string;
  /** What the sentence needs besides the figures (to write it again in another unit system). */
  readonly facts?: FindingFacts;
}

export const WARNING_SEVERITY: Readonly<Record<WarningCode, WarningSeverity>> = {
  // the foam cannot fill the cavity: a short part is certain, so the batch should not be poured as planned
  PACK_FACTOR_BELOW_ONE: 'danger',
  // just above 1 a slightly cold or aged component leaves the part short
  PACK_FACTOR_MARGINAL: 'caution',
  // Over-packing past the system's limit raises mold pressure: molds open, flash or crack.
  PACK_FACTOR_ABOVE_LIMIT: 'danger',
  TOLERANCE_BELOW_SCALE_RESOLUTION: 'warning',
  PIGMENT_OVER_LIMIT: 'warning',
  EXOTHERM_RISK_MASS: 'danger',
  LOT_EXPIRED: 'danger',
  CALIBRATION_OVERDUE: 'warning',
  OVER_CAPACITY: 'danger',
  TEMPERATURE_BELOW_WINDOW: 'warning',
  TEMPERATURE_ABOVE_WINDOW: 'warning',
};

/**
 * Pack factors from 1 up to this are marginal: a caution. Common practice: molders pack flexible
 * foam by 10–20 % at least, so a fill that barely reaches the walls is not left to chance.
 */
export const MARGINAL_PACK_FACTOR = 1.1;

/**
 * The ± tolerance band on the smaller component should span at least this many scale divisions.
 * A scale shows steps of d, so each reading is already off by up to ±½ d from rounding alone, and a
 * bench scale's repeatability and in-service tolerance add about one or two d more at small loads
 * (NIST Handbook 44's scale tolerances are stated in divisions; the figure here is from memory).
 * With a band under about 5 d those errors use up most of it: the scale cannot resolve whether a
 * pour is in or out of ratio. Conservative default; raise the batch size or use a finer scale.
 */
export const DEFAULT_MINIMUM_TOLERANCE_DIVISIONS = 5;

/**
 * Mixed mass (kg) above which one pour may overheat from its own exotherm. From memory /
 * conservative default for a single pour of a fast flexible system; defer to the supplier's TDS/SDS,
 * whose figure replaces this one when the material system gives it.
 */
export const DEFAULT_EXOTHERM_MASS_LIMIT = 2;

/** Relative slack in limit comparisons, so a value equal to its limit in decimal is not flagged. */
const EPSILON = 1e-9;

function exceeds(measured: number, limit: number): boolean {
  return measured > limit + EPSILON * Math.max(1, Math.abs(limit));
}

function warning(code: WarningCode, numbers: { measured?: number; limit?: number; unit?: string } = {}, facts: FindingFacts = {}): BatchWarning {
  const f = finding(code, numbers, facts);
  return {
    code,
    severity: WARNING_SEVERITY[code],
    message: f.message,
    ...(numbers.measured !== undefined ? { measured: numbers.measured } : {}),
    ...(numbers.limit !== undefined ? { limit: numbers.limit } : {}),
    ...(numbers.unit !== undefined ? { unit: numbers.unit } : {}),
    facts,
  };
}

/** A mass for a sentence: grams below 1 kg, kilograms above. */
export function describeMass(kg: number): string {
  const round = (x: number, digits: number): string => String(Number(x.toPrecision(digits)));
  return Math.abs(kg) < 1 ? `${round(kg * 1000, 4)} g` : `${round(kg, 4)} kg`;
}

function round4(x: number): number {
  return Number(x.toPrecision(4));
}

/**
 * Pack factor below 1 (the foam cannot fill the cavity: short fill, voids: a danger), barely above 1
 * (a caution), or above the system's limit. `basis` says which free-rise density the pack factor is
 * against, for the message.
 */
export function checkPackFactor(packFactor: number, limit: number | undefined, basis = 'the free-rise density'): BatchWarning[] {
  const found: BatchWarning[] = [];
  if (packFactor < 1 - EPSILON) {
    found.push(warning('PACK_FACTOR_BELOW_ONE', { measured: packFactor, limit: 1, unit: '1' }, { basis }));
  } else if (packFactor < MARGINAL_PACK_FACTOR - EPSILON) {
    found.push(warning('PACK_FACTOR_MARGINAL', { measured: packFactor, limit: MARGINAL_PACK_FACTOR, unit: '1' }, { basis }));
  }
  if (limit !== undefined && exceeds(packFactor, limit)) {
    found.push(warning('PACK_FACTOR_ABOVE_LIMIT', { measured: packFactor, limit, unit: '1' }, { basis }));
  }
  return found;
}

export interface ToleranceResolutionInput {
  /** The smaller of A and B. */
  readonly part: 'A' | 'B';
  /** Narrower half-width of the ± ratio band on that part's mass, kg. */
  readonly bandHalfWidth: number;
  /** Scale readability d, kg. */
  readonly readability: number;
  readonly minimumDivisions?: number;
}

/** The ratio band on the smaller component spans fewer scale divisions than it should. */
export function checkToleranceResolution(input: ToleranceResolutionInput): BatchWarning | null {
  const minimum = input.minimumDivisions ?? DEFAULT_MINIMUM_TOLERANCE_DIVISIONS;
  const limit = minimum * input.readability;
  if (!(input.bandHalfWidth < limit * (1 - EPSILON))) return null;
  const divisions = input.bandHalfWidth / input.readability;
  return warning('TOLERANCE_BELOW_SCALE_RESOLUTION', { measured: input.bandHalfWidth, limit, unit: 'kg' }, { part: input.part, readability: input.readability, divisions: round4(divisions), minimum });
}

/** Pigment above the system's maximum percent (of `basis`: A+B unless the system doses otherwise). */
export function checkPigment(pigmentPercent: number, maxPigmentPercent: number | undefined, basis = 'A + B'): BatchWarning | null {
  if (maxPigmentPercent === undefined || !exceeds(pigmentPercent, maxPigmentPercent)) return null;
  return warning('PIGMENT_OVER_LIMIT', { measured: pigmentPercent, limit: maxPigmentPercent, unit: '%' }, { basis });
}

/** A mixed mass large enough for a dangerous exotherm in a single pour. */
export function checkExothermMass(mixedMass: number, limit = DEFAULT_EXOTHERM_MASS_LIMIT): BatchWarning | null {
  if (!exceeds(mixedMass, limit)) return null;
  return warning('EXOTHERM_RISK_MASS', { measured: mixedMass, limit, unit: 'kg' });
}

export interface LotExpiry {
  readonly part: 'A' | 'B' | 'pigment';
  readonly lotCode?: string;
  /** Last day the lot may be used, `YYYY-MM-DD`. */
  readonly expiresOn: string;
}

function daysBetween(from: string, to: string): number {
  const a = isoDateToDayNumber(from);
  const b = isoDateToDayNumber(to);
  if (a === null || b === null) throw new RangeError(`Dates must be YYYY-MM-DD; got ${from} and ${to}.`);
  return b - a;
}

/** One warning per lot used after its expiry date (the expiry day itself is still in date). */
export function checkLotExpiry(lots: readonly LotExpiry[], today: string): BatchWarning[] {
  return lots.flatMap((lot) => {
    const daysPast = daysBetween(lot.expiresOn, today);
    if (daysPast <= 0) return [];
    return [warning('LOT_EXPIRED', { measured: daysPast, limit: 0, unit: 'd' }, { part: lot.part, date: lot.expiresOn, ...(lot.lotCode ? { lot: lot.lotCode } : {}) })];
  });
}

/** The scale is past its calibration due date (due on the date itself is not yet overdue). */
export function checkScaleCalibration(calibrationDueOn: string, today: string): BatchWarning | null {
  const daysOver = daysBetween(calibrationDueOn, today);
  if (daysOver <= 0) return null;
  return warning('CALIBRATION_OVERDUE', { measured: daysOver, limit: 0, unit: 'd' }, { date: calibrationDueOn });
}

/** The pour (all parts weighed into one container, tare not included) exceeds the scale's capacity. */
export function checkScaleCapacity(mass: number, capacity: number): BatchWarning | null {
  if (!exceeds(mass, capacity)) return null;
  return warning('OVER_CAPACITY', { measured: mass, limit: capacity, unit: 'kg' });
}

/** The component temperature (°C) is outside the system's window. */
export function checkComponentTemperature(temperature: number, window: { readonly min: number; readonly max: number }): BatchWarning | null {
  const below = temperature < window.min - EPSILON;
  const above = temperature > window.max + EPSILON;
  if (!below && !above) return null;
  return warning(below ? 'TEMPERATURE_BELOW_WINDOW' : 'TEMPERATURE_ABOVE_WINDOW', { measured: temperature, limit: below ? window.min : window.max, unit: 'degC' }, { otherEdge: below ? window.max : window.min });
}
