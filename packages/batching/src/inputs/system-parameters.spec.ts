import { describe, expect, it } from '@jest/globals';
import { readSystemInput, systemPointer, type MaterialSystemInput } from './system-parameters.js';

const base: MaterialSystemInput = {
  ratioBasis: 'weight',
  ratio: { a: 100, b: 50 },
  specificGravityA: 1.1,
  specificGravityB: 1.2,
  isocyanatePart: 'B',
  freeRiseDensity: { value: 40, unit: 'kg/m3' },
  freeRiseReferenceTemperature: { value: 72, unit: 'degF' },
};

describe('material system parameters', () => {
  it('points the computation’s field names at the request’s', () => {
    expect(systemPointer('/system/packFactorLimit')).toBe('/maxPackFactor');
    expect(systemPointer('/system/freeRiseDensity', '/system')).toBe('/system/freeRiseDensity/value');
    expect(systemPointer('/system/componentTemperatureWindow/max')).toBe('/componentTemperatureWindow/max/value');
    expect(systemPointer('/system/ratio/b')).toBe('/ratio/b');
  });

  it('stores the reference temperature in °C (NIST SP 811: t/°C = (t/°F − 32)/1.8) and the ±5 % default (common practice)', () => {
    const { cols, errors } = readSystemInput(base);
    expect(errors).toEqual([]);
    expect(cols.free_rise_reference_temperature_c).toBeCloseTo(40 / 1.8, 12);
    expect(cols.ratio_tolerance_percent).toBe(5);
  });

  it('uses the computation’s checks: a pack factor limit of 40 makes no physical sense', () => {
    const { errors } = readSystemInput({ ...base, maxPackFactor: 40 });
    expect(errors.map((e) => e.pointer)).toEqual(['/maxPackFactor']);
  });
});
