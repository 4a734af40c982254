import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { EventsService } from '../../api/src/events/events.service.js';
import { OutboxRelay } from '../../api/src/events/outbox-relay.service.js';
import { startErpReceiver, type ErpReceiver } from '../../fakes/src/erp-receiver.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';

// The relay polls only every 60 s here: a delivery within 2 s can only come from the NOTIFY that the
// transaction writing the event sends at commit (migration 0031), which the relay LISTENs for.
let t: TestApp;
let org: OrgFixture;
let receiver: ErpReceiver;
const holder = { secret: '' };

async function until<T>(fn: () => Promise<T | undefined | null | false>, ms: number): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 20));
  }
}

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', WEBHOOK_ALLOWED_HOSTS: '127.0.0.1', WEBHOOK_RELAY_INTERVAL_MS: '60000', WEBHOOK_TIMEOUT_MS: '3000' });
  org = await makeOrg('outbox-notify');
  const auth = await tokensFor(t.http, org);
  receiver = await startErpReceiver({ secret: () => holder.secret });
  const res = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.integrator).send({ url: receiver.url, description: 'ERP', eventTypes: [] });
  expect(res.status).toBe(201);
  holder.secret = res.body.secret;
  await until(async () => t.app.get(OutboxRelay).listening(), 10_000);
}, 120_000);
afterAll(async () => {
  await receiver.close();
  await t.close();
  await closeTestDb();
});

describe('the outbox relay wakes on NOTIFY', () => {
  it('delivers an event within 2 s although its poll interval is 60 s', async () => {
    const events = t.app.get(EventsService);
    for (let i = 0; i < 3; i++) {
      const started = Date.now();
      const ev = await testDb().transaction((trx) => events.emit(trx, { organizationId: org.id, type: 'batch.released', subjectType: 'batch', subjectId: `b-${i}`, data: { batchId: `b-${i}` } }));
      const got = await receiver.waitFor((r) => r.webhookId === ev.id, 2000);
      expect(got.verified).toBe(true);
      expect(Date.now() - started).toBeLessThan(2000);
    }
  });

  it('listens again after its connection is cut, and delivers without waiting for the poll', async () => {
    const relay = t.app.get(OutboxRelay);
    const db = testDb();
    // every relay listener on the test database (other suites' relays reconnect the same way)
    const before: { pid: number }[] = (await db.raw("SELECT pid FROM pg_stat_activity WHERE application_name = 'pourgate-outbox-relay'")).rows;
    expect(before.length).toBeGreaterThan(0);
    await db.raw("SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'pourgate-outbox-relay'");
    await until(async () => !relay.listening(), 5000);
    await until(async () => relay.listening(), 5000);
    const events = t.app.get(EventsService);
    const started = Date.now();
    const ev = await db.transaction((trx) => events.emit(trx, { organizationId: org.id, type: 'batch.released', subjectType: 'batch', subjectId: 'b-after', data: { batchId: 'b-after' } }));
    await receiver.waitFor((r) => r.webhookId === ev.id, 2000);
    expect(Date.now() - started).toBeLessThan(2000);
  });
});
