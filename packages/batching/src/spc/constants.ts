/**
 * Shewhart control-chart constants for subgroups of n = 2 … 10, as tabulated in the NIST/SEMATECH
 * e-Handbook of Statistical Methods, §6.3.2 (X̄ and R charts): A2 multiplies R̄ for the limits of the
 * means, D3 and D4 give the range chart's limits, d2 turns R̄ into an estimate of σ.
 * For individuals (moving ranges of two points) the same handbook uses d2 = 1.128, E2 = 3 / d2 = 2.660
 * and D4 = 3.267 (§6.3.2.2).
 */
export interface ShewhartConstants {
  n: number;
  A2: number;
  D3: number;
  D4: number;
  d2: number;
}

const TABLE: readonly ShewhartConstants[] = [
  { n: 2, A2: 1.88, D3: 0, D4: 3.267, d2: 1.128 },
  { n: 3, A2: 1.023, D3: 0, D4: 2.574, d2: 1.693 },
  { n: 4, A2: 0.729, D3: 0, D4: 2.282, d2: 2.059 },
  { n: 5, A2: 0.577, D3: 0, D4: 2.114, d2: 2.326 },
  { n: 6, A2: 0.483, D3: 0, D4: 2.004, d2: 2.534 },
  { n: 7, A2: 0.419, D3: 0.076, D4: 1.924, d2: 2.704 },
  { n: 8, A2: 0.373, D3: 0.136, D4: 1.864, d2: 2.847 },
  { n: 9, A2: 0.337, D3: 0.184, D4: 1.816, d2: 2.97 },
  { n: 10, A2: 0.308, D3: 0.223, D4: 1.777, d2: 3.078 },
];

/** The moving range of two points: d2, E2 (= 3 / d2, rounded as the handbook prints it) and D4. */
export const MOVING_RANGE_CONSTANTS = { d2: 1.128, E2: 2.66, D4: 3.267 } as const;

export const MIN_SUBGROUP_SIZE = 2;
export const MAX_SUBGROUP_SIZE = 10;

/** The constants for subgroups of n; a RangeError outside 2 … 10 (the table stops there). */
export function shewhartConstants(n: number): ShewhartConstants {
  const row = TABLE.find((r) => r.n === n);
  if (!row) throw new RangeError(`control-chart constants are tabulated for subgroups of ${MIN_SUBGROUP_SIZE} to ${MAX_SUBGROUP_SIZE}, not ${n}`);
  return row;
}
