import { describe, expect, it } from 'vitest';
import { previewMoldVolume } from './volumeHelper';

describe('previewMoldVolume', () => {
  it('works out a box in inches exactly (1 in = 0.0254 m, NIST SP 811)', () => {
    const r = previewMoldVolume({ cavity: { kind: 'box', length: { value: 12, unit: 'in' }, width: { value: '12', unit: 'in' }, height: { value: 2, unit: 'in' } } });
    expect(r.ok).toBe(true);
    // 288 in³ × 0.0254³ m³/in³
    if (r.ok) expect(r.volume.totalVolume).toBeCloseTo(288 * 0.0254 ** 3, 12);
  });

  it('takes inserts off each cavity and multiplies by the cavities', () => {
    const r = previewMoldVolume({
      cavity: { kind: 'box', length: { value: 280, unit: 'mm' }, width: { value: 70, unit: 'mm' }, height: { value: 60, unit: 'mm' } },
      inserts: [{ kind: 'entered', volume: { value: 0.12, unit: 'L' } }],
      cavities: '2',
    });
    expect(r.ok && r.volume.cavityVolume).toBeCloseTo(0.001056, 9);
    expect(r.ok && r.volume.totalVolume).toBeCloseTo(0.002112, 9);
  });

  it('turns a water fill into volume with the density of water at its temperature (about 997.0 kg/m³ at 25 °C, CRC handbook)', () => {
    const r = previewMoldVolume({ cavity: { kind: 'water_fill', waterMass: { value: 9.97045, unit: 'kg' }, waterTemperature: { value: 77, unit: 'degF' } } });
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.waterDensity).toBeCloseTo(997.045, 3);
      expect(r.volume.totalVolume).toBeCloseTo(0.01, 6);
    }
  });

  it('says what is missing before every measurement is in, and refuses water outside the table', () => {
    expect(previewMoldVolume({ cavity: { kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: '', unit: 'mm' } } })).toEqual({
      ok: false,
      missing: true,
      message: 'Enter the cavity’s height.',
    });
    const hot = previewMoldVolume({ cavity: { kind: 'water_fill', waterMass: { value: 5, unit: 'kg' }, waterTemperature: { value: 60, unit: 'degC' } } });
    expect(hot.ok).toBe(false);
    if (!hot.ok) expect(hot.message).toMatch(/0–40 °C/);
  });

  it('reports inserts that fill the whole cavity', () => {
    const r = previewMoldVolume({
      cavity: { kind: 'entered', volume: { value: 1, unit: 'L' } },
      inserts: [{ kind: 'entered', volume: { value: 1000, unit: 'mL' } }],
    });
    expect(r).toMatchObject({ ok: false, missing: false });
  });
});
