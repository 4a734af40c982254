import { describe, expect, it } from '@jest/globals';
import { capability, MIN_CAPABILITY_POINTS } from './capability.js';
import { MOVING_RANGE_CONSTANTS, shewhartConstants } from './constants.js';
import { individualsLimits, movingRanges, xbarRLimits } from './limits.js';

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
