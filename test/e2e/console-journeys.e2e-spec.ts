// The API side of the console journeys a new user tripped on: an import with a malformed id ends
// with a bad-row list (and an import that breaks ends failed, with a reason); a webhook test send is
// in the delivery log with a plain-word reason; an invitation tells its shop and role and accepting
// it signs the person in; the live station stream carries a posted reading, then its verdict.
import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import http from 'node:http';
import net from 'node:net';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { startSmtpCatcher, type SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { ImportsService } from '../../api/src/imports/imports.service.js';
import { ReadingsService } from '../../api/src/readings/readings.service.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { listenOnLoopback, startTestApp, type TestApp } from './support/app.js';
import { flexSystem } from './support/shop.js';

let t: TestApp;
let base: string;
let mail: SmtpCatcher;
let org: OrgFixture;
let auth: Record<Role, string>;
let batchId: string;
let deviceId: string;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off', SMTP_URL: mail.smtpUrl, PUBLIC_URL: 'http://127.0.0.1:3999', WEBHOOK_ALLOWED_HOSTS: '127.0.0.1', WEBHOOK_TIMEOUT_MS: '3000' });
  base = await listenOnLoopback(t);
  org = await makeOrg('journeys');
  auth = await tokensFor(t.http, org);
  const sys = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem());
  expect(sys.status).toBe(201);
  const batch = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: sys.body.id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(batch.status).toBe(201);
  batchId = batch.body.id;
  [{ id: deviceId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'thermometer', serial: `J-${randomUUID()}`, name: 'bench probe' }).returning('id');
}, 180_000);
afterAll(async () => {
  await t.close();
  await mail.close();
  await closeTestDb();
});

async function importEnds(id: string) {
  for (const deadline = Date.now() + 60_000; Date.now() < deadline; ) {
    const res = await t.http.get(`/v1/imports/${id}`).set('authorization', auth.engineer);
    if (res.body.status === 'done' || res.body.status === 'failed') return res.body;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`import ${id} never ended`);
}

const upload = (csv: string) => t.http.post('/v1/imports').set('authorization', auth.engineer).attach('file', Buffer.from(csv), { filename: 'logger.csv', contentType: 'text/csv' });

describe('logger CSV imports always end', () => {
  it('a malformed batch_id is a bad row with its line number; the good row is imported', async () => {
    const csv = ['client_reading_id,batch_id,device_id,quantity,subject,value,unit', `j-good-${randomUUID()},${batchId},${deviceId},temperature,part_a,21.5,degC`, `j-bad-${randomUUID()},not-a-batch-id,${deviceId},temperature,part_a,21.5,degC`].join('\n');
    const res = await upload(csv);
    expect(res.status).toBe(202);
    const done = await importEnds(res.body.id);
    expect(done).toMatchObject({ status: 'done', percent: 100, accepted: 1, rejectedRows: 1 });
    expect(done.badRows).toEqual([{ line: 3, errors: [expect.objectContaining({ field: 'batch_id', detail: expect.stringContaining('is not an id') })] }]);
  });

  it('an import whose job keeps failing ends failed with a reason on its last attempt', async () => {
    const readings = t.app.get(ReadingsService);
    const spy = jest.spyOn(readings, 'check').mockRejectedValue(Object.assign(new Error('boom'), { code: 'XX000' }));
    try {
      const csv = ['client_reading_id,batch_id,device_id,quantity,subject,value,unit', `j-x-${randomUUID()},${batchId},${deviceId},temperature,part_a,22,degC`].join('\n');
      const res = await upload(csv);
      expect(res.status).toBe(202);
      // the queued job may be running too: drive the last attempt by hand, as the processor would
      await t.app.get(ImportsService).run(res.body.id, { lastAttempt: true });
      const ended = await importEnds(res.body.id);
      expect(ended.status).toBe('failed');
      expect(ended.error).toMatch(/^The import stopped before the end \(the database refused a row\)/);
    } finally {
      spy.mockRestore();
    }
  });
});

describe('webhook test sends', () => {
  it('are in the delivery log; a refused connection reads in plain words', async () => {
    // a port nothing listens on: bind one, note it, close it
    const closedPort = await new Promise<number>((resolve) => {
      const s = net.createServer().listen(0, '127.0.0.1', () => {
        const p = (s.address() as net.AddressInfo).port;
        s.close(() => resolve(p));
      });
    });
    const ep = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.integrator).send({ url: `http://127.0.0.1:${closedPort}/hooks`, description: 'nobody home' });
    expect(ep.status).toBe(201);
    const sent = await t.http.post(`/v1/webhook-endpoints/${ep.body.id}/test`).set('authorization', auth.integrator).send({});
    expect(sent.status).toBe(200);
    expect(sent.body).toMatchObject({ verdict: 'failed', statusCode: null, deliveryId: expect.any(String) });
    expect(sent.body.reason).toMatch(new RegExp(`^Nothing is listening at 127\\.0\\.0\\.1:${closedPort}: the connection was refused.*\\(ECONNREFUSED\\)$`));

    const log = await t.http.get(`/v1/webhook-deliveries?filter=${encodeURIComponent(JSON.stringify({ endpointId: ep.body.id }))}`).set('authorization', auth.integrator);
    expect(log.status).toBe(200);
    expect(log.body).toEqual([expect.objectContaining({ id: sent.body.deliveryId, eventType: 'webhook.test', status: 'dead', attempts: 1, lastError: sent.body.reason })]);
    const one = await t.http.get(`/v1/webhook-deliveries/${sent.body.deliveryId}`).set('authorization', auth.integrator);
    expect(one.body.attemptLog).toEqual([expect.objectContaining({ attempt: 1, statusCode: null, error: sent.body.reason })]);
  });

  it('a delivered test is logged with the receiver’s answer', async () => {
    const server = http.createServer((req, res) => req.resume().on('end', () => res.writeHead(200, { 'content-type': 'application/json' }).end('{"ok":true}')));
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
    try {
      const url = `http://127.0.0.1:${(server.address() as net.AddressInfo).port}/hooks`;
      const ep = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.integrator).send({ url });
      const sent = await t.http.post(`/v1/webhook-endpoints/${ep.body.id}/test`).set('authorization', auth.integrator).send({});
      expect(sent.body).toMatchObject({ verdict: 'delivered', statusCode: 200 });
      expect(sent.body.reason).toBeUndefined();
      const one = await t.http.get(`/v1/webhook-deliveries/${sent.body.deliveryId}`).set('authorization', auth.integrator);
      expect(one.body).toMatchObject({ eventType: 'webhook.test', status: 'succeeded', lastStatusCode: 200 });
      expect(one.body.attemptLog[0].responseSnippet).toBe('{"ok":true}');
    } finally {
      server.close();
    }
  });
});

describe('invitations', () => {
  it('the link tells the shop, the role and the invited name; accepting signs the person in', async () => {
    const email = `journey.${Date.now()}@fixture.test`;
    const inv = await t.http.post('/v1/invitations').set('authorization', auth.admin).send({ email, role: 'integrator', name: 'Ada Journey' });
    expect(inv.status).toBe(201);
    const msg = await mail.waitFor((m) => m.to.includes(email));
    const token = decodeURIComponent(/token=([^\s]+)/.exec(msg.text)![1]!);

    const look = await t.http.post('/v1/invitations/lookup').send({ token });
    expect(look.status).toBe(200);
    expect(look.body).toMatchObject({ organization: { name: org.name }, role: 'integrator', email, name: 'Ada Journey', expiresAt: expect.any(String) });

    const accept = await t.http.post('/v1/invitations/accept').send({ token, name: 'Ada Journey', password: 'a-long-password-9' });
    expect(accept.status).toBe(200);
    const me = await t.http.get('/v1/me').set('authorization', `Bearer ${accept.body.session.accessToken}`);
    expect(me.status).toBe(200);
    expect(me.body).toMatchObject({ email, name: 'Ada Journey', role: 'integrator', organization: { name: org.name } });
    // the refresh token of that session works like one from signing in
    expect((await t.http.post('/v1/auth/refresh').send({ refreshToken: accept.body.session.refreshToken })).status).toBe(200);
    // spent: the lookup answers 410 like accepting again
    expect((await t.http.post('/v1/invitations/lookup').send({ token })).status).toBe(410);
    expect((await t.http.post('/v1/invitations/lookup').send({ token: 'inv_not-a-real-token' })).status).toBe(410);
  });
});

describe('live station stream', () => {
  /** Opens the SSE stream and collects its events until `until` holds. */
  function stream(url: string) {
    const events: { event: string; data: any }[] = [];
    let status = 0;
    let contentType = '';
    const req = http.get(url, (res) => {
      status = res.statusCode ?? 0;
      contentType = String(res.headers['content-type']);
      let buf = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => {
        buf += chunk;
        let i;
        while ((i = buf.indexOf('\n\n')) >= 0) {
          const block = buf.slice(0, i);
          buf = buf.slice(i + 2);
          const event = /^event: (.*)$/m.exec(block)?.[1];
          const data = /^data: (.*)$/m.exec(block)?.[1];
          if (event && data) events.push({ event, data: JSON.parse(data) });
        }
      });
    });
    const until = async (what: string, ok: () => boolean) => {
      for (const deadline = Date.now() + 20_000; Date.now() < deadline; ) {
        if (ok()) return;
        await new Promise((r) => setTimeout(r, 50));
      }
      throw new Error(`the stream never showed ${what}; got ${JSON.stringify(events.map((e) => [e.event, e.data.kind]))}`);
    };
    return { events, until, close: () => req.destroy(), status: () => status, contentType: () => contentType };
  }

  it('carries a posted reading, then its verdict with reasons, for the watched device only', async () => {
    const [{ id: other }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'thermometer', serial: `J-${randomUUID()}`, name: 'other probe' }).returning('id');
    const ticket = await t.http.post('/v1/live/tickets').set('authorization', auth.viewer).send({ deviceId });
    expect(ticket.status).toBe(201);
    expect(ticket.body).toMatchObject({ expiresInSeconds: 60, streamUrl: expect.stringMatching(/^\/v1\/live\/stream\?ticket=lt_/) });
    const s = stream(`${base}${ticket.body.streamUrl}`);
    try {
      await s.until('ready', () => s.events.some((e) => e.event === 'ready'));
      expect(s.status()).toBe(200);
      expect(s.contentType()).toMatch(/^text\/event-stream/);
      expect(s.events[0]!.data.devices).toEqual([{ id: deviceId, name: 'bench probe', stationCode: null }]);

      const posted = await t.http.post('/v1/readings').set('authorization', auth.engineer).send({ batchId, deviceId, clientReadingId: `live-${randomUUID()}`, quantity: 'temperature', subject: 'part_a', value: 21.4, unit: 'degC' });
      expect(posted.status).toBe(202);
      await t.http.post('/v1/readings').set('authorization', auth.engineer).send({ batchId, deviceId: other, clientReadingId: `live-${randomUUID()}`, quantity: 'temperature', subject: 'part_a', value: 21.4, unit: 'degC' });
      const mine = () => s.events.filter((e) => e.event === 'reading');
      const of = (kind: string) => mine().find((e) => e.data.kind === kind && e.data.reading.id === posted.body.id);
      await s.until('the verdict', () => !!of('judged'));
      const received = of('received');
      const judged = of('judged');
      expect(mine().indexOf(received!)).toBeLessThan(mine().indexOf(judged!));
      expect(received!.data).toMatchObject({ kind: 'received', reading: { id: posted.body.id, status: 'pending' }, device: { id: deviceId, name: 'bench probe' } });
      expect(judged!.data).toMatchObject({ kind: 'judged', reading: { id: posted.body.id, reasons: expect.any(Array) } });
      expect(judged!.data.reading.status).not.toBe('pending');
      // the other device's reading never reached this stream
      expect(mine().every((e) => e.data.reading.deviceId === deviceId)).toBe(true);
    } finally {
      s.close();
    }
  });

  it('refuses a stream without a genuine ticket, and a ticket for a foreign device', async () => {
    const bad = await t.http.get('/v1/live/stream?ticket=lt_e30.AAAA');
    expect(bad.status).toBe(401);
    expect(bad.headers['content-type']).toMatch(/problem\+json/);
    expect((await t.http.get('/v1/live/stream')).status).toBe(401);
    expect((await t.http.post('/v1/live/tickets').set('authorization', auth.viewer).send({ deviceId: randomUUID() })).status).toBe(404);
    expect((await t.http.post('/v1/live/tickets').send({})).status).toBe(401);
  });
});
