import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { Webhook } from 'standardwebhooks';
import { EventsService } from '../../api/src/events/events.service.js';
import type { EventType } from '../../api/src/events/event-types.js';
import { startErpReceiver, type ErpReceiver } from '../../fakes/src/erp-receiver.js';
import { startSmtpCatcher, type SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';

let t: TestApp;
let mail: SmtpCatcher;
let org: OrgFixture;
let auth: Record<string, string>;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  // compressed schedule: 4 attempts, 0.3 s apart (the standard's is hours; the logic is the same)
  t = await startTestApp({ PROCESS_ROLE: 'all', SMTP_URL: mail.smtpUrl, WEBHOOK_ALLOWED_HOSTS: '127.0.0.1', WEBHOOK_RETRY_SCHEDULE: '0,0.3,0.3,0.3', WEBHOOK_RELAY_INTERVAL_MS: '50', WEBHOOK_TIMEOUT_MS: '3000' });
  org = await makeOrg('hooks');
  auth = await tokensFor(t.http, org);
});
afterAll(async () => {
  await t.close();
  await mail.close();
  await closeTestDb();
});

async function addEndpoint(receiverSecretHolder: { secret: string }, receiver: ErpReceiver, eventTypes: string[] = []) {
  const res = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.integrator).send({ url: receiver.url, description: 'ERP', eventTypes });
  expect(res.status).toBe(201);
  expect(res.body.secret).toMatch(/^whsec_/);
  receiverSecretHolder.secret = res.body.secret;
  return res.body.id as string;
}

async function emit(type: EventType, data: Record<string, unknown>) {
  const events = t.app.get(EventsService);
  return testDb().transaction((trx) => events.emit(trx, { organizationId: org.id, type, subjectType: 'test', subjectId: 'x', data }));
}

async function deliveriesOf(eventId: string) {
  return testDb()('webhook_deliveries').where({ event_id: eventId });
}

async function until<T>(fn: () => Promise<T | undefined | null | false>, ms = 15_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('signed delivery', () => {
  const holder = { secret: '' };
  let receiver: ErpReceiver;
  let endpointId: string;
  beforeAll(async () => {
    receiver = await startErpReceiver({ secret: () => holder.secret });
    endpointId = await addEndpoint(holder, receiver);
  });
  afterAll(() => receiver.close());

  it('the test button sends a signed webhook.test and reports the answer', async () => {
    const res = await t.http.post(`/v1/webhook-endpoints/${endpointId}/test`).set('authorization', auth.integrator);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ verdict: 'delivered', statusCode: 204 });
    const got = await receiver.waitFor((r) => r.webhookId === res.body.eventId);
    expect(got.verified).toBe(true);
    expect(got.event?.type).toBe('webhook.test');
  });

  it('an event reaches the receiver signed; the reference library verifies it; tampering or an old timestamp fails', async () => {
    const ev = await emit('batch.released', { batchId: 'b-1' });
    const got = await receiver.waitFor((r) => r.webhookId === ev.id);
    expect(got.verified).toBe(true);
    expect(got.event).toMatchObject({ id: ev.id, type: 'batch.released', data: { batchId: 'b-1' } });
    const wh = new Webhook(holder.secret);
    expect(() => wh.verify(got.rawBody.replace('b-1', 'b-2'), got.headers)).toThrow();
    const old = { ...got.headers, 'webhook-timestamp': String(Number(got.timestamp) - 3600) };
    expect(() => wh.verify(got.rawBody, old)).toThrow();
    const [d] = await until(async () => {
      const rows = await deliveriesOf(ev.id);
      return rows[0]?.status === 'succeeded' ? rows : null;
    });
    expect(d.attempts).toBe(1);
  });

  it('a receiver failing 2 times then succeeding gets 3 attempts of one event id', async () => {
    receiver.behaviour.failNext = 2;
    const ev = await emit('batch.on_hold', { batchId: 'b-2' });
    const [d] = await until(async () => {
      const rows = await deliveriesOf(ev.id);
      return rows[0]?.status === 'succeeded' ? rows : null;
    });
    expect(d.attempts).toBe(3);
    const got = receiver.received.filter((r) => r.webhookId === ev.id);
    expect(got.map((r) => r.answered)).toEqual([503, 503, 204]);
    expect(new Set(got.map((r) => r.event?.id))).toEqual(new Set([ev.id]));
    const log = await t.http.get(`/v1/webhook-deliveries/${d.id}`).set('authorization', auth.integrator);
    expect(log.body.attemptLog.map((a: { statusCode: number }) => a.statusCode)).toEqual([503, 503, 204]);
  });

  it('429 with Retry-After is waited for', async () => {
    receiver.behaviour.retryAfter = { status: 429, seconds: 1, times: 1 };
    const ev = await emit('batch.scrapped', { batchId: 'b-3' });
    await until(async () => (await deliveriesOf(ev.id))[0]?.status === 'succeeded');
    const got = receiver.received.filter((r) => r.webhookId === ev.id);
    expect(got.map((r) => r.answered)).toEqual([429, 204]);
    // the schedule alone would retry after 0.3 s; the receiver asked for 1 s
    expect(got[1].at - got[0].at).toBeGreaterThanOrEqual(950);
  });

  it('after the last try the delivery is dead, the admin is mailed, and a replay delivers it', async () => {
    receiver.behaviour.failNext = 4;
    const ev = await emit('batch.created', { batchId: 'b-4' });
    const [d] = await until(async () => {
      const rows = await deliveriesOf(ev.id);
      return rows[0]?.status === 'dead' ? rows : null;
    });
    expect(d.attempts).toBe(4);
    const notice = await mail.waitFor((m) => m.to.includes(org.people.admin.email) && m.text.includes(ev.id));
    expect(notice.subject).toMatch(/failed for good/);
    const replay = await t.http.post(`/v1/webhook-deliveries/${d.id}/replay`).set('authorization', auth.integrator);
    expect(replay.status).toBe(200);
    await until(async () => (await deliveriesOf(ev.id))[0]?.status === 'succeeded');
    const ok = receiver.received.filter((r) => r.webhookId === ev.id && r.answered === 204);
    expect(ok).toHaveLength(1);
  });

  it('a secret rotation signs with both secrets during the overlap', async () => {
    const old = holder.secret;
    const rot = await t.http.post(`/v1/webhook-endpoints/${endpointId}/rotate-secret`).set('authorization', auth.integrator).send({ overlapSeconds: 60 });
    expect(rot.status).toBe(201);
    const ev = await emit('work_order.created', { ref: 'WO-1' });
    holder.secret = rot.body.secret;
    const got = await receiver.waitFor((r) => r.webhookId === ev.id);
    expect(got.verified).toBe(true);
    expect(got.headers['webhook-signature'].split(' ')).toHaveLength(2);
    expect(new Webhook(old).verify(got.rawBody, got.headers)).toMatchObject({ id: ev.id });
  });

  it('410 Gone disables the endpoint and says why', async () => {
    receiver.behaviour.gone = true;
    const ev = await emit('batch.state_changed', { batchId: 'b-5' });
    await until(async () => (await deliveriesOf(ev.id))[0]?.status === 'cancelled');
    const ep = await t.http.get(`/v1/webhook-endpoints/${endpointId}`).set('authorization', auth.integrator);
    expect(ep.body.enabled).toBe(false);
    expect(ep.body.disabledReason).toMatch(/410/);
    receiver.behaviour.gone = false;
  });
});

describe('SSRF guard', () => {
  it('refuses at delivery time too: a stored URL whose address is not allowed is never connected to', async () => {
    // stored behind the creation check's back, as if its DNS had changed since
    const own = await makeOrg('ssrf');
    const { WebhooksService } = await import('../../api/src/webhooks/webhooks.service.js');
    const box = t.app.get(WebhooksService).box;
    const { sealed, version } = box.seal('whsec_' + Buffer.from('x'.repeat(32)).toString('base64'));
    await testDb()('webhook_endpoints').insert({ organization_id: own.id, url: 'http://169.254.169.254/latest/meta-data', secret_enc: sealed, secret_key_version: version });
    const ev = await testDb().transaction((trx) => t.app.get(EventsService).emit(trx, { organizationId: own.id, type: 'batch.created', subjectType: 'test', subjectId: 'y', data: {} }));
    const [d] = await until(async () => {
      const rows = await deliveriesOf(ev.id);
      return rows[0]?.status === 'dead' ? rows : null;
    });
    expect(d.last_error).toMatch(/169\.254\.169\.254 \(linkLocal\), which webhooks may not reach/);
    // refused before any connection, and not retried: it cannot get better by waiting
    expect(d.attempts).toBe(1);
    expect(d.last_duration_ms).toBeLessThan(1000);
  });
});

describe('the event feed', () => {
  it('returns every event once, in order, across pages', async () => {
    const own = await makeOrg('feed');
    const key = (await tokensFor(t.http, own)).engineer;
    const events = t.app.get(EventsService);
    const ids: string[] = [];
    for (let i = 0; i < 7; i++) {
      const e = await testDb().transaction((trx) => events.emit(trx, { organizationId: own.id, type: 'reading.accepted', subjectType: 'reading', subjectId: String(i), data: { n: i } }));
      ids.push(e.id);
    }
    // poll as a client would: an event shows once no older transaction is still open
    const seen: string[] = [];
    let after: string | undefined;
    const deadline = Date.now() + 10_000;
    while (seen.length < ids.length && Date.now() < deadline) {
      const res = await t.http.get('/v1/events').set('authorization', key).query({ limit: 3, ...(after ? { after } : {}) });
      expect(res.status).toBe(200);
      expect(res.body.events.length).toBeLessThanOrEqual(3);
      seen.push(...res.body.events.map((e: { id: string }) => e.id));
      after = res.body.next ?? undefined;
      if (!res.body.hasMore) await new Promise((r) => setTimeout(r, 50));
    }
    expect(seen).toEqual(ids);
    const empty = await t.http.get('/v1/events').set('authorization', key).query({ after });
    expect(empty.body).toMatchObject({ events: [], next: after, hasMore: false });
    const bad = await t.http.get('/v1/events').set('authorization', key).query({ after: 'garbage!' });
    expect(bad.status).toBe(400);
  });
});
