import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash } from 'node:crypto';
import { EventsService } from '../events/events.service.js';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { type FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { isoDay } from '@pourgate/batching';
import { notFound } from '../shop/errors.js';

export const workOrdersListSpec: ListSpec = {
  resource: 'work-orders',
  sortable: ['externalRef', 'dueOn', 'state', 'quantity', 'createdAt', 'updatedAt'],
  filters: { q: 'text', externalRef: 'eq', state: 'eq', moldId: 'eq', materialSystemId: 'eq', dueBefore: 'lte', dueAfter: 'gte', id: 'in' },
  defaultSort: ['dueOn', 'ASC'],
};
const columns = {
  externalRef: 'work_orders.external_ref', dueOn: 'work_orders.due_on', state: 'work_orders.state', quantity: 'work_orders.quantity', createdAt: 'work_orders.created_at', updatedAt: 'work_orders.updated_at',
  q: 'work_orders.external_ref', moldId: 'work_orders.mold_id', materialSystemId: 'work_orders.material_system_id', dueBefore: 'work_orders.due_on', dueAfter: 'work_orders.due_on', id: 'work_orders.id',
};

export const WORK_ORDER_STATES = ['open', 'in_progress', 'done', 'cancelled'] as const;
export type WorkOrderState = (typeof WORK_ORDER_STATES)[number];

export interface WorkOrderInput {
  externalRef?: string;
  partNumber?: string | null;
  moldId?: string | null;
  materialSystemId?: string | null;
  quantity?: number;
  dueOn?: string | null;
  notes?: string | null;
  state?: WorkOrderState;
}

export interface WorkOrderRow {
  id: string;
  organization_id: string;
  external_ref: string;
  part_number: string | null;
  mold_id: string | null;
  mold_name?: string | null;
  material_system_id: string | null;
  material_system_name?: string | null;
  quantity: number;
  due_on: Date | string | null;
  notes: string | null;
  state: WorkOrderState;
  request_hash: string;
  created_by_label: string | null;
  created_at: Date;
  updated_at: Date;
}

export function workOrderView(r: WorkOrderRow) {
  return {
    id: r.id,
    externalRef: r.external_ref,
    partNumber: r.part_number,
    moldId: r.mold_id,
    moldName: r.mold_name ?? null,
    materialSystemId: r.material_system_id,
    materialSystemName: r.material_system_name ?? null,
    quantity: r.quantity,
    dueOn: isoDay(r.due_on),
    notes: r.notes,
    state: r.state,
    createdBy: r.created_by_label,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

/**
 * The body of a first post, with every default filled in and keys in a fixed order: two posts are
 * "the same" when these agree, whatever order or optional nulls the ERP sent.
 */
export function canonicalPost(body: WorkOrderInput): string {
  const canonical = {
    dueOn: body.dueOn ?? null,
    externalRef: body.externalRef,
    materialSystemId: body.materialSystemId ?? null,
    moldId: body.moldId ?? null,
    notes: body.notes ?? null,
    partNumber: body.partNumber ?? null,
    quantity: body.quantity,
    state: body.state ?? 'open',
  };
  return JSON.stringify(canonical);
}

export function requestHash(body: WorkOrderInput): string {
  return createHash('sha256').update(canonicalPost(body)).digest('hex');
}

@Injectable()
export class WorkOrdersService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, private readonly events: EventsService) {}

  base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('work_orders')
      .leftJoin('molds', 'molds.id', 'work_orders.mold_id')
      .leftJoin('material_systems', 'material_systems.id', 'work_orders.material_system_id')
      .where('work_orders.organization_id', orgId)
      .select('work_orders.*', 'molds.name as mold_name', 'material_systems.name as material_system_name');
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<WorkOrderRow>(this.base(c.principal.organizationId), q, workOrdersListSpec, columns);
    return { rows: rows.map(workOrderView), total };
  }

  async row(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<WorkOrderRow | undefined> {
    return this.base(orgId, db).where('work_orders.id', id).first();
  }

  async get(c: RequestContext, id: string) {
    const r = await this.row(c.principal.organizationId, id);
    if (!r) throw notFound('work order');
    return workOrderView(r);
  }

  private async checkReferences(orgId: string, body: WorkOrderInput): Promise<FieldError[]> {
    const errors: FieldError[] = [];
    if (body.moldId && !(await this.db('molds').where({ id: body.moldId, organization_id: orgId }).first('id'))) {
      errors.push({ pointer: '/moldId', detail: 'no mold with that id in your organization', code: 'reference' });
    }
    if (body.materialSystemId && !(await this.db('material_systems').where({ id: body.materialSystemId, organization_id: orgId }).first('id'))) {
      errors.push({ pointer: '/materialSystemId', detail: 'no material system with that id in your organization', code: 'reference' });
    }
    return errors;
  }

  /**
   * Idempotent on the ERP's reference: a first post creates the order (created: true); the same
   * reference with the same body returns the order as it is now (created: false); with another
   * body it is a 409, and nothing changes.
   */
  async post(c: RequestContext, body: WorkOrderInput): Promise<{ created: boolean; order: ReturnType<typeof workOrderView> }> {
    const orgId = c.principal.organizationId;
    const errors = await this.checkReferences(orgId, body);
    if (errors.length) throw validationProblem(errors);
    const hash = requestHash(body);
    const actor = actorOf(c.principal);
    const result = await this.db.transaction(async (trx) => {
      const [row] = await trx('work_orders')
        .insert({
          organization_id: orgId,
          external_ref: body.externalRef,
          part_number: body.partNumber ?? null,
          mold_id: body.moldId ?? null,
          material_system_id: body.materialSystemId ?? null,
          quantity: body.quantity,
          due_on: body.dueOn ?? null,
          notes: body.notes ?? null,
          state: body.state ?? 'open',
          request_hash: hash,
          created_by_label: actor.actorLabel,
        })
        .onConflict(['organization_id', 'external_ref'])
        .ignore()
        .returning('id');
      if (row) {
        await this.audit.record({ organizationId: orgId, ...actor, action: 'work_order.posted', targetType: 'work_order', targetId: row.id, details: { externalRef: body.externalRef, quantity: body.quantity }, ip: c.ip, userAgent: c.userAgent }, trx);
        await this.events.emit(trx, { organizationId: orgId, type: 'work_order.created', subjectType: 'work_order', subjectId: row.id, data: { workOrderId: row.id, externalRef: body.externalRef, quantity: body.quantity, state: body.state ?? 'open' } });
        return { id: row.id as string, created: true };
      }
      const existing = await trx('work_orders').where({ organization_id: orgId, external_ref: body.externalRef }).first('id', 'request_hash');
      if (existing.request_hash !== hash) {
        throw new ProblemException(409, {
          slug: 'conflict',
          detail: `Work order ${body.externalRef} was already posted with a different body. Post changes with PUT /v1/work-orders/${existing.id}.`,
          existingId: existing.id,
          errors: [{ pointer: '/externalRef', detail: 'already posted with a different body', code: 'conflict' }],
        });
      }
      return { id: existing.id as string, created: false };
    });
    return { created: result.created, order: await this.get(c, result.id) };
  }

  async update(c: RequestContext, id: string, body: WorkOrderInput) {
    const orgId = c.principal.organizationId;
    const current = await this.row(orgId, id);
    if (!current) throw notFound('work order');
    const errors = await this.checkReferences(orgId, body);
    if (body.externalRef !== undefined && body.externalRef !== current.external_ref) {
      errors.push({ pointer: '/externalRef', detail: 'cannot change; it identifies the order to the ERP', code: 'immutable' });
    }
    if (errors.length) throw validationProblem(errors);
    const patch: Record<string, unknown> = {};
    const map: [keyof WorkOrderInput, string][] = [['partNumber', 'part_number'], ['moldId', 'mold_id'], ['materialSystemId', 'material_system_id'], ['quantity', 'quantity'], ['dueOn', 'due_on'], ['notes', 'notes'], ['state', 'state']];
    for (const [field, col] of map) if (body[field] !== undefined) patch[col] = body[field];
    if (Object.keys(patch).length) {
      await this.db.transaction(async (trx) => {
        await trx('work_orders').where({ id, organization_id: orgId }).update(patch);
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'work_order.changed', targetType: 'work_order', targetId: id, details: { fields: Object.keys(patch), state: body.state }, ip: c.ip, userAgent: c.userAgent }, trx);
        await this.events.emit(trx, { organizationId: orgId, type: 'work_order.changed', subjectType: 'work_order', subjectId: id, data: { workOrderId: id, externalRef: current.external_ref, changed: Object.keys(body).filter((k) => body[k as keyof WorkOrderInput] !== undefined) } });
      });
    }
    return this.get(c, id);
  }
}
