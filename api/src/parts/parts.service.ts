import { Injectable } from '@nestjs/common';
import {
  DEFAULT_PART_DENSITY_TOLERANCE_PERCENT, FOAM_DENSITY_BOUNDS, MAX_INDENTATION_FORCE_N, MAX_PART_MASS_KG, QuantityReader,
  densityOf, forceToNewtons, isFoamDensity, judgeAgainstTarget, judgeBand, specimenVolume, type Quantity,
} from '@pourgate/batching';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { type FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { ControlService } from '../control/control.service.js';
import { EventsService } from '../events/events.service.js';
import { DevicesService } from '../devices/devices.service.js';
import { notFound } from '../shop/errors.js';
import { type Decision, partCounts } from './part-figures.js';
import { type BatchFacts, type PartRow, PartsRepository } from './parts.repository.js';

export interface PartInput {
  cavity?: number;
  serial?: string | null;
  mass: Quantity;
  source?: 'scale' | 'entered';
  deviceId?: string;
  demoldedAt?: string;
}

export interface SpecimenInput {
  test: 'core_density' | 'indentation_force' | 'durometer';
  mass?: Quantity;
  dimensions?: { length: Quantity; width: Quantity; thickness: Quantity };
  force?: { value: number; unit: 'N' | 'lbf' };
  durometer?: { scale: 'A' | 'OO' | 'D'; value: number };
  notes?: string | null;
}

export interface DispositionInput {
  decision: Decision;
  defectCauses?: string[];
  note?: string | null;
  parts?: { partId: string; decision: Decision; defectCauses?: string[] }[];
}

function specimenView(r: Record<string, unknown>, spec: { min: number | null; max: number | null }) {
  return {
    id: r.id as string,
    partId: r.part_id as string,
    test: r.test as string,
    massKg: (r.mass_kg as number | null) ?? null,
    volumeM3: (r.volume_m3 as number | null) ?? null,
    densityKgM3: (r.density_kg_m3 as number | null) ?? null,
    forceN: (r.force_n as number | null) ?? null,
    durometerScale: (r.durometer_scale as string | null) ?? null,
    durometer: (r.durometer as number | null) ?? null,
    verdict: (r.verdict as string | null) ?? null,
    spec,
    notes: (r.notes as string | null) ?? null,
    createdBy: (r.created_by_label as string | null) ?? null,
    createdAt: r.created_at as Date,
  };
}

/** The system's band for a specimen test (SI). */
export function specOf(b: BatchFacts, test: string): { min: number | null; max: number | null } {
  if (test === 'core_density') return { min: b.core_density_min_kg_m3, max: b.core_density_max_kg_m3 };
  if (test === 'indentation_force') return { min: b.indentation_force_min_n, max: b.indentation_force_max_n };
  return { min: b.durometer_min, max: b.durometer_max };
}

export function partView(r: PartRow, specimens: ReturnType<typeof specimenView>[] = []) {
  return {
    id: r.id,
    batchId: r.batch_id,
    workOrderId: r.work_order_id ?? null,
    cavity: r.cavity,
    serial: r.serial,
    massKg: r.mass_kg,
    massSource: r.mass_source,
    deviceId: r.device_id,
    cavityVolumeM3: r.cavity_volume_m3,
    moldedDensityKgM3: r.molded_density_kg_m3,
    targetDensityKgM3: r.target_density_kg_m3,
    tolerancePercent: r.tolerance_percent,
    deviationPercent: ((r.molded_density_kg_m3 - r.target_density_kg_m3) / r.target_density_kg_m3) * 100,
    densityVerdict: r.density_verdict,
    disposition: r.disposition,
    defectCauses: r.defect_causes ?? [],
    dispositionNote: r.disposition_note,
    specimens,
    createdBy: r.created_by_label,
    demoldedAt: r.demolded_at,
    createdAt: r.created_at,
  };
}

export function dispositionView(d: Record<string, unknown>, b: BatchFacts, parts: PartRow[]) {
  const { undecided, ...rest } = partCounts(b, parts);
  return {
    batchId: b.id,
    workOrderId: b.work_order_id,
    decision: d.decision as Decision,
    defectCauses: (d.defect_causes as string[]) ?? [],
    note: (d.note as string | null) ?? null,
    parts: { ...rest, undecided },
    decidedBy: (d.decided_by_label as string | null) ?? null,
    decidedAt: d.decided_at as Date,
  };
}

/**
 * The finished part: recording demolded parts (molded density judged against the batch's target),
 * their test specimens (judged against the system's spec), and the batch's disposition with defect
 * causes (batch.disposed).
 */
@Injectable()
export class PartsService {
  constructor(private readonly repo: PartsRepository, private readonly devices: DevicesService, private readonly audit: AuditService, private readonly events: EventsService, private readonly control: ControlService) {}

  async batch(orgId: string, id: string): Promise<BatchFacts> {
    const b = await this.repo.batch(orgId, id);
    if (!b) throw notFound('batch');
    return b;
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.listParts(c.principal.organizationId, q);
    return { rows: await this.withSpecimens(c.principal.organizationId, rows), total };
  }

  async withSpecimens(orgId: string, rows: PartRow[]) {
    const specimens = await this.repo.specimensOf(orgId, rows.map((r) => r.id));
    const batches = new Map<string, BatchFacts>();
    for (const id of new Set(rows.map((r) => r.batch_id))) batches.set(id, (await this.repo.batch(orgId, id))!);
    return rows.map((r) => partView(r, specimens.filter((s) => s.part_id === r.id).map((s) => specimenView(s, specOf(batches.get(r.batch_id)!, s.test as string)))));
  }

  async get(c: RequestContext, id: string) {
    const r = await this.repo.part(c.principal.organizationId, id);
    if (!r) throw notFound('part');
    return (await this.withSpecimens(c.principal.organizationId, [r]))[0]!;
  }

  async record(c: RequestContext, batchId: string, body: PartInput) {
    const orgId = c.principal.organizationId;
    const b = await this.batch(orgId, batchId);
    if (b.subject !== 'mold') throw new ProblemException(409, { slug: 'conflict', detail: 'A free-rise cup batch makes no part.' });
    const errors: FieldError[] = [];
    const q = new QuantityReader();
    const mass = q.read('mass', body.mass, '/mass', { positive: true });
    errors.push(...q.errors);
    if (typeof mass === 'number' && mass > MAX_PART_MASS_KG) errors.push({ pointer: '/mass/value', detail: `a part of more than ${MAX_PART_MASS_KG} kg is no foam part of one cavity`, code: 'range' });
    const volume = b.targets.input?.mold?.volume;
    const target = b.targets.targets?.targetDensity?.value;
    const cavities = b.cavities ?? b.targets.input?.mold?.cavities ?? 1;
    const cavity = body.cavity ?? 1;
    if (cavity > cavities) errors.push({ pointer: '/cavity', detail: `the mold has ${cavities} cavit${cavities === 1 ? 'y' : 'ies'}`, code: 'range' });
    // a device key weighs on its own scale; a person may name the scale
    const p = c.principal;
    let deviceId: string | null = body.deviceId ?? null;
    let source = body.source ?? (deviceId ? 'scale' : 'entered');
    if (p.kind === 'api_key' && p.keyKind === 'device') {
      if (body.deviceId && body.deviceId !== p.deviceId) errors.push({ pointer: '/deviceId', detail: 'a device key records parts on its own device only', code: 'forbidden' });
      deviceId = p.deviceId;
      source = 'scale';
    }
    if (source === 'scale' && !deviceId) errors.push({ pointer: '/deviceId', detail: 'a part weighed on a scale names the scale', code: 'required' });
    if (deviceId && !errors.some((e) => e.pointer === '/deviceId')) {
      const known = await this.devices.existingIds(orgId, [deviceId]);
      if (!known.has(deviceId)) errors.push({ pointer: '/deviceId', detail: 'no device with that id in your organization', code: 'reference' });
    }
    if (errors.length) throw validationProblem(errors);
    if (!volume || !target) throw new ProblemException(409, { slug: 'conflict', detail: 'The batch has no stored cavity volume or target density to judge a part against.' });
    const density = densityOf(mass as number, volume);
    if (!isFoamDensity(density)) {
      throw validationProblem([{ pointer: '/mass/value', detail: `gives a molded density of ${density.toPrecision(4)} kg/m³ in this ${(volume * 1000).toPrecision(4)} L cavity: no polyurethane foam is outside ${FOAM_DENSITY_BOUNDS.min}–${FOAM_DENSITY_BOUNDS.max} kg/m³`, code: 'range' }]);
    }
    const tolerance = b.part_density_tolerance_percent ?? DEFAULT_PART_DENSITY_TOLERANCE_PERCENT;
    const judged = judgeAgainstTarget(density, target, tolerance);
    const actor = actorOf(c.principal);
    const id = await this.repo.transaction(async (trx) => {
      const id = await this.repo.insertPart(trx, {
        organization_id: orgId, batch_id: b.id, cavity, serial: body.serial ?? null, mass_kg: mass, mass_source: source, device_id: deviceId,
        cavity_volume_m3: volume, molded_density_kg_m3: density, target_density_kg_m3: target, tolerance_percent: tolerance, density_verdict: judged.verdict,
        created_by_label: actor.actorLabel, ...(body.demoldedAt ? { demolded_at: body.demoldedAt } : {}),
      });
      // the molded density is a point of the system's control charts (the parts of a batch are one subgroup)
      await this.control.recordPartDensity(trx, { partId: id, organizationId: orgId, materialSystemId: b.material_system_id, batchId: b.id, stationId: b.station_id, deviceId, readingId: null, lotAId: b.lot_a_id, lotBId: b.lot_b_id, densityKgM3: density, at: body.demoldedAt ?? new Date() });
      await this.audit.record({ organizationId: orgId, ...actor, action: 'part.recorded', targetType: 'part', targetId: id, details: { batchId: b.id, massKg: mass, moldedDensityKgM3: density, verdict: judged.verdict }, ip: c.ip, userAgent: c.userAgent }, trx);
      return id;
    });
    return this.get(c, id);
  }

  async addSpecimen(c: RequestContext, partId: string, body: SpecimenInput) {
    const orgId = c.principal.organizationId;
    const part = await this.repo.part(orgId, partId);
    if (!part) throw notFound('part');
    const b = await this.batch(orgId, part.batch_id);
    const errors: FieldError[] = [];
    const q = new QuantityReader();
    const row: Record<string, unknown> = { organization_id: orgId, part_id: partId, test: body.test, notes: body.notes ?? null, created_by_label: actorOf(c.principal).actorLabel };
    let value: number | null = null;
    if (body.test === 'core_density') {
      if (!body.mass) errors.push({ pointer: '/mass', detail: 'a core density specimen needs its mass', code: 'required' });
      if (!body.dimensions) errors.push({ pointer: '/dimensions', detail: 'a core density specimen needs its length, width and thickness', code: 'required' });
      const m = body.mass ? q.read('mass', body.mass, '/mass', { positive: true }) : null;
      const dims = body.dimensions ? (['length', 'width', 'thickness'] as const).map((k) => q.read('length', body.dimensions![k], `/dimensions/${k}`, { positive: true })) : [];
      errors.push(...q.errors);
      if (!errors.length) {
        const volume = specimenVolume(dims[0] as number, dims[1] as number, dims[2] as number);
        value = densityOf(m as number, volume);
        if (!isFoamDensity(value)) errors.push({ pointer: '/mass/value', detail: `gives ${value.toPrecision(4)} kg/m³: no polyurethane foam is outside ${FOAM_DENSITY_BOUNDS.min}–${FOAM_DENSITY_BOUNDS.max} kg/m³`, code: 'range' });
        Object.assign(row, { mass_kg: m, volume_m3: volume, density_kg_m3: value });
      }
    } else if (body.test === 'indentation_force') {
      if (!body.force) errors.push({ pointer: '/force', detail: 'an indentation force specimen needs the force at 25 % deflection', code: 'required' });
      else {
        value = forceToNewtons(body.force.value, body.force.unit);
        if (!(value > 0) || value > MAX_INDENTATION_FORCE_N) errors.push({ pointer: '/force/value', detail: `must be above 0 and at most ${MAX_INDENTATION_FORCE_N} N`, code: 'range' });
        row.force_n = value;
      }
    } else {
      if (!body.durometer) errors.push({ pointer: '/durometer', detail: 'a durometer test needs its scale and reading (0–100)', code: 'required' });
      else {
        value = body.durometer.value;
        if (b.durometer_scale && body.durometer.scale !== b.durometer_scale) errors.push({ pointer: '/durometer/scale', detail: `the system's spec is on the Shore ${b.durometer_scale} scale`, code: 'conflicting' });
        Object.assign(row, { durometer_scale: body.durometer.scale, durometer: value });
      }
    }
    if (errors.length) throw validationProblem(errors);
    row.verdict = judgeBand(value!, specOf(b, body.test));
    await this.repo.transaction(async (trx) => {
      const id = await this.repo.insertSpecimen(trx, row);
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'part.specimen_recorded', targetType: 'part', targetId: partId, details: { specimenId: id, test: body.test, value, verdict: row.verdict }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.get(c, partId);
  }

  private async checkCauses(orgId: string, codes: string[], pointer: (i: number) => string): Promise<FieldError[]> {
    const found = new Map((await this.repo.causesByCode(orgId, codes)).map((x) => [x.code, x]));
    return codes.flatMap((code, i) => {
      const f = found.get(code);
      if (!f) return [{ pointer: pointer(i), detail: `no defect cause ${code} in your organization’s list`, code: 'reference' }];
      if (!f.active) return [{ pointer: pointer(i), detail: `defect cause ${code} is retired`, code: 'reference' }];
      return [];
    });
  }

  async dispose(c: RequestContext, batchId: string, body: DispositionInput) {
    const orgId = c.principal.organizationId;
    const b = await this.batch(orgId, batchId);
    if (b.subject !== 'mold') throw new ProblemException(409, { slug: 'conflict', detail: 'A free-rise cup batch makes no part to dispose of.' });
    const causes = body.defectCauses ?? [];
    const errors: FieldError[] = [];
    if (body.decision !== 'accepted' && causes.length === 0) errors.push({ pointer: '/defectCauses', detail: `a ${body.decision} decision names at least one defect cause`, code: 'required' });
    errors.push(...(await this.checkCauses(orgId, causes, (i) => `/defectCauses/${i}`)));
    const parts = await this.repo.partsOfBatches(orgId, [batchId]);
    const ids = new Set(parts.map((p) => p.id));
    const listed = body.parts ?? [];
    for (const [i, p] of listed.entries()) {
      if (!ids.has(p.partId)) errors.push({ pointer: `/parts/${i}/partId`, detail: 'no part of this batch', code: 'reference' });
      const pc = p.defectCauses ?? [];
      if (p.decision !== 'accepted' && pc.length === 0) errors.push({ pointer: `/parts/${i}/defectCauses`, detail: `a ${p.decision} part names at least one defect cause`, code: 'required' });
      errors.push(...(await this.checkCauses(orgId, pc, (j) => `/parts/${i}/defectCauses/${j}`)));
    }
    if (new Set(listed.map((p) => p.partId)).size !== listed.length) errors.push({ pointer: '/parts', detail: 'a part is listed twice', code: 'duplicate' });
    if (errors.length) throw validationProblem(errors);
    const actor = actorOf(c.principal);
    const note = body.note?.trim() || null;
    await this.repo.transaction(async (trx) => {
      const inserted = await this.repo.insertDisposition(trx, { organization_id: orgId, batch_id: batchId, decision: body.decision, defect_causes: JSON.stringify(causes), note, decided_by_label: actor.actorLabel });
      if (!inserted) throw new ProblemException(409, { slug: 'conflict', detail: 'This batch is already disposed of.' });
      const others = new Set(listed.map((p) => p.partId));
      await this.repo.setPartDisposition(trx, orgId, parts.filter((p) => !others.has(p.id)).map((p) => p.id), { disposition: body.decision, defect_causes: JSON.stringify(body.decision === 'accepted' ? [] : causes), disposition_note: note });
      for (const p of listed) await this.repo.setPartDisposition(trx, orgId, [p.partId], { disposition: p.decision, defect_causes: JSON.stringify(p.decision === 'accepted' ? [] : (p.defectCauses ?? [])), disposition_note: note });
      const after = await this.repo.partsOfBatches(orgId, [batchId], trx);
      const { undecided: _u, ...counts } = partCounts({ ...b, decision: body.decision }, after);
      await this.events.emit(trx, { organizationId: orgId, type: 'batch.disposed', subjectType: 'batch', subjectId: batchId, data: { batchId, workOrderId: b.work_order_id, decision: body.decision, defectCauses: causes, parts: counts, note } });
      await this.audit.record({ organizationId: orgId, ...actor, action: 'batch.disposed', targetType: 'batch', targetId: batchId, details: { decision: body.decision, defectCauses: causes, parts: counts, partDecisions: listed }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.disposition(c, batchId);
  }

  async disposition(c: RequestContext, batchId: string) {
    const orgId = c.principal.organizationId;
    const b = await this.batch(orgId, batchId);
    const d = await this.repo.disposition(orgId, batchId);
    if (!d) throw notFound('disposition');
    return dispositionView(d, b, await this.repo.partsOfBatches(orgId, [batchId]));
  }
}
