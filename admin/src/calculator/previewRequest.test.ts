import { describe, expect, it } from 'vitest';
import { buildPreview, fieldOfPointer, initialForm, parseNumber } from './previewRequest';

const SYSTEM = '232486a9-2ab9-48dd-ab20-9feab51559c0';
const MOLD = '6b8a789d-819f-457f-8a39-99e2f2d1298a';

describe('parseNumber', () => {
  it('reads decimals with a point or a comma and refuses words', () => {
    expect(parseNumber(' 1.8 ')).toBe(1.8);
    expect(parseNumber('1,8')).toBe(1.8);
    expect(parseNumber('')).toBeUndefined();
    expect(parseNumber('abc')).toBeNaN();
  });
});

describe('buildPreview', () => {
  it('asks for a system and a mold before anything is sent', () => {
    const r = buildPreview(initialForm('metric'));
    expect(r.body).toBeNull();
    expect(r.missing).toEqual(['a material system', 'a mold']);
  });

  it('sends a stored system and mold by id, with only the options given', () => {
    const r = buildPreview({ ...initialForm('metric'), systemId: SYSTEM, moldId: MOLD, densityMode: 'pack', packFactor: '1.8', pigmentPercent: '2' });
    expect(r.body).toEqual({ system: { id: SYSTEM }, mold: { id: MOLD }, options: { packFactor: 1.8, pigmentPercent: 2 } });
  });

  it('sends a typed box in the chosen length unit with its cavities', () => {
    const f = { ...initialForm('imperial'), systemId: SYSTEM, subject: 'dimensions' as const, length: '12', width: '12', height: '2', cavities: '2', densityMode: 'density' as const, targetDensity: '3' };
    expect(buildPreview(f).body).toEqual({
      system: { id: SYSTEM },
      mold: { cavity: { kind: 'box', length: { value: 12, unit: 'in' }, width: { value: 12, unit: 'in' }, height: { value: 2, unit: 'in' } }, cavities: 2 },
      options: { targetDensity: { value: 3, unit: 'lb/ft3' } },
    });
  });

  it('sends a cylinder as diameter and height only', () => {
    const f = { ...initialForm('metric'), systemId: SYSTEM, subject: 'dimensions' as const, shape: 'cylinder' as const, diameter: '95', height: '115', length: '999' };
    expect((buildPreview(f).body as { mold: { cavity: unknown } }).mold.cavity).toEqual({ kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: 115, unit: 'mm' } });
  });

  it('sends a free-rise cup and the component temperature in its unit', () => {
    const f = { ...initialForm('metric'), systemId: SYSTEM, subject: 'cup' as const, cupVolume: '1', componentTemperature: '24' };
    expect(buildPreview(f).body).toEqual({ system: { id: SYSTEM }, freeRiseCup: { volume: { value: 1, unit: 'L' } }, options: { componentTemperature: { value: 24, unit: 'degC' } } });
  });

  it('holds back a request with text where a number belongs, naming the field', () => {
    const r = buildPreview({ ...initialForm('metric'), systemId: SYSTEM, moldId: MOLD, pigmentPercent: 'two' });
    expect(r.body).toBeNull();
    expect(r.invalid).toEqual(['pigmentPercent']);
  });

  it('names the dimensions still missing', () => {
    const r = buildPreview({ ...initialForm('metric'), systemId: SYSTEM, subject: 'dimensions', length: '100' });
    expect(r.missing).toEqual(['the width', 'the height']);
  });
});

describe('fieldOfPointer', () => {
  it('puts the API’s field errors next to the right input', () => {
    expect(fieldOfPointer('/mold/cavity/length')).toBe('length');
    expect(fieldOfPointer('/options/targetDensity/value')).toBe('targetDensity');
    expect(fieldOfPointer('/system/id')).toBe('systemId');
    expect(fieldOfPointer('/options/lots/A')).toBeNull();
  });
});
