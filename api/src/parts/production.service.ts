import { Injectable } from '@nestjs/common';
import { pareto, proposedBatchCount, todayUtc, yieldOf } from '@pourgate/batching';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { ProblemException } from '../common/problems.js';
import { EventsService } from '../events/events.service.js';
import { LotsService } from '../lots/lots.service.js';
import { MoldsService } from '../molds/molds.service.js';
import { notFound } from '../shop/errors.js';
import { WorkOrdersService } from '../work-orders/work-orders.service.js';
import { addCounts, lotsOf, noParts, partCounts, plannedFor, toCsv } from './part-figures.js';
import { type BatchFacts, type PartRow, PartsRepository } from './parts.repository.js';
import { dispositionView, PartsService } from './parts.service.js';

export interface ParetoQuery {
  from?: string;
  to?: string;
  groupBy?: 'none' | 'system' | 'mold' | 'station';
  materialSystemId?: string;
  moldId?: string;
  stationCode?: string;
}

const SUBJECT_PART = { part_a: 'A', part_b: 'B', pigment: 'pigment' } as const;
const PLAN_LISTED = 200;

/**
 * From plan to part, per work order and per lot: the batches a work order still needs, what it
 * consumed and made (and its completion for the ERP's back-flush), where a lot went (genealogy and
 * the recall report), and the Pareto of defect causes. Figures come from the pure package.
 */
@Injectable()
export class ProductionService {
  constructor(
    private readonly repo: PartsRepository,
    private readonly parts: PartsService,
    private readonly orders: WorkOrdersService,
    private readonly molds: MoldsService,
    private readonly lots: LotsService,
    private readonly audit: AuditService,
    private readonly events: EventsService,
  ) {}

  private async order(orgId: string, id: string) {
    const wo = await this.orders.row(orgId, id);
    if (!wo) throw notFound('work order');
    return wo;
  }

  async batchPlan(c: RequestContext, id: string) {
    const orgId = c.principal.organizationId;
    const wo = await this.order(orgId, id);
    if (!wo.mold_id || !wo.material_system_id) {
      throw new ProblemException(409, { slug: 'conflict', detail: 'The work order names no mold or no material system: give it both (PUT /v1/work-orders/{id}) to plan its batches.' });
    }
    const mold = (await this.molds.row(orgId, wo.mold_id))!;
    const batches = (await this.repo.batchesOfWorkOrder(orgId, id)).filter((b) => b.state !== 'scrapped');
    const partsPlanned = batches.length * mold.cavities;
    const partsRemaining = Math.max(0, wo.quantity - partsPlanned);
    const proposed = proposedBatchCount(partsRemaining, mold.cavities);
    const day = wo.due_on ? String(new Date(wo.due_on).toISOString().slice(0, 10)) : todayUtc();
    const plannedOn = day < todayUtc() ? todayUtc() : day;
    return {
      workOrderId: wo.id,
      externalRef: wo.external_ref,
      ordered: wo.quantity,
      cavities: mold.cavities,
      batchesPlanned: batches.length,
      partsPlanned,
      partsRemaining,
      proposedBatches: proposed,
      batches: Array.from({ length: Math.min(proposed, PLAN_LISTED) }, () => ({ workOrderId: wo.id, moldId: wo.mold_id!, materialSystemId: wo.material_system_id!, options: { plannedFor: plannedOn } })),
    };
  }

  async consumption(c: RequestContext, id: string) {
    const orgId = c.principal.organizationId;
    const wo = await this.order(orgId, id);
    const batches = await this.repo.batchesOfWorkOrder(orgId, id);
    if (batches.length === 0) throw new ProblemException(409, { slug: 'conflict', detail: `Work order ${wo.external_ref} has no batches yet: nothing was consumed.` });
    const ids = batches.map((b) => b.id);
    const [masses, parts] = await Promise.all([this.repo.acceptedMasses(orgId, ids), this.repo.partsOfBatches(orgId, ids)]);
    const lines = new Map<string, { part: 'A' | 'B' | 'pigment'; lotId: string | null; lotNumber: string | null; batches: number; plannedKg: number; actualKg: number }>();
    let counts = noParts();
    let scrapMassKg = 0;
    for (const b of batches) {
      const own = parts.filter((p) => p.batch_id === b.id);
      counts = addCounts(counts, partCounts(b, own));
      scrapMassKg += scrapMass(b, own);
      for (const [subject, part] of Object.entries(SUBJECT_PART) as ['part_a' | 'part_b' | 'pigment', 'A' | 'B' | 'pigment'][]) {
        const planned = b.targets.targets?.components?.[part]?.mass.value ?? 0;
        const actual = masses.find((m) => m.batch_id === b.id && m.subject === subject)?.value_si ?? 0;
        if (planned === 0 && actual === 0) continue;
        const lot = lotsOf(b).find((l) => l.part === part);
        const key = `${part}:${lot?.id ?? ''}`;
        const line = lines.get(key) ?? { part, lotId: lot?.id ?? null, lotNumber: lot?.lotNumber ?? null, batches: 0, plannedKg: 0, actualKg: 0 };
        line.batches++;
        line.plannedKg += planned;
        line.actualKg += Number(actual);
        lines.set(key, line);
      }
    }
    const order = { A: 0, B: 1, pigment: 2 };
    return {
      workOrderId: wo.id,
      externalRef: wo.external_ref,
      partNumber: wo.part_number,
      state: wo.state,
      ordered: wo.quantity,
      batches: batches.length,
      parts: counts,
      yield: yieldOf(counts),
      scrapMassKg,
      materials: [...lines.values()].sort((a, b) => order[a.part] - order[b.part] || (a.lotNumber ?? '').localeCompare(b.lotNumber ?? '')).map((l) => ({ ...l, varianceKg: l.actualKg - l.plannedKg })),
    };
  }

  async consumptionCsv(c: RequestContext, id: string): Promise<string> {
    const r = await this.consumption(c, id);
    const head = ['work_order', 'part_number', 'ordered', 'batches', 'parts_accepted', 'parts_rework', 'parts_scrap', 'parts_undecided', 'yield', 'scrap_mass_kg', 'material', 'lot', 'lot_batches', 'planned_kg', 'actual_kg', 'variance_kg'];
    // a sheet for people and the ERP's import: kilograms to 0.1 g and the yield to 0.01 %, where the
    // JSON answer keeps every digit of the sums
    const kg = (x: number) => Math.round(x * 1e4) / 1e4;
    const common = [r.externalRef, r.partNumber, r.ordered, r.batches, r.parts.accepted, r.parts.rework, r.parts.scrap, r.parts.undecided, r.yield === null ? null : Math.round(r.yield * 1e4) / 1e4, kg(r.scrapMassKg)];
    const rows = r.materials.length ? r.materials.map((m) => [...common, m.part, m.lotNumber, m.batches, kg(m.plannedKg), kg(m.actualKg), kg(m.varianceKg)]) : [[...common, null, null, null, null, null, null]];
    return toCsv(head, rows);
  }

  /** Completes a work order: state done, and work_order.completed carries its consumption for the ERP's back-flush. */
  async complete(c: RequestContext, id: string, note: string | null) {
    const orgId = c.principal.organizationId;
    const figures = await this.consumption(c, id);
    const actor = actorOf(c.principal);
    await this.repo.transaction(async (trx) => {
      if (!(await this.orders.markDone(trx, orgId, id))) throw new ProblemException(409, { slug: 'conflict', detail: `Work order ${figures.externalRef} is already ${figures.state}.` });
      const { undecided: _u, ...parts } = figures.parts;
      await this.events.emit(trx, {
        organizationId: orgId, type: 'work_order.completed', subjectType: 'work_order', subjectId: id,
        data: { workOrderId: id, externalRef: figures.externalRef, partNumber: figures.partNumber, parts: { ordered: figures.ordered, ...parts }, yield: figures.yield, scrapMassKg: figures.scrapMassKg, materials: figures.materials },
      });
      await this.audit.record({ organizationId: orgId, ...actor, action: 'work_order.completed', targetType: 'work_order', targetId: id, details: { note, parts: figures.parts, yield: figures.yield }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.consumption(c, id);
  }

  private genealogyRow(b: BatchFacts, parts: PartRow[]) {
    return {
      batchId: b.id, state: b.state, plannedFor: plannedFor(b), workOrderId: b.work_order_id, workOrderExternalRef: b.work_order_external_ref, moldName: b.mold_name, stationCode: b.station_code,
      disposition: b.decision, parts: partCounts(b, parts.filter((p) => p.batch_id === b.id)), lots: lotsOf(b),
    };
  }

  async lotGenealogy(c: RequestContext, lotId: string) {
    const orgId = c.principal.organizationId;
    const lot = await this.lots.get(c, lotId);
    const batches = await this.repo.batchesOfLot(orgId, lotId);
    const parts = await this.repo.partsOfBatches(orgId, batches.map((b) => b.id));
    const rows = batches.map((b) => this.genealogyRow(b, parts));
    const orders = new Map<string, { id: string; externalRef: string; partNumber: string | null; state: string; batches: number }>();
    for (const b of batches) {
      if (!b.work_order_id) continue;
      const o = orders.get(b.work_order_id) ?? (await this.orderSummary(orgId, b.work_order_id));
      o.batches++;
      orders.set(b.work_order_id, o);
    }
    return { lot, batches: rows, workOrders: [...orders.values()], parts: rows.reduce((a, r) => addCounts(a, r.parts), noParts()) };
  }

  private async orderSummary(orgId: string, id: string) {
    const wo = (await this.orders.row(orgId, id))!;
    return { id: wo.id, externalRef: wo.external_ref, partNumber: wo.part_number, state: wo.state, batches: 0 };
  }

  async batchGenealogy(c: RequestContext, batchId: string) {
    const orgId = c.principal.organizationId;
    const b = await this.parts.batch(orgId, batchId);
    const rows = await this.repo.partsOfBatches(orgId, [batchId]);
    const d = await this.repo.disposition(orgId, batchId);
    return { batchId: b.id, state: b.state, workOrderId: b.work_order_id, workOrderExternalRef: b.work_order_external_ref, lots: lotsOf(b), disposition: d ? dispositionView(d, b, rows) : null, parts: await this.parts.withSpecimens(orgId, rows) };
  }

  async recallReport(c: RequestContext, lotId: string) {
    const g = await this.lotGenealogy(c, lotId);
    const orders = new Map(g.workOrders.map((o) => [o.id, o]));
    const rows = g.batches.map((b) => ({
      batchId: b.batchId, plannedFor: b.plannedFor, state: b.state, workOrderId: b.workOrderId, workOrderExternalRef: b.workOrderExternalRef,
      partNumber: b.workOrderId ? (orders.get(b.workOrderId)?.partNumber ?? null) : null, moldName: b.moldName, stationCode: b.stationCode,
      partCount: b.parts.accepted + b.parts.rework + b.parts.scrap + b.parts.undecided, disposition: b.disposition, parts: b.parts,
    }));
    return {
      lotId: g.lot.id, lotNumber: g.lot.lotNumber, part: g.lot.part, recall: g.lot.recall, generatedAt: new Date().toISOString(), rows,
      totals: { batches: rows.length, workOrders: g.workOrders.length, parts: rows.reduce((s, r) => s + r.partCount, 0) },
    };
  }

  async recallCsv(c: RequestContext, lotId: string): Promise<string> {
    const r = await this.recallReport(c, lotId);
    const head = ['lot', 'part', 'batch', 'planned_for', 'state', 'work_order', 'part_number', 'mold', 'station', 'part_count', 'disposition', 'accepted', 'rework', 'scrap', 'undecided'];
    return toCsv(head, r.rows.map((x) => [r.lotNumber, r.part, x.batchId, x.plannedFor, x.state, x.workOrderExternalRef, x.partNumber, x.moldName, x.stationCode, x.partCount, x.disposition, x.parts.accepted, x.parts.rework, x.parts.scrap, x.parts.undecided]));
  }

  async recall(c: RequestContext, lotId: string, reason: string) {
    const g = await this.lotGenealogy(c, lotId);
    await this.repo.transaction((trx) => this.lots.recall(trx, c, lotId, reason.trim(), { batches: g.batches.length, workOrders: g.workOrders.length }));
    return this.recallReport(c, lotId);
  }

  async pareto(c: RequestContext, q: ParetoQuery) {
    const orgId = c.principal.organizationId;
    const to = q.to ?? todayUtc();
    const from = q.from ?? new Date(Date.parse(`${to}T00:00:00Z`) - 29 * 86_400_000).toISOString().slice(0, 10);
    if (from > to) throw new ProblemException(422, { slug: 'validation-failed', detail: 'The period ends before it starts.', errors: [{ pointer: '/from', detail: 'must not be after to', code: 'range' }] });
    const groupBy = q.groupBy ?? 'none';
    const batches = await this.repo.disposedIn(orgId, from, to, q);
    const parts = await this.repo.partsOfBatches(orgId, batches.map((b) => b.id));
    const names = new Map((await this.repo.allCauses(orgId)).map((x) => [x.code, x.name]));
    const groups = new Map<string, { key: string | null; name: string | null; counts: Map<string, number> }>();
    for (const b of batches) {
      const [key, name] = groupBy === 'system' ? [b.material_system_id, b.material_system_name] : groupBy === 'mold' ? [b.mold_id, b.mold_name] : groupBy === 'station' ? [b.station_code, b.station_code] : [null, null];
      const g = groups.get(key ?? '') ?? { key, name, counts: new Map<string, number>() };
      const own = parts.filter((p) => p.batch_id === b.id);
      const add = (code: string, n: number) => g.counts.set(code, (g.counts.get(code) ?? 0) + n);
      if (own.length) for (const p of own) if (p.disposition === 'rework' || p.disposition === 'scrap') for (const code of p.defect_causes ?? []) add(code, 1);
      if (!own.length && b.decision !== 'accepted') for (const code of b.batch_defect_causes ?? []) add(code, b.cavities ?? 1);
      groups.set(key ?? '', g);
    }
    return {
      from, to, groupBy,
      groups: [...groups.values()].map((g) => {
        const bars = pareto([...g.counts].map(([code, count]) => ({ code, count }))).map((bar) => ({ ...bar, name: names.get(bar.code) ?? bar.code }));
        return { key: g.key, name: g.name, defects: bars.reduce((s, x) => s + x.count, 0), bars };
      }).sort((a, b) => b.defects - a.defects || String(a.name).localeCompare(String(b.name))),
    };
  }
}

/** The mass scrapped in a batch: its scrap parts as weighed, or its foam target per cavity for a batch scrapped whole with none weighed. */
function scrapMass(b: BatchFacts, parts: PartRow[]): number {
  if (parts.length) return parts.filter((p) => p.disposition === 'scrap').reduce((s, p) => s + p.mass_kg, 0);
  if (b.decision !== 'scrap') return 0;
  return b.targets.targets?.foamMass?.value ?? 0;
}
