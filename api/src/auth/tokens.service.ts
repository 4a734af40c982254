import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import argon2 from 'argon2';
import { Redis } from 'ioredis';
import type { Knex } from 'knex';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import rateLimiterFlexible, { type RateLimiterAbstract, type RateLimiterRes } from 'rate-limiter-flexible';
import { AuditService } from '../audit/audit.service.js';
import { ProblemException } from '../common/problems.js';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { AccountsService, type UserRow } from '../users/accounts.service.js';
import { actionsOf } from '@pourgate/permissions';

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
  notifyDrift: UserRow['notify_drift'];
  organization: { id: string; name: string; unitSystem: 'metric' | 'imperial' };
  actions: string[];
}

const { RateLimiterMemory, RateLimiterRedis } = rateLimiterFlexible;

const BAD_CREDENTIALS = 'The e-mail or the password is not right, or the account is disabled.';

/** Sign-in, refresh-token rotation (with reuse detection) and sign-out. */
export interface AccessClaims {
  sub: string;
  org: string;
  role: string;
  typ: 'access';
  /** The session (refresh-token family) the token belongs to: signing out or a password change ends it. */
  sid: string;
}

@Injectable()
export class TokensService implements OnApplicationShutdown {
  private readonly logger = new Logger('Auth');

  private readonly redis: Redis;
  /** Attempts per account (known or not, so answers stay alike) within SIGNIN_LOCK_SECONDS. */
  private readonly perAccount: RateLimiterAbstract;
  /** Attempts per client address per minute. */
  private readonly perAddress: RateLimiterAbstract;

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly jwt: JwtService,
    private readonly users: AccountsService,
    private readonly audit: AuditService,
    private readonly config: ConfigService<Env, true>,
  ) {
    const ns = config.get('RATE_LIMIT_NAMESPACE', { infer: true });
    // a connection of its own (fails fast, no offline queue), so auth does not depend on the queues module
    const redis = new Redis(config.get('REDIS_URL', { infer: true }), { maxRetriesPerRequest: 1, enableOfflineQueue: false, connectTimeout: 2000 });
    redis.on('error', () => undefined); // an outage shows in /v1/ready; the limiters fall back to memory
    this.redis = redis;
    // Redis counts for every API process; if it is down, each process keeps counting in memory
    // rather than letting guesses through unchecked (or locking everyone out).
    const limiter = (keyPrefix: string, points: number, duration: number) =>
      new RateLimiterRedis({ storeClient: redis, keyPrefix, points, duration, rejectIfRedisNotReady: true, insuranceLimiter: new RateLimiterMemory({ keyPrefix, points, duration }) });
    this.perAccount = limiter(`${ns}signin-account`, config.get('SIGNIN_MAX_FAILURES', { infer: true }), config.get('SIGNIN_LOCK_SECONDS', { infer: true }));
    this.perAddress = limiter(`${ns}signin-address`, config.get('SIGNIN_IP_LIMIT_PER_MINUTE', { infer: true }), 60);
  }

  /**
   * Each attempt is reserved (an atomic increment in Redis) before the password is looked at, so N
   * parallel guesses check at most the limit; a right password gives the account's reservation back.
   */
  async signIn(email: string, password: string, origin: Origin): Promise<Session> {
    const accountKey = sha256(email.toLowerCase());
    const address = await this.reserve(this.perAddress, origin.ip);
    if (address) {
      await this.auditThrottle(address, this.perAddress, 'address', email, origin);
      throw this.throttled(address, 'Too many sign-in attempts from this address');
    }
    const account = await this.reserve(this.perAccount, accountKey);
    if (account) {
      await this.auditThrottle(account, this.perAccount, 'account', email, origin);
      throw this.throttled(account, 'Too many failed sign-ins for this account');
    }
    const user = await this.users.findByEmail(email);
    const ok = user?.password_hash ? await argon2.verify(user.password_hash, password) : (await argon2.verify(await DUMMY_HASH, password), false);
    if (!user || !ok || user.disabled) {
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
    await this.perAccount.delete(accountKey).catch((e: Error) => this.logger.warn(`sign-in counter not cleared: ${e.message}`));
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
      notifyDrift: u.notify_drift,
      organization: { id: org.id, name: org.name, unitSystem: org.unit_system },
      actions: actionsOf(u.role),
    };
  }

  /** A new session for a person who has just proved who they are another way (an accepted invitation). */
  startSession(user: UserRow): Promise<Session> {
    return this.issue(user, randomUUID());
  }

  private async issue(user: UserRow, familyId: string): Promise<Session> {
    const accessTtl = this.config.get('ACCESS_TOKEN_TTL_SECONDS', { infer: true });
    const refreshTtl = this.config.get('REFRESH_TOKEN_TTL_SECONDS', { infer: true });
    const claims: AccessClaims = { sub: user.id, org: user.organization_id, role: user.role, typ: 'access', sid: familyId };
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

  onApplicationShutdown(): void {
    this.redis.disconnect();
  }

  /** Takes one attempt from the limiter; answers the refusal when none is left, else null. */
  private async reserve(limiter: RateLimiterAbstract, key: string): Promise<RateLimiterRes | null> {
    try {
      await limiter.consume(key);
      return null;
    } catch (e) {
      if (e instanceof Error) {
        // neither Redis nor the in-memory fallback answered: refuse rather than check unthrottled
        this.logger.warn(`sign-in limiter failed: ${e.message}`);
        throw new ProblemException(503, { detail: 'Sign-in is briefly unavailable; try again in a moment.' }, { 'retry-after': '5' });
      }
      return e as RateLimiterRes;
    }
  }

  /** The first refused attempt of a window goes to the audit log; a flood adds no row per request. */
  private async auditThrottle(res: RateLimiterRes, limiter: RateLimiterAbstract, limit: 'address' | 'account', email: string, origin: Origin): Promise<void> {
    if (res.consumedPoints !== limiter.points + 1) return;
    await this.audit.record({ organizationId: null, actorType: 'anonymous', actorLabel: email, action: 'auth.sign_in_throttled', details: { limit }, ip: origin.ip, userAgent: origin.userAgent });
  }

  private throttled(res: RateLimiterRes, title: string): ProblemException {
    const wait = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
    return new ProblemException(429, { title, detail: `${title}. Try again in ${wait} s.` }, { 'retry-after': String(wait) });
  }

  /**
   * Ends every other session (refresh-token family) of a person, keeping the one in use; a changed
   * password must shut out whoever held the old one. Returns how many sessions ended.
   */
  async endOtherSessions(userId: string, keepFamily: string | undefined, trx: Knex | Knex.Transaction = this.db): Promise<number> {
    const q = trx('refresh_tokens').where({ user_id: userId }).whereNull('revoked_at');
    if (keepFamily) q.whereNot({ family_id: keepFamily });
    const ended = await q.update({ revoked_at: trx.fn.now() }).returning('family_id');
    return new Set(ended.map((r: { family_id: string }) => r.family_id)).size;
  }

  /** Whether a session (refresh-token family) is still alive: signed out or ended sessions are not. */
  async sessionAlive(familyId: string): Promise<boolean> {
    return Boolean(await this.db('refresh_tokens').where({ family_id: familyId }).whereNull('revoked_at').where('expires_at', '>', this.db.fn.now()).first('id'));
  }
}
