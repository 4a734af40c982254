// A CPU profile of the API under ingest, to see where a request's time goes:
// `node --import tsx bench/profile-ingest.ts` runs 10 s (PROFILE_SINGLE_S) of single POSTs (autocannon, 10 connections)
// and three 1000-reading bulk posts against an API started with --cpu-prof, then prints the
// summary of the last 15 s (bench/profile-summary.mjs). Own servers: PostgreSQL 55642, Redis 56642, API 3345
// (BENCH_PGPORT, BENCH_REDIS_PORT, BENCH_API_PORT + 3 move them); the compiled API (api/dist), as the bench runs it.
import autocannon from 'autocannon';
import { spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { makeShop, readingBody, resetDatabase, ROOT, startApi } from '../test/faults/harness.js';
import { startPostgres, startRedis } from '../scripts/lib/services.mjs';

const dir = path.join(ROOT, 'test-output', 'profiles');
fs.rmSync(dir, { recursive: true, force: true });
fs.mkdirSync(dir, { recursive: true });
const PG_PORT = Number(process.env.BENCH_PGPORT ?? 55642);
const REDIS_PORT = Number(process.env.BENCH_REDIS_PORT ?? 56642);
const API_PORT = Number(process.env.BENCH_API_PORT ?? 3342) + 3;
const pgSrv = await startPostgres({ name: `pg-bench-${PG_PORT}`, port: PG_PORT, fast: true, databases: ['pourgate_bench'] });
const redis = await startRedis({ name: `redis-bench-${REDIS_PORT}`, port: REDIS_PORT, durable: false });
const DB_URL: string = pgSrv.url('pourgate_bench');
process.env.DATABASE_URL = DB_URL;
resetDatabase(DB_URL);
const api = await startApi({ port: API_PORT, compiled: !process.env.BENCH_SOURCES, databaseUrl: DB_URL, redisUrl: redis.url, logFile: path.join(ROOT, 'test-output', 'profile-api.log'), env: { PROCESS_ROLE: 'api', QUEUE_PREFIX: 'profile' }, nodeArgs: ['--cpu-prof', `--cpu-prof-dir=${dir}`] });
try {
  const shop = await makeShop(api.base, 'profile');
  const r = (await autocannon({
    url: `${api.base}/v1/readings`, method: 'POST', connections: 10, duration: Number(process.env.PROFILE_SINGLE_S ?? 10),
    headers: { 'content-type': 'application/json', 'x-api-key': shop.deviceKey },
    requests: [{ setupRequest: (req: Record<string, unknown>) => ({ ...req, body: JSON.stringify(readingBody(shop.batchId, randomUUID())) }) }],
  } as never)) as unknown as { requests: { average: number }; non2xx: number };
  console.log(`single: ${r.requests.average} req/s, non-2xx ${r.non2xx}`);
  for (let i = 0; i < 3; i++) {
    const res = await fetch(`${api.base}/v1/readings/bulk`, { method: 'POST', headers: { 'x-api-key': shop.deviceKey, 'content-type': 'application/json' }, body: JSON.stringify({ readings: Array.from({ length: 1000 }, () => readingBody(shop.batchId, randomUUID())) }) });
    console.log(`bulk: ${res.status}`);
    await res.text();
  }
} finally {
  await api.kill('SIGTERM'); // the profile is written when the process exits
  pgSrv.stop();
  redis.stop();
}
spawnSync(process.execPath, [path.join(ROOT, 'bench/profile-summary.mjs'), dir], { stdio: 'inherit' });
