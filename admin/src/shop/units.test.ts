import { describe, expect, it } from 'vitest';
import { formatQuantity, formatSeconds, fromSI, secondsForInput, toSI } from './units';

describe('shop units', () => {
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

  it('formats SI read-outs in a display unit with a few significant digits', () => {
    expect(formatQuantity(28, 'density', 'kg/m3')).toBe('28 kg/m³');
    expect(formatQuantity(28, 'density', 'lb/ft3')).toBe('1.748 lb/ft³');
    expect(formatQuantity(null, 'mass', 'kg')).toBe('—');
  });

  it('reads durations the way a shop says them', () => {
    expect(formatSeconds(75)).toBe('75 s');
    expect(formatSeconds(480)).toBe('8 min');
    expect(formatSeconds(86400)).toBe('24 h');
    expect(secondsForInput(480)).toEqual({ value: 8, unit: 'min' });
    expect(secondsForInput(86400)).toEqual({ value: 24, unit: 'h' });
    expect(secondsForInput(75)).toEqual({ value: 75, unit: 's' });
  });
});
