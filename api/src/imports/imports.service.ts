import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable, Logger } from '@nestjs/common';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { createHash } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type Principal, type RequestContext } from '../auth/principal.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { listPage } from '../common/lists/knex-list.js';
import { ProblemException, validationProblem } from '../common/problems.js';
import { schemaRegistry } from '../common/schemas/schema-registry.js';
import { KNEX } from '../database/database.module.js';
import { ReadingsService } from '../readings/readings.service.js';
import { type BadRow, columnOf, CsvFileError, parseReadingsCsv } from './csv-rows.js';
import { IMPORT_CHUNK_ROWS, IMPORT_QUEUE, type ImportJob, MAX_IMPORT_BYTES, MAX_LISTED_BAD_ROWS } from './imports.constants.js';

export const importsListSpec: ListSpec = {
  resource: 'imports',
  sortable: ['createdAt', 'status'],
  filters: { status: 'eq', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const columns = { createdAt: 'created_at', status: 'status', id: 'id' };

interface ImportRow {
  id: string;
  organization_id: string;
  file_name: string | null;
  sha256: string;
  size_bytes: number;
  status: 'queued' | 'running' | 'done' | 'failed';
  total: number;
  processed: number;
  imported: number;
  duplicates: number;
  bad_rows: BadRow[];
  error: string | null;
  actor_type: string;
  actor_id: string | null;
  actor_label: string | null;
  bound_device_id: string | null;
  created_at: Date;
  started_at: Date | null;
  finished_at: Date | null;
}

const VIEW_COLUMNS = ['id', 'organization_id', 'file_name', 'sha256', 'size_bytes', 'status', 'total', 'processed', 'imported', 'duplicates', 'bad_rows', 'error', 'actor_label', 'created_at', 'started_at', 'finished_at'];

export function importView(r: ImportRow) {
  const badCount = r.bad_rows.length;
  return {
    id: r.id,
    fileName: r.file_name,
    sha256: r.sha256,
    sizeBytes: r.size_bytes,
    status: r.status,
    total: r.total,
    processed: r.processed,
    percent: r.total > 0 ? Math.floor((r.processed / r.total) * 100) : r.status === 'done' ? 100 : 0,
    accepted: r.imported,
    duplicates: r.duplicates,
    rejectedRows: badCount,
    badRows: r.bad_rows.slice(0, MAX_LISTED_BAD_ROWS),
    error: r.error,
    uploadedBy: r.actor_label,
    createdAt: r.created_at,
    startedAt: r.started_at,
    finishedAt: r.finished_at,
    statusUrl: `/v1/imports/${r.id}`,
  };
}

/** Logger CSV files: kept, then imported row by row through the readings' own checks and ingest. */
@Injectable()
export class ImportsService {
  private readonly log = new Logger('imports');

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly readings: ReadingsService,
    private readonly audit: AuditService,
    @InjectQueue(IMPORT_QUEUE) private readonly queue: Queue<ImportJob>,
  ) {}

  /**
   * Keeps the file and queues its import. The header is checked now (a file that cannot be read is
   * refused at once); rows are checked by the job. The same bytes again answer with the first import.
   */
  async upload(c: RequestContext, file: { buffer?: Buffer; originalname?: string } | null | undefined): Promise<{ created: boolean; view: ReturnType<typeof importView> }> {
    if (file === null) throw new ProblemException(415, { slug: 'unsupported-media-type', detail: 'Send the CSV as multipart/form-data in the form field "file".' });
    if (!file?.buffer) throw validationProblem([{ pointer: '/file', detail: 'attach the CSV as the form field "file"', code: 'required' }]);
    const content = file.buffer;
    if (content.length > MAX_IMPORT_BYTES) throw new ProblemException(413, { slug: 'payload-too-large', detail: `The file is over ${MAX_IMPORT_BYTES / 1024 / 1024} MB; split the export.` });
    const text = content.toString('utf8');
    if (text.includes('\uFFFD') || text.includes('\u0000')) throw new ProblemException(415, { slug: 'unsupported-media-type', detail: 'The file is not UTF-8 text (a logger CSV export).', errors: [{ pointer: '/file', detail: 'is not UTF-8 text', code: 'contentType' }] });
    let total: number;
    try {
      const parsed = parseReadingsCsv(text);
      total = parsed.rows.length + parsed.bad.length;
    } catch (e) {
      if (!(e instanceof CsvFileError)) throw e;
      throw validationProblem([{ pointer: `/file${e.field === 'header' ? '/header' : ''}`, detail: e.message, code: 'csv' }], 'The CSV cannot be imported.');
    }
    const orgId = c.principal.organizationId;
    const sha256 = createHash('sha256').update(content).digest('hex');
    const actor = actorOf(c.principal);
    const p = c.principal;
    const inserted = await this.db.transaction(async (trx) => {
      const rows = await trx('reading_imports')
        .insert({
          organization_id: orgId, file_name: safeName(file.originalname), sha256, size_bytes: content.length, content, total,
          actor_type: actor.actorType, actor_id: actor.actorId, actor_label: actor.actorLabel, bound_device_id: p.kind === 'api_key' ? p.deviceId : null,
        })
        .onConflict(['organization_id', 'sha256']).ignore().returning(VIEW_COLUMNS);
      if (rows.length) await this.audit.record({ organizationId: orgId, ...actor, action: 'import.uploaded', targetType: 'reading_import', targetId: rows[0].id, details: { fileName: rows[0].file_name, rows: total, sha256 }, ip: c.ip, userAgent: c.userAgent }, trx);
      return rows[0] as ImportRow | undefined;
    });
    if (!inserted) return { created: false, view: importView(await this.db('reading_imports').where({ organization_id: orgId, sha256 }).first(VIEW_COLUMNS)) };
    await this.enqueue(inserted.id);
    return { created: true, view: importView(inserted) };
  }

  async enqueue(id: string): Promise<boolean> {
    try {
      await this.queue.add({ importId: id }, { jobId: id, attempts: 5, backoff: { type: 'exponential', delay: 1000 }, removeOnComplete: true, removeOnFail: true });
      return true;
    } catch (e) {
      this.log.warn(`import ${id} stays queued; the sweeper will queue it (${(e as Error).message})`);
      return false;
    }
  }

  async get(c: RequestContext, id: string) {
    const r = await this.db('reading_imports').where({ organization_id: c.principal.organizationId, id }).first(VIEW_COLUMNS);
    if (!r) throw new ProblemException(404, { detail: 'No import with that id in your organization.' });
    return importView(r);
  }

  async list(c: RequestContext, q: ListQuery) {
    const base = this.db('reading_imports').where('organization_id', c.principal.organizationId).select(VIEW_COLUMNS);
    const { rows, total } = await listPage<ImportRow>(base, q, importsListSpec, columns);
    return { rows: rows.map(importView), total };
  }

  /**
   * The job: rows in chunks, each checked with the readings' own rules and the good ones ingested
   * (idempotent per device and client reading id, so a job run again after a crash adds nothing).
   */
  async run(id: string, opts: { lastAttempt?: boolean } = {}): Promise<void> {
    try {
      await this.runOnce(id);
    } catch (e) {
      // every import ends: a job that fails on its last attempt marks the import failed with the reason
      // (earlier attempts rethrow so the queue retries what may be passing trouble, a database restart)
      if (!opts.lastAttempt) throw e;
      this.log.error(`import ${id} failed: ${(e as Error).message}`);
      await this.fail(id, `The import stopped before the end (${plainReason(e)}); rows already imported are kept, upload the file again to finish it.`);
    }
  }

  /** Marks a queued or running import failed, with a reason a person can act on. */
  async fail(id: string, reason: string): Promise<void> {
    await this.db('reading_imports').where({ id }).whereIn('status', ['queued', 'running']).update({ status: 'failed', error: reason.slice(0, 1000), finished_at: this.db.fn.now() });
  }

  private async runOnce(id: string): Promise<void> {
    const imp = await this.db('reading_imports').where({ id }).first();
    if (!imp || imp.status === 'done' || imp.status === 'failed') return;
    await this.db('reading_imports').where({ id }).update({ status: 'running', started_at: this.db.fn.now(), processed: 0, imported: 0, duplicates: 0, bad_rows: '[]' });
    let parsed;
    try {
      parsed = parseReadingsCsv(Buffer.from(imp.content).toString('utf8'));
    } catch (e) {
      await this.db('reading_imports').where({ id }).update({ status: 'failed', error: (e as Error).message, finished_at: this.db.fn.now() });
      return;
    }
    const principal = { kind: imp.actor_type === 'api_key' ? 'api_key' : 'user', id: imp.actor_id, organizationId: imp.organization_id, deviceId: imp.bound_device_id } as unknown as Principal;
    const c: RequestContext = { principal, ip: undefined as unknown as string, userAgent: undefined, requestId: `import-${id}` };
    const bad: BadRow[] = [...parsed.bad];
    let imported = 0;
    let duplicates = 0;
    const registry = schemaRegistry();
    for (let start = 0; start < parsed.rows.length; start += IMPORT_CHUNK_ROWS) {
      const chunk = parsed.rows.slice(start, start + IMPORT_CHUNK_ROWS);
      const rowErrors = new Map<number, BadRow['errors']>();
      const add = (i: number, field: string, detail: string) => rowErrors.set(i, [...(rowErrors.get(i) ?? []), { field: columnOf(field), detail }]);
      chunk.forEach((r, i) => {
        for (const e of registry.validate('reading.create', r.input)) add(i, e.pointer.split('/')[1] || 'row', e.detail);
      });
      // only rows the schema accepts go on to the readings' checks (which query by their ids)
      const valid = chunk.map((_, i) => i).filter((i) => !rowErrors.has(i));
      const { rows, errors } = await this.readings.check(c, valid.map((i) => chunk[i]!.input), (k) => `/${valid[k]}`);
      for (const e of errors) {
        const [, index, field] = e.pointer.split('/');
        const i = Number(index);
        if (!rowErrors.get(i)?.some((x) => x.field === columnOf(field ?? 'row'))) add(i, field ?? 'row', e.detail);
      }
      const good = rows.filter((_, k) => !rowErrors.has(valid[k]!));
      const stored = good.length ? await this.readings.store(good) : [];
      imported += stored.filter((s) => !s.replayed).length;
      duplicates += stored.filter((s) => s.replayed).length;
      for (const [i, errs] of rowErrors) bad.push({ line: chunk[i]!.line, errors: errs });
      await this.db('reading_imports').where({ id }).update({ processed: Math.min(parsed.bad.length + start + chunk.length, imp.total), imported, duplicates, bad_rows: JSON.stringify(bad) });
    }
    bad.sort((a, b) => a.line - b.line);
    await this.db('reading_imports').where({ id }).update({ status: 'done', processed: imp.total, imported, duplicates, bad_rows: JSON.stringify(bad), finished_at: this.db.fn.now() });
  }

  /** Imports whose job was lost (Redis down at upload, a worker crash) are queued again. */
  async sweep(olderThanMs: number): Promise<number> {
    const stale = await this.db('reading_imports').whereIn('status', ['queued', 'running']).where('created_at', '<', new Date(Date.now() - olderThanMs)).select('id');
    let n = 0;
    for (const { id } of stale) if (await this.enqueue(id)) n++;
    return n;
  }
}

/** An error in words for the import's page: no stack, no SQL. */
function plainReason(e: unknown): string {
  const code = (e as { code?: string }).code;
  if (code === 'ECONNREFUSED' || code === '57P01' || code === '57P03') return 'the database was not reachable';
  if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return 'the database refused a row';
  return 'an unexpected error';
}

function safeName(name: string | undefined): string | null {
  if (!name) return null;
  const base = name.split(/[\\/]/).pop()!.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 200);
  return base || null;
}
