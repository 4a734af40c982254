import { mean } from 'simple-statistics';
import { MOVING_RANGE_CONSTANTS, shewhartConstants } from './constants.js';

/** Limits of a chart: centre line, ±3σ control limits and the σ used for zones and run rules. */
export interface ChartLimits {
  centre: number;
  sigma: number;
  ucl: number;
  lcl: number;
}

export interface IndividualsLimits extends ChartLimits {
  /** Number of points the limits were computed from. */
  n: number;
  /** Mean of the moving ranges of two consecutive points. */
  mrBar: number;
  /** Upper limit of the moving-range chart (its lower limit is 0 for n = 2). */
  mrUcl: number;
}

export interface XbarRLimits extends ChartLimits {
  /** Number of subgroups and their size. */
  subgroups: number;
  subgroupSize: number;
  rBar: number;
  rUcl: number;
  rLcl: number;
}

/** |x[i] − x[i−1]| for i ≥ 1: one fewer than the points. */
export function movingRanges(values: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = 1; i < values.length; i++) out.push(Math.abs(values[i]! - values[i - 1]!));
  return out;
}

/**
 * Individuals and moving-range chart (subgroups of one): centre x̄, limits x̄ ± E2·MR̄, σ = MR̄ / d2,
 * moving-range limit D4·MR̄ (NIST/SEMATECH e-Handbook §6.3.2.2).
 */
export function individualsLimits(values: readonly number[]): IndividualsLimits {
  if (values.length < 2) throw new RangeError('an individuals chart needs at least 2 points (one moving range)');
  if (!values.every(Number.isFinite)) throw new RangeError('every point must be a finite number');
  const { d2, E2, D4 } = MOVING_RANGE_CONSTANTS;
  const centre = mean(values as number[]);
  const mrBar = mean(movingRanges(values));
  return { n: values.length, centre, mrBar, sigma: mrBar / d2, ucl: centre + E2 * mrBar, lcl: centre - E2 * mrBar, mrUcl: D4 * mrBar };
}

/**
 * X̄–R chart for equal subgroups of 2 … 10: centre x̿, limits x̿ ± A2·R̄, range limits D3·R̄ … D4·R̄,
 * σ of a subgroup mean = R̄ / (d2 √n) (NIST/SEMATECH e-Handbook §6.3.2).
 */
export function xbarRLimits(subgroups: readonly (readonly number[])[]): XbarRLimits {
  if (subgroups.length < 2) throw new RangeError('an X̄–R chart needs at least 2 subgroups');
  const size = subgroups[0]!.length;
  if (!subgroups.every((g) => g.length === size)) throw new RangeError('every subgroup must have the same size');
  const k = shewhartConstants(size);
  const means = subgroups.map((g) => mean(g as number[]));
  const ranges = subgroups.map((g) => Math.max(...g) - Math.min(...g));
  const centre = mean(means);
  const rBar = mean(ranges);
  return {
    subgroups: subgroups.length,
    subgroupSize: size,
    centre,
    rBar,
    sigma: rBar / (k.d2 * Math.sqrt(size)),
    ucl: centre + k.A2 * rBar,
    lcl: centre - k.A2 * rBar,
    rUcl: k.D4 * rBar,
    rLcl: k.D3 * rBar,
  };
}

/** Where a value sits, in σ from the centre line (zones C, B, A are |z| < 1, 1–2, 2–3). */
export function zScore(value: number, limits: Pick<ChartLimits, 'centre' | 'sigma'>): number {
  return limits.sigma > 0 ? (value - limits.centre) / limits.sigma : value === limits.centre ? 0 : Math.sign(value - limits.centre) * Infinity;
}

/** A subgroup as PostgreSQL reports it: its size, mean and range. */
export interface SubgroupFigures {
  n: number;
  mean: number;
  range: number;
}

/** Limits of one subgroup's mean and range on an X̄–R chart whose subgroups differ in size. */
export interface SubgroupLimits {
  /** σ of a mean of n values: σ / √n. */
  sigmaMean: number;
  ucl: number;
  lcl: number;
  rCentre: number;
  rUcl: number;
  rLcl: number;
}

/** Whether a subgroup can be charted: the constants are tabulated for 2 … 10 values. */
export function chartableSubgroup(n: number): boolean {
  return Number.isInteger(n) && n >= MIN_SUBGROUP_SIZE_FOR_RANGE && n <= 10;
}
const MIN_SUBGROUP_SIZE_FOR_RANGE = 2;

/**
 * Within-subgroup σ from subgroups of several sizes: the mean of Rᵢ / d2(nᵢ). With equal sizes it is
 * R̄ / d2, so the limits below are those of `xbarRLimits` (x̿ ± A2·R̄, D3·R̄ … D4·R̄).
 */
export function withinSigma(subgroups: readonly SubgroupFigures[]): number {
  const usable = subgroups.filter((g) => chartableSubgroup(g.n));
  if (usable.length < 2) throw new RangeError('an X̄–R chart needs at least 2 subgroups of 2 to 10 values');
  return mean(usable.map((g) => g.range / shewhartConstants(g.n).d2));
}

/** The grand mean x̿ of subgroups of several sizes, each mean weighed by its size. */
export function grandMean(subgroups: readonly SubgroupFigures[]): number {
  const usable = subgroups.filter((g) => chartableSubgroup(g.n));
  const total = usable.reduce((s, g) => s + g.n, 0);
  if (total === 0) throw new RangeError('no chartable subgroup');
  return usable.reduce((s, g) => s + g.n * g.mean, 0) / total;
}

/**
 * One subgroup's limits from x̿ and the within σ: x̿ ± 3σ/√n; the range chart's centre d2·σ and
 * limits D3·d2·σ … D4·d2·σ (NIST/SEMATECH e-Handbook §6.3.2 with σ = R̄ / d2).
 */
export function subgroupLimits(centre: number, sigma: number, n: number): SubgroupLimits {
  const k = shewhartConstants(n);
  const sigmaMean = sigma / Math.sqrt(n);
  const rCentre = k.d2 * sigma;
  return { sigmaMean, ucl: centre + 3 * sigmaMean, lcl: centre - 3 * sigmaMean, rCentre, rUcl: k.D4 * rCentre, rLcl: k.D3 * rCentre };
}
