import { HttpException } from '@nestjs/common';

/** One failed check of a request, located by a JSON Pointer (RFC 6901) into the body or query. */
export interface FieldError {
  pointer: string;
  detail: string;
  code?: string;
}

/** RFC 9457 problem details, with Pourgate's `errors[]` extension for validation failures. */
export interface Problem {
  type: string;
  title: string;
  status: number;
  detail?: string;
  instance?: string;
  errors?: FieldError[];
  [extension: string]: unknown;
}

/**
 * The problem types the API emits, beyond plain HTTP statuses (which use `about:blank`). Each
 * `type` is a relative URI that the API itself serves with a description (GET /v1/problems/{slug}).
 */
export const PROBLEM_TYPES = {
  'validation-failed': { title: 'The request is not valid', description: 'One or more fields failed validation; see errors[] for JSON Pointers to each one.' },
  'malformed-request': { title: 'The request could not be parsed', description: 'The body is not well-formed JSON, or a query parameter is not in the documented format.' },
  'unsupported-media-type': { title: 'Unsupported media type', description: 'Send JSON bodies as application/json (or multipart/form-data where a route takes files).' },
  'payload-too-large': { title: 'The request body is too large', description: 'The body is over the size limit of the route.' },
  'method-not-allowed': { title: 'Method not allowed', description: 'The path exists but does not take this method; the Allow header lists the methods it takes.' },
  'not-found': { title: 'Not found', description: 'Nothing exists at this path, or it belongs to another organization.' },
  'idempotency-key-reused': { title: 'Idempotency-Key reused with another request', description: 'This Idempotency-Key was already used by you with a different method, path or body. Use a new key for a new request.' },
  'idempotency-key-in-flight': { title: 'A request with this Idempotency-Key is still in progress', description: 'The first request with this key has not finished; retry after the number of seconds in Retry-After to get its response.' },
  conflict: { title: 'Conflict', description: 'The request conflicts with the current state of the resource.' },
  'service-unavailable': { title: 'Service temporarily unavailable', description: 'A backing service (database or queue) is not reachable. Retry after the number of seconds in Retry-After; nothing was written.' },
  'internal-error': { title: 'Internal error', description: 'An unexpected error. The request id in the response lets an operator find the log line.' },
} as const;

export type ProblemSlug = keyof typeof PROBLEM_TYPES;

export function problemType(slug: ProblemSlug): string {
  return `/v1/problems/${slug}`;
}

/** Throw this to answer with a specific problem. */
export class ProblemException extends HttpException {
  constructor(
    status: number,
    readonly problem: Omit<Problem, 'status' | 'type' | 'title'> & { type?: string; title?: string; slug?: ProblemSlug },
    readonly headers: Record<string, string> = {},
  ) {
    super(problem.detail ?? problem.title ?? 'error', status);
  }
}

export function validationProblem(errors: FieldError[], detail = 'The request has invalid fields.'): ProblemException {
  return new ProblemException(422, { slug: 'validation-failed', detail, errors });
}

export function malformed(detail: string, errors?: FieldError[]): ProblemException {
  return new ProblemException(400, { slug: 'malformed-request', detail, errors });
}
