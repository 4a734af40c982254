import { describe, expect, it } from 'vitest';
import { buildKeyPayload, canManageKey, DEFAULT_SCOPES, expiryText, keyFormErrors, keyRows, keyStateView, kindsAllowed } from './keyRules';

const NOW = Date.parse('2025-06-02T12:00:00Z');

describe('buildKeyPayload', () => {
  it('sends a device id only on device keys, and an expiry instant from the lifetime', () => {
    expect(
      buildKeyPayload({ name: '  Bench scale 2 ', kind: 'device', environment: 'live', scopes: ['readings:write', 'readings:write', 'targets:read'], deviceId: ' dev_7 ', expiresAfter: '30' }, NOW),
    ).toEqual({ name: 'Bench scale 2', kind: 'device', environment: 'live', scopes: ['readings:write', 'targets:read'], deviceId: 'dev_7', expiresAt: '2025-07-02T12:00:00.000Z' });
  });

  it('drops the device id on integration keys and the expiry when it never expires', () => {
    expect(buildKeyPayload({ name: 'ERP', kind: 'integration', environment: 'test', scopes: ['events:read'], deviceId: 'dev_7', expiresAfter: 'never' }, NOW)).toEqual({
      name: 'ERP',
      kind: 'integration',
      environment: 'test',
      scopes: ['events:read'],
    });
  });

  it('leaves out a blank device id', () => {
    expect(buildKeyPayload({ name: 'x', kind: 'device', environment: 'test', scopes: ['readings:write'], deviceId: '   ', expiresAfter: 'never' }, NOW)).not.toHaveProperty('deviceId');
  });
});

describe('keyFormErrors', () => {
  it('points expiresAt errors at the lifetime input and scope items at the group', () => {
    expect(keyFormErrors({ expiresAt: 'must be in the future', 'scopes.2': 'unknown scope', name: 'is required' })).toEqual({
      expiresAfter: 'must be in the future',
      scopes: 'unknown scope',
      name: 'is required',
    });
  });
});

describe('who may do what with a key', () => {
  it('lets integrators issue device keys only', () => {
    expect(kindsAllowed('integrator')).toEqual(['device']);
    expect(kindsAllowed('admin')).toEqual(['device', 'integration']);
    expect(kindsAllowed('viewer')).toEqual([]);
  });

  it('lets integrators rotate and revoke device keys but not integration keys', () => {
    expect(canManageKey('integrator', { kind: 'device', state: 'active' })).toEqual({ rotate: true, revoke: true });
    expect(canManageKey('integrator', { kind: 'integration', state: 'active' })).toEqual({ rotate: false, revoke: false });
    expect(canManageKey('admin', { kind: 'integration', state: 'active' })).toEqual({ rotate: true, revoke: true });
  });

  it('allows revoking a key in its grace period but not rotating it, and nothing on dead keys', () => {
    expect(canManageKey('admin', { kind: 'device', state: 'grace' })).toEqual({ rotate: false, revoke: true });
    expect(canManageKey('admin', { kind: 'device', state: 'revoked' })).toEqual({ rotate: false, revoke: false });
    expect(canManageKey('admin', { kind: 'device', state: 'expired' })).toEqual({ rotate: false, revoke: false });
  });
});

describe('keyStateView', () => {
  it('labels each state and says until when a retiring key works', () => {
    expect(keyStateView({ state: 'active', graceUntil: null, revokedAt: null, expiresAt: null })).toEqual({ label: 'Active', tone: 'good' });
    const grace = keyStateView({ state: 'grace', graceUntil: '2025-06-03T12:00:00Z', revokedAt: null, expiresAt: null });
    expect(grace.label).toBe('Retiring');
    expect(grace.note).toMatch(/^Works until /);
    expect(keyStateView({ state: 'revoked', graceUntil: null, revokedAt: '2025-06-01T00:00:00Z', expiresAt: null }).tone).toBe('bad');
  });

  it('offers each kind its usual scopes', () => {
    expect(DEFAULT_SCOPES.device).toContain('readings:write');
    expect(DEFAULT_SCOPES.integration).toContain('work-orders:write');
    expect(DEFAULT_SCOPES.device).not.toContain('work-orders:write');
  });
});

describe('keyRows', () => {
  const k = (id: string, state: 'active' | 'grace' | 'expired' | 'revoked', rotatedFrom: string | null = null) => ({ id, state, rotatedFrom });

  it('folds a rotated-out key into the row of the key that replaced it', () => {
    const rows = keyRows([k('new', 'active', 'old'), k('old', 'grace'), k('other', 'active')], false);
    expect(rows.map((r) => r.key.id)).toEqual(['new', 'other']);
    expect(rows[0]!.previous?.id).toBe('old');
    expect(rows[1]!.previous).toBeNull();
  });

  it('hides revoked keys unless asked, and keeps a predecessor from another page as a row of its own', () => {
    const keys = [k('a', 'revoked'), k('b', 'active', 'gone'), k('c', 'expired')];
    expect(keyRows(keys, false).map((r) => r.key.id)).toEqual(['b', 'c']);
    expect(keyRows(keys, true).map((r) => r.key.id)).toEqual(['a', 'b', 'c']);
  });
});

describe('expiryText', () => {
  const now = Date.parse('2026-12-02T12:00:00Z');
  it('never says "Expired" beside "No expiry": a key past its grace period expired when the grace ended', () => {
    expect(expiryText({ state: 'expired', expiresAt: null, graceUntil: '2026-11-29T12:00:00Z', revokedAt: null }, now)).toBe('Expired 3 days ago');
    expect(expiryText({ state: 'active', expiresAt: null, graceUntil: null, revokedAt: null }, now)).toBe('No expiry');
    expect(expiryText({ state: 'grace', expiresAt: null, graceUntil: '2026-12-03T12:00:00Z', revokedAt: null }, now)).toBe('Retires tomorrow');
    expect(expiryText({ state: 'revoked', expiresAt: null, graceUntil: null, revokedAt: '2026-12-01T12:00:00Z' }, now)).toBe('Revoked');
  });
});
