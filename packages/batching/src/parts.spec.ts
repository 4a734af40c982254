import { describe, expect, it } from '@jest/globals';
import { densityOf, forceToNewtons, isFoamDensity, judgeAgainstTarget, judgeBand, pareto, proposedBatchCount, specimenVolume, usableUntil, yieldOf } from './parts.js';

describe('parts', () => {
  it('molded density is mass over cavity volume; impossible inputs throw', () => {
    expect(densityOf(0.9, 0.018)).toBeCloseTo(50, 12);
    expect(() => densityOf(0, 0.018)).toThrow(RangeError);
    expect(() => densityOf(1, 0)).toThrow(RangeError);
    expect(() => specimenVolume(0.05, 0, 0.025)).toThrow(RangeError);
    expect(specimenVolume(0.05, 0.05, 0.025)).toBeCloseTo(6.25e-5, 15);
  });

  it('judges a density against ± percent of the target, edges inside', () => {
    expect(judgeAgainstTarget(55, 50, 10)).toMatchObject({ verdict: 'within', deviationPercent: 10 });
    expect(judgeAgainstTarget(44.9, 50, 10).verdict).toBe('below');
    expect(judgeAgainstTarget(55.1, 50, 10).verdict).toBe('above');
    expect(judgeBand(30, { min: 40, max: null })).toBe('below');
    expect(judgeBand(30, null)).toBeNull();
    expect(isFoamDensity(2)).toBe(false);
    expect(isFoamDensity(45)).toBe(true);
  });

  it('proposes ceil(parts ÷ cavities) batches', () => {
    expect(proposedBatchCount(120, 1)).toBe(120);
    expect(proposedBatchCount(61, 2)).toBe(31);
    expect(proposedBatchCount(0, 2)).toBe(0);
    expect(() => proposedBatchCount(3, 0)).toThrow(RangeError);
  });

  it('yield, Pareto and the usable-until day', () => {
    expect(yieldOf({ accepted: 8, rework: 1, scrap: 1 })).toBeCloseTo(0.8, 12);
    expect(yieldOf({ accepted: 0, rework: 0, scrap: 0 })).toBeNull();
    const bars = pareto([{ code: 'tack', count: 1 }, { code: 'voids', count: 6 }, { code: 'splits', count: 3 }, { code: 'none', count: 0 }]);
    expect(bars.map((b) => b.code)).toEqual(['voids', 'splits', 'tack']);
    expect(bars.map((b) => b.cumulativePercent)).toEqual([60, 90, 100]);
    expect(usableUntil('2027-01-31', '2026-12-01', 30)).toBe('2026-12-31');
    expect(usableUntil('2026-12-15', '2026-12-01', 30)).toBe('2026-12-15');
    expect(usableUntil('2027-01-31', null, 30)).toBe('2027-01-31');
    expect(forceToNewtons(10, 'N')).toBe(10);
  });
});
