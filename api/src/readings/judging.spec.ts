import { describe, expect, it } from '@jest/globals';
import { judgeReading, type JudgeInput, targetWeightRatio } from './judging.js';

// 100:100 by weight, B the isocyanate side, ±5 % (common practice), window 18–27 °C (near 22 °C, common practice)
const system = { ratioBasis: 'weight' as const, ratio: { a: 100, b: 100 }, specificGravityA: 1, specificGravityB: 1, isocyanatePart: 'B' as const, ratioTolerancePercent: 5, componentTemperatureWindow: { min: 18, max: 27 } };
const base: JudgeInput = { quantity: 'mass', subject: 'part_a', valueSi: 1, stable: true, device: { capacityKg: 10, calibrationDue: null }, day: '2026-06-01', system, otherPartMassKg: null };

describe('judgeReading', () => {
  it('accepts a lone A mass (nothing to compare yet)', () => {
    expect(judgeReading(base).status).toBe('accepted');
  });
  it('passes exactly 5.0 % and rejects 5.1 % with the heavy side named', () => {
    expect(judgeReading({ ...base, valueSi: 1.05, otherPartMassKg: 1 }).status).toBe('accepted');
    const r = judgeReading({ ...base, valueSi: 1.051, otherPartMassKg: 1 });
    expect(r.status).toBe('rejected');
    expect(r.reasons[0]!.code).toBe('RATIO_POLYOL_HEAVY');
    expect(r.reasons[0]!.message).toMatch(/softer and tackier/);
    expect(r.reasons[0]!.measured).toBeCloseTo(5.1, 9);
  });
  it('names the isocyanate side as heavy when B is over (harder)', () => {
    const r = judgeReading({ ...base, subject: 'part_b', valueSi: 1.06, otherPartMassKg: 1 });
    expect(r.reasons[0]!.code).toBe('RATIO_ISOCYANATE_HEAVY');
    expect(r.reasons[0]!.message).toMatch(/harder/);
  });
  it('sets aside unstable readings and rejects over-capacity and overdue calibration', () => {
    expect(judgeReading({ ...base, stable: false }).status).toBe('unused');
    expect(judgeReading({ ...base, valueSi: 10.001 }).reasons.map((x) => x.code)).toEqual(['OVER_CAPACITY']);
    expect(judgeReading({ ...base, device: { capacityKg: 10, calibrationDue: '2026-05-31' } }).reasons.map((x) => x.code)).toEqual(['CALIBRATION_OVERDUE']);
  });
  it('judges component temperatures against the window, edges included', () => {
    const t = { ...base, quantity: 'temperature' as const };
    expect(judgeReading({ ...t, valueSi: 27 }).status).toBe('accepted');
    expect(judgeReading({ ...t, valueSi: 27.1 }).reasons[0]!.code).toBe('TEMPERATURE_ABOVE_WINDOW');
    expect(judgeReading({ ...t, valueSi: 17.9 }).reasons[0]!.code).toBe('TEMPERATURE_BELOW_WINDOW');
  });
  it('turns a volume ratio into a weight ratio by the specific gravities', () => {
    // 100:100 by volume at SG 1.23 / 1.05 is 117.143:100 by weight (weight = volume × SG)
    expect(targetWeightRatio({ ...system, ratioBasis: 'volume', specificGravityA: 1.23, specificGravityB: 1.05 }).a).toBeCloseTo(117.142857, 5);
  });
});
