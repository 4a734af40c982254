import type { Me } from '../auth/me';

/** Where this tab keeps its tokens (sessionStorage). */
export const SESSION_KEY = 'pourgate.session';

/** The four values the API hands out at sign-in and at every refresh. */
export interface Tokens {
  accessToken: string;
  accessTokenExpiresAt: string;
  refreshToken: string;
  refreshTokenExpiresAt: string;
}

/** What the sign-in and refresh routes answer. */
export interface TokenResponse extends Tokens {
  user: Me;
}

export interface TokenStore {
  read(): Tokens | null;
  write(tokens: Tokens): void;
  clear(): void;
}

export function pickTokens(body: Tokens): Tokens {
  return {
    accessToken: body.accessToken,
    accessTokenExpiresAt: body.accessTokenExpiresAt,
    refreshToken: body.refreshToken,
    refreshTokenExpiresAt: body.refreshTokenExpiresAt,
  };
}

function isTokens(v: unknown): v is Tokens {
  const t = v as Tokens | null;
  return !!t && typeof t.accessToken === 'string' && typeof t.refreshToken === 'string';
}

/**
 * Tokens live in sessionStorage, one tab each: refresh tokens rotate and a reused one is refused,
 * so two tabs sharing one token would sign each other out at the first refresh.
 */
export function storageTokenStore(storage: Storage, key = SESSION_KEY): TokenStore {
  return {
    read() {
      try {
        const raw = storage.getItem(key);
        const parsed: unknown = raw ? JSON.parse(raw) : null;
        return isTokens(parsed) ? parsed : null;
      } catch {
        return null;
      }
    },
    write(tokens) {
      storage.setItem(key, JSON.stringify(pickTokens(tokens)));
    },
    clear() {
      storage.removeItem(key);
    },
  };
}

export function memoryTokenStore(initial: Tokens | null = null): TokenStore {
  let current = initial;
  return {
    read: () => current,
    write: (t) => {
      current = pickTokens(t);
    },
    clear: () => {
      current = null;
    },
  };
}

/** True when the access token is gone or will lapse within `skewMs`. */
export function accessTokenLapsing(tokens: Tokens, now = Date.now(), skewMs = 15_000): boolean {
  const at = Date.parse(tokens.accessTokenExpiresAt);
  return Number.isFinite(at) && at - skewMs <= now;
}

export function refreshTokenLapsed(tokens: Tokens, now = Date.now()): boolean {
  const at = Date.parse(tokens.refreshTokenExpiresAt);
  return Number.isFinite(at) && at <= now;
}
