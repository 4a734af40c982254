import type { Knex } from 'knex';

/**
 * E-mail to engineers about rejected readings: one row per (person, event), written by the outbox
 * relay in the transaction that takes the event, then sent one by one or gathered into a digest.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rejection_notices', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('event_id').notNullable();
    t.uuid('reading_id').notNullable();
    t.text('mode').notNullable().checkIn(['each', 'digest']);
    t.text('status').notNullable().defaultTo('pending').checkIn(['pending', 'sent', 'failed']);
    t.integer('attempts').notNullable().defaultTo(0);
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('last_error');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true });
    t.unique(['user_id', 'event_id']);
  });
  await knex.raw("CREATE INDEX rejection_notices_due ON rejection_notices (mode, next_attempt_at) WHERE status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('rejection_notices');
}
