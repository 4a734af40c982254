#!/usr/bin/env node
// `npm run migrate` / `npm run seed`: database chores from a fresh clone. Plain Node (runs before
// node_modules exists): installs what is missing, and without DATABASE_URL uses the same local
// PostgreSQL `npm start` runs (started here if it is not running, and stopped again after),
// then runs scripts/db.ts through tsx.
import path from 'node:path';

const USAGE = `usage: npm run migrate [-- --dry-run]     apply pending migrations (--dry-run: list them, apply nothing)
       npm run seed [-- --dry-run]        add the invented demo shop (idempotent; --dry-run: roll back)
       node scripts/db.mjs reset          drop everything and migrate from scratch (throw-away databases)

DATABASE_URL picks the database; without it, the local PostgreSQL of \`npm start\`
(127.0.0.1:\${PGPORT:-55432}, database pourgate) is used, started if needed.`;

const args = process.argv.slice(2);
if (args.includes('--help') || args.includes('-h') || args.length === 0) {
  console.log(USAGE);
  process.exit(args.length === 0 ? 1 : 0);
}
if (!['migrate', 'seed', 'reset'].includes(args[0])) {
  console.error(`unknown command "${args[0]}"\n\n${USAGE}`);
  process.exit(1);
}

const { ROOT, checkNode, ensureNpmDeps, ensureWorkspacePackages, runTs, startPostgres } = await import('./lib/services.mjs');
checkNode();
ensureNpmDeps();
ensureWorkspacePackages();
const env = { ...process.env, NODE_ENV: process.env.NODE_ENV ?? 'development' };
let stop = () => undefined;
if (!env.DATABASE_URL) {
  const pg = await startPostgres({ name: 'pg', port: Number(process.env.PGPORT ?? 55432), databases: ['pourgate'] });
  if (pg.startedHere) stop = () => pg.stop();
  env.DATABASE_URL = pg.url('pourgate');
}
const r = runTs(path.join(ROOT, 'scripts/db.ts'), args, env);
stop();
process.exit(r.status ?? 1);
