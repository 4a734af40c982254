/**
 * Densities: the molded (packed) density a pour aims at, and the free-rise density the system is
 * expected to give at the components' temperature.
 */
import { linearRegression, rSquared } from 'simple-statistics';

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
  readonly fit: FreeRiseFit | null;
}

/**
 * Expected free-rise density at a component temperature: from a fit of the system's QC cup tests
 * when there are at least three at more than one temperature, else from the system's slope, else
 * the reference density itself.
 */
export function expectedFreeRiseDensity(
  reference: FreeRiseReference,
  temperature: number,
  cupTests: readonly CupTestPoint[] = [],
): ExpectedFreeRiseDensity {
  const fit = fitFreeRiseDensity(cupTests);
  if (fit) {
    return { density: fit.intercept + fit.slope * temperature, temperature, method: 'cup_test_fit', fit };
  }
  const method: ExpectedDensityMethod =
    reference.slope !== undefined && temperature !== reference.temperature ? 'system_slope' : 'reference_only';
  return { density: freeRiseDensityFromSlope(reference, temperature), temperature, method, fit: null };
}
