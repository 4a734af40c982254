import { Process, Processor } from '@nestjs/bull';
import type { Job } from 'bull';
import { QUEUES } from './queues.module.js';

export interface HeartbeatJob {
  sentAt: string;
}

/** The smallest worker there is: proves producer -> Redis -> consumer wiring end to end. */
@Processor(QUEUES.heartbeat)
export class HeartbeatProcessor {
  @Process()
  handle(job: Job<HeartbeatJob>): { sentAt: string; handledAt: string; pid: number } {
    return { sentAt: job.data.sentAt, handledAt: new Date().toISOString(), pid: process.pid };
  }
}
