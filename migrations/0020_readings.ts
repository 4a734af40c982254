import type { Knex } from 'knex';

/**
 * Readings from bench scales and temperature loggers. Each is committed `pending` before its judging
 * job is queued, so a lost queue loses no reading; (device, client reading id) makes a replay harmless.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('readings', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.uuid('batch_id').notNullable().references('batches.id').onDelete('CASCADE');
    t.uuid('device_id').notNullable().references('devices.id').onDelete('RESTRICT');
    t.text('client_reading_id').notNullable();
    t.text('quantity').notNullable().checkIn(['mass', 'temperature', 'humidity']);
    t.text('subject').notNullable().checkIn(['part_a', 'part_b', 'pigment', 'mixed', 'mold', 'ambient']);
    t.double('value_si').notNullable().comment('kg, °C or % relative humidity');
    t.text('unit_given').notNullable();
    t.double('value_given').notNullable();
    t.boolean('stable').notNullable().defaultTo(true);
    t.timestamp('device_time', { useTz: true });
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.double('skew_seconds');
    t.text('status').notNullable().defaultTo('pending').checkIn(['pending', 'accepted', 'rejected', 'unused']);
    t.jsonb('reasons').notNullable().defaultTo('[]');
    t.timestamp('judged_at', { useTz: true });
    t.text('review_decision').checkIn(['waive', 'uphold']);
    t.text('review_note');
    t.uuid('reviewed_by');
    t.text('reviewed_by_label');
    t.timestamp('reviewed_at', { useTz: true });
    t.unique(['device_id', 'client_reading_id']);
    t.index(['organization_id', 'status', 'received_at']);
    t.index(['batch_id', 'received_at']);
  });
  await knex.raw("CREATE INDEX readings_pending_idx ON readings (received_at) WHERE status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('readings');
}
