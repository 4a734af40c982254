// Pieces the fault suite and the benchmarks share: the API as a child process (so it can be killed),
// a loopback HTTP sender with full control of headers, and a demo organization with a batch, a
// scale and a device key. Invented data only; loopback only.
import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { FuzzRequest, FuzzResponse } from './fuzz-core.js';
import { flexSystem } from '../e2e/support/systems.js';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/** drops everything and migrates from scratch (no demo seed: the suites make their own organizations) */
export function resetDatabase(databaseUrl: string): void {
  for (const step of ['reset']) {
    const r = spawnSync(process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts/db.ts'), step], { cwd: ROOT, env: { ...process.env, DATABASE_URL: databaseUrl }, stdio: 'pipe' });
    if (r.status !== 0) throw new Error(`db ${step} failed: ${r.stdout}${r.stderr}`);
  }
}

/** Builds api/dist (as `npm start` does) when it is older than the sources. */
export function ensureCompiledApi(): void {
  const target = path.join(ROOT, 'api/dist/main.js');
  const newest = (d: string): number => {
    const st = fs.statSync(d);
    if (!st.isDirectory()) return st.mtimeMs;
    return Math.max(0, ...fs.readdirSync(d).map((e) => newest(path.join(d, e))));
  };
  if (fs.existsSync(target) && fs.statSync(target).mtimeMs >= Math.max(newest(path.join(ROOT, 'api/src')), newest(path.join(ROOT, 'api/tsconfig.json')), newest(path.join(ROOT, 'api/tsconfig.build.json')))) return;
  const r = spawnSync('npm', ['run', 'build', '-w', 'api'], { cwd: ROOT, stdio: 'pipe' });
  if (r.status !== 0) throw new Error(`building the API failed: ${r.stdout}${r.stderr}`);
}

export interface ApiProcess {
  base: string;
  child: ChildProcess;
  alive(): boolean;
  kill(signal: NodeJS.Signals): Promise<void>;
  pid(): number | undefined;
}

/** The API as the deployment runs it (HTTP and workers in one process), its log in `logFile`. */
export async function startApi(opts: { port: number; databaseUrl: string; redisUrl: string; logFile: string; env?: Record<string, string>; nodeArgs?: string[]; compiled?: boolean }): Promise<ApiProcess> {
  // the API imports the workspace packages by name, from their dist/ at run time
  const { ensureWorkspacePackages } = await import('../../scripts/lib/services.mjs');
  ensureWorkspacePackages();
  if (opts.compiled) ensureCompiledApi();
  const out = fs.openSync(opts.logFile, 'a');
  // compiled: api/dist/main.js as `npm start` runs it; otherwise the sources through swc, as the test suites do
  const entry = opts.compiled ? ['--enable-source-maps', path.join(ROOT, 'api/dist/main.js')] : ['--import', '@swc-node/register/esm-register', path.join(ROOT, 'api/src/main.ts')];
  const child = spawn(process.execPath, [...(opts.nodeArgs ?? []), ...entry], {
    cwd: ROOT,
    stdio: ['ignore', out, out],
    env: {
      ...process.env,
      NODE_ENV: 'test',
      SWC_NODE_PROJECT: path.join(ROOT, 'api/tsconfig.json'),
      PORT: String(opts.port),
      HOST: '127.0.0.1',
      DATABASE_URL: opts.databaseUrl,
      REDIS_URL: opts.redisUrl,
      PROCESS_ROLE: 'all',
      WEBHOOK_ALLOWED_HOSTS: '127.0.0.1,localhost',
      LOG_LEVEL: 'warn',
      SIGNIN_IP_LIMIT_PER_MINUTE: '1000000',
      SIGNIN_MAX_FAILURES: '100000',
      SMTP_URL: 'smtp://127.0.0.1:9',
      PUBLIC_URL: `http://127.0.0.1:${opts.port}`,
      ...opts.env,
    },
  });
  fs.closeSync(out);
  let exited = false;
  child.once('exit', () => (exited = true));
  const base = `http://127.0.0.1:${opts.port}`;
  const until = Date.now() + 120_000;
  for (;;) {
    if (exited) throw new Error(`the API exited while starting; see ${opts.logFile}`);
    if (await fetch(`${base}/v1/health`).then((r) => r.ok).catch(() => false)) break;
    if (Date.now() > until) throw new Error(`the API did not answer /v1/health within 120 s; see ${opts.logFile}`);
    await sleep(250);
  }
  return {
    base,
    child,
    alive: () => !exited,
    pid: () => child.pid,
    async kill(signal) {
      if (exited) return;
      const gone = new Promise((r) => child.once('exit', r));
      child.kill(signal);
      await Promise.race([gone, sleep(20_000)]);
    },
  };
}

const agent = new http.Agent({ keepAlive: true, maxSockets: 32 });

/** One request with exactly the headers given (fetch would add or refuse some). */
export function rawSend(base: string, r: FuzzRequest, timeoutMs = 30_000): Promise<FuzzResponse> {
  return new Promise((resolve, reject) => {
    const u = new URL(base);
    const payload = r.payload === undefined ? undefined : Buffer.isBuffer(r.payload) ? r.payload : Buffer.from(r.payload);
    const req = http.request({ host: u.hostname, port: u.port, method: r.method, path: r.url, agent, headers: { ...r.headers, ...(payload ? { 'content-length': String(payload.length) } : {}) }, timeout: timeoutMs }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString('utf8') }));
      res.on('error', reject);
    });
    req.on('timeout', () => req.destroy(new Error('timed out')));
    req.on('error', reject);
    if (payload) req.write(payload);
    req.end();
  });
}

export async function json(base: string, method: string, url: string, headers: Record<string, string>, body?: unknown): Promise<{ status: number; headers: Headers; body: any }> {
  const res = await fetch(base + url, { method, headers: { ...headers, ...(body !== undefined ? { 'content-type': 'application/json' } : {}) }, body: body === undefined ? undefined : JSON.stringify(body) });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON */
  }
  return { status: res.status, headers: res.headers, body: parsed };
}

/** A weight-ratio flexible system (100:50, ±5 %), invented numbers for tests. */
export function demoSystem() {
  return flexSystem({ name: `Fault Flex ${randomUUID().slice(0, 6)}`, ratio: { a: 100, b: 50 } });
}

export interface Shop {
  orgId: string;
  people: Record<string, { id: string; email: string }>;
  tokens: Record<string, string>;
  systemId: string;
  batchId: string;
  scaleId: string;
  deviceKey: string;
  newBatch(): Promise<string>;
}

/** An organization with people, a system, a batch, a bench scale and its device key. */
export async function makeShop(base: string, label: string): Promise<Shop> {
  const { makeOrg, testDb, PASSWORD } = await import('../e2e/support/fixtures.js');
  const org = await makeOrg(label);
  const tokens: Record<string, string> = {};
  for (const [role, p] of Object.entries(org.people)) {
    const res = await json(base, 'POST', '/v1/auth/sign-in', {}, { email: p.email, password: PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
    tokens[role] = `Bearer ${res.body.accessToken}`;
  }
  const sys = await json(base, 'POST', '/v1/material-systems', { authorization: tokens.engineer! }, demoSystem());
  if (sys.status !== 201) throw new Error(`material system: ${sys.status} ${JSON.stringify(sys.body)}`);
  const newBatch = async () => {
    const b = await json(base, 'POST', '/v1/batches', { authorization: tokens.engineer! }, { materialSystemId: sys.body.id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
    if (b.status !== 201) throw new Error(`batch: ${b.status} ${JSON.stringify(b.body)}`);
    return b.body.id as string;
  };
  const [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'fault bench scale', readability_kg: 0.001, capacity_kg: 50, calibration_due: '2099-01-01' }).returning('id');
  const deviceKey = `pgd_live_${randomBytes(32).toString('base64url')}`;
  await testDb()('api_keys').insert({ organization_id: org.id, name: 'fault scale key', kind: 'device', environment: 'live', scopes: ['readings:write'], prefix: deviceKey.slice(0, 16), secret_hash: sha256(deviceKey), device_id: scaleId });
  return { orgId: org.id, people: org.people, tokens, systemId: sys.body.id, batchId: await newBatch(), scaleId, deviceKey, newBatch };
}

/** A reading of part A on the shop's scale; the device comes from the key. */
export function readingBody(batchId: string, clientReadingId: string, value = 1.0) {
  return { batchId, clientReadingId, quantity: 'mass', subject: 'part_a', value, unit: 'kg', stable: true, deviceTime: new Date().toISOString() };
}
