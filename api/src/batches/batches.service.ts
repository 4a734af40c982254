import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { BatchTargets, BatchTargetsInput } from '@pourgate/batching';
import type { UnitSystem } from '@pourgate/batching';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { type FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { isoDay } from '@pourgate/batching';
import { notFound } from '../shop/errors.js';
import type { Quantity } from '@pourgate/batching';
import { type OptionsInput, type TargetsSources, TargetsService } from '../targets/targets.service.js';
import { EventsService } from '../events/events.service.js';
import { moveBatch, type TransitionActor } from './batch-transitions.js';
import type { BatchState } from './batch-states.js';
import { LotsService } from '../lots/lots.service.js';
import { roleAllows } from '@pourgate/permissions';

export const batchesListSpec: ListSpec = {
  resource: 'batches',
  sortable: ['createdAt', 'plannedFor', 'state', 'totalMassKg'],
  filters: { state: 'eq', workOrderId: 'eq', moldId: 'eq', materialSystemId: 'eq', plannedAfter: 'gte', plannedBefore: 'lte', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const columns = {
  createdAt: 'batches.created_at', plannedFor: 'batches.planned_for', state: 'batches.state', totalMassKg: 'batches.total_mass_kg',
  workOrderId: 'batches.work_order_id', moldId: 'batches.mold_id', materialSystemId: 'batches.material_system_id', plannedAfter: 'batches.planned_for', plannedBefore: 'batches.planned_for', id: 'batches.id',
};

export const transitionsListSpec: ListSpec = { resource: 'batch-state-transitions', sortable: ['at'], filters: {}, defaultSort: ['at', 'ASC'] };

/** Every batch starts planned; the readings pipeline moves it on. */
export const INITIAL_BATCH_STATE = 'planned';

export interface BatchInput {
  workOrderId?: string | null;
  materialSystemId?: string;
  materialSystemRevision?: number;
  moldId?: string;
  freeRiseCup?: { volume: Quantity };
  stationCode?: string | null;
  options?: OptionsInput;
  notes?: string | null;
  lotOverride?: { reason: string };
}

/** An engineer let expired, held or recalled lots into the batch: why, who, when, and which lots. */
export interface LotOverride {
  reason: string;
  by: string;
  at: string;
  lots: { id: string; lotNumber: string; part: string; code: string }[];
}

/** What a batch stores of its targets: every SI input, where each came from, and the result. */
export interface TargetsSnapshot {
  computationVersion: string;
  computedAt: string;
  input: BatchTargetsInput;
  sources: TargetsSources;
  targets: BatchTargets;
}

interface BatchRow {
  id: string;
  organization_id: string;
  work_order_id: string | null;
  work_order_external_ref: string | null;
  material_system_id: string;
  material_system_name: string;
  material_system_revision_id: string;
  material_system_revision: number;
  subject: 'mold' | 'free_rise_cup';
  mold_id: string | null;
  mold_name: string | null;
  scale_device_id: string | null;
  station_id: string | null;
  station_code: string | null;
  lot_a_id: string | null;
  lot_b_id: string | null;
  lot_pigment_id: string | null;
  state: string;
  planned_for: Date | string;
  notes: string | null;
  options: OptionsInput;
  computation_version: string;
  targets: TargetsSnapshot;
  total_mass_kg: number;
  lot_override?: LotOverride | null;
  created_by_label: string | null;
  created_at: Date;
  updated_at: Date;
}

export function batchView(r: BatchRow) {
  const t = r.targets.targets;
  return {
    id: r.id,
    state: r.state,
    workOrderId: r.work_order_id,
    workOrderExternalRef: r.work_order_external_ref,
    materialSystemId: r.material_system_id,
    materialSystemName: r.material_system_name,
    materialSystemRevision: r.material_system_revision,
    materialSystemRevisionId: r.material_system_revision_id,
    subject: r.subject,
    moldId: r.mold_id,
    moldName: r.mold_name,
    scaleDeviceId: r.scale_device_id,
    stationCode: r.station_code,
    lots: r.targets.sources.lots,
    plannedFor: isoDay(r.planned_for),
    notes: r.notes,
    options: r.options,
    computationVersion: r.computation_version,
    summary: {
      targetDensityKgM3: t.targetDensity.value,
      packFactor: t.packFactor.value,
      foamMassKg: t.foamMass.value,
      mixedMassKg: t.mixedMass.value,
      massAKg: t.components.A.mass.value,
      massBKg: t.components.B.mass.value,
      pigmentMassKg: t.components.pigment.mass.value,
      totalMassKg: r.total_mass_kg,
      warnings: t.warnings.map((w) => w.code),
    },
    targetsHref: `/v1/batches/${r.id}/targets`,
    lotOverride: r.lot_override ?? null,
    cautions: t.cautions,
    createdBy: r.created_by_label,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

@Injectable()
export class BatchesService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, private readonly targets: TargetsService, private readonly events: EventsService, private readonly lots: LotsService) {}

  base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('batches')
      .join('material_systems', 'material_systems.id', 'batches.material_system_id')
      .join('material_system_revisions', 'material_system_revisions.id', 'batches.material_system_revision_id')
      .leftJoin('molds', 'molds.id', 'batches.mold_id')
      .leftJoin('work_orders', 'work_orders.id', 'batches.work_order_id')
      .leftJoin('stations', 'stations.id', 'batches.station_id')
      .where('batches.organization_id', orgId)
      .select(
        'batches.*',
        'material_systems.name as material_system_name',
        'material_system_revisions.revision as material_system_revision',
        'molds.name as mold_name',
        'work_orders.external_ref as work_order_external_ref',
        'stations.code as station_code',
      );
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<BatchRow>(this.base(c.principal.organizationId), q, batchesListSpec, columns);
    return { rows: rows.map(batchView), total };
  }

  private async row(c: RequestContext, id: string): Promise<BatchRow> {
    const r = await this.base(c.principal.organizationId).where('batches.id', id).first();
    if (!r) throw notFound('batch');
    return r;
  }

  async get(c: RequestContext, id: string) {
    return batchView(await this.row(c, id));
  }

  /** The stored snapshot, in the caller's units with SI alongside: the parameters it was computed with. */
  async storedTargets(c: RequestContext, id: string, units: UnitSystem) {
    const r = await this.row(c, id);
    const snap = r.targets;
    return {
      batchId: r.id,
      state: r.state,
      computedAt: snap.computedAt,
      ...(await this.targets.view(c, units, snap)),
    };
  }

  async transitions(c: RequestContext, id: string, q: ListQuery) {
    await this.row(c, id);
    const base = this.db('batch_state_transitions').where({ organization_id: c.principal.organizationId, batch_id: id }).select('*');
    const { rows, total } = await listPage<Record<string, unknown>>(base, q, transitionsListSpec, {});
    return {
      rows: rows.map((t) => ({ id: Number(t.id), batchId: t.batch_id, from: t.from_state, to: t.to_state, at: t.at, actorType: t.actor_type, actor: t.actor_label, reason: t.reason })),
      total,
    };
  }

  /**
   * Plans a batch: the work order's mold and system unless given, the system's current revision
   * unless one is named, targets computed now and stored with every input, state `planned`.
   */
  async create(c: RequestContext, body: BatchInput) {
    const orgId = c.principal.organizationId;
    const errors: FieldError[] = [];
    let systemId = body.materialSystemId;
    let moldId = body.moldId;
    let workOrderId: string | null = null;
    if (body.workOrderId) {
      const wo = await this.db('work_orders').where({ id: body.workOrderId, organization_id: orgId }).first();
      if (!wo) errors.push({ pointer: '/workOrderId', detail: 'no work order with that id in your organization', code: 'reference' });
      else {
        workOrderId = wo.id;
        if (wo.state === 'done' || wo.state === 'cancelled') errors.push({ pointer: '/workOrderId', detail: `the work order is ${wo.state}`, code: 'state' });
        if (systemId && wo.material_system_id && systemId !== wo.material_system_id) errors.push({ pointer: '/materialSystemId', detail: 'differs from the work order’s material system', code: 'conflicting' });
        if (moldId && wo.mold_id && moldId !== wo.mold_id) errors.push({ pointer: '/moldId', detail: 'differs from the work order’s mold', code: 'conflicting' });
        systemId ??= wo.material_system_id ?? undefined;
        if (!body.freeRiseCup) moldId ??= wo.mold_id ?? undefined;
      }
    }
    let stationId: string | null = null;
    if (body.stationCode) {
      const st = await this.db('stations').where({ organization_id: orgId, code: body.stationCode }).first('id');
      if (!st) errors.push({ pointer: '/stationCode', detail: 'no station with that code in your organization', code: 'reference' });
      else stationId = st.id;
    }
    if (errors.length) throw validationProblem(errors);

    const resolved = await this.targets.resolve(orgId, {
      system: systemId ? { id: systemId, revision: body.materialSystemRevision } : undefined,
      mold: moldId ? { id: moldId } : undefined,
      freeRiseCup: body.freeRiseCup,
      options: body.options,
      at: { systemId: '/materialSystemId', systemRevision: '/materialSystemRevision', systemInline: '/materialSystemId', moldId: '/moldId', moldInline: '/moldId', freeRiseCup: '/freeRiseCup', options: '/options' },
    });
    // an expired, held or recalled lot goes into a new batch only on an engineer's override, with a reason
    const bars = await this.lots.bars(orgId, Object.values(resolved.lotIds).filter((x): x is string => !!x), resolved.sources.plannedFor);
    let lotOverride: LotOverride | null = null;
    if (bars.length) {
      const at = (lotId: string) => `/options/lots/${Object.entries(resolved.lotIds).find(([, id]) => id === lotId)?.[0] ?? ''}`;
      if (!body.lotOverride) {
        throw new ProblemException(409, {
          slug: 'conflict',
          detail: `${bars.map((b) => b.detail).join('; ')}. An engineer may plan the batch anyway with lotOverride: { reason }.`,
          errors: bars.map((b) => ({ pointer: at(b.id), detail: b.detail, code: b.code })),
        });
      }
      const p = c.principal;
      if (p.kind !== 'user' || !roleAllows(p.role, 'lots:override')) {
        throw new ProblemException(403, { detail: 'Only an engineer or an admin may let an expired, held or recalled lot into a batch.', errors: [{ pointer: '/lotOverride', detail: 'your role may not override a lot bar', code: 'forbidden' }] });
      }
      lotOverride = { reason: body.lotOverride.reason.trim(), by: actorOf(p).actorLabel, at: new Date().toISOString(), lots: bars.map((b) => ({ id: b.id, lotNumber: b.lotNumber, part: b.part, code: b.code })) };
    }
    if (!stationId && resolved.scaleDeviceId) {
      const dev = await this.db('devices').where({ id: resolved.scaleDeviceId }).first('station_id');
      stationId = dev?.station_id ?? null;
    }
    const snapshot: TargetsSnapshot = {
      computationVersion: resolved.targets.computationVersion,
      computedAt: new Date().toISOString(),
      input: resolved.input,
      sources: resolved.sources,
      targets: resolved.targets,
    };
    const actor = actorOf(c.principal);
    const id = await this.db.transaction(async (trx) => {
      const [row] = await trx('batches')
        .insert({
          organization_id: orgId,
          work_order_id: workOrderId,
          material_system_id: resolved.systemId,
          material_system_revision_id: resolved.systemRevisionId,
          subject: resolved.targets.subject,
          mold_id: resolved.moldId,
          scale_device_id: resolved.scaleDeviceId,
          station_id: stationId,
          lot_a_id: resolved.lotIds.A ?? null,
          lot_b_id: resolved.lotIds.B ?? null,
          lot_pigment_id: resolved.lotIds.pigment ?? null,
          state: INITIAL_BATCH_STATE,
          planned_for: resolved.sources.plannedFor,
          notes: body.notes ?? null,
          options: JSON.stringify(body.options ?? {}),
          computation_version: snapshot.computationVersion,
          targets: JSON.stringify(snapshot),
          total_mass_kg: resolved.targets.totalMass.value,
          lot_override: lotOverride ? JSON.stringify(lotOverride) : null,
          created_by_label: actor.actorLabel,
        })
        .returning('id');
      await trx('batch_state_transitions').insert({ organization_id: orgId, batch_id: row.id, from_state: null, to_state: INITIAL_BATCH_STATE, actor_type: actor.actorType, actor_id: actor.actorId, actor_label: actor.actorLabel, reason: workOrderId ? 'planned for a work order' : 'planned ad hoc' });
      await this.events.emit(trx, { organizationId: orgId, type: 'batch.created', subjectType: 'batch', subjectId: row.id, data: { batchId: row.id, workOrderId, materialSystemId: resolved.systemId, subject: resolved.targets.subject, totalMassKg: resolved.targets.totalMass.value, state: INITIAL_BATCH_STATE } });
      if (lotOverride) await this.audit.record({ organizationId: orgId, ...actor, action: 'batch.lot_override', targetType: 'batch', targetId: row.id, details: { reason: lotOverride.reason, lots: lotOverride.lots }, ip: c.ip, userAgent: c.userAgent }, trx);
      await this.audit.record({ organizationId: orgId, ...actor, action: 'batch.planned', targetType: 'batch', targetId: row.id, details: { workOrderId, materialSystemRevisionId: resolved.systemRevisionId, moldId: resolved.moldId, totalMassKg: resolved.targets.totalMass.value, computationVersion: snapshot.computationVersion }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return this.get(c, id);
  }

  /**
   * A query that finds the batch in the organization: another module's write may be conditional on
   * it. Plain SQL, as it runs inside every single reading's insert.
   */
  existsQuery(orgId: string, id: string): Knex.Raw {
    return this.db.raw('SELECT 1 FROM batches WHERE organization_id = ? AND id = ?', [orgId, id]);
  }

  /** The ids among `ids` that are batches of the organization. */

  async existingIds(orgId: string, ids: string[]): Promise<Set<string>> {
    if (ids.length === 0) return new Set();
    const rows: { id: string }[] = await this.db('batches').where('organization_id', orgId).whereIn('id', ids).select('id');
    return new Set(rows.map((r) => r.id));
  }

  /** What judging and release need of a batch: its state and the stored targets snapshot. */
  async judgingFacts(db: Knex | Knex.Transaction, orgId: string, batchId: string): Promise<{ state: string; snapshot: TargetsSnapshot | null; systemKind: string | null } | undefined> {
    const row = await db('batches').join('material_systems', 'material_systems.id', 'batches.material_system_id').where({ 'batches.id': batchId, 'batches.organization_id': orgId }).first('batches.state', 'batches.targets', 'material_systems.kind');
    return row ? { state: row.state, snapshot: row.targets ?? null, systemKind: row.kind ?? null } : undefined;
  }

  /** Moves a batch inside the caller's transaction when the move is legal (see batch-transitions.ts). */
  move(trx: Knex.Transaction, orgId: string, batchId: string, to: BatchState, actor: TransitionActor, reason: string): Promise<boolean> {
    return moveBatch(trx, this.events, orgId, batchId, to, actor, reason);
  }

  async state(trx: Knex | Knex.Transaction, orgId: string, batchId: string): Promise<string | undefined> {
    const b = await trx('batches').where({ id: batchId, organization_id: orgId }).first('state');
    return b?.state;
  }

  /** Audits a release decided by the review use case (same transaction). */
  async recordRelease(trx: Knex.Transaction, c: RequestContext, batchId: string, details: Record<string, unknown>) {
    await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'batch.released', targetType: 'batch', targetId: batchId, details, ip: c.ip, userAgent: c.userAgent }, trx);
  }
}
