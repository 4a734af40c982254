import type { Knex } from 'knex';

/**
 * Statistical control, deeper: charts of subgroup means and ranges (X̄–R, a batch's values as one
 * subgroup) beside individuals charts; the molded part density as a charted metric; and e-mail to
 * engineers about drift signals, each person choosing it on their profile.
 */
const METRICS = ['ratio_error_percent', 'shot_mass_error_percent', 'component_temperature_a_c', 'component_temperature_b_c', 'free_rise_density_kg_m3', 'part_density_kg_m3'];

export async function up(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE control_points DROP CONSTRAINT IF EXISTS control_points_metric_check');
  await knex.raw(`ALTER TABLE control_points ADD CONSTRAINT control_points_metric_check CHECK (metric IN (${METRICS.map((m) => `'${m}'`).join(', ')}))`);
  await knex.schema.alterTable('control_charts', (t) => {
    t.text('kind').notNullable().defaultTo('individuals').checkIn(['individuals', 'xbar_r']);
  });
  // an X̄–R chart groups its points by batch: the subgroup query reads this index
  await knex.raw('CREATE INDEX control_points_batch_idx ON control_points (organization_id, material_system_id, metric, batch_id) WHERE batch_id IS NOT NULL');

  await knex.schema.alterTable('users', (t) => {
    t.text('notify_drift').notNullable().defaultTo('each').checkIn(['each', 'off']);
  });
  await knex.schema.createTable('drift_notices', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('event_id').notNullable();
    t.uuid('signal_id').notNullable();
    t.jsonb('facts').notNullable().comment('the drift.detected event data, as the mail needs it');
    t.text('status').notNullable().defaultTo('pending').checkIn(['pending', 'sent', 'failed']);
    t.integer('attempts').notNullable().defaultTo(0);
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('last_error');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true });
    t.unique(['user_id', 'event_id']);
  });
  await knex.raw("CREATE INDEX drift_notices_due ON drift_notices (next_attempt_at) WHERE status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('drift_notices');
  await knex.schema.alterTable('users', (t) => t.dropColumn('notify_drift'));
  await knex.raw('DROP INDEX IF EXISTS control_points_batch_idx');
  await knex.schema.alterTable('control_charts', (t) => t.dropColumn('kind'));
  await knex.raw('ALTER TABLE control_points DROP CONSTRAINT IF EXISTS control_points_metric_check');
  await knex.raw(
    `ALTER TABLE control_points ADD CONSTRAINT control_points_metric_check CHECK (metric IN (${METRICS.slice(0, 5)
      .map((m) => `'${m}'`)
      .join(', ')}))`,
  );
}
