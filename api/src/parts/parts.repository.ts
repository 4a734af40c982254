import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';

export const partsListSpec: ListSpec = {
  resource: 'parts',
  sortable: ['createdAt', 'demoldedAt', 'moldedDensityKgM3', 'cavity'],
  filters: { batchId: 'eq', workOrderId: 'eq', disposition: { kind: 'eq', values: ['accepted', 'rework', 'scrap'] }, densityVerdict: { kind: 'eq', values: ['within', 'below', 'above'] }, id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const partColumns = {
  createdAt: 'parts.created_at', demoldedAt: 'parts.demolded_at', moldedDensityKgM3: 'parts.molded_density_kg_m3', cavity: 'parts.cavity',
  batchId: 'parts.batch_id', workOrderId: 'batches.work_order_id', disposition: 'parts.disposition', densityVerdict: 'parts.density_verdict', id: 'parts.id',
};

export const defectCausesListSpec: ListSpec = {
  resource: 'defect-causes',
  sortable: ['code', 'name', 'createdAt'],
  filters: { q: 'text', active: 'bool', id: 'in' },
  defaultSort: ['name', 'ASC'],
};
const causeColumns = { code: 'code', name: 'name', createdAt: 'created_at', q: 'name', active: 'active', id: 'id' };


export interface PartRow {
  id: string;
  organization_id: string;
  batch_id: string;
  work_order_id?: string | null;
  cavity: number;
  serial: string | null;
  mass_kg: number;
  mass_source: 'scale' | 'entered';
  device_id: string | null;
  cavity_volume_m3: number;
  molded_density_kg_m3: number;
  target_density_kg_m3: number;
  tolerance_percent: number;
  density_verdict: 'within' | 'below' | 'above';
  disposition: 'accepted' | 'rework' | 'scrap' | null;
  defect_causes: string[];
  disposition_note: string | null;
  created_by_label: string | null;
  demolded_at: Date;
  created_at: Date;
}

/** What the part use cases read of a batch: its subject, snapshot, work order, mold, station and revision's part spec. */
export interface BatchFacts {
  id: string;
  state: string;
  subject: 'mold' | 'free_rise_cup';
  work_order_id: string | null;
  work_order_external_ref: string | null;
  mold_id: string | null;
  mold_name: string | null;
  cavities: number | null;
  station_code: string | null;
  station_id: string | null;
  material_system_id: string;
  material_system_name: string;
  planned_for: Date | string;
  targets: { input?: { mold?: { volume: number; cavities: number } }; targets?: { targetDensity?: { value: number }; foamMass?: { value: number }; components?: Record<'A' | 'B' | 'pigment', { mass: { value: number } }> } };
  lot_a_id: string | null;
  lot_b_id: string | null;
  lot_pigment_id: string | null;
  lot_a_number: string | null;
  lot_b_number: string | null;
  lot_pigment_number: string | null;
  part_density_tolerance_percent: number | null;
  core_density_min_kg_m3: number | null;
  core_density_max_kg_m3: number | null;
  indentation_force_min_n: number | null;
  indentation_force_max_n: number | null;
  durometer_scale: string | null;
  durometer_min: number | null;
  durometer_max: number | null;
  decision: 'accepted' | 'rework' | 'scrap' | null;
}

/**
 * The parts, specimens, dispositions and defect causes tables, and the read model of plan-to-part:
 * batches with their lots, work order, mold, station and the revision's part spec, and the accepted
 * masses of their readings (reads only; those tables change through their own modules).
 */
@Injectable()
export class PartsRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  transaction<T>(fn: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
    return this.db.transaction(fn);
  }

  batches(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('batches')
      .join('material_systems', 'material_systems.id', 'batches.material_system_id')
      .join('material_system_revisions as rev', 'rev.id', 'batches.material_system_revision_id')
      .leftJoin('molds', 'molds.id', 'batches.mold_id')
      .leftJoin('work_orders', 'work_orders.id', 'batches.work_order_id')
      .leftJoin('stations', 'stations.id', 'batches.station_id')
      .leftJoin('lots as la', 'la.id', 'batches.lot_a_id')
      .leftJoin('lots as lb', 'lb.id', 'batches.lot_b_id')
      .leftJoin('lots as lp', 'lp.id', 'batches.lot_pigment_id')
      .leftJoin('batch_dispositions as d', 'd.batch_id', 'batches.id')
      .where('batches.organization_id', orgId)
      .select(
        'batches.id', 'batches.state', 'batches.subject', 'batches.work_order_id', 'batches.mold_id', 'batches.station_id', 'batches.material_system_id', 'batches.planned_for', 'batches.targets',
        'batches.lot_a_id', 'batches.lot_b_id', 'batches.lot_pigment_id', 'la.lot_number as lot_a_number', 'lb.lot_number as lot_b_number', 'lp.lot_number as lot_pigment_number',
        'work_orders.external_ref as work_order_external_ref', 'molds.name as mold_name', 'molds.cavities', 'stations.code as station_code', 'material_systems.name as material_system_name',
        'rev.part_density_tolerance_percent', 'rev.core_density_min_kg_m3', 'rev.core_density_max_kg_m3', 'rev.indentation_force_min_n', 'rev.indentation_force_max_n',
        'rev.durometer_scale', 'rev.durometer_min', 'rev.durometer_max', 'd.decision',
      )
      .orderBy([{ column: 'batches.planned_for' }, { column: 'batches.created_at' }]);
  }

  batch(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<BatchFacts | undefined> {
    return this.batches(orgId, db).where('batches.id', id).first();
  }

  batchesOfWorkOrder(orgId: string, workOrderId: string, db: Knex | Knex.Transaction = this.db): Promise<BatchFacts[]> {
    return this.batches(orgId, db).where('batches.work_order_id', workOrderId);
  }

  batchesOfLot(orgId: string, lotId: string): Promise<BatchFacts[]> {
    return this.batches(orgId).where((w) => w.where('batches.lot_a_id', lotId).orWhere('batches.lot_b_id', lotId).orWhere('batches.lot_pigment_id', lotId));
  }

  /** The latest settled mass of each part in each batch whose verdict stands accepted (accepted, or rejected and waived). */
  async acceptedMasses(orgId: string, batchIds: string[], db: Knex | Knex.Transaction = this.db): Promise<{ batch_id: string; subject: 'part_a' | 'part_b' | 'pigment'; value_si: number }[]> {
    if (batchIds.length === 0) return [];
    return db('readings')
      .where({ organization_id: orgId, quantity: 'mass', stable: true })
      .whereIn('batch_id', batchIds)
      .whereIn('subject', ['part_a', 'part_b', 'pigment'])
      .where((w) => w.where('status', 'accepted').orWhere((x) => x.where('status', 'rejected').where('review_decision', 'waive')))
      .distinctOn('batch_id', 'subject')
      .orderBy([{ column: 'batch_id' }, { column: 'subject' }, { column: 'received_at', order: 'desc' }, { column: 'id', order: 'desc' }])
      .select('batch_id', 'subject', 'value_si');
  }

  private partsBase(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('parts').join('batches', 'batches.id', 'parts.batch_id').where('parts.organization_id', orgId).select('parts.*', 'batches.work_order_id');
  }

  listParts(orgId: string, q: ListQuery) {
    return listPage<PartRow>(this.partsBase(orgId), q, partsListSpec, partColumns);
  }

  part(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<PartRow | undefined> {
    return this.partsBase(orgId, db).where('parts.id', id).first();
  }

  partsOfBatches(orgId: string, batchIds: string[], db: Knex | Knex.Transaction = this.db): Promise<PartRow[]> {
    if (batchIds.length === 0) return Promise.resolve([]);
    return this.partsBase(orgId, db).whereIn('parts.batch_id', batchIds).orderBy([{ column: 'parts.cavity' }, { column: 'parts.created_at' }]);
  }

  async insertPart(trx: Knex.Transaction, row: Record<string, unknown>): Promise<string> {
    const [r] = await trx('parts').insert(row).returning('id');
    return r.id as string;
  }

  async setPartDisposition(trx: Knex.Transaction, orgId: string, ids: string[], patch: { disposition: string; defect_causes: string; disposition_note: string | null }) {
    if (ids.length) await trx('parts').where('organization_id', orgId).whereIn('id', ids).update(patch);
  }

  specimensOf(orgId: string, partIds: string[]): Promise<Record<string, unknown>[]> {
    if (partIds.length === 0) return Promise.resolve([]);
    return this.db('part_specimens').where('organization_id', orgId).whereIn('part_id', partIds).orderBy('created_at');
  }

  async insertSpecimen(trx: Knex.Transaction, row: Record<string, unknown>): Promise<string> {
    const [r] = await trx('part_specimens').insert(row).returning('id');
    return r.id as string;
  }

  disposition(orgId: string, batchId: string): Promise<Record<string, unknown> | undefined> {
    return this.db('batch_dispositions').where({ organization_id: orgId, batch_id: batchId }).first();
  }

  /** Inserts the batch's disposition unless it has one; false when it had. */
  async insertDisposition(trx: Knex.Transaction, row: Record<string, unknown>): Promise<boolean> {
    const r = await trx('batch_dispositions').insert(row).onConflict('batch_id').ignore().returning('id');
    return r.length > 0;
  }

  /** Disposed batches in a period (by the day decided), with their facts, for the Pareto. */
  disposedIn(orgId: string, from: string, to: string, filter: { materialSystemId?: string; moldId?: string; stationCode?: string }) {
    const q = this.batches(orgId)
      .select('d.defect_causes as batch_defect_causes')
      .whereNotNull('d.id')
      .where('d.decided_at', '>=', `${from}T00:00:00Z`)
      .where('d.decided_at', '<', this.db.raw(`(?::date + 1)::timestamptz`, [to]));
    if (filter.materialSystemId) q.where('batches.material_system_id', filter.materialSystemId);
    if (filter.moldId) q.where('batches.mold_id', filter.moldId);
    if (filter.stationCode) q.where('stations.code', filter.stationCode);
    return q as unknown as Promise<(BatchFacts & { batch_defect_causes: string[] })[]>;
  }

  // defect causes

  listCauses(orgId: string, q: ListQuery) {
    return listPage<Record<string, unknown>>(this.db('defect_causes').where('organization_id', orgId).select('*'), q, defectCausesListSpec, causeColumns);
  }

  cause(orgId: string, id: string): Promise<Record<string, unknown> | undefined> {
    return this.db('defect_causes').where({ organization_id: orgId, id }).first();
  }

  causesByCode(orgId: string, codes: string[]): Promise<{ code: string; name: string; active: boolean }[]> {
    if (codes.length === 0) return Promise.resolve([]);
    return this.db('defect_causes').where('organization_id', orgId).whereIn('code', codes).select('code', 'name', 'active');
  }

  allCauses(orgId: string): Promise<{ code: string; name: string }[]> {
    return this.db('defect_causes').where('organization_id', orgId).select('code', 'name');
  }

  async insertCause(trx: Knex.Transaction, row: Record<string, unknown>): Promise<string> {
    const [r] = await trx('defect_causes').insert(row).returning('id');
    return r.id as string;
  }

  async updateCause(trx: Knex.Transaction, orgId: string, id: string, patch: Record<string, unknown>) {
    await trx('defect_causes').where({ organization_id: orgId, id }).update(patch);
  }
}
