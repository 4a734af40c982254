import { describe, expect, it } from '@jest/globals';
import { QuantityReader } from './quantities.js';

// NIST SP 811 appendix B: 1 lb = 0.45359237 kg, 1 ft = 0.3048 m; a temperature interval of 1 °F is 5/9 K.
const PCF = 0.45359237 / 0.3048 ** 3;

describe('QuantityReader', () => {
  it('converts to SI and points at the value or the unit of a bad quantity', () => {
    const q = new QuantityReader();
    expect(q.read('density', { value: 3, unit: 'pcf' }, '/d')).toBeCloseTo(3 * PCF, 12);
    expect(q.read('temperature', { value: 32, unit: 'degF' }, '/t')).toBeCloseTo(0, 12);
    expect(q.read('mass', { value: 0, unit: 'g' }, '/m', { positive: true })).toBeUndefined();
    expect(q.read('mass', { value: 1, unit: 'stone' }, '/s')).toBeUndefined();
    expect(q.read('temperature', { value: -300, unit: 'degC' }, '/cold')).toBeUndefined();
    expect(q.errors.map((e) => e.pointer)).toEqual(['/m/value', '/s/unit', '/cold/value']);
  });

  it('reads a density-per-degree slope as a density over a temperature difference (no 32 °F offset)', () => {
    const q = new QuantityReader();
    expect(q.readDensityPerTemperature({ value: -0.1, unit: 'lb/ft3/degF' }, '/slope')).toBeCloseTo((-0.1 * PCF) / (5 / 9), 12);
    expect(q.readDensityPerTemperature({ value: -0.3, unit: 'kg/m3/degC' }, '/slope')).toBeCloseTo(-0.3, 15);
    expect(q.readDensityPerTemperature({ value: 1, unit: 'kg/m3' }, '/bad')).toBeUndefined();
    expect(q.errors.map((e) => e.pointer)).toEqual(['/bad/unit']);
  });
});
