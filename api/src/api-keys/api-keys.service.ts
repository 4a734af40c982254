import { Inject, Injectable, Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import { randomBytes } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import type { ApiKeyScope } from '@pourgate/permissions';
import { actorOf, Principal, RequestContext } from '../auth/principal.js';
import { sha256 } from '../auth/tokens.service.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { ProblemException } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';

export const apiKeysListSpec: ListSpec = {
  resource: 'api-keys',
  sortable: ['createdAt', 'name', 'lastUsedAt', 'expiresAt'],
  filters: { q: 'text', kind: 'eq', environment: 'eq', deviceId: 'eq', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const columns = { createdAt: 'api_keys.created_at', lastUsedAt: 'api_keys.last_used_at', expiresAt: 'api_keys.expires_at', name: 'api_keys.name', q: 'api_keys.name', kind: 'api_keys.kind', environment: 'api_keys.environment', deviceId: 'api_keys.device_id', id: 'api_keys.id' };

interface ApiKeyRow {
  id: string;
  organization_id: string;
  name: string;
  kind: 'device' | 'integration';
  environment: 'live' | 'test';
  scopes: ApiKeyScope[];
  device_id: string | null;
  prefix: string;
  created_by: string | null;
  creator_name?: string | null;
  rotated_from: string | null;
  created_at: Date;
  expires_at: Date | null;
  grace_until: Date | null;
  last_used_at: Date | null;
  last_used_ip: string | null;
  revoked_at: Date | null;
}

export type ApiKeyState = 'active' | 'grace' | 'expired' | 'revoked';

export function keyState(r: Pick<ApiKeyRow, 'revoked_at' | 'expires_at' | 'grace_until'>, now = new Date()): ApiKeyState {
  if (r.revoked_at) return 'revoked';
  if (r.expires_at && r.expires_at <= now) return 'expired';
  if (r.grace_until) return r.grace_until <= now ? 'expired' : 'grace';
  return 'active';
}

/** Secret format: `pg` + kind letter + `_` + environment + `_` + 32 random bytes (base64url). */
export function newSecret(kind: 'device' | 'integration', env: 'live' | 'test'): { secret: string; prefix: string } {
  const secret = `pg${kind === 'device' ? 'd' : 'i'}_${env}_${randomBytes(32).toString('base64url')}`;
  return { secret, prefix: secret.slice(0, 16) };
}

function view(r: ApiKeyRow) {
  return {
    id: r.id,
    name: r.name,
    kind: r.kind,
    environment: r.environment,
    scopes: r.scopes,
    deviceId: r.device_id,
    prefix: r.prefix,
    state: keyState(r),
    createdAt: r.created_at,
    createdBy: r.created_by ? { id: r.created_by, name: r.creator_name ?? null } : null,
    rotatedFrom: r.rotated_from,
    lastUsedAt: r.last_used_at,
    lastUsedIp: r.last_used_ip,
    expiresAt: r.expires_at,
    graceUntil: r.grace_until,
    revokedAt: r.revoked_at,
  };
}

/**
 * API keys for machines. The secret is returned once, at creation or rotation; only its SHA-256
 * is stored (a key is a long random string, so a fast hash is enough and keeps lookups cheap).
 */
@Injectable()
export class ApiKeysService {
  private readonly logger = new Logger('ApiKeys');

  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService) {}

  async authenticate(secret: string): Promise<Principal | null> {
    if (!/^pg[di]_(live|test)_[A-Za-z0-9_-]{43}$/.test(secret)) return null;
    const r = (await this.db('api_keys').where({ secret_hash: sha256(secret) }).first()) as ApiKeyRow | undefined;
    if (!r || keyState(r) === 'revoked' || keyState(r) === 'expired') return null;
    return { kind: 'api_key', id: r.id, organizationId: r.organization_id, scopes: r.scopes, deviceId: r.device_id, name: r.name, keyKind: r.kind, prefix: r.prefix };
  }

  /** When this process last recorded each key's use (so most requests skip the write entirely). */
  private readonly touched = new Map<string, number>();

  /** Records last use; at most one write per key every 10 s, and never in the request's way. */
  touch(id: string, ip: string): void {
    const now = Date.now();
    if ((this.touched.get(id) ?? 0) > now - 10_000) return;
    if (this.touched.size > 10_000) this.touched.clear();
    this.touched.set(id, now);
    this.db('api_keys')
      .where({ id })
      .andWhere((q) => q.whereNull('last_used_at').orWhere('last_used_at', '<', this.db.raw("now() - interval '10 seconds'")))
      .update({ last_used_at: this.db.fn.now(), last_used_ip: ip })
      .catch((e: Error) => this.logger.warn(`last-used not recorded: ${e.message}`));
  }

  private base(orgId: string) {
    return this.db('api_keys').leftJoin('users', 'users.id', 'api_keys.created_by').where('api_keys.organization_id', orgId).select('api_keys.*', 'users.name as creator_name');
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<ApiKeyRow>(this.base(c.principal.organizationId), q, apiKeysListSpec, columns);
    return { rows: rows.map(view), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.base(c.principal.organizationId).where('api_keys.id', id).first();
    if (!r) throw new ProblemException(404, { detail: 'No API key with that id in your organization.' });
    return view(r);
  }

  private checkKind(c: RequestContext, kind: string) {
    if (c.principal.kind === 'user' && c.principal.role === 'integrator' && kind !== 'device') {
      throw new ProblemException(403, { detail: 'Integrators issue device keys only; ask an admin for an integration key.' });
    }
  }

  async create(c: RequestContext, body: { name: string; kind: 'device' | 'integration'; environment: 'live' | 'test'; scopes: ApiKeyScope[]; deviceId?: string | null; expiresAt?: string | null }) {
    this.checkKind(c, body.kind);
    if (body.expiresAt && new Date(body.expiresAt) <= new Date()) {
      throw new ProblemException(422, { slug: 'validation-failed', detail: 'The expiry is in the past.', errors: [{ pointer: '/expiresAt', detail: 'must be in the future' }] });
    }
    if (body.deviceId && body.kind !== 'device') {
      throw new ProblemException(422, { slug: 'validation-failed', detail: 'Only device keys can be bound to a device.', errors: [{ pointer: '/deviceId', detail: 'only for kind "device"' }] });
    }
    await this.checkDevice(c, body.deviceId ?? null);
    const { secret, prefix } = newSecret(body.kind, body.environment);
    const id = await this.db.transaction(async (trx) => {
      const [row] = await trx('api_keys')
        .insert({ organization_id: c.principal.organizationId, name: body.name, kind: body.kind, environment: body.environment, scopes: body.scopes, device_id: body.deviceId ?? null, prefix, secret_hash: sha256(secret), created_by: c.principal.id, expires_at: body.expiresAt ?? null })
        .returning('id');
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'api_key.created', targetType: 'api_key', targetId: row.id, details: { name: body.name, kind: body.kind, environment: body.environment, scopes: body.scopes, prefix }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return { ...(await this.get(c, id)), secret };
  }

  async revoke(c: RequestContext, id: string) {
    const key = await this.get(c, id);
    this.checkKind(c, key.kind);
    if (key.state !== 'revoked') {
      await this.db.transaction(async (trx) => {
        await trx('api_keys').where({ id }).update({ revoked_at: trx.fn.now(), revoked_by: c.principal.id });
        await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'api_key.revoked', targetType: 'api_key', targetId: id, details: { name: key.name, prefix: key.prefix }, ip: c.ip, userAgent: c.userAgent }, trx);
      });
    }
    return this.get(c, id);
  }

  async rotate(c: RequestContext, id: string, graceSeconds: number) {
    const old = await this.get(c, id);
    this.checkKind(c, old.kind);
    if (old.state === 'revoked' || old.state === 'expired') throw new ProblemException(409, { detail: `A ${old.state} key cannot be rotated; issue a new one.` });
    if (old.state === 'grace') throw new ProblemException(409, { detail: 'This key was already rotated; rotate its successor instead.' });
    const { secret, prefix } = newSecret(old.kind, old.environment);
    const newId = await this.db.transaction(async (trx) => {
      const [row] = await trx('api_keys')
        .insert({ organization_id: c.principal.organizationId, name: old.name, kind: old.kind, environment: old.environment, scopes: old.scopes, device_id: old.deviceId, prefix, secret_hash: sha256(secret), created_by: c.principal.id, expires_at: old.expiresAt, rotated_from: old.id })
        .returning('id');
      await trx('api_keys').where({ id }).update({ grace_until: new Date(Date.now() + graceSeconds * 1000) });
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'api_key.rotated', targetType: 'api_key', targetId: id, details: { successor: row.id, graceSeconds, prefix }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return { ...(await this.get(c, newId)), secret };
  }

  private async checkDevice(c: RequestContext, deviceId: string | null) {
    if (!deviceId) return;
    const found = await this.db('devices').where({ id: deviceId, organization_id: c.principal.organizationId }).first('id');
    if (!found) throw new ProblemException(422, { slug: 'validation-failed', detail: 'No such device in your organization.', errors: [{ pointer: '/deviceId', detail: 'no such device' }] });
  }
}
