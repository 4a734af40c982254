import type { Knex } from 'knex';

/**
 * The review list of one batch (status and a time window: "rejected in this batch this week") read
 * through `(batch_id, received_at)` walked every reading of the batch in the window and visited each
 * row to test its status and organization, so its cost grew with the batch's accepted readings. This
 * index puts the status before the time and carries the organization, so the page and its capped
 * count read only the matching entries (index-only where the visibility map allows).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE INDEX readings_batch_status_received_idx ON readings (batch_id, status, received_at) INCLUDE (organization_id)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX IF EXISTS readings_batch_status_received_idx');
}
