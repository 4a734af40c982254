import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { conflict, isUniqueViolation, notFound } from '../shop/errors.js';
import { readMoldGeometry, type MeasurementInput, type MoldGeometryInput } from '@pourgate/batching';

export const moldsListSpec: ListSpec = {
  resource: 'molds',
  sortable: ['name', 'code', 'cavityVolumeM3', 'totalVolumeM3', 'createdAt'],
  filters: { q: 'text', code: 'eq', id: 'in' },
  defaultSort: ['name', 'ASC'],
};
const columns = { name: 'name', code: 'code', cavityVolumeM3: 'cavity_volume_m3', totalVolumeM3: 'total_volume_m3', createdAt: 'created_at', q: 'name', id: 'id' };

export interface MoldRow {
  id: string;
  organization_id: string;
  name: string;
  code: string | null;
  cavity_kind: string;
  cavity_measurement: MeasurementInput;
  inserts: MeasurementInput[];
  gross_cavity_volume_m3: number;
  insert_volume_m3: number;
  cavity_volume_m3: number;
  cavities: number;
  total_volume_m3: number;
  default_pack_factor: number | null;
  notes: string | null;
  created_at: Date;
  updated_at: Date;
}

export function moldView(r: MoldRow) {
  return {
    id: r.id,
    name: r.name,
    code: r.code,
    cavity: r.cavity_measurement,
    inserts: r.inserts,
    cavities: r.cavities,
    grossCavityVolumeM3: r.gross_cavity_volume_m3,
    insertVolumeM3: r.insert_volume_m3,
    cavityVolumeM3: r.cavity_volume_m3,
    totalVolumeM3: r.total_volume_m3,
    defaultPackFactor: r.default_pack_factor,
    notes: r.notes,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

@Injectable()
export class MoldsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService) {}

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<MoldRow>(this.db('molds').where('organization_id', c.principal.organizationId).select('*'), q, moldsListSpec, columns);
    return { rows: rows.map(moldView), total };
  }

  async row(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<MoldRow | undefined> {
    return db('molds').where({ id, organization_id: orgId }).first();
  }

  async get(c: RequestContext, id: string) {
    const r = await this.row(c.principal.organizationId, id);
    if (!r) throw notFound('mold');
    return moldView(r);
  }

  private columns(body: MoldGeometryInput) {
    const { geometry, errors } = readMoldGeometry(body);
    if (errors.length || !geometry) throw validationProblem(errors);
    return {
      name: body.name!.trim(),
      code: body.code ?? null,
      cavity_kind: body.cavity.kind,
      cavity_measurement: JSON.stringify(body.cavity),
      inserts: JSON.stringify(body.inserts ?? []),
      gross_cavity_volume_m3: geometry.volume.grossCavityVolume,
      insert_volume_m3: geometry.volume.insertVolume,
      cavity_volume_m3: geometry.volume.cavityVolume,
      cavities: geometry.volume.cavities,
      total_volume_m3: geometry.volume.totalVolume,
      default_pack_factor: geometry.defaultPackFactor,
      notes: body.notes ?? null,
    };
  }

  private duplicate(e: unknown, body: MoldGeometryInput): never {
    if (isUniqueViolation(e)) {
      const byCode = String((e as { constraint?: string }).constraint ?? '').includes('code');
      throw conflict(byCode ? `A mold with code ${body.code} already exists.` : `A mold named "${body.name}" already exists.`, byCode ? '/code' : '/name', 'already in use');
    }
    throw e;
  }

  async create(c: RequestContext, body: MoldGeometryInput) {
    const cols = this.columns(body);
    const orgId = c.principal.organizationId;
    const id = await this.db
      .transaction(async (trx) => {
        const [row] = await trx('molds').insert({ ...cols, organization_id: orgId }).returning('id');
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'mold.created', targetType: 'mold', targetId: row.id, details: { name: cols.name, cavityVolumeM3: cols.cavity_volume_m3, cavities: cols.cavities }, ip: c.ip, userAgent: c.userAgent }, trx);
        return row.id as string;
      })
      .catch((e) => this.duplicate(e, body));
    return this.get(c, id);
  }

  /** Batches keep the volume they were computed with (in their snapshot); a change here affects new ones. */
  async update(c: RequestContext, id: string, body: MoldGeometryInput) {
    await this.get(c, id);
    const cols = this.columns(body);
    const orgId = c.principal.organizationId;
    await this.db
      .transaction(async (trx) => {
        await trx('molds').where({ id, organization_id: orgId }).update(cols);
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'mold.changed', targetType: 'mold', targetId: id, details: { name: cols.name, cavityVolumeM3: cols.cavity_volume_m3, cavities: cols.cavities }, ip: c.ip, userAgent: c.userAgent }, trx);
      })
      .catch((e) => this.duplicate(e, body));
    return this.get(c, id);
  }
}
