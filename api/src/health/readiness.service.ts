import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable } from '@nestjs/common';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.module.js';
import { QUEUES } from '../queues/queues.module.js';

function withTimeout<T>(p: Promise<T>, ms: number, what: string): Promise<T> {
  return Promise.race([p, new Promise<T>((_, reject) => setTimeout(() => reject(new Error(`${what} did not answer within ${ms} ms`)), ms).unref())]);
}

/** Asks PostgreSQL and Redis whether they answer, each within 2 s; throws with the reason when not. */
@Injectable()
export class ReadinessService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    @InjectQueue(QUEUES.heartbeat) private readonly queue: Queue,
  ) {}

  async postgres(): Promise<void> {
    await withTimeout(this.db.raw('select 1'), 2000, 'PostgreSQL');
  }

  async redis(): Promise<void> {
    const pong = await withTimeout(this.queue.client.ping(), 2000, 'Redis');
    if (pong !== 'PONG') throw new Error(`unexpected reply ${pong}`);
  }
}
