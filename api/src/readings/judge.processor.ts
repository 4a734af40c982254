import { OnQueueFailed, OnQueueStalled, Process, Processor } from '@nestjs/bull';
import { Logger } from '@nestjs/common';
import type { Job } from 'bull';
import { JUDGE_CONCURRENCY, JUDGE_QUEUE, type JudgeJob } from './readings.constants.js';
import { JudgeService } from './judge.service.js';

/** The Bull consumer: one job per reading (job id = reading id). */
@Processor(JUDGE_QUEUE)
export class JudgeProcessor {
  private readonly log = new Logger('judging');

  constructor(private readonly judging: JudgeService) {}

  // judgings of one batch serialise on its row lock; different batches run side by side
  @Process({ concurrency: JUDGE_CONCURRENCY })
  handle(job: Job<JudgeJob>) {
    return this.judging.judge(job.data.readingId);
  }

  /** A worker died or hung holding the job; Bull hands it to another (judging twice is harmless). */
  @OnQueueStalled()
  stalled(job: Job<JudgeJob>) {
    this.log.warn(`judging of reading ${job.data.readingId} stalled; it is being retried`);
  }

  @OnQueueFailed()
  failed(job: Job<JudgeJob>, err: Error) {
    this.log.warn(`judging of reading ${job.data.readingId} failed (attempt ${job.attemptsMade}): ${err.message}; the reading stays pending for a retry or the sweeper`);
  }
}
