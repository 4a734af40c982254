import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import { all, create } from 'mathjs';
import { DIMENSIONS, fromSI, SI_UNITS, toSI, UNIT_CATALOG, type Dimension } from './units.js';

// The conversions use NIST's exact definitions as factors (units.ts); mathjs's unit definitions are
// an independent second source for every one of them.
const math = create(all, {});
const MATHJS: Record<string, string> = { cm3: 'cm^3', m3: 'm^3', in3: 'in^3', ft3: 'ft^3', 'kg/m3': 'kg/m^3', 'g/cm3': 'g/cm^3', 'lb/ft3': 'lb/ft^3' };
const spelled = (symbol: string) => MATHJS[symbol] ?? symbol;
const absolute = DIMENSIONS.filter((d): d is Exclude<Dimension, 'temperature_difference'> => d !== 'temperature_difference');

describe('unit factors agree with mathjs', () => {
  for (const dimension of absolute) {
    for (const { symbol } of UNIT_CATALOG[dimension].units) {
      it(`${dimension}: ${symbol} to and from ${SI_UNITS[dimension]}`, () => {
        fc.assert(
          fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v) => {
            const expected = math.unit(v, spelled(symbol)).toNumber(spelled(SI_UNITS[dimension]));
            expect(toSI(dimension, v, symbol)).toBeCloseTo(expected, Math.max(0, 9 - Math.ceil(Math.log10(Math.abs(expected) + 1))));
            const back = math.unit(v, spelled(SI_UNITS[dimension])).toNumber(spelled(symbol));
            expect(fromSI(dimension, v, symbol)).toBeCloseTo(back, Math.max(0, 9 - Math.ceil(Math.log10(Math.abs(back) + 1))));
          }),
          { numRuns: 200 },
        );
      });
    }
  }

  it('fixed points of the temperature scales come out exact (common practice)', () => {
    expect(toSI('temperature', 32, 'degF')).toBe(0);
    expect(toSI('temperature', 212, 'degF')).toBe(100);
    expect(toSI('temperature', 273.15, 'K')).toBe(0);
    expect(fromSI('temperature', 100, 'degF')).toBe(212);
    expect(fromSI('temperature', -40, 'degF')).toBe(-40);
  });
});
