// `npm run bench`: every figure is a ratio against a baseline measured in the same run, the median
// of several rounds, on loopback only, on a PostgreSQL (55642) and Redis (56642) of its own.
//   1 bulk ingest           POST /v1/readings/bulk (1000 a post)  vs  pg multi-row INSERT of the same rows
//   2 single reading        POST /v1/readings (autocannon)        vs  a bare Fastify route doing the same INSERT
//   3 pipeline latency      posted -> verdict -> webhook received vs  a bare loopback POST round trip
//   4 review list           rejected, sorted, one page: 1 M readings in the table vs 10 k
//   5 memory                the API's peak RSS during 1 and 2 (the compiled build, as `npm start` runs it), the boot's peak apart
//   6 control chart         a chart's data over 1 M points vs 10 k
// Writes bench/results/<date>.json and bench/results/latest.json and prints the table for BENCHMARKS.md.
// BENCH_ROUNDS (3), BENCH_SECONDS (5), BENCH_WARMUP_SECONDS (15), BENCH_LARGE_ROWS (1000000), BENCH_PIPELINE_READINGS (150) scale it.
import autocannon from 'autocannon';
import { type ChildProcess, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { startErpReceiver } from '../fakes/src/erp-receiver.js';
import { type ApiProcess, json, makeShop, readingBody, resetDatabase, ROOT, type Shop, sleep, startApi } from '../test/faults/harness.js';
import { startPostgres, startRedis } from '../scripts/lib/services.mjs';

if (process.argv.includes('--help')) {
  console.log('usage: npm run bench   (BENCH_ROUNDS, BENCH_SECONDS, BENCH_WARMUP_SECONDS, BENCH_LARGE_ROWS, BENCH_PIPELINE_READINGS; servers on BENCH_PGPORT 55642, BENCH_REDIS_PORT 56642, BENCH_API_PORT 3342 (+1, +2); BENCH_SOURCES=1 runs the TypeScript sources instead of api/dist)');
  process.exit(0);
}
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 5);
// single posts before the rounds, each side: V8 needs 10-15 s of load to compile the API's request path (the bare route's is short)
const WARMUP_SECONDS = Number(process.env.BENCH_WARMUP_SECONDS ?? 15);
const LARGE = Number(process.env.BENCH_LARGE_ROWS ?? 1_000_000);
const SMALL = 10_000;
const PIPE_N = Number(process.env.BENCH_PIPELINE_READINGS ?? 150);
const PIPE_RATE = 10; // readings per second, steady
const BULK_POSTS = 4; // per round, 1000 readings each
const PG_PORT = Number(process.env.BENCH_PGPORT ?? 55642);
const REDIS_PORT = Number(process.env.BENCH_REDIS_PORT ?? 56642);
// the API under ingest on API_PORT, the bare route on API_PORT + 1, the pipeline's API on API_PORT + 2
const API_PORT = Number(process.env.BENCH_API_PORT ?? 3342);
// the API as `npm start` runs it (api/dist, built here when stale); BENCH_SOURCES=1: through swc, as the tests run it
const COMPILED = !process.env.BENCH_SOURCES;
const OUT = path.join(ROOT, 'bench', 'results');
fs.mkdirSync(OUT, { recursive: true });
const LOG = path.join(ROOT, 'test-output', 'bench-api.log');
fs.mkdirSync(path.dirname(LOG), { recursive: true });
fs.writeFileSync(LOG, '');
const t0 = Date.now();
const say = (m: string) => process.stdout.write(`[bench ${((Date.now() - t0) / 1000).toFixed(0).padStart(4)}s] ${m}\n`);
const median = (xs: number[]) => { const s = [...xs].sort((a, b) => a - b); const m = Math.floor(s.length / 2); return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2; };
const pct = (xs: number[], p: number) => { const s = [...xs].sort((a, b) => a - b); return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)]!; };
const round = (x: number, d = 2) => Math.round(x * 10 ** d) / 10 ** d;
const rssOf = (pid: number, field: 'VmRSS' | 'VmHWM') => Number(/(\d+) kB/.exec(fs.readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find((l) => l.startsWith(field)) ?? '')?.[1] ?? 0) / 1024;

const pgSrv = await startPostgres({ name: `pg-bench-${PG_PORT}`, port: PG_PORT, fast: true, databases: ['pourgate_bench'] });
const redis = await startRedis({ name: `redis-bench-${REDIS_PORT}`, port: REDIS_PORT, durable: false });
const DB_URL: string = pgSrv.url('pourgate_bench');
process.env.DATABASE_URL = DB_URL;
say('resetting the bench database');
resetDatabase(DB_URL);
const { testDb, closeTestDb } = await import('../test/e2e/support/fixtures.js');
const db = testDb();
const raw = new pg.Pool({ connectionString: DB_URL, max: 10 });
const results: Record<string, unknown> = {
  machine: { cpus: os.cpus().length, cpu: os.cpus()[0]?.model, memoryGiB: round(os.totalmem() / 2 ** 30, 1), node: process.version, os: `${os.type()} ${os.release()}`, loadavgAtStart: os.loadavg().map((x) => round(x)) },
  date: new Date().toISOString(),
  command: 'npm run bench',
  settings: { rounds: ROUNDS, secondsPerRun: SECONDS, singleWarmupSeconds: WARMUP_SECONDS, bulkPostsPerRound: BULK_POSTS, pipelineReadings: PIPE_N, pipelineRatePerSecond: PIPE_RATE, largeRows: LARGE, api: COMPILED ? 'node --enable-source-maps api/dist/main.js (compiled, as npm start runs it)' : 'node --import @swc-node/register/esm-register api/src/main.ts', postgres: 'Debian PostgreSQL 15, fsync=off (test cluster)' },
};
const children: (ApiProcess | ChildProcess)[] = [];

try {
  // ── 3 pipeline latency: a process with HTTP and workers, a receiver on loopback ──────────────
  {
    say('pipeline: starting the API with workers');
    const api = await startApi({ port: API_PORT + 2, databaseUrl: DB_URL, redisUrl: redis.url, logFile: LOG, compiled: COMPILED, env: { QUEUE_PREFIX: 'bench-pipe' } });
    children.push(api);
    const shop = await makeShop(api.base, 'bench-pipe');
    let secret = '';
    const receiver = await startErpReceiver({ secret: () => secret });
    const ep = await json(api.base, 'POST', '/v1/webhook-endpoints', { authorization: shop.tokens.integrator! }, { url: receiver.url, eventTypes: ['reading.accepted', 'reading.rejected'] });
    if (ep.status !== 201) throw new Error(`endpoint: ${ep.status} ${JSON.stringify(ep.body)}`);
    secret = ep.body.secret;
    // the baseline: a bare loopback POST round trip of the same body, at the same steady rate
    const bare = http.createServer((req, res) => { req.resume(); req.on('end', () => res.writeHead(204).end()); });
    await new Promise<void>((r) => bare.listen(0, '127.0.0.1', () => r()));
    const barePort = (bare.address() as AddressInfo).port;
    const steady = async (n: number, one: (i: number) => Promise<number | null>) => {
      const out: number[] = [];
      const pending: Promise<void>[] = [];
      for (let i = 0; i < n; i++) {
        pending.push(one(i).then((ms) => { if (ms !== null) out.push(ms); }));
        await sleep(1000 / PIPE_RATE);
      }
      await Promise.all(pending);
      return out;
    };
    const barePost = async (i: number) => {
      const body = JSON.stringify(readingBody(shop.batchId, `bare-${i}`));
      const s = performance.now();
      const r = await fetch(`http://127.0.0.1:${barePort}/`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
      await r.arrayBuffer();
      return performance.now() - s;
    };
    await steady(20, barePost); // warm-up
    await steady(20, async (i) => { const r = await fetch(`${api.base}/v1/readings`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify(readingBody(shop.batchId, `warm-${i}`)) }); await r.text(); return null; });
    await sleep(2000);
    const runs: { bare: Record<string, number>; pipeline: Record<string, number>; verdict: Record<string, number>; missing: number }[] = [];
    for (let k = 0; k < ROUNDS; k++) {
      say(`pipeline: round ${k + 1}/${ROUNDS} (${PIPE_N} readings at ${PIPE_RATE}/s, and as many bare POSTs)`);
      const bareMs = await steady(PIPE_N, barePost);
      const batchId = await shop.newBatch();
      const ids: string[] = [];
      let missing = 0;
      const pipeMs = await steady(PIPE_N, async (i) => {
        const s = performance.now();
        const res = await fetch(`${api.base}/v1/readings`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify(readingBody(batchId, `pipe-${k}-${i}`, 1 + (i % 7) * 0.01)) });
        const { id } = (await res.json()) as { id: string };
        ids.push(id);
        try {
          await receiver.waitFor((r) => r.verified && (r.event?.data as { readingId?: string } | undefined)?.readingId === id, 30_000);
          return performance.now() - s;
        } catch {
          missing++;
          return null;
        }
      });
      const judged = await db('readings').whereIn('id', ids).whereNotNull('judged_at').select(db.raw('extract(epoch from (judged_at - received_at)) * 1000 as ms'));
      const verdictMs = judged.map((r: { ms: string }) => Number(r.ms));
      const stats = (xs: number[]) => ({ p50: round(pct(xs, 50)), p95: round(pct(xs, 95)), p99: round(pct(xs, 99)), n: xs.length });
      runs.push({ bare: stats(bareMs), pipeline: stats(pipeMs), verdict: stats(verdictMs), missing });
      say(`  bare p99 ${round(pct(bareMs, 99))} ms; pipeline p50/p95/p99 ${round(pct(pipeMs, 50))}/${round(pct(pipeMs, 95))}/${round(pct(pipeMs, 99))} ms; verdict stored p99 ${round(pct(verdictMs, 99))} ms after receipt; missing ${missing}`);
    }
    const med = (f: (r: (typeof runs)[number]) => number) => round(median(runs.map(f)));
    results.pipeline = {
      runs,
      median: {
        bare: { p50: med((r) => r.bare.p50), p95: med((r) => r.bare.p95), p99: med((r) => r.bare.p99) },
        pipeline: { p50: med((r) => r.pipeline.p50), p95: med((r) => r.pipeline.p95), p99: med((r) => r.pipeline.p99) },
        verdictStoredAfterReceipt: { p50: med((r) => r.verdict.p50), p99: med((r) => r.verdict.p99) },
      },
      ratioP99: round(median(runs.map((r) => r.pipeline.p99 / r.bare.p99)), 1),
      target: 'p99 <= 10 x the bare round trip',
      relayIntervalMs: 'WEBHOOK_RELAY_INTERVAL_MS default (100), woken by NOTIFY',
      missing: runs.reduce((a, r) => a + r.missing, 0),
    };
    bare.close();
    await receiver.close();
    await api.kill('SIGTERM');
  }

  // ── 1, 2, 5: ingest throughput against raw pg and a bare Fastify route; the API's RSS ─────────
  say('ingest: starting the API (HTTP only, like a scaled-out API process) and the bare Fastify route');
  const api = await startApi({ port: API_PORT, databaseUrl: DB_URL, redisUrl: redis.url, logFile: LOG, compiled: COMPILED, env: { PROCESS_ROLE: 'api', QUEUE_PREFIX: 'bench-ingest' }, nodeArgs: process.env.BENCH_CPU_PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${path.join(ROOT, 'test-output', 'profiles')}`] : [] });
  children.push(api);
  const shop: Shop = await makeShop(api.base, 'bench-ingest');
  const bareChild = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'bench/bare-server.ts')], { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'], env: { ...process.env, BENCH_BARE_PORT: String(API_PORT + 1), DATABASE_URL: DB_URL, BENCH_ORG: shop.orgId, BENCH_BATCH: shop.batchId, BENCH_DEVICE: shop.scaleId } });
  children.push(bareChild);
  await new Promise<void>((resolve, reject) => { bareChild.stdout!.once('data', () => resolve()); bareChild.once('exit', () => reject(new Error('bare server exited'))); });
  const pid = api.pid()!;
  const rssIdle = rssOf(pid, 'VmRSS');
  // the peak of the boot (modules loaded, schemas compiled, the OpenAPI document built) is kept
  // apart: the goal is the peak during ingest, so the high-water mark is reset here (Linux
  // clear_refs 5) and read again after rows 1 and 2
  const bootPeak = rssOf(pid, 'VmHWM');
  let hwmReset = true;
  try { fs.writeFileSync(`/proc/${pid}/clear_refs`, '5'); } catch { hwmReset = false; }
  let rssPeakSampled = rssIdle;
  const sampler = setInterval(() => { rssPeakSampled = Math.max(rssPeakSampled, rssOf(pid, 'VmRSS')); }, 100);
  let seq = 0;
  const bulkBody = (n: number) => ({ readings: Array.from({ length: n }, () => readingBody(shop.batchId, `bulk-${++seq}`, 1.234)) });
  const rawRows = (n: number) => Array.from({ length: n }, () => [shop.orgId, shop.batchId, shop.scaleId, `raw-${++seq}`, 'mass', 'part_a', 1.234, 'kg', 1.234, true, new Date().toISOString()]);
  const rawInsert = async (n: number) => {
    const rows = rawRows(n);
    const cols = 11;
    const values = rows.map((_, i) => `(${Array.from({ length: cols }, (_x, j) => `$${i * cols + j + 1}`).join(',')})`).join(',');
    await raw.query(`INSERT INTO readings (organization_id, batch_id, device_id, client_reading_id, quantity, subject, value_si, unit_given, value_given, stable, device_time) VALUES ${values}`, rows.flat());
  };
  const postBulk = async () => {
    const res = await fetch(`${api.base}/v1/readings/bulk`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify(bulkBody(1000)) });
    if (res.status !== 202) throw new Error(`bulk answered ${res.status}: ${(await res.text()).slice(0, 300)}`);
    await res.arrayBuffer();
  };
  const rate = async (fn: () => Promise<void>, n: number) => { const s = performance.now(); for (let i = 0; i < n; i++) await fn(); return (n * 1000) / ((performance.now() - s) / 1000); };
  await postBulk();
  await rawInsert(1000); // warm-up
  const bulkRuns: { api: number; raw: number }[] = [];
  for (let k = 0; k < ROUNDS; k++) {
    const apiRate = await rate(postBulk, BULK_POSTS);
    const rawRate = await rate(() => rawInsert(1000), BULK_POSTS);
    bulkRuns.push({ api: round(apiRate, 0), raw: round(rawRate, 0) });
    say(`bulk round ${k + 1}: API ${round(apiRate, 0)} readings/s, raw pg ${round(rawRate, 0)} readings/s (${round((100 * apiRate) / rawRate, 1)} %)`);
  }
  const rssAfterBulk = rssOf(pid, 'VmHWM');
  results.bulk = { runs: bulkRuns, medianApi: median(bulkRuns.map((r) => r.api)), medianRaw: median(bulkRuns.map((r) => r.raw)), ratioPercent: round(100 * median(bulkRuns.map((r) => r.api / r.raw)), 1), target: '>= 50 % of the raw rate' };

  const cannon = (url: string, headers: Record<string, string>, tag: string, duration = SECONDS) => autocannon({
    url, method: 'POST', connections: 10, duration, headers: { 'content-type': 'application/json', ...headers },
    requests: [{ setupRequest: (req: Record<string, unknown>) => ({ ...req, body: JSON.stringify(readingBody(shop.batchId, `${tag}-${randomUUID()}`, 1.1)) }) }],
  }) as unknown as Promise<{ requests: { average: number }; latency: { p50: number; p99: number }; non2xx: number; errors: number; timeouts: number }>;
  await cannon(`${api.base}/v1/readings`, { 'x-api-key': shop.deviceKey }, 'warm', WARMUP_SECONDS);
  await cannon(`http://127.0.0.1:${API_PORT + 1}/readings`, {}, 'warm-bare', WARMUP_SECONDS);
  const singleRuns: { api: number; bare: number; apiP99: number; bareP99: number; apiNon2xx: number; bareNon2xx: number }[] = [];
  for (let k = 0; k < ROUNDS; k++) {
    const a = await cannon(`${api.base}/v1/readings`, { 'x-api-key': shop.deviceKey }, `single-${k}`);
    const b = await cannon(`http://127.0.0.1:${API_PORT + 1}/readings`, {}, `bare-${k}`);
    singleRuns.push({ api: round(a.requests.average, 0), bare: round(b.requests.average, 0), apiP99: a.latency.p99, bareP99: b.latency.p99, apiNon2xx: a.non2xx + a.errors, bareNon2xx: b.non2xx + b.errors });
    say(`single round ${k + 1}: API ${round(a.requests.average, 0)} req/s (p99 ${a.latency.p99} ms), bare Fastify ${round(b.requests.average, 0)} req/s (p99 ${b.latency.p99} ms) (${round((100 * a.requests.average) / b.requests.average, 1)} %); non-2xx ${a.non2xx + a.errors}/${b.non2xx + b.errors}`);
  }
  // how many PostgreSQL transactions one request costs (each autocommitted statement counts as one)
  const xacts = async () => { await sleep(11_000); // backends flush their statistics after 10 s idle (PostgreSQL 15)
    return Number((await raw.query("SELECT xact_commit + xact_rollback AS n FROM pg_stat_database WHERE datname = current_database()")).rows[0].n); };
  const perRequest = async (post: (i: number) => Promise<unknown>) => { const a = await xacts(); for (let i = 0; i < 50; i++) await post(i); return round(((await xacts()) - a) / 50, 1); };
  const xactApi = await perRequest(async (i) => (await fetch(`${api.base}/v1/readings`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify(readingBody(shop.batchId, `x-${i}-${randomUUID()}`)) })).text());
  const xactBare = await perRequest(async (i) => (await fetch(`http://127.0.0.1:${API_PORT + 1}/readings`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(readingBody(shop.batchId, `xb-${i}-${randomUUID()}`)) })).text());
  say(`PostgreSQL transactions per single POST: API ${xactApi}, bare ${xactBare}`);
  clearInterval(sampler);
  results.single = { runs: singleRuns, medianApi: median(singleRuns.map((r) => r.api)), medianBare: median(singleRuns.map((r) => r.bare)), ratioPercent: round(100 * median(singleRuns.map((r) => r.api / r.bare)), 1), target: '>= 50 % of the bare route', connections: 10, secondsPerRun: SECONDS, pgTransactionsPerRequest: { api: xactApi, bare: xactBare } };
  results.memory = { bootPeakRssMiB: round(bootPeak, 1), idleRssMiB: round(rssIdle, 1), peakRssAfterBulkMiB: round(rssAfterBulk, 1), peakRssMiB: round(rssOf(pid, 'VmHWM'), 1), sampledPeakMiB: round(rssPeakSampled, 1), peakIncludesBoot: !hwmReset, source: `/proc/<pid>/status VmHWM of the API process${hwmReset ? ', reset after boot' : ' (could not be reset: the boot peak included)'}` };
  say(`memory: boot peak ${round(bootPeak, 1)} MiB, idle ${round(rssIdle, 1)} MiB, peak during ingest ${round(rssOf(pid, 'VmHWM'), 1)} MiB${hwmReset ? '' : ' (boot included)'}`);
  bareChild.kill('SIGTERM');

  // ── 4 review list at 10 k and 1 M readings ──────────────────────────────────────────────────
  say('review list: emptying readings, generating 10 k with generate_series');
  await db.raw('TRUNCATE readings CASCADE');
  const review = await makeShop(api.base, 'bench-review');
  const batches = [review.batchId, await review.newBatch(), await review.newBatch(), await review.newBatch()];
  // the control chart of #17: ratio error of the review shop's system, one point per generated reading
  const chart = await json(api.base, 'POST', '/v1/control/charts', { authorization: review.tokens.engineer! }, { name: 'bench ratio error', materialSystemId: review.systemId, metric: 'ratio_error_percent' });
  if (chart.status !== 201) throw new Error(`control chart: ${chart.status} ${JSON.stringify(chart.body)}`);
  const fill = async (from: number, to: number) => {
    // one reading in ten rejected (ratio, temperature or capacity reasons), spread over 90 days;
    // reason_codes as the judge writes it beside reasons
    await db.raw(
      `INSERT INTO readings (organization_id, batch_id, device_id, client_reading_id, quantity, subject, value_si, unit_given, value_given, stable, received_at, status, reasons, reason_codes, judged_at)
       SELECT ?, (?::uuid[])[1 + g % 4], ?, 'gen-' || g, 'mass', CASE WHEN g % 2 = 0 THEN 'part_a' ELSE 'part_b' END, 1 + (g % 100) / 1000.0, 'kg', 1 + (g % 100) / 1000.0, true,
              now() - (g || ' seconds')::interval * 7.776,
              CASE WHEN g % 10 = 0 THEN 'rejected' WHEN g % 10 = 1 THEN 'unused' ELSE 'accepted' END,
              CASE WHEN g % 10 = 0 THEN jsonb_build_array(jsonb_build_object('code', (ARRAY['RATIO_POLYOL_HEAVY','RATIO_ISOCYANATE_HEAVY','TEMPERATURE_ABOVE_WINDOW','OVER_CAPACITY'])[1 + (g / 10) % 4], 'message', 'generated', 'measured', 5.4, 'limit', 5, 'unit', '%')) ELSE '[]'::jsonb END,
              CASE WHEN g % 10 = 0 THEN ARRAY[(ARRAY['RATIO_POLYOL_HEAVY','RATIO_ISOCYANATE_HEAVY','TEMPERATURE_ABOVE_WINDOW','OVER_CAPACITY'])[1 + (g / 10) % 4]] ELSE '{}'::text[] END,
              now() - (g || ' seconds')::interval * 7.776 + interval '1 second'
       FROM generate_series(?::int, ?::int) AS g`,
      [review.orgId, `{${batches.join(',')}}`, review.scaleId, from, to],
    );
    await db.raw(
      `INSERT INTO control_points (organization_id, material_system_id, metric, device_id, batch_id, value, at, source_key)
       SELECT ?, ?, 'ratio_error_percent', ?, (?::uuid[])[1 + g % 4], ((g::bigint * 7919) % 1000) / 100.0 - 5, now() - (g || ' seconds')::interval * 7.776, 'gen-' || g
       FROM generate_series(?::int, ?::int) AS g`,
      [review.orgId, review.systemId, review.scaleId, `{${batches.join(',')}}`, from, to],
    );
    await db.raw('ANALYZE readings');
    await db.raw('ANALYZE control_points');
  };
  const queries: Record<string, string> = {
    'rejected, newest first': `/v1/readings?filter=${encodeURIComponent('{"status":"rejected"}')}&sort=${encodeURIComponent('["receivedAt","DESC"]')}&range=${encodeURIComponent('[0,24]')}`,
    'rejected, one reason, newest first': `/v1/readings?filter=${encodeURIComponent('{"status":"rejected","reasonCode":"RATIO_POLYOL_HEAVY"}')}&sort=${encodeURIComponent('["receivedAt","DESC"]')}&range=${encodeURIComponent('[0,24]')}`,
    'rejected, one batch, last 7 days': `/v1/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', batchId: batches[0], receivedAfter: new Date(Date.now() - 7 * 86400_000).toISOString() }))}&sort=${encodeURIComponent('["receivedAt","DESC"]')}&range=${encodeURIComponent('[0,24]')}`,
  };
  const CHART_CASE = 'control chart, newest 500 points';
  queries[CHART_CASE] = `/v1/control/charts/${chart.body.id}/data`;
  const measure = async (label: string) => {
    const out: Record<string, { p50: number; p95: number; total: string | null }> = {};
    for (const [name, url] of Object.entries(queries)) {
      const ms: number[] = [];
      let total: string | null = null;
      for (let i = 0; i < 60; i++) {
        const s = performance.now();
        const res = await fetch(api.base + url, { headers: { authorization: review.tokens.engineer! } });
        if (res.status !== 200) throw new Error(`${name}: ${res.status} ${await res.text()}`);
        total = res.headers.get('content-range');
        await res.arrayBuffer();
        if (i >= 10) ms.push(performance.now() - s);
      }
      out[name] = { p50: round(pct(ms, 50)), p95: round(pct(ms, 95)), total };
      say(`  ${label} ${name}: p50 ${round(pct(ms, 50))} ms, p95 ${round(pct(ms, 95))} ms (${total})`);
    }
    return out;
  };
  await fill(1, SMALL);
  const at10k = await measure('10 k');
  say(`review list: generating up to ${LARGE} readings`);
  const s1 = Date.now();
  await fill(SMALL + 1, LARGE);
  const genSeconds = (Date.now() - s1) / 1000;
  say(`  generated in ${genSeconds.toFixed(0)} s`);
  const at1m = await measure(`${LARGE / 1e6} M`);
  const plans: Record<string, string> = {};
  for (const [name, sql] of Object.entries({
    page: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT readings.* FROM readings WHERE organization_id = '${review.orgId}' AND status = 'rejected' ORDER BY received_at DESC, id DESC LIMIT 25`,
    count: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT count(*) FROM readings WHERE organization_id = '${review.orgId}' AND status = 'rejected'`,
    reasonPage: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT readings.* FROM readings WHERE organization_id = '${review.orgId}' AND status = 'rejected' AND reason_codes @> ARRAY['RATIO_POLYOL_HEAVY'] AND reason_codes <> '{}' ORDER BY received_at DESC, id DESC LIMIT 25`,
    batchPage: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT readings.* FROM readings WHERE organization_id = '${review.orgId}' AND status = 'rejected' AND batch_id = '${batches[0]}' AND received_at >= now() - interval '7 days' ORDER BY received_at DESC, id DESC LIMIT 25`,
    batchCount: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT count(*) FROM (SELECT 1 FROM readings WHERE organization_id = '${review.orgId}' AND status = 'rejected' AND batch_id = '${batches[0]}' AND received_at >= now() - interval '7 days' LIMIT 10001) c`,
    chart: `EXPLAIN (ANALYZE, BUFFERS, FORMAT TEXT) SELECT id, value, at FROM control_points p WHERE organization_id = '${review.orgId}' AND material_system_id = '${review.systemId}' AND metric = 'ratio_error_percent' ORDER BY at DESC, id DESC LIMIT 500`,
  })) plans[name] = ((await db.raw(sql)).rows as { 'QUERY PLAN': string }[]).map((r) => r['QUERY PLAN']).join('\n');
  const listKeys = Object.keys(queries).filter((k) => k !== CHART_CASE);
  const pick = (o: typeof at10k, keys: string[]) => Object.fromEntries(keys.map((k) => [k, o[k]!]));
  results.reviewList = {
    rows: { small: SMALL, large: LARGE }, generateSeconds: round(genSeconds, 1), at10k: pick(at10k, listKeys), at1m: pick(at1m, listKeys),
    ratios: Object.fromEntries(listKeys.map((k) => [k, round(at1m[k]!.p50 / at10k[k]!.p50, 2)])),
    target: '<= 2 x', plans,
  };
  results.controlChart = { rows: { small: SMALL, large: LARGE }, query: 'GET /v1/control/charts/{id}/data (default: newest 500 points)', at10k: at10k[CHART_CASE], at1m: at1m[CHART_CASE], ratio: round(at1m[CHART_CASE]!.p50 / at10k[CHART_CASE]!.p50, 2), target: '<= 2 x' };
  await api.kill('SIGTERM');
} finally {
  for (const c of children) 'alive' in c ? await c.kill('SIGTERM') : c.kill('SIGTERM');
  await raw.end();
  await closeTestDb();
  pgSrv.stop();
  redis.stop();
}

results.seconds = round((Date.now() - t0) / 1000, 0);
const file = path.join(OUT, `${String(results.date).slice(0, 19).replace(/[:T]/g, '-')}.json`);
fs.writeFileSync(file, JSON.stringify(results, null, 2));
fs.writeFileSync(path.join(OUT, 'latest.json'), JSON.stringify(results, null, 2));

const b = results.bulk as { medianApi: number; medianRaw: number; ratioPercent: number };
const s = results.single as { medianApi: number; medianBare: number; ratioPercent: number };
const p = results.pipeline as { median: { bare: { p99: number }; pipeline: { p50: number; p95: number; p99: number } }; ratioP99: number };
const m = results.memory as { peakRssMiB: number; idleRssMiB: number; bootPeakRssMiB: number };
const r = results.reviewList as { ratios: Record<string, number>; at10k: Record<string, { p50: number }>; at1m: Record<string, { p50: number }> };
const mark = (ok: boolean) => (ok ? 'met' : 'MISSED');
console.log(`\nPourgate benchmarks, ${results.date}, ${(results.machine as { cpus: number }).cpus} CPUs, ${process.version}, median of ${ROUNDS} rounds (\`npm run bench\`)`);
console.log('| # | what | Pourgate | baseline | ratio | target | |');
console.log('| - | --- | --: | --: | --: | --- | --- |');
console.log(`| 1 | bulk ingest, readings/s | ${b.medianApi} | ${b.medianRaw} (pg multi-row INSERT) | ${b.ratioPercent} % | ≥ 50 % | ${mark(b.ratioPercent >= 50)} |`);
console.log(`| 2 | single reading, requests/s | ${s.medianApi} | ${s.medianBare} (bare Fastify + pg INSERT) | ${s.ratioPercent} % | ≥ 50 % | ${mark(s.ratioPercent >= 50)} |`);
console.log(`| 3 | posted → verdict → webhook received, p50/p95/p99 ms | ${p.median.pipeline.p50} / ${p.median.pipeline.p95} / ${p.median.pipeline.p99} | ${p.median.bare.p99} p99 (bare loopback POST) | ${p.ratioP99} × | p99 ≤ 10 × | ${mark(p.ratioP99 <= 10)} |`);
for (const [k, v] of Object.entries(r.ratios)) console.log(`| 4 | review list "${k}", p50 ms at ${LARGE / 1e6} M | ${r.at1m[k]!.p50} | ${r.at10k[k]!.p50} (at 10 k) | ${v} × | ≤ 2 × | ${mark(v <= 2)} |`);
console.log(`| 5 | API peak RSS during 1 and 2, MiB | ${m.peakRssMiB} | ${m.idleRssMiB} idle after boot (boot peak ${m.bootPeakRssMiB}) | | ≤ 300 MiB peak | ${mark(m.peakRssMiB <= 300)} |`);
const cc = results.controlChart as { ratio: number; at10k: { p50: number }; at1m: { p50: number } };
console.log(`| 6 | control chart data, p50 ms at ${LARGE / 1e6} M points | ${cc.at1m.p50} | ${cc.at10k.p50} (at 10 k) | ${cc.ratio} × | ≤ 2 × | ${mark(cc.ratio <= 2)} |`);
console.log(`results: ${path.relative(ROOT, file)} (and bench/results/latest.json); ${results.seconds} s`);
