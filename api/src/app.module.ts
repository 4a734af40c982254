import { DynamicModule, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { ApiKeysModule } from './api-keys/api-keys.module.js';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { ProblemsController } from './common/problems.controller.js';
import { validateEnv } from './config/env.js';
import { workerEnabled } from './config/process-role.js';
import { DevicesModule } from './devices/devices.module.js';
import { DatabaseModule } from './database/database.module.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { HeartbeatProcessor } from './queues/heartbeat.processor.js';
import { QueuesModule } from './queues/queues.module.js';
import { UsersModule } from './users/users.module.js';

/**
 * The application. Built by a function rather than at import time, so the environment (and the
 * process role) are read when the app is created: tests can start apps with different settings.
 */
@Module({})
export class AppModule {
  static forRoot(): DynamicModule {
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
        HealthModule,
      ],
      controllers: [ProblemsController],
      providers: [...(workerEnabled() ? [HeartbeatProcessor] : [])],
    };
  }
}
