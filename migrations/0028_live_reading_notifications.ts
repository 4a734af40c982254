import type { Knex } from 'knex';

/**
 * The live station view's source: PostgreSQL tells every listening API process (NOTIFY, delivered
 * when the writing transaction commits) which readings arrived and which got a verdict or a review.
 * Statement-level triggers with transition tables: one notification per statement and organization
 * (ids in chunks of 100, well under the 8000-byte payload limit), so a bulk insert of 1000 readings
 * sends 10, and nothing is read back unless someone is watching.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE FUNCTION pourgate_live_readings() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'INSERT' THEN
        PERFORM pg_notify('pourgate_live_readings', json_build_object('o', org, 'k', 'received', 'ids', ids)::text)
        FROM (SELECT organization_id AS org, array_agg(id) AS ids
              FROM (SELECT organization_id, id, (row_number() OVER (PARTITION BY organization_id) - 1) / 100 AS chunk FROM new_rows) x
              GROUP BY organization_id, chunk) y;
      ELSE
        PERFORM pg_notify('pourgate_live_readings', json_build_object('o', org, 'k', 'changed', 'ids', ids)::text)
        FROM (SELECT organization_id AS org, array_agg(id) AS ids
              FROM (SELECT n.organization_id, n.id, (row_number() OVER (PARTITION BY n.organization_id) - 1) / 100 AS chunk
                    FROM new_rows n JOIN old_rows o ON o.id = n.id
                    WHERE n.status IS DISTINCT FROM o.status OR n.review_decision IS DISTINCT FROM o.review_decision) x
              GROUP BY organization_id, chunk) y;
      END IF;
      RETURN NULL;
    END $$`);
  await knex.raw('CREATE TRIGGER readings_live_insert AFTER INSERT ON readings REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION pourgate_live_readings()');
  await knex.raw('CREATE TRIGGER readings_live_update AFTER UPDATE ON readings REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION pourgate_live_readings()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS readings_live_update ON readings');
  await knex.raw('DROP TRIGGER IF EXISTS readings_live_insert ON readings');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_live_readings()');
}
