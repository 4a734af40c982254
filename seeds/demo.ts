import type { Knex } from 'knex';

/**
 * The demo scenario: an invented foam shop. Idempotent: running it again changes nothing.
 * Each later part of the product adds its own demo rows here.
 */
export async function seedDemo(db: Knex): Promise<string> {
  const parts: string[] = [];
  const hasOrgs = await db.schema.hasTable('organizations');
  if (!hasOrgs) return 'nothing to seed yet';
  return parts.join('; ') || 'up to date';
}
