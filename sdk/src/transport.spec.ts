import { describe, expect, it } from '@jest/globals';
import { parseRetryAfter, PourgateNetworkError, PourgateProblem } from './errors.js';
import { backoffDelay, createTransport } from './transport.js';

function recorder(answers: Array<number | Error | ((r: Request) => Response)>) {
  const seen: { method: string; headers: Headers; body: string }[] = [];
  const fetch = async (r: Request) => {
    seen.push({ method: r.method, headers: new Headers(r.headers), body: await r.text() });
    const next = answers.shift() ?? 200;
    if (next instanceof Error) throw next;
    if (typeof next === 'function') return next(r);
    return new Response(next === 204 ? null : '{}', { status: next, headers: next === 429 ? { 'retry-after': '2' } : {} });
  };
  return { fetch, seen };
}

const sleeps: number[] = [];
const sleep = async (ms: number) => void sleeps.push(ms);

describe('retry-after and backoff', () => {
  it('reads delta-seconds and HTTP dates (RFC 9110 §10.2.3)', () => {
    const now = Date.parse('2026-01-05T10:00:00Z');
    expect(parseRetryAfter('120', now)).toBe(120);
    expect(parseRetryAfter('Mon, 05 Jan 2026 10:00:30 GMT', now)).toBe(30);
    expect(parseRetryAfter('soon', now)).toBeUndefined();
    expect(parseRetryAfter(null, now)).toBeUndefined();
  });

  it('full jitter: between 0 and base × 2^attempt, capped', () => {
    expect(backoffDelay(0, 100, 10_000, () => 0.999)).toBe(100);
    expect(backoffDelay(3, 100, 10_000, () => 0.5)).toBe(400);
    expect(backoffDelay(10, 100, 10_000, () => 1)).toBe(10_000);
    expect(backoffDelay(5, 100, 10_000, () => 0)).toBe(0);
  });
});

describe('transport', () => {
  it('sends one Idempotency-Key per POST, the same on every retry, and the same body each time', async () => {
    const { fetch, seen } = recorder([new TypeError('fetch failed'), 503, 201]);
    const t = createTransport({ credentials: { apiKey: 'pgd_test_x' }, fetch, sleep, retry: { baseDelayMs: 1 } });
    const res = await t(new Request('http://127.0.0.1:9/v1/readings', { method: 'POST', body: '{"a":1}', headers: { 'content-type': 'application/json' } }));
    expect(res.status).toBe(201);
    expect(seen).toHaveLength(3);
    const keys = seen.map((s) => s.headers.get('idempotency-key'));
    expect(keys[0]).toMatch(/^[0-9a-f-]{36}$/);
    expect(new Set(keys).size).toBe(1);
    expect(seen.map((s) => s.body)).toEqual(['{"a":1}', '{"a":1}', '{"a":1}']);
    expect(seen.every((s) => s.headers.get('x-api-key') === 'pgd_test_x')).toBe(true);
    const second = await t(new Request('http://127.0.0.1:9/v1/readings', { method: 'POST', body: '{}' }));
    expect(second.status).toBe(200);
    expect(seen[3]!.headers.get('idempotency-key')).not.toBe(keys[0]);
  });

  it('sends no Idempotency-Key on GET, and waits what Retry-After asks on a 429', async () => {
    sleeps.length = 0;
    const { fetch, seen } = recorder([429, 200]);
    const t = createTransport({ credentials: {}, fetch, sleep, retry: { baseDelayMs: 10 } });
    expect((await t(new Request('http://127.0.0.1:9/v1/devices'))).status).toBe(200);
    expect(seen[0]!.headers.has('idempotency-key')).toBe(false);
    expect(sleeps[0]).toBeGreaterThanOrEqual(2000);
    expect(sleeps[0]).toBeLessThanOrEqual(2010);
  });

  it('gives up after the configured retries: the last 5xx is returned; a 4xx is never retried', async () => {
    const five = recorder([500, 502, 503]);
    const t = createTransport({ credentials: {}, fetch: five.fetch, sleep, retry: { retries: 2, baseDelayMs: 1 } });
    expect((await t(new Request('http://127.0.0.1:9/x'))).status).toBe(503);
    expect(five.seen).toHaveLength(3);
    const four = recorder([422]);
    const t4 = createTransport({ credentials: {}, fetch: four.fetch, sleep });
    expect((await t4(new Request('http://127.0.0.1:9/x', { method: 'POST', body: '{}' }))).status).toBe(422);
    expect(four.seen).toHaveLength(1);
  });

  it('a network error on the last try becomes PourgateNetworkError with the attempt count', async () => {
    const { fetch } = recorder([new TypeError('fetch failed'), new TypeError('fetch failed')]);
    const t = createTransport({ credentials: {}, fetch, sleep, retry: { retries: 1, baseDelayMs: 1 } });
    const err = await t(new Request('http://127.0.0.1:9/x')).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PourgateNetworkError);
    expect((err as PourgateNetworkError).attempts).toBe(2);
  });

  it('on a 401 asks the refresh callback once and repeats the request with the new token', async () => {
    const { fetch, seen } = recorder([(r) => new Response('{}', { status: r.headers.get('authorization') === 'Bearer new' ? 200 : 401 }), (r) => new Response('{}', { status: r.headers.get('authorization') === 'Bearer new' ? 200 : 401 })]);
    let refreshes = 0;
    const t = createTransport({ credentials: { token: 'old', refresh: async () => (refreshes++, 'new') }, fetch, sleep });
    expect((await t(new Request('http://127.0.0.1:9/v1/me'))).status).toBe(200);
    expect(seen.map((s) => s.headers.get('authorization'))).toEqual(['Bearer old', 'Bearer new']);
    expect(refreshes).toBe(1);
  });
});

describe('PourgateProblem', () => {
  it('carries the problem members; a non-problem error body becomes about:blank with the status text', () => {
    const p = PourgateProblem.from(422, 'Unprocessable Entity', 'application/problem+json', { type: 'https://pourgate.example/problems/validation', title: 'Invalid body', status: 422, detail: 'See errors', errors: [{ pointer: '/value', detail: 'must be a number' }] });
    expect(p).toBeInstanceOf(Error);
    expect(p).toMatchObject({ status: 422, title: 'Invalid body', detail: 'See errors', type: 'https://pourgate.example/problems/validation' });
    expect(p.errorAt('/value')?.detail).toBe('must be a number');
    const html = PourgateProblem.from(502, 'Bad Gateway', 'text/html', '<html>upstream down</html>');
    expect(html).toMatchObject({ status: 502, title: 'Bad Gateway', type: 'about:blank', errors: [] });
  });
});
