import type { Knex } from 'knex';

/**
 * The transactional outbox (events), webhook endpoints, deliveries and their attempts, and the
 * stored responses of Idempotency-Key requests.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE TABLE events (
      seq bigserial PRIMARY KEY,
      id uuid NOT NULL UNIQUE DEFAULT gen_random_uuid(),
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      type text NOT NULL,
      subject_type text NOT NULL,
      subject_id text NOT NULL,
      payload jsonb NOT NULL,
      occurred_at timestamptz NOT NULL DEFAULT now(),
      -- the writing transaction: the feed only shows rows of transactions that can no longer
      -- commit "in the past", so a poller never skips an event that commits late
      txid xid8 NOT NULL DEFAULT pg_current_xact_id(),
      relayed_at timestamptz
    )`);
  await knex.raw('CREATE INDEX events_feed ON events (organization_id, txid, seq)');
  await knex.raw('CREATE INDEX events_unrelayed ON events (seq) WHERE relayed_at IS NULL');
  await knex.raw('CREATE INDEX events_subject ON events (organization_id, subject_type, subject_id)');

  await knex.schema.createTable('webhook_endpoints', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.text('url').notNullable();
    t.text('description').notNullable().defaultTo('');
    t.specificType('event_types', 'text[]').notNullable().defaultTo('{}');
    t.boolean('enabled').notNullable().defaultTo(true);
    t.text('disabled_reason');
    t.text('secret_enc').notNullable();
    t.text('previous_secret_enc');
    t.timestamp('previous_secret_until', { useTz: true });
    t.uuid('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organization_id', 'enabled']);
  });
  await knex.raw('CREATE TRIGGER webhook_endpoints_touch BEFORE UPDATE ON webhook_endpoints FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');
  await knex.schema.createTable('webhook_deliveries', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organization_id').notNullable().references('organizations.id').onDelete('CASCADE');
    t.uuid('endpoint_id').notNullable().references('webhook_endpoints.id').onDelete('CASCADE');
    t.uuid('event_id').notNullable().references('events.id').onDelete('CASCADE');
    t.text('event_type').notNullable();
    t.text('status').notNullable().defaultTo('pending').checkIn(['pending', 'delivering', 'succeeded', 'retrying', 'dead', 'cancelled']);
    t.integer('attempts').notNullable().defaultTo(0);
    t.timestamp('next_attempt_at', { useTz: true });
    t.integer('last_status_code');
    t.text('last_error');
    t.integer('last_duration_ms');
    t.timestamp('delivered_at', { useTz: true });
    t.integer('replays').notNullable().defaultTo(0);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['endpoint_id', 'event_id']);
    t.index(['organization_id', 'status', 'created_at']);
  });
  await knex.raw('CREATE TRIGGER webhook_deliveries_touch BEFORE UPDATE ON webhook_deliveries FOR EACH ROW EXECUTE FUNCTION pourgate_touch_updated_at()');
  await knex.schema.createTable('webhook_attempts', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('delivery_id').notNullable().references('webhook_deliveries.id').onDelete('CASCADE');
    t.integer('attempt').notNullable();
    t.timestamp('started_at', { useTz: true }).notNullable();
    t.integer('duration_ms').notNullable();
    t.integer('status_code');
    t.text('error');
    t.text('response_snippet');
    t.index(['delivery_id', 'attempt']);
  });

  await knex.schema.createTable('idempotency_keys', (t) => {
    t.text('scope').notNullable();
    t.text('key').notNullable();
    t.text('request_hash').notNullable();
    t.text('state').notNullable().checkIn(['in_flight', 'done']);
    t.integer('response_status');
    t.jsonb('response_headers');
    t.text('response_body');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.primary(['scope', 'key']);
    t.index(['expires_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ['idempotency_keys', 'webhook_attempts', 'webhook_deliveries', 'webhook_endpoints', 'events']) await knex.schema.dropTableIfExists(t);
}
