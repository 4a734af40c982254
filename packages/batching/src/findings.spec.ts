import { describe, expect, it } from '@jest/globals';
import { readFileSync } from 'node:fs';
import { describeFinding, FINDING_CODES, finding, forReader, Formatter } from './findings.js';
import { judgeReading } from './judging.js';
import { checkScaleCalibration } from './warnings.js';

describe('one vocabulary of findings', () => {
  it('is the enum of schemas/finding-code.schema.json, code for code', () => {
    const schema = JSON.parse(readFileSync(new URL('../../../schemas/finding-code.schema.json', import.meta.url), 'utf8')) as { enum: string[] };
    expect([...schema.enum].sort()).toEqual([...FINDING_CODES].sort());
  });

  it('uses the same code for the same fact in a batch warning and a reading reason', () => {
    const warning = checkScaleCalibration('2026-01-31', '2026-02-01')!;
    const reason = judgeReading({ quantity: 'mass', subject: 'part_a', valueSi: 1, stable: true, device: { capacityKg: null, calibrationDue: '2026-01-31' }, day: '2026-02-01', system: null, otherPartMassKg: null }).reasons[0]!;
    expect(warning.code).toBe(reason.code);
  });

  it('writes every code as a sentence with no NaN or undefined in it', () => {
    for (const code of FINDING_CODES) {
      const text = describeFinding({ code, measured: 1.2, limit: 1, unit: 'kg', facts: { part: 'B', side: 'isocyanate', target: 1, tolerance: 5, otherEdge: 2, date: '2026-01-31', divisions: 3, minimum: 5, readability: 0.001 } });
      expect(text).not.toMatch(/NaN|undefined/);
      expect(text.length).toBeGreaterThan(20);
    }
  });
});

describe('sentences for the reader', () => {
  // 1 lb = 0.45359237 kg exactly, °F = °C × 9/5 + 32 (NIST SP 811)
  it('writes temperatures and masses in the reader’s unit system, rounded sensibly', () => {
    const cold = finding('TEMPERATURE_BELOW_WINDOW', { measured: 15.5555555555556, limit: 18, unit: 'degC' }, { otherEdge: 27 });
    expect(cold.message).toMatch(/^The component at 15\.6 °C is below the window of 18–27 °C/);
    const [imperial] = forReader([cold], 'imperial');
    expect(imperial!.message).toMatch(/^The component at 60 °F is below the window of 64\.4–80\.6 °F/);
    expect(new Formatter('imperial').mass(0.45359237)).toBe('1 lb');
    // to the scale: 0.1234 kg on a 1 g scale is 123 g
    expect(new Formatter('metric').mass(0.1234, 0.001)).toBe('123 g');
    expect(new Formatter('metric').mass(1.23456, 0.001)).toBe('1.235 kg');
  });

  it('keeps a stored sentence without facts as it was written', () => {
    const old = { code: 'TEMPERATURE_BELOW_WINDOW', message: 'as stored', measured: 16, limit: 18, unit: 'degC' };
    expect(forReader([old], 'imperial')[0]!.message).toBe('as stored');
  });

  it('states signs in words: "part B heavy by 4.98 %", never a minus sign', () => {
    const r = judgeReading({ quantity: 'mass', subject: 'part_b', valueSi: 1 / (1 - 0.0498), stable: true, device: { capacityKg: null, calibrationDue: null }, day: '2026-02-01', system: { ratioBasis: 'weight', ratio: { a: 100, b: 100 }, specificGravityA: 1, specificGravityB: 1, isocyanatePart: 'B', ratioTolerancePercent: 4 }, otherPartMassKg: 1 });
    expect(r.reasons[0]!.message).toMatch(/^Part B \(the isocyanate side\) is heavy by 4\.98 %, outside ±4 %/);
    expect(r.reasons[0]!.message).not.toMatch(/−|-\d/);
  });
});
