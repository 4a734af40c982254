import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import {
  DEFAULT_ALLOWANCE_CONVENTION,
  applyAllowance,
  decimalPlaces,
  foamMass,
  mixedMass,
  pigmentMass,
  roundPourMasses,
  roundToReadability,
  splitMixedMass,
  withDeliveredAllowance,
  withMultiplicativeAllowance,
} from './mass.js';

describe('foamMass', () => {
  it('is density × volume', () => {
    expect(foamMass(50, 0.002)).toBe(0.1);
    expect(() => foamMass(-1, 1)).toThrow(RangeError);
  });
});

describe('allowances', () => {
  it('delivered form divides by (1 − loss)', () => {
    expect(withDeliveredAllowance(0.95, 0.05)).toBeCloseTo(1, 15);
    expect(withDeliveredAllowance(1, 0.05)).toBeCloseTo(1.0526315789, 9);
    expect(() => withDeliveredAllowance(1, 1)).toThrow(RangeError);
  });

  it('multiplicative form multiplies by (1 + allowance)', () => {
    expect(withMultiplicativeAllowance(1, 0.05)).toBe(1.05);
    expect(() => withMultiplicativeAllowance(1, -0.1)).toThrow(RangeError);
  });

  it('applies either form by name', () => {
    expect(applyAllowance(2, 0.1, 'multiplicative')).toBeCloseTo(2.2, 15);
    expect(applyAllowance(1.8, 0.1, 'delivered')).toBeCloseTo(2, 15);
  });

  it('by default multiplies for overfill and divides for retention', () => {
    expect(DEFAULT_ALLOWANCE_CONVENTION).toEqual({ overfill: 'multiplicative', retention: 'delivered' });
    expect(mixedMass(1, { overfillPercent: 10, retentionPercent: 20 })).toBeCloseTo((1 * 1.1) / 0.8, 12);
    expect(mixedMass(1, { overfillPercent: 10 })).toBeCloseTo(1.1, 15);
    expect(mixedMass(1, { retentionPercent: 20 })).toBeCloseTo(1.25, 15);
    expect(mixedMass(1)).toBe(1);
  });

  it('follows another convention when given one', () => {
    expect(mixedMass(1, { overfillPercent: 20, retentionPercent: 20 }, { overfill: 'delivered', retention: 'multiplicative' })).toBeCloseTo(
      1.2 / 0.8,
      12,
    );
  });
});

describe('pigment and the split', () => {
  it('makes pigment a percent of A + B', () => {
    expect(pigmentMass(1, 2)).toBe(0.02);
  });

  it('keeps A + B + pigment equal to the mixed mass, with pigment at its percent of A + B', () => {
    const parts = splitMixedMass(1.02, { a: 100, b: 50 }, 2);
    expect(parts.a + parts.b).toBeCloseTo(1, 12);
    expect(parts.pigment).toBeCloseTo(0.02, 12);
    expect(parts.a / parts.b).toBeCloseTo(2, 12);
    expect(parts.a + parts.b + parts.pigment).toBeCloseTo(1.02, 12);
  });

  it('splits by the weight ratio alone without pigment', () => {
    expect(splitMixedMass(0.2, { a: 1, b: 1 })).toEqual({ a: 0.1, b: 0.1, pigment: 0 });
  });
});

describe('decimalPlaces', () => {
  it('counts the digits a readability is written with', () => {
    expect(decimalPlaces(0.1)).toBe(1);
    expect(decimalPlaces(0.05)).toBe(2);
    expect(decimalPlaces(1e-7)).toBe(7);
    expect(decimalPlaces(2.5e-5)).toBe(6);
    expect(decimalPlaces(20)).toBe(0);
    expect(decimalPlaces(1e21)).toBe(0);
  });
});

describe('roundToReadability', () => {
  it('rounds to the nearest multiple without float junk', () => {
    expect(roundToReadability(0.1 + 0.2, 0.1)).toBe(0.3);
    expect(roundToReadability(0.29, 0.1)).toBe(0.3);
    expect(roundToReadability(0.2267962, 0.0001)).toBe(0.2268);
    expect(roundToReadability(0.2267962, 1e-7)).toBe(0.2267962);
    expect(roundToReadability(123.456, 0.05)).toBe(123.45);
    expect(roundToReadability(123.476, 0.05)).toBe(123.5);
    expect(roundToReadability(7, 2)).toBe(8);
  });

  it('rounds a written half away from zero', () => {
    expect(roundToReadability(0.35, 0.1)).toBe(0.4);
    expect(roundToReadability(0.25, 0.1)).toBe(0.3);
    expect(roundToReadability(-0.25, 0.1)).toBe(-0.3);
    expect(roundToReadability(1.005, 0.01)).toBe(1.01);
  });

  it('never returns negative zero', () => {
    expect(Object.is(roundToReadability(-0.01, 0.1), 0)).toBe(true);
  });

  it('lands on a multiple of d within d/2, written with no more digits than d', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.constantFrom(1e-4, 1e-3, 0.01, 0.05, 0.1, 0.5, 1, 2e-4),
        (value, d) => {
          const rounded = roundToReadability(value, d);
          expect(Math.abs(rounded - value)).toBeLessThanOrEqual(d / 2 + 1e-9);
          const steps = rounded / d;
          expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-6);
          expect(decimalPlaces(rounded)).toBeLessThanOrEqual(decimalPlaces(d));
        },
      ),
      { numRuns: 500 },
    );
  });

  it('rejects a readability that is not positive', () => {
    expect(() => roundToReadability(1, 0)).toThrow(RangeError);
    expect(() => roundToReadability(Number.NaN, 0.1)).toThrow(RangeError);
  });
});

describe('roundPourMasses', () => {
  it('rounds each part and totals the rounded parts', () => {
    const rounded = roundPourMasses({ a: 0.11339809, b: 0.11339809, pigment: 0.00453592 }, 0.0001);
    expect(rounded).toEqual({ a: 0.1134, b: 0.1134, pigment: 0.0045, total: 0.2313 });
  });
});
