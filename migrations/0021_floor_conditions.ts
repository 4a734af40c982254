import type { Knex } from 'knex';

/**
 * What judging needs beyond the mix ratio: the mold and shop-air windows and the humidity limit a
 * system is made for (from its TDS), a band on the poured masses, and milestones — mix start, pour
 * and demold as timed readings — so pot life and demold time are judged like any other reading.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('material_system_revisions', (t) => {
    t.double('mold_temperature_min_c');
    t.double('mold_temperature_max_c');
    t.double('ambient_temperature_min_c');
    t.double('ambient_temperature_max_c');
    t.double('max_relative_humidity_percent');
    t.double('mass_tolerance_percent').comment('± band on component and total masses; the ratio tolerance when null');
  });
  await knex.raw(`ALTER TABLE material_system_revisions ADD CONSTRAINT material_system_revisions_floor CHECK (
    (mold_temperature_min_c IS NULL OR mold_temperature_max_c IS NULL OR mold_temperature_min_c <= mold_temperature_max_c)
    AND (ambient_temperature_min_c IS NULL OR ambient_temperature_max_c IS NULL OR ambient_temperature_min_c <= ambient_temperature_max_c)
    AND (max_relative_humidity_percent IS NULL OR (max_relative_humidity_percent > 0 AND max_relative_humidity_percent <= 100))
    AND (mass_tolerance_percent IS NULL OR (mass_tolerance_percent > 0 AND mass_tolerance_percent < 100)))`);
  await knex.raw('ALTER TABLE readings DROP CONSTRAINT readings_quantity_check, DROP CONSTRAINT readings_subject_check');
  await knex.raw("ALTER TABLE readings ADD CONSTRAINT readings_quantity_check CHECK (quantity IN ('mass', 'temperature', 'humidity', 'milestone'))");
  await knex.raw("ALTER TABLE readings ADD CONSTRAINT readings_subject_check CHECK (subject IN ('part_a', 'part_b', 'pigment', 'mixed', 'mold', 'ambient', 'mix_start', 'pour', 'demold'))");
  // the review list: rejected readings of an organization, newest first, filtered by batch or device
  await knex.raw("CREATE INDEX readings_batch_subject_idx ON readings (batch_id, subject, received_at) WHERE status <> 'unused'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX IF EXISTS readings_batch_subject_idx');
  await knex.raw("DELETE FROM readings WHERE quantity = 'milestone'");
  await knex.raw('ALTER TABLE readings DROP CONSTRAINT readings_quantity_check, DROP CONSTRAINT readings_subject_check');
  await knex.raw("ALTER TABLE readings ADD CONSTRAINT readings_quantity_check CHECK (quantity IN ('mass', 'temperature', 'humidity'))");
  await knex.raw("ALTER TABLE readings ADD CONSTRAINT readings_subject_check CHECK (subject IN ('part_a', 'part_b', 'pigment', 'mixed', 'mold', 'ambient'))");
  await knex.raw('ALTER TABLE material_system_revisions DROP CONSTRAINT material_system_revisions_floor');
  await knex.schema.alterTable('material_system_revisions', (t) => {
    for (const c of ['mold_temperature_min_c', 'mold_temperature_max_c', 'ambient_temperature_min_c', 'ambient_temperature_max_c', 'max_relative_humidity_percent', 'mass_tolerance_percent']) t.dropColumn(c);
  });
}
