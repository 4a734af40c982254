import { InjectQueue } from '@nestjs/bull';
import { Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Queue } from 'bull';
import type { Env } from '../config/env.js';
import { plannedJobs, SCHEDULE_QUEUE, staleRepeats } from './schedules.js';

/**
 * Worker processes: registers the periodic jobs at boot. Registering is idempotent (a fixed job id
 * per job), so N workers registering the same plan leave one schedule; entries the plan no longer
 * holds are removed, so the workers of one deployment must share these settings.
 */
@Injectable()
export class ScheduleService implements OnApplicationBootstrap {
  private readonly log = new Logger('schedule');

  constructor(@InjectQueue(SCHEDULE_QUEUE) private readonly queue: Queue, private readonly config: ConfigService<Env, true>) {}

  async onApplicationBootstrap(): Promise<void> {
    const c = this.config;
    const plan = plannedJobs({
      OUTBOX_RELAY: c.get('OUTBOX_RELAY', { infer: true }),
      NOTIFICATIONS: c.get('NOTIFICATIONS', { infer: true }),
      SMTP_URL: c.get('SMTP_URL', { infer: true }),
      NOTIFY_INTERVAL_MS: c.get('NOTIFY_INTERVAL_MS', { infer: true }),
      NOTIFY_DIGEST_CRON: c.get('NOTIFY_DIGEST_CRON', { infer: true }),
      NOTIFY_DIGEST_TZ: c.get('NOTIFY_DIGEST_TZ', { infer: true }),
      NOTIFY_DIGEST_INTERVAL_MS: c.get('NOTIFY_DIGEST_INTERVAL_MS', { infer: true }),
    });
    if (c.get('NOTIFICATIONS', { infer: true }) !== 'off' && !c.get('SMTP_URL', { infer: true })) this.log.warn('SMTP_URL is not set: rejection e-mails wait until a mail server is configured');
    try {
      for (const stale of staleRepeats(await this.queue.getRepeatableJobs(), plan)) await this.queue.removeRepeatableByKey(stale.key);
      for (const job of plan) {
        await this.queue.add(job.name, {}, { jobId: job.name, repeat: job.repeat, removeOnComplete: true, removeOnFail: 100, attempts: 1 });
      }
      this.log.log(`periodic jobs: ${plan.map((j) => `${j.name} (${'every' in j.repeat ? `every ${j.repeat.every} ms` : `${j.repeat.cron} ${j.repeat.tz}`})`).join(', ')}`);
    } catch (e) {
      // Redis away at boot: the schedule registered by an earlier boot (or another worker) still runs
      this.log.warn(`periodic jobs not registered now: ${(e as Error).message}`);
    }
  }
}
