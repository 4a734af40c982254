import { describe, expect, it } from '@jest/globals';
import { capability, MIN_CAPABILITY_POINTS } from './capability.js';
import { MOVING_RANGE_CONSTANTS, shewhartConstants } from './constants.js';
import { chartableSubgroup, grandMean, individualsLimits, movingRanges, subgroupLimits, withinSigma, xbarRLimits } from './limits.js';

describe('limits and capability', () => {
  it('E2 is 3 / d2 as the handbook rounds it, and the table refuses subgroups it does not hold', () => {
    expect(3 / MOVING_RANGE_CONSTANTS.d2).toBeCloseTo(MOVING_RANGE_CONSTANTS.E2, 2);
    expect(() => shewhartConstants(1)).toThrow(RangeError);
    expect(() => shewhartConstants(11)).toThrow(RangeError);
  });

  it('moving ranges are one fewer than the points; a single point has no limits', () => {
    expect(movingRanges([1, 3, 2])).toEqual([2, 1]);
    expect(() => individualsLimits([5])).toThrow(RangeError);
  });

  it('X̄–R refuses unequal subgroups', () => {
    expect(() => xbarRLimits([[1, 2], [1, 2, 3]])).toThrow(RangeError);
  });

  it('capability: a centred process with σ = 1 between limits ±3 has Cp = Cpk = 1; an off-centre one a lower Cpk', () => {
    const xs = Array.from({ length: 40 }, (_, i) => (i % 2 ? 1 : -1));
    const c = capability(xs, { lsl: -3, usl: 3 }, 1);
    expect(c.cp).toBeCloseTo(1, 12);
    expect(c.cpk).toBeCloseTo(1, 12);
    expect(c.warnings).toEqual([]);
    const shifted = capability(xs.map((x) => x + 1), { lsl: -3, usl: 3 }, 1);
    expect(shifted.cpk).toBeCloseTo(2 / 3, 12);
    expect(shifted.pp).not.toBeNull();
  });

  it('capability warns below the minimum number of points and without limits', () => {
    const few = capability([1, 2, 3], { lsl: 0, usl: 4 }, 1);
    expect(few.warnings.join(' ')).toContain(`${MIN_CAPABILITY_POINTS}`);
    const none = capability([1, 2, 3], {}, 1);
    expect(none.cp).toBeNull();
    expect(none.cpk).toBeNull();
    const upperOnly = capability([1, 2, 3], { usl: 5 }, 1);
    expect(upperOnly.cp).toBeNull();
    expect(upperOnly.cpk).toBeCloseTo(1, 12);
  });
});

describe('X̄–R with subgroups of several sizes', () => {
  it('with equal sizes, the per-subgroup limits are x̿ ± A2·R̄ and D3·R̄ … D4·R̄ of the equal-size chart', () => {
    const groups = [[9, 10, 11, 10, 10], [10, 12, 9, 10, 11], [11, 10, 10, 8, 10], [10, 10, 11, 12, 9]];
    const eq = xbarRLimits(groups);
    const figs = groups.map((g) => ({ n: g.length, mean: g.reduce((a, b) => a + b) / g.length, range: Math.max(...g) - Math.min(...g) }));
    const sigma = withinSigma(figs);
    const l = subgroupLimits(grandMean(figs), sigma, 5);
    expect(grandMean(figs)).toBeCloseTo(eq.centre, 12);
    // A2 is printed to three decimals, so the limits agree to the table's rounding
    expect(l.ucl).toBeCloseTo(eq.ucl, 2);
    expect(l.lcl).toBeCloseTo(eq.lcl, 2);
    expect(l.rUcl).toBeCloseTo(eq.rUcl, 10);
    expect(l.rCentre).toBeCloseTo(eq.rBar, 10);
  });

  it('weighs each mean by its size and skips subgroups the table does not cover', () => {
    const figs = [{ n: 2, mean: 10, range: 1 }, { n: 4, mean: 13, range: 2 }, { n: 1, mean: 100, range: 0 }];
    expect(grandMean(figs)).toBeCloseTo((2 * 10 + 4 * 13) / 6, 12);
    expect(withinSigma(figs)).toBeCloseTo((1 / 1.128 + 2 / 2.059) / 2, 12);
    expect(() => withinSigma([{ n: 2, mean: 1, range: 1 }])).toThrow(RangeError);
    expect(chartableSubgroup(11)).toBe(false);
  });
});
