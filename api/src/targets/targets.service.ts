import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { CupTestPoint } from '@pourgate/batching';
import { computeBatchTargets, type BatchOptions, type BatchTargets, type BatchTargetsInput, type MaterialSystemParameters, type MoldParameters } from '@pourgate/batching';
import type { UnitSystem } from '@pourgate/batching';
import type { LotExpiry } from '@pourgate/batching';
import type { RequestContext } from '../auth/principal.js';
import { type FieldError, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { DocumentsService } from '../documents/documents.service.js';
import { LotsService, type LotPart } from '../lots/lots.service.js';
import { MaterialSystemsService } from '../materials/material-systems.service.js';
import { parametersOf, readSystemInput, systemPointer, type MaterialSystemInput } from '@pourgate/batching';
import { readMoldGeometry, type MoldGeometryInput } from '@pourgate/batching';
import { MoldsService } from '../molds/molds.service.js';
import { isoDay, todayUtc } from '@pourgate/batching';
import { inDisplayUnits } from '../shop/display.js';
import { withBatchingErrors } from '../shop/errors.js';
import { QuantityReader, forReader, type Quantity } from '@pourgate/batching';

export interface OptionsInput {
  targetDensity?: Quantity;
  packFactor?: number;
  pigmentPercent?: number;
  overfillPercent?: number;
  retentionPercent?: number;
  allowanceConvention?: { overfill: 'multiplicative' | 'delivered'; retention: 'multiplicative' | 'delivered' };
  componentTemperature?: Quantity;
  scaleDeviceId?: string;
  scale?: { readability: Quantity; capacity?: Quantity; calibrationDueOn?: string };
  lots?: Partial<Record<LotPart, string>>;
  plannedFor?: string;
  minimumToleranceDivisions?: number;
}

export type SystemSpec = { id: string; revision?: number } | MaterialSystemInput;
export type MoldSpec = { id: string } | MoldGeometryInput;

/** What to compute, and where in the request body each reference sits (for the pointers of a 422). */
export interface TargetsRequest {
  system: SystemSpec | undefined;
  mold?: MoldSpec;
  freeRiseCup?: { volume: Quantity };
  options?: OptionsInput;
  /** Pointer of the system's id (`/system/id`, `/materialSystemId`) and of its inline fields (`/system`). */
  at: { systemId: string; systemRevision: string; systemInline: string; moldId: string; moldInline: string; freeRiseCup: string; options: string };
}

/** Where each input came from: stored rows (with ids and revision) or inline values. */
export interface TargetsSources {
  system: { id: string; name: string; revision: number; revisionId: string } | { inline: true };
  mold: { id: string; name: string; code: string | null } | { inline: true; grossCavityVolumeM3: number; insertVolumeM3: number } | null;
  scale: { deviceId: string; name: string; serial: string } | { inline: true } | null;
  lots: { part: LotPart; id: string; lotNumber: string; expiresOn: string }[];
  cupTests: number;
  plannedFor: string;
}

export interface ResolvedTargets {
  input: BatchTargetsInput;
  sources: TargetsSources;
  targets: BatchTargets;
}

/** The most recent cup tests fitted for the expected free-rise density. */
export const CUP_TESTS_FITTED = 100;

const isRef = (s: object | undefined): s is { id: string } => !!s && typeof (s as { id?: unknown }).id === 'string';

/**
 * Turns a request (references to stored rows and inline values, in shop units) into the
 * computation's SI input, runs it, and keeps where every input came from. Shared by the stateless
 * preview and by batch creation, so both compute the same way.
 */
@Injectable()
export class TargetsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly systems: MaterialSystemsService,
    private readonly molds: MoldsService,
    private readonly lots: LotsService,
    private readonly documents: DocumentsService,
  ) {}

  async resolve(orgId: string, req: TargetsRequest, db: Knex | Knex.Transaction = this.db): Promise<ResolvedTargets & { systemRevisionId: string | null; systemId: string | null; moldId: string | null; scaleDeviceId: string | null; lotIds: Partial<Record<LotPart, string>> }> {
    const errors: FieldError[] = [];
    const q = new QuantityReader();
    const { at } = req;
    const o = req.options ?? {};

    // the system: a stored revision, or inline parameters
    let system: MaterialSystemParameters | undefined;
    let systemSource: TargetsSources['system'] = { inline: true };
    let systemId: string | null = null;
    let systemRevisionId: string | null = null;
    if (req.system === undefined) {
      errors.push({ pointer: at.systemId, detail: 'is required (here or on the work order)', code: 'required' });
    } else if (isRef(req.system)) {
      const rev = await this.systems.revision(orgId, req.system.id, req.system.revision, db);
      if (!rev) {
        const exists = req.system.revision !== undefined && (await this.systems.revision(orgId, req.system.id, undefined, db));
        errors.push(exists
          ? { pointer: at.systemRevision, detail: `the system has no revision ${req.system.revision}`, code: 'reference' }
          : { pointer: at.systemId, detail: 'no material system with that id in your organization', code: 'reference' });
      } else {
        system = parametersOf(rev, rev.kind);
        systemId = rev.material_system_id;
        systemRevisionId = rev.id;
        systemSource = { id: rev.material_system_id, name: rev.name, revision: rev.revision, revisionId: rev.id };
      }
    } else {
      const read = readSystemInput(req.system, at.systemInline);
      if (read.errors.length) errors.push(...read.errors);
      else system = parametersOf(read.cols);
    }

    // the subject: a stored mold, an inline mold, or a free-rise cup
    let mold: MoldParameters | undefined;
    let moldSource: TargetsSources['mold'] = null;
    let moldId: string | null = null;
    if (req.mold !== undefined && isRef(req.mold)) {
      const row = await this.molds.row(orgId, req.mold.id, db);
      if (!row) errors.push({ pointer: at.moldId, detail: 'no mold with that id in your organization', code: 'reference' });
      else {
        mold = { volume: row.cavity_volume_m3, cavities: row.cavities, defaultPackFactor: row.default_pack_factor ?? undefined };
        moldSource = { id: row.id, name: row.name, code: row.code };
        moldId = row.id;
      }
    } else if (req.mold !== undefined) {
      const { geometry, errors: e } = readMoldGeometry(req.mold, at.moldInline);
      errors.push(...e);
      if (geometry) {
        mold = { volume: geometry.volume.cavityVolume, cavities: geometry.volume.cavities, defaultPackFactor: geometry.defaultPackFactor ?? undefined };
        moldSource = { inline: true, grossCavityVolumeM3: geometry.volume.grossCavityVolume, insertVolumeM3: geometry.volume.insertVolume };
      }
    }
    const cupVolume = req.freeRiseCup ? q.read('volume', req.freeRiseCup.volume, `${at.freeRiseCup}/volume`) : undefined;

    // the options: quantities to SI, the scale and the lots looked up
    const ot = (p: string) => `${at.options}/${p}`;
    const targetDensity = q.read('density', o.targetDensity, ot('targetDensity'));
    const componentTemperature = q.read('temperature', o.componentTemperature, ot('componentTemperature'));
    const plannedFor = o.plannedFor ?? todayUtc();
    let scale: BatchOptions['scale'];
    let scaleSource: TargetsSources['scale'] = null;
    let scaleDeviceId: string | null = null;
    if (o.scaleDeviceId !== undefined && o.scale !== undefined) {
      errors.push({ pointer: ot('scale'), detail: 'give a scaleDeviceId or an inline scale, not both', code: 'conflicting' });
    } else if (o.scaleDeviceId !== undefined) {
      const d = await db('devices').where({ id: o.scaleDeviceId, organization_id: orgId }).first();
      if (!d) errors.push({ pointer: ot('scaleDeviceId'), detail: 'no device with that id in your organization', code: 'reference' });
      else if (d.kind !== 'scale' || d.readability_kg === null) errors.push({ pointer: ot('scaleDeviceId'), detail: `is a ${d.kind}, not a scale with a readability`, code: 'reference' });
      else if (d.retired) errors.push({ pointer: ot('scaleDeviceId'), detail: 'this scale is retired', code: 'reference' });
      else {
        scale = { readability: d.readability_kg, capacity: d.capacity_kg ?? undefined, calibrationDueOn: isoDay(d.calibration_due) ?? undefined };
        scaleSource = { deviceId: d.id, name: d.name, serial: d.serial };
        scaleDeviceId = d.id;
      }
    } else if (o.scale !== undefined) {
      const readability = q.read('mass', o.scale.readability, ot('scale/readability'));
      const capacity = q.read('mass', o.scale.capacity, ot('scale/capacity'));
      if (typeof readability === 'number') {
        scale = { readability, capacity: capacity ?? undefined, calibrationDueOn: o.scale.calibrationDueOn };
        scaleSource = { inline: true };
      }
    }

    const lotParts = (['A', 'B', 'pigment'] as const).filter((p) => o.lots?.[p] !== undefined);
    const found = await this.lots.rows(orgId, lotParts.map((p) => o.lots![p]!), db);
    const lots: (LotExpiry & { id: string; lotNumber: string })[] = [];
    const lotIds: Partial<Record<LotPart, string>> = {};
    for (const part of lotParts) {
      const lot = found.get(o.lots![part]!);
      const pointer = ot(`lots/${part}`);
      const what = part === 'pigment' ? 'pigment' : `part ${part}`;
      if (!lot) errors.push({ pointer, detail: 'no lot with that id in your organization', code: 'reference' });
      else if (lot.part !== part) errors.push({ pointer, detail: `lot ${lot.lot_number} is ${lot.part === 'pigment' ? 'pigment' : `part ${lot.part}`}, not ${what}`, code: 'wrong_part' });
      else if (part !== 'pigment' && systemId !== null && lot.material_system_id !== systemId) {
        errors.push({ pointer, detail: `lot ${lot.lot_number} belongs to ${lot.material_system_name ?? 'another material system'}, not to this one`, code: 'wrong_system' });
      } else {
        const expiresOn = isoDay(lot.expires_on)!;
        lots.push({ part, lotCode: lot.lot_number, expiresOn, id: lot.id, lotNumber: lot.lot_number });
        lotIds[part] = lot.id;
      }
    }
    errors.push(...q.errors);
    if (errors.length) throw validationProblem(errors);

    let cupTests: CupTestPoint[] = [];
    if (systemId) {
      const rows = await db('qc_cup_tests').where({ organization_id: orgId, material_system_id: systemId }).orderBy('tested_at', 'desc').limit(CUP_TESTS_FITTED)
        .select('component_temperature_a_c', 'component_temperature_b_c', 'free_rise_density_kg_m3');
      // A and B are conditioned together before a cup test; their mean stands for "the component temperature"
      cupTests = rows.map((r) => ({ temperature: (r.component_temperature_a_c + r.component_temperature_b_c) / 2, density: r.free_rise_density_kg_m3 }));
    }

    const options: BatchOptions = {
      targetDensity: targetDensity ?? undefined,
      packFactor: o.packFactor,
      pigmentPercent: o.pigmentPercent,
      overfillPercent: o.overfillPercent,
      retentionPercent: o.retentionPercent,
      allowanceConvention: o.allowanceConvention,
      scale,
      lots: lots.map(({ part, lotCode, expiresOn }) => ({ part, lotCode, expiresOn })),
      componentTemperature: componentTemperature ?? undefined,
      today: plannedFor,
      minimumToleranceDivisions: o.minimumToleranceDivisions,
    };
    const input: BatchTargetsInput = {
      system: system!,
      ...(mold ? { mold } : {}),
      ...(cupVolume !== undefined && cupVolume !== null ? { freeRiseCup: { volume: cupVolume } } : {}),
      options,
      cupTests,
    };
    const targets = withBatchingErrors(() => computeBatchTargets(input), (p) => this.pointer(p, req, lotParts));
    return {
      input,
      targets,
      sources: { system: systemSource, mold: moldSource, scale: scaleSource, lots: lots.map(({ part, id, lotNumber, expiresOn }) => ({ part: part as LotPart, id, lotNumber, expiresOn })), cupTests: cupTests.length, plannedFor },
      systemId,
      systemRevisionId,
      moldId,
      scaleDeviceId,
      lotIds,
    };
  }

  /** A pointer of the computation's input as a pointer into the request body. */
  private pointer(p: string, req: TargetsRequest, lotParts: readonly LotPart[]): string {
    const { at } = req;
    if (p.startsWith('/system')) return isRef(req.system) ? at.systemId : systemPointer(p, at.systemInline);
    if (p === '/mold') return req.freeRiseCup && !req.mold ? at.freeRiseCup : isRef(req.mold) || !req.mold ? at.moldId : at.moldInline;
    if (p.startsWith('/mold/')) {
      if (isRef(req.mold)) return at.moldId;
      return `${at.moldInline}/${p === '/mold/volume' ? 'cavity' : p.slice('/mold/'.length)}`;
    }
    if (p.startsWith('/freeRiseCup')) return `${at.freeRiseCup}/volume/value`;
    if (p.startsWith('/options/')) {
      const rest = p.slice('/options/'.length);
      const ot = (s: string) => `${at.options}/${s}`;
      if (rest === 'targetDensity' || rest === 'componentTemperature') return ot(`${rest}/value`);
      if (rest === 'today') return ot('plannedFor');
      if (rest.startsWith('scale')) {
        if (req.options?.scaleDeviceId !== undefined) return ot('scaleDeviceId');
        return /^scale\/(readability|capacity)$/.test(rest) ? ot(`${rest}/value`) : ot(rest);
      }
      const lot = /^lots\/(\d+)/.exec(rest);
      if (lot) return ot(`lots/${lotParts[Number(lot[1])] ?? ''}`);
      return ot(rest);
    }
    return p;
  }

  /** The SDS on file for the systems of a result, so whoever pours can read it first. */
  async documentsFor(orgId: string, sources: TargetsSources) {
    const ids = 'id' in sources.system ? [sources.system.id] : [];
    const sheets = await this.documents.safetyDataSheets(orgId, ids);
    return { safetyDataSheets: sheets, sdsOnFile: sheets.length > 0 };
  }

  /** A result as the API shows it: figures in the caller's units with SI alongside, and the documents. */
  async view(c: RequestContext, units: UnitSystem, stored: { targets: BatchTargets; sources: TargetsSources; input: BatchTargetsInput }) {
    return {
      unitSystem: units,
      // warnings' sentences written again in the reader's unit system
      ...(inDisplayUnits({ ...stored.targets, warnings: forReader(stored.targets.warnings, units) }, units) as Record<string, unknown>),
      sources: stored.sources,
      inputs: stored.input,
      documents: await this.documentsFor(c.principal.organizationId, stored.sources),
    };
  }
}
