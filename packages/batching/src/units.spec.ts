import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import {
  DIMENSIONS,
  SI_UNITS,
  UNIT_CATALOG,
  UnitError,
  acceptedUnits,
  convert,
  displayUnits,
  fromSI,
  resolveUnit,
  temperatureDifferenceFromSI,
  temperatureDifferenceToSI,
  toSI,
  trimFloat,
} from './units.js';

describe('toSI', () => {
  it('converts masses to kilograms', () => {
    expect(toSI('mass', 250, 'g')).toBe(0.25);
    expect(toSI('mass', 2, 'kg')).toBe(2);
    expect(toSI('mass', 2, 'lb')).toBe(0.90718474);
    expect(toSI('mass', 16, 'oz')).toBe(0.45359237);
  });

  it('converts volumes to cubic metres', () => {
    expect(toSI('volume', 500, 'mL')).toBe(0.0005);
    expect(toSI('volume', 1.5, 'L')).toBe(0.0015);
    expect(toSI('volume', 1, 'cm3')).toBe(1e-6);
    expect(toSI('volume', 1, 'cm³')).toBe(1e-6);
    expect(toSI('volume', 2, 'm3')).toBe(2);
    expect(toSI('volume', 1, 'in3')).toBe(1.6387064e-5);
    expect(toSI('volume', 1, 'ft3')).toBe(0.028316846592);
    expect(toSI('volume', 1, 'gal')).toBe(0.003785411784);
    expect(toSI('volume', 128, 'fl oz')).toBe(0.003785411784);
  });

  it('converts densities to kg/m³, with "pcf" for lb/ft³', () => {
    expect(toSI('density', 1, 'g/cm3')).toBe(1000);
    expect(toSI('density', 45, 'kg/m³')).toBe(45);
    expect(toSI('density', 1, 'pcf')).toBe(toSI('density', 1, 'lb/ft3'));
    expect(toSI('density', 1, 'pcf')).toBeCloseTo(16.018463374, 9);
  });

  it('converts absolute temperatures to °C with the offset', () => {
    expect(toSI('temperature', 212, 'degF')).toBe(100);
    expect(toSI('temperature', 32, '°F')).toBe(0);
    expect(toSI('temperature', -40, 'F')).toBe(-40);
    expect(toSI('temperature', 22, 'C')).toBe(22);
    expect(toSI('temperature', 22, '°C')).toBe(22);
    expect(toSI('temperature', 273.15, 'K')).toBe(0);
  });

  it('converts temperature differences without the offset', () => {
    expect(toSI('temperature_difference', 9, 'degF')).toBe(5);
    expect(temperatureDifferenceToSI(9, '°F')).toBe(5);
    expect(temperatureDifferenceToSI(3, 'degC')).toBe(3);
    expect(temperatureDifferenceToSI(0, 'F')).toBe(0);
    // The trap: as an absolute temperature 9 °F is −12.8 °C, nothing like a 5 °C band.
    expect(toSI('temperature', 9, 'degF')).toBeCloseTo(-12.7778, 4);
  });

  it('converts lengths to metres and times to seconds', () => {
    expect(toSI('length', 12, 'in')).toBe(0.3048);
    expect(toSI('length', 1, 'ft')).toBe(0.3048);
    expect(toSI('length', 25, 'mm')).toBe(0.025);
    expect(toSI('length', 3, 'cm')).toBe(0.03);
    expect(toSI('time', 12, 'min')).toBe(720);
    expect(toSI('time', 24, 'h')).toBe(86400);
    expect(toSI('time', 90, 's')).toBe(90);
  });

  it('accepts symbols regardless of case and surrounding spaces', () => {
    expect(toSI('volume', 250, ' ml ')).toBe(0.00025);
    expect(toSI('mass', 1, 'LB')).toBe(0.45359237);
    expect(toSI('density', 2, 'PCF')).toBe(toSI('density', 2, 'lb/ft3'));
  });

  it('leaves no float junk in the last digits', () => {
    expect(toSI('density', 1.05, 'g/cm3')).toBe(1050);
    expect(toSI('volume', 3, 'cm3')).toBe(3e-6);
  });
});

describe('fromSI and convert', () => {
  it('expresses SI values in shop units', () => {
    expect(fromSI('mass', 0.45359237, 'lb')).toBe(1);
    expect(fromSI('mass', 0.2, 'g')).toBe(200);
    expect(fromSI('density', 48.055390122, 'pcf')).toBeCloseTo(3, 9);
    expect(fromSI('temperature', 100, 'degF')).toBe(212);
    expect(fromSI('temperature_difference', 5, 'degF')).toBe(9);
    expect(temperatureDifferenceFromSI(2, 'K')).toBe(2);
    expect(fromSI('time', 600, 'min')).toBe(10);
  });

  it('converts between two shop units', () => {
    expect(convert('volume', 1, 'gal', 'in3')).toBe(231);
    expect(convert('volume', 1, 'ft3', 'in3')).toBe(1728);
    expect(convert('mass', 1, 'lb', 'oz')).toBe(16);
  });

  it('round-trips every accepted unit of every dimension', () => {
    for (const dimension of DIMENSIONS) {
      for (const unit of acceptedUnits(dimension)) {
        fc.assert(
          fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), (value) => {
            const back = fromSI(dimension, toSI(dimension, value, unit), unit);
            expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(value)) + 1e-12);
          }),
          { numRuns: 50 },
        );
      }
    }
  });
});

describe('UnitError', () => {
  it('names the unit, the dimension and what is accepted', () => {
    let caught: unknown;
    try {
      toSI('mass', 1, 'stone');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(UnitError);
    const error = caught as UnitError;
    expect(error.code).toBe('UNKNOWN_UNIT');
    expect(error.unit).toBe('stone');
    expect(error.dimension).toBe('mass');
    expect(error.accepted).toEqual(['g', 'kg', 'lb', 'oz']);
    expect(error.message).toContain('stone');
  });

  it('rejects a unit of another dimension', () => {
    expect(() => toSI('volume', 1, 'kg')).toThrow(UnitError);
    expect(() => toSI('temperature', 1, 'g')).toThrow(UnitError);
  });

  it('reads "C" and "F" as temperatures only within the temperature dimensions', () => {
    expect(() => toSI('mass', 1, 'C')).toThrow(UnitError);
    expect(() => toSI('length', 1, 'F')).toThrow(UnitError);
  });

  it('rejects empty units, unknown dimensions and non-finite values', () => {
    expect(() => toSI('mass', 1, '')).toThrow(UnitError);
    expect(() => toSI('weight' as never, 1, 'kg')).toThrow(expect.objectContaining({ code: 'UNKNOWN_DIMENSION' }));
    expect(() => toSI('mass', Number.NaN, 'kg')).toThrow(expect.objectContaining({ code: 'VALUE_NOT_FINITE' }));
    expect(() => toSI('mass', Infinity, 'kg')).toThrow(UnitError);
  });
});

describe('catalog', () => {
  it('lists every dimension with its SI unit among the accepted units', () => {
    expect(Object.keys(UNIT_CATALOG).sort()).toEqual([...DIMENSIONS].sort());
    for (const dimension of DIMENSIONS) {
      const symbols = UNIT_CATALOG[dimension].units.map((u) => u.symbol);
      expect(symbols).toContain(SI_UNITS[dimension]);
      expect(UNIT_CATALOG[dimension].si).toBe(SI_UNITS[dimension]);
      for (const unit of UNIT_CATALOG[dimension].units) expect(unit.label.length).toBeGreaterThan(0);
    }
  });

  it('accepts every alias it lists, resolving it to its symbol', () => {
    for (const dimension of DIMENSIONS) {
      for (const unit of UNIT_CATALOG[dimension].units) {
        for (const alias of unit.aliases) expect(resolveUnit(dimension, alias).symbol).toBe(unit.symbol);
      }
    }
  });

  it('is frozen, so no caller can change what is accepted', () => {
    expect(Object.isFrozen(UNIT_CATALOG)).toBe(true);
    expect(Object.isFrozen(UNIT_CATALOG.mass.units)).toBe(true);
  });
});

describe('displayUnits', () => {
  it('gives metric and imperial sets whose units all resolve', () => {
    const metric = displayUnits('metric');
    const imperial = displayUnits('imperial');
    expect(metric.density).toBe('kg/m3');
    expect(imperial.density).toBe('lb/ft3');
    expect(imperial.temperature).toBe('degF');
    for (const dimension of DIMENSIONS) {
      expect(() => resolveUnit(dimension, metric[dimension])).not.toThrow();
      expect(() => resolveUnit(dimension, imperial[dimension])).not.toThrow();
    }
  });

  it('rejects an unknown system', () => {
    expect(() => displayUnits('cgs' as never)).toThrow(RangeError);
  });
});

describe('trimFloat', () => {
  it('cuts binary junk beyond fifteen significant digits', () => {
    expect(trimFloat(0.1 + 0.2)).toBe(0.3);
    expect(trimFloat(999.9999999999999)).toBe(1000);
    expect(trimFloat(0)).toBe(0);
    expect(trimFloat(-2.0000000000000004)).toBe(-2);
  });
});
