import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';
import { BatchingInputError } from './errors.js';
import { judgeReading } from './judging.js';
import { computeBatchTargets, type BatchTargetsInput } from './targets.js';

/** Any number, sensible or not: NaN, infinities, huge, tiny, negative, and plausible shop values. */
const anyNumber = fc.oneof(
  fc.double(),
  fc.constantFrom(0, -1, 1e308, -1e308, 5e-324, Number.NaN, Number.POSITIVE_INFINITY),
  fc.double({ min: 0.001, max: 200, noNaN: true }),
  fc.double({ min: 0.5, max: 2, noNaN: true }),
);
const maybe = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

const input: fc.Arbitrary<BatchTargetsInput> = fc.record({
  system: fc.record({
    ratioBasis: fc.constantFrom('weight', 'volume'),
    ratio: fc.record({ a: anyNumber, b: anyNumber }),
    specificGravityA: anyNumber,
    specificGravityB: anyNumber,
    isocyanatePart: fc.constantFrom('A', 'B'),
    freeRiseDensity: anyNumber,
    freeRiseReferenceTemperature: anyNumber,
    freeRiseDensitySlope: maybe(fc.oneof(anyNumber, fc.double({ min: -2, max: 0, noNaN: true }))),
    ratioTolerancePercent: maybe(anyNumber),
    ratioTolerancePbw: maybe(anyNumber),
    ncoPercent: maybe(anyNumber),
    hydroxylNumber: maybe(anyNumber),
    waterPbw: maybe(anyNumber),
    pigmentDoseBasis: maybe(fc.constantFrom('ab', 'polyol', 'total')),
    pigmentPlacement: maybe(fc.constantFrom('separate', 'A', 'B')),
    pigmentCarrierHydroxylNumber: maybe(anyNumber),
    packFactorLimit: maybe(anyNumber),
    exothermMassLimit: maybe(anyNumber),
  }) as fc.Arbitrary<BatchTargetsInput['system']>,
  subject: fc.oneof(
    fc.record({ mold: fc.record({ volume: anyNumber, cavities: maybe(fc.oneof(fc.integer({ min: -2, max: 300 }), anyNumber)), defaultPackFactor: maybe(anyNumber) }) }),
    fc.record({ freeRiseCup: fc.record({ volume: anyNumber }) }),
  ),
  options: fc.record({
    targetDensity: maybe(anyNumber),
    packFactor: maybe(anyNumber),
    pigmentPercent: maybe(anyNumber),
    overfillPercent: maybe(anyNumber),
    retentionPercent: maybe(anyNumber),
    componentTemperature: maybe(anyNumber),
    scale: maybe(fc.record({ readability: anyNumber, capacity: maybe(anyNumber) })),
  }),
  cupTests: maybe(fc.array(fc.record({ temperature: anyNumber, density: anyNumber }), { maxLength: 8 })),
}).map(({ subject, ...rest }) => ({ ...rest, ...subject }) as BatchTargetsInput);

/** Every number of a result, with its path. */
function numbers(node: unknown, path = ''): [string, number][] {
  if (typeof node === 'number') return [[path, node]];
  if (Array.isArray(node)) return node.flatMap((n, i) => numbers(n, `${path}/${i}`));
  if (node && typeof node === 'object') return Object.entries(node).flatMap(([k, v]) => numbers(v, `${path}/${k}`));
  return [];
}

describe('physical bounds: the whole input space', () => {
  it('gives finite, non-negative figures or refuses with pointers, never anything else (fast-check)', () => {
    fc.assert(
      fc.property(input, (i) => {
        let result;
        try {
          result = computeBatchTargets(i);
        } catch (e) {
          // refused: a BatchingInputError pointing into the input, nothing else may escape (a 500)
          expect(e).toBeInstanceOf(BatchingInputError);
          expect((e as BatchingInputError).issues.length).toBeGreaterThan(0);
          for (const issue of (e as BatchingInputError).issues) expect(issue.pointer).toMatch(/^\/[a-zA-Z]/);
          return;
        }
        for (const [path, value] of numbers(result)) {
          expect([path, Number.isFinite(value)]).toEqual([path, true]);
          // a fit's line may slope down and cross zero outside its span; every other figure is a magnitude
          if (!/\/fit\/(slope|intercept)$/.test(path)) expect([path, value >= 0]).toEqual([path, true]);
        }
      }),
      { numRuns: 3000 },
    );
  });

  it('refuses the nonsense an audit found, each with a pointer', () => {
    const system = { ratioBasis: 'weight' as const, ratio: { a: 100, b: 50 }, specificGravityA: 1.05, specificGravityB: 1.2, isocyanatePart: 'B' as const, freeRiseDensity: 30, freeRiseReferenceTemperature: 22, freeRiseDensitySlope: -0.3 };
    const refused = (i: BatchTargetsInput) => {
      try {
        computeBatchTargets(i);
      } catch (e) {
        if (e instanceof BatchingInputError) return e.issues.map((x) => x.pointer);
        throw e;
      }
      return [];
    };
    const cup = { freeRiseCup: { volume: 0.001 } };
    // a component at 200 °C (the model gave −17.3 kg/m³), also for a free-rise cup (it was a RangeError)
    expect(refused({ system, mold: { volume: 0.001 }, options: { packFactor: 2, componentTemperature: 200 } })).toEqual(['/options/componentTemperature']);
    expect(refused({ system, ...cup, options: { componentTemperature: 200 } })).toEqual(['/options/componentTemperature']);
    expect(refused({ system: { ...system, ratio: { a: 1e308, b: 1 } }, ...cup })).toEqual(['/system/ratio/a']);
    expect(refused({ system, mold: { volume: 1e9 }, options: { packFactor: 2 } })).toEqual(['/mold/volume']);
    expect(refused({ system: { ...system, specificGravityA: 12 }, ...cup })).toEqual(['/system/specificGravityA']);
    // %NCO 48 with OH 5000: the OH number is past any polyol (the index came out at 7)
    expect(refused({ system: { ...system, ncoPercent: 48, hydroxylNumber: 5000 }, ...cup })).toEqual(['/system/hydroxylNumber']);
    // a 1 kg readability on a 0.2 kg pour rounds every target to 0
    expect(refused({ system, mold: { volume: 0.2 / 60 }, options: { packFactor: 2, scale: { readability: 1 } } })).toEqual(['/options/scale/readability']);
  });
});

describe('judging over its input space', () => {
  it('gives finite figures in every reason (fast-check)', () => {
    const system = { ratioBasis: 'weight' as const, ratio: { a: 100, b: 50 }, specificGravityA: 1, specificGravityB: 1, isocyanatePart: 'B' as const };
    fc.assert(
      fc.property(
        fc.constantFrom('part_a', 'part_b', 'pigment', 'mixed'),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.option(fc.double({ min: 0, max: 1000, noNaN: true }), { nil: null }),
        fc.option(fc.record({ a: fc.double({ min: 0.001, max: 100, noNaN: true }), b: fc.double({ min: 0.001, max: 100, noNaN: true }), pigment: fc.double({ min: 0, max: 5, noNaN: true }), total: fc.double({ min: 0.001, max: 200, noNaN: true }) }), { nil: null }),
        (subject, valueSi, other, targets) => {
          const r = judgeReading({ quantity: 'mass', subject, valueSi, stable: true, device: { capacityKg: null, calibrationDue: null }, day: '2026-01-01', system, targets, otherPartMassKg: other, partMassesKg: { a: other, b: other } });
          for (const reason of r.reasons) {
            for (const v of [reason.measured, reason.limit]) if (v !== null) expect(Number.isFinite(v)).toBe(true);
            expect(reason.message).not.toMatch(/NaN|Infinity|undefined/);
          }
        },
      ),
      { numRuns: 2000 },
    );
  });
});
