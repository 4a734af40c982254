import { InjectQueue } from '@nestjs/bull';
import { Controller, Get, Inject } from '@nestjs/common';
import { ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { HealthCheck, HealthCheckService, HealthIndicatorService } from '@nestjs/terminus';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { Public } from '../common/decorators/public.decorator.js';
import { KNEX } from '../database/database.module.js';
import { QUEUES } from '../queues/queues.module.js';
import { Responds } from '../common/schemas/responds.decorator.js';

function withTimeout<T>(p: Promise<T>, ms: number, what: string): Promise<T> {
  return Promise.race([p, new Promise<T>((_, reject) => setTimeout(() => reject(new Error(`${what} did not answer within ${ms} ms`)), ms).unref())]);
}

@ApiTags('health')
@Public()
@Controller()
export class HealthController {
  private readonly startedAt = new Date();

  constructor(
    private readonly health: HealthCheckService,
    private readonly indicator: HealthIndicatorService,
    @Inject(KNEX) private readonly db: Knex,
    @InjectQueue(QUEUES.heartbeat) private readonly queue: Queue,
  ) {}

  @Get('health')
  @ApiOperation({ summary: 'Liveness: the process answers', description: 'Never touches PostgreSQL or Redis.' })
  @Responds(200, 'health.view')
  alive() {
    return { status: 'ok', startedAt: this.startedAt.toISOString() };
  }

  @Get('ready')
  @HealthCheck()
  @ApiOperation({ summary: 'Readiness: PostgreSQL and Redis are reachable' })
  @ApiServiceUnavailableResponse({ description: 'A dependency is down (problem+json, with per-check details)' })
  @Responds(200, 'readiness.view')
  ready() {
    return this.health.check([
      async () => {
        const ind = this.indicator.check('postgres');
        try {
          await withTimeout(this.db.raw('select 1'), 2000, 'PostgreSQL');
          return ind.up();
        } catch (e) {
          return ind.down({ message: (e as Error).message });
        }
      },
      async () => {
        const ind = this.indicator.check('redis');
        try {
          const pong = await withTimeout(this.queue.client.ping(), 2000, 'Redis');
          return pong === 'PONG' ? ind.up() : ind.down({ message: `unexpected reply ${pong}` });
        } catch (e) {
          return ind.down({ message: (e as Error).message });
        }
      },
    ]);
  }
}
