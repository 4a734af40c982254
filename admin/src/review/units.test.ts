import { describe, expect, it } from 'vitest';
import { decimalsForStep, formatDisplay, formatNumber, formatQuantity, formatSeconds, formatSi, siToDisplay, unitLabel } from './units';

describe('unitLabel', () => {
  it('prints the usual signs for the API’s ASCII units', () => {
    expect(unitLabel('degC')).toBe('°C');
    expect(unitLabel('degF')).toBe('°F');
    expect(unitLabel('kg/m3')).toBe('kg/m³');
    expect(unitLabel('in3')).toBe('in³');
    expect(unitLabel('%')).toBe('%');
    expect(unitLabel('kg')).toBe('kg');
    expect(unitLabel('1')).toBe('');
    expect(unitLabel(null)).toBe('');
  });
});

describe('formatNumber and formatQuantity', () => {
  it('uses a real minus sign and a + only when asked', () => {
    expect(formatNumber(-7.8787878788, { decimals: 2 })).toBe('−7.88');
    expect(formatNumber(5.1, { decimals: 1, signed: true })).toBe('+5.1');
    expect(formatNumber(-0.0001, { decimals: 2, signed: true })).toBe('0.00');
  });

  it('gives each unit its usual decimals', () => {
    expect(formatQuantity(16.2, 'degC')).toBe('16.2 °C');
    expect(formatQuantity(486.66, 'g')).toBe('486.7 g');
    expect(formatQuantity(0.4867, 'kg')).toBe('0.487 kg');
    expect(formatQuantity(1.8, '1')).toBe('1.80');
    expect(formatQuantity(1234.5, 'g')).toBe('1,234.5 g');
    expect(formatQuantity(null, 'kg')).toBe('—');
  });

  it('shows one scale division when the readability is known', () => {
    expect(decimalsForStep(0.1)).toBe(1);
    expect(decimalsForStep(1)).toBe(0);
    expect(decimalsForStep(0.00220462262)).toBe(3);
    expect(decimalsForStep(0)).toBeUndefined();
    expect(formatQuantity(486.7, 'g', { decimals: decimalsForStep(0.1) })).toBe('486.7 g');
  });
});

describe('siToDisplay', () => {
  it('converts masses by the exact pound (NIST SP 811: 1 lb = 0.45359237 kg)', () => {
    expect(siToDisplay(0.45359237, 'kg', 'imperial')).toEqual({ value: 1, unit: 'lb' });
    expect(siToDisplay(0.2904, 'kg', 'metric').unit).toBe('g');
    expect(siToDisplay(0.2904, 'kg', 'metric').value).toBeCloseTo(290.4, 9);
    expect(siToDisplay(2.5, 'kg', 'metric')).toEqual({ value: 2.5, unit: 'kg' });
  });

  it('converts absolute temperatures with the 32 °F offset', () => {
    expect(siToDisplay(22, 'degC', 'imperial').value).toBeCloseTo(71.6, 9);
    expect(siToDisplay(-40, 'degC', 'imperial').value).toBeCloseTo(-40, 9);
    expect(formatSi(18, 'degC', 'imperial')).toBe('64.4 °F');
    expect(formatSi(18, 'degC', 'metric')).toBe('18.0 °C');
  });

  it('converts densities with the exact foot (1 lb/ft³ = 16.018463 kg/m³)', () => {
    expect(siToDisplay(16.018463373960138, 'kg/m3', 'imperial').value).toBeCloseTo(1, 9);
  });

  it('leaves percents alone', () => {
    expect(siToDisplay(5, '%', 'imperial')).toEqual({ value: 5, unit: '%' });
  });
});

describe('formatSeconds', () => {
  it('reads pot life, demold and cure times in the unit a shop uses', () => {
    expect(formatSeconds(75)).toBe('75 s');
    expect(formatSeconds(480)).toBe('8 min');
    expect(formatSeconds(86400)).toBe('24 h');
    expect(formatSeconds(null)).toBe('—');
    expect(formatDisplay({ value: 1.25, unit: 'min', si: { value: 75, unit: 's' } })).toBe('75 s');
    expect(formatDisplay({ value: 1440, unit: 'min', si: { value: 86400, unit: 's' } })).toBe('24 h');
    expect(formatDisplay({ value: 50.4, unit: 'kg/m3', si: { value: 50.4, unit: 'kg/m3' } })).toBe('50.4 kg/m³');
  });
});
