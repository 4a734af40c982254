/**
 * Logger CSV imports: `POST /v1/imports` (multipart, field `file`) answers 202 with the import, or
 * 200 with the first import when the same file was sent before; `GET /v1/imports/{id}` is polled
 * until the import is `done` or `failed`.
 */
import { problemToHttpError } from '../dataProvider/problem';
import { accessTokenLapsing, type TokenStore } from '../dataProvider/session';
import type { ImportJob } from '../views/sdk';

export type ImportStatus = ImportJob['status'];

export type BadRow = ImportJob['badRows'][number];

export type { ImportJob };

export function isFinished(job: Pick<ImportJob, 'status'>): boolean {
  return job.status === 'done' || job.status === 'failed';
}

/** 0…100 for the progress bar, from `percent` or, failing that, processed ÷ total. */
export function progressOf(job: Pick<ImportJob, 'percent' | 'processed' | 'total' | 'status'>): number {
  let p = Number.isFinite(job.percent) ? job.percent : job.total > 0 ? (job.processed / job.total) * 100 : 0;
  if (job.status === 'done') p = 100;
  return Math.min(100, Math.max(0, p));
}

export interface UploadDeps {
  store: TokenStore;
  /** Renews the session through the console's own client (a cheap request through the data provider). */
  renew: () => Promise<unknown>;
  fetch?: typeof fetch;
  url?: string;
  now?: () => number;
}

export async function uploadCsv(file: File, deps: UploadDeps): Promise<{ job: ImportJob; replayed: boolean }> {
  const doFetch = deps.fetch ?? ((i: RequestInfo | URL, init?: RequestInit) => globalThis.fetch(i, init));
  const send = () => {
    const form = new FormData();
    form.append('file', file, file.name);
    const token = deps.store.read()?.accessToken;
    return doFetch(deps.url ?? '/v1/imports', { method: 'POST', body: form, headers: { Accept: 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) } });
  };
  const tokens = deps.store.read();
  if (tokens && accessTokenLapsing(tokens, (deps.now ?? Date.now)())) await deps.renew().catch(() => undefined);
  let res = await send();
  if (res.status === 401) {
    await deps.renew().catch(() => undefined);
    res = await send();
  }
  const text = await res.text();
  let json: unknown;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    json = undefined;
  }
  if (!res.ok) throw problemToHttpError({ status: res.status, statusText: res.statusText, headers: res.headers, json });
  return { job: json as ImportJob, replayed: res.status === 200 };
}

/**
 * Polls until the import is finished, handing every answer to `onUpdate`. Stops when `signal`
 * aborts; a failed poll is retried on the next tick, up to `maxFailures` in a row.
 */
export async function pollImport(
  fetchJob: () => Promise<ImportJob>,
  onUpdate: (job: ImportJob) => void,
  opts: { intervalMs?: number; signal?: AbortSignal; maxFailures?: number; sleep?: (ms: number) => Promise<void> } = {},
): Promise<ImportJob | null> {
  const sleep = opts.sleep ?? ((ms: number) => new Promise<void>((r) => setTimeout(r, ms)));
  let failures = 0;
  for (;;) {
    if (opts.signal?.aborted) return null;
    try {
      const job = await fetchJob();
      failures = 0;
      if (opts.signal?.aborted) return null;
      onUpdate(job);
      if (isFinished(job)) return job;
    } catch (error) {
      failures += 1;
      if (failures >= (opts.maxFailures ?? 5)) throw error;
    }
    await sleep(opts.intervalMs ?? 600);
  }
}
