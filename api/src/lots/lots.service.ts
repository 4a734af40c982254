import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { type FieldError, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { isoDay, todayUtc } from '@pourgate/batching';
import { conflict, isUniqueViolation, notFound } from '../shop/errors.js';

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
    expired: isoDay(r.expires_on)! < today,
    notes: r.notes,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

@Injectable()
export class LotsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService) {}

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
}
