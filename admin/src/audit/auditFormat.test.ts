import { describe, expect, it } from 'vitest';
import { detailRows } from './auditFormat';

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
