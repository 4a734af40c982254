import { describe, expect, it } from '@jest/globals';
import {
  DEFAULT_EXOTHERM_MASS_LIMIT,
  DEFAULT_MINIMUM_TOLERANCE_DIVISIONS,
  WARNING_SEVERITY,
  checkComponentTemperature,
  checkExothermMass,
  checkLotExpiry,
  checkPackFactor,
  checkPigment,
  checkScaleCalibration,
  checkScaleCapacity,
  checkToleranceResolution,
  describeMass,
} from './warnings.js';

describe('checkPackFactor', () => {
  it('flags a pack factor below 1 as a short fill', () => {
    const [found] = checkPackFactor(0.9, 3);
    expect(found).toMatchObject({ code: 'PACK_FACTOR_BELOW_ONE', severity: 'danger', measured: 0.9, limit: 1, unit: '1' });
    expect(found!.message).toMatch(/short fill/);
  });

  it('flags a pack factor above the limit as a danger', () => {
    expect(checkPackFactor(3.2, 3)).toEqual([expect.objectContaining({ code: 'PACK_FACTOR_ABOVE_LIMIT', severity: 'danger', limit: 3 })]);
  });

  it('is quiet at exactly 1 and at exactly the limit', () => {
    expect(checkPackFactor(1.1, 3)).toEqual([]);
    // from 1 up to 1.1 the fill is marginal: a caution, not a danger
    expect(checkPackFactor(1, 3).map((w) => [w.code, w.severity])).toEqual([['PACK_FACTOR_MARGINAL', 'caution']]);
    expect(checkPackFactor(3, 3)).toEqual([]);
    expect(checkPackFactor(0.1 * 3 * 10, 3)).toEqual([]);
  });

  it('skips the upper check when the system has no limit', () => {
    expect(checkPackFactor(8, undefined)).toEqual([]);
  });
});

describe('checkToleranceResolution', () => {
  it('flags a band of fewer than 5 divisions on the smaller part', () => {
    // ±5 % of 6 g is ±0.3 g: three divisions of a 0.1 g scale.
    const found = checkToleranceResolution({ part: 'B', bandHalfWidth: 0.0003, readability: 0.0001 });
    expect(found).toMatchObject({ code: 'TOLERANCE_BELOW_SCALE_RESOLUTION', severity: 'warning', unit: 'kg' });
    expect(found!.measured).toBe(0.0003);
    expect(found!.limit).toBeCloseTo(0.0005, 15);
    expect(found!.message).toContain('part B');
    expect(found!.message).toContain('cannot resolve');
  });

  it('is quiet at exactly 5 divisions and above', () => {
    expect(DEFAULT_MINIMUM_TOLERANCE_DIVISIONS).toBe(5);
    expect(checkToleranceResolution({ part: 'A', bandHalfWidth: 0.0005, readability: 0.0001 })).toBeNull();
    expect(checkToleranceResolution({ part: 'A', bandHalfWidth: 0.002, readability: 0.0001 })).toBeNull();
  });

  it('takes another number of divisions', () => {
    expect(checkToleranceResolution({ part: 'A', bandHalfWidth: 0.0008, readability: 0.0001, minimumDivisions: 10 })).not.toBeNull();
  });
});

describe('checkPigment', () => {
  it('flags pigment above the maximum, not at it', () => {
    expect(checkPigment(5.5, 5)).toMatchObject({ code: 'PIGMENT_OVER_LIMIT', measured: 5.5, limit: 5, unit: '%' });
    expect(checkPigment(5, 5)).toBeNull();
    expect(checkPigment(9, undefined)).toBeNull();
  });
});

describe('checkExothermMass', () => {
  it('flags a mixed mass above the limit as a danger, deferring to the supplier', () => {
    expect(DEFAULT_EXOTHERM_MASS_LIMIT).toBe(2);
    const found = checkExothermMass(2.5);
    expect(found).toMatchObject({ code: 'EXOTHERM_RISK_MASS', severity: 'danger', measured: 2.5, limit: 2, unit: 'kg' });
    expect(found!.message).toMatch(/exotherm/);
    expect(found!.message).toMatch(/TDS\/SDS/);
  });

  it('is quiet at or below the limit, and honours a supplier limit', () => {
    expect(checkExothermMass(2)).toBeNull();
    expect(checkExothermMass(1.5, 1)).not.toBeNull();
  });
});

describe('dates', () => {
  it('flags each lot used after its expiry day', () => {
    const found = checkLotExpiry(
      [
        { part: 'A', lotCode: 'A-17', expiresOn: '2026-03-01' },
        { part: 'B', expiresOn: '2026-03-10' },
        { part: 'pigment', lotCode: 'P-2', expiresOn: '2026-02-28' },
      ],
      '2026-03-10',
    );
    expect(found.map((w) => [w.code, w.severity, w.measured])).toEqual([
      ['LOT_EXPIRED', 'danger', 9],
      ['LOT_EXPIRED', 'danger', 10],
    ]);
    expect(found[0]!.message).toContain('part A lot A-17');
    expect(found[1]!.message).toContain('pigment lot P-2');
  });

  it('flags a scale past its calibration due date, not on it', () => {
    expect(checkScaleCalibration('2026-01-31', '2026-02-01')).toMatchObject({ code: 'CALIBRATION_OVERDUE', measured: 1, unit: 'd' });
    expect(checkScaleCalibration('2026-01-31', '2026-01-31')).toBeNull();
  });

  it('refuses malformed dates', () => {
    expect(() => checkScaleCalibration('31/01/2026', '2026-02-01')).toThrow(RangeError);
  });
});

describe('checkScaleCapacity', () => {
  it('flags a pour heavier than the scale can weigh', () => {
    expect(checkScaleCapacity(2.2, 2)).toMatchObject({ code: 'OVER_CAPACITY', severity: 'danger', measured: 2.2, limit: 2 });
    expect(checkScaleCapacity(2, 2)).toBeNull();
  });
});

describe('checkComponentTemperature', () => {
  it('flags temperatures outside the window on either side', () => {
    expect(checkComponentTemperature(17, { min: 20, max: 25 })).toMatchObject({ limit: 20, unit: 'degC' });
    expect(checkComponentTemperature(27, { min: 20, max: 25 })!.message).toContain('above');
    expect(checkComponentTemperature(25, { min: 20, max: 25 })).toBeNull();
  });
});

describe('messages and severities', () => {
  it('gives every code a severity', () => {
    expect(Object.values(WARNING_SEVERITY).every((s) => s === 'caution' || s === 'warning' || s === 'danger')).toBe(true);
    expect(Object.keys(WARNING_SEVERITY)).toHaveLength(11);
  });

  it('writes masses in grams below 1 kg and kilograms above', () => {
    expect(describeMass(0.2268)).toBe('226.8 g');
    expect(describeMass(2.5)).toBe('2.5 kg');
    expect(describeMass(0.0001)).toBe('0.1 g');
  });
});
