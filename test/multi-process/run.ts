// Many processes, one truth: two API processes (PROCESS_ROLE=api) and two workers
// (PROCESS_ROLE=worker) on one PostgreSQL and one Redis of this suite's own, a steady load of
// readings through both APIs, two webhook endpoints on a loopback receiver and a mail catcher.
// Checks: each reading judged exactly once, each event delivered once per endpoint, one digest per
// period, no mail twice, a worker answers nothing on the API port, the periodic jobs registered
// once. `npm test` runs it as its own step; alone: `node --import tsx test/multi-process/run.ts`
// (MULTI_PGPORT / MULTI_REDIS_PORT / MULTI_PORT_BASE move it off its ports; MULTI_LOAD_MS).
import { type ChildProcess, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import net from 'node:net';
import path from 'node:path';
import argon2 from 'argon2';
import Bull from 'bull';
import { startPostgres, startRedis, ensureWorkspacePackages } from '../../scripts/lib/services.mjs';
import { startSmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { json, makeShop, resetDatabase, ROOT, sleep } from '../faults/harness.js';

if (process.argv.includes('--help')) {
  console.log('usage: node --import tsx test/multi-process/run.ts   (2 API + 2 worker processes; about a minute)');
  process.exit(0);
}

const PG_PORT = Number(process.env.MULTI_PGPORT ?? 55643);
const REDIS_PORT = Number(process.env.MULTI_REDIS_PORT ?? 56643);
const PORT_BASE = Number(process.env.MULTI_PORT_BASE ?? 3361);
const LOAD_MS = Number(process.env.MULTI_LOAD_MS ?? 15_000);
const DIGEST_MS = 5_000;
const DRAIN_MS = 60_000;
const OUT_DIR = path.join(ROOT, 'test-output');
const t0 = Date.now();
const say = (m: string) => console.log(`[multi-process] ${m} (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
const results: { check: string; ok: boolean; detail: string }[] = [];
const check = (name: string, ok: boolean, detail = '') => {
  results.push({ check: name, ok, detail });
  console.log(`  ${ok ? 'PASS' : 'FAIL'}  ${name}${detail ? `: ${detail}` : ''}`);
};

interface Proc {
  name: string;
  child: ChildProcess;
  exited: boolean;
}

function spawnProcess(name: string, env: Record<string, string>, logFile: string): Proc {
  const out = fs.openSync(logFile, 'w');
  const child = spawn(process.execPath, ['--import', '@swc-node/register/esm-register', path.join(ROOT, 'api/src/main.ts')], {
    cwd: ROOT,
    stdio: ['ignore', out, out],
    env: { ...process.env, NODE_ENV: 'test', SWC_NODE_PROJECT: path.join(ROOT, 'api/tsconfig.json'), HOST: '127.0.0.1', LOG_LEVEL: 'warn', LOG_FORMAT: 'json', ...env },
  });
  fs.closeSync(out);
  const p: Proc = { name, child, exited: false };
  child.once('exit', () => (p.exited = true));
  return p;
}

async function waitUp(p: Proc, url: string): Promise<void> {
  const until = Date.now() + 240_000;
  for (;;) {
    if (p.exited) throw new Error(`${p.name} exited while starting (see test-output/multi-${p.name}.log)`);
    if (await fetch(url).then((r) => r.ok).catch(() => false)) return;
    if (Date.now() > until) throw new Error(`${p.name} did not answer ${url} within 240 s`);
    await sleep(250);
  }
}

/** True when something accepts a TCP connection on the port. */
const listening = (port: number) =>
  new Promise<boolean>((resolve) => {
    const s = net.connect(port, '127.0.0.1');
    s.once('connect', () => (s.destroy(), resolve(true)));
    s.once('error', () => resolve(false));
  });

/**
 * API-key principals are cached in each API process; a change made through one process must hold in
 * the other within a second (the change notice goes over Redis). Warms both caches, then rotates
 * with no grace and revokes through API 1 while API 2 is asked every 20 ms.
 */
async function keyChangesReachEveryApi(bases: string[], shop: Awaited<ReturnType<typeof makeShop>>): Promise<void> {
  const [one, two] = [bases[0]!, bases[1]!];
  const probe = async (base: string, secret: string) => (await fetch(`${base}/v1/devices?range=${encodeURIComponent('[0,0]')}`, { headers: { 'x-api-key': secret } })).status;
  const created = await json(one, 'POST', '/v1/api-keys', { authorization: shop.tokens.integrator! }, { name: 'cache probe', kind: 'device', scopes: ['readings:write', 'devices:read'], deviceId: shop.scaleId });
  if (created.status !== 201) throw new Error(`api key: ${created.status} ${JSON.stringify(created.body)}`);
  const warm = async (secret: string) => {
    const seen: number[] = [];
    for (let i = 0; i < 5; i++) for (const b of [one, two]) seen.push(await probe(b, secret));
    return seen;
  };
  /** ms from the change's answer until API 2 answers 401 for the secret (polled every 20 ms, at most 3 s) */
  const refusedAfter = async (secret: string, since: number) => {
    for (;;) {
      if ((await probe(two, secret)) === 401) return Date.now() - since;
      if (Date.now() - since > 3000) return Infinity;
      await sleep(20);
    }
  };
  const warmed = await warm(created.body.secret);
  const rotated = await json(one, 'POST', `/v1/api-keys/${created.body.id}/rotate`, { authorization: shop.tokens.integrator! }, { graceSeconds: 0 });
  const rotateMs = await refusedAfter(created.body.secret, Date.now());
  const warmedNew = await warm(rotated.body.secret);
  const revoked = await json(one, 'POST', `/v1/api-keys/${rotated.body.id}/revoke`, { authorization: shop.tokens.integrator! });
  const revokeMs = await refusedAfter(rotated.body.secret, Date.now());
  check(
    'a key rotated or revoked through one API process is refused by the other within 1 s (cached principals)',
    warmed.every((s) => s === 200) && warmedNew.every((s) => s === 200) && rotated.status === 201 && revoked.status === 200 && rotateMs <= 1000 && revokeMs <= 1000,
    `warm-up answers ${[...new Set([...warmed, ...warmedNew])].join('/')}; old secret refused by API 2 ${rotateMs} ms after the rotation (grace 0); revoked key refused ${revokeMs} ms after the revoke`,
  );
}

async function main(): Promise<number> {
  fs.mkdirSync(OUT_DIR, { recursive: true });
  ensureWorkspacePackages();
  const pg = await startPostgres({ name: 'pg-multi', port: PG_PORT, fast: true, databases: ['pourgate_multi'] });
  const redisServer = await startRedis({ name: 'redis-multi', port: REDIS_PORT, durable: false });
  const databaseUrl = pg.url('pourgate_multi');
  resetDatabase(databaseUrl);
  process.env.DATABASE_URL = databaseUrl; // the fixtures write to this suite's database
  const prefix = `multi-${Date.now()}`;
  say(`servers up (PostgreSQL ${PG_PORT}, Redis ${REDIS_PORT}), database migrated; queue prefix ${prefix}`);

  const mail = await startSmtpCatcher({ httpPort: null });
  // the webhook receiver: every request counted by endpoint and webhook-id
  const received = new Map<string, Map<string, number>>();
  const receiver = http.createServer((req, res) => {
    req.resume();
    req.on('end', () => {
      const endpoint = req.url ?? '/';
      const id = String(req.headers['webhook-id'] ?? '');
      const m = received.get(endpoint) ?? new Map<string, number>();
      m.set(id, (m.get(id) ?? 0) + 1);
      received.set(endpoint, m);
      res.writeHead(204).end();
    });
  });
  await new Promise<void>((r) => receiver.listen(0, '127.0.0.1', r));
  const receiverPort = (receiver.address() as net.AddressInfo).port;

  const common = {
    DATABASE_URL: databaseUrl,
    REDIS_URL: redisServer.url,
    QUEUE_PREFIX: prefix,
    RATE_LIMIT_NAMESPACE: `${prefix}-rl:`,
    SMTP_URL: mail.smtpUrl,
    NOTIFICATIONS: 'on',
    NOTIFY_INTERVAL_MS: '250',
    NOTIFY_DIGEST_INTERVAL_MS: String(DIGEST_MS),
    WEBHOOK_ALLOWED_HOSTS: '127.0.0.1',
    WEBHOOK_RELAY_INTERVAL_MS: '100',
    SIGNIN_IP_LIMIT_PER_MINUTE: '100000',
    SIGNIN_MAX_FAILURES: '100000',
    DATABASE_POOL_MAX: '5',
  };
  const apiPorts = [PORT_BASE, PORT_BASE + 1];
  const workerPorts = [PORT_BASE + 2, PORT_BASE + 3];
  const healthPorts = [PORT_BASE + 4, PORT_BASE + 5];
  const procs: Proc[] = [
    ...apiPorts.map((port, i) => spawnProcess(`api${i + 1}`, { ...common, PROCESS_ROLE: 'api', PORT: String(port), PUBLIC_URL: `http://127.0.0.1:${port}` }, path.join(OUT_DIR, `multi-api${i + 1}.log`))),
    ...workerPorts.map((port, i) => spawnProcess(`worker${i + 1}`, { ...common, PROCESS_ROLE: 'worker', PORT: String(port), WORKER_HEALTH_PORT: String(healthPorts[i]), PUBLIC_URL: `http://127.0.0.1:${apiPorts[0]}` }, path.join(OUT_DIR, `multi-worker${i + 1}.log`))),
  ];
  const bases = apiPorts.map((p) => `http://127.0.0.1:${p}`);
  try {
    await Promise.all([...procs.slice(0, 2).map((p, i) => waitUp(p, `${bases[i]}/v1/health`)), ...procs.slice(2).map((p, i) => waitUp(p, `http://127.0.0.1:${healthPorts[i]}/health`))]);
    say('2 API and 2 worker processes up');

    // roles: a worker opens no API port and answers only its health routes
    const workerApi = await Promise.all(workerPorts.map(listening));
    check('a worker answers nothing on the API port', workerApi.every((l) => !l), `ports ${workerPorts.join(', ')}: ${workerApi.map((l) => (l ? 'listening' : 'refused')).join(', ')}`);
    const health = await fetch(`http://127.0.0.1:${healthPorts[0]}/health`).then((r) => r.json() as Promise<{ status: string; role: string }>);
    const ready = await fetch(`http://127.0.0.1:${healthPorts[0]}/ready`).then((r) => r.status);
    const other = await fetch(`http://127.0.0.1:${healthPorts[0]}/v1/readings`).then((r) => r.status);
    check('the worker health port answers /health and /ready, nothing else', health.status === 'ok' && health.role === 'worker' && ready === 200 && other === 404, `health ${health.status}/${health.role}, ready ${ready}, /v1/readings ${other}`);

    // the shop: a batch per pour, the scale's key, two webhook endpoints, an engineer who wants a digest
    const shop = await makeShop(bases[0]!, 'multi');
    const { testDb } = await import('../e2e/support/fixtures.js');
    const digestEmail = `digest-${randomUUID()}@multi.test`;
    await testDb()('users').insert({ organization_id: shop.orgId, email: digestEmail, name: 'Digest engineer', role: 'engineer', password_hash: await argon2.hash(randomUUID()), notify_rejections: 'digest' });
    await testDb()('users').where({ id: shop.people.engineer!.id }).update({ notify_rejections: 'each' });
    await keyChangesReachEveryApi(bases, shop);

    for (const name of ['erp', 'mes']) {
      const ep = await json(bases[1]!, 'POST', '/v1/webhook-endpoints', { authorization: shop.tokens.integrator! }, { url: `http://127.0.0.1:${receiverPort}/${name}`, description: name, eventTypes: [] });
      if (ep.status !== 201) throw new Error(`webhook endpoint: ${ep.status} ${JSON.stringify(ep.body)}`);
    }

    // steady load: pours of part A then part B (a few off-ratio), alternating between the two APIs
    say(`load for ${LOAD_MS / 1000} s through both APIs`);
    const posted: string[] = [];
    const refused: string[] = [];
    let pours = 0;
    const loadUntil = Date.now() + LOAD_MS;
    while (Date.now() < loadUntil) {
      const batchId = await shop.newBatch();
      const off = pours % 4 === 3;
      for (const [subject, value] of [['part_a', 1.0], ['part_b', off ? 0.62 : 0.5]] as const) {
        const base = bases[(posted.length + refused.length) % 2]!;
        const r = await json(base, 'POST', '/v1/readings', { 'x-api-key': shop.deviceKey }, { batchId, clientReadingId: randomUUID(), quantity: 'mass', subject, value, unit: 'kg', stable: true, deviceTime: new Date().toISOString() });
        if (r.status === 202 || r.status === 201) posted.push(r.body.id);
        else refused.push(`${r.status}`);
      }
      pours++;
      await sleep(150);
    }
    say(`${posted.length} readings in ${pours} pours posted${refused.length ? `, ${refused.length} refused (${[...new Set(refused)].join(', ')})` : ''}`);

    // drain: every reading judged, every delivery done, every notice sent
    const db = testDb();
    const drainUntil = Date.now() + DRAIN_MS;
    let state = { pending: -1, deliveriesOpen: -1, noticesOpen: -1, unrelayed: -1 };
    while (Date.now() < drainUntil) {
      const [{ n: pending }] = await db('readings').where({ organization_id: shop.orgId, status: 'pending' }).count({ n: '*' });
      const [{ n: deliveriesOpen }] = await db('webhook_deliveries').where({ organization_id: shop.orgId }).whereNot({ status: 'succeeded' }).count({ n: '*' });
      const [{ n: noticesOpen }] = await db('rejection_notices').where({ organization_id: shop.orgId, status: 'pending' }).count({ n: '*' });
      const [{ n: unrelayed }] = await db('events').where({ organization_id: shop.orgId }).whereNull('relayed_at').count({ n: '*' });
      state = { pending: Number(pending), deliveriesOpen: Number(deliveriesOpen), noticesOpen: Number(noticesOpen), unrelayed: Number(unrelayed) };
      if (Object.values(state).every((v) => v === 0)) break;
      await sleep(500);
    }
    say(`drained: ${JSON.stringify(state)}`);
    await sleep(1500); // a late duplicate would arrive now

    // judged exactly once: one verdict event per reading, none left pending
    const verdicts = await db('events').where({ organization_id: shop.orgId }).whereIn('type', ['reading.accepted', 'reading.rejected']).select('subject_id', 'type');
    const perReading = new Map<string, number>();
    for (const v of verdicts) perReading.set(v.subject_id, (perReading.get(v.subject_id) ?? 0) + 1);
    const twice = [...perReading.values()].filter((n) => n > 1).length;
    const unjudged = posted.filter((id) => !perReading.has(id)).length;
    check('every reading judged exactly once', posted.length > 0 && twice === 0 && unjudged === 0 && state.pending === 0, `${posted.length} readings, ${verdicts.length} verdict events, ${twice} judged twice, ${unjudged} never judged`);
    const rejected = verdicts.filter((v) => v.type === 'reading.rejected').map((v) => v.subject_id as string);

    // each event once per endpoint: every event after the endpoints existed has a delivery to each, and
    // the receiver saw each delivered event exactly once (events before them went nowhere, rightly)
    const events = (await db('events').where({ organization_id: shop.orgId }).select('id')).map((e) => e.id as string);
    for (const name of ['erp', 'mes']) {
      const ep = await db('webhook_endpoints').where({ organization_id: shop.orgId, description: name }).first();
      const due = (await db('events').where({ organization_id: shop.orgId }).where('occurred_at', '>', ep.created_at).select('id')).map((e) => e.id as string);
      const delivered = new Set((await db('webhook_deliveries').where({ endpoint_id: ep.id, status: 'succeeded' }).select('event_id')).map((d) => d.event_id as string));
      const got = received.get(`/${name}`) ?? new Map<string, number>();
      const dup = [...got.values()].filter((n) => n > 1).length;
      const missing = due.filter((id) => !got.has(id)).length;
      const unknown = [...got.keys()].filter((id) => !delivered.has(id)).length;
      check(`every event delivered once to the ${name} endpoint`, due.length > 0 && dup === 0 && missing === 0 && unknown === 0 && got.size === delivered.size, `${due.length} events after it was added (${events.length} in all), ${got.size} received, ${dup} twice, ${missing} missing, ${unknown} not in the delivery log`);
    }

    // mail: one message per rejected reading to the engineer who wants each; each rejection in exactly one digest
    const engineerMail = mail.messages.filter((m) => m.to.includes(shop.people.engineer!.email));
    const eachCount = new Map<string, number>();
    for (const id of rejected) eachCount.set(id, engineerMail.filter((m) => m.text.includes(id)).length);
    const eachWrong = [...eachCount.entries()].filter(([, n]) => n !== 1).length;
    check('one e-mail per rejected reading, none twice', rejected.length > 0 && engineerMail.length === rejected.length && eachWrong === 0, `${rejected.length} rejected, ${engineerMail.length} messages, ${eachWrong} readings not mailed exactly once`);
    const digests = mail.messages.filter((m) => m.to.includes(digestEmail));
    const inDigests = new Map<string, number>();
    for (const id of rejected) inDigests.set(id, digests.filter((m) => m.text.includes(id)).length);
    const digestWrong = [...inDigests.values()].filter((n) => n !== 1).length;
    const slots = digests.map((m) => Math.floor(Date.parse(m.receivedAt) / DIGEST_MS));
    const sameSlot = slots.length - new Set(slots).size;
    check('one digest per period, each rejection in exactly one digest', digests.length > 0 && sameSlot === 0 && digestWrong === 0, `${digests.length} digests in ${new Set(slots).size} periods of ${DIGEST_MS / 1000} s, ${sameSlot} extra in a period, ${digestWrong} rejections not in exactly one digest`);

    // the periodic jobs are registered once, whatever the number of workers; only workers consume
    const periodic = new Bull('periodic', redisServer.url, { prefix });
    const judging = new Bull('reading-judging', redisServer.url, { prefix });
    const repeats = await periodic.getRepeatableJobs();
    const names = repeats.map((r) => r.name).sort();
    check('each periodic job registered once', JSON.stringify(names) === JSON.stringify(['digest-send', 'import-sweep', 'judge-sweep', 'notice-send', 'relay-sweep']), names.join(', '));
    const consumers = await judging.getWorkers();
    check('only the two workers consume the judging queue', consumers.length === 2, `${consumers.length} consumers`);
    await periodic.close();
    await judging.close();

    const summary = {
      at: new Date().toISOString(),
      processes: '2 api + 2 worker',
      loadSeconds: LOAD_MS / 1000,
      readings: posted.length,
      pours,
      rejected: rejected.length,
      events: events.length,
      deliveriesPerEndpoint: events.length,
      digests: digests.length,
      seconds: Number(((Date.now() - t0) / 1000).toFixed(1)),
      results,
    };
    fs.writeFileSync(path.join(OUT_DIR, 'multi-process.json'), JSON.stringify(summary, null, 2));
    say(`done: ${JSON.stringify({ ...summary, results: undefined })}`);
  } finally {
    // SIGTERM and wait: each process stops within SHUTDOWN_TIMEOUT_MS (25 s) plus its own close
    const stopStart = Date.now();
    const stops = await Promise.all(
      procs.map((p) =>
        p.exited
          ? Promise.resolve(`${p.name} had exited`)
          : new Promise<string>((r) => {
              p.child.once('exit', (code, sig) => r(`${p.name} ${code ?? sig} after ${((Date.now() - stopStart) / 1000).toFixed(1)} s`));
              p.child.kill('SIGTERM');
              setTimeout(() => r(`${p.name} still running after 40 s`), 40_000).unref();
            }),
      ),
    );
    if (results.length) check('every process stops on SIGTERM within the shutdown bound', stops.every((x) => !/still running|had exited/.test(x)), stops.join(', '));
    const { closeTestDb } = await import('../e2e/support/fixtures.js');
    await closeTestDb();
    await mail.close();
    receiver.close();
    if (pg.startedHere) pg.stop();
    if (redisServer.startedHere) redisServer.stop();
  }
  const failed = results.filter((r) => !r.ok).length;
  console.log(`multi-process: ${results.length - failed} passed, ${failed} failed (${((Date.now() - t0) / 1000).toFixed(0)} s)`);
  return failed ? 1 : 0;
}

main().then(
  (code) => process.exit(code),
  (e: Error) => {
    console.error(`[multi-process] ${e.stack ?? e.message}`);
    process.exit(1);
  },
);
