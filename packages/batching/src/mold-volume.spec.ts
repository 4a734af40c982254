import { describe, expect, it } from '@jest/globals';
import { BatchingInputError } from './errors.js';
import {
  WATER_DENSITY_TABLE,
  boxVolume,
  cylinderVolume,
  measuredVolume,
  moldVolume,
  waterDensity,
  waterFillVolume,
} from './mold-volume.js';

/** Kell (1975), J. Chem. Eng. Data 20, 97, eq. 16: the formulation the table was drawn from. */
function kell(t: number): number {
  const numerator =
    999.83952 + 16.945176 * t - 7.9870401e-3 * t ** 2 - 46.170461e-6 * t ** 3 + 105.56302e-9 * t ** 4 - 280.54253e-12 * t ** 5;
  return numerator / (1 + 16.87985e-3 * t);
}

describe('water density table', () => {
  it('has one row per whole °C from 0 to 40, each matching Kell to the table precision', () => {
    expect(WATER_DENSITY_TABLE).toHaveLength(41);
    WATER_DENSITY_TABLE.forEach(([t, density], i) => {
      expect(t).toBe(i);
      expect(Math.abs(density - kell(t))).toBeLessThanOrEqual(0.0005);
    });
  });

  it('peaks at 4 °C, as water does', () => {
    const densest = WATER_DENSITY_TABLE.reduce((best, row) => (row[1] > best[1] ? row : best));
    expect(densest[0]).toBe(4);
  });
});

describe('waterDensity', () => {
  it('returns the table rows at whole degrees', () => {
    expect(waterDensity(20)).toBe(998.204);
    expect(waterDensity(0)).toBe(999.84);
    expect(waterDensity(40)).toBe(992.216);
  });

  it('interpolates between rows, staying within 0.003 kg/m³ of the formulation', () => {
    expect(waterDensity(20.5)).toBeCloseTo((998.204 + 997.992) / 2, 9);
    for (let t = 0; t <= 40; t += 0.37) expect(Math.abs(waterDensity(t) - kell(t))).toBeLessThan(0.003);
  });

  it('refuses temperatures outside the table', () => {
    expect(() => waterDensity(-0.1)).toThrow(RangeError);
    expect(() => waterDensity(40.1)).toThrow(RangeError);
    expect(() => waterDensity(Number.NaN)).toThrow(RangeError);
  });
});

describe('shape volumes', () => {
  it('multiplies the sides of a box', () => {
    expect(boxVolume(0.3, 0.2, 0.05)).toBeCloseTo(0.003, 15);
  });

  it('uses π d²/4 × h for a cylinder', () => {
    expect(cylinderVolume(0.1, 0.2)).toBeCloseTo(0.0015707963, 10);
  });

  it('divides the water mass by the water density at its temperature', () => {
    expect(waterFillVolume(0.998204, 20)).toBeCloseTo(0.001, 12);
    // The same mass of colder, denser water is a smaller volume.
    expect(waterFillVolume(1, 4)).toBeLessThan(waterFillVolume(1, 25));
  });

  it('rejects zero, negative and non-finite sizes', () => {
    expect(() => boxVolume(0, 1, 1)).toThrow(RangeError);
    expect(() => cylinderVolume(1, -1)).toThrow(RangeError);
    expect(() => waterFillVolume(Number.POSITIVE_INFINITY, 20)).toThrow(RangeError);
    expect(() => measuredVolume({ kind: 'entered', volume: 0 })).toThrow(RangeError);
  });
});

describe('moldVolume', () => {
  it('subtracts the inserts and multiplies by the cavities', () => {
    const result = moldVolume({
      cavity: { kind: 'box', length: 0.4, width: 0.3, height: 0.1 },
      inserts: [{ kind: 'entered', volume: 0.002 }, { kind: 'cylinder', diameter: 0.1, height: 0.1 }],
      cavities: 2,
    });
    expect(result.grossCavityVolume).toBeCloseTo(0.012, 12);
    expect(result.insertVolume).toBeCloseTo(0.002 + Math.PI * 0.00025, 12);
    expect(result.cavityVolume).toBeCloseTo(0.012 - 0.002 - Math.PI * 0.00025, 12);
    expect(result.cavities).toBe(2);
    expect(result.totalVolume).toBeCloseTo(2 * result.cavityVolume, 12);
  });

  it('defaults to one cavity without inserts', () => {
    const result = moldVolume({ cavity: { kind: 'entered', volume: 0.0025 } });
    expect(result).toEqual({ grossCavityVolume: 0.0025, insertVolume: 0, cavityVolume: 0.0025, cavities: 1, totalVolume: 0.0025 });
  });

  it('takes a water fill', () => {
    const result = moldVolume({ cavity: { kind: 'water_fill', waterMass: 1.99641, waterTemperature: 20 } });
    expect(result.cavityVolume).toBeCloseTo(0.002, 8);
  });

  function issuesOf(run: () => unknown): { pointer: string; code: string }[] {
    try {
      run();
    } catch (error) {
      if (error instanceof BatchingInputError) return error.issues.map(({ pointer, code }) => ({ pointer, code }));
      throw error;
    }
    throw new Error('expected a BatchingInputError');
  }

  it('points at every bad field under the given base', () => {
    const issues = issuesOf(() =>
      moldVolume(
        {
          cavity: { kind: 'box', length: 0.3, width: -1, height: 0 },
          inserts: [{ kind: 'water_fill', waterMass: 1, waterTemperature: 60 }],
          cavities: 1.5,
        },
        '/geometry',
      ),
    );
    expect(issues).toEqual([
      { pointer: '/geometry/cavity/width', code: 'must_be_positive' },
      { pointer: '/geometry/cavity/height', code: 'must_be_positive' },
      { pointer: '/geometry/inserts/0/waterTemperature', code: 'out_of_range' },
      { pointer: '/geometry/cavities', code: 'not_an_integer' },
    ]);
  });

  it('rejects an unknown measurement kind and inserts that fill the cavity', () => {
    expect(issuesOf(() => moldVolume({ cavity: { kind: 'sphere' } as never }))).toEqual([
      { pointer: '/cavity/kind', code: 'not_allowed' },
    ]);
    expect(
      issuesOf(() => moldVolume({ cavity: { kind: 'entered', volume: 0.001 }, inserts: [{ kind: 'entered', volume: 0.001 }] })),
    ).toEqual([{ pointer: '/inserts', code: 'inserts_exceed_cavity' }]);
  });
});
