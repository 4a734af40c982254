import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.module.js';

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
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async record(entry: AuditEntry, trx?: Knex.Transaction): Promise<void> {
    await (trx ?? this.db)('audit_events').insert({
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
    });
  }
}
