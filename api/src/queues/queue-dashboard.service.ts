import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createHmac, timingSafeEqual } from 'node:crypto';
import type { Env } from '../config/env.js';
import { TokensService } from '../auth/tokens.service.js';
import { roleAllows, type Role } from '@pourgate/permissions';

/** A page beside the API (like /docs), not an operation of it. */
export const DASHBOARD_PATH = '/queues';
export const DASHBOARD_COOKIE = 'pourgate_queues';
/** A pass lasts this long; the console asks for a new one each time the link is used. */
export const PASS_TTL_S = 15 * 60;

interface Pass {
  sub: string;
  exp: number;
}

/**
 * The queue dashboard is a browser page, so a person's bearer token cannot reach it. An admin's
 * console asks for a pass (POST /v1/admin/queue-sessions); the pass is an HMAC-signed cookie
 * (HttpOnly, SameSite=Strict, Path=/queues, 15 minutes), checked on every dashboard
 * request together with the person's current role, so a demoted admin loses it at once.
 */
@Injectable()
export class QueueDashboardService {
  private readonly key: Buffer;
  readonly secureCookie: boolean;

  constructor(config: ConfigService<Env, true>, private readonly tokens: TokensService) {
    this.key = createHmac('sha256', config.get('JWT_SECRET', { infer: true })).update('queue-dashboard-pass').digest();
    this.secureCookie = (config.get('PUBLIC_URL', { infer: true }) ?? '').startsWith('https:');
  }

  issue(userId: string, now = Date.now()): { cookie: string; url: string; expiresAt: string } {
    const exp = Math.floor(now / 1000) + PASS_TTL_S;
    const body = Buffer.from(JSON.stringify({ sub: userId, exp } satisfies Pass)).toString('base64url');
    const value = `${body}.${this.sign(body)}`;
    const cookie = [`${DASHBOARD_COOKIE}=${value}`, `Path=${DASHBOARD_PATH}`, `Max-Age=${PASS_TTL_S}`, 'HttpOnly', 'SameSite=Strict', ...(this.secureCookie ? ['Secure'] : [])].join('; ');
    return { cookie, url: `${DASHBOARD_PATH}/`, expiresAt: new Date(exp * 1000).toISOString() };
  }

  /** The user id a cookie header's pass names, or null (missing, forged or lapsed). */
  passHolder(cookieHeader: string | undefined, now = Date.now()): string | null {
    const raw = (cookieHeader ?? '').split(';').map((c) => c.trim()).find((c) => c.startsWith(`${DASHBOARD_COOKIE}=`));
    if (!raw) return null;
    const [body, mac] = raw.slice(DASHBOARD_COOKIE.length + 1).split('.');
    if (!body || !mac) return null;
    const want = Buffer.from(this.sign(body));
    const got = Buffer.from(mac);
    if (want.length !== got.length || !timingSafeEqual(want, got)) return null;
    try {
      const pass = JSON.parse(Buffer.from(body, 'base64url').toString('utf8')) as Pass;
      return typeof pass.sub === 'string' && pass.exp * 1000 > now ? pass.sub : null;
    } catch {
      return null;
    }
  }

  /** Whether the pass holder may see the queues now (the role is read again, not trusted from the pass). */
  async mayView(userId: string): Promise<boolean> {
    try {
      const me = await this.tokens.me(userId);
      return roleAllows(me.role as Role, 'queues:read');
    } catch {
      return false;
    }
  }

  private sign(body: string): string {
    return createHmac('sha256', this.key).update(body).digest('base64url');
  }
}
