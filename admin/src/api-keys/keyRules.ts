import type { ApiKeyScope, Role } from '@pourgate/permissions';
import type { Tone } from '../common/StatusChip';
import { addDaysIso, formatDateTime } from '../format/dates';
import type { ApiKey, ApiKeyEnvironment, ApiKeyKind } from '../api/views';

export const SCOPE_INFO: Readonly<Record<ApiKeyScope, string>> = {
  'readings:write': 'Post readings (mass, temperature, humidity)',
  'targets:read': 'Fetch computed batch targets',
  'work-orders:write': 'Post and change work orders',
  'events:read': 'Poll the event feed',
  'devices:read': 'Read devices and stations',
  'shop:read': 'Read systems, lots, molds, work orders and batches',
};

/** What a new key of each kind usually needs; the person can change it before issuing. */
export const DEFAULT_SCOPES: Readonly<Record<ApiKeyKind, ApiKeyScope[]>> = {
  device: ['readings:write', 'targets:read'],
  integration: ['work-orders:write', 'targets:read', 'events:read'],
};

export const KIND_LABEL: Readonly<Record<ApiKeyKind, string>> = { device: 'Device', integration: 'Integration' };

/** Integrators wire benches and loggers, so they issue device keys only; the API enforces it too. */
export function kindsAllowed(role: Role | string | undefined): ApiKeyKind[] {
  if (role === 'admin') return ['device', 'integration'];
  if (role === 'integrator') return ['device'];
  return [];
}

export function canManageKey(role: Role | string | undefined, key: Pick<ApiKey, 'kind' | 'state'>): { rotate: boolean; revoke: boolean } {
  const mine = kindsAllowed(role).includes(key.kind);
  return {
    rotate: mine && key.state === 'active',
    // a key in its grace period can still be cut off early
    revoke: mine && (key.state === 'active' || key.state === 'grace'),
  };
}

export function keyStateView(key: Pick<ApiKey, 'state' | 'graceUntil' | 'revokedAt' | 'expiresAt'>): { label: string; tone: Tone; note?: string } {
  switch (key.state) {
    case 'active':
      return { label: 'Active', tone: 'good' };
    case 'grace':
      return { label: 'Retiring', tone: 'caution', note: key.graceUntil ? `Works until ${formatDateTime(key.graceUntil)}` : undefined };
    case 'expired':
      return { label: 'Expired', tone: 'quiet', note: key.expiresAt ? `Since ${formatDateTime(key.expiresAt)}` : undefined };
    case 'revoked':
      return { label: 'Revoked', tone: 'bad', note: key.revokedAt ? `Since ${formatDateTime(key.revokedAt)}` : undefined };
    default:
      return { label: String(key.state), tone: 'quiet' };
  }
}

export const EXPIRY_CHOICES = [
  { id: '30', name: '30 days' },
  { id: '90', name: '90 days' },
  { id: '365', name: '1 year' },
  { id: 'never', name: 'Never (revoke by hand)' },
] as const;

export const GRACE_CHOICES = [
  { id: 0, name: 'No overlap: the old secret stops now' },
  { id: 3_600, name: '1 hour' },
  { id: 86_400, name: '1 day' },
  { id: 604_800, name: '7 days (the longest overlap)' },
] as const;

export const DEFAULT_GRACE_SECONDS = 86_400;

export interface KeyFormValues {
  name: string;
  kind: ApiKeyKind;
  environment: ApiKeyEnvironment;
  scopes: ApiKeyScope[];
  deviceId?: string | null;
  expiresAfter: string;
}

export interface KeyPayload {
  name: string;
  kind: ApiKeyKind;
  environment: ApiKeyEnvironment;
  scopes: ApiKeyScope[];
  deviceId?: string;
  expiresAt?: string;
}

/** The POST body for a new key: a device id only on device keys, an instant for the expiry. */
export function buildKeyPayload(v: KeyFormValues, now: number = Date.now()): KeyPayload {
  const out: KeyPayload = { name: v.name.trim(), kind: v.kind, environment: v.environment, scopes: [...new Set(v.scopes)] };
  const deviceId = v.deviceId?.trim();
  if (v.kind === 'device' && deviceId) out.deviceId = deviceId;
  if (v.expiresAfter !== 'never') {
    const days = Number(v.expiresAfter);
    if (Number.isFinite(days) && days > 0) out.expiresAt = addDaysIso(days, now);
  }
  return out;
}

/** The API names `expiresAt`; the form asks for a lifetime. Point its errors at the right input. */
export function keyFormErrors(errors: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(errors)) out[k === 'expiresAt' ? 'expiresAfter' : k.startsWith('scopes.') ? 'scopes' : k] = v;
  return out;
}
