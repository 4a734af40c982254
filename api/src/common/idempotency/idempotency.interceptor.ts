import { applyDecorators, type CallHandler, type ExecutionContext, Inject, Injectable, type NestInterceptor, SetMetadata } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Reflector } from '@nestjs/core';
import { ApiExtension } from '@nestjs/swagger';
import type { FastifyReply, FastifyRequest } from 'fastify';
import type { Knex } from 'knex';
import { createHash } from 'node:crypto';
import { lastValueFrom, type Observable, of } from 'rxjs';
import type { Principal } from '../../auth/principal.js';
import { type Env, secretsKeysPrevious } from '../../config/env.js';
import { KNEX } from '../../database/database.module.js';
import { NO_STORE } from '../decorators/no-store.decorator.js';
import { IS_PUBLIC } from '../decorators/public.decorator.js';
import { SecretBox } from '../secret-box.js';
import { isMultipart } from '../http/multipart.js';
import { malformed, ProblemException, validationProblem } from '../problems.js';

/** How long a key and its response are kept. */
export const IDEMPOTENCY_TTL_HOURS = 24;
/** An in-flight key older than this belongs to a request that died; a retry may take it over. */
export const IN_FLIGHT_TAKEOVER_S = 60;
export const REPLAYED_HEADER = 'idempotent-replayed';

const SKIP = 'pourgate:idempotency-skip';
/** An expired key, or one held by a request that died long ago: free to take again. */
const STALE = `(expires_at < now() OR (state = 'in_flight' AND created_at < now() - make_interval(secs => ${IN_FLIGHT_TAKEOVER_S})))`;
const SKIP_REQUEST = Symbol('not handled here');
/** Keys of a stored response body that is sealed (it carried a secret). */
const SEALED = '$pourgateSealed';
const SEALED_VERSION = '$pourgateKeyVersion';
/**
 * Marks a POST that is idempotent by its own means (a reading's (device, clientReadingId), an
 * imported file's hash): the Idempotency-Key header is ignored there.
 */
export const OwnIdempotency = (how: string) => applyDecorators(SetMetadata(SKIP, true), ApiExtension('x-pourgate-idempotency', how));

/** The header as a structured-field string (`"abc"`) or a bare token; printable ASCII, 1–255 characters. */
export function parseIdempotencyKey(raw: string): string | null {
  const m = /^"([\x20-\x21\x23-\x5b\x5d-\x7e]{1,255})"$/.exec(raw) ?? /^([\x21\x23-\x7e]{1,255})$/.exec(raw);
  return m ? m[1]! : null;
}

/** Deeper than any request of this API; a body nested further is refused before it is hashed. */
export const MAX_BODY_DEPTH = 64;

/** JSON with object keys sorted, so two bodies that differ only in key order are the same request. */
export function canonicalJson(v: unknown, depth = 0): string {
  if (depth > MAX_BODY_DEPTH) throw validationProblem([{ pointer: '', detail: `is nested deeper than ${MAX_BODY_DEPTH} levels`, code: 'depth' }], 'The body is nested too deeply.');
  if (Array.isArray(v)) return `[${v.map((x) => canonicalJson(x, depth + 1)).join(',')}]`;
  if (v && typeof v === 'object') {
    return `{${Object.keys(v as object).sort().map((k) => `${JSON.stringify(k)}:${canonicalJson((v as Record<string, unknown>)[k], depth + 1)}`).join(',')}}`;
  }
  return JSON.stringify(v ?? null);
}

/** Method, path, query and canonical body: what makes two requests "the same request". */
export function requestHash(method: string, url: string, body: unknown): string {
  return createHash('sha256').update(`${method} ${url}\n${canonicalJson(body)}`).digest('hex');
}

interface KeyRow {
  request_hash: string;
  state: 'in_flight' | 'done';
  response_status: number | null;
  response_headers: Record<string, string> | null;
  response_body: string | null;
}

/**
 * `Idempotency-Key` on every authenticated POST (the IETF httpapi draft's semantics), scoped to the
 * caller: the first request runs and its response is stored; a retry with the same key and body
 * gets that response again (with `Idempotent-Replayed: true`); the same key with another request is
 * a 422; a retry while the first is still running is a 409 with Retry-After. A request that fails
 * (an error response) keeps no key, so a corrected retry may reuse it.
 */
@Injectable()
export class IdempotencyInterceptor implements NestInterceptor {
  private readonly box: SecretBox;

  constructor(@Inject(KNEX) private readonly db: Knex, private readonly reflector: Reflector, config: ConfigService<Env, true>) {
    this.box = new SecretBox(config.get('SECRETS_KEY', { infer: true }), secretsKeysPrevious(config.get('SECRETS_KEY_PREVIOUS', { infer: true })));
  }

  /**
   * A response that carries a secret (a new key, a webhook secret, tokens: routes marked @NoStore) is
   * kept sealed, so the idempotency table never holds a usable secret in plain text.
   */
  private storedBody(body: unknown, secret: boolean): string | null {
    if (body === undefined) return null;
    const json = JSON.stringify(body);
    if (!secret) return json;
    const { sealed, version } = this.box.seal(json);
    return JSON.stringify({ [SEALED]: sealed, [SEALED_VERSION]: version });
  }

  private replayedBody(stored: string | null): unknown {
    if (stored === null) return undefined;
    const parsed = JSON.parse(stored) as Record<string, unknown>;
    if (parsed && typeof parsed === 'object' && typeof parsed[SEALED] === 'string') return JSON.parse(this.box.open(parsed[SEALED] as string, parsed[SEALED_VERSION] as string));
    return parsed;
  }

  /**
   * What identifies the request besides method and URL. A multipart body is not parsed yet when the
   * global interceptor runs: upload routes put `UploadIdempotencyInterceptor` after their file
   * interceptor instead.
   */
  protected requestBody(req: FastifyRequest): unknown {
    return isMultipart(req) ? SKIP_REQUEST : req.body;
  }

  async intercept(ctx: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    if (ctx.getType() !== 'http') return next.handle();
    const req = ctx.switchToHttp().getRequest<FastifyRequest & { principal?: Principal }>();
    const raw = req.headers['idempotency-key'];
    if (req.method !== 'POST' || raw === undefined) return next.handle();
    const body = this.requestBody(req);
    if (body === SKIP_REQUEST) return next.handle();
    const targets = [ctx.getHandler(), ctx.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(SKIP, targets) || this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets) || !req.principal) return next.handle();
    const key = parseIdempotencyKey(Array.isArray(raw) ? raw.join(',') : raw);
    if (!key) throw malformed('The Idempotency-Key header must be 1–255 printable ASCII characters (a UUID is a good key).', [{ pointer: '/headers/idempotency-key', detail: 'must be 1–255 printable ASCII characters', code: 'format' }]);
    const p = req.principal;
    const scope = `${p.organizationId}:${p.kind}:${p.id}`;
    const hash = requestHash(req.method, req.url, body);
    const reply = ctx.switchToHttp().getResponse<FastifyReply>();

    const held = await this.claim(scope, key, hash);
    if (held) {
      if (held.request_hash !== hash) throw new ProblemException(422, { slug: 'idempotency-key-reused', detail: 'This Idempotency-Key was used with a different request. Use a new key for a new request.' });
      if (held.state === 'in_flight') throw new ProblemException(409, { slug: 'idempotency-key-in-flight', detail: 'The first request with this Idempotency-Key is still running; retry shortly for its response.' }, { 'retry-after': '1' });
      void reply.status(held.response_status!);
      void reply.header(REPLAYED_HEADER, 'true');
      for (const [h, v] of Object.entries(held.response_headers ?? {})) void reply.header(h, v);
      return of(this.replayedBody(held.response_body));
    }
    try {
      const body = await lastValueFrom(next.handle(), { defaultValue: undefined });
      const headers: Record<string, string> = {};
      for (const h of ['location', 'content-range']) {
        const v = reply.getHeader(h);
        if (typeof v === 'string') headers[h] = v;
      }
      await this.db('idempotency_keys').where({ scope, key }).update({ state: 'done', response_status: reply.statusCode, response_headers: JSON.stringify(headers), response_body: this.storedBody(body, this.reflector.getAllAndOverride<boolean>(NO_STORE, targets) ?? false) });
      return of(body);
    } catch (e) {
      await this.db('idempotency_keys').where({ scope, key }).del().catch(() => undefined);
      throw e;
    }
  }

  /** Takes the key for this request (null), or returns the row of the request that holds it. */
  private async claim(scope: string, key: string, hash: string, tries = 3): Promise<KeyRow | null> {
    const inserted = await this.db('idempotency_keys')
      .insert({ scope, key, request_hash: hash, state: 'in_flight', expires_at: this.db.raw(`now() + make_interval(hours => ${IDEMPOTENCY_TTL_HOURS})`) })
      .onConflict(['scope', 'key'])
      .ignore()
      .returning('key');
    if (inserted.length) return null;
    const row = await this.db('idempotency_keys').where({ scope, key }).first<(KeyRow & { stale: boolean }) | undefined>('request_hash', 'state', 'response_status', 'response_headers', 'response_body', this.db.raw(`${STALE} AS stale`));
    if (tries > 0 && (!row || row.stale)) {
      if (row) await this.db('idempotency_keys').where({ scope, key }).whereRaw(STALE).del();
      return this.claim(scope, key, hash, tries - 1);
    }
    return row ?? { request_hash: hash, state: 'in_flight', response_status: null, response_headers: null, response_body: null };
  }
}

/**
 * The same, for an upload route, placed after its file interceptor: the request is the form fields
 * and the SHA-256 of the file's bytes.
 */
@Injectable()
export class UploadIdempotencyInterceptor extends IdempotencyInterceptor {
  protected override requestBody(req: FastifyRequest & { file?: { buffer?: Buffer; originalname?: string } }): unknown {
    // anything else was handled by the global interceptor already
    if (!isMultipart(req)) return SKIP_REQUEST;
    const file = req.file?.buffer ? { name: req.file.originalname ?? null, sha256: createHash('sha256').update(req.file.buffer).digest('hex') } : null;
    return { fields: req.body ?? null, file };
  }
}
