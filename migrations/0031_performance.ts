import type { Knex } from 'knex';

/**
 * What keeps the review queue and the outbox flat as the tables grow.
 *
 * 1. `readings.reason_codes`: the codes of a verdict's reasons as a text array, written with the
 *    verdict (ReadingsRepository.setVerdict), backfilled here, with a GIN index over the readings
 *    that have any. The review list's reason filter is `reason_codes @> ARRAY[code]` on it instead
 *    of reading every `reasons` document from the heap.
 * 2. `reading_rejection_counts`: per organization, how many readings are rejected and how many of
 *    those are still open (no review decision), in total (reason_code '') and per reason code. The
 *    review list's total and the overview's open rejections read one row instead of counting the
 *    rows. Kept by triggers, so every writer (judge, review, imports, SQL by hand) keeps it exact:
 *    updates and deletes by deferred row triggers, so the counter rows are locked at commit, last and
 *    for the shortest time, in one order ('' first, then codes sorted), which cannot deadlock with the
 *    batch and reading locks the judge and the review take before; inserts (pending, except SQL by
 *    hand) by a statement trigger.
 * 3. `api_keys`: a NOTIFY on `pourgate_api_keys` with the key's id at the commit of any change to a
 *    key (revoke, rotation, scopes, expiry, or SQL by hand), so each API process drops its cached
 *    principal (api-keys/principal-cache.ts) whichever way the row changed.
 * 4. `events`: a NOTIFY on `pourgate_outbox` from the transaction that writes an event (delivered at
 *    commit), so the outbox relay wakes at once instead of at its next poll.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE readings ADD COLUMN reason_codes text[] NOT NULL DEFAULT '{}'`);
  await knex.raw(`
    UPDATE readings SET reason_codes = coalesce((SELECT array_agg(DISTINCT x->>'code' ORDER BY x->>'code') FROM jsonb_array_elements(reasons) x WHERE x->>'code' IS NOT NULL), '{}')
     WHERE jsonb_typeof(reasons) = 'array' AND jsonb_array_length(reasons) > 0`);
  // partial: the many readings with no reason add nothing to the index (nor to an insert's cost)
  await knex.raw(`CREATE INDEX readings_reason_codes_idx ON readings USING gin (reason_codes) WHERE reason_codes <> '{}'`);

  await knex.raw(`
    CREATE TABLE reading_rejection_counts (
      organization_id uuid NOT NULL REFERENCES organizations(id) ON DELETE CASCADE,
      reason_code text NOT NULL,
      rejected bigint NOT NULL DEFAULT 0,
      open bigint NOT NULL DEFAULT 0,
      PRIMARY KEY (organization_id, reason_code)
    )`);
  await knex.raw(`COMMENT ON TABLE reading_rejection_counts IS 'rejected readings per organization: reason_code '''' counts all, another row each code; open = no review decision yet (migration 0031)'`);
  await knex.raw(`
    CREATE FUNCTION pourgate_count_rejections() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.status = 'rejected' THEN
        INSERT INTO reading_rejection_counts AS c (organization_id, reason_code, rejected, open)
        SELECT OLD.organization_id, code, -1, CASE WHEN OLD.review_decision IS NULL THEN -1 ELSE 0 END
          FROM (SELECT DISTINCT unnest(array_prepend('', OLD.reason_codes)) AS code) k ORDER BY code
        ON CONFLICT (organization_id, reason_code) DO UPDATE SET rejected = c.rejected + excluded.rejected, open = c.open + excluded.open;
      END IF;
      IF TG_OP = 'UPDATE' AND NEW.status = 'rejected' THEN
        INSERT INTO reading_rejection_counts AS c (organization_id, reason_code, rejected, open)
        SELECT NEW.organization_id, code, 1, CASE WHEN NEW.review_decision IS NULL THEN 1 ELSE 0 END
          FROM (SELECT DISTINCT unnest(array_prepend('', NEW.reason_codes)) AS code) k ORDER BY code
        ON CONFLICT (organization_id, reason_code) DO UPDATE SET rejected = c.rejected + excluded.rejected, open = c.open + excluded.open;
      END IF;
      RETURN NULL;
    END $$`);
  // Readings are inserted pending by the API; rows inserted already rejected (SQL by hand, a seed)
  // are counted once per statement, one upsert per organization and code: a row trigger would update
  // the same counter row once per reading in one transaction, each update walking the chain of the
  // versions before it (quadratic; 100 000 rejected rows took minutes).
  await knex.raw(`
    CREATE FUNCTION pourgate_count_inserted_rejections() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO reading_rejection_counts AS c (organization_id, reason_code, rejected, open)
      SELECT organization_id, code, count(*), count(*) FILTER (WHERE review_decision IS NULL)
        FROM new_rows, LATERAL (SELECT DISTINCT unnest(array_prepend('', reason_codes)) AS code) k
       WHERE status = 'rejected'
       GROUP BY organization_id, code
       ORDER BY organization_id, code
      ON CONFLICT (organization_id, reason_code) DO UPDATE SET rejected = c.rejected + excluded.rejected, open = c.open + excluded.open;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER readings_count_rejections_insert AFTER INSERT ON readings REFERENCING NEW TABLE AS new_rows
    FOR EACH STATEMENT EXECUTE FUNCTION pourgate_count_inserted_rejections()`);
  // the WHEN clause keeps the function out of every update that changes nothing counted
  await knex.raw(`CREATE CONSTRAINT TRIGGER readings_count_rejections_update AFTER UPDATE ON readings DEFERRABLE INITIALLY DEFERRED
    FOR EACH ROW WHEN ((OLD.status = 'rejected' OR NEW.status = 'rejected')
      AND (OLD.status IS DISTINCT FROM NEW.status OR (OLD.review_decision IS NULL) <> (NEW.review_decision IS NULL)
           OR OLD.reason_codes IS DISTINCT FROM NEW.reason_codes OR OLD.organization_id IS DISTINCT FROM NEW.organization_id))
    EXECUTE FUNCTION pourgate_count_rejections()`);
  await knex.raw(`CREATE CONSTRAINT TRIGGER readings_count_rejections_delete AFTER DELETE ON readings DEFERRABLE INITIALLY DEFERRED
    FOR EACH ROW WHEN (OLD.status = 'rejected') EXECUTE FUNCTION pourgate_count_rejections()`);
  await knex.raw(`
    CREATE FUNCTION pourgate_reset_rejection_counts() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      DELETE FROM reading_rejection_counts;
      RETURN NULL;
    END $$`);
  await knex.raw('CREATE TRIGGER readings_count_rejections_truncate AFTER TRUNCATE ON readings FOR EACH STATEMENT EXECUTE FUNCTION pourgate_reset_rejection_counts()');
  await knex.raw(`
    INSERT INTO reading_rejection_counts (organization_id, reason_code, rejected, open)
    SELECT organization_id, code, count(*), count(*) FILTER (WHERE review_decision IS NULL)
      FROM readings, LATERAL (SELECT DISTINCT unnest(array_prepend('', reason_codes)) AS code) k
     WHERE status = 'rejected'
     GROUP BY organization_id, code`);

  await knex.raw(`
    CREATE FUNCTION pourgate_api_key_changed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_notify('pourgate_api_keys', OLD.id::text);
      RETURN NULL;
    END $$`);
  // every column a principal is made of or judged by; not last_used_at/ip, which each use writes
  await knex.raw(`CREATE TRIGGER api_keys_changed AFTER DELETE OR UPDATE OF organization_id, name, kind, environment, scopes, device_id, prefix, secret_hash, expires_at, grace_until, revoked_at
    ON api_keys FOR EACH ROW EXECUTE FUNCTION pourgate_api_key_changed()`);

  await knex.raw(`
    CREATE FUNCTION pourgate_outbox_notify() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_notify('pourgate_outbox', '');
      RETURN NULL;
    END $$`);
  // one notification per statement (and PostgreSQL folds identical ones of a transaction into one)
  await knex.raw('CREATE TRIGGER events_outbox_notify AFTER INSERT ON events FOR EACH STATEMENT EXECUTE FUNCTION pourgate_outbox_notify()');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS events_outbox_notify ON events');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_outbox_notify()');
  await knex.raw('DROP TRIGGER IF EXISTS api_keys_changed ON api_keys');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_api_key_changed()');
  for (const t of ['insert', 'update', 'delete', 'truncate']) await knex.raw(`DROP TRIGGER IF EXISTS readings_count_rejections_${t} ON readings`);
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_reset_rejection_counts()');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_count_inserted_rejections()');
  await knex.raw('DROP FUNCTION IF EXISTS pourgate_count_rejections()');
  await knex.raw('DROP TABLE IF EXISTS reading_rejection_counts');
  await knex.raw('DROP INDEX IF EXISTS readings_reason_codes_idx');
  await knex.raw('ALTER TABLE readings DROP COLUMN IF EXISTS reason_codes');
}
