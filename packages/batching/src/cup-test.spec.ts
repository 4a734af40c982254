import { describe, expect, it } from '@jest/globals';
import { densityAtReference, judgeCupTest } from './cup-test.js';

// ASTM D7487 terms (cream, rise / top-of-cup, tack-free times; free-rise density). The window and
// band are invented test data; the correction ρ_ref = ρ − slope × (T − T_ref) is the straight-line
// density model the system states.
const spec = { creamTimeWindow: { min: 8, max: 14 }, riseTimeWindow: { min: 60, max: 90 }, tackFreeTimeWindow: { min: 90, max: 150 }, freeRiseDensityBand: { min: 26, max: 30 }, referenceTemperature: 22, slope: -0.25 };

describe('judgeCupTest', () => {
  it('passes a cup inside the window and band', () => {
    expect(judgeCupTest({ temperature: 22, creamTime: 10, riseTime: 75, tackFreeTime: 120, freeRiseDensity: 28 }, spec)).toMatchObject({ verdict: 'passed', findings: [], correctedDensity: 28 });
  });

  it('corrects the density to the reference temperature before comparing it with the band', () => {
    // at 30 °C a cup of 25 kg/m³ corresponds to 25 + 0.25 × 8 = 27 kg/m³ at 22 °C: inside 26–30
    expect(densityAtReference(25, 30, spec)).toBeCloseTo(27, 12);
    expect(judgeCupTest({ temperature: 30, freeRiseDensity: 25 }, spec).verdict).toBe('passed');
    const cold = judgeCupTest({ temperature: 14, freeRiseDensity: 33 }, spec);
    // 33 − 0.25 × 8 = 31 kg/m³: above the band
    expect(cold.findings.map((f) => f.code)).toEqual(['FREE_RISE_DENSITY_ABOVE_BAND']);
    expect(cold.correctedDensity).toBeCloseTo(31, 9);
  });

  it('fails a slow lot on each time outside its window, with the edge crossed', () => {
    const slow = judgeCupTest({ temperature: 22, creamTime: 16, riseTime: 95, tackFreeTime: 160, freeRiseDensity: 28 }, spec);
    expect(slow.verdict).toBe('failed');
    expect(slow.findings.map((f) => [f.code, f.limit])).toEqual([['CREAM_TIME_ABOVE_WINDOW', 14], ['RISE_TIME_ABOVE_WINDOW', 90], ['TACK_FREE_TIME_ABOVE_WINDOW', 150]]);
    expect(slow.findings[0]!.message).toBe('Cream time 16 s is above the window of 8–14 s: the lot reacts slower than the system should (aged or moist components, cold material).');
  });

  it('does not judge without a window or band', () => {
    expect(judgeCupTest({ temperature: 22, freeRiseDensity: 28 }, { referenceTemperature: 22 }).verdict).toBe('not_judged');
  });
});
