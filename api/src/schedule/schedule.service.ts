import { InjectQueue } from '@nestjs/bull';
import { Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Queue } from 'bull';
import type { Env } from '../config/env.js';
import { plannedJobs, SCHEDULE_QUEUE, staleRepeats } from './schedules.js';

/**
 * Worker processes: registers the periodic jobs at boot. Registering is idempotent (a fixed job id
 * per job), so N workers registering the same plan leave one schedule; entries the plan no longer
 * holds are removed, so the workers of one deployment must share these settings.
 *
 * The schedule lives in Redis: a Redis that comes back empty has forgotten it, and with it the sweep
 * that re-queues what Redis lost. So the plan is registered again whenever the queue's connection
 * becomes ready, and checked every REGISTER_CHECK_MS (registering is idempotent and cheap).
 */
const REGISTER_CHECK_MS = 30_000;

@Injectable()
export class ScheduleService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly log = new Logger('schedule');
  private timer?: NodeJS.Timeout;
  private readonly onReady = () => void this.register(false);

  constructor(
    @InjectQueue(SCHEDULE_QUEUE) private readonly queue: Queue,
    private readonly config: ConfigService<Env, true>,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    await this.register(true);
    this.queue.client.on('ready', this.onReady);
    this.timer = setInterval(() => void this.register(false), REGISTER_CHECK_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
    this.queue.client.off('ready', this.onReady);
  }

  private async register(atBoot: boolean): Promise<void> {
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
    if (atBoot && c.get('NOTIFICATIONS', { infer: true }) !== 'off' && !c.get('SMTP_URL', { infer: true }))
      this.log.warn('SMTP_URL is not set: rejection e-mails wait until a mail server is configured');
    try {
      const registered = await this.queue.getRepeatableJobs();
      const stale = staleRepeats(registered, plan);
      for (const r of stale) await this.queue.removeRepeatableByKey(r.key);
      // after boot, only a plan that Redis lost (a job missing) or that changed is registered again
      if (!atBoot && stale.length === 0 && plan.every((job) => registered.some((r) => r.name === job.name))) return;
      for (const job of plan) {
        await this.queue.add(job.name, {}, { jobId: job.name, repeat: job.repeat, removeOnComplete: true, removeOnFail: 100, attempts: 1 });
      }
      // Redis came back without the plan, so probably without the jobs it held: the sweeps run now
      // rather than at their next period (up to 30 s later); a sweep run twice queues nothing twice
      if (!atBoot) for (const job of plan.filter((j) => j.recovers)) await this.queue.add(job.name, { recovery: true }, { removeOnComplete: true, removeOnFail: 100, attempts: 1 });
      this.log.log(
        `periodic jobs${atBoot ? '' : ' registered again'}: ${plan.map((j) => `${j.name} (${'every' in j.repeat ? `every ${j.repeat.every} ms` : `${j.repeat.cron} ${j.repeat.tz}`})`).join(', ')}`,
      );
    } catch (e) {
      // Redis away at boot: the schedule registered by an earlier boot (or another worker) still runs
      if (atBoot) this.log.warn(`periodic jobs not registered now: ${(e as Error).message}`);
    }
  }
}
