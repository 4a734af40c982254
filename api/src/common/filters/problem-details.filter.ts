import { ArgumentsHost, Catch, ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { STATUS_CODES } from 'node:http';
import { PROBLEM_TYPES, Problem, ProblemException, ProblemSlug, problemType } from '../problems.js';
import { RouteTable } from './route-table.js';

const PROBLEM_JSON = 'application/problem+json; charset=utf-8';

/** PostgreSQL error classes that mean "the database is not there right now", not "bad input". */
const DB_UNAVAILABLE_SQLSTATES = new Set(['57P01', '57P02', '57P03', '08000', '08001', '08003', '08004', '08006', '53300']);
const NET_UNAVAILABLE = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', 'EHOSTUNREACH']);

interface ErrorLike {
  statusCode?: number;
  status?: number;
  code?: string;
  message?: string;
  name?: string;
}

function plain(status: number, slug: ProblemSlug | null, detail?: string): Problem {
  return {
    type: slug ? problemType(slug) : 'about:blank',
    title: slug ? PROBLEM_TYPES[slug].title : (STATUS_CODES[status] ?? 'Error'),
    status,
    ...(detail ? { detail } : {}),
  };
}

function isUnavailable(err: ErrorLike): boolean {
  if (err.code && (DB_UNAVAILABLE_SQLSTATES.has(err.code) || NET_UNAVAILABLE.has(err.code))) return true;
  const m = err.message ?? '';
  return /Connection terminated|connect ECONNREFUSED|Knex: Timeout acquiring a connection|Connection is closed|is not queryable|Redis connection|MaxRetriesPerRequest/i.test(m);
}

/** Maps anything thrown to an RFC 9457 problem; unknown errors become a 500 with no internals leaked. */
export function toProblem(exception: unknown, req: FastifyRequest, routes?: RouteTable): { problem: Problem; headers: Record<string, string> } {
  if (exception instanceof ProblemException) {
    const { slug, ...rest } = exception.problem;
    const status = exception.getStatus();
    const base = plain(status, slug ?? null);
    return { problem: { ...base, ...rest, status }, headers: exception.headers };
  }
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    if (status === 404 && routes && /^Cannot [A-Z]+ /.test(exception.message)) {
      const allowed = routes.methodsFor(req.url);
      if (allowed.length > 0) {
        return {
          problem: plain(405, 'method-not-allowed', `${req.method} is not allowed on ${req.url.split('?')[0]}; allowed: ${allowed.join(', ')}.`),
          headers: { allow: allowed.join(', ') },
        };
      }
      return { problem: plain(404, 'not-found', `No route ${req.method} ${req.url.split('?')[0]}.`), headers: {} };
    }
    const body = exception.getResponse();
    let detail: string | undefined;
    if (typeof body === 'string') detail = body;
    else if (body && typeof body === 'object') {
      const m = (body as { message?: unknown }).message;
      detail = Array.isArray(m) ? m.join('; ') : typeof m === 'string' ? m : undefined;
    }
    const slug: ProblemSlug | null = status === 404 ? 'not-found' : status === 409 ? 'conflict' : status === 413 ? 'payload-too-large' : status === 415 ? 'unsupported-media-type' : status === 400 ? 'malformed-request' : null;
    const extra = body && typeof body === 'object' && 'info' in body ? { checks: (body as { info?: unknown; error?: unknown }).error ?? (body as { info?: unknown }).info } : {};
    const headers: Record<string, string> = status === 503 ? { 'retry-after': '5' } : {};
    return { problem: { ...plain(status, status === 503 ? 'service-unavailable' : slug, detail), ...extra }, headers };
  }
  const err = (exception ?? {}) as ErrorLike;
  const fastifyStatus = typeof err.statusCode === 'number' ? err.statusCode : undefined;
  if (fastifyStatus && fastifyStatus >= 400 && fastifyStatus < 500) {
    if (fastifyStatus === 413) return { problem: plain(413, 'payload-too-large', err.message), headers: {} };
    if (fastifyStatus === 415) return { problem: plain(415, 'unsupported-media-type', err.message), headers: {} };
    if (fastifyStatus === 400) return { problem: plain(400, 'malformed-request', err.message), headers: {} };
    const retry = (exception as { retryAfterSeconds?: number }).retryAfterSeconds;
    return { problem: plain(fastifyStatus, null, err.message), headers: retry ? { 'retry-after': String(retry) } : {} };
  }
  if (isUnavailable(err)) {
    return { problem: plain(503, 'service-unavailable', 'A backing service is not reachable; nothing was written. Retry shortly.'), headers: { 'retry-after': '5' } };
  }
  return { problem: plain(500, 'internal-error', 'An unexpected error occurred.'), headers: {} };
}

/**
 * Fastify's router answers some requests before Nest sees them (a path parameter over
 * `maxParamLength`: 414; a URL it cannot decode: 400) with its own JSON; pass this as the adapter's
 * `frameworkErrors` so those are problem details too.
 */
export function frameworkErrorProblem(err: Error & ErrorLike, req: FastifyRequest, reply: FastifyReply): void {
  const status = typeof err.statusCode === 'number' && err.statusCode >= 400 && err.statusCode < 600 ? err.statusCode : 400;
  const detail = err.code === 'FST_ERR_MAX_PARAM_LENGTH' ? 'A path parameter is longer than any id this API issues.' : 'The URL could not be parsed.';
  const problem: Problem = { ...plain(status, status === 400 ? 'malformed-request' : null, detail), requestId: req.id };
  void reply.status(status).header('content-type', PROBLEM_JSON).send(JSON.stringify(problem));
}

@Catch()
export class ProblemDetailsFilter implements ExceptionFilter {
  constructor(private readonly routes?: RouteTable, private readonly logger: Pick<Logger, 'error'> = new Logger('ProblemDetails')) {}

  catch(exception: unknown, host: ArgumentsHost): void {
    const ctx = host.switchToHttp();
    const req = ctx.getRequest<FastifyRequest>();
    const reply = ctx.getResponse<FastifyReply>();
    const { problem, headers } = toProblem(exception, req, this.routes);
    problem.instance ??= req.url.split('?')[0];
    problem.requestId = req.id;
    if (problem.status >= 500) {
      const e = exception as Error;
      this.logger.error(`${req.method} ${req.url} -> ${problem.status}: ${e?.message ?? String(exception)}`, e?.stack);
    }
    if (reply.sent) return;
    reply.status(problem.status ?? HttpStatus.INTERNAL_SERVER_ERROR);
    for (const [k, v] of Object.entries(headers)) reply.header(k, v);
    reply.header('content-type', PROBLEM_JSON).send(JSON.stringify(problem));
  }
}
