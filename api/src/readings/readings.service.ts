import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { confinedDevice, type RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { type FieldError, ProblemException } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { unitSystemFor } from '../shop/unit-system.js';
import { type ReadingInput, ReadingsIngestService } from './readings-ingest.service.js';
import { type NewReading, ReadingsRepository } from './readings.repository.js';
import { readingView } from './reading-view.js';
import { type ReviewInput, ReviewService } from './review.service.js';

export type { ReadingInput } from './readings-ingest.service.js';
export type { ReviewInput } from './review.service.js';
export { readingView } from './reading-view.js';

/**
 * The readings module as other modules and the controller see it: lists and single readings, and
 * the ingest and review use cases (readings-ingest.service.ts, review.service.ts; judging is
 * judge.service.ts, run by the queue).
 */
@Injectable()
export class ReadingsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ReadingsRepository,
    private readonly ingestion: ReadingsIngestService,
    private readonly reviews: ReviewService,
  ) {}

  /** Converts every item and collects what is wrong with each, writing nothing (imports use it row by row). */
  check(c: RequestContext, items: ReadingInput[], at: (i: number) => string): Promise<{ rows: NewReading[]; errors: FieldError[] }> {
    return this.ingestion.check(c, items, at);
  }

  /** Commits the readings pending, then queues their judging. */
  ingest(c: RequestContext, items: ReadingInput[], at: (i: number) => string) {
    return this.ingestion.ingest(c, items, at);
  }

  /** Writes readings already checked by `check` and queues the new ones. */
  store(rows: NewReading[]) {
    return this.ingestion.store(rows);
  }

  /** Re-queues pending readings whose job was lost (Redis down at ingest, a worker crash). */
  sweep(olderThanMs: number, stopped: () => boolean = () => false): Promise<number> {
    return this.ingestion.sweep(olderThanMs, stopped);
  }

  async list(c: RequestContext, q: ListQuery) {
    // a device key lists its own device's readings only (its filter cannot widen that)
    const device = confinedDevice(c.principal);
    if (device === null) return { rows: [], total: 0 };
    const { rows, total } = await this.repo.list(c.principal.organizationId, device === undefined ? q : { ...q, filter: { ...q.filter, deviceId: device } });
    const units = await unitSystemFor(this.db, c, undefined);
    return { rows: rows.map((r) => readingView(r, units)), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.repo.find(c.principal.organizationId, id);
    const device = confinedDevice(c.principal);
    if (!r || (device !== undefined && r.device_id !== device)) throw new ProblemException(404, { detail: 'No reading with that id in your organization.' });
    return readingView(r, await unitSystemFor(this.db, c, undefined));
  }

  /** Waive (with a note) or uphold a rejected reading; the reading as it is afterwards. */
  async review(c: RequestContext, id: string, body: ReviewInput) {
    await this.reviews.review(c, id, body);
    return this.get(c, id);
  }
}
