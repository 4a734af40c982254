import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { checkRelease, ratioError, requiredForRelease, type ItemRecord, type ReleaseItem, type ReleaseRequirement } from '@pourgate/batching';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { BatchesService } from '../batches/batches.service.js';
import { ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { EventsService } from '../events/events.service.js';
import { notFound } from '../shop/errors.js';
import { ReadingsRepository } from './readings.repository.js';

export interface ReviewInput {
  decision: 'waive' | 'uphold';
  note?: string;
  scrap?: boolean;
}

/** Which release item a reading stands for. */
function itemOf(quantity: string, subject: string): ReleaseItem | null {
  if (quantity === 'mass') return subject === 'part_a' || subject === 'part_b' || subject === 'pigment' ? subject : null;
  if (quantity === 'temperature') return subject === 'mold' ? 'mold_temperature' : subject === 'ambient' ? 'ambient_temperature' : 'component_temperature';
  if (quantity === 'humidity') return 'humidity';
  if (quantity === 'milestone') return subject as ReleaseItem;
  return null;
}

/** Review: waive or uphold rejections, and release a batch once it is complete. */
@Injectable()
export class ReviewService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ReadingsRepository,
    private readonly batches: BatchesService,
    private readonly audit: AuditService,
    private readonly events: EventsService,
  ) {}

  /** Waive (with a note) or uphold a rejected reading; upholding holds the batch, or scraps it. */
  async review(c: RequestContext, id: string, body: ReviewInput): Promise<void> {
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
        await this.batches.move(trx, orgId, r.batch_id, body.scrap ? 'scrapped' : 'on_hold', actor, `rejection of reading ${id} upheld${body.note ? `: ${body.note}` : ''}`);
      }
      await this.audit.record({ organizationId: orgId, ...actor, action: `reading.${body.decision === 'waive' ? 'waived' : 'upheld'}`, targetType: 'reading', targetId: id, details: { note: body.note ?? null, scrap: !!body.scrap, batchId: r.batch_id }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
  }

  /**
   * What the batch still needs before it can be released: every component its targets name (A, B,
   * the pigment when weighed separately and above zero) and what the system asks for, each weighed
   * or recorded and accepted or waived; and no rejection left open.
   */
  async releaseCheck(c: RequestContext, batchId: string, db: Knex | Knex.Transaction = this.db) {
    const orgId = c.principal.organizationId;
    const batch = await this.batches.judgingFacts(db, orgId, batchId);
    if (!batch) throw notFound('batch');
    const targets = batch.snapshot?.targets;
    const pigment = targets?.components?.pigment;
    const pigmentWeighedKg = pigment && (pigment.placement ?? 'separate') === 'separate' ? pigment.mass.value : 0;
    const requires = (batch.snapshot?.input?.system?.releaseRequires ?? []) as readonly ReleaseRequirement[];
    const required = requiredForRelease(pigmentWeighedKg, requires);
    const facts = await this.repo.releaseFacts(db, orgId, batchId);
    const latest = new Map<ReleaseItem, ItemRecord>();
    // several subjects feed one item (component temperature of A, B or the mix): any accepted one counts
    for (const row of facts.latest) {
      const item = itemOf(row.quantity, row.subject);
      if (!item) continue;
      const seen = latest.get(item);
      const ok = (x: ItemRecord | undefined) => !!x && (x.status === 'accepted' || x.reviewDecision === 'waive');
      const record: ItemRecord = { status: row.status, reviewDecision: row.review_decision };
      if (!seen || (!ok(seen) && ok(record))) latest.set(item, record);
    }
    const pending = new Set(facts.pending.map((p) => itemOf(p.quantity, p.subject)).filter((x): x is ReleaseItem => x !== null));
    const w = await this.repo.weighed(db, orgId, batchId);
    const mass = (subject: string) => {
      const r = w.latest.find((x) => x.subject === subject);
      return r ? { massKg: Number(r.value_si), readingId: r.id, receivedAt: r.received_at.toISOString() } : null;
    };
    const a = mass('part_a');
    const b = mass('part_b');
    const weightRatio = targets?.weightRatio as { a: number; b: number } | undefined;
    // the same definition the judge uses: e = (m_A / m_B) ÷ (t_A / t_B) − 1, with both parts above zero
    const error = a && b && a.massKg > 0 && b.massKg > 0 && weightRatio ? ratioError(a.massKg, b.massKg, weightRatio) : null;
    return {
      batchId,
      state: batch.state,
      ...checkRelease(required, latest, pending, facts.openRejections),
      weighed: { partA: a, partB: b, pigment: mass('pigment'), mixed: mass('mixed'), ratioErrorPercent: error === null ? null : Math.round(error * 1e6) / 1e4 },
      readings: { total: w.total, rejected: w.rejected },
    };
  }

  /**
   * Releases a batch when it is complete (releaseCheck) and no rejection is left open; 409 with
   * what is missing otherwise, nothing written.
   */
  async release(c: RequestContext, batchId: string): Promise<void> {
    const orgId = c.principal.organizationId;
    const actor = actorOf(c.principal);
    await this.db.transaction(async (trx) => {
      const check = await this.releaseCheck(c, batchId, trx);
      if (!check.ready) {
        const parts = [...check.missing.map((m) => m.message), ...(check.openRejections ? [`The batch has ${check.openRejections} rejected reading(s) not waived.`] : [])];
        throw new ProblemException(409, {
          slug: 'conflict',
          detail: `The batch cannot be released yet. ${parts.join(' ')}`,
          errors: [
            ...check.missing.map((m) => ({ pointer: `/missing/${m.item}`, detail: m.message, code: m.problem })),
            ...(check.openRejections ? [{ pointer: '/openRejections', detail: `${check.openRejections} rejected reading(s) not waived`, code: 'open_rejections' }] : []),
          ],
        });
      }
      const moved = await this.batches.move(trx, orgId, batchId, 'released', actor, 'released by an engineer');
      if (!moved) {
        const state = await this.batches.state(trx, orgId, batchId);
        if (state !== 'released') throw new ProblemException(409, { slug: 'conflict', detail: `A ${state} batch cannot be released.` });
        return;
      }
      await this.batches.recordRelease(trx, c, batchId, { required: check.required });
    });
  }
}
