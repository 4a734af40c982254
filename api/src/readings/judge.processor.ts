import { OnQueueFailed, OnQueueStalled, Process, Processor } from '@nestjs/bull';
import { Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { JUDGE_CONCURRENCY, JUDGE_QUEUE, type JudgeJob } from './readings.constants.js';
import { JudgeService } from './judge.service.js';

/** The Bull consumer: a job is one reading (job id = reading id, as the sweeper queues it) or a chunk of readings posted together. */
@Processor(JUDGE_QUEUE)
export class JudgeProcessor {
  private readonly log = new Logger('judging');

  constructor(private readonly judging: JudgeService) {}

  // judgings of one batch serialise on its row lock; different batches run side by side
  @Process({ concurrency: JUDGE_CONCURRENCY })
  async handle(job: Job<JudgeJob>) {
    if (job.data.readingId !== undefined) return this.judging.judge(job.data.readingId);
    // each reading in its own transaction; one failure does not hold the others back, and the
    // retry of the job finds the judged ones judged (judging twice changes nothing)
    const failed: string[] = [];
    for (const id of job.data.readingIds) {
      try {
        await this.judging.judge(id);
      } catch (e) {
        failed.push(`${id}: ${(e as Error).message}`);
      }
    }
    if (failed.length) throw new Error(`${failed.length} of ${job.data.readingIds.length} readings not judged (${failed.slice(0, 3).join('; ')})`);
    return { judged: job.data.readingIds.length };
  }

  /** A worker died or hung holding the job; Bull hands it to another (judging twice is harmless). */
  @OnQueueStalled()
  stalled(job: Job<JudgeJob>) {
    this.log.warn(`judging of ${describe(job.data)} stalled; it is being retried`);
  }

  @OnQueueFailed()
  failed(job: Job<JudgeJob>, err: Error) {
    this.log.warn(`judging of ${describe(job.data)} failed (attempt ${job.attemptsMade}): ${err.message}; what is not judged stays pending for a retry or the sweeper`);
  }
}

const describe = (d: JudgeJob) => (d.readingId !== undefined ? `reading ${d.readingId}` : `${d.readingIds.length} readings from ${d.readingIds[0]}`);
