import type { Knex } from 'knex';

/**
 * Logger CSV imports: the file is kept with its SHA-256 (the same file uploaded twice imports once)
 * and a queued job works through it, recording progress and every bad row with its line number.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('reading_imports', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('file_name');
    t.text('sha256').notNullable();
    t.integer('size_bytes').notNullable();
    t.binary('content').notNullable();
    t.text('status').notNullable().defaultTo('queued').checkIn(['queued', 'running', 'done', 'failed']);
    t.integer('total').notNullable().defaultTo(0).comment('data rows in the file');
    t.integer('processed').notNullable().defaultTo(0);
    t.integer('imported').notNullable().defaultTo(0).comment('rows that became new readings');
    t.integer('duplicates').notNullable().defaultTo(0).comment('rows already posted (same device and client reading id)');
    t.jsonb('bad_rows').notNullable().defaultTo('[]');
    t.text('error');
    // who uploaded it: the job ingests as them (their organization and, for a device key, its device)
    t.text('actor_type').notNullable();
    t.uuid('actor_id');
    t.text('actor_label');
    t.uuid('bound_device_id');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('started_at', { useTz: true });
    t.timestamp('finished_at', { useTz: true });
    t.unique(['organization_id', 'sha256']);
    t.index(['organization_id', 'created_at']);
  });
  await knex.raw("CREATE INDEX reading_imports_open_idx ON reading_imports (created_at) WHERE status IN ('queued', 'running')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('reading_imports');
}
