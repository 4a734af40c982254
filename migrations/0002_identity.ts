import type { Knex } from 'knex';

/** Organizations, people, invitations, refresh tokens, API keys and the audit log. */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS citext');
  await knex.schema.createTable('organizations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable();
    t.text('slug').notNullable().unique();
    t.text('unit_system').notNullable().defaultTo('metric').checkIn(['metric', 'imperial']);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.specificType('email', 'citext').notNullable().unique();
    t.text('name').notNullable();
    t.text('role').notNullable().checkIn(['admin', 'engineer', 'integrator', 'viewer']);
    t.text('password_hash');
    t.boolean('disabled').notNullable().defaultTo(false);
    t.text('unit_system').notNullable().defaultTo('metric').checkIn(['metric', 'imperial']);
    t.text('notify_rejections').notNullable().defaultTo('each').checkIn(['each', 'digest', 'off']);
    t.timestamp('last_sign_in_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'role']);
  });
  await knex.raw('CREATE TRIGGER users_touch BEFORE UPDATE ON users FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');
  await knex.schema.createTable('invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.specificType('email', 'citext').notNullable();
    t.text('role').notNullable().checkIn(['admin', 'engineer', 'integrator', 'viewer']);
    t.text('token_hash').notNullable().unique();
    t.uuid('invited_by').references('users.id').onDelete('SET NULL');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'created_at']);
  });
  await knex.schema.createTable('refresh_tokens', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('family_id').notNullable();
    t.text('token_hash').notNullable().unique();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('revoked_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['family_id']);
  });
  await knex.schema.createTable('api_keys', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('kind').notNullable().checkIn(['device', 'integration']);
    t.text('environment').notNullable().checkIn(['live', 'test']);
    t.specificType('scopes', 'text[]').notNullable();
    t.uuid('device_id');
    t.text('prefix').notNullable();
    t.text('secret_hash').notNullable().unique();
    t.uuid('created_by').references('users.id').onDelete('SET NULL');
    t.uuid('rotated_from').references('api_keys.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('expires_at', { useTz: true });
    t.timestamp('grace_until', { useTz: true });
    t.timestamp('last_used_at', { useTz: true });
    t.text('last_used_ip');
    t.timestamp('revoked_at', { useTz: true });
    t.uuid('revoked_by').references('users.id').onDelete('SET NULL');
    t.index(['organization_id', 'created_at']);
  });
  await knex.schema.createTable('audit_events', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('organization_id').references('organizations.id').onDelete('CASCADE');
    t.text('actor_type').notNullable().checkIn(['user', 'api_key', 'system', 'anonymous']);
    t.uuid('actor_id');
    t.text('actor_label');
    t.text('action').notNullable();
    t.text('target_type');
    t.text('target_id');
    t.jsonb('details').notNullable().defaultTo('{}');
    t.text('ip');
    t.text('user_agent');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'created_at']);
    t.index(['organization_id', 'action', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ['audit_events', 'api_keys', 'refresh_tokens', 'invitations', 'users', 'organizations']) await knex.schema.dropTableIfExists(t);
}
