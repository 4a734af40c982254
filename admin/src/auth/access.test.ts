import { actionsOf } from '@pourgate/permissions';
import { describe, expect, it } from 'vitest';
import { canAccess, knownActions } from './access';

describe('canAccess', () => {
  it('lets the admin read and change people, keys and read the audit log', () => {
    const a = actionsOf('admin');
    expect(canAccess(a, 'users', 'list')).toBe(true);
    expect(canAccess(a, 'users', 'edit')).toBe(true);
    expect(canAccess(a, 'invitations', 'create')).toBe(true);
    expect(canAccess(a, 'api-keys', 'create')).toBe(true);
    expect(canAccess(a, 'audit-events', 'list')).toBe(true);
  });

  it('never offers writes to the read-only audit log', () => {
    expect(canAccess(actionsOf('admin'), 'audit-events', 'edit')).toBe(false);
    expect(canAccess(actionsOf('admin'), 'audit-events', 'delete')).toBe(false);
  });

  it('keeps integrators to API keys', () => {
    const a = actionsOf('integrator');
    expect(canAccess(a, 'api-keys', 'list')).toBe(true);
    expect(canAccess(a, 'api-keys', 'create')).toBe(true);
    expect(canAccess(a, 'users', 'list')).toBe(false);
    expect(canAccess(a, 'audit-events', 'list')).toBe(false);
  });

  it('keeps viewers and engineers out of the admin pages', () => {
    for (const role of ['viewer', 'engineer'] as const) {
      for (const res of ['users', 'invitations', 'api-keys', 'audit-events']) expect(canAccess(actionsOf(role), res, 'list')).toBe(false);
    }
  });

  it('refuses unknown resources and actions', () => {
    expect(canAccess(actionsOf('admin'), 'webhooks', 'list')).toBe(false);
    expect(canAccess(actionsOf('admin'), 'users', 'teleport')).toBe(false);
  });
});

describe('knownActions', () => {
  it('keeps only matrix actions', () => {
    expect([...knownActions(['audit:read', 'nope', 3])]).toEqual(['audit:read']);
  });
});
