import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, RequestContext } from '../auth/principal.js';
import { toSI, UnitError } from '@pourgate/batching';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { FieldError, ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';

export const devicesListSpec: ListSpec = {
  resource: 'devices',
  sortable: ['name', 'serial', 'kind', 'calibrationDue', 'createdAt'],
  filters: { q: 'text', kind: 'eq', stationId: 'eq', retired: 'bool', id: 'in' },
  defaultSort: ['name', 'ASC'],
};
const columns = { name: 'devices.name', serial: 'devices.serial', kind: 'devices.kind', calibrationDue: 'devices.calibration_due', createdAt: 'devices.created_at', q: 'devices.name', stationId: 'devices.station_id', retired: 'devices.retired', id: 'devices.id' };

interface Quantity {
  value: number;
  unit: string;
}

export interface DeviceInput {
  kind?: 'scale' | 'thermometer' | 'hygrometer' | 'logger' | 'gateway';
  serial?: string;
  name?: string;
  stationCode?: string | null;
  readability?: Quantity | null;
  capacity?: Quantity | null;
  calibrationDue?: string | null;
  retired?: boolean;
}

export interface DeviceRow {
  id: string;
  organization_id: string;
  kind: string;
  serial: string;
  name: string;
  station_id: string | null;
  station_code?: string | null;
  station_name?: string | null;
  readability_kg: number | null;
  capacity_kg: number | null;
  calibration_due: string | null;
  retired: boolean;
  created_at: Date;
  updated_at: Date;
}

export function deviceView(r: DeviceRow, today = new Date().toISOString().slice(0, 10)) {
  return {
    id: r.id,
    kind: r.kind,
    serial: r.serial,
    name: r.name,
    station: r.station_id ? { id: r.station_id, code: r.station_code ?? null, name: r.station_name ?? null } : null,
    stationCode: r.station_code ?? null,
    readabilityKg: r.readability_kg,
    capacityKg: r.capacity_kg,
    calibrationDue: r.calibration_due,
    calibrationOverdue: r.calibration_due !== null && r.calibration_due < today,
    retired: r.retired,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

/** Converts a {value, unit} mass to kg; unit errors become 422 with a pointer. */
function massKg(q: Quantity | null | undefined, pointer: string, errors: FieldError[]): number | null | undefined {
  if (q === undefined) return undefined;
  if (q === null) return null;
  try {
    const kg = toSI('mass', q.value, q.unit);
    if (!(kg > 0)) errors.push({ pointer: `${pointer}/value`, detail: 'must be greater than zero', code: 'exclusiveMinimum' });
    return kg;
  } catch (e) {
    if (e instanceof UnitError) {
      errors.push({ pointer: `${pointer}/unit`, detail: e.message, code: 'unit' });
      return undefined;
    }
    throw e;
  }
}

@Injectable()
export class DevicesService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService) {}

  private base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    return db('devices')
      .leftJoin('stations', 'stations.id', 'devices.station_id')
      .where('devices.organization_id', orgId)
      .select('devices.*', 'stations.code as station_code', 'stations.name as station_name');
  }

  /**
   * A query that finds the device in the organization: another module's write may be conditional
   * on it. Plain SQL, as it runs inside every single reading's insert.
   */
  existsQuery(orgId: string, id: string): Knex.Raw {
    return this.db.raw('SELECT 1 FROM devices WHERE organization_id = ? AND id = ?', [orgId, id]);
  }

  /** Which of these ids are devices of the organization. */

  async existingIds(orgId: string, ids: readonly string[]): Promise<Set<string>> {
    if (!ids.length) return new Set();
    const rows: { id: string }[] = await this.db('devices').where({ organization_id: orgId }).whereIn('id', ids).select('id');
    return new Set(rows.map((d) => d.id));
  }

  /** Whether a station (where devices stand) is the organization's. */
  async stationExists(orgId: string, id: string): Promise<boolean> {
    return !!(await this.db('stations').where({ organization_id: orgId, id }).first('id'));
  }

  /** What judging needs to know of a device: its capacity and when its calibration is due. */
  judgingFacts(orgId: string, id: string, db: Knex | Knex.Transaction = this.db): Promise<{ capacity_kg: number | null; calibration_due: Date | string | null } | undefined> {
    return db('devices').where({ organization_id: orgId, id }).first('capacity_kg', 'calibration_due');
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<DeviceRow>(this.base(c.principal.organizationId), q, devicesListSpec, columns);
    return { rows: rows.map((r) => deviceView(r)), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.base(c.principal.organizationId).where('devices.id', id).first();
    if (!r) throw new ProblemException(404, { detail: 'No device with that id in your organization.' });
    return deviceView(r);
  }

  private async station(trx: Knex.Transaction, orgId: string, code: string | null | undefined): Promise<string | null | undefined> {
    if (code === undefined) return undefined;
    if (code === null || code === '') return null;
    const found = await trx('stations').where({ organization_id: orgId, code }).first('id');
    if (found) return found.id;
    const [row] = await trx('stations').insert({ organization_id: orgId, code, name: `Station ${code}` }).onConflict(['organization_id', 'code']).merge().returning('id');
    return row.id;
  }

  private toColumns(body: DeviceInput, errors: FieldError[]) {
    const cols: Record<string, unknown> = {};
    if (body.kind !== undefined) cols.kind = body.kind;
    if (body.serial !== undefined) cols.serial = body.serial;
    if (body.name !== undefined) cols.name = body.name;
    const d = massKg(body.readability, '/readability', errors);
    const cap = massKg(body.capacity, '/capacity', errors);
    if (d !== undefined) cols.readability_kg = d;
    if (cap !== undefined) cols.capacity_kg = cap;
    if (typeof d === 'number' && typeof cap === 'number' && d >= cap) errors.push({ pointer: '/readability', detail: 'must be smaller than the capacity', code: 'range' });
    if (body.calibrationDue !== undefined) cols.calibration_due = body.calibrationDue;
    if (body.retired !== undefined) cols.retired = body.retired;
    return cols;
  }

  async create(c: RequestContext, body: DeviceInput) {
    const errors: FieldError[] = [];
    const cols = this.toColumns(body, errors);
    if (errors.length) throw validationProblem(errors);
    const orgId = c.principal.organizationId;
    const id = await this.db.transaction(async (trx) => {
      if (await trx('devices').where({ organization_id: orgId, serial: body.serial }).first('id')) {
        throw new ProblemException(409, { detail: `A device with serial ${body.serial} is already registered.`, errors: [{ pointer: '/serial', detail: 'already registered' }] });
      }
      const stationId = await this.station(trx, orgId, body.stationCode);
      const [row] = await trx('devices').insert({ ...cols, organization_id: orgId, station_id: stationId ?? null }).returning('id');
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'device.registered', targetType: 'device', targetId: row.id, details: { serial: body.serial, kind: body.kind }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return this.get(c, id);
  }

  async update(c: RequestContext, id: string, body: DeviceInput) {
    await this.get(c, id);
    const errors: FieldError[] = [];
    const cols = this.toColumns({ ...body, kind: undefined }, errors);
    if (errors.length) throw validationProblem(errors);
    const orgId = c.principal.organizationId;
    await this.db.transaction(async (trx) => {
      const stationId = await this.station(trx, orgId, body.stationCode);
      if (stationId !== undefined) cols.station_id = stationId;
      if (Object.keys(cols).length) await trx('devices').where({ id, organization_id: orgId }).update(cols);
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'device.changed', targetType: 'device', targetId: id, details: { fields: Object.keys(cols) }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.get(c, id);
  }
}
