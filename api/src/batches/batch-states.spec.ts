import { describe, expect, it } from '@jest/globals';
import { BATCH_STATES, BATCH_TRANSITIONS, canMove } from './batch-states.js';

describe('batch states', () => {
  it('starts a batch at planned and lets it be weighed, held, released or scrapped', () => {
    expect(canMove('planned', 'weighing')).toBe(true);
    expect(canMove('weighing', 'on_hold')).toBe(true);
    expect(canMove('on_hold', 'released')).toBe(true);
    expect(canMove('on_hold', 'scrapped')).toBe(true);
  });
  it('never moves a scrapped batch and rejects unknown states', () => {
    expect(BATCH_TRANSITIONS.scrapped).toEqual([]);
    expect(canMove('scrapped', 'released')).toBe(false);
    expect(canMove('nonsense', 'weighing')).toBe(false);
  });
  it('only names states it defines', () => {
    for (const targets of Object.values(BATCH_TRANSITIONS)) for (const t of targets) expect(Object.keys(BATCH_STATES)).toContain(t);
  });
});
