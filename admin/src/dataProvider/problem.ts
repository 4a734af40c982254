import { HttpError } from 'react-admin';

/** One entry of a problem's `errors[]`: a JSON Pointer (RFC 6901) to the failing field. */
export interface ProblemFieldError {
  pointer: string;
  detail: string;
  code?: string;
}

/** RFC 9457 problem details as the API sends them. */
export interface Problem {
  type?: string;
  title?: string;
  status?: number;
  detail?: string;
  instance?: string;
  errors?: ProblemFieldError[];
  [extension: string]: unknown;
}

/**
 * What the console keeps of a failed response: the problem itself, plus `errors` reshaped into an
 * object keyed by form field (react-admin forms read that shape), and `retryAfter` in seconds
 * when the API throttled the caller.
 */
export interface ProblemBody extends Omit<Problem, 'errors'> {
  errors?: Record<string, string>;
  fieldErrors: ProblemFieldError[];
  retryAfter?: number;
}

/**
 * Turns a JSON Pointer into the dotted path react-hook-form uses: `/readings/3/value` becomes
 * `readings.3.value`. Returns null for the whole-document pointer, which names no field.
 */
export function pointerToField(pointer: string): string | null {
  let p = pointer ?? '';
  if (p.startsWith('#')) p = decodeURIComponent(p.slice(1));
  if (p === '' || p === '/') return null;
  const tokens = (p.startsWith('/') ? p.slice(1) : p).split('/');
  return tokens.map((t) => t.replace(/~1/g, '/').replace(/~0/g, '~')).join('.');
}

/** Groups field errors by form field; two failures of one field are joined into one sentence. */
export function fieldErrorsByKey(errors: readonly ProblemFieldError[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const e of errors) {
    if (!e || typeof e.pointer !== 'string') continue;
    const key = pointerToField(e.pointer);
    if (!key) continue;
    const detail = String(e.detail ?? 'is not valid');
    out[key] = out[key] ? `${out[key]}; ${detail}` : detail;
  }
  return out;
}

/** Seconds to wait from a `Retry-After` header (delta-seconds or an HTTP date). */
export function parseRetryAfter(value: string | null | undefined, now = Date.now()): number | undefined {
  if (!value) return undefined;
  const trimmed = value.trim();
  if (/^\d+$/.test(trimmed)) return Number(trimmed);
  const at = Date.parse(trimmed);
  if (Number.isNaN(at)) return undefined;
  return Math.max(0, Math.ceil((at - now) / 1000));
}

function isProblem(json: unknown): json is Problem {
  return !!json && typeof json === 'object' && !Array.isArray(json);
}

/**
 * Builds the error react-admin understands from a failed response. The message a person sees is
 * the problem's `detail`, else its `title`, else the HTTP status text.
 */
export function problemToHttpError(res: { status: number; statusText?: string; headers?: Headers; json?: unknown }): HttpError {
  const problem: Problem = isProblem(res.json) ? res.json : {};
  const list = Array.isArray(problem.errors) ? problem.errors : [];
  const byField = fieldErrorsByKey(list);
  const retryAfter = parseRetryAfter(res.headers?.get('retry-after'));
  const message =
    (typeof problem.detail === 'string' && problem.detail) ||
    (typeof problem.title === 'string' && problem.title) ||
    res.statusText ||
    `The request failed (HTTP ${res.status}).`;
  const { errors: _dropped, ...rest } = problem;
  const body: ProblemBody = { ...rest, status: problem.status ?? res.status, fieldErrors: list };
  if (Object.keys(byField).length > 0) body.errors = byField;
  if (retryAfter !== undefined) body.retryAfter = retryAfter;
  return new HttpError(message, res.status, body);
}

/** The problem body carried by an error from the data layer, if there is one. */
export function problemOf(error: unknown): ProblemBody | undefined {
  if (error && typeof error === 'object' && 'body' in error) {
    const body = (error as { body?: unknown }).body;
    if (body && typeof body === 'object' && 'fieldErrors' in body) return body as ProblemBody;
  }
  return undefined;
}
