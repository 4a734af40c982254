import { describe, expect, it } from '@jest/globals';
import {
  WATER_EQUIVALENT_WEIGHT,
  hydroxylEquivalents,
  indexAfterRatioError,
  isocyanateIndex,
  isocyanatePartsForIndex,
  ncoEquivalentWeight,
  ohEquivalentWeight,
} from './isocyanate-index.js';

describe('equivalent weights', () => {
  it('follow 4202 / %NCO, 56100 / OH number and 9.0 for water', () => {
    expect(ncoEquivalentWeight(42.02)).toBeCloseTo(100, 12);
    expect(ncoEquivalentWeight(48.3)).toBeCloseTo(86.998, 3);
    expect(ohEquivalentWeight(56.1)).toBeCloseTo(1000, 12);
    expect(ohEquivalentWeight(56)).toBeCloseTo(1001.786, 3);
    expect(WATER_EQUIVALENT_WEIGHT).toBe(9);
    expect(18.015 / 2).toBeCloseTo(WATER_EQUIVALENT_WEIGHT, 1);
  });

  it('reject impossible values', () => {
    expect(() => ncoEquivalentWeight(0)).toThrow(RangeError);
    expect(() => ncoEquivalentWeight(101)).toThrow(RangeError);
    expect(() => ohEquivalentWeight(-5)).toThrow(RangeError);
  });
});

describe('isocyanateIndex', () => {
  it('is 100 when NCO and OH + water equivalents match', () => {
    // 100 g of OH 56.1 polyol = 0.1 eq; 0.9 g water = 0.1 eq; 20 g of 42.02 %NCO = 0.2 eq.
    expect(isocyanateIndex({ isocyanateMass: 20, ncoPercent: 42.02, polyolMass: 100, hydroxylNumber: 56.1, waterMass: 0.9 })).toBeCloseTo(
      100,
      10,
    );
  });

  it('counts water as reactive', () => {
    const dry = isocyanateIndex({ isocyanateMass: 20, ncoPercent: 42.02, polyolMass: 100, hydroxylNumber: 56.1 });
    expect(dry).toBeCloseTo(200, 10);
    expect(hydroxylEquivalents(100, 56.1, 0.9)).toBeCloseTo(0.2, 12);
  });

  it('refuses a polyol side with nothing to react', () => {
    expect(() => isocyanateIndex({ isocyanateMass: 1, ncoPercent: 30, polyolMass: 0, hydroxylNumber: 56 })).toThrow(RangeError);
  });
});

describe('isocyanatePartsForIndex', () => {
  it('inverts isocyanateIndex', () => {
    const parts = isocyanatePartsForIndex({ index: 110, ncoPercent: 31.5, hydroxylNumber: 35, waterParts: 2.5 });
    expect(isocyanateIndex({ isocyanateMass: parts, ncoPercent: 31.5, polyolMass: 100, hydroxylNumber: 35, waterMass: 2.5 })).toBeCloseTo(
      110,
      10,
    );
  });

  it('scales with the index', () => {
    const at100 = isocyanatePartsForIndex({ index: 100, ncoPercent: 31.5, hydroxylNumber: 35 });
    const at105 = isocyanatePartsForIndex({ index: 105, ncoPercent: 31.5, hydroxylNumber: 35 });
    expect(at105 / at100).toBeCloseTo(1.05, 12);
  });
});

describe('indexAfterRatioError', () => {
  it('multiplies by (1 + e) when A is the isocyanate', () => {
    expect(indexAfterRatioError(100, 0.05, 'A')).toBeCloseTo(105, 10);
    expect(indexAfterRatioError(100, -0.05, 'A')).toBeCloseTo(95, 10);
  });

  it('divides by (1 + e) when B is the isocyanate', () => {
    expect(indexAfterRatioError(105, 0.05, 'B')).toBeCloseTo(100, 10);
  });

  it('agrees with recomputing the index from the off-ratio masses', () => {
    const base = { ncoPercent: 31.5, hydroxylNumber: 35, waterMass: 2.5 };
    const target = isocyanateIndex({ ...base, isocyanateMass: 50, polyolMass: 100 });
    const heavy = isocyanateIndex({ ...base, isocyanateMass: 50 * 1.07, polyolMass: 100 });
    expect(indexAfterRatioError(target, 0.07, 'A')).toBeCloseTo(heavy, 10);
  });

  it('rejects an error of −100 % or less', () => {
    expect(() => indexAfterRatioError(100, -1, 'A')).toThrow(RangeError);
  });
});
