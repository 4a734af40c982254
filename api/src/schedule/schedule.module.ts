import { BullModule } from '@nestjs/bull';
import { DynamicModule, Module } from '@nestjs/common';
import { workerEnabled } from '../config/process-role.js';
import { OutboxRelayModule } from '../events/outbox-relay.module.js';
import { ImportsModule } from '../imports/imports.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { ReadingsModule } from '../readings/readings.module.js';
import { PeriodicProcessor } from './periodic.processor.js';
import { ScheduleService } from './schedule.service.js';
import { SCHEDULE_QUEUE } from './schedules.js';

/**
 * The one place periodic jobs are scheduled and run (worker processes; the queue itself is
 * registered everywhere, so the dashboard shows it). Also brings in the outbox relay, which needs
 * the application's webhooks module.
 */
@Module({})
export class ScheduleModule {
  static forRoot(webhooks: DynamicModule): DynamicModule {
    return {
      module: ScheduleModule,
      imports: [BullModule.registerQueue({ name: SCHEDULE_QUEUE }), ReadingsModule, ImportsModule, NotificationsModule, OutboxRelayModule.forRoot(webhooks)],
      providers: workerEnabled() ? [ScheduleService, PeriodicProcessor] : [],
    };
  }
}
