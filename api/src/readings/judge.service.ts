import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { judgeReading, type JudgeResult, type MassTargets, type SystemFacts } from '@pourgate/batching';
import { SYSTEM_ACTOR } from '../batches/batch-transitions.js';
import { BatchesService, type TargetsSnapshot } from '../batches/batches.service.js';
import { KNEX } from '../database/database.module.js';
import { DevicesService } from '../devices/devices.service.js';
import { EventsService } from '../events/events.service.js';
import { ControlService } from '../control/control.service.js';
import { type ReadingRow, ReadingsRepository } from './readings.repository.js';

/**
 * Judging one reading: this service gathers the facts — the reading and the batch's other latest
 * masses and milestones (readings repository), the device (devices service), the batch's stored
 * targets (batches service) — and the pure decision in @pourgate/batching decides.
 */
@Injectable()
export class JudgeService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ReadingsRepository,
    private readonly devices: DevicesService,
    private readonly batches: BatchesService,
    private readonly events: EventsService,
    private readonly control: ControlService,
  ) {}

  /**
   * Judges one reading. A reading already judged is left as it is, so a job run twice (a retry, the
   * sweeper racing a slow worker) gives the same verdict and emits nothing more.
   */
  async judge(id: string): Promise<{ status: string }> {
    const out = await this.db.transaction(async (trx) => {
      const r = await this.repo.lockForJudging(trx, id);
      if (!r) return { status: 'missing' };
      if (r.status !== 'pending') return { status: r.status };
      const { verdict, elapsedS } = await this.decide(trx, r);
      await this.repo.setVerdict(trx, id, verdict.status, verdict.reasons, r.quantity === 'milestone' ? (elapsedS ?? 0) : undefined);
      await this.control.evaluateReading(trx, id);
      await this.announce(trx, r, verdict);
      return { status: verdict.status, reading: r };
    });
    if ('reading' in out && out.reading) await this.afterVerdict(out.reading, out.status);
    return { status: out.status };
  }

  /** Gathers the facts and asks the pure decision. */
  private async decide(trx: Knex.Transaction, r: ReadingRow): Promise<{ verdict: JudgeResult; elapsedS: number | null }> {
    const orgId = r.organization_id;
    const isMass = r.quantity === 'mass';
    const isPart = isMass && (r.subject === 'part_a' || r.subject === 'part_b');
    const needsBoth = isMass && (r.subject === 'pigment' || r.subject === 'mixed');
    // one after another: a transaction is one connection, which runs one query at a time anyway
    // (queries sent side by side on it are queued by pg, a use pg deprecates)
    const device = await this.devices.judgingFacts(orgId, r.device_id, trx);
    const batch = await this.batches.judgingFacts(trx, orgId, r.batch_id);
    const otherPartMassKg = isPart ? await this.repo.otherPartMass(trx, r) : null;
    const partA = needsBoth ? await this.repo.latestMass(trx, r, 'part_a') : null;
    const partB = needsBoth ? await this.repo.latestMass(trx, r, 'part_b') : null;
    const snapshot = batch?.snapshot ?? null;
    const stored = (snapshot?.input?.system ?? null) as SystemFacts | null;
    const system = stored?.ratio ? { ...stored, ...(stored.kind === undefined && batch?.systemKind ? { kind: batch.systemKind as SystemFacts['kind'] } : {}) } : null;
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
      system,
      targets: massTargets(snapshot),
      otherPartMassKg,
      partMassesKg: needsBoth ? { a: partA, b: partB } : undefined,
      elapsedS,
    });
    return { verdict, elapsedS };
  }

  /** The verdict's events, and the batch moved on (or held) in the same transaction. */
  private async announce(trx: Knex.Transaction, r: ReadingRow, verdict: JudgeResult): Promise<void> {
    const orgId = r.organization_id;
    if (verdict.status !== 'unused') {
      await this.events.emit(trx, { organizationId: orgId, type: verdict.status === 'accepted' ? 'reading.accepted' : 'reading.rejected', subjectType: 'reading', subjectId: r.id, data: { readingId: r.id, batchId: r.batch_id, deviceId: r.device_id, quantity: r.quantity, subject: r.subject, status: verdict.status, reasons: verdict.reasons.map(({ facts: _facts, ...reason }) => reason) } });
    }
    const next = r.subject === 'mix_start' ? 'mixed' : r.subject === 'pour' ? 'curing' : r.subject === 'demold' ? null : 'weighing';
    const why = r.subject === 'mix_start' ? 'mix started (A met B)' : r.subject === 'pour' ? 'poured into the mold' : 'first reading received';
    if (next) await this.batches.move(trx, orgId, r.batch_id, next, SYSTEM_ACTOR, why);
    if (verdict.status === 'rejected') await this.batches.move(trx, orgId, r.batch_id, 'on_hold', SYSTEM_ACTOR, `reading ${r.id} rejected: ${verdict.reasons.map((x) => x.code).join(', ')}`);
  }

  /**
   * Runs after a verdict is committed (not for a reading judged before): the place for follow-up
   * evaluations of the judged reading, such as control charts. A failure here does not undo the
   * verdict.
   */
  private async afterVerdict(_reading: ReadingRow, _status: string): Promise<void> {}
}

/** The target masses from a batch's stored targets, unrounded (absent for a batch planned before targets had them). */
function massTargets(snapshot: TargetsSnapshot | null): MassTargets | null {
  const t = snapshot?.targets as unknown as {
    components?: { A?: { mass?: { value: number }; massUnrounded?: { value: number } }; B?: { mass?: { value: number }; massUnrounded?: { value: number } }; pigment?: { mass?: { value: number }; massUnrounded?: { value: number }; placement?: string } };
    totalMass?: { value: number };
    scaleReadability?: { value: number } | null;
  } | undefined;
  const a = t?.components?.A?.massUnrounded?.value ?? t?.components?.A?.mass?.value;
  const b = t?.components?.B?.massUnrounded?.value ?? t?.components?.B?.mass?.value;
  if (a === undefined || b === undefined) return null;
  const pigment = t?.components?.pigment;
  // a pigment pre-blended in a part is in that part's target, not weighed on its own
  const separate = !pigment?.placement || pigment.placement === 'separate';
  const pigmentKg = separate ? (pigment?.massUnrounded?.value ?? pigment?.mass?.value ?? 0) : 0;
  const readability = t?.scaleReadability?.value;
  return { a, b, pigment: pigmentKg, total: t?.totalMass?.value ?? a + b + pigmentKg, ...(readability ? { readability } : {}) };
}

function calibrationDay(v: unknown): string | null {
  if (v === null || v === undefined) return null;
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  return String(v).slice(0, 10);
}
