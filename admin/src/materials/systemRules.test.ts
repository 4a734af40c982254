import { describe, expect, it } from 'vitest';
import { ratioLabel, systemFormValues, type MaterialSystem } from './systemRules';

const record = {
  id: 'ms1', name: 'Demo Flex 28', kind: 'flexible', revision: 2, revisionId: 'r2', revisedAt: '', ratioBasis: 'weight', ratio: { a: 100, b: 55 },
  specificGravityA: 1.04, specificGravityB: 1.22, isocyanatePart: 'B', freeRiseDensityKgM3: 28, freeRiseReferenceTemperatureC: 22, freeRiseDensitySlopeKgM3PerC: null,
  ratioTolerancePercent: 5, componentTemperatureMinC: 18, componentTemperatureMaxC: 27, potLifeS: 75, demoldTimeS: 480, fullCureTimeS: 86400,
  maxPigmentPercent: 5, maxPackFactor: 3.5, exothermMassLimitKg: null, ncoPercent: null, hydroxylNumberMgKohG: null, waterPbw: null, cautionsText: null,
  derived: { weightRatio: { a: 100, b: 55 }, volumeRatio: { a: 117.3, b: 55 }, isocyanateIndex: null }, documents: { sds: 0, tds: 0 }, createdAt: '', updatedAt: '',
} as MaterialSystem;

describe('systemFormValues', () => {
  it('starts the edit form from {value, unit} quantities with times in shop units', () => {
    const v = systemFormValues(record);
    expect(v.freeRiseDensity).toEqual({ value: 28, unit: 'kg/m3' });
    expect(v.potLife).toEqual({ value: 75, unit: 's' });
    expect(v.demoldTime).toEqual({ value: 8, unit: 'min' });
    expect(v.fullCureTime).toEqual({ value: 24, unit: 'h' });
    expect(v.componentTemperatureWindow).toEqual({ min: { value: 18, unit: 'degC' }, max: { value: 27, unit: 'degC' } });
    // empty optional quantities still get a unit, so the person only types a number
    expect(v.freeRiseDensitySlope).toEqual({ value: null, unit: 'kg/m3/degC' });
    expect(v.changeNote).toBe('');
    expect(v).not.toHaveProperty('derived');
  });
});

describe('ratioLabel', () => {
  it('reads the mix ratio with its basis', () => {
    expect(ratioLabel({ ratio: { a: 2, b: 1 }, ratioBasis: 'volume' })).toBe('2 : 1 by volume');
  });
});
