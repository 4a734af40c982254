#!/usr/bin/env node
// `npm run demo`: `npm start` (databases, migrations, demo seed, API + console, mail catcher) and
// then a shift at the demo shop played by the fakes (fakes/src/shop-shift.ts): work orders from the
// ERP, batches weighed at two stations, one off-ratio and one too cold, webhooks verified at the
// ERP, the engineer's mail in the catcher. Prints the story with links; Ctrl-C stops everything.
// PORT, PGPORT, REDIS_PORT, CATCHER_*_PORT and ERP_PORT move it off the default ports.
import { spawn } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

if (process.argv.includes('--help')) {
  console.log('usage: npm run demo   (npm start, then a shift at the invented demo shop played by the fakes; Ctrl-C stops)');
  process.exit(0);
}
const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const port = Number(process.env.PORT ?? 3000);
const mailPort = Number(process.env.CATCHER_HTTP_PORT ?? 55080);
const erpPort = Number(process.env.ERP_PORT ?? 4100);
const base = `http://127.0.0.1:${port}`;

const free = (p) =>
  new Promise((resolve) => {
    const s = net.createServer().once('error', () => resolve(false)).once('listening', () => s.close(() => resolve(true)));
    s.listen(p, '127.0.0.1');
  });
for (const [p, name, env] of [[port, 'the API', 'PORT'], [erpPort, "the ERP's webhook receiver", 'ERP_PORT']]) {
  if (!(await free(p))) {
    console.error(`[pourgate] port ${p} (${name}) is taken: stop what uses it, or run with ${env}=<another port>`);
    process.exit(1);
  }
}

const env = { ...process.env, PORT: String(port), PUBLIC_URL: process.env.PUBLIC_URL ?? base, LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn' };
const children = [];
const service = spawn(process.execPath, [path.join(ROOT, 'scripts/start.mjs')], { cwd: ROOT, env, stdio: 'inherit' });
children.push(service);
let stopping = false;
const stop = (sig) => {
  if (stopping) return;
  stopping = true;
  for (const c of children.slice().reverse()) if (c.exitCode === null) c.kill('SIGTERM');
  if (sig) console.log(`\n[pourgate] ${sig}: stopping the demo ...`);
};
process.on('SIGINT', () => stop('SIGINT'));
process.on('SIGTERM', () => stop('SIGTERM'));
service.on('exit', (code) => {
  stop();
  process.exit(stopping ? 0 : code ?? 1);
});

// the first run builds the API and the console: allow it time
const deadline = Date.now() + 15 * 60_000;
for (;;) {
  if (stopping) break;
  try {
    if ((await fetch(`${base}/v1/ready`)).ok) break;
  } catch { /* not up yet */ }
  if (Date.now() > deadline) {
    console.error('[pourgate] the service did not become ready in time');
    stop();
    break;
  }
  await new Promise((r) => setTimeout(r, 1000));
}

if (!stopping) {
  console.log('[pourgate] playing a shift at the demo shop ...');
  const shift = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'fakes/src/shop-shift.ts'), '--api', base, '--mail', process.env.SMTP_URL ? '' : `http://127.0.0.1:${mailPort}`, '--erp-port', String(erpPort)], { cwd: ROOT, env, stdio: 'inherit' });
  children.push(shift);
  shift.on('exit', (code) => {
    if (!stopping && code) console.error(`[pourgate] the shift stopped with code ${code}; the service keeps running (Ctrl-C to stop)`);
  });
}
