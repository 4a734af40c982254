import { describe, expect, it } from '@jest/globals';
import {
  expectedFreeRiseDensity,
  fitFreeRiseDensity,
  freeRiseDensityFromSlope,
  impliedPackFactor,
  packedDensity,
  targetDensity,
} from './density.js';

describe('packed density and pack factor', () => {
  it('multiplies the free-rise density by the pack factor', () => {
    expect(packedDensity(40, 1.5)).toBe(60);
  });

  it('divides a molded density by the free-rise density', () => {
    expect(impliedPackFactor(60, 40)).toBe(1.5);
  });

  it('resolves a target from either the density or the pack factor', () => {
    expect(targetDensity(40, { density: 50 })).toEqual({ density: 50, packFactor: 1.25, givenAs: 'density' });
    expect(targetDensity(40, { packFactor: 1.25 })).toEqual({ density: 50, packFactor: 1.25, givenAs: 'pack_factor' });
  });

  it('rejects zero and negative inputs', () => {
    expect(() => packedDensity(0, 1)).toThrow(RangeError);
    expect(() => packedDensity(40, -1)).toThrow(RangeError);
    expect(() => impliedPackFactor(60, Number.NaN)).toThrow(RangeError);
  });
});

describe('freeRiseDensityFromSlope', () => {
  const reference = { density: 48, temperature: 22, slope: -0.4 };

  it('moves the reference density along the slope', () => {
    expect(freeRiseDensityFromSlope(reference, 27)).toBeCloseTo(46, 12);
    expect(freeRiseDensityFromSlope(reference, 17)).toBeCloseTo(50, 12);
    expect(freeRiseDensityFromSlope(reference, 22)).toBe(48);
  });

  it('keeps the reference density when no slope is known', () => {
    expect(freeRiseDensityFromSlope({ density: 48, temperature: 22 }, 30)).toBe(48);
  });
});

describe('fitFreeRiseDensity', () => {
  it('recovers an exact line with r² = 1 and no spread', () => {
    const points = [18, 20, 22, 24, 26].map((t) => ({ temperature: t, density: 60 - 0.5 * t }));
    const fit = fitFreeRiseDensity(points)!;
    expect(fit.slope).toBeCloseTo(-0.5, 12);
    expect(fit.intercept).toBeCloseTo(60, 10);
    expect(fit.rSquared).toBeCloseTo(1, 12);
    expect(fit.residualStandardDeviation).toBeCloseTo(0, 10);
    expect(fit.count).toBe(5);
  });

  it('matches a least-squares fit worked by hand', () => {
    // x = 20, 22, 24; y = 50, 49, 47.  x̄ = 22, ȳ = 48.667; Sxy = −6, Sxx = 8 → slope −0.75,
    // intercept 48.667 + 0.75 × 22 = 65.167; residuals −0.1667, +0.3333, −0.1667 → SSE = 1/6,
    // s = √(SSE / 1) = 0.40825; SST = 4.6667 → r² = 1 − (1/6)/4.6667 = 0.96429.
    const fit = fitFreeRiseDensity([
      { temperature: 20, density: 50 },
      { temperature: 22, density: 49 },
      { temperature: 24, density: 47 },
    ])!;
    expect(fit.slope).toBeCloseTo(-0.75, 12);
    expect(fit.intercept).toBeCloseTo(65.1666667, 6);
    expect(fit.residualStandardDeviation).toBeCloseTo(0.40825, 5);
    expect(fit.rSquared).toBeCloseTo(0.964286, 6);
    expect(fit.count).toBe(3);
  });

  it('gives no fit below three cups or at a single temperature', () => {
    expect(fitFreeRiseDensity([{ temperature: 20, density: 50 }, { temperature: 24, density: 48 }])).toBeNull();
    expect(fitFreeRiseDensity([20, 20, 20].map((t, i) => ({ temperature: t, density: 48 + i })))).toBeNull();
  });

  it('drops unusable points before counting', () => {
    expect(
      fitFreeRiseDensity([
        { temperature: 20, density: 50 },
        { temperature: 22, density: Number.NaN },
        { temperature: 24, density: 48 },
      ]),
    ).toBeNull();
  });

  it('reports r² as null when every cup gave the same density', () => {
    const fit = fitFreeRiseDensity([20, 22, 24].map((t) => ({ temperature: t, density: 48 })))!;
    expect(fit.slope).toBe(0);
    expect(fit.rSquared).toBeNull();
  });
});

describe('expectedFreeRiseDensity', () => {
  const reference = { density: 48, temperature: 22, slope: -0.4 };

  it('prefers the cup-test fit when there are enough cups over a real span', () => {
    const cups = [18, 20, 22, 24, 26].map((t) => ({ temperature: t, density: 70 - t }));
    const expected = expectedFreeRiseDensity(reference, 25, cups);
    expect(expected.method).toBe('cup_test_fit');
    expect(expected.density).toBeCloseTo(45, 10);
    expect(expected.fit?.count).toBe(5);
  });

  it('does not trust three cups, a narrow span, a poor fit, a rising line, or extrapolation', () => {
    const line = (ts: number[], f = (t: number) => 70 - t) => ts.map((t) => ({ temperature: t, density: f(t) }));
    expect(expectedFreeRiseDensity(reference, 25, line([18, 22, 26])).fitRejected).toBe('too_few_points');
    // 22.0, 22.1, 22.2 °C fitting +15 kg/m³/°C: at 30 °C that line would say 164 kg/m³
    const narrow = expectedFreeRiseDensity(reference, 30, [...line([22.0, 22.1, 22.2], (t) => 48 + 15 * (t - 22)), ...line([22.1, 22.0], (t) => 48 + 15 * (t - 22))]);
    expect(narrow).toMatchObject({ method: 'system_slope', fitRejected: 'narrow_span' });
    expect(narrow.density).toBeCloseTo(48 - 0.4 * 8, 10);
    expect(expectedFreeRiseDensity(reference, 22, line([18, 20, 22, 24, 26], (t) => (t % 4 === 0 ? 60 : 40))).fitRejected).toBe('poor_fit');
    expect(expectedFreeRiseDensity(reference, 22, line([18, 20, 22, 24, 26], (t) => 30 + t)).fitRejected).toBe('unexpected_sign');
    const far = expectedFreeRiseDensity(reference, 29, line([18, 20, 22, 24, 26]));
    expect(far).toMatchObject({ method: 'system_slope', fitRejected: 'outside_tested_span' });
    expect(far.methodReason).toMatch(/more than 2 °C outside the span/);
    expect(expectedFreeRiseDensity(reference, 28, line([18, 20, 22, 24, 26])).method).toBe('cup_test_fit');
  });

  it('falls back to the system slope with fewer than three cups', () => {
    const expected = expectedFreeRiseDensity(reference, 25, [{ temperature: 20, density: 50 }]);
    expect(expected.method).toBe('system_slope');
    expect(expected.density).toBeCloseTo(46.8, 12);
    expect(expected.fit).toBeNull();
  });

  it('says reference only when there is no slope', () => {
    const expected = expectedFreeRiseDensity({ density: 48, temperature: 22 }, 25);
    expect(expected).toMatchObject({ density: 48, temperature: 25, method: 'reference_only', fit: null, fitRejected: null });
  });
});
