import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { malformed } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import type { EventType } from './event-types.js';

export interface NewEvent {
  organizationId: string;
  type: EventType;
  subjectType: string;
  subjectId: string;
  data: Record<string, unknown>;
}

/** What receivers get (webhook body) and what the feed lists: the same envelope. */
export interface EventEnvelope {
  id: string;
  type: EventType;
  occurredAt: string;
  subject: { type: string; id: string };
  data: Record<string, unknown>;
}

interface EventRow {
  seq: number;
  id: string;
  organization_id: string;
  type: EventType;
  subject_type: string;
  subject_id: string;
  payload: Record<string, unknown>;
  occurred_at: Date;
  txid: string;
}

export function envelope(r: Pick<EventRow, 'id' | 'type' | 'occurred_at' | 'subject_type' | 'subject_id' | 'payload'>): EventEnvelope {
  return { id: r.id, type: r.type, occurredAt: new Date(r.occurred_at).toISOString(), subject: { type: r.subject_type, id: r.subject_id }, data: r.payload };
}

const encodeCursor = (txid: string, seq: number) => Buffer.from(`${txid}.${seq}`).toString('base64url');
function decodeCursor(cursor: string): { txid: string; seq: number } {
  const m = /^(\d+)\.(\d+)$/.exec(Buffer.from(cursor, 'base64url').toString('utf8'));
  if (!m) throw malformed('The "after" cursor is not one this feed handed out.', [{ pointer: '/after', detail: 'is not a valid cursor', code: 'format' }]);
  return { txid: m[1], seq: Number(m[2]) };
}

/**
 * The transactional outbox. `emit` writes in the caller's transaction, so an event exists exactly
 * when the state change it describes committed. The relay turns rows into webhook deliveries.
 */
@Injectable()
export class EventsService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async emit(trx: Knex.Transaction, e: NewEvent): Promise<{ id: string; seq: number }> {
    const [row] = await trx('events')
      .insert({ organization_id: e.organizationId, type: e.type, subject_type: e.subjectType, subject_id: e.subjectId, payload: JSON.stringify(e.data) })
      .returning(['id', 'seq']);
    return row;
  }

  /**
   * Keyset feed ordered by (writing transaction, seq), showing only transactions older than every
   * one still running: a row can never appear later behind a cursor already handed out.
   */
  async feed(orgId: string, after: string | undefined, limit: number, types?: string[]) {
    const q = this.db<EventRow>('events')
      .where({ organization_id: orgId })
      .whereRaw('txid < pg_snapshot_xmin(pg_current_snapshot())')
      .orderBy([{ column: 'txid' }, { column: 'seq' }])
      .limit(limit + 1)
      .select('seq', 'id', 'type', 'subject_type', 'subject_id', 'payload', 'occurred_at', this.db.raw('txid::text as txid'));
    if (after) {
      const c = decodeCursor(after);
      q.whereRaw('(txid, seq) > (?::xid8, ?)', [c.txid, c.seq]);
    }
    if (types?.length) q.whereIn('type', types);
    const rows = (await q) as unknown as EventRow[];
    const page = rows.slice(0, limit);
    const last = page.at(-1);
    return {
      events: page.map(envelope),
      next: last ? encodeCursor(last.txid, last.seq) : (after ?? null),
      hasMore: rows.length > limit,
    };
  }
}
