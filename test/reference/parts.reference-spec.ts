/**
 * The finished part's figures against published definitions. Each check names its source beside it.
 */
import { describe, expect, it } from '@jest/globals';
import { densityOf, forceToNewtons, specimenVolume, toSI } from '@pourgate/batching';

describe('density of a part and of a specimen (ASTM D3574 Test A; ISO 845: apparent density = mass ÷ volume)', () => {
  it('a 50 × 50 × 25 mm core specimen of 2.5 g has 40 kg/m³', () => {
    // ISO 845 computes the apparent density from the mass and the volume of a specimen of regular shape
    expect(densityOf(0.0025, specimenVolume(0.05, 0.05, 0.025))).toBeCloseTo(40, 12);
  });

  it('a part of 1 lb in a 0.5 ft³ cavity has 2 lb/ft³ = 32.036926 kg/m³ (NIST SP 811 Appendix B: 1 lb/ft³ = 16.018 46 kg/m³)', () => {
    const kgM3 = densityOf(toSI('mass', 1, 'lb'), toSI('volume', 0.5, 'ft3'));
    expect(kgM3).toBeCloseTo(2 * 16.01846, 4);
  });
});

describe('force (NIST SP 811 Appendix B.8: 1 lbf = 4.448 222 N)', () => {
  it('an indentation force of 50 lbf is 222.4111 N', () => {
    expect(forceToNewtons(50, 'lbf')).toBeCloseTo(222.4111, 4);
  });
});
