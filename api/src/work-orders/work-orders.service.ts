import { Injectable } from '@nestjs/common';
import { createHash } from 'node:crypto';
import type { Knex } from 'knex';
import { EventsService } from '../events/events.service.js';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { type FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { isoDay } from '@pourgate/batching';
import { MaterialSystemsService } from '../materials/material-systems.service.js';
import { MoldsService } from '../molds/molds.service.js';
import { notFound } from '../shop/errors.js';
import { type WorkOrderRow, WorkOrdersRepository, type WorkOrderState } from './work-orders.repository.js';

export { WORK_ORDER_STATES, workOrdersListSpec, type WorkOrderRow, type WorkOrderState } from './work-orders.repository.js';

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
  constructor(
    private readonly repo: WorkOrdersRepository,
    private readonly molds: MoldsService,
    private readonly systems: MaterialSystemsService,
    private readonly audit: AuditService,
    private readonly events: EventsService,
  ) {}

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.list(c.principal.organizationId, q);
    return { rows: rows.map(workOrderView), total };
  }

  row(orgId: string, id: string): Promise<WorkOrderRow | undefined> {
    return this.repo.row(orgId, id);
  }

  async get(c: RequestContext, id: string) {
    const r = await this.row(c.principal.organizationId, id);
    if (!r) throw notFound('work order');
    return workOrderView(r);
  }

  private async checkReferences(orgId: string, body: WorkOrderInput): Promise<FieldError[]> {
    const errors: FieldError[] = [];
    if (body.moldId && !(await this.molds.row(orgId, body.moldId))) {
      errors.push({ pointer: '/moldId', detail: 'no mold with that id in your organization', code: 'reference' });
    }
    if (body.materialSystemId && !(await this.systems.revision(orgId, body.materialSystemId))) {
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
    const result = await this.repo.transaction(async (trx) => {
      const id = await this.repo.insertOnce(trx, {
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
      });
      if (id) {
        await this.audit.record(
          {
            organizationId: orgId,
            ...actor,
            action: 'work_order.posted',
            targetType: 'work_order',
            targetId: id,
            details: { externalRef: body.externalRef, quantity: body.quantity },
            ip: c.ip,
            userAgent: c.userAgent,
          },
          trx,
        );
        await this.events.emit(trx, {
          organizationId: orgId,
          type: 'work_order.created',
          subjectType: 'work_order',
          subjectId: id,
          data: { workOrderId: id, externalRef: body.externalRef, quantity: body.quantity, state: body.state ?? 'open' },
        });
        return { id, created: true };
      }
      const existing = await this.repo.byExternalRef(trx, orgId, body.externalRef);
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

  /** Marks an order done inside the caller's transaction (its completion, with the consumption); false when it is done or cancelled already. */
  async markDone(trx: Knex.Transaction, orgId: string, id: string): Promise<boolean> {
    const r = await this.repo.row(orgId, id, trx);
    if (!r || r.state === 'done' || r.state === 'cancelled') return false;
    await this.repo.update(trx, orgId, id, { state: 'done' });
    return true;
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
    const map: [keyof WorkOrderInput, string][] = [
      ['partNumber', 'part_number'],
      ['moldId', 'mold_id'],
      ['materialSystemId', 'material_system_id'],
      ['quantity', 'quantity'],
      ['dueOn', 'due_on'],
      ['notes', 'notes'],
      ['state', 'state'],
    ];
    for (const [field, col] of map) if (body[field] !== undefined) patch[col] = body[field];
    if (Object.keys(patch).length) {
      await this.repo.transaction(async (trx) => {
        await this.repo.update(trx, orgId, id, patch);
        await this.audit.record(
          {
            organizationId: orgId,
            ...actorOf(c.principal),
            action: 'work_order.changed',
            targetType: 'work_order',
            targetId: id,
            details: { fields: Object.keys(patch), state: body.state },
            ip: c.ip,
            userAgent: c.userAgent,
          },
          trx,
        );
        await this.events.emit(trx, {
          organizationId: orgId,
          type: 'work_order.changed',
          subjectType: 'work_order',
          subjectId: id,
          data: { workOrderId: id, externalRef: current.external_ref, changed: Object.keys(body).filter((k) => body[k as keyof WorkOrderInput] !== undefined) },
        });
      });
    }
    return this.get(c, id);
  }
}
