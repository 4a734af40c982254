import { describe, expect, it } from 'vitest';
import type { Batch } from '../batches/types';
import type { Reading } from '../review/types';
import { lastDays, outside, poursToday, ratioErrorsBySystem, rejectionByDay } from './floorStats';

const NOW = new Date(2026, 11, 2, 15, 0).getTime(); // 2 Dec 2026, 15:00 local
const at = (day: number, hour: number) => new Date(2026, 11, day, hour, 0).toISOString();

let n = 0;
function reading(over: Partial<Reading>): Reading {
  n += 1;
  return {
    id: `r${String(n).padStart(3, '0')}`, batchId: 'b1', deviceId: 'd', clientReadingId: `c${n}`, quantity: 'mass', subject: 'part_a', valueSi: 1, unitSi: 'kg',
    given: { value: 1, unit: 'kg' }, stable: true, deviceTime: null, receivedAt: at(2, 9), clockSkewSeconds: null, clockSkewFlagged: false,
    status: 'accepted', reasons: [], judgedAt: null, review: null, ...over,
  };
}

function batch(id: string, systemId: string, a: number, b: number): Batch {
  return { id, materialSystemId: systemId, summary: { massAKg: a, massBKg: b } } as unknown as Batch;
}

describe('lastDays', () => {
  it('lists local days oldest first, ending today', () => {
    expect(lastDays(3, NOW)).toEqual(['2026-11-30', '2026-12-01', '2026-12-02']);
  });
});

describe('poursToday', () => {
  it('counts batches with a settled mass reading since midnight, once each', () => {
    const rs = [
      reading({ batchId: 'b1' }),
      reading({ batchId: 'b1', subject: 'part_b' }),
      reading({ batchId: 'b2', stable: false }),
      reading({ batchId: 'b3', quantity: 'temperature' }),
      reading({ batchId: 'b4', receivedAt: at(1, 23) }),
      reading({ batchId: 'b5', receivedAt: at(2, 0) }),
    ];
    expect(poursToday(rs, NOW)).toBe(2);
  });
});

describe('rejectionByDay', () => {
  it('gives the share of judged readings rejected per day and null on quiet days', () => {
    const rs = [
      reading({ status: 'accepted' }),
      reading({ status: 'rejected' }),
      reading({ status: 'rejected' }),
      reading({ status: 'rejected' }),
      reading({ status: 'unused' }),
      reading({ status: 'pending' }),
      reading({ status: 'accepted', receivedAt: at(1, 10) }),
      reading({ status: 'rejected', receivedAt: at(20, 10) }),
    ];
    expect(rejectionByDay(rs, 3, NOW)).toEqual([
      { day: '2026-11-30', judged: 0, rejected: 0, rate: null },
      { day: '2026-12-01', judged: 1, rejected: 0, rate: 0 },
      { day: '2026-12-02', judged: 4, rejected: 3, rate: 75 },
    ]);
  });
});

describe('ratioErrorsBySystem', () => {
  it('puts each weighed batch’s ratio error under its system, oldest first', () => {
    const batches = [batch('b1', 'flex', 0.5, 0.25), batch('b2', 'flex', 0.5, 0.25), batch('b3', 'skin', 1, 1), batch('b4', 'flex', 0.5, 0.25)];
    const rs = [
      reading({ batchId: 'b2', subject: 'part_a', valueSi: 0.525, receivedAt: at(2, 11) }),
      reading({ batchId: 'b2', subject: 'part_b', valueSi: 0.25, receivedAt: at(2, 11) }),
      reading({ batchId: 'b1', subject: 'part_a', valueSi: 0.5, receivedAt: at(2, 8) }),
      reading({ batchId: 'b1', subject: 'part_b', valueSi: 0.25, receivedAt: at(2, 8) }),
      reading({ batchId: 'b3', subject: 'part_a', valueSi: 1, receivedAt: at(2, 9) }),
      reading({ batchId: 'b3', subject: 'part_b', valueSi: 1.1, receivedAt: at(2, 9) }),
      reading({ batchId: 'b4', subject: 'part_a', valueSi: 0.5 }), // B never weighed
    ];
    const m = ratioErrorsBySystem(batches, rs);
    expect(m.get('flex')!.map((p) => p.batchId)).toEqual(['b1', 'b2']);
    expect(m.get('flex')![0]!.errorPercent).toBeCloseTo(0, 9);
    expect(m.get('flex')![1]!.errorPercent).toBeCloseTo(5, 9);
    expect(m.get('skin')![0]!.errorPercent).toBeCloseTo((1 / 1.1 - 1) * 100, 9);
    expect(outside(m.get('skin')!, 5)).toBe(1);
    expect(outside(m.get('flex')!, 5)).toBe(0);
  });
});
