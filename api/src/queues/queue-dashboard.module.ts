import { Module } from '@nestjs/common';
import { QueueDashboardController } from './queue-dashboard.controller.js';
import { QueueDashboardService } from './queue-dashboard.service.js';

/** The pass for the queue dashboard (the dashboard itself is mounted on Fastify by queue-dashboard.ts). */
@Module({ controllers: [QueueDashboardController], providers: [QueueDashboardService], exports: [QueueDashboardService] })
export class QueueDashboardModule {}
