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
    expect(r.reasons[0]!.message).toMatch(/Part A \(the polyol side\) is heavy by 5\.1 %.*softer and tackier/);
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
  it('judges each part against its own band even when the ratio holds: both parts 30 % short is a short shot', () => {
    const b = judgeReading({ ...withTargets, subject: 'part_b', valueSi: 0.7, otherPartMassKg: 0.7 });
    expect(b.status).toBe('rejected');
    expect(b.reasons.map((x) => x.code)).toEqual(['SHORT_SHOT']);
    expect(b.reasons[0]!.message).toMatch(/^Short shot: part B is 700 g, 30 % under its target of 1 kg/);
    // 6 % under: not far enough to be a short shot, but outside ±5 %
    expect(judgeReading({ ...withTargets, subject: 'part_a', valueSi: 0.94, otherPartMassKg: 0.94 }).reasons.map((x) => x.code)).toEqual(['PART_A_MASS_LOW']);
    expect(judgeReading({ ...withTargets, subject: 'part_a', valueSi: 1.05, otherPartMassKg: 1 }).status).toBe('accepted');
    expect(judgeReading({ ...withTargets, subject: 'part_a', valueSi: 1.06, otherPartMassKg: 1 }).reasons.map((x) => x.code)).toEqual(['RATIO_POLYOL_HEAVY', 'PART_A_MASS_HIGH']);
  });
  it('judges the ratio only with both parts above zero; a zero part is its own reason', () => {
    expect(judgeReading({ ...base, subject: 'part_b', valueSi: 1, otherPartMassKg: 0 }).status).toBe('accepted');
    const zero = judgeReading({ ...base, subject: 'part_b', valueSi: 0, otherPartMassKg: 1 });
    expect(zero.reasons.map((x) => x.code)).toEqual(['PART_NOT_WEIGHED']);
    expect(zero.reasons[0]!.message).toMatch(/Part B weighed 0/);
    const mixed = judgeReading({ ...withTargets, subject: 'mixed', valueSi: 2.04, partMassesKg: { a: 1, b: null } });
    expect(mixed.reasons.map((x) => x.code)).toEqual(['PART_NOT_WEIGHED']);
  });
  it('says the heavy side in words, for the kind of foam', () => {
    // e = (1 / 1.06) − 1 = −5.66 %: B heavy by 5.66 % (wording of the effects: common practice)
    const r = judgeReading({ ...base, system: { ...system, kind: 'flexible' }, subject: 'part_b', valueSi: 1.06, otherPartMassKg: 1 });
    expect(r.reasons[0]!.message).toBe('Part B (the isocyanate side) is heavy by 5.66 %, outside ±5 %: the foam will be firmer and harsher to the touch, weaker in tear and elongation.');
    const skin = judgeReading({ ...base, system: { ...system, kind: 'integral-skin' }, subject: 'part_b', valueSi: 0.9, otherPartMassKg: 1 });
    expect(skin.reasons[0]!.message).toMatch(/Part A \(the polyol side\) is heavy by 11\.1 %.*skin will be softer/);
  });
  it('holds the ratio to ± parts by weight when the system states it so (100 : 100 ± 3 pbw)', () => {
    const pbw = { ...base, system: { ...system, ratioTolerancePbw: 3 } };
    expect(judgeReading({ ...pbw, subject: 'part_b', valueSi: 1.03, otherPartMassKg: 1 }).status).toBe('accepted');
    const r = judgeReading({ ...pbw, subject: 'part_b', valueSi: 1.031, otherPartMassKg: 1 });
    expect(r.reasons[0]).toMatchObject({ code: 'RATIO_ISOCYANATE_HEAVY', unit: 'pbw', limit: 3 });
    expect(r.reasons[0]!.measured).toBeCloseTo(3.1, 9);
  });
  it('judges the ratio against the targets when the pigment is pre-blended in B (B heavier by design)', () => {
    // 100:100 with 4 % of A+B pre-blended in B: targets 1 : 1.08, so B at 1.08 is on ratio
    const blended = { ...base, targets: { a: 1, b: 1.08, pigment: 0, total: 2.08 } };
    expect(judgeReading({ ...blended, subject: 'part_b', valueSi: 1.08, otherPartMassKg: 1 }).status).toBe('accepted');
    expect(judgeReading({ ...base, subject: 'part_b', valueSi: 1.08, otherPartMassKg: 1 }).reasons[0]!.code).toBe('RATIO_ISOCYANATE_HEAVY');
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
