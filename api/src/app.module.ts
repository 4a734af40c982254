import { DynamicModule, Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { ConfigModule } from '@nestjs/config';
import { ApiKeysModule } from './api-keys/api-keys.module.js';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { IdempotencyInterceptor } from './common/idempotency/idempotency.interceptor.js';
import { ProblemsController } from './common/problems.controller.js';
import { validateEnv } from './config/env.js';
import { workerEnabled } from './config/process-role.js';
import { DevicesModule } from './devices/devices.module.js';
import { BatchesModule } from './batches/batches.module.js';
import { ControlModule } from './control/control.module.js';
import { DocumentsModule } from './documents/documents.module.js';
import { ImportsModule } from './imports/imports.module.js';
import { LotsModule } from './lots/lots.module.js';
import { MaterialsModule } from './materials/materials.module.js';
import { MoldsModule } from './molds/molds.module.js';
import { OverviewModule } from './overview/overview.module.js';
import { QcCupTestsModule } from './qc-cup-tests/qc-cup-tests.module.js';
import { ReadingsModule } from './readings/readings.module.js';
import { LiveModule } from './live/live.module.js';
import { TargetsModule } from './targets/targets.module.js';
import { WorkOrdersModule } from './work-orders/work-orders.module.js';
import { PartsModule } from './parts/parts.module.js';
import { EventsModule } from './events/events.module.js';
import { WebhooksModule } from './webhooks/webhooks.module.js';
import { ScheduleModule } from './schedule/schedule.module.js';
import { DatabaseModule } from './database/database.module.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { HeartbeatProcessor } from './queues/heartbeat.processor.js';
import { QueuesModule } from './queues/queues.module.js';
import { QueueDashboardModule } from './queues/queue-dashboard.module.js';
import { UsersModule } from './users/users.module.js';

/**
 * The application. Built by a function rather than at import time, so the environment (and the
 * process role) are read when the app is created: tests can start apps with different settings.
 */
@Module({})
export class AppModule {
  static forRoot(): DynamicModule {
    const webhooks = WebhooksModule.forRoot();
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnv }),
        DatabaseModule,
        QueuesModule,
        MailModule,
        AuditModule,
        UsersModule,
        ApiKeysModule,
        AuthModule,
        DevicesModule,
        MaterialsModule,
        DocumentsModule,
        LotsModule,
        MoldsModule,
        WorkOrdersModule,
        PartsModule,
        TargetsModule,
        BatchesModule,
        ReadingsModule,
        LiveModule,
        ControlModule,
        ImportsModule,
        QcCupTestsModule,
        EventsModule,
        webhooks,
        ScheduleModule.forRoot(webhooks),
        QueueDashboardModule,
        OverviewModule,
        HealthModule,
      ],
      controllers: [ProblemsController],
      providers: [{ provide: APP_INTERCEPTOR, useClass: IdempotencyInterceptor }, ...(workerEnabled() ? [HeartbeatProcessor] : [])],
    };
  }
}
