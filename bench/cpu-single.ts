// Where a single reading's CPU goes: the API and the bare route (bench/bare-server.ts) each under
// 10 connections of single POSTs for PROFILE_SINGLE_S seconds (default 10), with the CPU time each
// process used (/proc/<pid>/stat) divided by the requests it answered, and the same for PostgreSQL
// and Redis. `node --import tsx bench/cpu-single.ts`; own servers on BENCH_PGPORT + 7, BENCH_REDIS_PORT + 7.
import autocannon from 'autocannon';
import { execFileSync, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { makeShop, readingBody, resetDatabase, ROOT, startApi } from '../test/faults/harness.js';
import { startPostgres, startRedis } from '../scripts/lib/services.mjs';

const PG_PORT = Number(process.env.BENCH_PGPORT ?? 55642) + 7;
const REDIS_PORT = Number(process.env.BENCH_REDIS_PORT ?? 56642) + 7;
const API_PORT = Number(process.env.BENCH_API_PORT ?? 3342) + 7;
const SECONDS = Number(process.env.PROFILE_SINGLE_S ?? 10);
const TICK = Number(execFileSync('getconf', ['CLK_TCK']).toString().trim()) || 100;
const cpuMs = (pid: number) => { const f = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' '); return ((Number(f[11]) + Number(f[12])) * 1000) / TICK; };
const machineMs = () => { const f = fs.readFileSync('/proc/stat', 'utf8').split('\n')[0]!.trim().split(/\s+/).slice(1).map(Number); return ((f[0]! + f[1]! + f[2]! + f[5]! + f[6]! + f[7]!) * 1000) / TICK; };
const pidsOf = (name: string) => execFileSync('pgrep', ['-f', name]).toString().trim().split('\n').map(Number).filter(Boolean);
const sumCpu = (pids: number[]) => pids.reduce((a, p) => { try { return a + cpuMs(p); } catch { return a; } }, 0);

const pgSrv = await startPostgres({ name: `pg-bench-${PG_PORT}`, port: PG_PORT, fast: true, databases: ['pourgate_bench'] });
const redis = await startRedis({ name: `redis-bench-${REDIS_PORT}`, port: REDIS_PORT, durable: false });
const DB_URL: string = pgSrv.url('pourgate_bench');
process.env.DATABASE_URL = DB_URL;
resetDatabase(DB_URL);
const api = await startApi({ port: API_PORT, compiled: true, databaseUrl: DB_URL, redisUrl: redis.url, logFile: path.join(ROOT, 'test-output', 'cpu-single-api.log'), env: { PROCESS_ROLE: 'api', QUEUE_PREFIX: 'cpu' } });
const shop = await makeShop(api.base, 'cpu');
const bare = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'bench/bare-server.ts')], { cwd: ROOT, stdio: ['ignore', 'pipe', 'inherit'], env: { ...process.env, BENCH_BARE_PORT: String(API_PORT + 1), DATABASE_URL: DB_URL, BENCH_ORG: shop.orgId, BENCH_BATCH: shop.batchId, BENCH_DEVICE: shop.scaleId } });
await new Promise((r) => bare.stdout!.once('data', r));
const pgPids = () => pidsOf(`postgres.*${PG_PORT}|postgres: `).filter((p) => { try { return fs.readFileSync(`/proc/${p}/cmdline`, 'utf8').includes('postgres'); } catch { return false; } });
const redisPids = () => pidsOf(`redis-server.*${REDIS_PORT}`);
const run = async (url: string, headers: Record<string, string>, pid: number) => {
  const before = { self: cpuMs(pid), pg: sumCpu(pgPids()), redis: sumCpu(redisPids()), machine: machineMs() };
  const r = (await autocannon({ url, method: 'POST', connections: 10, duration: SECONDS, headers: { 'content-type': 'application/json', ...headers }, requests: [{ setupRequest: (req: Record<string, unknown>) => ({ ...req, body: JSON.stringify(readingBody(shop.batchId, randomUUID())) }) }] } as never)) as unknown as { requests: { total: number; average: number } };
  const n = r.requests.total;
  return { rps: Math.round(r.requests.average), selfMs: (cpuMs(pid) - before.self) / n, pgMs: (sumCpu(pgPids()) - before.pg) / n, redisMs: (sumCpu(redisPids()) - before.redis) / n, machineMs: (machineMs() - before.machine) / n };
};
try {
  for (let k = 0; k < Number(process.env.PROFILE_ROUNDS ?? 2); k++) {
    const a = await run(`${api.base}/v1/readings`, { 'x-api-key': shop.deviceKey }, api.pid()!);
    const b = await run(`http://127.0.0.1:${API_PORT + 1}/readings`, {}, bare.pid!);
    const f = (x: number) => x.toFixed(3);
    console.log(`round ${k + 1}: API ${a.rps} req/s, CPU ms/request: API ${f(a.selfMs)}, PostgreSQL ${f(a.pgMs)}, Redis ${f(a.redisMs)}, machine ${f(a.machineMs)} | bare ${b.rps} req/s, CPU ms/request: bare ${f(b.selfMs)}, PostgreSQL ${f(b.pgMs)}, machine ${f(b.machineMs)} | ratio ${(100 * a.rps / b.rps).toFixed(1)} % (load ${os.loadavg()[0].toFixed(1)})`);
  }
} finally {
  bare.kill('SIGTERM');
  await api.kill('SIGTERM');
  pgSrv.stop();
  redis.stop();
}
