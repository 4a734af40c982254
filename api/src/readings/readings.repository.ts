import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash } from 'node:crypto';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';
import type { FindingFacts, ReadingQuantity, ReadingSubject } from '@pourgate/batching';

export const readingsListSpec: ListSpec = {
  resource: 'readings',
  sortable: ['receivedAt', 'deviceTime', 'status', 'judgedAt'],
  filters: { status: 'eq', batchId: 'eq', deviceId: 'eq', quantity: 'eq', subject: 'eq', reasonCode: 'eq', reviewed: 'bool', receivedAfter: 'gte', receivedBefore: 'lte', id: 'in' },
  defaultSort: ['receivedAt', 'DESC'],
};
const columns = {
  receivedAt: 'readings.received_at', deviceTime: 'readings.device_time', quantity: 'readings.quantity', subject: 'readings.subject', status: 'readings.status', judgedAt: 'readings.judged_at', batchId: 'readings.batch_id', deviceId: 'readings.device_id',
  receivedAfter: 'readings.received_at', receivedBefore: 'readings.received_at', id: 'readings.id',
};

export interface ReadingRow {
  id: string;
  organization_id: string;
  batch_id: string;
  device_id: string;
  client_reading_id: string;
  quantity: ReadingQuantity;
  subject: ReadingSubject;
  value_si: number;
  unit_given: string;
  value_given: number;
  stable: boolean;
  device_time: Date | null;
  received_at: Date;
  skew_seconds: number | null;
  status: 'pending' | 'accepted' | 'rejected' | 'unused';
  reasons: { code: string; message: string; measured: number | null; limit: number | null; unit: string | null; facts?: FindingFacts }[];
  judged_at: Date | null;
  review_decision: 'waive' | 'uphold' | null;
  review_note: string | null;
  reviewed_by: string | null;
  reviewed_by_label: string | null;
  reviewed_at: Date | null;
}

/** What an insert returns of a new reading. */
export type InsertedReading = Pick<ReadingRow, 'id' | 'status' | 'device_id' | 'client_reading_id'>;

export type NewReading = Omit<ReadingRow, 'id' | 'received_at' | 'status' | 'reasons' | 'judged_at' | 'review_decision' | 'review_note' | 'reviewed_by' | 'reviewed_by_label' | 'reviewed_at'>;

/** The column types of a new reading (insertIfOwned casts each value, as a SELECT list has no target types). */
const NEW_READING_TYPES: Record<keyof NewReading, string> = {
  organization_id: 'uuid', batch_id: 'uuid', device_id: 'uuid', client_reading_id: 'text', quantity: 'text', subject: 'text',
  value_si: 'float8', unit_given: 'text', value_given: 'float8', stable: 'boolean', device_time: 'timestamptz', skew_seconds: 'float8',
};
const NEW_READING_COLUMNS = Object.keys(NEW_READING_TYPES) as (keyof NewReading)[];

/** Every Knex query of readings. */
@Injectable()
export class ReadingsRepository {
  constructor(@Inject(KNEX) readonly db: Knex) {}

  /**
   * Inserts the readings whose (device, client reading id) is new, in one statement (and one more for
   * the replays): a bulk post costs two round trips, not two per reading. Results follow the input
   * order; a reading given twice in one post is stored once, the second answered as a replay of the
   * first. A new reading comes back as its id and status only (all its answer needs: parsing 1 000
   * whole rows cost more than the insert); a replay is read whole, as its answer shows it.
   */
  async insertMany(trx: Knex | Knex.Transaction, rows: NewReading[]): Promise<({ row: InsertedReading; created: true } | { row: ReadingRow; created: false })[]> {
    const key = (r: { device_id: string; client_reading_id: string }) => `${r.device_id}\u0000${r.client_reading_id}`;
    const fresh = new Map<string, InsertedReading>();
    for (let i = 0; i < rows.length; i += 1000) {
      const chunk = rows.slice(i, i + 1000);
      // one array per column (twelve parameters, not twelve per reading), prepared once per connection
      const { rows: inserted } = (await trx
        .raw(
          `INSERT INTO readings (${NEW_READING_COLUMNS.map(() => '??').join(', ')})
           SELECT * FROM unnest(${NEW_READING_COLUMNS.map((c) => `?::${NEW_READING_TYPES[c]}[]`).join(', ')})
           ON CONFLICT (device_id, client_reading_id) DO NOTHING RETURNING id, status, device_id, client_reading_id`,
          [...NEW_READING_COLUMNS, ...NEW_READING_COLUMNS.map((c) => chunk.map((r) => r[c] ?? null) as Knex.Value)],
        )
        .options({ name: preparedName('insert-many') })) as { rows: InsertedReading[] };
      for (const r of inserted) fresh.set(key(r), r);
    }
    const handedOut = new Set<string>();
    const isFirst = rows.map((r) => {
      const k = key(r);
      if (!fresh.has(k) || handedOut.has(k)) return false;
      handedOut.add(k);
      return true;
    });
    const replays = rows.filter((_, i) => !isFirst[i]);
    const existing = new Map<string, ReadingRow>();
    for (let i = 0; i < replays.length; i += 1000) {
      const found: ReadingRow[] = await trx('readings').whereIn(['device_id', 'client_reading_id'], replays.slice(i, i + 1000).map((r) => [r.device_id, r.client_reading_id])).select('*');
      for (const r of found) existing.set(key(r), r);
    }
    return rows.map((r, i) => (isFirst[i] ? { row: fresh.get(key(r))!, created: true as const } : { row: existing.get(key(r))!, created: false as const }));
  }

  /**
   * Inserts one new reading only when every `guards` query finds its row (the device and the batch
   * in the caller's organization), in one statement; undefined when a guard found nothing or the
   * (device, client reading id) exists already. `guardsShape` names what the guards are (the same
   * name must always mean the same guard queries): the statement is then prepared once on each
   * pooled connection, not parsed and planned again for every reading.
   */
  async insertIfOwned(row: NewReading, guards: Knex.Raw[], guardsShape: string): Promise<Pick<ReadingRow, 'id' | 'status'> | undefined> {
    const cols = Object.keys(row) as (keyof NewReading)[];
    const what = `insert-if-owned:${guardsShape}:${guards.length}:${cols.join(',')}`;
    let sql = insertIfOwnedSql.get(what);
    if (!sql) {
      const values = cols.map((c) => {
        const type = NEW_READING_TYPES[c];
        if (!type) throw new Error(`insertIfOwned: no column type for ${String(c)}`);
        return `?::${type}`;
      });
      // the column names are this file's own (NEW_READING_TYPES), quoted as identifiers
      sql = `INSERT INTO readings (${cols.map((c) => `"${c}"`).join(', ')}) SELECT ${values.join(', ')} WHERE ${guards.map(() => 'EXISTS (?)').join(' AND ')}
       ON CONFLICT (device_id, client_reading_id) DO NOTHING RETURNING id, status`;
      insertIfOwnedSql.set(what, sql);
    }
    const { rows } = (await this.db.raw(sql, [...cols.map((c) => row[c] as Knex.Value), ...guards]).options({ name: preparedName(what) })) as { rows: Pick<ReadingRow, 'id' | 'status'>[] };
    return rows[0];
  }

  find(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<ReadingRow | undefined> {
    return db('readings').where({ organization_id: orgId, id }).first();
  }

  async list(orgId: string, q: ListQuery) {
    const { reasonCode, reviewed, ...rest } = q.filter;
    const base = this.db('readings').where('readings.organization_id', orgId).select('readings.*');
    // the array column and its partial GIN index (migration 0031); the second condition names the index's predicate
    if (reasonCode !== undefined) base.whereRaw("readings.reason_codes @> ARRAY[?]::text[] AND readings.reason_codes <> '{}'", [String(reasonCode)]);
    // the open review queue: rejected and not yet waived or upheld
    if (reviewed === true) base.whereNotNull('readings.review_decision');
    if (reviewed === false) base.whereNull('readings.review_decision');
    return listPage<ReadingRow>(base, { ...q, filter: rest }, readingsListSpec, columns, undefined, this.rejectionTotal(orgId, q.filter));
  }

  /**
   * The review queue's total from the maintained counts (migration 0031) when the filter is one they
   * hold — rejected, optionally open or reviewed, optionally one reason code — so the list's cost does
   * not grow with the number of rejections; undefined otherwise (the list counts its rows).
   */
  private rejectionTotal(orgId: string, filter: Record<string, unknown>): (() => Promise<number>) | undefined {
    const { status, reviewed, reasonCode, ...other } = filter;
    if (status !== 'rejected' || Object.keys(other).length > 0) return undefined;
    if (reasonCode !== undefined && typeof reasonCode !== 'string') return undefined;
    return async () => {
      const row = await this.db('reading_rejection_counts').where({ organization_id: orgId, reason_code: reasonCode ?? '' }).first('rejected', 'open');
      const rejected = Number(row?.rejected ?? 0);
      const open = Number(row?.open ?? 0);
      return reviewed === true ? rejected - open : reviewed === false ? open : rejected;
    };
  }

  lockForJudging(trx: Knex.Transaction, id: string): Promise<ReadingRow | undefined> {
    return trx('readings').where({ id }).forUpdate().first();
  }

  /** The other part's latest stable mass received before this reading (ties broken by id), for the ratio. */
  otherPartMass(trx: Knex.Transaction, r: ReadingRow): Promise<number | null> {
    return this.latestMass(trx, r, r.subject === 'part_a' ? 'part_b' : 'part_a');
  }

  /** The latest stable, judged-or-pending mass of `subject` in the batch received before this reading. */
  async latestMass(trx: Knex.Transaction, r: ReadingRow, subject: ReadingSubject): Promise<number | null> {
    const row = await trx('readings')
      .where({ batch_id: r.batch_id, subject, quantity: 'mass', stable: true })
      .whereNot('status', 'unused')
      .where((q) => q.where('received_at', '<', r.received_at).orWhere((q2) => q2.where('received_at', r.received_at).where('id', '<', r.id)))
      .orderBy([{ column: 'received_at', order: 'desc' }, { column: 'id', order: 'desc' }])
      .first('value_si');
    return row ? Number(row.value_si) : null;
  }

  /**
   * When the latest `subject` milestone of the batch happened (device time when the device gave one),
   * among those that happened before this reading; null when there is none.
   */
  async milestoneTime(trx: Knex.Transaction, r: ReadingRow, subject: ReadingSubject): Promise<Date | null> {
    const at = r.device_time ?? r.received_at;
    const row = await trx('readings')
      .where({ batch_id: r.batch_id, subject, quantity: 'milestone' })
      .whereNot('id', r.id)
      .whereRaw('coalesce(device_time, received_at) <= ?', [at])
      .orderByRaw('coalesce(device_time, received_at) desc, id desc')
      .first(trx.raw('coalesce(device_time, received_at) as at'));
    return row ? new Date(row.at) : null;
  }

  async setVerdict(trx: Knex.Transaction, id: string, status: string, reasons: unknown[], valueSi?: number) {
    // the codes as an indexed array beside the reasons (the review list filters on it), in the same statement
    const codes = [...new Set((reasons as { code?: unknown }[]).map((r) => r?.code).filter((c): c is string => typeof c === 'string'))].sort();
    await trx('readings').where({ id }).update({ status, reasons: JSON.stringify(reasons), reason_codes: codes, judged_at: trx.fn.now(), ...(valueSi === undefined ? {} : { value_si: valueSi }) });
  }

  async setReview(trx: Knex.Transaction, id: string, review: { decision: string; note: string | null; by: string; label: string }) {
    await trx('readings').where({ id }).update({ review_decision: review.decision, review_note: review.note, reviewed_by: review.by, reviewed_by_label: review.label, reviewed_at: trx.fn.now() });
  }

  /**
   * For the release check: each (quantity, subject) of the batch with its latest judged reading
   * (unstable ones set aside), whether one is still pending, and the rejections not waived.
   */
  /**
   * What was weighed for a batch: the latest settled, judged (not `unused`) mass of each part, and how
   * many readings the batch has, how many rejected.
   */
  async weighed(db: Knex | Knex.Transaction, orgId: string, batchId: string) {
    const latest: { subject: ReadingSubject; value_si: number; id: string; received_at: Date }[] = await db('readings')
      .where({ organization_id: orgId, batch_id: batchId, quantity: 'mass', stable: true })
      .whereIn('status', ['accepted', 'rejected'])
      .distinctOn('subject')
      .orderBy([{ column: 'subject' }, { column: 'received_at', order: 'desc' }, { column: 'id', order: 'desc' }])
      .select('subject', 'value_si', 'id', 'received_at');
    const [counts] = await db('readings')
      .where({ organization_id: orgId, batch_id: batchId })
      .select(db.raw('count(*)::int AS total'), db.raw("count(*) FILTER (WHERE status = 'rejected')::int AS rejected"));
    return { latest, total: Number(counts?.total ?? 0), rejected: Number(counts?.rejected ?? 0) };
  }

  async releaseFacts(trx: Knex | Knex.Transaction, orgId: string, batchId: string) {
    const latest: { quantity: ReadingQuantity; subject: ReadingSubject; status: 'accepted' | 'rejected'; review_decision: 'waive' | 'uphold' | null }[] = await trx('readings')
      .where({ organization_id: orgId, batch_id: batchId })
      .whereIn('status', ['accepted', 'rejected'])
      .distinctOn('quantity', 'subject')
      .orderBy([{ column: 'quantity' }, { column: 'subject' }, { column: 'received_at', order: 'desc' }, { column: 'id', order: 'desc' }])
      .select('quantity', 'subject', 'status', 'review_decision');
    const pending: { quantity: ReadingQuantity; subject: ReadingSubject }[] = await trx('readings').where({ organization_id: orgId, batch_id: batchId, status: 'pending' }).distinct('quantity', 'subject');
    const open = await trx('readings').where({ organization_id: orgId, batch_id: batchId, status: 'rejected' }).where((q) => q.whereNull('review_decision').orWhere('review_decision', 'uphold')).count({ n: '*' });
    return { latest, pending, openRejections: Number(open[0]!.n) };
  }

  /** Pending readings received before `olderThanMs` ago, oldest first, a page at a time after `after`. */
  stalePending(olderThanMs: number, limit = 500, after?: { received_at: Date; id: string }): Promise<{ id: string; received_at: Date }[]> {
    const q = this.db('readings').where('status', 'pending').where('received_at', '<', new Date(Date.now() - olderThanMs));
    if (after) q.whereRaw('(received_at, id) > (?, ?)', [after.received_at, after.id]);
    return q.orderBy([{ column: 'received_at' }, { column: 'id' }]).limit(limit).select('id', 'received_at');
  }
}

const preparedNames = new Map<string, string>();
const insertIfOwnedSql = new Map<string, string>();

/** A short, stable name for a prepared statement (pg checks that one name always carries the same text). */
function preparedName(what: string): string {
  let name = preparedNames.get(what);
  if (!name) preparedNames.set(what, (name = `readings_${createHash('sha256').update(what).digest('hex').slice(0, 24)}`));
  return name;
}
