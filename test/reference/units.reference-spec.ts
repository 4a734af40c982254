/**
 * Unit conversions pinned to published definitions. Each check names its source beside it.
 */
import { describe, expect, it } from '@jest/globals';
import { convert, fromSI, temperatureDifferenceToSI, toSI } from '@pourgate/batching';

describe('exact definitions (NIST SP 811 Appendix B; NIST Handbook 44 Appendix C)', () => {
  it('1 lb = 0.45359237 kg exactly (international avoirdupois pound, 1959)', () => {
    expect(toSI('mass', 1, 'lb')).toBe(0.45359237);
  });

  it('1 oz = 1/16 lb = 28.349523125 g exactly (NIST Handbook 44, avoirdupois units)', () => {
    expect(toSI('mass', 1, 'oz')).toBe(0.028349523125);
    expect(convert('mass', 1, 'lb', 'oz')).toBe(16);
  });

  it('1 in = 0.0254 m exactly, 1 ft = 12 in', () => {
    expect(toSI('length', 1, 'in')).toBe(0.0254);
    expect(toSI('length', 1, 'ft')).toBe(0.3048);
  });

  it('1 in³ = 16.387064 cm³ exactly and 1 ft³ = 1728 in³ (follows from 1 in = 0.0254 m)', () => {
    expect(toSI('volume', 1, 'in3')).toBe(1.6387064e-5);
    expect(convert('volume', 1, 'ft3', 'in3')).toBe(1728);
  });

  it('1 US gal = 231 in³ = 3.785411784 L exactly (NIST Handbook 44)', () => {
    expect(convert('volume', 1, 'gal', 'in3')).toBe(231);
    expect(convert('volume', 1, 'gal', 'L')).toBe(3.785411784);
  });

  it('1 US fl oz = 1/128 US gal (NIST Handbook 44, US liquid measure)', () => {
    expect(convert('volume', 128, 'floz', 'gal')).toBe(1);
  });

  it('1 lb/ft³ = 0.45359237 / 0.3048³ kg/m³ = 16.018463 kg/m³ (follows from the definitions)', () => {
    expect(toSI('density', 1, 'lb/ft3')).toBeCloseTo(16.018463, 6);
    expect(toSI('density', 1, 'pcf')).toBeCloseTo(0.45359237 / 0.3048 ** 3, 12);
  });

  it('1 g/cm³ = 1000 kg/m³ (SI prefixes)', () => {
    expect(toSI('density', 1, 'g/cm3')).toBe(1000);
  });
});

describe('16 CFR 500.19 (US net-quantity conversion factors, six significant digits)', () => {
  const sixDigits = (x: number) => Number(x.toPrecision(6));

  it('1 fluid ounce = 29.5735 mL', () => {
    expect(sixDigits(fromSI('volume', toSI('volume', 1, 'fl oz'), 'mL'))).toBe(29.5735);
  });

  it('1 gallon = 3.78541 L; 1 cubic inch = 16.3871 cm³; 1 cubic foot = 0.0283168 m³', () => {
    expect(sixDigits(convert('volume', 1, 'gal', 'L'))).toBe(3.78541);
    expect(sixDigits(convert('volume', 1, 'in3', 'cm3'))).toBe(16.3871);
    expect(sixDigits(toSI('volume', 1, 'ft3'))).toBe(0.0283168);
  });

  it('1 ounce = 28.3495 g; 1 pound = 453.592 g; 1 kilogram = 2.20462 lb', () => {
    expect(sixDigits(convert('mass', 1, 'oz', 'g'))).toBe(28.3495);
    expect(sixDigits(convert('mass', 1, 'lb', 'g'))).toBe(453.592);
    expect(sixDigits(convert('mass', 1, 'kg', 'lb'))).toBe(2.20462);
  });
});

describe('49 CFR 171.10(c) conversion table (values based on ASTM E 380)', () => {
  it('1 lb/ft³ = 16.01846 kg/m³ and 1 kg/m³ = 0.06242797 lb/ft³', () => {
    expect(Number(toSI('density', 1, 'lb/ft3').toFixed(5))).toBe(16.01846);
    // The table's inverse is off by one in its last place (the exact value is 0.062427961).
    expect(Math.abs(fromSI('density', 1, 'lb/ft3') - 0.06242797)).toBeLessThanOrEqual(1e-8);
  });

  it('1 ft³ = 0.02831685 m³; 1 gal = 3.785412 L', () => {
    expect(Number(toSI('volume', 1, 'ft3').toPrecision(7))).toBe(0.02831685);
    expect(Number(convert('volume', 1, 'gal', 'L').toPrecision(7))).toBe(3.785412);
  });
});

describe('temperature (NIST SP 811 §4.2.1.1 and Appendix B.9: t/°C = (t/°F − 32)/1.8; ΔT of 1 °F = 5/9 K)', () => {
  it('212 °F = 100 °C and 32 °F = 0 °C', () => {
    expect(toSI('temperature', 212, 'degF')).toBe(100);
    expect(toSI('temperature', 32, '°F')).toBe(0);
  });

  it('72 °F ≈ 22.2 °C', () => {
    expect(toSI('temperature', 72, 'F')).toBeCloseTo(22.2, 1);
  });

  it('a 9 °F band is a 5 °C band (a difference: no offset)', () => {
    expect(temperatureDifferenceToSI(9, 'degF')).toBe(5);
    expect(toSI('temperature_difference', 9, '°F')).toBe(5);
  });

  it('0 °C = 273.15 K (SI definition of the Celsius temperature)', () => {
    expect(toSI('temperature', 273.15, 'K')).toBe(0);
  });
});
