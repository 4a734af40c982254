// `npm run test:faults`: the API under faults, on a PostgreSQL and a Redis of its own (ports 55641 /
// 56641, API on 3341), so stopping them disturbs no other suite. Bounded in time and count; stops by
// itself; prints a table and exits non-zero when anything acknowledged is lost or a check fails.
//   FAULTS_SCALE=small  (what `npm test` runs)  fewer fuzz cases, shorter ingest windows
//   FAULTS_ONLY=fuzz,kill-api,stop-postgres,stop-redis,receiver-down   a subset
import fs from 'node:fs';
import path from 'node:path';
import { Webhook } from 'standardwebhooks';
import { startErpReceiver } from '../../fakes/src/erp-receiver.js';
import { ACTIONS, type Action } from '@pourgate/permissions';
import { bodyValidator, type CaseContext, rowCounts, rowDiff, runFuzz, writeRoutes } from './fuzz-core.js';
import { type ApiProcess, json, makeShop, rawSend, readingBody, resetDatabase, ROOT, type Shop, sleep, startApi } from './harness.js';
// plain Node module shared with `npm start` / `npm test`
import { startPostgres, startRedis } from '../../scripts/lib/services.mjs';

if (process.argv.includes('--help')) {
  console.log('usage: npm run test:faults   (FAULTS_SCALE=small, FAULTS_ONLY=kill-api,stop-redis, FUZZ_CASES, FUZZ_SEED; servers on 55641/56641/3341)');
  process.exit(0);
}
const small = process.env.FAULTS_SCALE === 'small';
const only = process.env.FAULTS_ONLY?.split(',').map((s) => s.trim());
const PG_PORT = Number(process.env.FAULTS_PGPORT ?? 55641);
const REDIS_PORT = Number(process.env.FAULTS_REDIS_PORT ?? 56641);
const API_PORT = Number(process.env.FAULTS_API_PORT ?? 3341);
const FUZZ_CASES = Number(process.env.FUZZ_CASES ?? (small ? 1000 : 10_000));
const FUZZ_SEED = Number(process.env.FUZZ_SEED ?? Date.now() % 2 ** 31);
const WINDOW_MS = small ? 1500 : 4000; // how long each phase of an ingest runs
const JUDGE_DEADLINE_MS = 30_000;
const OUT_DIR = path.join(ROOT, 'test-output');
fs.mkdirSync(OUT_DIR, { recursive: true });
const LOG = path.join(OUT_DIR, 'faults-api.log');
fs.writeFileSync(LOG, '');

interface Row { scenario: string; load: string; fault: string; acknowledged: number; lost: number; duplicates: number; recovery: string; ok: boolean; notes: string[] }
const rows: Row[] = [];
const t0 = Date.now();
const say = (m: string) => process.stdout.write(`[faults ${((Date.now() - t0) / 1000).toFixed(0).padStart(3)}s] ${m}\n`);

type Pg = { url(db: string): string; stop(): void };
type Rd = { url: string; stop(): void };
let pg: Pg = await startPostgres({ name: `pg-faults-${PG_PORT}`, port: PG_PORT, fast: true, databases: ['pourgate_faults'] });
let redis: Rd = await startRedis({ name: `redis-faults-${REDIS_PORT}`, port: REDIS_PORT, durable: false });
const DB_URL = pg.url('pourgate_faults');
process.env.DATABASE_URL = DB_URL; // the fixtures' direct connection
say('resetting the fault database');
resetDatabase(DB_URL);
const { testDb, closeTestDb } = await import('../e2e/support/fixtures.js');
const apiEnv = { QUEUE_PREFIX: 'faults', WEBHOOK_RETRY_SCHEDULE: '0,1,2,3,4,5,6,8,10,15,20', WEBHOOK_TIMEOUT_MS: '3000' };
const launch = () => startApi({ port: API_PORT, databaseUrl: DB_URL, redisUrl: redis.url, logFile: LOG, env: apiEnv });
let api: ApiProcess = await launch();
say(`API up on ${api.base} (pid ${api.pid()})`);
const shop: Shop = await makeShop(api.base, 'faults');

/** Posts readings from `loops` devices-worth of callers at a steady pace; remembers every answer. */
class Ingest {
  readonly acked = new Map<string, string>();
  readonly unacked = new Set<string>();
  readonly statuses: Record<string, number> = {};
  readonly bad: string[] = [];
  private running = false;
  private loops: Promise<void>[] = [];
  private n = 0;
  private phase = 'before';
  readonly byPhase: Record<string, Record<string, number>> = {};
  constructor(private readonly label: string, private readonly batchId: string, private readonly base: () => string) {}

  setPhase(p: string) { this.phase = p; }

  start(loops = 4, pauseMs = 25) {
    this.running = true;
    this.loops = Array.from({ length: loops }, async () => {
      // like a device: a reading that was not acknowledged is posted again, same client id, after a pause
      let id = `${this.label}-${++this.n}`;
      while (this.running) {
        const status = await this.post(id);
        if (status === 200 || status === 202) id = `${this.label}-${++this.n}`;
        await sleep(status === 200 || status === 202 ? pauseMs : 200);
      }
    });
  }

  async stop() {
    this.running = false;
    await Promise.all(this.loops);
  }

  async post(id: string): Promise<number> {
    let status: number;
    try {
      const res = await fetch(`${this.base()}/v1/readings`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify(readingBody(this.batchId, id)), signal: AbortSignal.timeout(15_000) });
      status = res.status;
      const text = await res.text();
      if (status === 200 || status === 202) {
        this.acked.set(id, JSON.parse(text).id);
        this.unacked.delete(id);
      } else {
        this.unacked.add(id);
        const ct = res.headers.get('content-type') ?? '';
        if (!/^application\/problem\+json/.test(ct)) this.bad.push(`${status} with content-type ${ct}`);
        if (status === 503 && !res.headers.get('retry-after')) this.bad.push('503 without Retry-After');
        if (status !== 503) this.bad.push(`unexpected ${status}: ${text.slice(0, 200)}`);
      }
    } catch {
      status = 0; // connection refused or reset: not acknowledged, retried later with the same id
      this.unacked.add(id);
    }
    this.statuses[status] = (this.statuses[status] ?? 0) + 1;
    const ph = (this.byPhase[this.phase] ??= {});
    ph[status] = (ph[status] ?? 0) + 1;
    return status;
  }

  /** Posts every unacknowledged reading again with its own client id until each is acknowledged. */
  async retryUnacked(deadlineMs = 60_000) {
    const until = Date.now() + deadlineMs;
    while (this.unacked.size && Date.now() < until) {
      for (const id of [...this.unacked]) await this.post(id);
      if (this.unacked.size) await sleep(500);
    }
  }
}

/** Every acknowledged reading exists once, with the id it was acknowledged with; all judged in time. */
async function verify(ing: Ingest, since: number): Promise<{ lost: number; duplicates: number; judgedAfterMs: number | null; pending: number; eventuallyMs?: number }> {
  const ids = [...ing.acked.keys()];
  const found = await testDb()('readings').where({ device_id: shop.scaleId }).whereIn('client_reading_id', ids).select('client_reading_id', 'id');
  const byClient = new Map<string, string[]>();
  for (const r of found) byClient.set(r.client_reading_id, [...(byClient.get(r.client_reading_id) ?? []), r.id]);
  let lost = 0;
  let duplicates = 0;
  for (const [cid, rid] of ing.acked) {
    const got = byClient.get(cid) ?? [];
    if (!got.includes(rid)) lost++;
    if (got.length > 1) duplicates += got.length - 1;
  }
  const until = since + JUDGE_DEADLINE_MS;
  for (;;) {
    const pending = Number((await testDb()('readings').whereIn('id', [...ing.acked.values()]).where('status', 'pending').count({ n: '*' }))[0]!.n);
    if (pending === 0) return { lost, duplicates, judgedAfterMs: Date.now() - since, pending };
    if (Date.now() > until) {
      // past the target: keep watching a while, so the report can say by how much it missed
      const late = Date.now();
      while (Date.now() < late + 90_000) {
        await sleep(1000);
        const left = Number((await testDb()('readings').whereIn('id', [...ing.acked.values()]).where('status', 'pending').count({ n: '*' }))[0]!.n);
        if (left === 0) return { lost, duplicates, judgedAfterMs: null, pending, eventuallyMs: Date.now() - since };
      }
      return { lost, duplicates, judgedAfterMs: null, pending };
    }
    await sleep(500);
  }
}

function record(scenario: string, fault: string, ing: Ingest, v: Awaited<ReturnType<typeof verify>>, extra: { ok?: boolean; notes?: string[] } = {}) {
  const notes = [...(extra.notes ?? []), ...[...new Set(ing.bad)].slice(0, 5)];
  const ok = (extra.ok ?? true) && v.lost === 0 && v.duplicates === 0 && v.judgedAfterMs !== null && ing.bad.length === 0;
  const total = Object.values(ing.statuses).reduce((a, b) => a + b, 0);
  rows.push({
    scenario, fault, ok, notes,
    load: `${total} posts (${Object.entries(ing.statuses).map(([s, n]) => `${s === '0' ? 'refused conn' : s}: ${n}`).join(', ')})`,
    acknowledged: ing.acked.size, lost: v.lost, duplicates: v.duplicates,
    recovery: v.judgedAfterMs === null ? `${v.pending} still pending after ${JUDGE_DEADLINE_MS / 1000} s${v.eventuallyMs ? ` (all judged after ${(v.eventuallyMs / 1000).toFixed(1)} s)` : ''}` : `all judged ${(v.judgedAfterMs / 1000).toFixed(1)} s after recovery`,
  });
  say(`${ok ? 'PASS' : 'FAIL'} ${scenario}: acked ${ing.acked.size}, lost ${v.lost}, duplicates ${v.duplicates}, ${rows.at(-1)!.recovery}${notes.length ? `; ${notes.join('; ')}` : ''}`);
}

const want = (name: string) => !only || only.includes(name);
const summaryExtra: Record<string, unknown> = {};

try {
  if (want('fuzz')) {
    say(`fuzz: ${FUZZ_CASES} refused requests over loopback (seed ${FUZZ_SEED})`);
    const doc = (await json(api.base, 'GET', '/v1/openapi.json', {})).body;
    const routes = writeRoutes(doc);
    const ctx: CaseContext = {
      isValid: bodyValidator(doc),
      bodyLimit: 1048576,
      credentialsFor: (route): Record<string, string> => {
        if (route.isPublic || !route.action) return {};
        const role = (ACTIONS[route.action as Action]?.roles ?? [])[0];
        return role ? { authorization: shop.tokens[role]! } : {};
      },
    };
    await sleep(1000); // let the boot-time sweeps finish so that only the fuzz could write
    const before = await rowCounts(testDb());
    const s = await runFuzz({ routes, ctx, numRuns: FUZZ_CASES, seed: FUZZ_SEED, concurrency: 8, send: (r) => rawSend(api.base, r) });
    const after = await rowCounts(testDb());
    const diff = rowDiff(before, after);
    const ok = s.failures.length === 0 && Object.keys(diff).length === 0 && s.cases === FUZZ_CASES && api.alive();
    summaryExtra.fuzz = { ...s, failures: s.failures.slice(0, 20), rowsWritten: diff };
    rows.push({
      scenario: 'fuzz every write route', fault: `${s.cases} generated refused requests on ${s.routes} routes (seed ${s.seed})`,
      load: `${s.cases} requests in ${s.seconds.toFixed(1)} s; ${Object.entries(s.byStatus).map(([k, v]) => `${k}: ${v}`).join(', ')}`,
      acknowledged: 0, lost: 0, duplicates: 0, recovery: `${Object.keys(diff).length ? `rows written: ${JSON.stringify(diff)}` : 'no row written'}`, ok,
      notes: s.failures.slice(0, 8).map((f) => f.signature),
    });
    say(`${ok ? 'PASS' : 'FAIL'} fuzz: ${s.cases} cases, ${s.failures.length} distinct violations, rows written ${JSON.stringify(diff)}`);
    for (const f of s.failures.slice(0, 5)) say(`  ${f.signature}\n      ${JSON.stringify(f.example).slice(0, 600)}`);
  }

  if (want('kill-api')) {
    say('kill-api: SIGKILL the API during a steady ingest, restart it');
    const ing = new Ingest('kill', await shop.newBatch(), () => api.base);
    ing.start();
    await sleep(WINDOW_MS);
    ing.setPhase('down');
    await api.kill('SIGKILL');
    const killedAt = Date.now();
    await sleep(1000);
    api = await launch();
    const back = Date.now();
    ing.setPhase('after');
    await sleep(WINDOW_MS);
    await ing.stop();
    await ing.retryUnacked();
    const restartedIn = ((back - killedAt) / 1000).toFixed(1);
    record('SIGKILL the API during ingest', `SIGKILL mid-ingest, restarted (up again in ${restartedIn} s)`, ing, await verify(ing, back), { notes: [`posts while down: ${JSON.stringify(ing.byPhase.down ?? {})}`] });
  }

  if (want('stop-postgres')) {
    say('stop-postgres: stop PostgreSQL during ingest');
    const ing = new Ingest('pg', await shop.newBatch(), () => api.base);
    ing.start();
    await sleep(WINDOW_MS);
    ing.setPhase('down');
    pg.stop();
    const downAt = Date.now();
    await sleep(WINDOW_MS * 1.5);
    const ready = await json(api.base, 'GET', '/v1/ready', {}).catch(() => ({ status: 0, headers: new Headers(), body: null }));
    const aliveWhileDown = api.alive();
    pg = await startPostgres({ name: `pg-faults-${PG_PORT}`, port: PG_PORT, fast: true, databases: ['pourgate_faults'] });
    const back = Date.now();
    ing.setPhase('after');
    // recovery: the first acknowledged reading after PostgreSQL returns
    const firstOk = await (async () => {
      const until = Date.now() + 30_000;
      while (Date.now() < until) {
        if ([200, 202].includes(await ing.post(`pg-probe-${Date.now()}`))) return Date.now() - back;
        await sleep(200);
      }
      return null;
    })();
    await sleep(WINDOW_MS);
    await ing.stop();
    await ing.retryUnacked();
    const down = ing.byPhase.down ?? {};
    const notes = [`while down (${((back - downAt) / 1000).toFixed(1)} s): ${JSON.stringify(down)}; /v1/ready ${ready.status}; first 2xx ${firstOk === null ? 'never' : `${firstOk} ms`} after restart`];
    const saw503 = (down['503'] ?? 0) > 0;
    if (!saw503) notes.push('no 503 seen while PostgreSQL was down');
    record('stop PostgreSQL during ingest', `pg_ctl stop -m fast for ${((back - downAt) / 1000).toFixed(1)} s, start again`, ing, await verify(ing, back), { ok: aliveWhileDown && api.alive() && saw503 && ready.status === 503 && firstOk !== null, notes });
  }

  if (want('stop-redis')) {
    say('stop-redis: stop Redis during ingest (it comes back empty)');
    const ing = new Ingest('redis', await shop.newBatch(), () => api.base);
    ing.start();
    await sleep(WINDOW_MS);
    ing.setPhase('down');
    redis.stop();
    const downAt = Date.now();
    await sleep(WINDOW_MS * 1.5);
    const aliveWhileDown = api.alive();
    redis = await startRedis({ name: `redis-faults-${REDIS_PORT}`, port: REDIS_PORT, durable: false });
    const back = Date.now();
    ing.setPhase('after');
    await sleep(WINDOW_MS);
    await ing.stop();
    await ing.retryUnacked();
    const down = ing.byPhase.down ?? {};
    const downTotal = Object.values(down).reduce((a, b) => a + b, 0);
    const accepted = (down['202'] ?? 0) + (down['200'] ?? 0);
    const notes = [`while down (${((back - downAt) / 1000).toFixed(1)} s): ${JSON.stringify(down)}`];
    record('stop Redis during ingest', `redis shutdown nosave for ${((back - downAt) / 1000).toFixed(1)} s, start empty`, ing, await verify(ing, back), { ok: aliveWhileDown && api.alive() && downTotal > 0 && accepted === downTotal, notes });
  }

  if (want('receiver-down')) {
    say('receiver-down: the webhook receiver is away while events happen');
    let secret = '';
    const receiver = await startErpReceiver({ secret: () => secret });
    const ep = await json(api.base, 'POST', '/v1/webhook-endpoints', { authorization: shop.tokens.integrator! }, { url: receiver.url, eventTypes: ['reading.accepted', 'reading.rejected'] });
    if (ep.status !== 201) throw new Error(`webhook endpoint: ${ep.status} ${JSON.stringify(ep.body)}`);
    secret = ep.body.secret;
    await receiver.stop();
    const ing = new Ingest('hook', await shop.newBatch(), () => api.base);
    ing.start(2, 50);
    await sleep(WINDOW_MS);
    await ing.stop();
    await ing.retryUnacked();
    await sleep(small ? 3000 : 8000); // deliveries fail and back off meanwhile
    await receiver.start();
    const back = Date.now();
    const v = await verify(ing, back);
    const readingIds = [...ing.acked.values()];
    const expected = new Set<string>((await testDb()('events').whereIn('subject_id', readingIds).whereIn('type', ['reading.accepted', 'reading.rejected']).select('id')).map((e) => e.id as string));
    let delivered = 0;
    const until = Date.now() + 60_000;
    for (;;) {
      delivered = receiver.events().filter((r) => expected.has(r.webhookId)).length;
      if (delivered === expected.size || Date.now() > until) break;
      await sleep(250);
    }
    const deliveredAfterMs = Date.now() - back;
    const ours = receiver.received.filter((r) => expected.has(r.webhookId) || expected.has(String(r.event?.id)));
    // checked again here with the reference Standard Webhooks library itself, not only the receiver's own check
    const reference = new Webhook(secret);
    const unverified = ours.filter((r) => {
      try {
        reference.verify(r.rawBody, r.headers);
        return !r.verified;
      } catch {
        return true;
      }
    }).length;
    // a duplicate must carry the same webhook-id as the first delivery of its event
    const idsPerEvent = new Map<string, Set<string>>();
    for (const r of ours.filter((x) => x.verified)) {
      const evId = String(r.event?.id ?? '');
      if (!idsPerEvent.has(evId)) idsPerEvent.set(evId, new Set());
      idsPerEvent.get(evId)!.add(r.webhookId);
    }
    const mismatched = [...idsPerEvent.entries()].filter(([evId, ids]) => ids.size !== 1 || !ids.has(evId)).length;
    const dupDeliveries = ours.filter((r) => r.verified && r.answered < 300).length - delivered;
    const attempts = Number((await testDb()('webhook_attempts').whereIn('delivery_id', testDb()('webhook_deliveries').where({ endpoint_id: ep.body.id }).select('id')).count({ n: '*' }))[0]!.n);
    const ok = delivered === expected.size && expected.size > 0 && unverified === 0 && mismatched === 0;
    rows.push({
      scenario: 'webhook receiver down', fault: `receiver stopped ${(small ? 3 : 8) + WINDOW_MS / 1000} s while ${expected.size} events happened`,
      load: `${ing.acked.size} readings, ${expected.size} events, ${attempts} delivery attempts (failed ones included)`,
      acknowledged: ing.acked.size, lost: expected.size - delivered, duplicates: Math.max(0, dupDeliveries), ok,
      recovery: `all ${delivered}/${expected.size} delivered ${(deliveredAfterMs / 1000).toFixed(1)} s after the receiver returned`,
      notes: [`${ours.length} requests received, ${unverified} failed signature verification (standardwebhooks), ${mismatched} events seen under another webhook-id`, ...(v.lost ? [`${v.lost} readings lost`] : [])],
    });
    say(`${ok ? 'PASS' : 'FAIL'} receiver-down: ${delivered}/${expected.size} delivered, unverified ${unverified}, mismatched ids ${mismatched}, duplicates ${dupDeliveries}`);
    await receiver.close();
  }
} catch (e) {
  rows.push({ scenario: 'harness', fault: 'the suite itself failed', load: '', acknowledged: 0, lost: 0, duplicates: 0, recovery: '', ok: false, notes: [(e as Error).stack ?? String(e)] });
  say(`ERROR ${(e as Error).stack}`);
} finally {
  await api.kill('SIGTERM');
  await closeTestDb();
  pg.stop();
  redis.stop();
}

console.log(`\nFault suite (${small ? 'small' : 'full'} counts), ${new Date().toISOString()}, ${((Date.now() - t0) / 1000).toFixed(0)} s`);
console.log('| scenario | fault | load held | acknowledged | lost | duplicates | recovery | result |');
console.log('| --- | --- | --- | --: | --: | --: | --- | --- |');
for (const r of rows) console.log(`| ${r.scenario} | ${r.fault} | ${r.load} | ${r.acknowledged} | ${r.lost} | ${r.duplicates} | ${r.recovery} | ${r.ok ? 'pass' : 'FAIL'} |`);
for (const r of rows.filter((x) => x.notes.length)) console.log(`  ${r.scenario}: ${r.notes.join(' | ')}`);
const out = path.join(OUT_DIR, `faults-${small ? 'small' : 'full'}.json`);
fs.writeFileSync(out, JSON.stringify({ at: new Date().toISOString(), scale: small ? 'small' : 'full', seconds: (Date.now() - t0) / 1000, rows, ...summaryExtra }, null, 2));
console.log(`results: ${path.relative(ROOT, out)}; API log: ${path.relative(ROOT, LOG)}`);
process.exit(rows.every((r) => r.ok) && rows.length > 0 ? 0 : 1);
