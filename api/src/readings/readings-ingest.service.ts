import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { MASS_SUBJECTS, MILESTONE_SUBJECTS, toSI, UnitError, type ReadingQuantity, type ReadingSubject } from '@pourgate/batching';
import type { RequestContext } from '../auth/principal.js';
import { BatchesService } from '../batches/batches.service.js';
import { type FieldError, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { DevicesService } from '../devices/devices.service.js';
import { JUDGE_CHUNK, JUDGE_GATHER_MS, JUDGE_QUEUE, type JudgeJob, SWEEP_PAGE, SWEEP_PAGES } from './readings.constants.js';
import { type NewReading, ReadingsRepository } from './readings.repository.js';
import { readingView } from './reading-view.js';

export interface ReadingInput {
  batchId: string;
  deviceId?: string;
  clientReadingId: string;
  quantity: ReadingQuantity;
  subject: ReadingSubject;
  value?: number;
  unit?: string;
  stable?: boolean;
  deviceTime?: string;
}

const HUMIDITY_UNITS = ['%', '%RH', 'percent'];

/** Ingest: check and convert readings, store them pending, queue their judging; re-queue lost jobs. */
@Injectable()
export class ReadingsIngestService implements OnModuleDestroy {
  private readonly log = new Logger('readings');
  /** Readings posted one at a time whose judging job is not queued yet (see `judgeSoon`). */
  private waiting: string[] = [];
  private flushing: Promise<void> | null = null;

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ReadingsRepository,
    private readonly devices: DevicesService,
    private readonly batches: BatchesService,
    @InjectQueue(JUDGE_QUEUE) private readonly queue: Queue<JudgeJob>,
  ) {}

  /** Checks and converts every item; all refused together, with pointers, before anything is written. */
  private async prepare(c: RequestContext, items: ReadingInput[], at: (i: number) => string): Promise<NewReading[]> {
    const { rows, errors } = await this.check(c, items, at);
    if (errors.length) throw validationProblem(errors);
    return rows;
  }

  /**
   * Converts every item and collects what is wrong with each (pointers from `at(i)`), writing
   * nothing. `rows[i]` is item i, meaningful only when no error points into it.
   */
  async check(c: RequestContext, items: ReadingInput[], at: (i: number) => string): Promise<{ rows: NewReading[]; errors: FieldError[] }> {
    const orgId = c.principal.organizationId;
    const boundDevice = c.principal.kind === 'api_key' ? c.principal.deviceId : null;
    const deviceIds = [...new Set(items.map((r) => r.deviceId ?? boundDevice).filter((x): x is string => !!x))];
    const batchIds = [...new Set(items.map((r) => r.batchId))];
    // each module's rows through its own service: side by side, ids only
    const [devices, batches] = await Promise.all([
      this.devices.existingIds(orgId, deviceIds),
      this.batches.existingIds(orgId, batchIds),
    ]);
    return this.convert(c, items, at, { devices, batches });
  }

  /**
   * Converts every item and collects what is wrong with it; with `refs`, also whether its device and
   * batch exist in the caller's organization (without, those are left to the caller).
   */
  private convert(c: RequestContext, items: ReadingInput[], at: (i: number) => string, refs?: { devices: Set<string>; batches: Set<string> }): { rows: NewReading[]; errors: FieldError[] } {
    const orgId = c.principal.organizationId;
    const errors: FieldError[] = [];
    const boundDevice = c.principal.kind === 'api_key' ? c.principal.deviceId : null;
    const now = Date.now();
    const out: NewReading[] = [];
    items.forEach((r, i) => {
      const p = at(i);
      const deviceId = r.deviceId ?? boundDevice;
      if (boundDevice && r.deviceId && r.deviceId !== boundDevice) errors.push({ pointer: `${p}/deviceId`, detail: 'differs from the device this key is bound to', code: 'conflicting' });
      if (!deviceId) errors.push({ pointer: `${p}/deviceId`, detail: 'is required unless the key is bound to a device', code: 'required' });
      else if (refs && !refs.devices.has(deviceId)) errors.push({ pointer: `${p}/deviceId`, detail: 'no device with that id in your organization', code: 'reference' });
      if (refs && !refs.batches.has(r.batchId)) errors.push({ pointer: `${p}/batchId`, detail: 'no batch with that id in your organization', code: 'reference' });
      let valueSi = NaN;
      const isMilestone = r.quantity === 'milestone';
      if (isMilestone) {
        // the clock is the measurement: seconds since the milestone before it, filled in by the judge
        valueSi = 0;
        if (!(MILESTONE_SUBJECTS as readonly string[]).includes(r.subject)) errors.push({ pointer: `${p}/subject`, detail: `a milestone is one of ${MILESTONE_SUBJECTS.join(', ')}`, code: 'enum' });
        if (r.value !== undefined || r.unit !== undefined) errors.push({ pointer: `${p}/value`, detail: 'a milestone carries no value; its time is deviceTime (or when it was received)', code: 'not_allowed' });
      } else if (r.value === undefined || r.unit === undefined) {
        if (r.value === undefined) errors.push({ pointer: `${p}/value`, detail: 'is required', code: 'required' });
        if (r.unit === undefined) errors.push({ pointer: `${p}/unit`, detail: 'is required', code: 'required' });
      } else if ((MILESTONE_SUBJECTS as readonly string[]).includes(r.subject)) {
        errors.push({ pointer: `${p}/subject`, detail: `${r.subject} is a milestone: post it with quantity "milestone"`, code: 'enum' });
      } else if (!Number.isFinite(r.value)) errors.push({ pointer: `${p}/value`, detail: 'must be a finite number', code: 'type' });
      else if (r.quantity === 'humidity') {
        if (!HUMIDITY_UNITS.includes(r.unit)) errors.push({ pointer: `${p}/unit`, detail: `relative humidity is given in % (one of ${HUMIDITY_UNITS.join(', ')})`, code: 'unit' });
        else if (r.value < 0 || r.value > 100) errors.push({ pointer: `${p}/value`, detail: 'must be between 0 and 100 %', code: 'range' });
        valueSi = r.value;
      } else {
        try {
          valueSi = toSI(r.quantity as 'mass' | 'temperature', r.value, r.unit);
          if (r.quantity === 'mass' && valueSi < 0) errors.push({ pointer: `${p}/value`, detail: 'a net mass cannot be negative', code: 'minimum' });
          if (r.quantity === 'temperature' && valueSi < -273.15) errors.push({ pointer: `${p}/value`, detail: 'is below absolute zero', code: 'minimum' });
        } catch (e) {
          if (!(e instanceof UnitError)) throw e;
          errors.push({ pointer: `${p}/unit`, detail: e.message, code: 'unit' });
        }
      }
      if (r.quantity === 'mass' && !(MASS_SUBJECTS as readonly string[]).includes(r.subject)) errors.push({ pointer: `${p}/subject`, detail: `a mass is of ${MASS_SUBJECTS.join(', ')}`, code: 'enum' });
      const deviceTime = r.deviceTime ? new Date(r.deviceTime) : null;
      out.push({
        organization_id: orgId,
        batch_id: r.batchId,
        device_id: deviceId ?? '',
        client_reading_id: r.clientReadingId,
        quantity: r.quantity,
        subject: r.subject,
        value_si: valueSi,
        unit_given: isMilestone ? 's' : (r.unit ?? ''),
        value_given: isMilestone ? 0 : (r.value ?? NaN),
        stable: r.stable ?? true,
        device_time: deviceTime,
        skew_seconds: deviceTime ? Math.round((now - deviceTime.getTime()) / 100) / 10 : null,
      });
    });
    return { rows: out, errors };
  }

  /** Commits the readings pending, then queues their judging; a failed queue is left to the sweeper. */
  async ingest(c: RequestContext, items: ReadingInput[], at: (i: number) => string) {
    if (items.length === 1) {
      const fast = await this.ingestOne(c, items, at);
      if (fast) return [fast];
    }
    return this.store(await this.prepare(c, items, at));
  }

  /**
   * One new reading in one round trip: the insert itself checks that the device and the batch are
   * the caller's (their modules' own existence queries, as conditions of the insert). Undefined when
   * nothing was inserted — a replay, an unknown device or batch, a bad value — and the full path
   * (check, then insert or read the first reading back) answers with its errors or the replay.
   */
  private async ingestOne(c: RequestContext, items: ReadingInput[], at: (i: number) => string) {
    const { rows, errors } = this.convert(c, items, at);
    const row = rows[0];
    if (errors.length || !row) return undefined;
    const orgId = c.principal.organizationId;
    const created = await this.repo.insertIfOwned(row, [this.devices.existsQuery(orgId, row.device_id), this.batches.existsQuery(orgId, row.batch_id)], 'device,batch');
    if (!created) return undefined;
    this.judgeSoon(created.id);
    return { id: created.id, status: created.status, statusUrl: `/v1/readings/${created.id}`, replayed: false as const };
  }

  /** Writes readings already checked by `check` (one transaction) and queues the new ones. */
  async store(rows: NewReading[]) {
    // one statement is atomic by itself: a single reading needs no BEGIN/COMMIT round trips
    const results = rows.length === 1 ? await this.repo.insertMany(this.db, rows) : await this.db.transaction((trx) => this.repo.insertMany(trx, rows));
    await this.enqueueMany(results.filter((r) => r.created).map((r) => r.row.id));
    return results.map(({ row, created }) =>
      created ? { id: row.id, status: row.status, statusUrl: `/v1/readings/${row.id}`, replayed: false } : { ...readingView(row, 'metric'), replayed: true },
    );
  }

  /**
   * Queues the judging of a reading already committed, together with the others posted in the same
   * moment: the ids that arrive while one Redis round trip is in flight go into the next, as one job
   * per JUDGE_CHUNK readings (a Bull job and a round trip per reading cost the API more CPU than the
   * insert). The caller does not wait; a job that cannot be queued is left to the sweeper, as a
   * failed queue always was.
   */
  judgeSoon(id: string): void {
    this.waiting.push(id);
    this.flushing ??= this.flushWaiting();
  }

  private async flushWaiting(): Promise<void> {
    try {
      await new Promise<void>((resolve) => setImmediate(resolve)); // the rest of this turn's posts
      while (this.waiting.length) {
        const started = Date.now();
        await this.enqueueMany(this.waiting.splice(0));
        // posts keep coming: gather them a few milliseconds more (a lone reading never waits)
        const wait = JUDGE_GATHER_MS - (Date.now() - started);
        if (this.waiting.length && wait > 0) await new Promise<void>((resolve) => setTimeout(resolve, wait));
      }
    } catch (e) {
      // enqueueMany keeps its own failures; anything else must not stop later posts from being queued
      this.log.warn(`judging not queued; the sweeper will queue what is pending (${(e as Error).message})`);
    } finally {
      this.flushing = null;
    }
  }

  /** Nothing gathered is left behind at shutdown (the sweeper would find it, 5 s later). */
  async onModuleDestroy(): Promise<void> {
    await this.flushing;
  }

  private jobOptions(id: string) {
    return { jobId: id, attempts: 5, backoff: { type: 'exponential', delay: 1000 }, removeOnComplete: true, removeOnFail: true, timeout: 30_000 };
  }

  async enqueue(id: string): Promise<boolean> {
    try {
      await this.queue.add({ readingId: id }, this.jobOptions(id));
      return true;
    } catch (e) {
      this.log.warn(`reading ${id} stays pending; the sweeper will queue it (${(e as Error).message})`);
      return false;
    }
  }

  /**
   * One round trip to Redis for a whole post, one job per JUDGE_CHUNK readings (a Bull job each
   * cost more CPU than the insert); on failure the readings wait for the sweeper.
   */
  async enqueueMany(ids: string[]): Promise<void> {
    if (ids.length === 0) return;
    if (ids.length === 1) return void (await this.enqueue(ids[0]!));
    const jobs: { data: JudgeJob; opts: ReturnType<ReadingsIngestService['jobOptions']> }[] = [];
    for (let i = 0; i < ids.length; i += JUDGE_CHUNK) {
      const chunk = ids.slice(i, i + JUDGE_CHUNK);
      jobs.push(chunk.length === 1 ? { data: { readingId: chunk[0]! }, opts: this.jobOptions(chunk[0]!) } : { data: { readingIds: chunk }, opts: { ...this.jobOptions(`chunk:${chunk[0]}`), timeout: 120_000 } });
    }
    try {
      // one job is one script call; addBulk wraps even one in MULTI/EXEC
      if (jobs.length === 1) await this.queue.add(jobs[0]!.data, jobs[0]!.opts);
      else await this.queue.addBulk(jobs);
    } catch (e) {
      this.log.warn(`${ids.length} readings stay pending; the sweeper will queue them (${(e as Error).message})`);
    }
  }

  /** Re-queues pending readings whose job was lost (Redis down at ingest, a worker crash). */
  async sweep(olderThanMs: number, stopped: () => boolean = () => false): Promise<number> {
    let n = 0;
    // page by page, so a long outage is re-queued in one pass (it took a pass of 500 every 15 s)
    let after: { received_at: Date; id: string } | undefined;
    for (let page = 0; page < SWEEP_PAGES; page++) {
      const rows = await this.repo.stalePending(olderThanMs, SWEEP_PAGE, after);
      for (const { id } of rows) {
        if (stopped()) return n;
        if (await this.enqueue(id)) n++;
      }
      if (rows.length < SWEEP_PAGE) break;
      after = rows[rows.length - 1];
    }
    return n;
  }

}
