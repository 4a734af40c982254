import { describe, expect, it } from '@jest/globals';
import { inDisplayUnits } from './display.js';

// NIST SP 811 appendix B: 1 lb = 0.45359237 kg, 1 in = 0.0254 m; t/°F = 1.8 t/°C + 32.
describe('inDisplayUnits', () => {
  it('shows SI quantities in imperial units with the SI value beside them', () => {
    const shown = inDisplayUnits({ foamMass: { value: 0.45359237, unit: 'kg' }, cavityVolume: { value: 0.0254 ** 3, unit: 'm3' }, t: { value: 100, unit: 'degC' } }, 'imperial') as Record<string, { value: number; unit: string; si: unknown }>;
    expect(shown.foamMass.unit).toBe('lb');
    expect(shown.foamMass.value).toBeCloseTo(1, 14);
    expect(shown.foamMass.si).toEqual({ value: 0.45359237, unit: 'kg' });
    expect(shown.cavityVolume).toMatchObject({ unit: 'in3' });
    expect(shown.cavityVolume.value).toBeCloseTo(1, 12);
    expect(shown.t.value).toBeCloseTo(212, 12);
  });

  it('leaves pure numbers alone and gives warnings a display twin of their SI figures', () => {
    const shown = inDisplayUnits({ packFactor: { value: 2, unit: '1' }, warnings: [{ code: 'X', measured: 1, limit: 2, unit: 'kg' }, { code: 'Y', measured: 3, limit: 0, unit: 'd' }] }, 'metric') as {
      packFactor: unknown;
      warnings: { display?: { measured: number; limit: number; unit: string } }[];
    };
    expect(shown.packFactor).toEqual({ value: 2, unit: '1' });
    expect(shown.warnings[0]!.display).toEqual({ measured: 1000, limit: 2000, unit: 'g' });
    expect(shown.warnings[1]!.display).toBeUndefined();
  });
});
