import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Env } from '../config/env.js';
import { NotificationsService } from './notifications.service.js';

/** Worker processes: sends one-by-one notices every second or so, digests on their own interval. */
@Injectable()
export class NotificationsSender implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly log = new Logger('notifications');
  private timers: NodeJS.Timeout[] = [];
  private busy = false;
  private stopped = false;

  constructor(private readonly notices: NotificationsService, private readonly config: ConfigService<Env, true>) {}

  onApplicationBootstrap(): void {
    if (this.config.get('NOTIFICATIONS', { infer: true }) === 'off') return;
    // with no mail server configured the notices wait (they are not consumed into the log)
    if (!this.config.get('SMTP_URL', { infer: true })) {
      this.log.warn('SMTP_URL is not set: rejection e-mails wait until a mail server is configured');
      return;
    }
    const guard = (f: () => Promise<unknown>) => async () => {
      if (this.busy || this.stopped) return;
      this.busy = true;
      try {
        await f();
      } catch (e) {
        this.log.warn(`sending paused: ${(e as Error).message}`);
      } finally {
        this.busy = false;
      }
    };
    this.timers.push(setInterval(guard(async () => { while (!this.stopped && (await this.notices.sendEach()) > 0); }), this.config.get('NOTIFY_INTERVAL_MS', { infer: true })));
    this.timers.push(setInterval(guard(() => this.notices.sendDigests()), this.config.get('NOTIFY_DIGEST_INTERVAL_MS', { infer: true })));
    for (const t of this.timers) t.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    for (const t of this.timers) clearInterval(t);
    while (this.busy) await new Promise((r) => setTimeout(r, 20));
  }
}
