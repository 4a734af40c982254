import { mean, sampleStandardDeviation } from 'simple-statistics';

/**
 * Below this many points a capability index is too uncertain to act on; the result carries a
 * warning (common practice: at least 25–30 points, or 100 for a confident figure).
 */
export const MIN_CAPABILITY_POINTS = 30;

export interface SpecificationLimits {
  lsl?: number | null;
  usl?: number | null;
}

export interface Capability {
  n: number;
  mean: number;
  /** Short-term σ (the chart's σ, e.g. MR̄ / d2): Cp and Cpk. */
  sigmaWithin: number;
  /** Overall sample standard deviation: Pp and Ppk. */
  sigmaOverall: number | null;
  cp: number | null;
  cpk: number | null;
  pp: number | null;
  ppk: number | null;
  warnings: string[];
}

/**
 * Cp = (USL − LSL) / 6σ, Cpk = min(USL − μ, μ − LSL) / 3σ with the within σ; Pp, Ppk the same with the
 * overall standard deviation (NIST/SEMATECH e-Handbook §6.1.6). Cp and Pp need both limits; with one
 * limit only the one-sided index is given.
 */
export function capability(values: readonly number[], spec: SpecificationLimits, sigmaWithin: number): Capability {
  const warnings: string[] = [];
  const n = values.length;
  if (n === 0) throw new RangeError('capability needs at least one point');
  const mu = mean(values as number[]);
  const sigmaOverall = n >= 2 ? sampleStandardDeviation(values as number[]) : null;
  const lsl = spec.lsl ?? null;
  const usl = spec.usl ?? null;
  if (lsl === null && usl === null) warnings.push('no specification limits: capability cannot be computed');
  if (n < MIN_CAPABILITY_POINTS) warnings.push(`only ${n} points: at least ${MIN_CAPABILITY_POINTS} are needed for a capability estimate to mean much`);
  const two = (s: number | null) => (s !== null && s > 0 && lsl !== null && usl !== null ? (usl - lsl) / (6 * s) : null);
  const one = (s: number | null) => {
    if (s === null || !(s > 0) || (lsl === null && usl === null)) return null;
    const sides = [usl !== null ? (usl - mu) / (3 * s) : Infinity, lsl !== null ? (mu - lsl) / (3 * s) : Infinity];
    return Math.min(...sides);
  };
  if (!(sigmaWithin > 0)) warnings.push('no variation within the baseline: the indices are undefined');
  return { n, mean: mu, sigmaWithin, sigmaOverall, cp: two(sigmaWithin), cpk: one(sigmaWithin), pp: two(sigmaOverall), ppk: one(sigmaOverall), warnings };
}
