import { Inject, Injectable, Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import { randomBytes } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import { type ApiKeyScope, DEVICE_KEY_SCOPES, refusedScopes } from '@pourgate/permissions';
import { actorOf, Principal, RequestContext } from '../auth/principal.js';
import { sha256 } from '../auth/tokens.service.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { ProblemException } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { PrincipalCache } from './principal-cache.js';

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

const SECRET_FORMAT = /^pg[di]_(live|test)_[A-Za-z0-9_-]{43}$/;

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

  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, private readonly cache: PrincipalCache) {}

  /** The key's principal: from memory when this process holds it (see PrincipalCache), else from PostgreSQL. */
  async authenticate(secret: string): Promise<Principal | null> {
    if (!SECRET_FORMAT.test(secret)) return null;
    const hash = sha256(secret);
    const cached = this.cache.get(hash);
    if (cached) return cached;
    const gen = this.cache.begin();
    const r = (await this.db('api_keys').where({ secret_hash: hash }).first()) as ApiKeyRow | undefined;
    if (!r || keyState(r) === 'revoked' || keyState(r) === 'expired') return null;
    // a device key issued before scopes were checked at creation still holds the device scopes only
    const scopes = r.kind === 'device' ? r.scopes.filter((s) => (DEVICE_KEY_SCOPES as readonly string[]).includes(s)) : r.scopes;
    const p = { kind: 'api_key' as const, id: r.id, organizationId: r.organization_id, scopes, deviceId: r.device_id, name: r.name, keyKind: r.kind, prefix: r.prefix };
    // a key in its rotation grace period is about to end: read each time, so its end (or an early
    // one set by hand) holds at once; the hot path is active keys
    if (!r.grace_until) this.cache.set(hash, p, gen, [r.expires_at]);
    return p;
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

  /** A key holds no scope its issuer may not grant, and a device key only the device scopes. */
  private checkScopes(c: RequestContext, kind: 'device' | 'integration', scopes: readonly string[]) {
    if (c.principal.kind !== 'user') throw new ProblemException(403, { detail: 'Only people issue API keys.' });
    const refused = refusedScopes(c.principal.role, kind, scopes);
    if (refused.length === 0) return;
    const why = kind === 'device' && refused.every((s) => !(DEVICE_KEY_SCOPES as readonly string[]).includes(s)) ? `a device key holds only ${DEVICE_KEY_SCOPES.join(', ')}` : `your role (${c.principal.role}) may not grant them`;
    throw new ProblemException(403, {
      title: 'Scopes refused',
      detail: `These scopes cannot go on this key: ${refused.join(', ')} (${why}).`,
      errors: refused.map((s) => ({ pointer: `/scopes/${scopes.indexOf(s)}`, detail: `${s} refused`, code: 'scope' })),
    });
  }

  async create(c: RequestContext, body: { name: string; kind: 'device' | 'integration'; environment: 'live' | 'test'; scopes: ApiKeyScope[]; deviceId?: string | null; expiresAt?: string | null }) {
    this.checkKind(c, body.kind);
    this.checkScopes(c, body.kind, body.scopes);
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

  /**
   * Ends every secret of the key at once: the key, the keys it was rotated from (a predecessor may
   * still be in its grace period) and any successor. A leak is answered by one revoke.
   */
  async revoke(c: RequestContext, id: string) {
    const key = await this.get(c, id);
    this.checkKind(c, key.kind);
    const lineage = await this.db.transaction(async (trx) => {
      const lineage = await this.lineage(trx, c.principal.organizationId, id);
      const ended = await trx('api_keys').whereIn('id', lineage).whereNull('revoked_at').update({ revoked_at: trx.fn.now(), revoked_by: c.principal.kind === 'user' ? c.principal.id : null }).returning('id');
      if (ended.length) await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'api_key.revoked', targetType: 'api_key', targetId: id, details: { name: key.name, prefix: key.prefix, ended: ended.map((r: { id: string }) => r.id) }, ip: c.ip, userAgent: c.userAgent }, trx);
      return lineage;
    });
    // every process forgets the lineage's principals: the revoke holds everywhere within moments
    await this.cache.changed(lineage);
    return this.get(c, id);
  }

  /** The ids of a key's rotation chain (ancestors and descendants), locked for the change. */
  private async lineage(trx: Knex.Transaction, orgId: string, id: string): Promise<string[]> {
    // lock, then look again: a rotation that committed while we waited added a successor to end too
    const first = await this.chain(trx, orgId, id);
    await trx('api_keys').whereIn('id', first).forUpdate().select('id');
    const ids = await this.chain(trx, orgId, id);
    await trx('api_keys').whereIn('id', ids).forUpdate().select('id');
    return ids;
  }

  private async chain(trx: Knex.Transaction, orgId: string, id: string): Promise<string[]> {
    const { rows } = await trx.raw<{ rows: { id: string }[] }>(
      `WITH RECURSIVE up AS (
         SELECT id, rotated_from FROM api_keys WHERE id = ? AND organization_id = ?
         UNION SELECT k.id, k.rotated_from FROM api_keys k JOIN up ON k.id = up.rotated_from WHERE k.organization_id = ?
       ), down AS (
         SELECT id FROM api_keys WHERE id = ? AND organization_id = ?
         UNION SELECT k.id FROM api_keys k JOIN down ON k.rotated_from = down.id WHERE k.organization_id = ?
       )
       SELECT id FROM up UNION SELECT id FROM down`,
      [id, orgId, orgId, id, orgId, orgId],
    );
    return rows.map((r) => r.id);
  }

  async rotate(c: RequestContext, id: string, graceSeconds: number) {
    const seen = await this.get(c, id);
    this.checkKind(c, seen.kind);
    this.checkScopes(c, seen.kind, seen.scopes);
    const { secret, prefix } = newSecret(seen.kind, seen.environment);
    const newId = await this.db.transaction(async (trx) => {
      // the state is read again under a row lock, so a revoke running at the same time wins cleanly
      const locked = (await trx('api_keys').where({ id, organization_id: c.principal.organizationId }).forUpdate().first()) as ApiKeyRow;
      const old = view(locked);
      if (old.state === 'revoked' || old.state === 'expired') throw new ProblemException(409, { detail: `A ${old.state} key cannot be rotated; issue a new one.` });
      if (old.state === 'grace') throw new ProblemException(409, { detail: 'This key was already rotated; rotate its successor instead.' });
      const [row] = await trx('api_keys')
        .insert({ organization_id: c.principal.organizationId, name: old.name, kind: old.kind, environment: old.environment, scopes: old.scopes, device_id: old.deviceId, prefix, secret_hash: sha256(secret), created_by: c.principal.id, expires_at: old.expiresAt, rotated_from: old.id })
        .returning('id');
      await trx('api_keys').where({ id }).update({ grace_until: new Date(Date.now() + graceSeconds * 1000) });
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'api_key.rotated', targetType: 'api_key', targetId: id, details: { successor: row.id, graceSeconds, prefix }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    // the old secret now ends with its grace period: cached copies learn that end
    await this.cache.changed([id]);
    return { ...(await this.get(c, newId)), secret };
  }

  private async checkDevice(c: RequestContext, deviceId: string | null) {
    if (!deviceId) return;
    const found = await this.db('devices').where({ id: deviceId, organization_id: c.principal.organizationId }).first('id');
    if (!found) throw new ProblemException(422, { slug: 'validation-failed', detail: 'No such device in your organization.', errors: [{ pointer: '/deviceId', detail: 'no such device' }] });
  }
}
