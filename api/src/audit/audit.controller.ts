import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { auditListSpec as spec } from './audit.repository.js';
import { AuditService } from './audit.service.js';

@ApiTags('audit')
@Controller('audit-events')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Requires('audit:read')
  @ListRoute(spec, 'audit-entry.view')
  @ApiOperation({ summary: 'The audit log: sign-ins, invitations, role changes, keys, review decisions' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, spec);
    const { rows, total } = await this.audit.list(c, q);
    setContentRange(reply, spec.resource, q, rows.length, total);
    return rows;
  }
}
