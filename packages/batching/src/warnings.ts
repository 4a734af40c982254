/**
 * Warnings raised with batch targets. Each has a stable code (clients switch on it), a severity, a
 * sentence for a person, and — where a number was compared with a limit — both numbers in SI.
 *
 * Severity: `danger` where going ahead can hurt someone or is likely to scrap the batch or damage a
 * mold; `warning` where an engineer should look before pouring.
 */
import { isoDateToDayNumber } from './validation.js';

export type WarningSeverity = 'warning' | 'danger';

export type WarningCode =
  | 'PACK_FACTOR_BELOW_ONE'
  | 'PACK_FACTOR_ABOVE_LIMIT'
  | 'TOLERANCE_BELOW_SCALE_RESOLUTION'
  | 'PIGMENT_ABOVE_LIMIT'
  | 'EXOTHERM_RISK_MASS'
  | 'LOT_EXPIRED'
  | 'SCALE_CALIBRATION_OVERDUE'
  | 'SCALE_CAPACITY_EXCEEDED'
  | 'COMPONENT_TEMPERATURE_OUTSIDE_WINDOW';

export interface BatchWarning {
  readonly code: WarningCode;
  readonly severity: WarningSeverity;
  readonly message: string;
  readonly measured?: number;
  readonly limit?: number;
  /** Unit of `measured` and `limit`: SI (kg, degC, '1' for a pure number, '%' for percents, 'd' for days). */
  readonly unit?: string;
}

export const WARNING_SEVERITY: Readonly<Record<WarningCode, WarningSeverity>> = {
  PACK_FACTOR_BELOW_ONE: 'warning',
  // Over-packing past the system's limit raises mold pressure: molds open, flash or crack.
  PACK_FACTOR_ABOVE_LIMIT: 'danger',
  TOLERANCE_BELOW_SCALE_RESOLUTION: 'warning',
  PIGMENT_ABOVE_LIMIT: 'warning',
  EXOTHERM_RISK_MASS: 'danger',
  LOT_EXPIRED: 'danger',
  SCALE_CALIBRATION_OVERDUE: 'warning',
  SCALE_CAPACITY_EXCEEDED: 'danger',
  COMPONENT_TEMPERATURE_OUTSIDE_WINDOW: 'warning',
};

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

function warning(code: WarningCode, message: string, numbers: Pick<BatchWarning, 'measured' | 'limit' | 'unit'> = {}): BatchWarning {
  return { code, severity: WARNING_SEVERITY[code], message, ...numbers };
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
 * Pack factor below 1 (the foam cannot fill the cavity: short fill, voids) or above the system's
 * limit. `basis` says which free-rise density the pack factor is against, for the message.
 */
export function checkPackFactor(packFactor: number, limit: number | undefined, basis = 'the free-rise density'): BatchWarning[] {
  const found: BatchWarning[] = [];
  if (packFactor < 1 - EPSILON) {
    found.push(
      warning(
        'PACK_FACTOR_BELOW_ONE',
        `Pack factor ${round4(packFactor)} against ${basis} is below 1: the foam will not fill the cavity (short fill, voids).`,
        { measured: packFactor, limit: 1, unit: '1' },
      ),
    );
  }
  if (limit !== undefined && exceeds(packFactor, limit)) {
    found.push(
      warning(
        'PACK_FACTOR_ABOVE_LIMIT',
        `Pack factor ${round4(packFactor)} against ${basis} is above the system's limit of ${limit}: expect high mold pressure, flash or a mold that opens.`,
        { measured: packFactor, limit, unit: '1' },
      ),
    );
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
  return warning(
    'TOLERANCE_BELOW_SCALE_RESOLUTION',
    `The ratio tolerance on part ${input.part} is ±${describeMass(input.bandHalfWidth)}, only ${round4(divisions)} divisions of a ${describeMass(input.readability)} scale (at least ${minimum} needed): the scale cannot resolve the band. Mix a larger batch or use a finer scale.`,
    { measured: input.bandHalfWidth, limit, unit: 'kg' },
  );
}

/** Pigment above the system's maximum percent of A+B. */
export function checkPigment(pigmentPercent: number, maxPigmentPercent: number | undefined): BatchWarning | null {
  if (maxPigmentPercent === undefined || !exceeds(pigmentPercent, maxPigmentPercent)) return null;
  return warning(
    'PIGMENT_ABOVE_LIMIT',
    `Pigment at ${pigmentPercent} % of A+B is above the system's maximum of ${maxPigmentPercent} %: excess pigment can upset the cure and the cell structure.`,
    { measured: pigmentPercent, limit: maxPigmentPercent, unit: '%' },
  );
}

/** A mixed mass large enough for a dangerous exotherm in a single pour. */
export function checkExothermMass(mixedMass: number, limit = DEFAULT_EXOTHERM_MASS_LIMIT): BatchWarning | null {
  if (!exceeds(mixedMass, limit)) return null;
  return warning(
    'EXOTHERM_RISK_MASS',
    `A single pour of ${describeMass(mixedMass)} is above ${describeMass(limit)}: a large mass of mixed foam can overheat from its own exotherm (scorch, smoke, fire). Pour in layers or smaller shots and keep within the supplier's guidance (TDS/SDS).`,
    { measured: mixedMass, limit, unit: 'kg' },
  );
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
    const name = lot.lotCode ? `lot ${lot.lotCode}` : 'the lot';
    const what = lot.part === 'pigment' ? 'pigment' : `part ${lot.part}`;
    return [
      warning('LOT_EXPIRED', `The ${what} ${name} expired on ${lot.expiresOn}, ${daysPast} day${daysPast === 1 ? '' : 's'} ago.`, {
        measured: daysPast,
        limit: 0,
        unit: 'd',
      }),
    ];
  });
}

/** The scale is past its calibration due date (due on the date itself is not yet overdue). */
export function checkScaleCalibration(calibrationDueOn: string, today: string): BatchWarning | null {
  const daysOver = daysBetween(calibrationDueOn, today);
  if (daysOver <= 0) return null;
  return warning(
    'SCALE_CALIBRATION_OVERDUE',
    `The scale was due for calibration on ${calibrationDueOn}, ${daysOver} day${daysOver === 1 ? '' : 's'} ago: its readings cannot be trusted for the ratio.`,
    { measured: daysOver, limit: 0, unit: 'd' },
  );
}

/** The pour (all parts weighed into one container, tare not included) exceeds the scale's capacity. */
export function checkScaleCapacity(mass: number, capacity: number): BatchWarning | null {
  if (!exceeds(mass, capacity)) return null;
  return warning(
    'SCALE_CAPACITY_EXCEEDED',
    `The pour of ${describeMass(mass)} is above the scale's capacity of ${describeMass(capacity)} (before the container's tare): split the batch or use a larger scale.`,
    { measured: mass, limit: capacity, unit: 'kg' },
  );
}

/** The component temperature (°C) is outside the system's window. */
export function checkComponentTemperature(temperature: number, window: { readonly min: number; readonly max: number }): BatchWarning | null {
  const below = temperature < window.min - EPSILON;
  const above = temperature > window.max + EPSILON;
  if (!below && !above) return null;
  return warning(
    'COMPONENT_TEMPERATURE_OUTSIDE_WINDOW',
    `Components at ${round4(temperature)} °C are ${below ? 'below' : 'above'} the system's window of ${window.min}–${window.max} °C: rise, density and cure will differ from the data sheet.`,
    { measured: temperature, limit: below ? window.min : window.max, unit: 'degC' },
  );
}
