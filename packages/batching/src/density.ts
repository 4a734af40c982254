/**
 * Densities: the molded (packed) density a pour aims at, and the free-rise density the system is
 * expected to give at the components' temperature.
 */
import { linearRegression, rSquared } from 'simple-statistics';
import { MAX_SLOPE_SHARE_PER_C } from './bounds.js';

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a finite number greater than 0; got ${value}.`);
}

/** Molded (packed) density, kg/m³: free-rise density × pack factor. */
export function packedDensity(freeRiseDensity: number, packFactor: number): number {
  requirePositive('freeRiseDensity', freeRiseDensity);
  requirePositive('packFactor', packFactor);
  return freeRiseDensity * packFactor;
}

/** The pack factor a molded density implies: molded density ÷ free-rise density. */
export function impliedPackFactor(moldedDensity: number, freeRiseDensity: number): number {
  requirePositive('moldedDensity', moldedDensity);
  requirePositive('freeRiseDensity', freeRiseDensity);
  return moldedDensity / freeRiseDensity;
}

export interface TargetDensity {
  /** Molded density aimed at, kg/m³. */
  readonly density: number;
  readonly packFactor: number;
  /** Which of the two was given. */
  readonly givenAs: 'density' | 'pack_factor';
}

/** Target molded density from exactly one of a density or a pack factor, with the other implied. */
export function targetDensity(
  freeRiseDensity: number,
  given: { readonly density: number } | { readonly packFactor: number },
): TargetDensity {
  if ('density' in given) {
    return { density: given.density, packFactor: impliedPackFactor(given.density, freeRiseDensity), givenAs: 'density' };
  }
  return { density: packedDensity(freeRiseDensity, given.packFactor), packFactor: given.packFactor, givenAs: 'pack_factor' };
}

/** How a system's free-rise density moves with component temperature. */
export interface FreeRiseReference {
  /** Free-rise density at the reference temperature, kg/m³. */
  readonly density: number;
  /** Component temperature the reference density was measured at, °C. */
  readonly temperature: number;
  /**
   * Change of free-rise density per °C of component temperature, kg/m³ per °C; usually negative
   * (warmer components blow more and rise lighter).
   */
  readonly slope?: number;
}

/** Free-rise density at a component temperature from the reference and its slope (0 if none given). */
export function freeRiseDensityFromSlope(reference: FreeRiseReference, temperature: number): number {
  requirePositive('reference.density', reference.density);
  if (!Number.isFinite(reference.temperature)) throw new RangeError('reference.temperature must be finite.');
  if (!Number.isFinite(temperature)) throw new RangeError('temperature must be finite.');
  const slope = reference.slope ?? 0;
  if (!Number.isFinite(slope)) throw new RangeError('reference.slope must be finite.');
  return reference.density + slope * (temperature - reference.temperature);
}

/** One QC cup test: component temperature (°C) and the free-rise density it gave (kg/m³). */
export interface CupTestPoint {
  readonly temperature: number;
  readonly density: number;
}

export interface FreeRiseFit {
  /** kg/m³ per °C. */
  readonly slope: number;
  /** Free-rise density the line gives at 0 °C, kg/m³. */
  readonly intercept: number;
  /** Share of the density variance the line explains; null when every cup gave the same density. */
  readonly rSquared: number | null;
  /** Residual standard deviation √(Σ residual² / (n − 2)), kg/m³: the spread of cups about the line. */
  readonly residualStandardDeviation: number;
  readonly count: number;
}

/** Fewer cups than this give no fit (two points always lie on a line and leave no spread). */
export const MINIMUM_FIT_POINTS = 3;

/**
 * Least-squares line of free-rise density against component temperature over QC cup tests, or null
 * when there are fewer than MINIMUM_FIT_POINTS cups or all were at one temperature.
 */
export function fitFreeRiseDensity(points: readonly CupTestPoint[]): FreeRiseFit | null {
  const usable = points.filter((p) => Number.isFinite(p.temperature) && Number.isFinite(p.density) && p.density > 0);
  if (usable.length < MINIMUM_FIT_POINTS) return null;
  const first = usable[0]!.temperature;
  if (usable.every((p) => p.temperature === first)) return null;
  const data = usable.map((p): [number, number] => [p.temperature, p.density]);
  const { m, b } = linearRegression(data);
  const line = (x: number): number => m * x + b;
  const residualSquares = data.reduce((sum, [x, y]) => sum + (y - line(x)) ** 2, 0);
  const allSameDensity = data.every(([, y]) => y === data[0]![1]);
  return {
    slope: m,
    intercept: b,
    rSquared: allSameDensity ? null : rSquared(data, line),
    residualStandardDeviation: Math.sqrt(residualSquares / (data.length - 2)),
    count: data.length,
  };
}

export type ExpectedDensityMethod = 'cup_test_fit' | 'system_slope' | 'reference_only';

/**
 * When a line through the system's cup tests is trusted over the system's own slope (common
 * practice for a calibration line: enough points, spread over a real range, a good fit, and no
 * extrapolation beyond the tested span plus a small margin; the thresholds are conservative
 * defaults, not from a standard).
 */
export const FIT_TRUST = {
  minimumPoints: 5,
  /** °C between the coldest and the warmest cup. */
  minimumSpanC: 4,
  minimumRSquared: 0.8,
  /** °C beyond the tested span the line may still be used. */
  extrapolationMarginC: 2,
  /** Steepest believable slope, as a share of the density per °C (bounds.ts). */
  maxSlopeShare: MAX_SLOPE_SHARE_PER_C,
} as const;

export type FitRejection = 'too_few_points' | 'narrow_span' | 'poor_fit' | 'unexpected_sign' | 'outside_tested_span';

export interface ExpectedFreeRiseDensity {
  /** kg/m³. */
  readonly density: number;
  /** °C the estimate is for. */
  readonly temperature: number;
  /**
   * `cup_test_fit` from the QC cups; `system_slope` from the system's slope; `reference_only` when
   * neither exists (or the temperature is the reference), so the reference density is taken as is.
   */
  readonly method: ExpectedDensityMethod;
  /** Why the cup tests' line was not used (null when it was, or when there were no cups). */
  readonly fitRejected: FitRejection | null;
  /** One sentence: which estimate was used and why. */
  readonly methodReason: string;
  readonly fit: FreeRiseFit | null;
}

/** Whether a fit may stand for the system at `temperature`; the reason when not. */
export function fitRejection(fit: FreeRiseFit | null, points: readonly CupTestPoint[], temperature: number): FitRejection | null {
  if (!fit || fit.count < FIT_TRUST.minimumPoints) return 'too_few_points';
  const temperatures = points.map((p) => p.temperature).filter(Number.isFinite);
  const low = Math.min(...temperatures);
  const high = Math.max(...temperatures);
  if (high - low < FIT_TRUST.minimumSpanC) return 'narrow_span';
  if (fit.rSquared === null || fit.rSquared < FIT_TRUST.minimumRSquared) return 'poor_fit';
  const density = fit.intercept + fit.slope * temperature;
  // warmer components rise lighter: a rising or implausibly steep line is noise, not the system
  if (!(fit.slope < 0) || !(density > 0) || -fit.slope > FIT_TRUST.maxSlopeShare * density) return 'unexpected_sign';
  if (temperature < low - FIT_TRUST.extrapolationMarginC || temperature > high + FIT_TRUST.extrapolationMarginC) return 'outside_tested_span';
  return null;
}

const REJECTION_WORDS: Readonly<Record<FitRejection, string>> = {
  too_few_points: `fewer than ${FIT_TRUST.minimumPoints} cup tests`,
  narrow_span: `the cup tests span less than ${FIT_TRUST.minimumSpanC} °C`,
  poor_fit: `the cup tests fit a line poorly (R² under ${FIT_TRUST.minimumRSquared})`,
  unexpected_sign: 'the cup tests give a line that does not fall with temperature as free-rise density does',
  outside_tested_span: `the temperature is more than ${FIT_TRUST.extrapolationMarginC} °C outside the span of the cup tests`,
};

/**
 * Expected free-rise density at a component temperature: from a fit of the system's QC cup tests
 * when the fit can be trusted (FIT_TRUST), else from the system's slope, else the reference density
 * itself; `methodReason` says which and why.
 */
export function expectedFreeRiseDensity(
  reference: FreeRiseReference,
  temperature: number,
  cupTests: readonly CupTestPoint[] = [],
): ExpectedFreeRiseDensity {
  const fit = fitFreeRiseDensity(cupTests);
  const rejected = cupTests.length > 0 ? fitRejection(fit, cupTests, temperature) : null;
  if (fit && cupTests.length > 0 && rejected === null) {
    return { density: fit.intercept + fit.slope * temperature, temperature, method: 'cup_test_fit', fitRejected: null, methodReason: `From a line through ${fit.count} cup tests (R² ${Number((fit.rSquared ?? 0).toFixed(3))}).`, fit };
  }
  const method: ExpectedDensityMethod =
    reference.slope !== undefined && temperature !== reference.temperature ? 'system_slope' : 'reference_only';
  const own = method === 'system_slope' ? "From the system's own slope" : "The system's reference density";
  return {
    density: freeRiseDensityFromSlope(reference, temperature),
    temperature,
    method,
    fitRejected: rejected,
    methodReason: rejected ? `${own}: the cup tests were not used because ${REJECTION_WORDS[rejected]}.` : `${own}${cupTests.length === 0 ? ' (no cup tests on record)' : ''}.`,
    fit,
  };
}
