import type { Knex } from 'knex';

/**
 * Each sealed webhook secret names the version of the key that sealed it, so SECRETS_KEY can be
 * rotated and older rows still open. Rows sealed before have none: they open with the former
 * single-hash derivation.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('webhook_endpoints', (t) => {
    t.text('secret_key_version');
    t.text('previous_secret_key_version');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('webhook_endpoints', (t) => {
    t.dropColumn('secret_key_version');
    t.dropColumn('previous_secret_key_version');
  });
}
