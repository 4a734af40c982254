import { Controller, HttpCode, Post, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Requires } from '../auth/requires.decorator.js';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { QueueDashboardService } from './queue-dashboard.service.js';

@ApiTags('admin')
@Controller('admin/queue-sessions')
export class QueueDashboardController {
  constructor(private readonly dashboard: QueueDashboardService) {}

  @Post()
  @HttpCode(201)
  @Requires('queues:read')
  @ApiOperation({
    summary: 'A pass to the queue dashboard (admins)',
    description: 'Sets an HttpOnly cookie, valid 15 minutes on /queues only, that lets this browser open the queue dashboard (waiting, active, delayed and failed jobs of every queue, read-only).',
  })
  @Responds(201, 'queue-dashboard.session', { headers: { 'Set-Cookie': { description: 'pourgate_queues=…; Path=/queues; HttpOnly; SameSite=Strict' } } })
  open(@Caller() c: RequestContext, @Res({ passthrough: true }) reply: FastifyReply) {
    const pass = this.dashboard.issue(c.principal.id);
    reply.header('set-cookie', pass.cookie);
    reply.header('cache-control', 'no-store');
    return { url: pass.url, expiresAt: pass.expiresAt };
  }
}
