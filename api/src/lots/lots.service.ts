import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { type FieldError, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { isoDay, todayUtc, usableUntil } from '@pourgate/batching';
import { conflict, isUniqueViolation, notFound } from '../shop/errors.js';
import { EventsService } from '../events/events.service.js';
import { ProblemException } from '../common/problems.js';

export const lotsListSpec: ListSpec = {
  resource: 'lots',
  sortable: ['lotNumber', 'part', 'receivedOn', 'expiresOn', 'createdAt'],
  filters: { q: 'text', part: 'eq', materialSystemId: 'eq', expiresBefore: 'lte', expiresAfter: 'gte', id: 'in' },
  defaultSort: ['expiresOn', 'ASC'],
};
const columns = { lotNumber: 'lots.lot_number', part: 'lots.part', receivedOn: 'lots.received_on', expiresOn: 'lots.expires_on', createdAt: 'lots.created_at', q: 'lots.lot_number', materialSystemId: 'lots.material_system_id', expiresBefore: 'lots.expires_on', expiresAfter: 'lots.expires_on', id: 'lots.id' };

export type LotPart = 'A' | 'B' | 'pigment';

export interface LotInput {
  part: LotPart;
  materialSystemId?: string | null;
  lotNumber: string;
  receivedOn: string;
  expiresOn: string;
  openedOn?: string | null;
  shelfLifeDaysAfterOpening?: number | null;
  notes?: string | null;
}

export interface LotRow {
  id: string;
  organization_id: string;
  part: LotPart;
  material_system_id: string | null;
  material_system_name?: string | null;
  lot_number: string;
  received_on: Date | string;
  expires_on: Date | string;
  opened_on: Date | string | null;
  notes: string | null;
  created_at: Date;
  updated_at: Date;
  held_by_cup_test_id?: string | null;
  held_at?: Date | null;
  hold_released_at?: Date | null;
  hold_released_by_label?: string | null;
  hold_release_note?: string | null;
  shelf_life_days_after_opening?: number | null;
  recalled_at?: Date | null;
  recall_reason?: string | null;
  recalled_by_label?: string | null;
}

/** Why a lot may not go into a new batch without an engineer's override. */
export interface LotBar {
  id: string;
  lotNumber: string;
  part: LotPart;
  code: 'lot_expired' | 'lot_on_hold' | 'lot_recalled';
  detail: string;
}

/** The last day a lot may be used: its expiry, or earlier once opened when it has a shelf life after opening. */
export function lotUsableUntil(r: LotRow): string {
  return usableUntil(isoDay(r.expires_on)!, isoDay(r.opened_on), r.shelf_life_days_after_opening ?? null);
}

export function lotView(r: LotRow, today = todayUtc()) {
  return {
    id: r.id,
    part: r.part,
    materialSystemId: r.material_system_id,
    materialSystemName: r.material_system_name ?? null,
    lotNumber: r.lot_number,
    receivedOn: isoDay(r.received_on),
    expiresOn: isoDay(r.expires_on),
    openedOn: isoDay(r.opened_on),
    shelfLifeDaysAfterOpening: r.shelf_life_days_after_opening ?? null,
    usableUntil: lotUsableUntil(r),
    expired: lotUsableUntil(r) < today,
    recall: r.recalled_at ? { at: r.recalled_at, reason: r.recall_reason ?? null, by: r.recalled_by_label ?? null } : null,
    /** Held for new batches: its latest cup test failed and no engineer has released it yet. */
    hold: r.held_at ? { since: r.held_at, cupTestId: r.held_by_cup_test_id ?? null } : null,
    lastHoldRelease: r.hold_released_at ? { at: r.hold_released_at, by: r.hold_released_by_label ?? null, note: r.hold_release_note ?? null } : null,
    notes: r.notes,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

@Injectable()
export class LotsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, private readonly events: EventsService) {}

  base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('lots')
      .leftJoin('material_systems', 'material_systems.id', 'lots.material_system_id')
      .where('lots.organization_id', orgId)
      .select('lots.*', 'material_systems.name as material_system_name');
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<LotRow>(this.base(c.principal.organizationId), q, lotsListSpec, columns);
    return { rows: rows.map((r) => lotView(r)), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.base(c.principal.organizationId).where('lots.id', id).first();
    if (!r) throw notFound('lot');
    return lotView(r);
  }

  /** Lots by id within an organization, for the services that reference them. */
  async rows(orgId: string, ids: string[], db: Knex | Knex.Transaction = this.db): Promise<Map<string, LotRow>> {
    if (ids.length === 0) return new Map();
    const rows: LotRow[] = await this.base(orgId, db).whereIn('lots.id', ids);
    return new Map(rows.map((r) => [r.id, r]));
  }

  private async check(orgId: string, body: LotInput): Promise<FieldError[]> {
    const errors: FieldError[] = [];
    if (body.part !== 'pigment' && !body.materialSystemId) {
      errors.push({ pointer: '/materialSystemId', detail: `a part ${body.part} lot belongs to a material system`, code: 'required' });
    }
    if (body.materialSystemId && !(await this.db('material_systems').where({ id: body.materialSystemId, organization_id: orgId }).first('id'))) {
      errors.push({ pointer: '/materialSystemId', detail: 'no material system with that id in your organization', code: 'reference' });
    }
    if (body.expiresOn < body.receivedOn) errors.push({ pointer: '/expiresOn', detail: 'must not be before the received date', code: 'range' });
    if (body.openedOn && body.openedOn < body.receivedOn) errors.push({ pointer: '/openedOn', detail: 'must not be before the received date', code: 'range' });
    return errors;
  }

  private columns(body: LotInput) {
    return {
      part: body.part,
      material_system_id: body.materialSystemId ?? null,
      lot_number: body.lotNumber.trim(),
      received_on: body.receivedOn,
      expires_on: body.expiresOn,
      opened_on: body.openedOn ?? null,
      shelf_life_days_after_opening: body.shelfLifeDaysAfterOpening ?? null,
      notes: body.notes ?? null,
    };
  }

  private duplicate(e: unknown, body: LotInput): never {
    if (isUniqueViolation(e)) throw conflict(`A part ${body.part} lot ${body.lotNumber} is already recorded.`, '/lotNumber', 'already recorded for this part');
    throw e;
  }

  async create(c: RequestContext, body: LotInput) {
    const orgId = c.principal.organizationId;
    const errors = await this.check(orgId, body);
    if (errors.length) throw validationProblem(errors);
    const id = await this.db
      .transaction(async (trx) => {
        const [row] = await trx('lots').insert({ ...this.columns(body), organization_id: orgId }).returning('id');
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'lot.received', targetType: 'lot', targetId: row.id, details: { part: body.part, lotNumber: body.lotNumber }, ip: c.ip, userAgent: c.userAgent }, trx);
        return row.id as string;
      })
      .catch((e) => this.duplicate(e, body));
    return this.get(c, id);
  }

  async update(c: RequestContext, id: string, body: LotInput) {
    const orgId = c.principal.organizationId;
    const current = await this.get(c, id);
    const errors = await this.check(orgId, body);
    if (current.part !== body.part || current.materialSystemId !== (body.materialSystemId ?? null)) {
      const used = await this.db('batches').where({ organization_id: orgId }).andWhere((w) => w.where('lot_a_id', id).orWhere('lot_b_id', id).orWhere('lot_pigment_id', id)).first('id');
      const tested = await this.db('qc_cup_tests').where({ organization_id: orgId }).andWhere((w) => w.where('lot_a_id', id).orWhere('lot_b_id', id)).first('id');
      if (used || tested) errors.push({ pointer: current.part !== body.part ? '/part' : '/materialSystemId', detail: 'cannot change: batches or cup tests already use this lot', code: 'immutable' });
    }
    if (errors.length) throw validationProblem(errors);
    await this.db
      .transaction(async (trx) => {
        await trx('lots').where({ id, organization_id: orgId }).update(this.columns(body));
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'lot.changed', targetType: 'lot', targetId: id, details: { part: body.part, lotNumber: body.lotNumber }, ip: c.ip, userAgent: c.userAgent }, trx);
      })
      .catch((e) => this.duplicate(e, body));
    return this.get(c, id);
  }

  /**
   * The lots among `ids` that may not go into a batch poured on `day` without an override: used
   * past their expiry (or their shelf life after opening), held by a failed cup test, or recalled.
   */
  async bars(orgId: string, ids: string[], day: string): Promise<LotBar[]> {
    const found = await this.rows(orgId, ids);
    const out: LotBar[] = [];
    for (const r of found.values()) {
      const until = lotUsableUntil(r);
      const base = { id: r.id, lotNumber: r.lot_number, part: r.part };
      if (r.recalled_at) out.push({ ...base, code: 'lot_recalled', detail: `lot ${r.lot_number} is recalled${r.recall_reason ? `: ${r.recall_reason}` : ''}` });
      if (r.held_at) out.push({ ...base, code: 'lot_on_hold', detail: `lot ${r.lot_number} is on hold since ${new Date(r.held_at).toISOString()} (failed cup test)` });
      if (until < day) out.push({ ...base, code: 'lot_expired', detail: `lot ${r.lot_number} may be used until ${until}${until !== isoDay(r.expires_on) ? ' (its shelf life after opening)' : ''}; the batch is for ${day}` });
    }
    return out;
  }

  /**
   * Recalls a lot: it may go into no new batch, and lot.recalled tells the ERP which batches it went
   * into (counted by the caller, who reads the genealogy). Audited; a second recall is a 409.
   */
  async recall(trx: Knex.Transaction, c: RequestContext, id: string, reason: string, affected: { batches: number; workOrders: number }) {
    const orgId = c.principal.organizationId;
    const actor = actorOf(c.principal);
    const lot = await trx('lots').where({ id, organization_id: orgId }).forUpdate().first('id', 'lot_number', 'part', 'recalled_at');
    if (!lot) throw notFound('lot');
    if (lot.recalled_at) throw new ProblemException(409, { slug: 'conflict', detail: `Lot ${lot.lot_number} is already recalled.` });
    await trx('lots').where({ id }).update({ recalled_at: trx.fn.now(), recall_reason: reason, recalled_by_label: actor.actorLabel });
    await this.events.emit(trx, { organizationId: orgId, type: 'lot.recalled', subjectType: 'lot', subjectId: id, data: { lotId: id, lotNumber: lot.lot_number, part: lot.part, reason, recalledBy: actor.actorLabel, affectedBatches: affected.batches, affectedWorkOrders: affected.workOrders } });
    await this.audit.record({ organizationId: orgId, ...actor, action: 'lot.recalled', targetType: 'lot', targetId: id, details: { reason, ...affected }, ip: c.ip, userAgent: c.userAgent }, trx);
  }

  /** The lots among `ids` on hold, for refusing a new batch. */
  async held(orgId: string, ids: string[]): Promise<{ id: string; lotNumber: string; heldAt: string }[]> {
    if (ids.length === 0) return [];
    const rows = await this.db('lots').where('organization_id', orgId).whereIn('id', ids).whereNotNull('held_at').select('id', 'lot_number', 'held_at');
    return rows.map((r: { id: string; lot_number: string; held_at: Date }) => ({ id: r.id, lotNumber: r.lot_number, heldAt: new Date(r.held_at).toISOString() }));
  }

  /**
   * Holds lots for new batches because a cup test of theirs failed (inside the cup test's
   * transaction): lot.held for each lot not already on hold.
   */
  async holdForCupTest(trx: Knex.Transaction, orgId: string, lotIds: string[], cupTestId: string, reasons: { code: string }[]): Promise<void> {
    for (const id of lotIds) {
      const [row] = await trx('lots').where({ id, organization_id: orgId }).whereNull('held_at').update({ held_at: trx.fn.now(), held_by_cup_test_id: cupTestId }).returning(['id', 'lot_number', 'part']);
      if (!row) continue;
      await this.events.emit(trx, { organizationId: orgId, type: 'lot.held', subjectType: 'lot', subjectId: id, data: { lotId: id, lotNumber: row.lot_number, part: row.part, cupTestId, reasons: reasons.map((r) => r.code) } });
    }
  }

  /** An engineer releases a held lot, with a note saying why (audited; lot.hold_released). */
  async releaseHold(c: RequestContext, id: string, note: string) {
    const orgId = c.principal.organizationId;
    if (!note?.trim()) throw validationProblem([{ pointer: '/note', detail: 'releasing a held lot needs a note saying why', code: 'required' }]);
    const actor = actorOf(c.principal);
    await this.db.transaction(async (trx) => {
      const lot = await trx('lots').where({ id, organization_id: orgId }).forUpdate().first('id', 'lot_number', 'part', 'held_at', 'held_by_cup_test_id');
      if (!lot) throw notFound('lot');
      if (!lot.held_at) throw new ProblemException(409, { slug: 'conflict', detail: `Lot ${lot.lot_number} is not on hold.` });
      await trx('lots').where({ id }).update({ held_at: null, held_by_cup_test_id: null, hold_released_at: trx.fn.now(), hold_released_by_label: actor.actorLabel, hold_release_note: note.trim() });
      await this.events.emit(trx, { organizationId: orgId, type: 'lot.hold_released', subjectType: 'lot', subjectId: id, data: { lotId: id, lotNumber: lot.lot_number, part: lot.part, cupTestId: lot.held_by_cup_test_id, note: note.trim(), releasedBy: actor.actorLabel } });
      await this.audit.record({ organizationId: orgId, ...actor, action: 'lot.hold_released', targetType: 'lot', targetId: id, details: { note: note.trim(), cupTestId: lot.held_by_cup_test_id, heldAt: lot.held_at }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.get(c, id);
  }
}
