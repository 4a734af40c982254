/**
 * Density of air-free water at 101.325 kPa. Table drawn from Kell, J. Chem. Eng. Data 20 (1975) 97,
 * eq. 16; values checked against the CRC Handbook of Chemistry and Physics water density table
 * ("Properties of water in the range 0–100 °C"; the five-digit g/cm³ values are from memory).
 */
import { describe, expect, it } from '@jest/globals';
import { WATER_DENSITY_TABLE, waterDensity, waterFillVolume } from '@pourgate/batching';

describe('water density', () => {
  it('4 °C ≈ 999.97 kg/m³ (CRC: 0.99997 g/cm³), the maximum', () => {
    expect(waterDensity(4)).toBeCloseTo(999.97, 2);
    expect(Math.max(...WATER_DENSITY_TABLE.map(([, d]) => d))).toBe(waterDensity(4));
  });

  it('20 °C ≈ 998.2 kg/m³ (CRC: 0.99821 g/cm³)', () => {
    expect(waterDensity(20)).toBeCloseTo(998.2, 1);
    expect(Math.abs(waterDensity(20) - 998.21)).toBeLessThan(0.01);
  });

  it('0 °C 0.99984, 25 °C 0.99705, 40 °C 0.99222 g/cm³ (CRC, from memory)', () => {
    expect(Math.abs(waterDensity(0) - 999.84)).toBeLessThan(0.005);
    expect(Math.abs(waterDensity(25) - 997.05)).toBeLessThan(0.006);
    expect(Math.abs(waterDensity(40) - 992.22)).toBeLessThan(0.005);
  });

  it('a water fill of 998.2 g at 20 °C is 1.000 L', () => {
    expect(waterFillVolume(0.9982, 20) * 1000).toBeCloseTo(1.0, 4);
  });
});
