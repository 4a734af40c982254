#!/usr/bin/env node
// `npm start`: everything from a fresh clone to a running service on http://127.0.0.1:3000.
// Installs what is missing, starts PostgreSQL and Redis on loopback (durable), migrates, seeds the
// demo, builds what is stale, serves API + docs + console, and on Ctrl-C stops what it started.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ROOT, checkNode, ensureNpmDeps, ensureWorkspacePackages, fail, isStale, log, runTs, startPostgres, startRedis } from './lib/services.mjs';

if (process.argv.includes('--help')) {
  console.log(`usage: npm start
  From a fresh clone to a running service: npm dependencies, PostgreSQL and Redis on loopback
  (.data/), migrations, the demo seed (not in production), builds, then the API + console on
  http://127.0.0.1:\${PORT:-3000}. DATABASE_URL / REDIS_URL / SMTP_URL use servers of your own;
  PORT, PGPORT, REDIS_PORT move it; PROCESS_ROLE=api|worker|all (default all). Ctrl-C stops it.`);
  process.exit(0);
}
checkNode();
ensureNpmDeps();
ensureWorkspacePackages();

const stops = [];
const env = { ...process.env, NODE_ENV: process.env.NODE_ENV ?? 'development' };
if (!env.DATABASE_URL) {
  const pg = await startPostgres({ name: 'pg', port: Number(process.env.PGPORT ?? 55432), databases: ['pourgate'] });
  if (pg.startedHere) stops.push(() => { log('stopping PostgreSQL'); pg.stop(); });
  env.DATABASE_URL = pg.url('pourgate');
}
if (!env.REDIS_URL) {
  const redis = await startRedis({ name: 'redis', port: Number(process.env.REDIS_PORT ?? 56379), durable: true });
  if (redis.startedHere) stops.push(() => { log('stopping Redis'); redis.stop(); });
  env.REDIS_URL = redis.url;
}
let mailPage = null;
if (!env.SMTP_URL && env.NODE_ENV !== 'production') {
  // the local mail catcher stands in for the shop's mail server: invitations and notices land there
  const smtpPort = Number(process.env.CATCHER_SMTP_PORT ?? 55025);
  const httpPort = Number(process.env.CATCHER_HTTP_PORT ?? 55080);
  const catcher = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'fakes/src/smtp-catcher.ts'), '--smtp-port', String(smtpPort), '--http-port', String(httpPort)], { cwd: ROOT, env, stdio: 'inherit' });
  stops.push(() => catcher.kill('SIGTERM'));
  env.SMTP_URL = `smtp://127.0.0.1:${smtpPort}`;
  mailPage = `http://127.0.0.1:${httpPort}/`;
}
if (!env.S3_ENDPOINT && !env.DOCUMENTS_DIR && env.NODE_ENV !== 'production') {
  // documents (SDS/TDS) go through the S3 API; in development into the local stand-in
  const s3Port = Number(process.env.OBJECT_STORE_PORT ?? 55095);
  const store = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'fakes/src/object-store.ts'), '--port', String(s3Port), '--dir', path.join(ROOT, '.data/objects')], { cwd: ROOT, env, stdio: 'inherit' });
  stops.push(() => store.kill('SIGTERM'));
  env.S3_ENDPOINT = `http://127.0.0.1:${s3Port}`;
  // the stand-in's development keys; a real store takes the SDK's default credential chain
  env.S3_ACCESS_KEY_ID ??= 'pourgate-local';
  env.S3_SECRET_ACCESS_KEY ??= 'pourgate-local-secret';
}
if (!env.WEBHOOK_ALLOWED_HOSTS && env.NODE_ENV === 'development') {
  // the local fakes (ERP receiver) listen on loopback; production allows public addresses only
  env.WEBHOOK_ALLOWED_HOSTS = '127.0.0.1,localhost';
}
// links in mail (invitations, notices) point at the address this service actually listens on,
// unless PUBLIC_URL says otherwise (a proxy, a domain name)
const port = Number(env.PORT ?? 3000);
const listenHost = env.HOST && !['0.0.0.0', '::'].includes(env.HOST) ? env.HOST : '127.0.0.1';
if (!env.PUBLIC_URL) env.PUBLIC_URL = `http://${listenHost.includes(':') ? `[${listenHost}]` : listenHost}:${port}`;
const stopServices = () => { for (const s of stops.splice(0).reverse()) s(); };

if (runTs(path.join(ROOT, 'scripts/db.ts'), ['migrate'], env).status !== 0) { stopServices(); fail('migrations failed'); }
if (env.NODE_ENV !== 'production' && runTs(path.join(ROOT, 'scripts/db.ts'), ['seed'], env).status !== 0) { stopServices(); fail('demo seed failed'); }

function build(name, target, sources, args) {
  if (!isStale(path.join(ROOT, target), sources)) return;
  log(`building ${name} ...`);
  const r = spawnSync('npm', args, { cwd: ROOT, stdio: 'inherit', env });
  if (r.status !== 0) { stopServices(); fail(`building ${name} failed`); }
}
build('the API', 'api/dist/main.js', ['api/src', 'api/tsconfig.json', 'api/tsconfig.build.json'], ['run', 'build', '-w', 'api']);
if (fs.existsSync(path.join(ROOT, 'admin/vite.config.ts')) && !process.env.SKIP_CONSOLE_BUILD) build('the console', 'admin/dist/index.html', ['admin/src', 'admin/index.html', 'admin/vite.config.ts'], ['run', 'build', '-w', 'admin']);
// brotli and gzip copies beside the console's files, once per build (the API serves them by Accept-Encoding)
if (fs.existsSync(path.join(ROOT, 'admin/dist/index.html'))) runTs(path.join(ROOT, 'scripts/precompress.ts'), [path.join(ROOT, 'admin/dist')], env);

const child = spawn(process.execPath, ['--enable-source-maps', path.join(ROOT, 'api/dist/main.js')], { cwd: ROOT, env, stdio: 'inherit' });
let stopping = false;
const shutdown = (sig) => {
  if (stopping) return;
  stopping = true;
  log(`${sig}: shutting down ...`);
  child.kill('SIGTERM');
};
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));
child.on('exit', (code, signal) => {
  stopServices();
  process.exit(stopping ? 0 : (code ?? (signal ? 1 : 0)));
});

// Print the addresses once the API answers.
const base = `http://127.0.0.1:${port}`;
for (let i = 0; i < 120 && !stopping; i++) {
  try {
    const r = await fetch(`${base}/v1/health`);
    if (r.ok) {
      console.log(`
  Pourgate is running.
    console         ${base}/
    API             ${base}/v1
    OpenAPI         ${base}/v1/openapi.json
    API docs        ${base}/docs${mailPage ? `\n    caught mail     ${mailPage}` : ''}

  Demo sign-in (local only; password for all: pourgate-demo)
    admin@demo.test  engineer@demo.test  integrator@demo.test  viewer@demo.test

  Ctrl-C stops the service and the database servers it started.
`);
      break;
    }
  } catch { /* not up yet */ }
  await new Promise((r) => setTimeout(r, 500));
}
