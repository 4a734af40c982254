import { DynamicModule, Module } from '@nestjs/common';
import { workerEnabled } from '../config/process-role.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { OutboxRelay } from './outbox-relay.service.js';

/**
 * The relay from the outbox (events) to webhook deliveries and e-mail notices: worker processes
 * only. It is given the application's own webhooks module (a dynamic module: importing a second
 * `WebhooksModule.forRoot()` would register its routes twice).
 */
@Module({})
export class OutboxRelayModule {
  static forRoot(webhooks: DynamicModule): DynamicModule {
    return {
      module: OutboxRelayModule,
      imports: [NotificationsModule, webhooks],
      providers: workerEnabled() ? [OutboxRelay] : [],
      exports: workerEnabled() ? [OutboxRelay] : [],
    };
  }
}
