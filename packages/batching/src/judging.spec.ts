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

describe('judgeReading: masses against the targets', () => {
  const targets = { a: 1, b: 1, pigment: 0.04, total: 2.04 };
  const withTargets: JudgeInput = { ...base, targets, system: { ...system, maxPigmentPercent: 3 } };
  it('does not judge a single part against its target mass (the ratio and the mixed shot do that)', () => {
    expect(judgeReading({ ...withTargets, subject: 'part_b', valueSi: 0.5, otherPartMassKg: 0.5 }).status).toBe('accepted');
  });
  it('judges the mixed shot against the total, exactly 5 % under passing, and says what a short or heavy shot does', () => {
    expect(judgeReading({ ...withTargets, subject: 'mixed', valueSi: 2.04 * 0.95 }).status).toBe('accepted');
    expect(judgeReading({ ...withTargets, subject: 'mixed', valueSi: 2.04 * 0.949 }).reasons[0]!.limit).toBeCloseTo(1.938, 9);
    const low = judgeReading({ ...withTargets, subject: 'mixed', valueSi: 1.9 });
    expect(low.reasons[0]!.code).toBe('TOTAL_MASS_LOW');
    expect(low.reasons[0]!.message).toMatch(/short/);
    expect(judgeReading({ ...withTargets, subject: 'mixed', valueSi: 2.2 }).reasons[0]!.code).toBe('TOTAL_MASS_HIGH');
    expect(judgeReading({ ...withTargets, subject: 'mixed', valueSi: 2.05 }).status).toBe('accepted');
  });
  it('judges pigment against its target and the system limit as a share of A + B', () => {
    expect(judgeReading({ ...withTargets, subject: 'pigment', valueSi: 0.04, partMassesKg: { a: 1, b: 1 } }).status).toBe('accepted');
    // 0.07 kg on 2 kg of A + B is 3.5 %, over a 3 % limit, and 75 % over its 0.04 kg target
    const r = judgeReading({ ...withTargets, subject: 'pigment', valueSi: 0.07, partMassesKg: { a: 1, b: 1 } });
    expect(r.reasons.map((x) => x.code)).toEqual(['PIGMENT_MASS_HIGH', 'PIGMENT_OVER_LIMIT']);
    expect(r.reasons[1]!.measured).toBeCloseTo(3.5, 9);
  });
  it('uses the system mass tolerance when it has one', () => {
    const tight = { ...withTargets, system: { ...system, massTolerancePercent: 1 } };
    expect(judgeReading({ ...tight, subject: 'mixed', valueSi: 2.04 * 0.985 }).reasons[0]!.code).toBe('TOTAL_MASS_LOW');
  });
});

describe('judgeReading: mold, shop air, humidity and timing', () => {
  // TDS-style windows: mold 40–50 °C, shop air 18–30 °C, at most 70 % RH (values from memory, typical of TDS sheets)
  const floor = { ...system, moldTemperatureWindow: { min: 40, max: 50 }, ambientTemperatureWindow: { min: 18, max: 30 }, maxRelativeHumidity: 70, potLife: 60, demoldTime: 300 };
  const t: JudgeInput = { ...base, system: floor, quantity: 'temperature' };
  it('judges the mold and the shop air against their own windows, edges included', () => {
    expect(judgeReading({ ...t, subject: 'mold', valueSi: 40 }).status).toBe('accepted');
    expect(judgeReading({ ...t, subject: 'mold', valueSi: 39.9 }).reasons[0]!.code).toBe('MOLD_TEMPERATURE_BELOW_WINDOW');
    expect(judgeReading({ ...t, subject: 'mold', valueSi: 50.1 }).reasons[0]!.code).toBe('MOLD_TEMPERATURE_ABOVE_WINDOW');
    expect(judgeReading({ ...t, subject: 'ambient', valueSi: 30 }).status).toBe('accepted');
    expect(judgeReading({ ...t, subject: 'ambient', valueSi: 17.5 }).reasons[0]!.code).toBe('AMBIENT_TEMPERATURE_BELOW_WINDOW');
    // the component window does not apply to the mold
    expect(judgeReading({ ...t, subject: 'mold', valueSi: 45 }).status).toBe('accepted');
  });
  it('rejects humidity over the limit and passes it at the limit', () => {
    const h: JudgeInput = { ...base, system: floor, quantity: 'humidity', subject: 'ambient' };
    expect(judgeReading({ ...h, valueSi: 70 }).status).toBe('accepted');
    expect(judgeReading({ ...h, valueSi: 70.5 }).reasons[0]!.code).toBe('HUMIDITY_ABOVE_LIMIT');
  });
  it('rejects a pour after the pot life and a demold before the demold time', () => {
    const m: JudgeInput = { ...base, system: floor, quantity: 'milestone', subject: 'pour', valueSi: 0 };
    expect(judgeReading({ ...m, elapsedS: 60 }).status).toBe('accepted');
    expect(judgeReading({ ...m, elapsedS: 61 }).reasons[0]!.code).toBe('POT_LIFE_EXCEEDED');
    expect(judgeReading({ ...m, elapsedS: null }).status).toBe('accepted');
    expect(judgeReading({ ...m, subject: 'demold', elapsedS: 299 }).reasons[0]!.code).toBe('DEMOLDED_EARLY');
    expect(judgeReading({ ...m, subject: 'demold', elapsedS: 300 }).status).toBe('accepted');
  });
});
