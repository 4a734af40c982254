import { actionsOf } from '@pourgate/permissions';
import { describe, expect, it, vi } from 'vitest';
import { createAuthProvider } from './authProvider';
import { createHttpClient } from './dataProvider/httpClient';
import { memoryTokenStore } from './dataProvider/session';

const NOW = Date.parse('2025-06-02T08:00:00Z');
const iso = (ms: number) => new Date(NOW + ms).toISOString();
const me = { id: 'u-int', email: 'integrator@demo.test', name: 'Ines Integra', role: 'integrator', unitSystem: 'metric', organization: { id: 'o1', name: 'Demo Foamworks' }, actions: actionsOf('integrator') };
const pair = { accessToken: 'acc-1', accessTokenExpiresAt: iso(900_000), refreshToken: 'ref-1', refreshTokenExpiresAt: iso(86_400_000) };

function setup(handler: (url: string, init: RequestInit) => Response) {
  const store = memoryTokenStore();
  const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => handler(String(url), init ?? {}));
  const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW });
  return { store, fetch, auth: createAuthProvider({ http, store, now: () => NOW }) };
}

const ok = (body: unknown, status = 200) => new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

describe('authProvider', () => {
  it('signs in, keeps the tokens and answers identity and permissions without another call', async () => {
    const { auth, store, fetch } = setup((url) => (url === '/v1/auth/sign-in' ? ok({ ...pair, user: me }) : ok({}, 500)));
    await auth.login({ email: ' integrator@demo.test ', password: 'pourgate-demo' });
    expect(JSON.parse(String(fetch.mock.calls[0]![1]?.body))).toEqual({ email: 'integrator@demo.test', password: 'pourgate-demo' });
    expect(store.read()?.refreshToken).toBe('ref-1');
    await expect(auth.checkAuth({})).resolves.toBeUndefined();
    expect(await auth.getPermissions!({})).toEqual(actionsOf('integrator'));
    expect(await auth.getIdentity!()).toMatchObject({ id: 'u-int', fullName: 'Ines Integra', role: 'integrator', organization: { name: 'Demo Foamworks' } });
    expect(await auth.canAccess!({ resource: 'api-keys', action: 'create' })).toBe(true);
    expect(await auth.canAccess!({ resource: 'users', action: 'list' })).toBe(false);
    expect(fetch).toHaveBeenCalledTimes(1);
  });

  it('passes the sign-in refusal on with the problem detail and keeps no session', async () => {
    const { auth, store } = setup(() =>
      new Response(JSON.stringify({ type: 'about:blank', title: 'Unauthorized', status: 401, detail: 'E-mail or password is not right.' }), {
        status: 401,
        headers: { 'Content-Type': 'application/problem+json' },
      }),
    );
    await expect(auth.login({ email: 'x@y.test', password: 'nope' })).rejects.toMatchObject({ status: 401, message: 'E-mail or password is not right.' });
    expect(store.read()).toBeNull();
    await expect(auth.checkAuth({})).rejects.toMatchObject({ message: false });
  });

  it('loads /v1/me once after a reload', async () => {
    const { auth, store, fetch } = setup((url) => (url === '/v1/me' ? ok(me) : ok({}, 404)));
    store.write(pair);
    const [perms, id] = await Promise.all([auth.getPermissions!({}), auth.getIdentity!()]);
    expect(perms).toContain('api-keys:manage');
    expect(id.fullName).toBe('Ines Integra');
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(new Headers(fetch.mock.calls[0]![1]?.headers).get('Authorization')).toBe('Bearer acc-1');
  });

  it('treats a lapsed refresh token as signed out', async () => {
    const { auth, store } = setup(() => ok({}));
    store.write({ ...pair, refreshTokenExpiresAt: iso(-1000) });
    await expect(auth.checkAuth({})).rejects.toBeTruthy();
    expect(await auth.getPermissions!({})).toEqual([]);
  });

  it('signs out with the refresh token and forgets the tokens', async () => {
    const { auth, store, fetch } = setup(() => new Response(null, { status: 204 }));
    store.write(pair);
    await auth.logout({});
    expect(store.read()).toBeNull();
    const [url, init] = fetch.mock.calls[0]!;
    expect(url).toBe('/v1/auth/sign-out');
    expect(JSON.parse(String(init?.body))).toEqual({ refreshToken: 'ref-1' });
  });

  it('logs out on 401 but keeps the session on 403', async () => {
    const { auth, store } = setup(() => ok({}));
    store.write(pair);
    await expect(auth.checkError({ status: 403 })).resolves.toBeUndefined();
    expect(store.read()).not.toBeNull();
    await expect(auth.checkError({ status: 401 })).rejects.toMatchObject({ redirectTo: '/login' });
    expect(store.read()).toBeNull();
  });
});
