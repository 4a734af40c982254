import type { ApiKeyScope, Role } from '@pourgate/permissions';
import type { UnitSystem } from './auth/me';

/** The records the console lists, as the API's `/v1/<resource>` routes send them. */
export interface PersonRef {
  id: string;
  name: string;
}

export interface User {
  id: string;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  unitSystem: UnitSystem;
  lastSignInAt: string | null;
  createdAt: string;
}

export type InvitationState = 'pending' | 'accepted' | 'expired' | 'revoked';

export interface Invitation {
  id: string;
  email: string;
  role: Role;
  invitedBy: PersonRef | null;
  expiresAt: string;
  acceptedAt: string | null;
  createdAt: string;
  state: InvitationState;
}

export type ApiKeyKind = 'device' | 'integration';
export type ApiKeyEnvironment = 'live' | 'test';
export type ApiKeyState = 'active' | 'expired' | 'revoked' | 'grace';

export interface ApiKey {
  id: string;
  name: string;
  kind: ApiKeyKind;
  environment: ApiKeyEnvironment;
  scopes: ApiKeyScope[];
  deviceId: string | null;
  prefix: string;
  state: ApiKeyState;
  createdAt: string;
  createdBy: PersonRef | null;
  lastUsedAt: string | null;
  lastUsedIp: string | null;
  expiresAt: string | null;
  revokedAt: string | null;
  graceUntil: string | null;
}

/** Only the create and rotate answers carry the secret, and only once. */
export interface ApiKeyWithSecret extends ApiKey {
  secret: string;
}

export type ActorType = 'user' | 'api_key' | 'system' | 'anonymous';

export interface AuditEvent {
  id: string;
  createdAt: string;
  actorType: ActorType;
  actorId: string | null;
  actorLabel: string | null;
  action: string;
  targetType: string | null;
  targetId: string | null;
  details: Record<string, unknown> | null;
  ip: string | null;
}
