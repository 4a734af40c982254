/**
 * Mix ratio checks. Sources beside each check.
 */
import { describe, expect, it } from '@jest/globals';
import { judgeRatio, weightRatioFromVolumeRatio, withinRatioTolerance } from '@pourgate/batching';

describe('weight ratio from volume ratio (definition of specific gravity: density relative to water)', () => {
  it('1:1 by volume at SG 1.23 and 1.05 is 117.143 : 100 by weight', () => {
    const weight = weightRatioFromVolumeRatio({ a: 1, b: 1 }, 1.23, 1.05);
    expect((100 * weight.a) / weight.b).toBeCloseTo(117.143, 3);
  });

  it('equal SGs leave the ratio unchanged (same definition)', () => {
    const weight = weightRatioFromVolumeRatio({ a: 100, b: 45 }, 1.1, 1.1);
    expect(weight.a / weight.b).toBeCloseTo(100 / 45, 12);
  });
});

describe('ratio tolerance (common practice: ±5 % on the A:B ratio)', () => {
  it('at ±5 %, exactly 5.0 % passes and 5.1 % fails, in both directions', () => {
    expect(withinRatioTolerance(0.05, 5)).toBe(true);
    expect(withinRatioTolerance(-0.05, 5)).toBe(true);
    expect(withinRatioTolerance(0.051, 5)).toBe(false);
    expect(withinRatioTolerance(-0.051, 5)).toBe(false);
  });

  it('excess isocyanate side tends to harden, excess polyol side to soften and tack (common practice)', () => {
    const target = { a: 100, b: 100 };
    const isoHeavy = judgeRatio({ massA: 1.1, massB: 1, target, tolerancePercent: 5, isocyanatePart: 'A' });
    const polyolHeavy = judgeRatio({ massA: 0.9, massB: 1, target, tolerancePercent: 5, isocyanatePart: 'A' });
    expect(isoHeavy.heavySide).toBe('isocyanate');
    expect(isoHeavy.consequence).toMatch(/harder/);
    expect(polyolHeavy.heavySide).toBe('polyol');
    expect(polyolHeavy.consequence).toMatch(/softer and tackier/);
  });
});
