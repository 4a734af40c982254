import { describe, expect, it } from '@jest/globals';
import { pourProfile, toDivision } from './bench-scale.js';
import { CSV_COLUMNS, driftToward, toCsv, type LoggedSample } from './temperature-logger.js';

describe('bench scale', () => {
  it('rounds to the nearest division d, as a scale display does (NIST Handbook 44: d is the displayed step)', () => {
    expect(toDivision(412.649, 0.1)).toBe(412.6);
    expect(toDivision(412.65001, 0.1)).toBe(412.7);
    expect(toDivision(412.74, 0.5)).toBe(412.5);
    expect(toDivision(413.1, 2)).toBe(414);
    expect(toDivision(0.04, 0.01)).toBe(0.04);
  });

  it('shows rising unstable values while pouring, then the settled mass, all on divisions', () => {
    const shown = pourProfile(250.04, 0.1, 3, () => 0.5);
    expect(shown).toEqual([62.5, 125, 187.5, 250]);
    for (const v of shown) expect(Math.abs(v * 10 - Math.round(v * 10))).toBeLessThan(1e-9);
  });
});

describe('temperature logger', () => {
  it("drifts by Newton's law of cooling: after one time constant 1/e of the difference is left (from memory)", () => {
    expect(driftToward(12, 22, 0, 600)).toBe(12);
    expect(driftToward(12, 22, 600, 600)).toBeCloseTo(22 - 10 / Math.E, 10); // 18.321…
    expect(driftToward(30, 22, 600 * Math.LN2, 600)).toBeCloseTo(26, 10); // half the gap after τ·ln 2
    expect(driftToward(12, 22, 1e6, 600)).toBeCloseTo(22, 6);
  });

  it('writes the import CSV: the agreed header, one row per sample, RFC 4180 quoting', () => {
    const s: LoggedSample = { clientReadingId: 'lg-1', batchId: 'b', deviceId: 'd', deviceTime: '2026-01-05T08:00:00.000Z', quantity: 'temperature', subject: 'mold', value: 24.5, unit: 'degC' };
    const csv = toCsv([s, { ...s, clientReadingId: 'lg,"2"' }]);
    expect(CSV_COLUMNS.join(',')).toBe('client_reading_id,batch_id,device_id,device_time,quantity,subject,value,unit');
    expect(csv.split('\r\n')).toEqual([CSV_COLUMNS.join(','), 'lg-1,b,d,2026-01-05T08:00:00.000Z,temperature,mold,24.5,degC', '"lg,""2""",b,d,2026-01-05T08:00:00.000Z,temperature,mold,24.5,degC', '']);
  });
});
