import type { Knex } from 'knex';

/**
 * Judging the whole pour: tolerances in parts by weight, pigment dosed as the trade doses it
 * (basis and placement, the carrier's OH number), what a batch needs before release, a cup-test
 * reactivity window and free-rise density band per system (ASTM D7487 terms); cup tests keep their
 * verdict, and a lot whose cup test failed is held for new batches until an engineer releases it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('material_system_revisions', (t) => {
    t.double('ratio_tolerance_pbw').comment('± pbw of B per the A parts; replaces the percent when set');
    t.text('pigment_dose_basis').notNullable().defaultTo('ab').checkIn(['ab', 'polyol', 'total']);
    t.text('pigment_placement').notNullable().defaultTo('separate').checkIn(['separate', 'A', 'B']);
    t.double('pigment_carrier_oh_number');
    for (const c of ['cream_time', 'rise_time', 'tack_free_time']) {
      t.double(`${c}_min_s`);
      t.double(`${c}_max_s`);
    }
    t.double('free_rise_density_min_kg_m3');
    t.double('free_rise_density_max_kg_m3');
    t.text('release_requires').notNullable().defaultTo('').comment('comma-separated: component_temperature, mold_temperature, ambient_temperature, humidity, mix_start, pour, demold');
  });
  await knex.raw(`ALTER TABLE material_system_revisions ADD CONSTRAINT material_system_revisions_judging CHECK (
    (ratio_tolerance_pbw IS NULL OR ratio_tolerance_pbw > 0)
    AND (cream_time_min_s IS NULL OR cream_time_max_s IS NULL OR cream_time_min_s <= cream_time_max_s)
    AND (rise_time_min_s IS NULL OR rise_time_max_s IS NULL OR rise_time_min_s <= rise_time_max_s)
    AND (tack_free_time_min_s IS NULL OR tack_free_time_max_s IS NULL OR tack_free_time_min_s <= tack_free_time_max_s)
    AND (free_rise_density_min_kg_m3 IS NULL OR free_rise_density_max_kg_m3 IS NULL OR free_rise_density_min_kg_m3 <= free_rise_density_max_kg_m3))`);
  await knex.schema.alterTable('qc_cup_tests', (t) => {
    t.text('verdict').notNullable().defaultTo('not_judged').checkIn(['passed', 'failed', 'not_judged']);
    t.jsonb('findings').notNullable().defaultTo('[]');
    t.double('free_rise_density_at_reference_kg_m3');
  });
  await knex.schema.alterTable('lots', (t) => {
    t.uuid('held_by_cup_test_id').references('qc_cup_tests.id').onDelete('SET NULL');
    t.timestamp('held_at', { useTz: true });
    t.timestamp('hold_released_at', { useTz: true });
    t.text('hold_released_by_label');
    t.text('hold_release_note');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('lots', (t) => {
    for (const c of ['held_by_cup_test_id', 'held_at', 'hold_released_at', 'hold_released_by_label', 'hold_release_note']) t.dropColumn(c);
  });
  await knex.schema.alterTable('qc_cup_tests', (t) => {
    for (const c of ['verdict', 'findings', 'free_rise_density_at_reference_kg_m3']) t.dropColumn(c);
  });
  await knex.raw('ALTER TABLE material_system_revisions DROP CONSTRAINT material_system_revisions_judging');
  await knex.schema.alterTable('material_system_revisions', (t) => {
    for (const c of ['ratio_tolerance_pbw', 'pigment_dose_basis', 'pigment_placement', 'pigment_carrier_oh_number', 'cream_time_min_s', 'cream_time_max_s', 'rise_time_min_s', 'rise_time_max_s', 'tack_free_time_min_s', 'tack_free_time_max_s', 'free_rise_density_min_kg_m3', 'free_rise_density_max_kg_m3', 'release_requires']) t.dropColumn(c);
  });
}
