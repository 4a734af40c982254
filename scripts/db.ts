// Database chores for the start and test commands: `migrate`, `seed` (the demo), `reset` (tests).
// Run as: node --import tsx scripts/db.ts <command> [--dry-run]   (DATABASE_URL must be set);
// `npm run migrate` / `npm run seed` go through scripts/db.mjs, which finds a database first.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import knexPkg from 'knex';
import type { Knex } from 'knex';

const { knex } = knexPkg;
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Lists migrations by bare name (no extension), so a .ts and a compiled .js run count as the same. */
class MigrationSource implements Knex.MigrationSource<string> {
  constructor(private readonly dir: string) {}
  async getMigrations(): Promise<string[]> {
    return fs.readdirSync(this.dir).filter((f) => /^\d{4}.*\.ts$/.test(f) && !f.endsWith('.d.ts')).sort();
  }
  getMigrationName(file: string): string {
    return file.replace(/\.ts$/, '');
  }
  async getMigration(file: string): Promise<Knex.Migration> {
    return import(path.join(this.dir, file));
  }
}

export function migrationConfig(): Knex.MigratorConfig {
  return { migrationSource: new MigrationSource(path.join(root, 'migrations')), tableName: 'knex_migrations' };
}

async function main(): Promise<void> {
  const cmd = process.argv[2];
  const dryRun = process.argv.includes('--dry-run');
  if (!cmd || process.argv.includes('--help')) {
    console.log('usage: node --import tsx scripts/db.ts migrate|seed|reset [--dry-run]   (DATABASE_URL must be set)');
    return;
  }
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  const db = knex({ client: 'pg', connection: url, pool: { min: 0, max: 2 } });
  try {
    if (cmd === 'migrate' && dryRun) {
      const [, pending] = (await db.migrate.list(migrationConfig())) as [unknown[], (string | { file: string })[]];
      const names = pending.map((m) => (typeof m === 'string' ? m : m.file).replace(/\.ts$/, ''));
      console.log(`[pourgate] dry run: ${names.length ? `would apply ${names.join(', ')}` : 'migrations up to date, nothing to apply'}`);
    } else if (cmd === 'migrate') {
      const [, done] = await db.migrate.latest(migrationConfig());
      console.log(`[pourgate] migrations: ${done.length ? done.join(', ') : 'up to date'}`);
    } else if (cmd === 'reset') {
      if (dryRun) throw new Error('reset has no dry run: it drops everything');
      await db.raw('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
      const [, done] = await db.migrate.latest(migrationConfig());
      console.log(`[pourgate] test database reset (${done.length} migrations)`);
    } else if (cmd === 'seed') {
      if (process.env.NODE_ENV === 'production') throw new Error('The demo seed refuses to run with NODE_ENV=production.');
      const { seedDemo } = await import('../seeds/demo.js');
      if (dryRun) {
        // the whole seed in one transaction that is rolled back: what it would do, nothing kept
        const trx = await db.transaction();
        try {
          console.log(`[pourgate] dry run (rolled back): demo seed would do: ${await seedDemo(trx as unknown as Knex)}`);
        } finally {
          await trx.rollback();
        }
      } else {
        const summary = await seedDemo(db);
        console.log(`[pourgate] demo seed: ${summary}`);
      }
    } else {
      throw new Error(`unknown command "${cmd}"; use migrate, seed or reset`);
    }
  } finally {
    await db.destroy();
  }
}

main().catch((e: Error) => {
  console.error(`[pourgate] ${e.message}`);
  process.exit(1);
});
