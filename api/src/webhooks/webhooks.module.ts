import { BullModule } from '@nestjs/bull';
import { DynamicModule, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Env } from '../config/env.js';
import { workerEnabled } from '../config/process-role.js';
import { DeliveryProcessor } from './delivery.processor.js';
import { DeliveryFailed, WEBHOOK_BACKOFF, WEBHOOK_QUEUE } from './webhooks.constants.js';
import { WebhookDeliveriesController, WebhookEndpointsController } from './webhooks.controller.js';
import { WebhooksRepository } from './webhooks.repository.js';
import { WebhooksService } from './webhooks.service.js';

@Module({})
export class WebhooksModule {
  static forRoot(): DynamicModule {
    return {
      module: WebhooksModule,
      imports: [
        BullModule.registerQueueAsync({
          name: WEBHOOK_QUEUE,
          inject: [ConfigService],
          useFactory: (_config: ConfigService<Env, true>) => ({
            settings: {
              // the processor computes each wait (schedule, jitter, Retry-After) and hands it over
              backoffStrategies: { [WEBHOOK_BACKOFF]: (_attempts: number, err: Error) => (err instanceof DeliveryFailed ? err.delayMs : 1000) },
            },
          }),
        }),
      ],
      controllers: [WebhookEndpointsController, WebhookDeliveriesController],
      providers: [WebhooksRepository, WebhooksService, ...(workerEnabled() ? [DeliveryProcessor] : [])],
      exports: [WebhooksService],
    };
  }
}
