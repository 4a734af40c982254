import { describe, expect, it } from '@jest/globals';
import { STANDARD_CAUTIONS } from './cautions.js';
import { BatchingInputError } from './errors.js';
import { judgeRatio } from './ratio.js';
import { computeBatchTargets, validateBatchTargetsInput, type BatchTargetsInput, type MaterialSystemParameters } from './targets.js';
import { COMPUTATION_VERSION } from './version.js';

const LB = 0.45359237;
const IN = 0.0254;
const PCF = LB / (12 * IN) ** 3;

/** Invented demo system: 100:100 by weight, A the isocyanate. */
const system: MaterialSystemParameters = {
  ratioBasis: 'weight',
  ratio: { a: 100, b: 100 },
  specificGravityA: 1.1,
  specificGravityB: 1.0,
  isocyanatePart: 'A',
  freeRiseDensity: 2 * PCF,
  freeRiseReferenceTemperature: 22,
};

const mold12x12x2 = { volume: 12 * IN * 12 * IN * 2 * IN };

function base(overrides: Partial<BatchTargetsInput> = {}): BatchTargetsInput {
  return { system, mold: mold12x12x2, options: { targetDensity: 3 * PCF }, ...overrides };
}

function issuesOf(input: BatchTargetsInput): string[] {
  try {
    computeBatchTargets(input);
  } catch (error) {
    if (error instanceof BatchingInputError) return error.issues.map((i) => i.pointer);
    throw error;
  }
  throw new Error('expected a BatchingInputError');
}

describe('computeBatchTargets: masses', () => {
  it('gives 0.5 lb of foam for a 12 × 12 × 2 in cavity at 3 pcf, split 1:1 and rounded to the scale', () => {
    const result = computeBatchTargets(base({ options: { targetDensity: 3 * PCF, scale: { readability: 0.0001 } } }));
    expect(result.foamMass.value).toBeCloseTo(LB / 2, 12);
    expect(result.foamMass.unit).toBe('kg');
    expect(result.mixedMass.value).toBeCloseTo(LB / 2, 12);
    expect(result.components.A.mass).toEqual({ value: 0.1134, unit: 'kg' });
    expect(result.components.B.mass).toEqual({ value: 0.1134, unit: 'kg' });
    expect(result.components.A.massUnrounded.value).toBeCloseTo(LB / 4, 12);
    expect(result.totalMass).toEqual({ value: 0.2268, unit: 'kg' });
    expect(result.packFactor.value).toBeCloseTo(1.5, 12);
    expect(result.densityBasis).toBe('target_density');
    expect(result.scaleReadability).toEqual({ value: 0.0001, unit: 'kg' });
  });

  it('derives the density from a pack factor, or from the mold default', () => {
    const fromPack = computeBatchTargets(base({ options: { packFactor: 1.5 } }));
    expect(fromPack.targetDensity.value).toBeCloseTo(3 * PCF, 10);
    expect(fromPack.densityBasis).toBe('pack_factor');
    const fromMold = computeBatchTargets(base({ mold: { ...mold12x12x2, defaultPackFactor: 1.5 }, options: {} }));
    expect(fromMold.targetDensity.value).toBeCloseTo(3 * PCF, 10);
    expect(fromMold.densityBasis).toBe('mold_default_pack_factor');
  });

  it('multiplies the volume by the cavities', () => {
    const result = computeBatchTargets(base({ mold: { ...mold12x12x2, cavities: 4 } }));
    expect(result.cavities).toBe(4);
    expect(result.totalVolume.value).toBeCloseTo(4 * mold12x12x2.volume, 15);
    expect(result.foamMass.value).toBeCloseTo(2 * LB, 12);
  });

  it('grosses up by overfill (×) and retention (÷), and pigment rides inside the mixed mass', () => {
    const result = computeBatchTargets(
      base({ options: { targetDensity: 3 * PCF, overfillPercent: 10, retentionPercent: 5, pigmentPercent: 2 } }),
    );
    const mixed = ((LB / 2) * 1.1) / 0.95;
    expect(result.mixedMass.value).toBeCloseTo(mixed, 12);
    const { A, B, pigment } = result.components;
    expect(A.mass.value + B.mass.value + pigment.mass.value).toBeCloseTo(mixed, 12);
    expect(pigment.mass.value / (A.mass.value + B.mass.value)).toBeCloseTo(0.02, 12);
    expect(result.allowances).toEqual({
      overfillPercent: 10,
      retentionPercent: 5,
      convention: { overfill: 'multiplicative', retention: 'delivered' },
    });
  });

  it('follows another allowance convention when given one', () => {
    const result = computeBatchTargets(
      base({
        options: { targetDensity: 3 * PCF, retentionPercent: 5, allowanceConvention: { overfill: 'multiplicative', retention: 'multiplicative' } },
      }),
    );
    expect(result.mixedMass.value).toBeCloseTo((LB / 2) * 1.05, 12);
  });

  it('leaves masses unrounded without a scale', () => {
    const result = computeBatchTargets(base());
    expect(result.components.A.mass.value).toBe(result.components.A.massUnrounded.value);
    expect(result.scaleReadability).toBeNull();
  });
});

describe('computeBatchTargets: ratio', () => {
  it('converts a volume ratio to weight with the SGs and gives volumes for dispensing', () => {
    const result = computeBatchTargets(
      base({ system: { ...system, ratioBasis: 'volume', specificGravityA: 1.23, specificGravityB: 1.05 } }),
    );
    expect(result.weightRatio.a).toBeCloseTo(117.142857, 6);
    expect(result.weightRatio.b).toBe(100);
    expect(result.volumeRatio).toEqual({ a: 100, b: 100 });
    const { A, B } = result.components;
    expect(A.volume!.value).toBeCloseTo(B.volume!.value, 15);
    expect(A.volume!.unit).toBe('m3');
    expect(A.volume!.value).toBeCloseTo(A.massUnrounded.value / 1230, 15);
  });

  it('gives no volumes for a weight-ratio system, but reports its volume ratio', () => {
    const result = computeBatchTargets(base());
    expect(result.components.A.volume).toBeNull();
    expect(result.volumeRatio.a).toBeCloseTo((100 * 1.0) / 1.1, 9);
  });

  it('gives tolerance bands whose edges judge as just within tolerance', () => {
    const result = computeBatchTargets(base({ system: { ...system, ratio: { a: 100, b: 45 } } }));
    const { A, B } = result.components;
    expect(A.toleranceBand.low.value).toBeCloseTo(A.massUnrounded.value * 0.95, 15);
    expect(B.toleranceBand.high.value).toBeCloseTo(B.massUnrounded.value / 0.95, 15);
    const judge = (massA: number, massB: number) =>
      judgeRatio({ massA, massB, target: result.weightRatio, tolerancePercent: result.ratioTolerancePercent, isocyanatePart: 'A' });
    expect(judge(A.toleranceBand.high.value, B.massUnrounded.value).withinTolerance).toBe(true);
    expect(judge(A.toleranceBand.low.value, B.massUnrounded.value).withinTolerance).toBe(true);
    expect(judge(A.massUnrounded.value, B.toleranceBand.low.value).withinTolerance).toBe(true);
    expect(judge(A.massUnrounded.value, B.toleranceBand.high.value).withinTolerance).toBe(true);
    expect(judge(A.massUnrounded.value, B.toleranceBand.high.value * 1.002).withinTolerance).toBe(false);
  });

  it('names each part\'s side', () => {
    const result = computeBatchTargets(base({ system: { ...system, isocyanatePart: 'B' } }));
    expect(result.components.A.side).toBe('polyol');
    expect(result.components.B.side).toBe('isocyanate');
  });

  it('uses ±5 % unless the system says otherwise', () => {
    expect(computeBatchTargets(base()).ratioTolerancePercent).toBe(5);
    expect(computeBatchTargets(base({ system: { ...system, ratioTolerancePercent: 3 } })).ratioTolerancePercent).toBe(3);
  });
});

describe('computeBatchTargets: index', () => {
  it('computes the index at the target ratio and over the tolerance band', () => {
    // Equivalent-weight method. Per 100 g of B: OH 56.1 → 0.1 eq, 0.9 g water → 0.1 eq; 100 g of A at
    // 8.404 %NCO → 0.2 eq → index 100.
    const result = computeBatchTargets(base({ system: { ...system, ncoPercent: 8.404, hydroxylNumber: 56.1, waterPbw: 0.9 } }));
    expect(result.isocyanateIndex!.value).toBeCloseTo(100, 9);
    expect(result.isocyanateIndex!.atToleranceLimits.low).toBeCloseTo(95, 9);
    expect(result.isocyanateIndex!.atToleranceLimits.high).toBeCloseTo(105, 9);
  });

  it('divides by (1 ± t) when B is the isocyanate', () => {
    const result = computeBatchTargets(
      base({ system: { ...system, isocyanatePart: 'B', ncoPercent: 8.404, hydroxylNumber: 56.1 } }),
    );
    const index = result.isocyanateIndex!;
    expect(index.value).toBeCloseTo(200, 9);
    expect(index.atToleranceLimits.low).toBeCloseTo(200 / 1.05, 9);
    expect(index.atToleranceLimits.high).toBeCloseTo(200 / 0.95, 9);
  });

  it('is null without %NCO and OH data', () => {
    expect(computeBatchTargets(base({ system: { ...system, ncoPercent: 30 } })).isocyanateIndex).toBeNull();
  });
});

describe('computeBatchTargets: free-rise density', () => {
  const sloped = { ...system, freeRiseDensity: 40, freeRiseDensitySlope: -0.5 };

  it('uses the slope at the component temperature and warns when cold components will not fill', () => {
    const result = computeBatchTargets(base({ system: sloped, options: { packFactor: 1.02, componentTemperature: 16 } }));
    expect(result.expectedFreeRiseDensity.density.value).toBeCloseTo(43, 12);
    expect(result.expectedFreeRiseDensity.method).toBe('system_slope');
    expect(result.expectedFreeRiseDensity.atComponentTemperature).toBe(true);
    expect(result.expectedPackFactor.value).toBeCloseTo(40.8 / 43, 12);
    expect(result.packFactor.value).toBe(1.02);
    expect(result.warnings.map((w) => w.code)).toContain('PACK_FACTOR_BELOW_ONE');
  });

  it('prefers a fit of five or more cup tests over a real span', () => {
    const cupTests = [18, 20, 22, 24, 26].map((temperature) => ({ temperature, density: 62 - temperature }));
    const result = computeBatchTargets(base({ system: sloped, options: { packFactor: 1.2, componentTemperature: 24 }, cupTests }));
    expect(result.expectedFreeRiseDensity.method).toBe('cup_test_fit');
    expect(result.expectedFreeRiseDensity.density.value).toBeCloseTo(38, 10);
    expect(result.expectedFreeRiseDensity.fit!.count).toBe(5);
  });

  it('falls back to the system slope, saying why, when the cups span 0.2 °C (a +15 kg/m³/°C line)', () => {
    const cupTests = [{ temperature: 22.0, density: 40 }, { temperature: 22.1, density: 41.5 }, { temperature: 22.2, density: 43 }, { temperature: 22.1, density: 41.5 }, { temperature: 22.0, density: 40 }];
    const result = computeBatchTargets(base({ system: sloped, options: { packFactor: 1.2, componentTemperature: 30 }, cupTests }));
    expect(result.expectedFreeRiseDensity.method).toBe('system_slope');
    expect(result.expectedFreeRiseDensity.fitRejected).toBe('narrow_span');
    expect(result.expectedFreeRiseDensity.methodReason).toMatch(/span less than 4 °C/);
    expect(result.expectedFreeRiseDensity.density.value).toBeCloseTo(40 - 0.5 * 8, 10);
  });

  it('uses the reference temperature when none is measured', () => {
    const result = computeBatchTargets(base({ system: sloped, options: { packFactor: 1.2 } }));
    expect(result.expectedFreeRiseDensity.temperature.value).toBe(22);
    expect(result.expectedFreeRiseDensity.atComponentTemperature).toBe(false);
    expect(result.expectedPackFactor.value).toBeCloseTo(1.2, 12);
  });

  it('fills a free-rise cup at the expected free-rise density with a pack factor of 1', () => {
    const result = computeBatchTargets({ system: sloped, freeRiseCup: { volume: 0.001 }, options: { componentTemperature: 26 } });
    expect(result.subject).toBe('free_rise_cup');
    expect(result.targetDensity.value).toBeCloseTo(38, 12);
    expect(result.packFactor.value).toBe(1);
    expect(result.foamMass.value).toBeCloseTo(0.038, 12);
    expect(result.densityBasis).toBe('free_rise_cup');
    expect(result.warnings.filter((w) => w.code.startsWith('PACK_FACTOR'))).toEqual([]);
  });
});

describe('computeBatchTargets: warnings', () => {
  const codes = (input: BatchTargetsInput) => computeBatchTargets(input).warnings.map((w) => w.code);

  it('is quiet for an ordinary pour', () => {
    expect(codes(base({ options: { targetDensity: 3 * PCF, scale: { readability: 0.0001, capacity: 5 } } }))).toEqual([]);
  });

  it('warns when the tolerance band is too narrow for the scale', () => {
    const tiny = base({ mold: { volume: 0.00005 }, options: { packFactor: 1.5, scale: { readability: 0.00005 } } });
    const warning = computeBatchTargets(tiny).warnings.find((w) => w.code === 'TOLERANCE_BELOW_SCALE_RESOLUTION');
    expect(warning).toBeDefined();
    expect(warning!.limit).toBeCloseTo(0.00025, 15);
  });

  it('refuses a scale on which a target rounds to zero or spans under 10 divisions', () => {
    const tiny = base({ mold: { volume: 0.00005 }, options: { packFactor: 1.5, scale: { readability: 0.001 } } });
    expect(() => computeBatchTargets(tiny)).toThrow(BatchingInputError);
    try {
      computeBatchTargets(tiny);
    } catch (e) {
      expect((e as BatchingInputError).issues[0]).toMatchObject({ pointer: '/options/scale/readability', code: 'below_minimum_load' });
    }
  });

  it('uses the narrower side of the B band when B is the smaller part', () => {
    // B ≈ 1.0 g: the band is −0.0476 g/+0.0526 g; a 0.01 g scale gives 4.76 divisions, under 5.
    const input = base({
      system: { ...system, ratio: { a: 100, b: 10 } },
      mold: { volume: 0.011 / (3 * PCF) },
      options: { targetDensity: 3 * PCF, scale: { readability: 0.00001 } },
    });
    const warning = computeBatchTargets(input).warnings.find((w) => w.code === 'TOLERANCE_BELOW_SCALE_RESOLUTION');
    expect(warning!.message).toContain('part B');
    expect(warning!.measured).toBeCloseTo((0.001 * 0.05) / 1.05, 12);
  });

  it('warns on pigment, exotherm, pack factor limit, capacity, temperature, lots and calibration', () => {
    const found = codes({
      system: { ...system, maxPigmentPercent: 3, packFactorLimit: 2, componentTemperatureWindow: { min: 20, max: 25 } },
      mold: { volume: 0.05 },
      options: {
        packFactor: 2.5,
        pigmentPercent: 4,
        componentTemperature: 30,
        scale: { readability: 0.001, capacity: 3, calibrationDueOn: '2026-01-31' },
        lots: [{ part: 'A', lotCode: 'A-1', expiresOn: '2026-02-01' }, { part: 'B', expiresOn: '2026-12-31' }],
        today: '2026-02-10',
      },
    });
    expect(found).toEqual([
      'PACK_FACTOR_ABOVE_LIMIT',
      'PIGMENT_OVER_LIMIT',
      'TEMPERATURE_ABOVE_WINDOW',
      'EXOTHERM_RISK_MASS',
      'OVER_CAPACITY',
      'LOT_EXPIRED',
      'CALIBRATION_OVERDUE',
    ]);
  });

  it('takes the supplier\'s exotherm limit over the default', () => {
    expect(codes(base({ system: { ...system, exothermMassLimit: 0.2 } }))).toContain('EXOTHERM_RISK_MASS');
  });
});

describe('computeBatchTargets: the envelope', () => {
  it('records the computation version and carries the cautions, the system\'s own last', () => {
    const result = computeBatchTargets(base({ system: { ...system, cautionsText: 'Keep part A sealed.' } }));
    expect(result.computationVersion).toBe(COMPUTATION_VERSION);
    expect(result.cautions.slice(0, STANDARD_CAUTIONS.length)).toEqual([...STANDARD_CAUTIONS]);
    expect(result.cautions.at(-1)!.text).toBe('Keep part A sealed.');
  });

  it('passes the timing and window through in SI', () => {
    const result = computeBatchTargets(
      base({ system: { ...system, potLife: 60, demoldTime: 600, componentTemperatureWindow: { min: 20, max: 25 } } }),
    );
    expect(result.timing).toEqual({ potLife: { value: 60, unit: 's' }, demoldTime: { value: 600, unit: 's' }, fullCureTime: null });
    expect(result.componentTemperatureWindow).toEqual({ min: { value: 20, unit: 'degC' }, max: { value: 25, unit: 'degC' } });
  });

  it('returns a result that survives JSON', () => {
    const result = computeBatchTargets(base({ options: { targetDensity: 3 * PCF, scale: { readability: 0.0001 } } }));
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });
});

describe('computeBatchTargets: validation', () => {
  it('points at zero or negative volumes, densities, SGs and ratio parts', () => {
    expect(
      issuesOf({
        system: { ...system, specificGravityA: 0, specificGravityB: -1, freeRiseDensity: 0, ratio: { a: -100, b: 100 } },
        mold: { volume: 0 },
        options: { packFactor: 1.2 },
      }),
    ).toEqual(['/system/ratio/a', '/system/specificGravityA', '/system/specificGravityB', '/system/freeRiseDensity', '/mold/volume']);
  });

  it('rejects pack factors of 0 or below and above 10, given or implied', () => {
    expect(issuesOf(base({ options: { packFactor: 0 } }))).toEqual(['/options/packFactor']);
    expect(issuesOf(base({ options: { packFactor: 10.5 } }))).toEqual(['/options/packFactor']);
    expect(issuesOf(base({ options: { targetDensity: 11 * system.freeRiseDensity } }))).toEqual(['/options/targetDensity']);
    expect(issuesOf(base({ mold: { ...mold12x12x2, defaultPackFactor: -1 }, options: { packFactor: 1.2 } }))).toEqual([
      '/mold/defaultPackFactor',
    ]);
    expect(() => computeBatchTargets(base({ options: { packFactor: 10 } }))).not.toThrow();
  });

  it('rejects percents out of range', () => {
    expect(
      issuesOf(
        base({
          system: { ...system, ratioTolerancePercent: 0, maxPigmentPercent: 101, ncoPercent: 120 },
          options: { packFactor: 1.2, pigmentPercent: -1, overfillPercent: 150, retentionPercent: 100 },
        }),
      ),
    ).toEqual([
      '/system/ratioTolerancePercent',
      '/system/maxPigmentPercent',
      '/system/ncoPercent',
      '/options/pigmentPercent',
      '/options/overfillPercent',
      '/options/retentionPercent',
    ]);
  });

  it('needs exactly one of a mold and a free-rise cup', () => {
    expect(issuesOf({ system, options: { packFactor: 1.2 } })).toEqual(['/mold']);
    expect(issuesOf({ system, mold: mold12x12x2, freeRiseCup: { volume: 0.001 } })).toEqual(['/mold']);
  });

  it('needs one way to the target density for a mold, and none for a cup', () => {
    expect(issuesOf(base({ options: {} }))).toEqual(['/options/packFactor']);
    expect(issuesOf(base({ options: { packFactor: 1.2, targetDensity: 50 } }))).toEqual(['/options/packFactor']);
    expect(issuesOf({ system, freeRiseCup: { volume: 0.001 }, options: { packFactor: 1.2 } })).toEqual(['/options/packFactor']);
  });

  it('needs today to judge lots and calibration, and real dates', () => {
    expect(issuesOf(base({ options: { packFactor: 1.2, lots: [{ part: 'A', expiresOn: '2026-02-30' }] } }))).toEqual([
      '/options/lots/0/expiresOn',
      '/options/today',
    ]);
    expect(issuesOf(base({ options: { packFactor: 1.2, scale: { readability: 0.0001, calibrationDueOn: '2026-01-01' } } }))).toEqual([
      '/options/today',
    ]);
  });

  it('checks the scale, the window, the enums and the cup tests', () => {
    expect(
      issuesOf({
        system: { ...system, ratioBasis: 'mass' as never, isocyanatePart: 'C' as never, componentTemperatureWindow: { min: 25, max: 20 } },
        mold: { volume: 0.001, cavities: 0 },
        options: { packFactor: 1.2, scale: { readability: 0.001, capacity: 0.001 } },
        cupTests: [{ temperature: 22, density: 0 }],
      }),
    ).toEqual([
      '/system/ratioBasis',
      '/system/isocyanatePart',
      '/system/componentTemperatureWindow/max',
      '/mold/cavities',
      '/options/scale/capacity',
      '/cupTests/0/density',
    ]);
  });

  it('reports every problem in one error, with details for a person', () => {
    try {
      validateBatchTargetsInput({ system: { ...system, specificGravityA: Number.NaN }, mold: { volume: -1 }, options: { packFactor: 1 } });
      throw new Error('expected a BatchingInputError');
    } catch (error) {
      expect(error).toBeInstanceOf(BatchingInputError);
      const issues = (error as BatchingInputError).issues;
      expect(issues).toEqual([
        { pointer: '/system/specificGravityA', detail: 'must be a finite number', code: 'not_a_number' },
        { pointer: '/mold/volume', detail: 'must be greater than 0', code: 'must_be_positive' },
      ]);
    }
  });

  it('does not crash on a null mold', () => {
    expect(issuesOf({ system, mold: null as never, options: { packFactor: 1.2 } })).toEqual(['/mold/volume']);
  });
});
