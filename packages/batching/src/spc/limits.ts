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
