/**
 * Facts of the trade, marked "common practice", and defaults marked "from memory / conservative".
 */
import { describe, expect, it } from '@jest/globals';
import {
  DEFAULT_EXOTHERM_MASS_LIMIT,
  DEFAULT_RATIO_TOLERANCE_PERCENT,
  computeBatchTargets,
  toSI,
  type MaterialSystemParameters,
} from '@pourgate/batching';

const system: MaterialSystemParameters = {
  ratioBasis: 'weight',
  ratio: { a: 100, b: 100 },
  specificGravityA: 1.1,
  specificGravityB: 1.0,
  isocyanatePart: 'A',
  freeRiseDensity: 40,
  freeRiseReferenceTemperature: 22,
};

describe('common practice', () => {
  it('±5 % is the default ratio tolerance (common practice)', () => {
    expect(DEFAULT_RATIO_TOLERANCE_PERCENT).toBe(5);
    expect(computeBatchTargets({ system, mold: { volume: 0.001 }, options: { packFactor: 1.2 } }).ratioTolerancePercent).toBe(5);
  });

  it('pigment at 2 % of A+B is near 2 % of the total weight (common practice: pigment around 2 %)', () => {
    const result = computeBatchTargets({ system, mold: { volume: 0.002 }, options: { packFactor: 1.2, pigmentPercent: 2 } });
    const share = result.components.pigment.massUnrounded.value / result.mixedMass.value;
    expect(share).toBeCloseTo(2 / 102, 12);
    expect(Math.abs(share - 0.02)).toBeLessThan(0.001);
  });

  it('components conditioned near 22 °C (72 °F) sit inside a typical 20–25 °C window (common practice)', () => {
    const at72F = toSI('temperature', 72, 'degF');
    const result = computeBatchTargets({
      system: { ...system, componentTemperatureWindow: { min: 20, max: 25 } },
      mold: { volume: 0.001 },
      options: { packFactor: 1.2, componentTemperature: at72F },
    });
    expect(at72F).toBeCloseTo(22.2, 1);
    expect(result.warnings.map((w) => w.code)).not.toContain('COMPONENT_TEMPERATURE_OUTSIDE_WINDOW');
  });

  it('demold in about 10–15 minutes for fast flexible systems is 600–900 s (common practice)', () => {
    expect(toSI('time', 10, 'min')).toBe(600);
    expect(toSI('time', 15, 'min')).toBe(900);
  });

  it('a 2 kg single pour is the exotherm default (from memory / conservative; the supplier\'s TDS/SDS governs)', () => {
    expect(DEFAULT_EXOTHERM_MASS_LIMIT).toBe(2);
    const large = computeBatchTargets({ system, mold: { volume: 0.05 }, options: { packFactor: 1.2 } });
    expect(large.mixedMass.value).toBeGreaterThan(2);
    expect(large.warnings.find((w) => w.code === 'EXOTHERM_RISK_MASS')?.severity).toBe('danger');
  });
});

describe('ASTM D7487 (polyurethane foam cup test) terms', () => {
  it('a free-rise cup rises unconstrained: its pack factor is 1 and its density the free-rise density', () => {
    const result = computeBatchTargets({ system, freeRiseCup: { volume: 0.001 } });
    expect(result.packFactor.value).toBe(1);
    expect(result.targetDensity.value).toBe(system.freeRiseDensity);
  });
});
