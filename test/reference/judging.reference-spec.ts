/**
 * The judging of a whole pour against values from outside the project: ASTM D7487 for the cup-test
 * terms, the equivalent-weight method (polyurethane handbooks: NCO equivalent weight 4202 ÷ %NCO,
 * OH equivalent weight 56 100 ÷ OH number) for the index, NIST SP 811 for units; trade practice is
 * marked "common practice" and remembered values "from memory".
 */
import { describe, expect, it } from '@jest/globals';
import {
  HYDROXYL_NUMBER_BOUNDS,
  NCO_PERCENT_BOUNDS,
  computeBatchTargets,
  describeFinding,
  judgeCupTest,
  judgeReading,
  pigmentPercentOfAB,
  systemIndex,
  type MaterialSystemParameters,
} from '@pourgate/batching';

const system: MaterialSystemParameters = {
  ratioBasis: 'weight',
  ratio: { a: 100, b: 55 },
  specificGravityA: 1.04,
  specificGravityB: 1.22,
  isocyanatePart: 'B',
  freeRiseDensity: 28,
  freeRiseReferenceTemperature: 22,
  freeRiseDensitySlope: -0.25,
};

describe('pigment dosed as the trade doses it (common practice)', () => {
  it('2 % of the polyol side at 100:55 is 1.29 % of A+B; copying the paste sheet as % of A+B overdoses by 55 %', () => {
    const ofAB = pigmentPercentOfAB(2, 'polyol', system.ratio, 'B');
    expect(ofAB).toBeCloseTo(1.2903, 4);
    expect(2 / ofAB - 1).toBeCloseTo(0.55, 12);
    // of the total: p ÷ (100 − p) of A+B — 2 % of the total is 2/98 = 2.0408 % of A+B
    expect(pigmentPercentOfAB(2, 'total', system.ratio, 'B')).toBeCloseTo(2.0408, 4);
  });
});

describe('isocyanate index with a pigment carrier (equivalent-weight method)', () => {
  it('a carrier of OH 56.1 at 3 g per 150 g of A+B adds 0.003 equivalents: index 200 → 194.17', () => {
    // 100 g polyol OH 56.1: 100 ÷ (56 100 ÷ 56.1) = 0.1 eq; 50 g at 16.808 %NCO: 50 ÷ (4202 ÷ 16.808) = 0.2 eq
    const s: MaterialSystemParameters = { ...system, ratio: { a: 100, b: 50 }, ncoPercent: 16.808, hydroxylNumber: 56.1, pigmentCarrierHydroxylNumber: 56.1 };
    expect(systemIndex(s, 0)).toBeCloseTo(200, 9);
    expect(systemIndex(s, 2)).toBeCloseTo((100 * 0.2) / 0.103, 9);
  });

  it('bounds: TDI carries 48.3 % NCO (4202 ÷ 87.08) and glycerol an OH number of 1829 (56 100 ÷ 30.67), from memory', () => {
    expect(4202 / 87.08).toBeCloseTo(48.25, 2);
    expect(4202 / 87.08).toBeLessThan(NCO_PERCENT_BOUNDS.max);
    expect(56_100 / 30.67).toBeCloseTo(1829, 0);
    expect(56_100 / 30.67).toBeLessThan(HYDROXYL_NUMBER_BOUNDS.max);
  });
});

describe('cup tests in ASTM D7487 terms', () => {
  const spec = { creamTimeWindow: { min: 9, max: 15 }, riseTimeWindow: { min: 60, max: 85 }, tackFreeTimeWindow: { min: 120, max: 160 }, freeRiseDensityBand: { min: 26.5, max: 29.5 }, referenceTemperature: 22, slope: -0.25 };
  it('orders the events cream → rise (top of cup) → tack free, and corrects the density to the reference temperature', () => {
    const ok = judgeCupTest({ temperature: 25.75, creamTime: 10, riseTime: 66, tackFreeTime: 125, freeRiseDensity: 27.0 }, spec);
    expect(ok.verdict).toBe('passed');
    // 27.0 − (−0.25) × (25.75 − 22) = 27.9375 kg/m³ at 22 °C
    expect(ok.correctedDensity).toBeCloseTo(27.9375, 9);
  });
  it('fails a lot that has gone off: slow and heavy', () => {
    const off = judgeCupTest({ temperature: 22.25, creamTime: 19, riseTime: 97, tackFreeTime: 175, freeRiseDensity: 31.6 }, spec);
    expect(off.findings.map((f) => f.code)).toEqual(['CREAM_TIME_ABOVE_WINDOW', 'RISE_TIME_ABOVE_WINDOW', 'TACK_FREE_TIME_ABOVE_WINDOW', 'FREE_RISE_DENSITY_ABOVE_BAND']);
  });
});

describe('sentences in the reader’s units (NIST SP 811)', () => {
  it('writes 18–27 °C as 64.4–80.6 °F and 0.45359237 kg as 1 lb', () => {
    const text = describeFinding({ code: 'TEMPERATURE_BELOW_WINDOW', measured: 15.5555555555556, limit: 18, unit: 'degC', facts: { otherEdge: 27 } }, 'imperial');
    expect(text).toMatch(/^The component at 60 °F is below the window of 64\.4–80\.6 °F/);
    const over = describeFinding({ code: 'OVER_CAPACITY', measured: 0.45359237 * 31, limit: 0.45359237 * 30, unit: 'kg', facts: {} }, 'imperial');
    expect(over).toMatch(/^31 lb is over the scale's capacity of 30 lb/);
  });
});

describe('the whole pour (common practice)', () => {
  it('both parts 30 % short in ratio are short shots; the ratio alone would have passed them', () => {
    const targets = computeBatchTargets({ system, freeRiseCup: { volume: 0.05 } });
    const a = targets.components.A.massUnrounded.value;
    const b = targets.components.B.massUnrounded.value;
    const facts = { a, b, pigment: 0, total: a + b };
    const r = judgeReading({ quantity: 'mass', subject: 'part_b', valueSi: 0.7 * b, stable: true, device: { capacityKg: null, calibrationDue: null }, day: '2026-01-01', system, targets: facts, otherPartMassKg: 0.7 * a });
    expect(r.reasons.map((x) => x.code)).toEqual(['SHORT_SHOT']);
  });
});
