import type { Knex } from 'knex';

/** Bench scales, thermometers, hygrometers, loggers and gateways, and the stations they sit at. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('code').notNullable();
    t.text('name').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['organization_id', 'code']);
  });
  await knex.schema.createTable('devices', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('kind').notNullable().checkIn(['scale', 'thermometer', 'hygrometer', 'logger', 'gateway']);
    t.text('serial').notNullable();
    t.text('name').notNullable();
    t.uuid('station_id').references('stations.id').onDelete('SET NULL');
    t.double('readability_kg').comment('scale division d, kg');
    t.double('capacity_kg').comment('scale maximum capacity, kg');
    t.date('calibration_due');
    t.boolean('retired').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['organization_id', 'serial']);
  });
  await knex.raw('CREATE TRIGGER devices_touch BEFORE UPDATE ON devices FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');
  await knex.schema.alterTable('api_keys', (t) => {
    t.foreign('device_id').references('devices.id').onDelete('SET NULL');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('api_keys', (t) => t.dropForeign(['device_id']));
  await knex.schema.dropTable('devices');
  await knex.schema.dropTable('stations');
}
