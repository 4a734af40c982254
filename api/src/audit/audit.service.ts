import { Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { type AuditRow, AuditRepository } from './audit.repository.js';

export interface AuditEntry {
  organizationId: string | null;
  actorType: 'user' | 'api_key' | 'system' | 'anonymous';
  actorId?: string | null;
  actorLabel?: string | null;
  action: string;
  targetType?: string;
  targetId?: string;
  details?: Record<string, unknown>;
  ip?: string;
  userAgent?: string;
}

/** Who did what, when and from where. Written in the caller's transaction when one is given. */
@Injectable()
export class AuditService {
  constructor(private readonly repo: AuditRepository) {}

  async record(entry: AuditEntry, trx?: Knex.Transaction): Promise<void> {
    await this.repo.insert({
      organization_id: entry.organizationId,
      actor_type: entry.actorType,
      actor_id: entry.actorId ?? null,
      actor_label: entry.actorLabel ?? null,
      action: entry.action,
      target_type: entry.targetType ?? null,
      target_id: entry.targetId ?? null,
      details: JSON.stringify(entry.details ?? {}),
      ip: entry.ip ?? null,
      user_agent: entry.userAgent?.slice(0, 300) ?? null,
    }, trx);
  }

  /** One page of the organization's audit log, newest first unless asked otherwise. */
  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.list(c.principal.organizationId, q);
    return { rows: rows.map(auditEntryView), total };
  }
}

function auditEntryView(r: AuditRow) {
  return {
    id: String(r.id),
    createdAt: r.created_at,
    actorType: r.actor_type,
    actorId: r.actor_id,
    actorLabel: r.actor_label,
    action: r.action,
    targetType: r.target_type,
    targetId: r.target_id,
    details: r.details,
    ip: r.ip,
    userAgent: r.user_agent,
  };
}
