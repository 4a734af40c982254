import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { Pourgate, PourgateProblem, verifyWebhook, WebhookVerificationError, type PourgateEvent, type Reading } from '@pourgate/sdk';
import { closeTestDb, makeOrg, type OrgFixture, PASSWORD, testDb } from './support/fixtures.js';
import { listenOnLoopback as listen, startTestApp, type TestApp } from './support/app.js';
import { flexSystem } from './support/shop.js';
import { startFlakyProxy } from '../../fakes/src/flaky-proxy.js';

// The SDK against the real API: the scale bridge and webhook receiver of sdk/README.md, retries that
// never duplicate a reading, problem details as typed errors, and list/feed iteration.
// Check values: ±5 % ratio tolerance is common practice; the masses are the API's own targets.

let t: TestApp;
let base: string;
let org: OrgFixture;
let integrator: Pourgate;
let engineer: Pourgate;
const fast = { retry: { baseDelayMs: 20, maxDelayMs: 200 } };

/** A receiver as sdk/README.md shows it: raw body + headers + secret → the verified event. */
async function startReceiver(secret: () => string) {
  const events: PourgateEvent[] = [];
  const raw: { headers: http.IncomingHttpHeaders; body: string }[] = [];
  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const body = Buffer.concat(chunks);
      raw.push({ headers: req.headers, body: body.toString('utf8') });
      try {
        events.push(verifyWebhook(req.headers, body, secret()));
        res.writeHead(204).end();
      } catch {
        res.writeHead(400).end();
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/hooks`,
    events,
    raw,
    async waitFor(match: (e: PourgateEvent) => boolean, ms = 20_000) {
      const end = Date.now() + ms;
      for (;;) {
        const found = events.find(match);
        if (found) return found;
        if (Date.now() > end) throw new Error(`no matching webhook within ${ms} ms (${events.length} received)`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    close: () => new Promise<void>((resolve) => (server.closeAllConnections(), server.close(() => resolve()))),
  };
}

let receiver: Awaited<ReturnType<typeof startReceiver>>;
let secret = '';
let scaleKey: string;
let scaleId: string;
let batchId: string;
const posted: Reading[] = [];

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', WEBHOOK_ALLOWED_HOSTS: '127.0.0.1', WEBHOOK_RETRY_SCHEDULE: '0,0.3,0.3', WEBHOOK_RELAY_INTERVAL_MS: '50', WEBHOOK_TIMEOUT_MS: '3000' });
  base = await listen(t);
  org = await makeOrg('sdk');
  integrator = await Pourgate.signIn({ baseUrl: base, email: org.people.integrator.email, password: PASSWORD, ...fast });
  engineer = await Pourgate.signIn({ baseUrl: base, email: org.people.engineer.email, password: PASSWORD, ...fast });
  receiver = await startReceiver(() => secret);
}, 60_000);
afterAll(async () => {
  await receiver?.close();
  await t.close();
  await closeTestDb();
});

describe('a scale bridge', () => {
  it('registers a scale, posts A, B and pigment with its device key, and gets each verdict as a verified webhook', async () => {
    // the integrator's part: device, device key, webhook endpoint
    const device = await integrator.unwrap<{ id: string }>(
      integrator.api.POST('/v1/devices', { body: { kind: 'scale', serial: `SDK-${randomUUID().slice(0, 8)}`, name: 'Bench scale 1', stationCode: 'S1', readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2099-12-31' } }),
    );
    scaleId = device.id;
    const key = await integrator.unwrap<{ secret: string }>(integrator.api.POST('/v1/api-keys', { body: { name: 'Bench scale 1', kind: 'device', scopes: ['readings:write', 'targets:read'], deviceId: device.id } }));
    scaleKey = key.secret;
    const endpoint = await integrator.unwrap<{ secret: string }>(integrator.api.POST('/v1/webhook-endpoints', { body: { url: receiver.url, eventTypes: ['reading.accepted', 'reading.rejected'] } }));
    secret = endpoint.secret;
    // the engineer's part: a system and a batch weighed on that scale
    const system = await engineer.unwrap<{ id: string }>(engineer.api.POST('/v1/material-systems', { body: flexSystem({ ratio: { a: 100, b: 50 } }) as never }));
    const batch = await engineer.unwrap<{ id: string }>(engineer.api.POST('/v1/batches', { body: { materialSystemId: system.id, freeRiseCup: { volume: { value: 2, unit: 'L' } }, options: { scaleDeviceId: device.id, pigmentPercent: 2 } } }));
    batchId = batch.id;

    // the bridge: what sdk/README.md shows
    const scale = new Pourgate({ baseUrl: base, apiKey: scaleKey, ...fast });
    const targets = await scale.batchTargets(batchId);
    expect(targets.scaleReadability?.si.value).toBeCloseTo(0.0001, 12);
    for (const [part, subject] of [['A', 'part_a'], ['B', 'part_b'], ['pigment', 'pigment']] as const) {
      const grams = Number(((targets.components[part].mass?.si.value ?? 0) * 1000).toFixed(1));
      expect(grams).toBeGreaterThan(0);
      const ack = await scale.postReading({ batchId, quantity: 'mass', subject, value: grams, unit: 'g', stable: true, deviceTime: new Date().toISOString() });
      expect(ack).toMatchObject({ status: 'pending', replayed: false });
      const verdict = await scale.waitForVerdict(ack.id, { timeoutMs: 20_000 });
      expect(verdict).toMatchObject({ status: 'accepted', deviceId: scaleId, batchId });
      expect(verdict.valueSi).toBeCloseTo(grams / 1000, 9);
      posted.push(verdict);
    }
    for (const r of posted) {
      const e = await receiver.waitFor((ev) => ev.type === 'reading.accepted' && (ev.data as { readingId?: string }).readingId === r.id);
      expect(e.data).toMatchObject({ readingId: r.id, batchId, status: 'accepted' });
    }
  });

  it('an off-ratio part B is rejected, and the rejection arrives as a webhook naming the heavy side', async () => {
    const scale = new Pourgate({ baseUrl: base, apiKey: scaleKey, ...fast });
    const targets = await scale.batchTargets(batchId);
    // part B 8 % heavy against the accepted part A: e = 1/1.08 − 1 ≈ −7.4 %, outside ±5 %
    const grams = Number(((targets.components.B.mass?.si.value ?? 0) * 1080).toFixed(1));
    const ack = await scale.postReading({ batchId, quantity: 'mass', subject: 'part_b', value: grams, unit: 'g', stable: true });
    const verdict = await scale.waitForVerdict(ack.id, { timeoutMs: 20_000 });
    expect(verdict.status).toBe('rejected');
    expect(verdict.reasons?.map((r) => r.code)).toContain('RATIO_ISOCYANATE_HEAVY');
    const e = await receiver.waitFor((ev) => ev.type === 'reading.rejected' && (ev.data as { readingId?: string }).readingId === ack.id);
    expect((e.data as { reasons: { code: string }[] }).reasons.map((r) => r.code)).toContain('RATIO_ISOCYANATE_HEAVY');
  });
});

describe('webhook verification', () => {
  it('accepts a real delivery (raw body, Node or fetch headers) and refuses a tampered body, another secret or a missing signature', () => {
    const delivery = receiver.raw.find((r) => r.body.includes('reading.accepted'))!;
    expect(delivery).toBeDefined();
    const event = verifyWebhook(delivery.headers, delivery.body, secret);
    expect(event.id).toBe(delivery.headers['webhook-id']);
    const asHeaders = new Headers(Object.entries(delivery.headers).map(([k, v]) => [k, String(v)]));
    expect(verifyWebhook(asHeaders, Buffer.from(delivery.body), secret).id).toBe(event.id);
    expect(() => verifyWebhook(delivery.headers, delivery.body.replace('"accepted"', '"rejected"'), secret)).toThrow(WebhookVerificationError);
    expect(() => verifyWebhook(delivery.headers, delivery.body, 'whsec_' + Buffer.from('another secret, 32 bytes long!!').toString('base64'))).toThrow(WebhookVerificationError);
    const { 'webhook-signature': _s, ...unsigned } = delivery.headers;
    expect(() => verifyWebhook(unsigned, delivery.body, secret)).toThrow(WebhookVerificationError);
  });
});

describe('retries', () => {
  it('a connection cut after the API stored the reading, then a 503: the third try answers with the same reading, stored once', async () => {
    const proxy = await startFlakyProxy(base, ['drop', '503']);
    try {
      const retries: string[] = [];
      const scale = new Pourgate({ baseUrl: proxy.url, apiKey: scaleKey, ...fast, onRetry: (i) => retries.push(i.reason) });
      // no clientReadingId given: the SDK makes one and keeps it for every attempt
      const ack = await scale.postReading({ batchId, quantity: 'mass', subject: 'mixed', value: 120.4, unit: 'g', stable: true });
      expect(retries).toHaveLength(2);
      expect(proxy.seen.map((s) => s.answered)).toEqual(['drop', '503', 'forwarded']);
      const bodies = proxy.seen.map((s) => JSON.parse(s.body) as { clientReadingId: string });
      expect(new Set(bodies.map((b) => b.clientReadingId)).size).toBe(1);
      expect(new Set(proxy.seen.map((s) => s.headers['idempotency-key'])).size).toBe(1);
      expect(proxy.seen[0]!.headers['idempotency-key']).toMatch(/^[0-9a-f-]{36}$/);
      // the first attempt reached the API: the last one is its replay
      expect(ack.replayed).toBe(true);
      const rows = await testDb()('readings').where({ organization_id: org.id, client_reading_id: bodies[0]!.clientReadingId });
      expect(rows).toHaveLength(1);
      expect(rows[0].id).toBe(ack.id);
    } finally {
      await proxy.close();
    }
  });

  it('gives up after the configured retries with the last problem', async () => {
    const proxy = await startFlakyProxy(base, ['503', '503', '503']);
    try {
      const scale = new Pourgate({ baseUrl: proxy.url, apiKey: scaleKey, retry: { retries: 2, baseDelayMs: 10 } });
      const err = await scale.getReading(posted[0]!.id).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(PourgateProblem);
      expect((err as PourgateProblem).status).toBe(503);
      expect(proxy.seen).toHaveLength(3);
    } finally {
      await proxy.close();
    }
  });
});

describe('typed errors', () => {
  it('a bad unit is a 422 PourgateProblem pointing at /unit; nothing is retried or stored', async () => {
    const scale = new Pourgate({ baseUrl: base, apiKey: scaleKey, ...fast });
    const before = Number((await testDb()('readings').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);
    const err = (await scale.postReading({ batchId, quantity: 'mass', subject: 'part_a', value: 1, unit: 'stone-ish' }).catch((e: unknown) => e)) as PourgateProblem;
    expect(err).toBeInstanceOf(PourgateProblem);
    expect(err).toBeInstanceOf(Error);
    expect(err.status).toBe(422);
    expect(typeof err.title).toBe('string');
    expect(typeof err.type).toBe('string');
    expect(err.errorAt('/unit')).toBeDefined();
    expect(err.message).toContain('422');
    expect(Number((await testDb()('readings').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n)).toBe(before);
  });

  it('an unknown key is a 401, a foreign or missing reading a 404', async () => {
    const stranger = new Pourgate({ baseUrl: base, apiKey: 'pgd_live_' + 'x'.repeat(43), ...fast });
    await expect(stranger.getReading(posted[0]!.id)).rejects.toMatchObject({ name: 'PourgateProblem', status: 401 });
    const scale = new Pourgate({ baseUrl: base, apiKey: scaleKey, ...fast });
    await expect(scale.getReading(randomUUID())).rejects.toMatchObject({ status: 404 });
  });
});

describe('iteration', () => {
  it('paginate walks a list two rows at a time and yields what one big page holds', async () => {
    const small: Reading[] = [];
    for await (const r of engineer.paginate('/v1/readings', { filter: { batchId }, sort: ['receivedAt', 'ASC'], pageSize: 2 })) small.push(r);
    const big = await engineer.unwrap<Reading[]>(engineer.api.GET('/v1/readings', { params: { query: { filter: JSON.stringify({ batchId }), sort: '["receivedAt","ASC"]', range: '[0,99]' } } }));
    expect(small.length).toBeGreaterThanOrEqual(5);
    expect(small.map((r) => r.id)).toEqual(big.map((r) => r.id));
  });

  it('the event feed iterator returns each event once, in order, and resumes from its cursor', async () => {
    const wanted = new Set(posted.map((r) => r.id));
    const got: PourgateEvent[] = [];
    let cursor: string | undefined;
    const deadline = Date.now() + 15_000;
    while ([...wanted].some((id) => !got.some((e) => (e.data as { readingId?: string }).readingId === id)) && Date.now() < deadline) {
      const feed = engineer.events({ types: ['reading.accepted'], limit: 2, after: cursor });
      for await (const e of feed) got.push(e);
      cursor = feed.cursor;
    }
    const ids = got.map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(got.every((e) => e.type === 'reading.accepted')).toBe(true);
    expect(got.map((e) => (e.data as { readingId: string }).readingId).filter((id) => wanted.has(id))).toEqual(posted.map((r) => r.id));
    const rest: PourgateEvent[] = [];
    for await (const e of engineer.events({ types: ['reading.accepted'], after: cursor })) rest.push(e);
    expect(rest).toEqual([]);
  });
});
