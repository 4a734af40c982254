import { describe, expect, it } from 'vitest';
import type { Reading } from '../review/labels';
import { barDomain, positionOn, ratioError, weighedMasses } from './weighed';

let n = 0;
function mass(subject: Reading['subject'], kg: number, over: Partial<Reading> = {}): Reading {
  n += 1;
  return {
    id: `r${String(n).padStart(3, '0')}`, batchId: 'b', deviceId: 'd', clientReadingId: `c${n}`, quantity: 'mass', subject, valueSi: kg, unitSi: 'kg',
    given: { value: kg * 1000, unit: 'g' }, stable: true, deviceTime: null, statusUrl: '/v1/readings/x', receivedAt: `2026-12-02T08:00:${String(n).padStart(2, '0')}Z`,
    clockSkewSeconds: null, clockSkewFlagged: false, status: 'accepted', reasons: [], judgedAt: null, review: null, ...over,
  };
}

describe('weighedMasses', () => {
  it('keeps the latest settled, judged mass of each part', () => {
    const w = weighedMasses([
      mass('part_a', 0.48),
      mass('part_a', 0.4867),
      mass('part_b', 0.3, { stable: false }),
      mass('part_b', 0.2677),
      mass('pigment', 0.02, { status: 'unused' }),
      { ...mass('part_a', 22), quantity: 'temperature', unitSi: 'degC' },
    ]);
    expect(w.massKg).toEqual({ A: 0.4867, B: 0.2677 });
    expect(w.reading.A?.valueSi).toBe(0.4867);
  });
});

describe('ratioError', () => {
  it('is zero on ratio and signed by the heavy side', () => {
    expect(ratioError(1, 0.55, { a: 100, b: 55 })).toBeCloseTo(0, 12);
    // 105:100 against 100:100 is +5 %; 100:105 is −4.76 %
    expect(ratioError(1.05, 1, { a: 100, b: 100 })).toBeCloseTo(0.05, 12);
    expect(ratioError(1, 1.05, { a: 100, b: 100 })).toBeCloseTo(1 / 1.05 - 1, 12);
  });
  it('cannot be formed without both parts', () => {
    expect(ratioError(undefined, 1, { a: 1, b: 1 })).toBeNull();
    expect(ratioError(1, 0, { a: 1, b: 1 })).toBeNull();
  });
});

describe('bar geometry', () => {
  it('shows the band and an outlier with room around them', () => {
    const d = barDomain(462.3, 511, 486.7, 530);
    expect(d.min).toBeLessThan(462.3);
    expect(d.max).toBeGreaterThan(530);
    expect(positionOn(486.7, 400, 600)).toBeCloseTo(0.4335, 4);
    expect(positionOn(700, 400, 600)).toBe(1);
    expect(positionOn(1, 2, 2)).toBe(0.5);
  });
});
