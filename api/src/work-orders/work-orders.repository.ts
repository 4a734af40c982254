import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';

export const WORK_ORDER_STATES = ['open', 'in_progress', 'done', 'cancelled'] as const;
export type WorkOrderState = (typeof WORK_ORDER_STATES)[number];

export const workOrdersListSpec: ListSpec = {
  resource: 'work-orders',
  sortable: ['externalRef', 'dueOn', 'state', 'quantity', 'createdAt', 'updatedAt'],
  filters: { q: 'text', externalRef: 'eq', state: 'eq', moldId: 'eq', materialSystemId: 'eq', dueBefore: 'lte', dueAfter: 'gte', id: 'in' },
  defaultSort: ['dueOn', 'ASC'],
};
const columns = {
  externalRef: 'work_orders.external_ref',
  dueOn: 'work_orders.due_on',
  state: 'work_orders.state',
  quantity: 'work_orders.quantity',
  createdAt: 'work_orders.created_at',
  updatedAt: 'work_orders.updated_at',
  q: 'work_orders.external_ref',
  moldId: 'work_orders.mold_id',
  materialSystemId: 'work_orders.material_system_id',
  dueBefore: 'work_orders.due_on',
  dueAfter: 'work_orders.due_on',
  id: 'work_orders.id',
};

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

/**
 * The work_orders table. Reads join the mold's and the material system's names for display (a read
 * of their name columns only; changes to molds and systems go through their own modules).
 */
@Injectable()
export class WorkOrdersRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  transaction<T>(fn: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
    return this.db.transaction(fn);
  }

  private base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('work_orders')
      .leftJoin('molds', 'molds.id', 'work_orders.mold_id')
      .leftJoin('material_systems', 'material_systems.id', 'work_orders.material_system_id')
      .where('work_orders.organization_id', orgId)
      .select('work_orders.*', 'molds.name as mold_name', 'material_systems.name as material_system_name');
  }

  list(orgId: string, q: ListQuery): Promise<{ rows: WorkOrderRow[]; total: number | null }> {
    return listPage<WorkOrderRow>(this.base(orgId), q, workOrdersListSpec, columns);
  }

  row(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<WorkOrderRow | undefined> {
    return this.base(orgId, db).where('work_orders.id', id).first();
  }

  /** Inserts unless the organization already has this external reference; the new id, or undefined. */
  async insertOnce(trx: Knex.Transaction, row: Record<string, unknown>): Promise<string | undefined> {
    const [r] = await trx('work_orders').insert(row).onConflict(['organization_id', 'external_ref']).ignore().returning('id');
    return r?.id as string | undefined;
  }

  byExternalRef(trx: Knex.Transaction, orgId: string, externalRef: string | undefined): Promise<{ id: string; request_hash: string }> {
    return trx('work_orders').where({ organization_id: orgId, external_ref: externalRef }).first('id', 'request_hash');
  }

  async update(trx: Knex.Transaction, orgId: string, id: string, patch: Record<string, unknown>): Promise<void> {
    await trx('work_orders').where({ id, organization_id: orgId }).update(patch);
  }
}
