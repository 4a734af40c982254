/**
 * Control-chart limits recomputed from published worked examples and tables.
 */
import { describe, expect, it } from '@jest/globals';
import { grandMean, individualsLimits, MOVING_RANGE_CONSTANTS, movingRanges, shewhartConstants, subgroupLimits, withinSigma, xbarRLimits } from '@pourgate/batching';

describe('individuals and moving-range chart', () => {
  it('constants for moving ranges of two: d2 = 1.128, E2 = 2.660, D4 = 3.267 (NIST/SEMATECH e-Handbook of Statistical Methods §6.3.2.2)', () => {
    expect(MOVING_RANGE_CONSTANTS).toEqual({ d2: 1.128, E2: 2.66, D4: 3.267 });
  });

  it('flow-rate example of NIST/SEMATECH e-Handbook §6.3.2.2 "Individuals Control Charts": x̄ = 50.81, MR̄ = 1.8778, UCL 55.80, LCL 45.82, MR UCL 6.13', () => {
    // The ten batches of the handbook's example, from memory; they reproduce its printed x̄ and MR̄,
    // which is how they were checked.
    const flowRate = [49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1];
    expect(movingRanges(flowRate).map((r) => Math.round(r * 10) / 10)).toEqual([2.0, 2.3, 1.4, 3.5, 3.4, 1.4, 0.2, 1.2, 1.5]);
    const l = individualsLimits(flowRate);
    expect(l.centre).toBeCloseTo(50.81, 2);
    expect(l.mrBar).toBeCloseTo(1.8778, 4);
    // the handbook computes the limits as x̄ ± 3·MR̄/1.128
    expect(l.centre + (3 * l.mrBar) / 1.128).toBeCloseTo(55.8, 2);
    expect(l.centre - (3 * l.mrBar) / 1.128).toBeCloseTo(45.82, 2);
    expect(l.ucl).toBeCloseTo(55.8, 1);
    expect(l.lcl).toBeCloseTo(45.82, 1);
    expect(l.mrUcl).toBeCloseTo(6.13, 2);
    expect(l.sigma).toBeCloseTo(1.8778 / 1.128, 4);
  });
});

describe('X̄–R chart', () => {
  it('constants for n = 2 … 10 as tabulated in NIST/SEMATECH e-Handbook §6.3.2 (the usual Shewhart table; values from memory)', () => {
    expect(shewhartConstants(2)).toMatchObject({ A2: 1.88, D3: 0, D4: 3.267, d2: 1.128 });
    expect(shewhartConstants(5)).toMatchObject({ A2: 0.577, D3: 0, D4: 2.114, d2: 2.326 });
    expect(shewhartConstants(10)).toMatchObject({ A2: 0.308, D3: 0.223, D4: 1.777, d2: 3.078 });
    // A2 = 3 / (d2 √n), the identity the table is built on (NIST/SEMATECH §6.3.2)
    for (let n = 2; n <= 10; n++) {
      const k = shewhartConstants(n);
      expect(3 / (k.d2 * Math.sqrt(n))).toBeCloseTo(k.A2, 2);
    }
  });

  it('limits x̿ ± A2·R̄ and D3·R̄ … D4·R̄ on three subgroups of five (constructed: x̿ = 10, R̄ = 2)', () => {
    const l = xbarRLimits([
      [9, 10, 11, 10, 10],
      [10, 11, 9, 10, 10],
      [11, 10, 9, 10, 10],
    ]);
    expect(l.centre).toBeCloseTo(10, 12);
    expect(l.rBar).toBeCloseTo(2, 12);
    expect(l.ucl).toBeCloseTo(10 + 0.577 * 2, 12);
    expect(l.rUcl).toBeCloseTo(2.114 * 2, 12);
    expect(l.rLcl).toBe(0);
  });

  it('subgroups of unequal size: σ̂ = mean of Rᵢ/d2(nᵢ), limits x̿ ± 3σ̂/√nᵢ, range limits D3·d2σ̂ … D4·d2σ̂ (the usual treatment of varying n, as in ASTM MNL 7; from memory)', () => {
    // constructed: two subgroups of 2 with R = 1.128 and two of 5 with R = 2.326 give σ̂ = 1 exactly
    const groups = [{ n: 2, mean: 10, range: 1.128 }, { n: 2, mean: 10, range: 1.128 }, { n: 5, mean: 10, range: 2.326 }, { n: 5, mean: 10, range: 2.326 }];
    expect(withinSigma(groups)).toBeCloseTo(1, 12);
    expect(grandMean(groups)).toBeCloseTo(10, 12);
    const two = subgroupLimits(10, 1, 2);
    const five = subgroupLimits(10, 1, 5);
    expect(two.ucl).toBeCloseTo(10 + 3 / Math.SQRT2, 12);
    expect(five.ucl).toBeCloseTo(10 + 3 / Math.sqrt(5), 12);
    // with σ = R̄/d2 the limits are the table's: A2(5)·R̄ = 0.577 × 2.326 ≈ 3/√5, D4(2)·R̄ = 3.267 × 1.128
    expect(five.ucl - 10).toBeCloseTo(0.577 * 2.326, 2);
    expect(two.rUcl).toBeCloseTo(3.267 * 1.128, 12);
    expect(five.rLcl).toBe(0);
  });
});
