import { OnQueueFailed, Process, Processor } from '@nestjs/bull';
import { BeforeApplicationShutdown, Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { OutboxRelay } from '../events/outbox-relay.service.js';
import { ImportsService } from '../imports/imports.service.js';
import { NotificationsService } from '../notifications/notifications.service.js';
import { SWEEP_AFTER_MS } from '../readings/readings.constants.js';
import { ReadingsService } from '../readings/readings.service.js';
import { SCHEDULE_QUEUE } from './schedules.js';

/** An import still queued or running after this long is taken to have lost its job. */
const IMPORT_SWEEP_AFTER_MS = 30_000;

/**
 * Runs each period's job in whichever worker takes it; the work itself stays in the owning
 * module's service. Each job has its own handler (no shared busy flag: a slow sender never skips
 * a digest). On shutdown the loops stop between rounds; Bull's close waits for the running job.
 */
@Processor(SCHEDULE_QUEUE)
export class PeriodicProcessor implements BeforeApplicationShutdown {
  private readonly log = new Logger('schedule');
  private stopping = false;

  constructor(
    private readonly readings: ReadingsService,
    private readonly imports: ImportsService,
    private readonly relay: OutboxRelay,
    private readonly notices: NotificationsService,
  ) {}

  beforeApplicationShutdown(): void {
    this.stopping = true;
  }

  /** After Redis came back empty (`recovery`), no pending reading has a job: all are queued, however new. */
  @Process('judge-sweep')
  judgeSweep(job: Job<{ recovery?: boolean }>): Promise<number> {
    return this.readings.sweep(job.data?.recovery ? 0 : SWEEP_AFTER_MS, () => this.stopping);
  }

  @Process('import-sweep')
  importSweep(): Promise<number> {
    return this.imports.sweep(IMPORT_SWEEP_AFTER_MS);
  }

  @Process('relay-sweep')
  relaySweep(): Promise<number> {
    return this.relay.sweep();
  }

  @Process('notice-send')
  async noticeSend(): Promise<number> {
    let sent = 0;
    while (!this.stopping) {
      const n = await this.notices.sendEach();
      sent += n;
      if (n === 0) break;
    }
    return sent;
  }

  @Process('digest-send')
  digestSend(): Promise<number> {
    return this.notices.sendDigests();
  }

  @OnQueueFailed()
  failed(job: Job, err: Error): void {
    this.log.warn(`periodic job ${job.name} failed: ${err.message}; it runs again next period`);
  }
}
