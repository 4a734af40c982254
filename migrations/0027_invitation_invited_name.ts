import type { Knex } from 'knex';

/**
 * The name the admin typed when inviting, so the acceptance page can greet the person and prefill
 * it (they may still change it). Optional: invitations sent before have none.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('invitations', (t) => {
    t.text('name');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('invitations', (t) => {
    t.dropColumn('name');
  });
}
