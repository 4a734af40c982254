import { afterEach, describe, expect, it } from 'vitest';
import {
  decimalsForStep,
  formatAsSent,
  formatDisplay,
  formatDisplayBand,
  formatDuration,
  formatNumber,
  formatQuantity,
  formatSeconds,
  formatSi,
  formatSiAs,
  fromSI,
  secondsForInput,
  setSmallMassUnit,
  siToDisplay,
  toSI,
  unitLabel,
} from './quantities';

afterEach(() => setSmallMassUnit('oz'));

describe('unit conversions', () => {
  it('converts with the exact definitions (NIST SP 811: 1 lb = 0.45359237 kg, 1 US gal = 231 in³)', () => {
    expect(toSI('mass', 1, 'lb')).toBe(0.45359237);
    expect(toSI('volume', 1, 'gal')).toBeCloseTo(0.003785411784, 15);
    // 1 lb/ft³ = 16.018463 kg/m³ (NIST SP 811 appendix B)
    expect(toSI('density', 1, 'lb/ft3')).toBeCloseTo(16.018463, 6);
    expect(toSI('temperature', 72, 'degF')).toBeCloseTo(22.2222, 4);
    expect(fromSI('temperature', 22, 'degF')).toBeCloseTo(71.6, 10);
  });

  it('treats empty or unknown input as no value', () => {
    expect(toSI('length', '', 'mm')).toBeNull();
    expect(toSI('length', 5, 'furlong')).toBeNull();
    expect(toSI('length', '250', 'mm')).toBe(0.25);
  });

  it('prints the usual signs for the API’s ASCII units', () => {
    expect(unitLabel('degC')).toBe('°C');
    expect(unitLabel('kg/m3')).toBe('kg/m³');
    expect(unitLabel('in3')).toBe('in³');
    expect(unitLabel('kg')).toBe('kg');
    expect(unitLabel('1')).toBe('');
    expect(unitLabel(null)).toBe('');
  });
});

describe('numbers', () => {
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

  it('shows SI read-outs in a chosen unit with a few significant digits', () => {
    expect(formatSiAs(28, 'kg/m3')).toBe('28 kg/m³');
    expect(formatSiAs(28, 'lb/ft3')).toBe('1.748 lb/ft³');
    expect(formatSiAs(null, 'kg')).toBe('—');
  });

  it('shows one scale division when the readability is known', () => {
    expect(decimalsForStep(0.1)).toBe(1);
    expect(decimalsForStep(1)).toBe(0);
    expect(decimalsForStep(0.00220462262)).toBe(3);
    expect(decimalsForStep(0)).toBeUndefined();
  });

  it('never writes an absurd value out in full: a bounded width whatever the magnitude', () => {
    const huge = formatQuantity(1e300, 'kg');
    expect(huge).toBe('1 × 10³⁰⁰ kg');
    expect(formatNumber(-1.234e12, { decimals: 2 })).toBe('−1.23 × 10¹²');
    expect(formatSiAs(1e300, 'lb')).toBe('2.2 × 10³⁰⁰ lb');
    expect(formatSeconds(1e200)).toMatch(/× 10/);
    for (const v of [1e21, 9.99e99, -Number.MAX_VALUE, 123456789012]) expect(formatQuantity(v, 'kg/m3').length).toBeLessThanOrEqual(20);
    expect(formatNumber(999_999_999, { decimals: 0 })).toBe('999,999,999');
  });
});

describe('the person’s unit system', () => {
  it('converts masses by the exact pound (NIST SP 811: 1 lb = 0.45359237 kg)', () => {
    expect(siToDisplay(0.45359237, 'kg', 'imperial')).toEqual({ value: 1, unit: 'lb' });
    expect(siToDisplay(0.2904, 'kg', 'metric').unit).toBe('g');
    expect(siToDisplay(0.2904, 'kg', 'metric').value).toBeCloseTo(290.4, 9);
    expect(siToDisplay(2.5, 'kg', 'metric')).toEqual({ value: 2.5, unit: 'kg' });
  });

  it('reads imperial masses under a pound in ounces (common practice: 16 oz = 1 lb)', () => {
    // 0.0045359237 kg = 0.01 lb = 0.16 oz
    expect(formatSi(0.0045359237, 'kg', 'imperial')).toBe('0.16 oz');
    expect(formatSi(0.2904, 'kg', 'imperial')).toBe('10.24 oz');
    expect(formatSi(2.5, 'kg', 'imperial')).toBe('5.512 lb');
    // the API's own figure in pounds, with the scale's decimals: one decimal fewer in ounces
    expect(formatDisplay({ value: 0.01, unit: 'lb' }, { decimals: 3 })).toBe('0.16 oz');
    expect(formatDisplayBand({ value: 0.009, unit: 'lb' }, { value: 0.01, unit: 'lb' }, { decimals: 3 })).toBe('0.14–0.16 oz');
    expect(formatDisplay({ value: 1.5, unit: 'lb' }, { decimals: 3 })).toBe('1.500 lb');
    // a figure that reads a whole pound at the scale's decimals stays in pounds
    expect(formatDisplay({ value: 0.9998, unit: 'lb' }, { decimals: 3 })).toBe('1.000 lb');
    expect(formatDisplay({ value: 0.9994, unit: 'lb' }, { decimals: 3 })).toBe('15.99 oz');
    expect(formatSi(0.45359237 * 0.99995, 'kg', 'imperial')).toMatch(/ lb$/);
  });

  it('reads them in grams when the organization chose grams', () => {
    setSmallMassUnit('g');
    expect(formatSi(0.0045359237, 'kg', 'imperial')).toBe('4.5 g');
  });

  it('converts absolute temperatures with the 32 °F offset', () => {
    expect(siToDisplay(-40, 'degC', 'imperial').value).toBeCloseTo(-40, 9);
    expect(formatSi(18, 'degC', 'imperial')).toBe('64.4 °F');
    expect(formatSi(18, 'degC', 'metric')).toBe('18.0 °C');
  });

  it('converts densities with the exact foot (1 lb/ft³ = 16.018463 kg/m³) and leaves percents alone', () => {
    expect(siToDisplay(16.018463373960138, 'kg/m3', 'imperial').value).toBeCloseTo(1, 9);
    expect(siToDisplay(5, '%', 'imperial')).toEqual({ value: 5, unit: '%' });
  });
});

describe('durations', () => {
  it('reads pot life, demold and cure times the way a shop says them, one way everywhere', () => {
    expect(formatSeconds(75)).toBe('75 s');
    expect(formatSeconds(60)).toBe('1 min');
    expect(formatSeconds(150)).toBe('2 min 30 s');
    expect(formatSeconds(480)).toBe('8 min');
    expect(formatSeconds(86400)).toBe('24 h');
    expect(formatSeconds(null)).toBe('—');
    expect(formatDisplay({ value: 2.5, unit: 'min', si: { value: 150, unit: 's' } })).toBe('2 min 30 s');
    expect(formatDisplay({ value: 1440, unit: 'min', si: { value: 86400, unit: 's' } })).toBe('24 h');
    expect(formatDisplay({ value: 50.4, unit: 'kg/m3', si: { value: 50.4, unit: 'kg/m3' } })).toBe('50.4 kg/m³');
  });

  it('gives inputs the friendliest whole unit and sentences a span in words', () => {
    expect(secondsForInput(480)).toEqual({ value: 8, unit: 'min' });
    expect(secondsForInput(86400)).toEqual({ value: 24, unit: 'h' });
    expect(secondsForInput(75)).toEqual({ value: 75, unit: 's' });
    expect(formatDuration(3600)).toBe('1 hour');
    expect(formatDuration(7 * 86400)).toBe('7 days');
    expect(formatDuration(90)).toBe('90 seconds');
    expect(formatDuration(0)).toBe('no overlap');
  });
});

describe('formatAsSent', () => {
  it('keeps every decimal a device sent, with the unit sign', () => {
    expect(formatAsSent(412.63, 'g')).toBe('412.63 g');
    expect(formatAsSent(22, 'degC')).toBe('22 °C');
    expect(formatAsSent(1520.5, 'g')).toBe('1,520.5 g');
  });
  it('never writes a 300-digit number: an absurd value reads in powers of ten', () => {
    const text = formatAsSent(Number('9'.repeat(300)), 'g');
    expect(text).toBe('1 × 10³⁰⁰ g');
    expect(text.length).toBeLessThan(20);
  });
});
