import type { AuthProvider, UserIdentity } from 'react-admin';
import { canAccess } from './auth/access';
import type { Me } from './auth/me';
import type { HttpClient } from './dataProvider/httpClient';
import { pickTokens, refreshTokenLapsed, type TokenResponse, type TokenStore } from './dataProvider/session';

export interface PourgateIdentity extends UserIdentity {
  email: string;
  role: Me['role'];
  organization: Me['organization'];
  unitSystem: Me['unitSystem'];
}

export interface AuthProviderOptions {
  http: HttpClient;
  store: TokenStore;
  apiBase?: string;
  now?: () => number;
}

function errorStatus(error: unknown): number | undefined {
  return error && typeof error === 'object' && 'status' in error ? Number((error as { status: unknown }).status) : undefined;
}

/** Sign-in, refresh and sign-out against `/v1/auth`, identity and permissions from `/v1/me`. */
export function createAuthProvider({ http, store, apiBase = '/v1', now = Date.now }: AuthProviderOptions): AuthProvider {
  let me: Promise<Me> | null = null;

  const loadMe = (): Promise<Me> => {
    me ??= http.fetchJson(`${apiBase}/me`).then(
      (r) => r.json as Me,
      (err: unknown) => {
        me = null;
        throw err;
      },
    );
    return me;
  };

  const hasSession = () => {
    const t = store.read();
    return !!t && !refreshTokenLapsed(t, now());
  };

  return {
    async login(params: { email?: string; password?: string; session?: TokenResponse }) {
      // an accepted invitation answers with a session: the new person is signed in without a second form
      if (params.session) {
        store.write(pickTokens(params.session));
        me = Promise.resolve(params.session.user);
        return;
      }
      const { json } = await http.fetchJson(`${apiBase}/auth/sign-in`, {
        method: 'POST',
        body: JSON.stringify({ email: (params.email ?? '').trim(), password: params.password ?? '' }),
        anonymous: true,
      });
      const body = json as TokenResponse;
      store.write(pickTokens(body));
      me = Promise.resolve(body.user);
    },

    async logout() {
      const tokens = store.read();
      store.clear();
      me = null;
      if (tokens) {
        try {
          await http.fetchJson(`${apiBase}/auth/sign-out`, {
            method: 'POST',
            headers: { Authorization: `Bearer ${tokens.accessToken}` },
            body: JSON.stringify({ refreshToken: tokens.refreshToken }),
            anonymous: true,
          });
        } catch {
          // the tokens are gone from this tab either way; the refresh token lapses on its own
        }
      }
    },

    async checkAuth() {
      if (!hasSession()) throw { message: false, redirectTo: '/login' };
    },

    async checkError(error: unknown) {
      const status = errorStatus(error);
      if (status === 401) {
        store.clear();
        me = null;
        throw { message: 'Your session has ended. Please sign in again.', redirectTo: '/login' };
      }
      // 403 keeps the person signed in: the page shows what was refused
    },

    async getIdentity(): Promise<PourgateIdentity> {
      const m = await loadMe();
      return { id: m.id, fullName: m.name, email: m.email, role: m.role, organization: m.organization, unitSystem: m.unitSystem };
    },

    async getPermissions() {
      if (!hasSession()) return [];
      return (await loadMe()).actions ?? [];
    },

    async canAccess({ resource, action }: { resource: string; action: string }) {
      if (!hasSession()) return false;
      return canAccess((await loadMe()).actions, resource, action);
    },
  };
}
