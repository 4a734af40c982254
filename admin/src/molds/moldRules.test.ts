import { describe, expect, it } from 'vitest';
import { writeBody } from '../dataProvider/writeBodies';
import { blankMeasurement, measurementText, moldFormValues, type Mold } from './moldRules';

describe('measurementText', () => {
  it('reads a mold the way it was measured', () => {
    expect(measurementText({ kind: 'box', length: { value: 280, unit: 'mm' }, width: { value: 70, unit: 'mm' }, height: { value: 60, unit: 'mm' } })).toBe('Box 280 × 70 × 60 mm');
    expect(measurementText({ kind: 'water_fill', waterMass: { value: 14.2, unit: 'kg' }, waterTemperature: { value: 21, unit: 'degC' } })).toBe('Water fill 14.2 kg at 21 °C');
    expect(measurementText({ kind: 'cylinder', diameter: { value: 3.75, unit: 'in' }, height: { value: 115, unit: 'mm' } })).toBe('Cylinder 3.75 in × 115 mm');
  });
});

describe('moldFormValues', () => {
  it('keeps the measurement and still sends only what its kind takes', () => {
    const mold = { id: 'm1', name: 'Cup', code: 'CUP-1', cavity: { kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: 115, unit: 'mm' } }, inserts: [], cavities: 1 } as unknown as Mold;
    const v = moldFormValues(mold);
    expect((v.cavity as Record<string, unknown>).waterMass).toEqual({ value: null, unit: 'kg' });
    expect((writeBody('molds', 'update', v) as { cavity: unknown }).cavity).toEqual({ kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: 115, unit: 'mm' } });
  });
  it('offers inch units for imperial people', () => {
    expect(blankMeasurement('box', false).length).toEqual({ value: null, unit: 'in' });
  });
});
