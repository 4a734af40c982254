import { BullModule } from '@nestjs/bull';
import { Module } from '@nestjs/common';
import { TerminusModule } from '@nestjs/terminus';
import { QUEUES } from '../queues/queues.module.js';
import { HealthController } from './health.controller.js';
import { ReadinessService } from './readiness.service.js';

@Module({
  imports: [TerminusModule.forRoot({ logger: false }), BullModule.registerQueue({ name: QUEUES.heartbeat })],
  controllers: [HealthController],
  providers: [ReadinessService],
})
export class HealthModule {}
