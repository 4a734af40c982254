import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { ProblemsController } from './common/problems.controller.js';
import { validateEnv } from './config/env.js';
import { DatabaseModule } from './database/database.module.js';
import { HealthModule } from './health/health.module.js';
import { HeartbeatProcessor } from './queues/heartbeat.processor.js';
import { QueuesModule } from './queues/queues.module.js';
import { workerEnabled } from './config/process-role.js';

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnv }),
    DatabaseModule,
    QueuesModule,
    HealthModule,
  ],
  controllers: [ProblemsController],
  providers: [...(workerEnabled() ? [HeartbeatProcessor] : [])],
})
export class AppModule {}
