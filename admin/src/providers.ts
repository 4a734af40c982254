import { createAuthProvider } from './authProvider';
import { createDataProvider } from './dataProvider';
import { createHttpClient } from './dataProvider/httpClient';
import { refreshTokenLapsed, storageTokenStore } from './dataProvider/session';

/** The console talks to the API on its own origin, under /v1 (vite proxies it in development). */
export const API_BASE = '/v1';

const store = storageTokenStore(window.sessionStorage);
export const http = createHttpClient({ store, refreshUrl: `${API_BASE}/auth/refresh` });

export const dataProvider = createDataProvider(http, API_BASE);
export const authProvider = createAuthProvider({ http, store, apiBase: API_BASE });

/** A session exists in this tab (its tokens may still be refused; the http client handles that). */
export function isSignedIn(): boolean {
  const tokens = store.read();
  return !!tokens && !refreshTokenLapsed(tokens);
}
