import type { ApiKeyScope, Role } from '@pourgate/permissions';
import type { Tone } from '../common/StatusChip';
import { addDaysIso, expiryLabel, formatDateTime, formatRelative } from '../format/dates';
import type { ApiKey, ApiKeyEnvironment, ApiKeyKind } from '../views/sdk';

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
      return { label: 'Expired', tone: 'quiet', note: (key.expiresAt ?? key.graceUntil) ? `Since ${formatDateTime(key.expiresAt ?? key.graceUntil)}` : undefined };
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

/** A key as the list shows it: the current secret, with the one it replaced while that still works. */
export interface KeyRow<K extends Pick<ApiKey, 'id' | 'state' | 'rotatedFrom'> = ApiKey> {
  key: K;
  /** The rotated-out predecessor on the same page, if any. */
  previous: K | null;
}

/**
 * One row per key: a rotation makes a new key row that names its predecessor (`rotatedFrom`); the
 * predecessor (retiring or expired) folds into its successor's row instead of showing as a second
 * key of the same name. Revoked keys are left out unless asked for.
 */
export function keyRows<K extends Pick<ApiKey, 'id' | 'state' | 'rotatedFrom'>>(keys: readonly K[], showRevoked: boolean): KeyRow<K>[] {
  const byId = new Map(keys.map((k) => [k.id, k]));
  const replaced = new Set(keys.map((k) => k.rotatedFrom).filter((id): id is string => !!id && byId.has(id)));
  return keys
    .filter((k) => !replaced.has(k.id))
    .filter((k) => showRevoked || k.state !== 'revoked')
    .map((k) => ({ key: k, previous: k.rotatedFrom ? (byId.get(k.rotatedFrom) ?? null) : null }));
}

/**
 * The expiry cell. A key in its rotation grace period or past it is judged by its grace end, not
 * by its own expiry: "Expired" never sits beside "No expiry".
 */
export function expiryText(key: Pick<ApiKey, 'state' | 'expiresAt' | 'graceUntil' | 'revokedAt'>, now: number = Date.now()): string {
  if (key.state === 'revoked') return 'Revoked';
  if (key.state === 'grace' && key.graceUntil) return `Retires ${formatRelative(key.graceUntil, now)}`;
  if (key.state === 'expired') {
    const at = key.expiresAt && Date.parse(key.expiresAt) <= now ? key.expiresAt : key.graceUntil;
    return at ? `Expired ${formatRelative(at, now)}` : 'Expired';
  }
  return expiryLabel(key.expiresAt, now);
}
