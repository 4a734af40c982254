import { describe, expect, it } from '@jest/globals';
import { COMPUTATION_VERSION } from './version.js';

describe('COMPUTATION_VERSION', () => {
  it('is written year.month.n, with a real month', () => {
    const match = /^(\d{4})\.(\d{1,2})\.(\d+)$/.exec(COMPUTATION_VERSION);
    expect(match).not.toBeNull();
    const month = Number(match![2]);
    expect(month).toBeGreaterThanOrEqual(1);
    expect(month).toBeLessThanOrEqual(12);
  });
});
