import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { conflict, isUniqueViolation, notFound } from '../shop/errors.js';
import { parametersView, readSystemInput, REVISION_COLUMNS, sameParameters, type MaterialSystemInput, type RevisionColumns } from '@pourgate/batching';

export const materialSystemsListSpec: ListSpec = {
  resource: 'material-systems',
  sortable: ['name', 'kind', 'revision', 'createdAt', 'updatedAt'],
  filters: { q: 'text', kind: 'eq', id: 'in' },
  defaultSort: ['name', 'ASC'],
};
const columns = { name: 'ms.name', kind: 'ms.kind', revision: 'ms.current_revision', createdAt: 'ms.created_at', updatedAt: 'ms.updated_at', q: 'ms.name', id: 'ms.id' };

export const revisionsListSpec: ListSpec = {
  resource: 'material-system-revisions',
  sortable: ['revision', 'createdAt'],
  filters: {},
  defaultSort: ['revision', 'DESC'],
};

export interface SystemRow extends RevisionColumns {
  id: string;
  organization_id: string;
  name: string;
  kind: string;
  current_revision: number;
  revision_id: string;
  revised_at: Date;
  sds_count: number;
  tds_count: number;
  created_at: Date;
  updated_at: Date;
}

export interface RevisionRow extends RevisionColumns {
  id: string;
  material_system_id: string;
  revision: number;
  change_note: string | null;
  created_by_label: string | null;
  created_at: Date;
}

export function systemView(r: SystemRow) {
  return {
    id: r.id,
    name: r.name,
    kind: r.kind,
    revision: r.current_revision,
    revisionId: r.revision_id,
    revisedAt: r.revised_at,
    ...parametersView(r),
    documents: { sds: Number(r.sds_count), tds: Number(r.tds_count) },
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

export function revisionView(r: RevisionRow) {
  return {
    id: r.id,
    materialSystemId: r.material_system_id,
    revision: r.revision,
    ...parametersView(r),
    changeNote: r.change_note,
    createdBy: r.created_by_label,
    createdAt: r.created_at,
  };
}

@Injectable()
export class MaterialSystemsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService) {}

  base(orgId: string, db: Knex | Knex.Transaction = this.db) {
    const docs = (kind: string) =>
      db('material_system_documents as d').count('*').where('d.material_system_id', db.ref('ms.id')).andWhere('d.kind', kind);
    return db('material_systems as ms')
      .join('material_system_revisions as r', (j) => j.on('r.material_system_id', 'ms.id').andOn('r.revision', 'ms.current_revision'))
      .where('ms.organization_id', orgId)
      .select('ms.*', 'r.id as revision_id', 'r.created_at as revised_at', ...REVISION_COLUMNS.map((c) => `r.${c}`))
      .select(docs('SDS').as('sds_count'), docs('TDS').as('tds_count'));
  }

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<SystemRow>(this.base(c.principal.organizationId), q, materialSystemsListSpec, columns);
    return { rows: rows.map(systemView), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.base(c.principal.organizationId).where('ms.id', id).first();
    if (!r) throw notFound('material system');
    return systemView(r);
  }

  /** One revision of a system of the caller's organization (the current one when `revision` is absent). */
  async revision(orgId: string, systemId: string, revision?: number, db: Knex | Knex.Transaction = this.db): Promise<(RevisionRow & { name: string; kind: string }) | undefined> {
    const q = db('material_system_revisions as r')
      .join('material_systems as ms', 'ms.id', 'r.material_system_id')
      .where({ 'ms.organization_id': orgId, 'ms.id': systemId })
      .select('r.*', 'ms.name', 'ms.kind');
    if (revision === undefined) q.whereRaw('r.revision = ms.current_revision');
    else q.where('r.revision', revision);
    return q.first();
  }

  async revisions(c: RequestContext, id: string, q: ListQuery) {
    await this.get(c, id);
    const base = this.db('material_system_revisions').where({ organization_id: c.principal.organizationId, material_system_id: id }).select('*');
    const { rows, total } = await listPage<RevisionRow>(base, q, revisionsListSpec, { createdAt: 'created_at' });
    return { rows: rows.map(revisionView), total };
  }

  async create(c: RequestContext, body: MaterialSystemInput) {
    const { cols, errors } = readSystemInput(body);
    if (errors.length) throw validationProblem(errors);
    const orgId = c.principal.organizationId;
    const actor = actorOf(c.principal);
    const id = await this.db
      .transaction(async (trx) => {
        const [ms] = await trx('material_systems').insert({ organization_id: orgId, name: body.name, kind: body.kind, current_revision: 1 }).returning('id');
        await trx('material_system_revisions').insert({ ...cols, organization_id: orgId, material_system_id: ms.id, revision: 1, change_note: body.changeNote ?? null, created_by_label: actor.actorLabel });
        await this.audit.record({ organizationId: orgId, ...actor, action: 'material_system.created', targetType: 'material_system', targetId: ms.id, details: { name: body.name, revision: 1 }, ip: c.ip, userAgent: c.userAgent }, trx);
        return ms.id as string;
      })
      .catch((e) => {
        if (isUniqueViolation(e)) throw conflict(`A material system named "${body.name}" already exists.`, '/name', 'already in use');
        throw e;
      });
    return this.get(c, id);
  }

  /**
   * The whole system again. A change of any parameter writes revision N+1 and makes it current;
   * batches keep pointing at the revision they were computed with. Name and kind are not parameters.
   */
  async update(c: RequestContext, id: string, body: MaterialSystemInput) {
    const orgId = c.principal.organizationId;
    const { cols, errors } = readSystemInput(body);
    const current = await this.revision(orgId, id);
    if (!current) throw notFound('material system');
    if (errors.length) throw validationProblem(errors);
    const actor = actorOf(c.principal);
    await this.db
      .transaction(async (trx) => {
        const locked = await trx('material_systems').where({ id, organization_id: orgId }).forUpdate().first();
        const latest = (await this.revision(orgId, id, undefined, trx))!;
        const changed = !sameParameters(cols, latest);
        const patch: Record<string, unknown> = {};
        if (body.name !== locked.name) patch.name = body.name;
        if (body.kind !== locked.kind) patch.kind = body.kind;
        if (changed) {
          const next = locked.current_revision + 1;
          await trx('material_system_revisions').insert({ ...cols, organization_id: orgId, material_system_id: id, revision: next, change_note: body.changeNote ?? null, created_by_label: actor.actorLabel });
          patch.current_revision = next;
        }
        if (Object.keys(patch).length === 0) return;
        await trx('material_systems').where({ id, organization_id: orgId }).update(patch);
        await this.audit.record({ organizationId: orgId, ...actor, action: changed ? 'material_system.revised' : 'material_system.changed', targetType: 'material_system', targetId: id, details: { fields: Object.keys(patch), revision: patch.current_revision ?? locked.current_revision, changeNote: body.changeNote ?? null }, ip: c.ip, userAgent: c.userAgent }, trx);
      })
      .catch((e) => {
        if (isUniqueViolation(e)) throw conflict(`A material system named "${body.name}" already exists.`, '/name', 'already in use');
        throw e;
      });
    return this.get(c, id);
  }
}
