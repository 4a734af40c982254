import type { components } from './schema.js';

export type ProblemBody = components['schemas']['problem'] & Record<string, unknown>;
export type FieldError = NonNullable<components['schemas']['problem']['errors']>[number];

/**
 * An RFC 9457 problem answered by the API (or, for a non-problem error response such as a proxy's
 * HTML page, one built from the status line), thrown by every SDK call that fails.
 */
export class PourgateProblem extends Error {
  readonly status: number;
  readonly type: string;
  readonly title: string;
  readonly detail?: string;
  readonly instance?: string;
  readonly requestId?: string;
  /** Validation failures, each with a JSON Pointer into the body or query. */
  readonly errors: FieldError[];
  /** Seconds the server asked to wait (Retry-After), when it said. */
  readonly retryAfterSeconds?: number;
  /** The whole problem body, including extension members. */
  readonly body: ProblemBody;

  constructor(body: ProblemBody, retryAfterSeconds?: number) {
    super(body.detail ? `${body.status} ${body.title}: ${body.detail}` : `${body.status} ${body.title}`);
    this.name = 'PourgateProblem';
    this.status = body.status;
    this.type = body.type ?? 'about:blank';
    this.title = body.title;
    this.detail = body.detail;
    this.instance = body.instance;
    this.requestId = body.requestId;
    this.errors = body.errors ?? [];
    this.retryAfterSeconds = retryAfterSeconds;
    this.body = body;
  }

  /** The detail of the first error at this JSON Pointer, if any. */
  errorAt(pointer: string): FieldError | undefined {
    return this.errors.find((e) => e.pointer === pointer);
  }

  /** Reads a failed response into a problem; the response body is consumed. */
  static async fromResponse(res: Response): Promise<PourgateProblem> {
    const retryAfter = parseRetryAfter(res.headers.get('retry-after'));
    const text = await res.text().catch(() => '');
    return PourgateProblem.from(res.status, res.statusText, res.headers.get('content-type'), text, res.headers.get('x-request-id'), retryAfter);
  }

  /** From a status and a body already read (openapi-fetch parses it before handing it over). */
  static from(status: number, statusText: string, contentType: string | null, body: unknown, requestId?: string | null, retryAfterSeconds?: number): PourgateProblem {
    let parsed: unknown = body;
    if (typeof body === 'string' && /json/.test(contentType ?? '')) {
      try {
        parsed = JSON.parse(body);
      } catch {
        parsed = body;
      }
    }
    if (parsed && typeof parsed === 'object' && typeof (parsed as ProblemBody).title === 'string') {
      const p = parsed as ProblemBody;
      return new PourgateProblem({ ...p, status: typeof p.status === 'number' ? p.status : status, type: p.type ?? 'about:blank' }, retryAfterSeconds);
    }
    const detail = typeof parsed === 'string' && parsed.length ? parsed.slice(0, 500) : undefined;
    return new PourgateProblem({ type: 'about:blank', title: statusText || `HTTP ${status}`, status, ...(detail ? { detail } : {}), ...(requestId ? { requestId } : {}) }, retryAfterSeconds);
  }
}

/** Thrown when the API could not be reached at all, after every retry. */
export class PourgateNetworkError extends Error {
  constructor(
    message: string,
    readonly attempts: number,
    options?: { cause?: unknown },
  ) {
    super(message, options);
    this.name = 'PourgateNetworkError';
  }
}

/** Retry-After as seconds: either delta-seconds or an HTTP date (RFC 9110 §10.2.3). */
export function parseRetryAfter(value: string | null | undefined, now = Date.now()): number | undefined {
  if (!value) return undefined;
  const trimmed = value.trim();
  if (/^\d+$/.test(trimmed)) return Number(trimmed);
  const at = Date.parse(trimmed);
  return Number.isNaN(at) ? undefined : Math.max(0, Math.ceil((at - now) / 1000));
}
