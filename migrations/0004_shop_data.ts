import type { Knex } from 'knex';

/**
 * Shop data: material systems and their revisions, component lots, molds, work orders, batches with
 * their state history, QC cup tests, and the SDS/TDS documents of each system. Every quantity is in
 * SI and every such column names its unit (_kg, _m3, _kg_m3, _c, _s).
 */
export async function up(knex: Knex): Promise<void> {
  const id = (t: Knex.CreateTableBuilder) => t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
  const org = (t: Knex.CreateTableBuilder) => t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
  const stamps = (t: Knex.CreateTableBuilder) => {
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  };

  await knex.schema.createTable('material_systems', (t) => {
    id(t);
    org(t);
    t.text('name').notNullable();
    t.text('kind').notNullable().checkIn(['flexible', 'integral-skin', 'other']);
    t.integer('current_revision').notNullable().defaultTo(1);
    stamps(t);
    t.unique(['organization_id', 'name']);
  });
  await knex.raw('CREATE TRIGGER material_systems_touch BEFORE UPDATE ON material_systems FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  // A revision is never changed once written: batches point at the one they were computed with.
  await knex.schema.createTable('material_system_revisions', (t) => {
    id(t);
    org(t);
    t.uuid('material_system_id').notNullable().references('material_systems.id').onDelete('CASCADE');
    t.integer('revision').notNullable();
    t.text('ratio_basis').notNullable().checkIn(['weight', 'volume']);
    t.double('ratio_a').notNullable().comment('parts of A');
    t.double('ratio_b').notNullable().comment('parts of B');
    t.double('specific_gravity_a').notNullable();
    t.double('specific_gravity_b').notNullable();
    t.text('isocyanate_part').notNullable().checkIn(['A', 'B']);
    t.double('free_rise_density_kg_m3').notNullable();
    t.double('free_rise_reference_temperature_c').notNullable();
    t.double('free_rise_density_slope_kg_m3_per_c');
    t.double('ratio_tolerance_percent').notNullable().defaultTo(5);
    t.double('component_temperature_min_c');
    t.double('component_temperature_max_c');
    t.double('pot_life_s');
    t.double('demold_time_s');
    t.double('full_cure_time_s');
    t.double('max_pigment_percent');
    t.double('max_pack_factor');
    t.double('exotherm_mass_limit_kg');
    t.double('nco_percent');
    t.double('hydroxyl_number_mg_koh_g');
    t.double('water_pbw').comment('parts of water per 100 parts of the polyol side');
    t.text('cautions_text');
    t.text('change_note');
    t.text('created_by_label');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['material_system_id', 'revision']);
  });
  await knex.raw(`ALTER TABLE material_system_revisions ADD CONSTRAINT material_system_revisions_physical CHECK (
    ratio_a > 0 AND ratio_b > 0 AND specific_gravity_a > 0 AND specific_gravity_b > 0 AND free_rise_density_kg_m3 > 0
    AND ratio_tolerance_percent > 0 AND ratio_tolerance_percent < 100
    AND (component_temperature_min_c IS NULL OR component_temperature_max_c IS NULL OR component_temperature_min_c <= component_temperature_max_c))`);

  await knex.schema.createTable('lots', (t) => {
    id(t);
    org(t);
    t.text('part').notNullable().checkIn(['A', 'B', 'pigment']);
    t.uuid('material_system_id').references('material_systems.id').onDelete('RESTRICT');
    t.text('lot_number').notNullable();
    t.date('received_on').notNullable();
    t.date('expires_on').notNullable();
    t.date('opened_on');
    t.text('notes');
    stamps(t);
    t.unique(['organization_id', 'part', 'lot_number']);
    t.index(['organization_id', 'material_system_id']);
  });
  await knex.raw("ALTER TABLE lots ADD CONSTRAINT lots_component_has_system CHECK (part = 'pigment' OR material_system_id IS NOT NULL)");
  await knex.raw('CREATE TRIGGER lots_touch BEFORE UPDATE ON lots FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  await knex.schema.createTable('molds', (t) => {
    id(t);
    org(t);
    t.text('name').notNullable();
    t.text('code');
    t.text('cavity_kind').notNullable().checkIn(['box', 'cylinder', 'water_fill', 'entered']);
    t.jsonb('cavity_measurement').notNullable().comment('as entered, with its units');
    t.jsonb('inserts').notNullable().defaultTo('[]').comment('as entered, with their units');
    t.double('gross_cavity_volume_m3').notNullable();
    t.double('insert_volume_m3').notNullable().defaultTo(0);
    t.double('cavity_volume_m3').notNullable().comment('one cavity less its inserts');
    t.integer('cavities').notNullable().defaultTo(1);
    t.double('total_volume_m3').notNullable();
    t.double('default_pack_factor');
    t.text('notes');
    stamps(t);
    t.unique(['organization_id', 'name']);
    t.unique(['organization_id', 'code']);
  });
  await knex.raw('ALTER TABLE molds ADD CONSTRAINT molds_physical CHECK (cavity_volume_m3 > 0 AND cavities >= 1 AND (default_pack_factor IS NULL OR default_pack_factor > 0))');
  await knex.raw('CREATE TRIGGER molds_touch BEFORE UPDATE ON molds FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  await knex.schema.createTable('work_orders', (t) => {
    id(t);
    org(t);
    t.text('external_ref').notNullable().comment("the ERP's own reference: the idempotency key of a post");
    t.text('part_number');
    t.uuid('mold_id').references('molds.id').onDelete('RESTRICT');
    t.uuid('material_system_id').references('material_systems.id').onDelete('RESTRICT');
    t.integer('quantity').notNullable();
    t.date('due_on');
    t.text('notes');
    t.text('state').notNullable().defaultTo('open').checkIn(['open', 'in_progress', 'done', 'cancelled']);
    t.text('request_hash').notNullable().comment('SHA-256 of the canonical first post, to tell a replay from a conflicting post');
    t.text('created_by_label');
    stamps(t);
    t.unique(['organization_id', 'external_ref']);
    t.index(['organization_id', 'state', 'due_on']);
  });
  await knex.raw('ALTER TABLE work_orders ADD CONSTRAINT work_orders_quantity CHECK (quantity > 0)');
  await knex.raw('CREATE TRIGGER work_orders_touch BEFORE UPDATE ON work_orders FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  await knex.schema.createTable('batches', (t) => {
    id(t);
    org(t);
    t.uuid('work_order_id').references('work_orders.id').onDelete('RESTRICT');
    t.uuid('material_system_id').notNullable().references('material_systems.id').onDelete('RESTRICT');
    t.uuid('material_system_revision_id').notNullable().references('material_system_revisions.id').onDelete('RESTRICT');
    t.text('subject').notNullable().checkIn(['mold', 'free_rise_cup']);
    t.uuid('mold_id').references('molds.id').onDelete('RESTRICT');
    t.uuid('scale_device_id').references('devices.id').onDelete('SET NULL');
    t.uuid('station_id').references('stations.id').onDelete('SET NULL');
    t.uuid('lot_a_id').references('lots.id').onDelete('RESTRICT');
    t.uuid('lot_b_id').references('lots.id').onDelete('RESTRICT');
    t.uuid('lot_pigment_id').references('lots.id').onDelete('RESTRICT');
    // the readings pipeline adds states and transitions; planned is where every batch starts
    t.text('state').notNullable().defaultTo('planned');
    t.date('planned_for').notNullable();
    t.text('notes');
    t.jsonb('options').notNullable().comment('the options as requested, with their units');
    t.text('computation_version').notNullable();
    t.jsonb('targets').notNullable().comment('snapshot: every SI input, its sources, and the computed targets');
    t.double('total_mass_kg').notNullable();
    t.text('created_by_label');
    stamps(t);
    t.index(['organization_id', 'state', 'created_at']);
    t.index(['organization_id', 'work_order_id']);
  });
  await knex.raw("ALTER TABLE batches ADD CONSTRAINT batches_subject CHECK ((subject = 'mold') = (mold_id IS NOT NULL))");
  await knex.raw('CREATE TRIGGER batches_touch BEFORE UPDATE ON batches FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');

  await knex.schema.createTable('batch_state_transitions', (t) => {
    t.bigIncrements('id').primary();
    org(t);
    t.uuid('batch_id').notNullable().references('batches.id').onDelete('CASCADE');
    t.text('from_state');
    t.text('to_state').notNullable();
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('actor_type').notNullable().checkIn(['user', 'api_key', 'system']);
    t.uuid('actor_id');
    t.text('actor_label');
    t.text('reason');
    t.index(['batch_id', 'at']);
  });

  await knex.schema.createTable('qc_cup_tests', (t) => {
    id(t);
    org(t);
    t.uuid('material_system_id').notNullable().references('material_systems.id').onDelete('CASCADE');
    t.uuid('material_system_revision_id').references('material_system_revisions.id').onDelete('SET NULL');
    t.uuid('lot_a_id').references('lots.id').onDelete('RESTRICT');
    t.uuid('lot_b_id').references('lots.id').onDelete('RESTRICT');
    t.double('component_temperature_a_c').notNullable();
    t.double('component_temperature_b_c').notNullable();
    t.double('cream_time_s');
    t.double('top_of_cup_time_s');
    t.double('tack_free_time_s');
    t.double('free_rise_density_kg_m3').notNullable();
    t.timestamp('tested_at', { useTz: true }).notNullable();
    t.text('notes');
    t.text('created_by_label');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'material_system_id', 'tested_at']);
  });
  await knex.raw('ALTER TABLE qc_cup_tests ADD CONSTRAINT qc_cup_tests_physical CHECK (free_rise_density_kg_m3 > 0)');

  await knex.schema.createTable('material_system_documents', (t) => {
    id(t);
    org(t);
    t.uuid('material_system_id').notNullable().references('material_systems.id').onDelete('CASCADE');
    t.text('kind').notNullable().checkIn(['SDS', 'TDS']);
    t.text('title');
    t.text('file_name').notNullable();
    t.text('content_type').notNullable();
    t.bigInteger('size_bytes').notNullable();
    t.text('sha256').notNullable();
    t.text('storage_key').notNullable().unique();
    t.text('uploaded_by_label');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'material_system_id', 'kind']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ['material_system_documents', 'qc_cup_tests', 'batch_state_transitions', 'batches', 'work_orders', 'molds', 'lots', 'material_system_revisions', 'material_systems']) {
    await knex.schema.dropTableIfExists(t);
  }
}
