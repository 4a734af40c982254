import type { Knex } from 'knex';

/**
 * Statistical control: the values charted (one per judged reading or per batch, kept as the judging
 * job stores its verdicts so a chart reads an index, not the readings), the charts an engineer
 * defines with their run rules and frozen baseline, and the signals the rules raise.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('control_points', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    // no foreign keys to batches, readings or systems: the judging job writes points while other
    // judgings of the batch wait on its row, and a key-share lock taken by the insert would deadlock them
    t.uuid('material_system_id').notNullable();
    t.text('metric').notNullable().checkIn(['ratio_error_percent', 'shot_mass_error_percent', 'component_temperature_a_c', 'component_temperature_b_c', 'free_rise_density_kg_m3']);
    t.uuid('station_id');
    t.uuid('device_id');
    t.uuid('lot_a_id');
    t.uuid('lot_b_id');
    t.uuid('batch_id');
    t.uuid('reading_id');
    t.uuid('cup_test_id');
    t.double('value').notNullable();
    t.timestamp('at', { useTz: true }).notNullable();
    // one point per batch for batch figures (ratio, shot mass), one per reading otherwise
    t.text('source_key').notNullable();
    t.unique(['metric', 'source_key']);
  });
  await knex.raw('CREATE INDEX control_points_chart_idx ON control_points (organization_id, material_system_id, metric, at, id) INCLUDE (value)');

  await knex.schema.createTable('control_charts', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.uuid('material_system_id').notNullable().references('material_systems.id').onDelete('CASCADE');
    t.text('metric').notNullable();
    t.uuid('station_id').references('stations.id').onDelete('CASCADE');
    t.uuid('device_id').references('devices.id').onDelete('CASCADE');
    t.uuid('lot_id').references('lots.id').onDelete('CASCADE');
    t.specificType('rules', 'text[]').notNullable();
    t.jsonb('baseline').comment('frozen limits: how chosen, n, centre, MR-bar, sigma, limits; null while limits are trial');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('created_by_label');
    t.index(['organization_id', 'material_system_id', 'metric']);
  });

  await knex.schema.createTable('control_signals', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.uuid('chart_id').notNullable().references('control_charts.id').onDelete('CASCADE');
    t.text('rule').notNullable();
    t.bigInteger('point_id').notNullable().references('control_points.id').onDelete('CASCADE');
    t.uuid('reading_id');
    t.uuid('batch_id');
    t.double('value').notNullable();
    t.jsonb('points').notNullable().comment('the points of the pattern: id, value, at, reading, batch');
    t.timestamp('raised_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('acknowledged_at', { useTz: true });
    t.uuid('acknowledged_by');
    t.text('acknowledged_by_label');
    t.text('acknowledgement_note');
    // judging a reading twice raises nothing more
    t.unique(['chart_id', 'rule', 'point_id']);
    t.index(['organization_id', 'raised_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ['control_signals', 'control_charts', 'control_points']) await knex.schema.dropTableIfExists(t);
}
