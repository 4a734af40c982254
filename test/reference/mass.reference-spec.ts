/**
 * Foam masses that follow from the exact unit definitions (NIST SP 811 / NIST Handbook 44:
 * 1 lb = 0.45359237 kg, 1 in = 0.0254 m).
 */
import { describe, expect, it } from '@jest/globals';
import { computeBatchTargets, fromSI, moldVolume, toSI } from '@pourgate/batching';

describe('a 12 × 12 × 2 in cavity at 3 lb/ft³', () => {
  const side = toSI('length', 12, 'in');
  const depth = toSI('length', 2, 'in');

  it('is 288 in³ = 1/6 ft³ (follows from the definitions)', () => {
    const volume = moldVolume({ cavity: { kind: 'box', length: side, width: side, height: depth } }).cavityVolume;
    expect(fromSI('volume', volume, 'in3')).toBeCloseTo(288, 9);
    expect(fromSI('volume', volume, 'ft3')).toBeCloseTo(1 / 6, 12);
  });

  it('needs exactly 0.5 lb = 226.796 g of foam (follows from the definitions)', () => {
    const volume = moldVolume({ cavity: { kind: 'box', length: side, width: side, height: depth } }).cavityVolume;
    const result = computeBatchTargets({
      system: {
        ratioBasis: 'weight',
        ratio: { a: 100, b: 100 },
        specificGravityA: 1.1,
        specificGravityB: 1.0,
        isocyanatePart: 'A',
        freeRiseDensity: toSI('density', 2, 'pcf'),
        freeRiseReferenceTemperature: 22,
      },
      mold: { volume },
      options: { targetDensity: toSI('density', 3, 'pcf') },
    });
    expect(fromSI('mass', result.foamMass.value, 'lb')).toBeCloseTo(0.5, 12);
    expect(fromSI('mass', result.foamMass.value, 'g')).toBeCloseTo(226.796, 3);
    expect(result.foamMass.value).toBeCloseTo(0.45359237 / 2, 12);
  });
});
