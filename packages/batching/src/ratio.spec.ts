import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import {
  OFF_RATIO_CONSEQUENCES,
  componentVolumes,
  judgeRatio,
  massFractions,
  ratioError,
  ratioQuotient,
  sideOf,
  volumeRatioFromWeightRatio,
  weightRatioFromVolumeRatio,
  withinRatioTolerance,
} from './ratio.js';

describe('weight and volume ratios', () => {
  it('weights each volume part by its specific gravity', () => {
    const weight = weightRatioFromVolumeRatio({ a: 100, b: 100 }, 1.23, 1.05);
    expect(weight.b).toBe(100);
    expect(weight.a).toBeCloseTo(117.142857, 6);
    expect(weightRatioFromVolumeRatio({ a: 100, b: 50 }, 1.1, 1.1)).toEqual({ a: 100, b: 50 });
  });

  it('inverts back to the volume ratio', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 300, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        (a, b, sgA, sgB) => {
          const back = volumeRatioFromWeightRatio(weightRatioFromVolumeRatio({ a, b }, sgA, sgB), sgA, sgB);
          expect(back.a).toBeCloseTo(a, 9);
          expect(back.b).toBe(b);
        },
      ),
    );
  });

  it('splits A+B into mass fractions', () => {
    expect(massFractions({ a: 100, b: 100 })).toEqual({ a: 0.5, b: 0.5 });
    const fractions = massFractions({ a: 100, b: 45 });
    expect(fractions.a).toBeCloseTo(100 / 145, 12);
    expect(fractions.a + fractions.b).toBeCloseTo(1, 15);
  });

  it('rejects zero, negative and non-finite ratio parts and SGs', () => {
    expect(() => ratioQuotient({ a: 0, b: 100 })).toThrow(RangeError);
    expect(() => weightRatioFromVolumeRatio({ a: 100, b: 100 }, -1, 1)).toThrow(RangeError);
    expect(() => volumeRatioFromWeightRatio({ a: 100, b: Number.NaN }, 1, 1)).toThrow(RangeError);
  });
});

describe('componentVolumes', () => {
  it('divides each mass by SG × 1000 kg/m³', () => {
    const volumes = componentVolumes({ a: 0.123, b: 0.105 }, 1.23, 1.05);
    expect(volumes.a).toBeCloseTo(1e-4, 15);
    expect(volumes.b).toBeCloseTo(1e-4, 15);
  });

  it('gives back the volume ratio that produced the weight ratio', () => {
    const weight = weightRatioFromVolumeRatio({ a: 100, b: 60 }, 1.2, 1.0);
    const fractions = massFractions(weight);
    const volumes = componentVolumes(fractions, 1.2, 1.0);
    expect(volumes.a / volumes.b).toBeCloseTo(100 / 60, 12);
  });

  it('takes another reference density when asked', () => {
    expect(componentVolumes({ a: 0.997, b: 0 }, 1, 1, 997).a).toBeCloseTo(0.001, 15);
  });
});

describe('ratioError', () => {
  it('is zero on target and signed by which part is heavy', () => {
    expect(ratioError(0.45, 1, { a: 45, b: 100 })).toBe(0);
    expect(ratioError(105, 100, { a: 100, b: 100 })).toBe(0.05);
    expect(ratioError(95, 100, { a: 100, b: 100 })).toBe(-0.05);
    expect(ratioError(100, 105, { a: 100, b: 100 })).toBeCloseTo(-0.047619, 6);
  });

  it('refuses a zero mass of B', () => {
    expect(() => ratioError(1, 0, { a: 1, b: 1 })).toThrow(RangeError);
    expect(() => ratioError(-1, 1, { a: 1, b: 1 })).toThrow(RangeError);
  });
});

describe('withinRatioTolerance', () => {
  it('passes exactly 5.0 % and fails 5.1 %, on both sides', () => {
    expect(withinRatioTolerance(0.05, 5)).toBe(true);
    expect(withinRatioTolerance(-0.05, 5)).toBe(true);
    expect(withinRatioTolerance(0.051, 5)).toBe(false);
    expect(withinRatioTolerance(-0.051, 5)).toBe(false);
  });

  it('is not fooled by binary junk in e', () => {
    expect(withinRatioTolerance(1.05 / 1 - 1, 5)).toBe(true);
    expect(withinRatioTolerance(0.95 / 1 - 1, 5)).toBe(true);
  });
});

describe('judgeRatio', () => {
  const target = { a: 100, b: 100 };

  it('at ±5 % passes 105:100 and 95:100 and fails 105.1:100 and 94.9:100', () => {
    const judge = (massA: number) => judgeRatio({ massA, massB: 1, target, tolerancePercent: 5, isocyanatePart: 'A' });
    expect(judge(1.05).withinTolerance).toBe(true);
    expect(judge(0.95).withinTolerance).toBe(true);
    expect(judge(1.051).withinTolerance).toBe(false);
    expect(judge(0.949).withinTolerance).toBe(false);
  });

  it('names the isocyanate side heavy, with its consequence, when A is the isocyanate and heavy', () => {
    const verdict = judgeRatio({ massA: 0.1102, massB: 0.1, target, tolerancePercent: 5, isocyanatePart: 'A' });
    expect(verdict.code).toBe('RATIO_ISOCYANATE_HEAVY');
    expect(verdict.heavyPart).toBe('A');
    expect(verdict.heavySide).toBe('isocyanate');
    expect(verdict.errorPercent).toBeCloseTo(10.2, 9);
    expect(verdict.consequence).toBe(OFF_RATIO_CONSEQUENCES.isocyanate);
    expect(verdict.consequence).toMatch(/harder/);
    expect(verdict.message).toContain('10.2 %');
    expect(verdict.message).toContain('outside ±5 %');
  });

  it('names the polyol side heavy when the isocyanate part B is light', () => {
    const verdict = judgeRatio({ massA: 0.11, massB: 0.1, target, tolerancePercent: 5, isocyanatePart: 'B' });
    expect(verdict.code).toBe('RATIO_POLYOL_HEAVY');
    expect(verdict.heavyPart).toBe('A');
    expect(verdict.heavySide).toBe('polyol');
    expect(verdict.consequence).toMatch(/softer and tackier/);
  });

  it('still names the heavy side inside tolerance, without calling it a failure', () => {
    const verdict = judgeRatio({ massA: 0.098, massB: 0.1, target, tolerancePercent: 5, isocyanatePart: 'A' });
    expect(verdict.code).toBe('RATIO_WITHIN_TOLERANCE');
    expect(verdict.withinTolerance).toBe(true);
    expect(verdict.heavySide).toBe('polyol');
    expect(verdict.message).toContain('within ±5 %');
  });

  it('says on target when e is zero', () => {
    const verdict = judgeRatio({ massA: 0.45, massB: 1, target: { a: 45, b: 100 }, tolerancePercent: 5, isocyanatePart: 'A' });
    expect(verdict.code).toBe('RATIO_ON_TARGET');
    expect(verdict.heavySide).toBeNull();
    expect(verdict.consequence).toBeNull();
  });
});

describe('sideOf', () => {
  it('maps parts to sides by which part is the isocyanate', () => {
    expect(sideOf('A', 'A')).toBe('isocyanate');
    expect(sideOf('B', 'A')).toBe('polyol');
    expect(sideOf('A', 'B')).toBe('polyol');
  });
});
