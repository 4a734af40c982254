#!/usr/bin/env node
// `npm test`: the same set-up as `npm start` (with a throw-away, test-speed database), then every
// suite of the project, one summary at the end. Extra arguments go to Jest (`npm test -- -t ratio`).
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { ROOT, checkNode, ensureNpmDeps, ensureWorkspacePackages, log, startPostgres, startRedis, runTs } from './lib/services.mjs';

if (process.argv.includes('--help')) {
  console.log(`usage: npm test [-- <jest arguments>]
  No arguments: every suite (console, typecheck, Jest, faults, multi-process, browser, fresh clone).
  With arguments: database reset and seed, typechecks, then Jest on what they select
  (npm test -- test/e2e/auth, npm test -- -t ratio). TEST_PGPORT / TEST_REDIS_PORT pick the servers.`);
  process.exit(0);
}
checkNode();
ensureNpmDeps();
ensureWorkspacePackages();
const { ensureDebianPackages } = await import('./lib/services.mjs');
ensureDebianPackages({ chromium: '/usr/bin/chromium' });

const pgPort = Number(process.env.TEST_PGPORT ?? 55433);
const redisPort = Number(process.env.TEST_REDIS_PORT ?? 56380);
const stops = [];
let pg;
let redis;
if (!process.env.TEST_DATABASE_URL) {
  pg = await startPostgres({ name: `pg-test-${pgPort}`, port: pgPort, fast: true, databases: ['pourgate_test'] });
  if (pg.startedHere) stops.push(() => pg.stop());
}
if (!process.env.TEST_REDIS_URL) {
  redis = await startRedis({ name: `redis-test-${redisPort}`, port: redisPort, durable: false });
  if (redis.startedHere) stops.push(() => redis.stop());
}
const env = {
  ...process.env,
  NODE_ENV: 'test',
  DATABASE_URL: process.env.TEST_DATABASE_URL ?? pg.url('pourgate_test'),
  REDIS_URL: process.env.TEST_REDIS_URL ?? redis.url,
  LOG_LEVEL: process.env.LOG_LEVEL ?? 'silent',
  TEST_PG_SUPER_URL: pg?.superUrl ?? '',
  // suites sign in often from one address; the throttle suite sets its own low limits
  SIGNIN_IP_LIMIT_PER_MINUTE: '100000',
  SIGNIN_MAX_FAILURES: '1000',
};

const results = [];

/**
 * The browser suite: @playwright/test on Debian's Chromium against the built console served by the
 * real API on the test database; its webServer option starts the API and a mail catcher
 * (test/browser/playwright.config.ts) and stops them before the database servers stop.
 */
async function browserSuite() {
  const port = Number(process.env.TEST_BROWSER_PORT ?? 3291);
  step('browser suite: Chromium against the built console and the real API', process.execPath, [path.join(ROOT, 'node_modules/@playwright/test/cli.js'), 'test', '-c', 'test/browser'], { TEST_BROWSER_PORT: String(port) });
}
function step(name, cmd, args, extraEnv = {}) {
  const t0 = Date.now();
  log(`── ${name}`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', cwd: ROOT, env: { ...env, ...extraEnv } });
  const ok = r.status === 0;
  results.push({ name, ok, seconds: ((Date.now() - t0) / 1000).toFixed(1) });
  return ok;
}

try {
  const reset = runTs(path.join(ROOT, 'scripts/db.ts'), ['reset'], env);
  const seeded = reset.status === 0 && runTs(path.join(ROOT, 'scripts/db.ts'), ['seed'], env).status === 0;
  results.push({ name: 'database reset, migrations, demo seed', ok: seeded, seconds: '-' });
  if (seeded && process.argv.length <= 2) {
    // the console: its types, its component tests, its production build and the bundle budget
    step('console: typecheck', process.execPath, [path.join(ROOT, 'node_modules/typescript/bin/tsc'), '-p', 'admin', '--noEmit']);
    step('console: vitest component tests', process.execPath, [path.join(ROOT, 'node_modules/vitest/vitest.mjs'), 'run', '--root', 'admin'], { NODE_ENV: 'test' });
    const built = step('console: production build', 'npm', ['run', 'build', '-w', 'admin'], { NODE_ENV: 'production' });
    if (built) step('console: first-page bundle within 250 kB gzip', 'npm', ['run', 'size', '-w', 'admin']);
    // once here, so no test app compresses the console while it boots
    if (built) step('console: brotli and gzip copies of its files', process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts/precompress.ts'), path.join(ROOT, 'admin/dist')]);
  }
  if (seeded) {
    // the module boundaries (controllers without Knex, no reaching into another module's repository or
    // into api/ by path, pure packages, no import cycles) and the TypeScript rules: eslint.config.js
    if (process.argv.length <= 2) step('lint (eslint: module boundaries and TypeScript rules)', process.execPath, [path.join(ROOT, 'node_modules/eslint/bin/eslint.js'), 'api/src', 'packages', 'seeds', 'fakes/src', 'sdk/src', 'admin/src', 'migrations', 'test']);
    step('typecheck (tsc --noEmit)', process.execPath, [path.join(ROOT, 'node_modules/typescript/bin/tsc'), '-p', 'api', '--noEmit']);
    step('typecheck of the SDK (tsc -p sdk)', process.execPath, [path.join(ROOT, 'node_modules/typescript/bin/tsc'), '-p', 'sdk', '--noEmit']);
    step('jest: unit, reference and e2e suites', process.execPath, [
      '--experimental-vm-modules', path.join(ROOT, 'node_modules/jest/bin/jest.js'), '--maxWorkers=2', ...process.argv.slice(2),
    ], { NODE_OPTIONS: '--experimental-vm-modules --no-warnings' });
    // kills the API and stops its own PostgreSQL (55641) and Redis (56641) mid-ingest: never these suites' servers
    if (process.argv.length <= 2) step('fault suite, small counts (test/faults/run.ts)', process.execPath, ['--import', 'tsx', path.join(ROOT, 'test/faults/run.ts')], { FAULTS_SCALE: 'small' });
    // its own PostgreSQL (55643) and Redis (56643): four processes that must agree on one truth
    if (process.argv.length <= 2) step('multi-process: 2 API + 2 worker processes (test/multi-process/run.ts)', process.execPath, ['--import', 'tsx', path.join(ROOT, 'test/multi-process/run.ts')]);
  }
  if (results.find((r) => r.name === 'console: production build')?.ok) await browserSuite();
} finally {
  for (const stop of stops.reverse()) stop();
}
// last, and on its own servers: the README's start command on a fresh clone of HEAD
if (!process.env.SKIP_FRESH_CLONE && process.argv.length <= 2) {
  step('fresh clone: npm start answers /v1/health', process.execPath, [path.join(ROOT, 'test/fresh-clone.mjs')]);
}

const width = Math.max(...results.map((r) => r.name.length));
console.log('\nPourgate test summary');
for (const r of results) console.log(`  ${r.ok ? 'PASS' : 'FAIL'}  ${r.name.padEnd(width)}  ${r.seconds}s`);
const failed = results.filter((r) => !r.ok).length;
console.log(`${results.length - failed} passed, ${failed} failed`);
process.exit(failed ? 1 : 0);
