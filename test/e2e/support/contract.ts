import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import addFormatsPkg from 'ajv-formats';

const addFormats = addFormatsPkg as unknown as (ajv: Ajv2020) => Ajv2020;

type Json = Record<string, unknown>;
interface MediaDoc { schema?: Json }
interface ResponseDoc { content?: Record<string, MediaDoc>; headers?: Record<string, unknown> }
interface OperationDoc { operationId?: string; responses?: Record<string, ResponseDoc> }
export interface OpenApiDoc { paths: Record<string, Record<string, OperationDoc>>; components?: { schemas?: Record<string, Json> } }

/** Routes the app serves on purpose outside the document (the document itself, the problem type pages, the docs UI). */
const OUTSIDE_THE_DOCUMENT = new Set(['/v1/openapi.json', '/v1/problems/:slug', '/v1/problems']);

/** Headers whose presence the document must admit when a response carries them. */
const WATCHED_HEADERS = ['location', 'content-range', 'retry-after', 'idempotent-replayed'];

const DOC_ID = 'urn:pourgate:openapi';

function rewriteRefs(node: unknown, prefix: string): unknown {
  if (Array.isArray(node)) return node.map((n) => rewriteRefs(n, prefix));
  if (!node || typeof node !== 'object') return node;
  const out: Json = {};
  for (const [k, v] of Object.entries(node)) {
    out[k] = k === '$ref' && typeof v === 'string' && v.startsWith('#/components/schemas/') ? `${prefix}#/$defs/${v.slice('#/components/schemas/'.length)}` : rewriteRefs(v, prefix);
  }
  return out;
}

/**
 * Checks responses against the served OpenAPI document: the operation is looked up by method and
 * route pattern, the response by status (`default` for errors), and the body is validated with ajv
 * (JSON Schema 2020-12, formats checked) against the documented schema of its media type.
 */
export class ResponseContract {
  private readonly ajv: Ajv2020;
  private readonly compiled = new Map<string, ValidateFunction>();

  constructor(private readonly doc: OpenApiDoc) {
    this.ajv = addFormats(new Ajv2020({ strict: false, allErrors: true }));
    this.ajv.addSchema({ $id: DOC_ID, $defs: rewriteRefs(doc.components?.schemas ?? {}, '') as Json });
  }

  /** Returns what is wrong with one response, or null when it matches the document. */
  check(r: { method: string; route: string | undefined; url: string; status: number; headers: Record<string, unknown>; payload: unknown }): string | null {
    const method = r.method.toLowerCase();
    if (method === 'head' || method === 'options') return null;
    const route = r.route;
    const contentType = String(r.headers['content-type'] ?? '').split(';')[0]!.trim().toLowerCase();
    let name = `${r.method} ${r.url}`;
    if (route === undefined || route === '*' || route === '/*') {
      // no route matched (404, an undecodable URL): only the problem body is checked
      if (!r.url.startsWith('/v1')) return null;
      return contentType === 'application/problem+json' ? this.validate(name, r.status, { $ref: `${DOC_ID}#/$defs/problem` }, r.payload) : `${name} answered ${r.status} with ${contentType || 'no content type'}, not application/problem+json`;
    }
    if (!route.startsWith('/v1/') || OUTSIDE_THE_DOCUMENT.has(route)) return null;
    const template = route.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
    const op: OperationDoc | undefined = this.doc.paths[template]?.[method];
    name = `${r.method} ${template}${op?.operationId ? ` (${op.operationId})` : ''}`;
    if (!op) return `${name}: the route is not in the OpenAPI document (document it: @Responds / @ListRoute on the controller method)`;
    const responses = op.responses ?? {};
    const resp = responses[String(r.status)] ?? responses[`${String(r.status)[0]}XX`] ?? (r.status >= 400 ? responses.default : undefined);
    if (!resp) return `${name} answered ${r.status}, which the document does not list (add @Responds(${r.status}, ...))`;
    for (const h of WATCHED_HEADERS) {
      const documented = Object.keys(resp.headers ?? {}).some((k) => k.toLowerCase() === h);
      if (r.headers[h] !== undefined && !documented) return `${name} answered ${r.status} with a ${h} header the document does not mention`;
      if (documented && (h === 'content-range' || (h === 'location' && r.status === 201)) && r.headers[h] === undefined) return `${name} answered ${r.status} without the documented ${h} header`;
    }
    if (r.status === 204 || r.status === 304) return null;
    if (!contentType) return resp.content ? `${name} answered ${r.status} without a body, but the document describes one` : null;
    const media = resp.content?.[contentType];
    if (!media) return `${name} answered ${r.status} with ${contentType}, which the document does not describe for it (documented: ${Object.keys(resp.content ?? {}).join(', ') || 'no body'})`;
    if (!contentType.includes('json')) return null;
    if (!media.schema) return `${name} answered ${r.status}: the document gives no schema for its ${contentType} body`;
    return this.validate(name, r.status, rewriteRefs(media.schema, DOC_ID) as Json, r.payload);
  }

  private validate(name: string, status: number, schema: Json, payload: unknown): string | null {
    const key = JSON.stringify(schema);
    let fn = this.compiled.get(key);
    if (!fn) {
      fn = this.ajv.compile(schema);
      this.compiled.set(key, fn);
    }
    let body: unknown;
    try {
      body = JSON.parse(Buffer.isBuffer(payload) ? payload.toString('utf8') : String(payload));
    } catch {
      return `${name} answered ${status} with a body that is not JSON`;
    }
    if (fn(body)) return null;
    const errors = this.ajv.errorsText(fn.errors, { separator: '; ', dataVar: 'body' });
    const excerpt = JSON.stringify(body).slice(0, 400);
    return `${name} answered ${status} with a body that does not match its schema: ${errors}\n  body: ${excerpt}`;
  }
}
