import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable, Logger } from '@nestjs/common';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, confinedDevice, type RequestContext } from '../auth/principal.js';
import { SYSTEM_ACTOR, moveBatch } from '../batches/batch-transitions.js';
import { toSI, UnitError } from '@pourgate/batching';
import type { ListQuery } from '../common/lists/list-query.js';
import { type FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { EventsService } from '../events/events.service.js';
import { judgeReading, MASS_SUBJECTS, MILESTONE_SUBJECTS, type MassTargets, type ReadingQuantity, type ReadingSubject, type SystemFacts } from '@pourgate/batching';
import { JUDGE_QUEUE, type JudgeJob, MAX_CLOCK_SKEW_S } from './readings.constants.js';
import { type NewReading, type ReadingRow, ReadingsRepository } from './readings.repository.js';

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

export interface ReviewInput {
  decision: 'waive' | 'uphold';
  note?: string;
  scrap?: boolean;
}

const HUMIDITY_UNITS = ['%', '%RH', 'percent'];
const UNIT_SI: Record<ReadingQuantity, string> = { mass: 'kg', temperature: 'degC', humidity: '%', milestone: 's' };

export function readingView(r: ReadingRow) {
  return {
    id: r.id,
    batchId: r.batch_id,
    deviceId: r.device_id,
    clientReadingId: r.client_reading_id,
    quantity: r.quantity,
    subject: r.subject,
    valueSi: r.value_si,
    unitSi: UNIT_SI[r.quantity],
    given: { value: r.value_given, unit: r.unit_given },
    stable: r.stable,
    deviceTime: r.device_time,
    receivedAt: r.received_at,
    clockSkewSeconds: r.skew_seconds,
    clockSkewFlagged: r.skew_seconds !== null && Math.abs(r.skew_seconds) > MAX_CLOCK_SKEW_S,
    status: r.status,
    reasons: r.reasons,
    judgedAt: r.judged_at,
    review: r.review_decision ? { decision: r.review_decision, note: r.review_note, by: r.reviewed_by_label, at: r.reviewed_at } : null,
    statusUrl: `/v1/readings/${r.id}`,
  };
}

/** Ingest, judge and review readings. */
@Injectable()
export class ReadingsService {
  private readonly log = new Logger('readings');

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ReadingsRepository,
    private readonly audit: AuditService,
    private readonly events: EventsService,
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
    const errors: FieldError[] = [];
    const boundDevice = c.principal.kind === 'api_key' ? c.principal.deviceId : null;
    const deviceIds = [...new Set(items.map((r) => r.deviceId ?? boundDevice).filter((x): x is string => !!x))];
    const batchIds = [...new Set(items.map((r) => r.batchId))];
    const [deviceRows, batchRows] = await Promise.all([
      deviceIds.length ? this.db('devices').where('organization_id', orgId).whereIn('id', deviceIds).select('id') : [],
      this.db('batches').where('organization_id', orgId).whereIn('id', batchIds).select('id'),
    ]);
    const devices = new Set(deviceRows.map((d: { id: string }) => d.id));
    const batches = new Set(batchRows.map((b: { id: string }) => b.id));
    const now = Date.now();
    const out: NewReading[] = [];
    items.forEach((r, i) => {
      const p = at(i);
      let deviceId = r.deviceId ?? boundDevice;
      if (boundDevice && r.deviceId && r.deviceId !== boundDevice) errors.push({ pointer: `${p}/deviceId`, detail: 'differs from the device this key is bound to', code: 'conflicting' });
      if (!deviceId) errors.push({ pointer: `${p}/deviceId`, detail: 'is required unless the key is bound to a device', code: 'required' });
      else if (!devices.has(deviceId)) errors.push({ pointer: `${p}/deviceId`, detail: 'no device with that id in your organization', code: 'reference' });
      if (!batches.has(r.batchId)) errors.push({ pointer: `${p}/batchId`, detail: 'no batch with that id in your organization', code: 'reference' });
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
    return this.store(await this.prepare(c, items, at));
  }

  /** Writes readings already checked by `check` (one transaction) and queues the new ones. */
  async store(rows: NewReading[]) {
    // one statement is atomic by itself: a single reading needs no BEGIN/COMMIT round trips
    const results = rows.length === 1 ? await this.repo.insertMany(this.db, rows) : await this.db.transaction((trx) => this.repo.insertMany(trx, rows));
    await this.enqueueMany(results.filter((r) => r.created).map((r) => r.row.id));
    return results.map(({ row, created }) =>
      created ? { id: row.id, status: row.status, statusUrl: `/v1/readings/${row.id}`, replayed: false } : { ...readingView(row), replayed: true },
    );
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

  /** One round trip to Redis for a whole post; on failure the readings wait for the sweeper. */
  async enqueueMany(ids: string[]): Promise<void> {
    if (ids.length === 0) return;
    if (ids.length === 1) return void (await this.enqueue(ids[0]!));
    try {
      await this.queue.addBulk(ids.map((id) => ({ data: { readingId: id }, opts: this.jobOptions(id) })));
    } catch (e) {
      this.log.warn(`${ids.length} readings stay pending; the sweeper will queue them (${(e as Error).message})`);
    }
  }

  /** Re-queues pending readings whose job was lost (Redis down at ingest, a worker crash). */
  async sweep(olderThanMs: number, stopped: () => boolean = () => false): Promise<number> {
    let n = 0;
    for (const { id } of await this.repo.stalePending(olderThanMs)) {
      if (stopped()) break;
      if (await this.enqueue(id)) n++;
    }
    return n;
  }

  async list(c: RequestContext, q: ListQuery) {
    // a device key lists its own device's readings only (its filter cannot widen that)
    const device = confinedDevice(c.principal);
    if (device === null) return { rows: [], total: 0 };
    const { rows, total } = await this.repo.list(c.principal.organizationId, device === undefined ? q : { ...q, filter: { ...q.filter, deviceId: device } });
    return { rows: rows.map(readingView), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.repo.find(c.principal.organizationId, id);
    const device = confinedDevice(c.principal);
    if (!r || (device !== undefined && r.device_id !== device)) throw new ProblemException(404, { detail: 'No reading with that id in your organization.' });
    return readingView(r);
  }

  /**
   * Judges one reading. A reading already judged is left as it is, so a job run twice (a retry, the
   * sweeper racing a slow worker) gives the same verdict and emits nothing more.
   */
  async judge(id: string): Promise<{ status: string }> {
    return this.db.transaction(async (trx) => {
      const r = await this.repo.lockForJudging(trx, id);
      if (!r) return { status: 'missing' };
      if (r.status !== 'pending') return { status: r.status };
      const device = await trx('devices').where({ id: r.device_id }).first('capacity_kg', 'calibration_due');
      const batch = await trx('batches').where({ id: r.batch_id }).first('state', 'targets');
      const system = (batch?.targets?.input?.system ?? null) as SystemFacts | null;
      const isPart = r.quantity === 'mass' && (r.subject === 'part_a' || r.subject === 'part_b');
      const otherPartMassKg = isPart ? await this.repo.otherPartMass(trx, r) : null;
      const partMassesKg = r.quantity === 'mass' && r.subject === 'pigment' ? { a: await this.repo.latestMass(trx, r, 'part_a'), b: await this.repo.latestMass(trx, r, 'part_b') } : undefined;
      let elapsedS: number | null = null;
      if (r.quantity === 'milestone' && r.subject !== 'mix_start') {
        const since = await this.repo.milestoneTime(trx, r, r.subject === 'pour' ? 'mix_start' : 'pour');
        const at = r.device_time ?? r.received_at;
        elapsedS = since ? Math.round((new Date(at).getTime() - since.getTime()) / 10) / 100 : null;
      }
      const takenAt = r.device_time ?? r.received_at;
      const verdict = judgeReading({
        quantity: r.quantity,
        subject: r.subject,
        valueSi: Number(r.value_si),
        stable: r.stable,
        device: { capacityKg: device?.capacity_kg ?? null, calibrationDue: calibrationDay(device?.calibration_due) },
        day: new Date(takenAt).toISOString().slice(0, 10),
        system: system?.ratio ? system : null,
        targets: massTargets(batch?.targets?.targets),
        otherPartMassKg,
        partMassesKg,
        elapsedS,
      });
      await this.repo.setVerdict(trx, id, verdict.status, verdict.reasons, r.quantity === 'milestone' ? (elapsedS ?? 0) : undefined);
      const orgId = r.organization_id;
      if (verdict.status !== 'unused') {
        await this.events.emit(trx, { organizationId: orgId, type: verdict.status === 'accepted' ? 'reading.accepted' : 'reading.rejected', subjectType: 'reading', subjectId: id, data: { readingId: id, batchId: r.batch_id, deviceId: r.device_id, quantity: r.quantity, subject: r.subject, status: verdict.status, reasons: verdict.reasons } });
      }
      const next = r.subject === 'mix_start' ? 'mixed' : r.subject === 'pour' ? 'curing' : r.subject === 'demold' ? null : 'weighing';
      const why = r.subject === 'mix_start' ? 'mix started (A met B)' : r.subject === 'pour' ? 'poured into the mold' : 'first reading received';
      if (next) await moveBatch(trx, this.events, orgId, r.batch_id, next, SYSTEM_ACTOR, why);
      if (verdict.status === 'rejected') await moveBatch(trx, this.events, orgId, r.batch_id, 'on_hold', SYSTEM_ACTOR, `reading ${id} rejected: ${verdict.reasons.map((x) => x.code).join(', ')}`);
      return { status: verdict.status };
    });
  }

  /** Waive (with a note) or uphold a rejected reading; upholding holds the batch, or scraps it. */
  async review(c: RequestContext, id: string, body: ReviewInput) {
    const orgId = c.principal.organizationId;
    if (body.decision === 'waive' && !body.note?.trim()) throw validationProblem([{ pointer: '/note', detail: 'a waiver needs a note saying why', code: 'required' }]);
    if (body.decision === 'waive' && body.scrap) throw validationProblem([{ pointer: '/scrap', detail: 'only an upheld rejection scraps a batch', code: 'conflicting' }]);
    const actor = actorOf(c.principal);
    await this.db.transaction(async (trx) => {
      const r = await trx('readings').where({ organization_id: orgId, id }).forUpdate().first();
      if (!r) throw new ProblemException(404, { detail: 'No reading with that id in your organization.' });
      if (r.status !== 'rejected') throw new ProblemException(409, { slug: 'conflict', detail: `Only rejected readings are reviewed; this one is ${r.status}.` });
      if (r.review_decision) throw new ProblemException(409, { slug: 'conflict', detail: `This reading was already reviewed (${r.review_decision}).` });
      await this.repo.setReview(trx, id, { decision: body.decision, note: body.note ?? null, by: actor.actorId, label: actor.actorLabel });
      const data = { readingId: id, batchId: r.batch_id, decision: body.decision, note: body.note ?? null, reviewedBy: actor.actorLabel };
      await this.events.emit(trx, { organizationId: orgId, type: body.decision === 'waive' ? 'reading.waived' : 'reading.upheld', subjectType: 'reading', subjectId: id, data });
      if (body.decision === 'uphold') {
        await moveBatch(trx, this.events, orgId, r.batch_id, body.scrap ? 'scrapped' : 'on_hold', actor, `rejection of reading ${id} upheld${body.note ? `: ${body.note}` : ''}`);
      }
      await this.audit.record({ organizationId: orgId, ...actor, action: `reading.${body.decision === 'waive' ? 'waived' : 'upheld'}`, targetType: 'reading', targetId: id, details: { note: body.note ?? null, scrap: !!body.scrap, batchId: r.batch_id }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.get(c, id);
  }
}

/** The target masses from a batch's stored targets (absent for a batch planned before targets had them). */
function massTargets(t: { components?: { A?: { mass?: { value: number } }; B?: { mass?: { value: number } }; pigment?: { mass?: { value: number } } }; totalMass?: { value: number } } | undefined): MassTargets | null {
  const a = t?.components?.A?.mass?.value;
  const b = t?.components?.B?.mass?.value;
  if (a === undefined || b === undefined) return null;
  return { a, b, pigment: t?.components?.pigment?.mass?.value ?? 0, total: t?.totalMass?.value ?? a + b };
}

function calibrationDay(v: unknown): string | null {
  if (v === null || v === undefined) return null;
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  return String(v).slice(0, 10);
}
