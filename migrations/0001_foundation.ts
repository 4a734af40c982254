import type { Knex } from 'knex';

/** Extensions and helpers every later migration relies on. */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE EXTENSION IF NOT EXISTS pgcrypto');
  // keeps updated_at honest without every query having to remember it
  await knex.raw(`
    CREATE OR REPLACE FUNCTION pourgate_touch_updated_at() RETURNS trigger AS $$
    BEGIN NEW.updated_at = now(); RETURN NEW; END;
    $$ LANGUAGE plpgsql`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_touch_updated_at()');
}
