import type { Knex } from 'knex';

/**
 * From plan to part: the finished part (its mass and molded density), test specimens, a batch's
 * disposition with defect causes from an organization's own list, the part spec of a material
 * system revision, a lot's shelf life after opening and its recall, and the engineer's override
 * that lets an expired or held lot into a batch (recorded on the batch).
 */
export async function up(knex: Knex): Promise<void> {
  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const org = (t: Knex.CreateTableBuilder) => t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');

  await knex.schema.alterTable('material_system_revisions', (t) => {
    t.double('part_density_tolerance_percent').comment('± band on the molded density against the batch target; 10 when null');
    t.double('core_density_min_kg_m3');
    t.double('core_density_max_kg_m3');
    t.double('indentation_force_min_n').comment('IFD at 25 % (ASTM D3574 Test B1)');
    t.double('indentation_force_max_n');
    t.text('durometer_scale').checkIn(['A', 'OO', 'D']);
    t.double('durometer_min');
    t.double('durometer_max');
  });
  await knex.raw(`ALTER TABLE material_system_revisions ADD CONSTRAINT material_system_revisions_part_spec CHECK (
    (part_density_tolerance_percent IS NULL OR (part_density_tolerance_percent > 0 AND part_density_tolerance_percent < 100))
    AND (core_density_min_kg_m3 IS NULL OR core_density_max_kg_m3 IS NULL OR core_density_min_kg_m3 <= core_density_max_kg_m3)
    AND (indentation_force_min_n IS NULL OR indentation_force_max_n IS NULL OR indentation_force_min_n <= indentation_force_max_n)
    AND (durometer_min IS NULL OR durometer_max IS NULL OR durometer_min <= durometer_max))`);

  await knex.schema.alterTable('lots', (t) => {
    t.integer('shelf_life_days_after_opening').comment('days the lot stays usable once opened; null: until its expiry');
    t.timestamp('recalled_at', { useTz: true });
    t.text('recall_reason');
    t.text('recalled_by_label');
  });
  await knex.raw('ALTER TABLE lots ADD CONSTRAINT lots_shelf_life CHECK (shelf_life_days_after_opening IS NULL OR shelf_life_days_after_opening > 0)');

  await knex.schema.alterTable('batches', (t) => {
    t.jsonb('lot_override').comment('an engineer let expired, held or recalled lots in: reason, by, lots');
  });

  await knex.schema.createTable('defect_causes', (t) => {
    id(t);
    org(t);
    t.text('code').notNullable();
    t.text('name').notNullable();
    t.text('description');
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['organization_id', 'code']);
  });
  await knex.raw('CREATE TRIGGER defect_causes_touch BEFORE UPDATE ON defect_causes FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  await knex.schema.createTable('parts', (t) => {
    id(t);
    org(t);
    t.uuid('batch_id').notNullable().references('batches.id').onDelete('CASCADE');
    t.integer('cavity').notNullable().defaultTo(1);
    t.text('serial');
    t.double('mass_kg').notNullable();
    t.text('mass_source').notNullable().checkIn(['scale', 'entered']);
    t.uuid('device_id').references('devices.id').onDelete('SET NULL');
    t.double('cavity_volume_m3').notNullable();
    t.double('molded_density_kg_m3').notNullable();
    t.double('target_density_kg_m3').notNullable();
    t.double('tolerance_percent').notNullable();
    t.text('density_verdict').notNullable().checkIn(['within', 'below', 'above']);
    t.text('disposition').checkIn(['accepted', 'rework', 'scrap']);
    t.jsonb('defect_causes').notNullable().defaultTo('[]');
    t.text('disposition_note');
    t.text('created_by_label');
    t.timestamp('demolded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'batch_id']);
  });
  await knex.raw('ALTER TABLE parts ADD CONSTRAINT parts_physical CHECK (mass_kg > 0 AND cavity >= 1 AND cavity_volume_m3 > 0 AND molded_density_kg_m3 > 0)');

  await knex.schema.createTable('part_specimens', (t) => {
    id(t);
    org(t);
    t.uuid('part_id').notNullable().references('parts.id').onDelete('CASCADE');
    t.text('test').notNullable().checkIn(['core_density', 'indentation_force', 'durometer']);
    t.double('mass_kg');
    t.double('volume_m3');
    t.double('density_kg_m3');
    t.double('force_n');
    t.text('durometer_scale');
    t.double('durometer');
    t.text('verdict').checkIn(['within', 'below', 'above']);
    t.text('notes');
    t.text('created_by_label');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'part_id']);
  });

  await knex.schema.createTable('batch_dispositions', (t) => {
    id(t);
    org(t);
    t.uuid('batch_id').notNullable().unique().references('batches.id').onDelete('CASCADE');
    t.text('decision').notNullable().checkIn(['accepted', 'rework', 'scrap']);
    t.jsonb('defect_causes').notNullable().defaultTo('[]');
    t.text('note');
    t.text('decided_by_label');
    t.timestamp('decided_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'decided_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_dispositions');
  await knex.schema.dropTable('part_specimens');
  await knex.schema.dropTable('parts');
  await knex.schema.dropTable('defect_causes');
  await knex.schema.alterTable('batches', (t) => t.dropColumn('lot_override'));
  await knex.raw('ALTER TABLE lots DROP CONSTRAINT lots_shelf_life');
  await knex.schema.alterTable('lots', (t) => {
    for (const c of ['shelf_life_days_after_opening', 'recalled_at', 'recall_reason', 'recalled_by_label']) t.dropColumn(c);
  });
  await knex.raw('ALTER TABLE material_system_revisions DROP CONSTRAINT material_system_revisions_part_spec');
  await knex.schema.alterTable('material_system_revisions', (t) => {
    for (const c of ['part_density_tolerance_percent', 'core_density_min_kg_m3', 'core_density_max_kg_m3', 'indentation_force_min_n', 'indentation_force_max_n', 'durometer_scale', 'durometer_min', 'durometer_max']) t.dropColumn(c);
  });
}
