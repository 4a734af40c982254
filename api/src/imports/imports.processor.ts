import { OnQueueStalled, Process, Processor } from '@nestjs/bull';
import { BeforeApplicationShutdown, Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import type { Job } from 'bull';
import { IMPORT_QUEUE, type ImportJob } from './imports.constants.js';
import { ImportsService } from './imports.service.js';

const SWEEP_AFTER_MS = 30_000;
const SWEEP_EVERY_MS = 30_000;

@Processor(IMPORT_QUEUE)
export class ImportProcessor {
  constructor(private readonly imports: ImportsService) {}

  private readonly log = new Logger('imports');

  @Process()
  handle(job: Job<ImportJob>) {
    return this.imports.run(job.data.importId);
  }

  @OnQueueStalled()
  stalled(job: Job<ImportJob>) {
    this.log.warn(`import ${job.data.importId} stalled; it starts again (rows already imported are not added twice)`);
  }
}

/** At boot and on a timer, queues imports whose job was lost. */
@Injectable()
export class ImportSweeper implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private timer?: NodeJS.Timeout;

  constructor(private readonly imports: ImportsService) {}

  onApplicationBootstrap(): void {
    const run = () => void this.imports.sweep(SWEEP_AFTER_MS).catch(() => undefined);
    this.timer = setInterval(run, SWEEP_EVERY_MS);
    this.timer.unref();
    setImmediate(run);
  }

  beforeApplicationShutdown(): void {
    if (this.timer) clearInterval(this.timer);
  }
}
