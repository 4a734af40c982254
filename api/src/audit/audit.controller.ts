import { Controller, Get, Inject, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import type { Knex } from 'knex';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { listPage } from '../common/lists/knex-list.js';
import { ListRoute, ListSpec, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';
import { Responds } from '../common/schemas/responds.decorator.js';

const spec: ListSpec = {
  resource: 'audit-events',
  sortable: ['createdAt', 'action', 'id'],
  filters: { action: 'eq', actorId: 'eq', actorType: 'eq', targetId: 'eq', createdAt_gte: 'gte', createdAt_lte: 'lte' },
  defaultSort: ['createdAt', 'DESC'],
};
const columns = { createdAt: 'created_at', actorId: 'actor_id', actorType: 'actor_type', targetId: 'target_id', createdAt_gte: 'created_at', createdAt_lte: 'created_at' };

interface AuditRow {
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

@ApiTags('audit')
@Controller('audit-events')
export class AuditController {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  @Get()
  @Requires('audit:read')
  @ListRoute(spec, 'audit-entry.view')
  @ApiOperation({ summary: 'The audit log: sign-ins, invitations, role changes, keys, review decisions' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, spec);
    const { rows, total } = await listPage<AuditRow>(this.db('audit_events').where({ organization_id: c.principal.organizationId }), q, spec, columns);
    setContentRange(reply, spec.resource, q, rows.length, total);
    return rows.map((r) => ({
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
    }));
  }
}
