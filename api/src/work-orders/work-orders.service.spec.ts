import { describe, expect, it } from '@jest/globals';
import { canonicalPost, requestHash } from './work-orders.service.js';

describe('the canonical first post of a work order', () => {
  it('does not depend on key order or on defaults sent explicitly', () => {
    const a = { externalRef: 'WO-1', quantity: 3, notes: 'x' };
    const b = { notes: 'x', state: 'open' as const, moldId: null, quantity: 3, externalRef: 'WO-1' };
    expect(canonicalPost(a)).toBe(canonicalPost(b));
    expect(requestHash(a)).toBe(requestHash(b));
    expect(requestHash(a)).toMatch(/^[0-9a-f]{64}$/);
  });

  it('changes with any field that matters', () => {
    const base = { externalRef: 'WO-1', quantity: 3 };
    expect(requestHash({ ...base, quantity: 4 })).not.toBe(requestHash(base));
    expect(requestHash({ ...base, dueOn: '2026-01-02' })).not.toBe(requestHash(base));
    expect(requestHash({ ...base, state: 'cancelled' })).not.toBe(requestHash(base));
  });
});
