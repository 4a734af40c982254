import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { fitFreeRiseDensity, fitRejection, FIT_TRUST, forReader, judgeCupTest, parametersOf, type Finding, type UnitSystem } from '@pourgate/batching';
import { ControlService } from '../control/control.service.js';
import { MaterialSystemsService } from '../materials/material-systems.service.js';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { type FieldError, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { LotsService } from '../lots/lots.service.js';
import { notFound } from '../shop/errors.js';
import { QuantityReader, type Quantity } from '@pourgate/batching';
import { CUP_TESTS_FITTED } from '../targets/targets.service.js';

export const cupTestsListSpec: ListSpec = {
  resource: 'qc-cup-tests',
  sortable: ['testedAt', 'freeRiseDensityKgM3', 'createdAt'],
  filters: { materialSystemId: 'eq', testedAfter: 'gte', testedBefore: 'lte', id: 'in' },
  defaultSort: ['testedAt', 'DESC'],
};
const columns = { testedAt: 'qc_cup_tests.tested_at', freeRiseDensityKgM3: 'qc_cup_tests.free_rise_density_kg_m3', createdAt: 'qc_cup_tests.created_at', materialSystemId: 'qc_cup_tests.material_system_id', testedAfter: 'qc_cup_tests.tested_at', testedBefore: 'qc_cup_tests.tested_at', id: 'qc_cup_tests.id' };

export interface CupTestInput {
  materialSystemId: string;
  lotAId?: string | null;
  lotBId?: string | null;
  componentTemperatureA: Quantity;
  componentTemperatureB: Quantity;
  creamTime?: Quantity | null;
  topOfCupTime?: Quantity | null;
  tackFreeTime?: Quantity | null;
  freeRiseDensity: Quantity;
  testedAt: string;
  notes?: string | null;
}

interface CupTestRow {
  id: string;
  material_system_id: string;
  material_system_name: string;
  revision: number | null;
  lot_a_id: string | null;
  lot_b_id: string | null;
  component_temperature_a_c: number;
  component_temperature_b_c: number;
  cream_time_s: number | null;
  top_of_cup_time_s: number | null;
  tack_free_time_s: number | null;
  free_rise_density_kg_m3: number;
  tested_at: Date;
  notes: string | null;
  created_by_label: string | null;
  created_at: Date;
  verdict: 'passed' | 'failed' | 'not_judged';
  findings: Finding[];
  free_rise_density_at_reference_kg_m3: number | null;
}

/** A cup test in the terms of ASTM D7487 (cream, top-of-cup and tack-free times; free-rise density), SI. */
export function cupTestView(r: CupTestRow, units: UnitSystem = 'metric') {
  return {
    id: r.id,
    materialSystemId: r.material_system_id,
    materialSystemName: r.material_system_name,
    materialSystemRevision: r.revision,
    lotAId: r.lot_a_id,
    lotBId: r.lot_b_id,
    componentTemperatureAC: r.component_temperature_a_c,
    componentTemperatureBC: r.component_temperature_b_c,
    creamTimeS: r.cream_time_s,
    topOfCupTimeS: r.top_of_cup_time_s,
    tackFreeTimeS: r.tack_free_time_s,
    freeRiseDensityKgM3: r.free_rise_density_kg_m3,
    /** Judged against the system's reactivity window and density band (its revision of the day). */
    verdict: r.verdict ?? 'not_judged',
    findings: forReader(r.findings ?? [], units),
    freeRiseDensityAtReferenceKgM3: r.free_rise_density_at_reference_kg_m3 ?? null,
    testedAt: r.tested_at,
    notes: r.notes,
    createdBy: r.created_by_label,
    createdAt: r.created_at,
  };
}

@Injectable()
export class QcCupTestsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, private readonly lots: LotsService, private readonly systems: MaterialSystemsService, private readonly control: ControlService) {}

  base(orgId: string) {
    return this.db('qc_cup_tests')
      .join('material_systems', 'material_systems.id', 'qc_cup_tests.material_system_id')
      .leftJoin('material_system_revisions', 'material_system_revisions.id', 'qc_cup_tests.material_system_revision_id')
      .where('qc_cup_tests.organization_id', orgId)
      .select('qc_cup_tests.*', 'material_systems.name as material_system_name', 'material_system_revisions.revision');
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<CupTestRow>(this.base(c.principal.organizationId), q, cupTestsListSpec, columns);
    return { rows: rows.map((r) => cupTestView(r)), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.base(c.principal.organizationId).where('qc_cup_tests.id', id).first();
    if (!r) throw notFound('cup test');
    return cupTestView(r);
  }

  /** The least-squares line of free-rise density against component temperature over a system's cups. */
  async fit(c: RequestContext, systemId: string) {
    const orgId = c.principal.organizationId;
    if (!(await this.db('material_systems').where({ id: systemId, organization_id: orgId }).first('id'))) throw notFound('material system');
    const rows = await this.db('qc_cup_tests').where({ organization_id: orgId, material_system_id: systemId }).orderBy('tested_at', 'desc').limit(CUP_TESTS_FITTED)
      .select('component_temperature_a_c', 'component_temperature_b_c', 'free_rise_density_kg_m3');
    const points = rows.map((r) => ({ temperature: (r.component_temperature_a_c + r.component_temperature_b_c) / 2, density: r.free_rise_density_kg_m3 }));
    const fit = fitFreeRiseDensity(points);
    const rev = await this.systems.revision(orgId, systemId);
    const reference = rev?.free_rise_reference_temperature_c ?? null;
    const rejected = points.length && reference !== null ? fitRejection(fit, points, reference) : 'too_few_points';
    return {
      materialSystemId: systemId,
      cupTests: points.length,
      temperatureBasis: 'mean of the A and B component temperatures, °C',
      fit: fit && { slopeKgM3PerC: fit.slope, interceptKgM3: fit.intercept, rSquared: fit.rSquared, residualStandardDeviationKgM3: fit.residualStandardDeviation, count: fit.count },
      /** Whether targets use this line (at the reference temperature), and why not when they do not. */
      trusted: rejected === null,
      notTrustedBecause: rejected,
      trustRules: { ...FIT_TRUST },
    };
  }

  async create(c: RequestContext, body: CupTestInput) {
    const orgId = c.principal.organizationId;
    const errors: FieldError[] = [];
    const ms = await this.db('material_systems').where({ id: body.materialSystemId, organization_id: orgId }).first('id', 'current_revision');
    if (!ms) errors.push({ pointer: '/materialSystemId', detail: 'no material system with that id in your organization', code: 'reference' });
    const lots = await this.lots.rows(orgId, [body.lotAId, body.lotBId].filter((x): x is string => !!x));
    for (const [part, id] of [['A', body.lotAId], ['B', body.lotBId]] as const) {
      if (!id) continue;
      const lot = lots.get(id);
      const pointer = `/lot${part}Id`;
      if (!lot) errors.push({ pointer, detail: 'no lot with that id in your organization', code: 'reference' });
      else if (lot.part !== part) errors.push({ pointer, detail: `lot ${lot.lot_number} is ${lot.part === 'pigment' ? 'pigment' : `part ${lot.part}`}, not part ${part}`, code: 'wrong_part' });
      else if (ms && lot.material_system_id !== ms.id) errors.push({ pointer, detail: `lot ${lot.lot_number} belongs to another material system`, code: 'wrong_system' });
    }
    const q = new QuantityReader();
    const tA = q.read('temperature', body.componentTemperatureA, '/componentTemperatureA');
    const tB = q.read('temperature', body.componentTemperatureB, '/componentTemperatureB');
    const cream = q.read('time', body.creamTime, '/creamTime', { nonNegative: true });
    const topOfCup = q.read('time', body.topOfCupTime, '/topOfCupTime', { positive: true });
    const tackFree = q.read('time', body.tackFreeTime, '/tackFreeTime', { positive: true });
    const density = q.read('density', body.freeRiseDensity, '/freeRiseDensity', { positive: true });
    // the foam starts to rise (cream) before it can reach the top of the cup (ASTM D7487's order of events)
    if (typeof cream === 'number' && typeof topOfCup === 'number' && cream > topOfCup) q.add('/topOfCupTime/value', 'must not be before the cream time', 'range');
    if (new Date(body.testedAt).getTime() > Date.now() + 5 * 60_000) errors.push({ pointer: '/testedAt', detail: 'is in the future', code: 'range' });
    errors.push(...q.errors);
    if (errors.length) throw validationProblem(errors);
    const revision = await this.systems.revision(orgId, ms.id);
    // judged against the system's reactivity window and density band (ASTM D7487 terms), the density
    // brought to the reference temperature with the system's slope
    const system = revision ? parametersOf(revision, revision.kind) : null;
    const judged = system
      ? judgeCupTest(
          { temperature: (tA! + tB!) / 2, creamTime: cream ?? null, riseTime: topOfCup ?? null, tackFreeTime: tackFree ?? null, freeRiseDensity: density! },
          { creamTimeWindow: system.creamTimeWindow, riseTimeWindow: system.riseTimeWindow, tackFreeTimeWindow: system.tackFreeTimeWindow, freeRiseDensityBand: system.freeRiseDensityBand, referenceTemperature: system.freeRiseReferenceTemperature, slope: system.freeRiseDensitySlope },
        )
      : { verdict: 'not_judged' as const, findings: [], correctedDensity: null };
    const id = await this.db.transaction(async (trx) => {
      const [row] = await trx('qc_cup_tests')
        .insert({
          organization_id: orgId,
          material_system_id: ms.id,
          material_system_revision_id: revision?.id ?? null,
          lot_a_id: body.lotAId ?? null,
          lot_b_id: body.lotBId ?? null,
          component_temperature_a_c: tA,
          component_temperature_b_c: tB,
          cream_time_s: cream ?? null,
          top_of_cup_time_s: topOfCup ?? null,
          tack_free_time_s: tackFree ?? null,
          free_rise_density_kg_m3: density,
          tested_at: body.testedAt,
          notes: body.notes ?? null,
          created_by_label: actorOf(c.principal).actorLabel,
          verdict: judged.verdict,
          findings: JSON.stringify(judged.findings),
          free_rise_density_at_reference_kg_m3: judged.correctedDensity,
        })
        .returning('id');
      // a failed cup test holds its lots for new batches until an engineer releases them
      if (judged.verdict === 'failed') {
        await this.lots.holdForCupTest(trx, orgId, [body.lotAId, body.lotBId].filter((x): x is string => !!x), row.id, judged.findings);
      }
      // the free-rise density is a point of the system's control charts (a drift signal rides on this transaction)
      await this.control.recordCupTest(trx, { id: row.id, organizationId: orgId, materialSystemId: ms.id, lotAId: body.lotAId ?? null, lotBId: body.lotBId ?? null, freeRiseDensityKgM3: density!, testedAt: body.testedAt });
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'qc_cup_test.recorded', targetType: 'qc_cup_test', targetId: row.id, details: { materialSystemId: ms.id, freeRiseDensityKgM3: density }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return this.get(c, id);
  }
}
