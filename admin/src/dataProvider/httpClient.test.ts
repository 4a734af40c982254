import { describe, expect, it, vi } from 'vitest';
import { createHttpClient } from './httpClient';
import { memoryTokenStore, type Tokens } from './session';

const NOW = Date.parse('2025-06-02T08:00:00Z');
const later = (ms: number) => new Date(NOW + ms).toISOString();

function tokens(n: number): Tokens {
  return { accessToken: `access-${n}`, accessTokenExpiresAt: later(15 * 60_000), refreshToken: `refresh-${n}`, refreshTokenExpiresAt: later(7 * 86_400_000) };
}

function json(status: number, body: unknown, headers: Record<string, string> = {}) {
  const type = status >= 400 ? 'application/problem+json' : 'application/json';
  return new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'Content-Type': type, ...headers } });
}

const me = { id: 'u1', email: 'a@b.test', name: 'A', role: 'admin', unitSystem: 'metric', organization: { id: 'o1', name: 'O' }, actions: [] };

/**
 * A fake API: `/v1/auth/refresh` rotates the pair (refusing a spent refresh token), every other
 * route answers 200 only to the current access token.
 */
function fakeApi(startAt = 1) {
  let current = startAt;
  const spent = new Set<string>();
  const calls: { url: string; auth: string | null; body?: string }[] = [];
  const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => {
    const u = String(url);
    const auth = new Headers(init?.headers).get('Authorization');
    calls.push({ url: u, auth, body: init?.body as string | undefined });
    if (u.endsWith('/auth/refresh')) {
      const { refreshToken } = JSON.parse(String(init?.body));
      if (refreshToken !== `refresh-${current}` || spent.has(refreshToken)) return json(401, { title: 'Unauthorized', status: 401, detail: 'The refresh token is not valid.' });
      spent.add(refreshToken);
      current += 1;
      return json(200, { ...tokens(current), user: me });
    }
    if (auth !== `Bearer access-${current}`) return json(401, { title: 'Unauthorized', status: 401, detail: 'The access token has expired.' });
    return json(200, [{ id: 1 }], { 'Content-Range': 'users 0-0/1' });
  });
  return { fetch, calls };
}

describe('httpClient', () => {
  it('sends the bearer token and JSON headers', async () => {
    const api = fakeApi();
    const store = memoryTokenStore(tokens(1));
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch: api.fetch, now: () => NOW });
    const res = await http.fetchJson('/v1/users', { method: 'POST', body: '{}' });
    expect(res.status).toBe(200);
    expect(res.json).toEqual([{ id: 1 }]);
    const [, init] = api.fetch.mock.calls[0]!;
    const h = new Headers(init?.headers);
    expect(h.get('Authorization')).toBe('Bearer access-1');
    expect(h.get('Content-Type')).toBe('application/json');
    expect(h.get('Accept')).toBe('application/json');
  });

  it('on 401 refreshes once, keeps the rotated refresh token and retries with the new access token', async () => {
    const store = memoryTokenStore(tokens(1));
    // the server has moved on: access-1 is no longer accepted, but refresh-1 still is
    const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => {
      const auth = new Headers(init?.headers).get('Authorization');
      if (String(url).endsWith('/auth/refresh')) return json(200, { ...tokens(2), user: me });
      return auth === 'Bearer access-2' ? json(200, { ok: true }) : json(401, { title: 'Unauthorized', status: 401 });
    });
    const onRefreshed = vi.fn();
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW, onRefreshed });
    const res = await http.fetchJson('/v1/me');
    expect(res.json).toEqual({ ok: true });
    expect(fetch.mock.calls.map(([u]) => String(u))).toEqual(['/v1/me', '/v1/auth/refresh', '/v1/me']);
    expect(JSON.parse(String((fetch.mock.calls[1] as unknown as [string, RequestInit])[1].body))).toEqual({ refreshToken: 'refresh-1' });
    expect(store.read()?.refreshToken).toBe('refresh-2');
    expect(store.read()?.accessToken).toBe('access-2');
    expect(onRefreshed).toHaveBeenCalledWith(expect.objectContaining({ user: me }));
  });

  it('gives up after one refresh: a second 401 ends the session and reaches the caller', async () => {
    const store = memoryTokenStore(tokens(1));
    const fetch = vi.fn(async (url: RequestInfo | URL) =>
      String(url).endsWith('/auth/refresh') ? json(200, { ...tokens(2), user: me }) : json(401, { title: 'Unauthorized', status: 401, detail: 'Signed out by an admin.' }),
    );
    const onSessionEnded = vi.fn();
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW, onSessionEnded });
    await expect(http.fetchJson('/v1/me')).rejects.toMatchObject({ status: 401, message: 'Signed out by an admin.' });
    expect(fetch.mock.calls.filter(([u]) => String(u).endsWith('/auth/refresh'))).toHaveLength(1);
    expect(fetch).toHaveBeenCalledTimes(3);
    expect(store.read()).toBeNull();
    expect(onSessionEnded).toHaveBeenCalledTimes(1);
  });

  it('clears the session when the refresh token is refused (spent or expired)', async () => {
    const api = fakeApi(5); // server is at pair 5; the store still holds pair 1
    const store = memoryTokenStore(tokens(1));
    const onSessionEnded = vi.fn();
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch: api.fetch, now: () => NOW, onSessionEnded });
    await expect(http.fetchJson('/v1/users')).rejects.toMatchObject({ status: 401 });
    expect(store.read()).toBeNull();
    expect(onSessionEnded).toHaveBeenCalled();
    expect(api.calls.map((c) => c.url)).toEqual(['/v1/users', '/v1/auth/refresh']);
  });

  it('lets concurrent 401s share one refresh, so the rotating token is never reused', async () => {
    const store = memoryTokenStore(tokens(1));
    const calls: string[] = [];
    const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => {
      const u = String(url);
      calls.push(u);
      if (u.endsWith('/auth/refresh')) {
        await new Promise((r) => setTimeout(r, 5));
        const { refreshToken } = JSON.parse(String(init?.body));
        // a reused refresh token is refused, as the API does
        return refreshToken === 'refresh-1' && calls.filter((c) => c.endsWith('/auth/refresh')).length === 1
          ? json(200, { ...tokens(2), user: me })
          : json(401, { status: 401, title: 'Unauthorized', detail: 'The refresh token was already used.' });
      }
      const auth = new Headers(init?.headers).get('Authorization');
      return auth === 'Bearer access-2' ? json(200, { u }) : json(401, { status: 401, title: 'Unauthorized' });
    });
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW });
    const results = await Promise.all([http.fetchJson('/v1/users'), http.fetchJson('/v1/api-keys'), http.fetchJson('/v1/me')]);
    expect(results.map((r) => r.status)).toEqual([200, 200, 200]);
    expect(calls.filter((c) => c.endsWith('/auth/refresh'))).toHaveLength(1);
    expect(store.read()?.refreshToken).toBe('refresh-2');
  });

  it('retries without refreshing when another request already renewed the token', async () => {
    const store = memoryTokenStore(tokens(1));
    const fetch = vi.fn(async (url: RequestInfo | URL, init?: RequestInit) => {
      const auth = new Headers(init?.headers).get('Authorization');
      if (auth === 'Bearer access-1') {
        // while this request was on the wire, another one rotated the pair
        store.write(tokens(2));
        return json(401, { status: 401, title: 'Unauthorized' });
      }
      return String(url).endsWith('/auth/refresh') ? json(500, {}) : json(200, { ok: 1 });
    });
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW });
    const res = await http.fetchJson('/v1/me');
    expect(res.json).toEqual({ ok: 1 });
    expect(fetch.mock.calls.map(([u]) => String(u))).toEqual(['/v1/me', '/v1/me']);
  });

  it('refreshes before sending when the access token is about to lapse', async () => {
    const api = fakeApi(1);
    const soon = { ...tokens(1), accessTokenExpiresAt: later(5_000) };
    const store = memoryTokenStore(soon);
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch: api.fetch, now: () => NOW });
    await http.fetchJson('/v1/users');
    expect(api.calls.map((c) => [c.url, c.auth])).toEqual([
      ['/v1/auth/refresh', null],
      ['/v1/users', 'Bearer access-2'],
    ]);
  });

  it('keeps the tokens when the refresh call cannot reach the API', async () => {
    const store = memoryTokenStore(tokens(1));
    const fetch = vi.fn(async () => {
      throw new TypeError('Failed to fetch');
    });
    const onSessionEnded = vi.fn();
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW, onSessionEnded });
    await expect(http.refresh()).resolves.toBe(false);
    expect(store.read()?.refreshToken).toBe('refresh-1');
    expect(onSessionEnded).not.toHaveBeenCalled();
  });

  it('sends public calls without a token and does not refresh on their 401', async () => {
    const store = memoryTokenStore(tokens(1));
    const fetch = vi.fn(async () => json(401, { type: 'about:blank', title: 'Unauthorized', status: 401, detail: 'E-mail or password is wrong.' }));
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW });
    await expect(http.fetchJson('/v1/auth/sign-in', { method: 'POST', body: '{}', anonymous: true })).rejects.toMatchObject({
      status: 401,
      message: 'E-mail or password is wrong.',
    });
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(new Headers((fetch.mock.calls[0] as unknown as [string, RequestInit])[1].headers).get('Authorization')).toBeNull();
    expect(store.read()?.accessToken).toBe('access-1');
  });

  it('turns problem+json validation failures into HttpError with field keys', async () => {
    const store = memoryTokenStore(tokens(1));
    const fetch = vi.fn(async () =>
      json(422, { type: '/v1/problems/validation-failed', title: 'The request is not valid', status: 422, detail: 'The request has invalid fields.', errors: [{ pointer: '/scopes/0', detail: 'is not a known scope' }] }),
    );
    const http = createHttpClient({ store, refreshUrl: '/v1/auth/refresh', fetch, now: () => NOW });
    await expect(http.fetchJson('/v1/api-keys', { method: 'POST', body: '{}' })).rejects.toMatchObject({
      status: 422,
      message: 'The request has invalid fields.',
      body: { errors: { 'scopes.0': 'is not a known scope' } },
    });
  });
});
