import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash, randomUUID } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { notFound } from '../shop/errors.js';
import { DOCUMENT_STORE, type DocumentStore } from './document-store.js';

export const DOCUMENT_KINDS = ['SDS', 'TDS'] as const;
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

/** Every PDF starts with this header (ISO 32000-1 §7.5.2); the declared content type is not trusted. */
const PDF_MAGIC = Buffer.from('%PDF-', 'latin1');

export interface UploadedPdf {
  originalname: string;
  size: number;
  buffer?: Buffer;
}

export interface DocumentRow {
  id: string;
  organization_id: string;
  material_system_id: string;
  kind: DocumentKind;
  title: string | null;
  file_name: string;
  content_type: string;
  size_bytes: number;
  sha256: string;
  storage_key: string;
  uploaded_by_label: string | null;
  created_at: Date;
}

export function documentView(r: DocumentRow) {
  return {
    id: r.id,
    materialSystemId: r.material_system_id,
    kind: r.kind,
    title: r.title,
    fileName: r.file_name,
    contentType: r.content_type,
    sizeBytes: Number(r.size_bytes),
    sha256: r.sha256,
    href: `/v1/material-systems/${r.material_system_id}/documents/${r.id}/content`,
    uploadedBy: r.uploaded_by_label,
    createdAt: r.created_at,
  };
}

/** A file name safe to echo in Content-Disposition and logs: no paths, no control characters. */
export function safeFileName(name: string | undefined): string {
  const base = (name ?? '').split(/[\\/]/).pop() ?? '';
  const clean = base.replace(/[\u0000-\u001f\u007f"]/g, '').trim().slice(0, 200);
  if (!clean) return 'document.pdf';
  return /\.pdf$/i.test(clean) ? clean : `${clean}.pdf`;
}

export function isPdf(content: Buffer | undefined): boolean {
  return !!content && content.length >= PDF_MAGIC.length && content.subarray(0, PDF_MAGIC.length).equals(PDF_MAGIC);
}

/** The SDS and TDS of each material system: workers must be able to reach the SDS of what they handle. */
@Injectable()
export class DocumentsService {
  constructor(@Inject(KNEX) private readonly db: Knex, private readonly audit: AuditService, @Inject(DOCUMENT_STORE) private readonly store: DocumentStore) {}

  private async system(orgId: string, id: string) {
    const ms = await this.db('material_systems').where({ id, organization_id: orgId }).first('id', 'name');
    if (!ms) throw notFound('material system');
    return ms as { id: string; name: string };
  }

  async list(c: RequestContext, systemId: string, kind?: string) {
    await this.system(c.principal.organizationId, systemId);
    const q = this.db('material_system_documents').where({ organization_id: c.principal.organizationId, material_system_id: systemId }).orderBy([{ column: 'kind' }, { column: 'created_at', order: 'desc' }]);
    if (kind) q.where({ kind });
    return ((await q) as DocumentRow[]).map(documentView);
  }

  /** The SDS documents of several systems at once (for targets: what to read before pouring). */
  async safetyDataSheets(orgId: string, systemIds: string[]) {
    if (systemIds.length === 0) return [];
    const rows: DocumentRow[] = await this.db('material_system_documents').where({ organization_id: orgId, kind: 'SDS' }).whereIn('material_system_id', systemIds).orderBy('created_at', 'desc');
    return rows.map(documentView);
  }

  /** `file` is null when the request was not multipart/form-data at all (415). */
  async upload(c: RequestContext, systemId: string, file: UploadedPdf | null | undefined, fields: { kind?: unknown; title?: unknown }) {
    const orgId = c.principal.organizationId;
    const ms = await this.system(orgId, systemId);
    if (file === null) {
      throw new ProblemException(415, { slug: 'unsupported-media-type', detail: 'Send the document as multipart/form-data with the fields "kind" and "file".' });
    }
    const errors = [];
    if (typeof fields.kind !== 'string' || !(DOCUMENT_KINDS as readonly string[]).includes(fields.kind)) {
      errors.push({ pointer: '/kind', detail: `must be one of: ${DOCUMENT_KINDS.join(', ')}`, code: 'enum' });
    }
    if (fields.title !== undefined && (typeof fields.title !== 'string' || fields.title.length > 200)) {
      errors.push({ pointer: '/title', detail: 'must be text of at most 200 characters', code: 'maxLength' });
    }
    if (!file || !file.buffer) errors.push({ pointer: '/file', detail: 'attach the PDF as the form field "file"', code: 'required' });
    else if (file.buffer.length === 0) errors.push({ pointer: '/file', detail: 'the file is empty', code: 'minLength' });
    if (errors.length) throw validationProblem(errors);
    const content = file!.buffer!;
    if (!isPdf(content)) {
      throw new ProblemException(415, { slug: 'unsupported-media-type', detail: 'Only PDF documents are accepted, and this file is not one: its content does not start with %PDF-.', errors: [{ pointer: '/file', detail: 'is not a PDF', code: 'contentType' }] });
    }
    const id = randomUUID();
    const key = `${orgId}/${id}.pdf`;
    const sha256 = createHash('sha256').update(content).digest('hex');
    const fileName = safeFileName(file!.originalname);
    const actor = actorOf(c.principal);
    await this.store.put(key, content, 'application/pdf');
    try {
      await this.db.transaction(async (trx) => {
        await trx('material_system_documents').insert({
          id, organization_id: orgId, material_system_id: systemId, kind: fields.kind, title: typeof fields.title === 'string' && fields.title.trim() ? fields.title.trim() : null,
          file_name: fileName, content_type: 'application/pdf', size_bytes: content.length, sha256, storage_key: key, uploaded_by_label: actor.actorLabel,
        });
        await this.audit.record({ organizationId: orgId, ...actor, action: 'document.uploaded', targetType: 'material_system', targetId: systemId, details: { documentId: id, kind: fields.kind, fileName, sizeBytes: content.length, sha256, system: ms.name }, ip: c.ip, userAgent: c.userAgent }, trx);
      });
    } catch (e) {
      await this.store.delete(key).catch(() => undefined);
      throw e;
    }
    const row = await this.db('material_system_documents').where({ id }).first();
    return documentView(row);
  }

  async content(c: RequestContext, systemId: string, documentId: string): Promise<{ row: DocumentRow; content: Buffer }> {
    const row: DocumentRow | undefined = await this.db('material_system_documents').where({ id: documentId, material_system_id: systemId, organization_id: c.principal.organizationId }).first();
    if (!row) throw notFound('document');
    return { row, content: await this.store.get(row.storage_key) };
  }
}
