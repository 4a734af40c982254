import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import argon2 from 'argon2';
import type { Redis } from 'ioredis';
import type { Knex } from 'knex';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import { ProblemException } from '../common/problems.js';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { REDIS } from '../queues/queues.module.js';
import { UserRow, UsersRepository } from '../users/users.repository.js';
import { actionsOf } from '@pourgate/permissions';
import type { AccessClaims } from './strategies.js';

export const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

// verified when the e-mail is unknown, so a miss costs as much time as a wrong password
const DUMMY_HASH = argon2.hash('pourgate-timing-equaliser');

export interface Origin {
  ip: string;
  userAgent?: string;
}

export interface Session {
  accessToken: string;
  accessTokenExpiresAt: string;
  refreshToken: string;
  refreshTokenExpiresAt: string;
  user: MeView;
}

export interface MeView {
  id: string;
  email: string;
  name: string;
  role: UserRow['role'];
  unitSystem: UserRow['unit_system'];
  notifyRejections: UserRow['notify_rejections'];
  organization: { id: string; name: string; unitSystem: 'metric' | 'imperial' };
  actions: string[];
}

const BAD_CREDENTIALS = 'The e-mail or the password is not right, or the account is disabled.';

/** Sign-in, refresh-token rotation (with reuse detection) and sign-out. */
@Injectable()
export class TokensService {
  private readonly logger = new Logger('Auth');

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    @Inject(REDIS) private readonly redis: Redis,
    private readonly jwt: JwtService,
    private readonly users: UsersRepository,
    private readonly audit: AuditService,
    private readonly config: ConfigService<Env, true>,
  ) {}

  async signIn(email: string, password: string, origin: Origin): Promise<Session> {
    const accountKey = `pourgate:signin-failures:${sha256(email.toLowerCase())}`;
    const max = this.config.get('SIGNIN_MAX_FAILURES', { infer: true });
    const failures = await this.safe(() => this.redis.get(accountKey), null);
    if (failures !== null && Number(failures) >= max) {
      const ttl = await this.safe(() => this.redis.ttl(accountKey), 60);
      await this.audit.record({ organizationId: null, actorType: 'anonymous', actorLabel: email, action: 'auth.sign_in_throttled', ip: origin.ip, userAgent: origin.userAgent });
      throw new ProblemException(429, { title: 'Too many failed sign-ins', detail: `Too many failed sign-ins for this account. Try again in ${Math.max(ttl, 1)} s.` }, { 'retry-after': String(Math.max(ttl, 1)) });
    }
    const user = await this.users.findByEmail(email);
    const ok = user?.password_hash ? await argon2.verify(user.password_hash, password) : (await argon2.verify(await DUMMY_HASH, password), false);
    if (!user || !ok || user.disabled) {
      await this.safe(async () => {
        const n = await this.redis.incr(accountKey);
        if (n === 1) await this.redis.expire(accountKey, this.config.get('SIGNIN_LOCK_SECONDS', { infer: true }));
      }, undefined);
      await this.audit.record({
        organizationId: user?.organization_id ?? null,
        actorType: 'anonymous',
        actorLabel: email,
        action: 'auth.sign_in_failed',
        targetType: user ? 'user' : undefined,
        targetId: user?.id,
        details: { reason: !user ? 'unknown_email' : user.disabled ? 'disabled' : 'wrong_password' },
        ip: origin.ip,
        userAgent: origin.userAgent,
      });
      throw new ProblemException(401, { title: 'Sign-in failed', detail: BAD_CREDENTIALS });
    }
    await this.safe(() => this.redis.del(accountKey), 0);
    await this.db('users').where({ id: user.id }).update({ last_sign_in_at: this.db.fn.now() });
    await this.audit.record({ organizationId: user.organization_id, actorType: 'user', actorId: user.id, actorLabel: user.email, action: 'auth.signed_in', ip: origin.ip, userAgent: origin.userAgent });
    return this.issue(user, randomUUID());
  }

  async refresh(refreshToken: string, origin: Origin): Promise<Session> {
    const row = await this.db('refresh_tokens').where({ token_hash: sha256(refreshToken) }).first();
    if (!row || row.expires_at < new Date() || row.revoked_at) throw this.refreshRefused();
    if (row.used_at) {
      // a rotated token came back: someone holds a copy. End the whole family.
      await this.db('refresh_tokens').where({ family_id: row.family_id }).whereNull('revoked_at').update({ revoked_at: this.db.fn.now() });
      const u = await this.users.findById(row.user_id);
      await this.audit.record({ organizationId: u?.organization_id ?? null, actorType: 'user', actorId: row.user_id, actorLabel: u?.email, action: 'auth.refresh_reused', details: { family: row.family_id }, ip: origin.ip, userAgent: origin.userAgent });
      throw this.refreshRefused();
    }
    const claimed = await this.db('refresh_tokens').where({ id: row.id }).whereNull('used_at').update({ used_at: this.db.fn.now() });
    if (claimed !== 1) throw this.refreshRefused();
    const user = await this.users.findById(row.user_id);
    if (!user || user.disabled) throw this.refreshRefused();
    return this.issue(user, row.family_id);
  }

  async signOut(refreshToken: string): Promise<void> {
    const row = await this.db('refresh_tokens').where({ token_hash: sha256(refreshToken) }).first();
    if (!row) return;
    await this.db('refresh_tokens').where({ family_id: row.family_id }).whereNull('revoked_at').update({ revoked_at: this.db.fn.now() });
    const u = await this.users.findById(row.user_id);
    if (u) await this.audit.record({ organizationId: u.organization_id, actorType: 'user', actorId: u.id, actorLabel: u.email, action: 'auth.signed_out' });
  }

  async me(userId: string): Promise<MeView> {
    const u = await this.users.findById(userId);
    if (!u) throw new ProblemException(401, { detail: 'The account no longer exists.' });
    const org = await this.db('organizations').where({ id: u.organization_id }).first();
    return {
      id: u.id,
      email: u.email,
      name: u.name,
      role: u.role,
      unitSystem: u.unit_system,
      notifyRejections: u.notify_rejections,
      organization: { id: org.id, name: org.name, unitSystem: org.unit_system },
      actions: actionsOf(u.role),
    };
  }

  private async issue(user: UserRow, familyId: string): Promise<Session> {
    const accessTtl = this.config.get('ACCESS_TOKEN_TTL_SECONDS', { infer: true });
    const refreshTtl = this.config.get('REFRESH_TOKEN_TTL_SECONDS', { infer: true });
    const claims: AccessClaims = { sub: user.id, org: user.organization_id, role: user.role, typ: 'access' };
    const accessToken = await this.jwt.signAsync(claims, { expiresIn: accessTtl, issuer: 'pourgate', audience: 'pourgate-api', algorithm: 'HS256' });
    const refreshToken = `rt_${randomBytes(32).toString('base64url')}`;
    const refreshExpires = new Date(Date.now() + refreshTtl * 1000);
    await this.db('refresh_tokens').insert({ user_id: user.id, family_id: familyId, token_hash: sha256(refreshToken), expires_at: refreshExpires });
    return {
      accessToken,
      accessTokenExpiresAt: new Date(Date.now() + accessTtl * 1000).toISOString(),
      refreshToken,
      refreshTokenExpiresAt: refreshExpires.toISOString(),
      user: await this.me(user.id),
    };
  }

  private refreshRefused(): ProblemException {
    return new ProblemException(401, { title: 'Refresh refused', detail: 'The refresh token is unknown, expired, revoked or already used; sign in again.' });
  }

  /** Redis helps throttle, but an outage of it must not lock everyone out. */
  private async safe<T>(fn: () => Promise<T>, fallback: T): Promise<T> {
    try {
      return await fn();
    } catch (e) {
      this.logger.warn(`sign-in throttling skipped: ${(e as Error).message}`);
      return fallback;
    }
  }
}
