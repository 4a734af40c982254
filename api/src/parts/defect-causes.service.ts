import { Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { conflict, isUniqueViolation, notFound } from '../shop/errors.js';
import { PartsRepository } from './parts.repository.js';

export interface DefectCauseInput {
  code?: string;
  name?: string;
  description?: string | null;
  active?: boolean;
}

export function causeView(r: Record<string, unknown>) {
  return { id: r.id as string, code: r.code as string, name: r.name as string, description: (r.description as string | null) ?? null, active: r.active as boolean, createdAt: r.created_at as Date, updatedAt: r.updated_at as Date };
}

/** The organization's list of defect causes: the trade's terms from its creation (migration 0032), then its own to edit. */
@Injectable()
export class DefectCausesService {
  constructor(private readonly repo: PartsRepository, private readonly audit: AuditService) {}

  async list(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.listCauses(c.principal.organizationId, q);
    return { rows: rows.map(causeView), total };
  }

  async get(c: RequestContext, id: string) {
    const r = await this.repo.cause(c.principal.organizationId, id);
    if (!r) throw notFound('defect cause');
    return causeView(r);
  }

  async create(c: RequestContext, body: DefectCauseInput) {
    const orgId = c.principal.organizationId;
    const id = await this.repo
      .transaction(async (trx) => {
        const id = await this.repo.insertCause(trx, { organization_id: orgId, code: body.code, name: body.name!.trim(), description: body.description ?? null });
        await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'defect_cause.added', targetType: 'defect_cause', targetId: id, details: { code: body.code, name: body.name }, ip: c.ip, userAgent: c.userAgent }, trx);
        return id;
      })
      .catch((e) => {
        if (isUniqueViolation(e)) throw conflict(`A defect cause ${body.code} is already on the list.`, '/code', 'already on the list');
        throw e;
      });
    return this.get(c, id);
  }

  async update(c: RequestContext, id: string, body: DefectCauseInput) {
    const orgId = c.principal.organizationId;
    await this.get(c, id);
    const patch: Record<string, unknown> = {};
    if (body.name !== undefined) patch.name = body.name.trim();
    if (body.description !== undefined) patch.description = body.description;
    if (body.active !== undefined) patch.active = body.active;
    await this.repo.transaction(async (trx) => {
      await this.repo.updateCause(trx, orgId, id, patch);
      await this.audit.record({ organizationId: orgId, ...actorOf(c.principal), action: 'defect_cause.changed', targetType: 'defect_cause', targetId: id, details: { fields: Object.keys(patch), active: body.active }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.get(c, id);
  }
}
