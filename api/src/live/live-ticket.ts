/**
 * Live-stream tickets: EventSource cannot set an Authorization header, so an authenticated POST
 * hands out a ticket that goes in the stream's query string. Stateless (HMAC-SHA256 over the claims
 * with a key derived from JWT_SECRET), so any API process can open the stream; short-lived, so a
 * ticket that leaks into a log is soon worth nothing. Pure: no Nest, no I/O.
 */
import { createHmac, timingSafeEqual } from 'node:crypto';

export interface LiveClaims {
  /** organization */
  o: string;
  /** who asked (user or API key id) and which kind */
  p: string;
  pk: 'user' | 'api_key';
  /** what to watch: a station, a device, or neither (every device) */
  s?: string;
  d?: string;
  /** expiry, seconds since the epoch */
  exp: number;
}

const key = (secret: string) => createHmac('sha256', secret).update('pourgate live-stream tickets').digest();

export function signTicket(claims: LiveClaims, secret: string): string {
  const body = Buffer.from(JSON.stringify(claims)).toString('base64url');
  const sig = createHmac('sha256', key(secret)).update(body).digest('base64url');
  return `lt_${body}.${sig}`;
}

/** The claims of a ticket that is genuine and not expired, else null. */
export function verifyTicket(ticket: string, secret: string, nowMs = Date.now()): LiveClaims | null {
  const m = /^lt_([A-Za-z0-9_-]+)\.([A-Za-z0-9_-]+)$/.exec(ticket);
  if (!m) return null;
  const want = createHmac('sha256', key(secret)).update(m[1]!).digest();
  const got = Buffer.from(m[2]!, 'base64url');
  if (got.length !== want.length || !timingSafeEqual(got, want)) return null;
  let claims: LiveClaims;
  try {
    claims = JSON.parse(Buffer.from(m[1]!, 'base64url').toString('utf8')) as LiveClaims;
  } catch {
    return null;
  }
  if (typeof claims.exp !== 'number' || claims.exp * 1000 <= nowMs || typeof claims.o !== 'string') return null;
  return claims;
}
