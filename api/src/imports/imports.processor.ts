import { OnQueueStalled, Process, Processor } from '@nestjs/bull';
import { Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { IMPORT_QUEUE, type ImportJob } from './imports.constants.js';
import { ImportsService } from './imports.service.js';

@Processor(IMPORT_QUEUE)
export class ImportProcessor {
  constructor(private readonly imports: ImportsService) {}

  private readonly log = new Logger('imports');

  @Process()
  handle(job: Job<ImportJob>) {
    // on the last attempt a failure marks the import failed with its reason instead of leaving it running
    return this.imports.run(job.data.importId, { lastAttempt: job.attemptsMade + 1 >= (job.opts.attempts ?? 1) });
  }

  @OnQueueStalled()
  stalled(job: Job<ImportJob>) {
    this.log.warn(`import ${job.data.importId} stalled; it starts again (rows already imported are not added twice)`);
  }
}
