import { describe, expect, it } from '@jest/globals';
import * as batching from './index.js';

describe('batching public API', () => {
  it('exports the entry points the API and the console use', () => {
    for (const name of [
      'computeBatchTargets',
      'validateBatchTargetsInput',
      'judgeRatio',
      'toSI',
      'fromSI',
      'temperatureDifferenceToSI',
      'displayUnits',
      'moldVolume',
      'waterDensity',
      'roundToReadability',
      'isocyanateIndex',
      'isocyanatePartsForIndex',
      'indexAfterRatioError',
      'expectedFreeRiseDensity',
      'cautionsFor',
    ] as const) {
      expect(typeof batching[name]).toBe('function');
    }
    expect(batching.COMPUTATION_VERSION).toMatch(/^\d{4}\.\d{1,2}\.\d+$/);
    expect(new batching.BatchingInputError([{ pointer: '/x', detail: 'd', code: 'c' }])).toBeInstanceOf(Error);
    expect(new batching.UnitError('UNKNOWN_UNIT', 'x', 'mass', ['kg'])).toBeInstanceOf(Error);
  });
});
