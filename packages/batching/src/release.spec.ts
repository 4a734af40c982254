import { describe, expect, it } from '@jest/globals';
import { checkRelease, requiredForRelease, type ItemRecord, type ReleaseItem } from './release.js';

describe('complete before release', () => {
  it('asks for A and B always, the pigment when it is weighed, and what the system asks for', () => {
    expect(requiredForRelease(0)).toEqual(['part_a', 'part_b']);
    expect(requiredForRelease(0.01, ['mix_start', 'mold_temperature'])).toEqual(['part_a', 'part_b', 'pigment', 'mix_start', 'mold_temperature']);
  });

  it('is ready only when each item is accepted or waived and no rejection is open', () => {
    const ok: ItemRecord = { status: 'accepted', reviewDecision: null };
    const waived: ItemRecord = { status: 'rejected', reviewDecision: 'waive' };
    const upheld: ItemRecord = { status: 'rejected', reviewDecision: 'uphold' };
    const required: ReleaseItem[] = ['part_a', 'part_b', 'pigment'];
    expect(checkRelease(required, new Map([['part_a', ok], ['part_b', waived], ['pigment', ok]]), new Set(), 0).ready).toBe(true);
    const r = checkRelease(required, new Map([['part_a', ok], ['part_b', upheld]]), new Set(['pigment'] as ReleaseItem[]), 1);
    expect(r.ready).toBe(false);
    expect(r.missing.map((m) => [m.item, m.problem])).toEqual([['part_b', 'rejected'], ['pigment', 'pending']]);
    expect(checkRelease(required, new Map([['part_a', ok], ['part_b', ok]]), new Set(), 0).missing).toEqual([{ item: 'pigment', problem: 'not_recorded', message: 'The pigment has not been recorded.' }]);
  });
});
