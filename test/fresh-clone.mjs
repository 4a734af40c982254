#!/usr/bin/env node
// The fresh-clone check: clone the committed repository into a temporary folder and run the
// README's start command there, far enough to see /v1/health answer, then stop it with SIGTERM
// and check that it shut down cleanly. Run by `npm test` (skip with SKIP_FRESH_CLONE=1) or alone:
//   node test/fresh-clone.mjs
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pourgate-fresh-'));
fs.chmodSync(dir, 0o755); // PostgreSQL runs as its own user and must reach .data/
const port = Number(process.env.FRESH_PORT ?? 3190);
const env = {
  ...process.env,
  PORT: String(port),
  PGPORT: process.env.FRESH_PGPORT ?? '55490',
  REDIS_PORT: process.env.FRESH_REDIS_PORT ?? '56490',
  CATCHER_SMTP_PORT: '55091',
  CATCHER_HTTP_PORT: '55092',
};
for (const k of ['DATABASE_URL', 'REDIS_URL', 'SMTP_URL', 'NODE_OPTIONS', 'LOG_LEVEL']) delete env[k];

const t0 = Date.now();
const say = (m) => console.log(`[fresh-clone] ${m} (${((Date.now() - t0) / 1000).toFixed(0)} s)`);
let ok = false;
const clone = spawnSync('git', ['clone', '--quiet', '--no-local', root, dir], { stdio: 'inherit' });
if (clone.status !== 0) process.exit(1);
say(`cloned HEAD into ${dir}; running npm start`);
const child = spawn('npm', ['start'], { cwd: dir, env, stdio: ['ignore', 'pipe', 'pipe'], detached: true });
let out = '';
child.stdout.on('data', (d) => (out += d));
child.stderr.on('data', (d) => (out += d));
const exited = new Promise((resolve) => child.on('exit', (code, sig) => resolve({ code, sig })));
const deadline = Date.now() + Number(process.env.FRESH_TIMEOUT_MS ?? 600_000);
let health = null;
while (Date.now() < deadline && child.exitCode === null) {
  try {
    const r = await fetch(`http://127.0.0.1:${port}/v1/health`);
    if (r.ok) {
      health = await r.json();
      break;
    }
  } catch { /* not yet */ }
  await new Promise((r) => setTimeout(r, 1000));
}
if (health?.status === 'ok') {
  const docs = await fetch(`http://127.0.0.1:${port}/docs`).then((r) => r.status).catch(() => 0);
  const consolePage = await fetch(`http://127.0.0.1:${port}/`).then((r) => r.status).catch(() => 0);
  say(`/v1/health answered ok; /docs ${docs}; console / ${consolePage}; sending SIGTERM`);
  process.kill(-child.pid, 'SIGTERM');
  const result = await Promise.race([exited, new Promise((r) => setTimeout(() => r(null), 30_000))]);
  const stillUp = await fetch(`http://127.0.0.1:${port}/v1/health`).then(() => true).catch(() => false);
  ok = docs === 200 && consolePage === 200 && result !== null && !stillUp;
  say(result ? `stopped (exit ${result.code ?? result.sig})` : 'did not stop within 30 s');
} else {
  say('the service did not come up');
}
if (!ok) {
  console.log(out.split('\n').filter((l) => !l.startsWith('{')).slice(-40).join('\n'));
  try { process.kill(-child.pid, 'SIGKILL'); } catch { /* gone */ }
}
// the clone's database servers were stopped by its own shutdown; remove what is left
spawnSync('rm', ['-rf', dir]);
console.log(ok ? 'fresh clone: 1 passed, 0 failed' : 'fresh clone: 0 passed, 1 failed');
process.exit(ok ? 0 : 1);
