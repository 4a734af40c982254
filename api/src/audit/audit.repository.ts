import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';

export const auditListSpec: ListSpec = {
  resource: 'audit-events',
  sortable: ['createdAt', 'action', 'id'],
  filters: {
    action: 'eq',
    actorId: 'eq',
    actorType: { kind: 'eq', values: ['user', 'api_key', 'system', 'anonymous'] },
    // targets are people, keys, devices ... and a few non-uuid names
    targetId: { kind: 'eq', type: 'string' },
    createdAt_gte: { kind: 'gte', type: 'date-time' },
    createdAt_lte: { kind: 'lte', type: 'date-time' },
  },
  defaultSort: ['createdAt', 'DESC'],
};
const columns = { createdAt: 'created_at', actorId: 'actor_id', actorType: 'actor_type', targetId: 'target_id', createdAt_gte: 'created_at', createdAt_lte: 'created_at' };

export interface AuditRow {
  id: number;
  created_at: Date;
  actor_type: string;
  actor_id: string | null;
  actor_label: string | null;
  action: string;
  target_type: string | null;
  target_id: string | null;
  details: Record<string, unknown>;
  ip: string | null;
  user_agent: string | null;
}

export type AuditInsert = Omit<AuditRow, 'id' | 'created_at' | 'details'> & { organization_id: string | null; details: string };

/** The audit_events table: appended to in the caller's transaction, read as a list. */
@Injectable()
export class AuditRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async insert(row: AuditInsert, trx?: Knex.Transaction): Promise<void> {
    await (trx ?? this.db)('audit_events').insert(row);
  }

  list(organizationId: string, q: ListQuery): Promise<{ rows: AuditRow[]; total: number | null }> {
    return listPage<AuditRow>(this.db('audit_events').where({ organization_id: organizationId }), q, auditListSpec, columns);
  }
}
