import { describe, expect, it } from 'vitest';
import { ACTION_CHOICES, actionLabel, detailRows } from './auditFormat';

describe('detailRows', () => {
  it('flattens nested details into dotted keys and keeps value types visible', () => {
    expect(detailRows({ role: { from: 'viewer', to: 'engineer' }, scopes: ['readings:write'], graceSeconds: 86400, note: 'swap' })).toEqual([
      { key: 'role.from', value: 'viewer' },
      { key: 'role.to', value: 'engineer' },
      { key: 'scopes', value: '["readings:write"]' },
      { key: 'graceSeconds', value: '86400' },
      { key: 'note', value: 'swap' },
    ]);
  });

  it('gives nothing for missing details', () => {
    expect(detailRows(null)).toEqual([]);
    expect(detailRows(undefined)).toEqual([]);
  });
});

describe('actionLabel', () => {
  it('says what happened in plain words, and still reads an action this console does not know', () => {
    expect(actionLabel('api_key.revoked')).toBe('API key revoked');
    expect(actionLabel('user.role_changed')).toBe('Role changed');
    expect(actionLabel('thing.was_done')).toBe('Thing was done');
  });

  it('offers every known action in the filter, each once, sorted by its words', () => {
    const names = ACTION_CHOICES.map((c) => c.name);
    expect(new Set(ACTION_CHOICES.map((c) => c.id)).size).toBe(ACTION_CHOICES.length);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    expect(ACTION_CHOICES.find((c) => c.id === 'auth.signed_in')?.name).toBe('Signed in');
  });
});
