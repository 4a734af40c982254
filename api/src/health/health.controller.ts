import { Controller, Get } from '@nestjs/common';
import { ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { HealthCheck, HealthCheckService, HealthIndicatorService } from '@nestjs/terminus';
import { Public } from '../common/decorators/public.decorator.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { ReadinessService } from './readiness.service.js';

@ApiTags('health')
@Public()
@Controller()
export class HealthController {
  private readonly startedAt = new Date();

  constructor(
    private readonly health: HealthCheckService,
    private readonly indicator: HealthIndicatorService,
    private readonly readiness: ReadinessService,
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
          await this.readiness.postgres();
          return ind.up();
        } catch (e) {
          return ind.down({ message: (e as Error).message });
        }
      },
      async () => {
        const ind = this.indicator.check('redis');
        try {
          await this.readiness.redis();
          return ind.up();
        } catch (e) {
          return ind.down({ message: (e as Error).message });
        }
      },
    ]);
  }
}
