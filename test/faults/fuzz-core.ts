// Fuzzing every write route of the OpenAPI document the app serves: fast-check generates refused
// input (bodies that break the route's schema, malformed JSON and multipart, wrong content types,
// junk credentials, junk idempotency keys, ids and query strings), and every answer must be a 4xx
// problem+json that wrote nothing. Shared by the default-run Jest suite (test/e2e/fuzz.e2e-spec.ts)
// and the fault suite (test/faults/run.ts); the transport is passed in, so the same cases run
// in-process (inject) or over loopback HTTP.
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormatsPkg from 'ajv-formats';
import fc from 'fast-check';
import type { Knex } from 'knex';

const addFormats = addFormatsPkg as unknown as (ajv: Ajv2020) => Ajv2020;

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
type Schema = Record<string, unknown>;

export interface WriteRoute {
  method: 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  path: string;
  action?: string;
  isPublic: boolean;
  /** JSON schema of the body (resolved one level when it is a component $ref). */
  jsonSchema?: Schema;
  jsonRef?: string;
  multipartSchema?: Schema;
  bodyRequired: boolean;
  queryParams: { name: string; schema: Schema }[];
}

export interface FuzzRequest {
  method: string;
  url: string;
  headers: Record<string, string>;
  payload?: string | Buffer;
}

export interface FuzzResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: string;
}

export interface FuzzCase {
  route: WriteRoute;
  kind: string;
  request: FuzzRequest;
}

interface OpenApiDoc {
  paths: Record<string, Record<string, Record<string, unknown>>>;
  components?: { schemas?: Record<string, Schema> };
}

const WRITE_METHODS = ['post', 'put', 'patch', 'delete'];

/** Every write operation of the document; nothing is listed by hand, so new routes are fuzzed too. */
export function writeRoutes(doc: OpenApiDoc): WriteRoute[] {
  const out: WriteRoute[] = [];
  for (const [path, item] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(item)) {
      if (!WRITE_METHODS.includes(method)) continue;
      const rb = op.requestBody as { required?: boolean; content?: Record<string, { schema?: Schema }> } | undefined;
      const content = rb?.content ?? {};
      const json = content['application/json']?.schema;
      const multipart = content['multipart/form-data']?.schema;
      const ref = typeof json?.$ref === 'string' ? (json.$ref as string) : undefined;
      const params = ((op.parameters as { in: string; name: string; schema?: Schema }[] | undefined) ?? []).filter((p) => p.in === 'query');
      out.push({
        method: method.toUpperCase() as WriteRoute['method'],
        path,
        action: op['x-pourgate-action'] as string | undefined,
        isPublic: op['x-pourgate-public'] === true,
        jsonSchema: ref ? doc.components?.schemas?.[ref.split('/').pop()!] : json,
        jsonRef: ref,
        multipartSchema: multipart ? resolve(doc, multipart) : undefined,
        bodyRequired: rb?.required === true,
        queryParams: params.map((p) => ({ name: p.name, schema: p.schema ?? {} })),
      });
    }
  }
  return out;
}

function resolve(doc: OpenApiDoc, s: Schema): Schema {
  return typeof s.$ref === 'string' ? (doc.components?.schemas?.[(s.$ref as string).split('/').pop()!] ?? s) : s;
}

/** True when a body satisfies the route's schema as the document states it (same schemas as the server). */
export function bodyValidator(doc: OpenApiDoc): (route: WriteRoute, body: unknown) => boolean {
  const ajv = addFormats(new Ajv2020({ strict: false, allErrors: false, validateFormats: true }));
  ajv.addSchema({ $id: 'doc', components: doc.components ?? {} });
  const cache = new Map<string, (v: unknown) => boolean>();
  return (route, body) => {
    const key = `${route.method} ${route.path}`;
    let fn = cache.get(key);
    if (!fn) {
      const schema = route.jsonRef ? { $ref: `doc${route.jsonRef}` } : (route.jsonSchema ?? {});
      const compiled = ajv.compile(schema);
      fn = (v) => compiled(v) as boolean;
      cache.set(key, fn);
    }
    return fn(body);
  };
}

// ── generators ────────────────────────────────────────────────────────────────────────────

const printable = (max: number) => fc.string({ unit: fc.integer({ min: 0x20, max: 0x7e }).map((c) => String.fromCharCode(c)), maxLength: max });

/** Values that have broken services before: limits of numbers, odd text, ids of nothing. */
const nastyValue: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(
    '', ' ', '\u0000', 'a\u0000b', '\ud800', '%00', '../../etc/passwd', "'; DROP TABLE readings; --", '${7*7}', '{{7*7}}', '<script>x</script>',
    'NaN', 'Infinity', '-0', '1e400', 'null', 'true', '2026-02-30', '9999-12-31T23:59:60Z', 'not-a-uuid', '00000000-0000-0000-0000-000000000000',
    0, -0, -1, 1e308, -1e308, 5e-324, 2 ** 53 + 1, -(2 ** 31) - 1, 2 ** 31, 0.1 + 0.2, true, false, null, [], {}, [null], { __proto__: 'x' }, { constructor: { prototype: {} } },
  ),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
  fc.string({ minLength: 300, maxLength: 5000 }),
  fc.uuid(),
  fc.emailAddress(),
  fc.double(),
  fc.integer(),
  fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>,
);

function deepNest(depth: number, leaf: Json): Json {
  let v: Json = leaf;
  for (let i = 0; i < depth; i++) v = i % 2 ? [v] : { a: v };
  return v;
}

/** A JSON value that does not satisfy the route's schema (checked; a valid draw is wrapped in an array). */
function invalidJsonBody(route: WriteRoute, isValid: (r: WriteRoute, b: unknown) => boolean): fc.Arbitrary<{ kind: string; body: Json }> {
  const schema = route.jsonSchema ?? {};
  const props = Object.keys((schema.properties as Record<string, unknown> | undefined) ?? {});
  const required = (schema.required as string[] | undefined) ?? [];
  const keys = props.length ? fc.constantFrom(...props) : fc.string({ maxLength: 12 });
  const objectOfProps = fc.dictionary(keys, nastyValue, { maxKeys: Math.max(1, props.length) }) as fc.Arbitrary<Record<string, Json>>;
  const variants: fc.Arbitrary<{ kind: string; body: Json }>[] = [
    fc.oneof(fc.constant<Json>(null), fc.boolean(), fc.double(), fc.string({ maxLength: 30 }), fc.array(nastyValue, { maxLength: 4 })).map((body) => ({ kind: 'json:wrong-root', body })),
    objectOfProps.map((body) => ({ kind: 'json:wrong-types', body })),
    fc.tuple(objectOfProps, fc.string({ minLength: 1, maxLength: 20 }).filter((k) => !props.includes(k)), nastyValue).map(([o, k, v]) => ({ kind: 'json:extra-property', body: { ...o, [k]: v } })),
    fc.tuple(fc.integer({ min: 50, max: 3000 }), nastyValue, keys).map(([d, leaf, k]) => ({ kind: 'json:deep-nesting', body: { [k]: deepNest(d, leaf) } })),
    fc.constantFrom<Json>(JSON.parse('{"__proto__":{"polluted":true}}'), { constructor: { prototype: { polluted: true } } }, { toString: 1, valueOf: 'x' }).map((body) => ({ kind: 'json:prototype-keys', body })),
  ];
  if (required.length) {
    variants.push(objectOfProps.chain((o) => fc.constantFrom(...required).map((drop) => {
      const { [drop]: _gone, ...rest } = o;
      return { kind: 'json:missing-required', body: rest as Json };
    })));
  }
  return fc.oneof(...variants).map((v) => (isValid(route, v.body) ? { kind: `${v.kind}+wrapped`, body: [v.body] } : v));
}

const junkContentType = fc.oneof(
  fc.constantFrom('text/plain', 'application/xml', 'application/x-www-form-urlencoded', 'multipart/form-data', 'multipart/form-data; boundary=', 'application/octet-stream',
    'application/json; charset=latin1', 'application/jsonx', 'json', '*/*', 'application/problem+json', 'text/json', ';;;', 'application/json, text/plain'),
  printable(60),
);

const jsonContentType = fc.constantFrom('application/json', 'application/json; charset=utf-8', 'APPLICATION/JSON', 'application/json;charset=UTF-8');

const malformedJsonText = fc.oneof(
  fc.constantFrom('{', '}', '{"a":', '[1,2', '{"a":1,}', "{'a':1}", 'nul', '{"a":NaN}', '{"a":undefined}', '\u0000', '\ufeff{"a":1', '{"a":"\\x41"}', ' ', '{}{}', '"unterminated'),
  fc.string({ maxLength: 200 }).map((s) => `{${s}`),
  fc.jsonValue({ maxDepth: 2 }).map((v) => JSON.stringify(v).slice(0, -1) + '\u0001'),
);

const junkAuth = fc.oneof(
  fc.constant<Record<string, string>>({}),
  printable(200).map((v) => ({ authorization: v })),
  fc.constantFrom('Bearer', 'Bearer ', 'Basic YWRtaW46YWRtaW4=', 'Bearer eyJhbGciOiJub25lIn0.eyJzdWIiOiJ4In0.', 'Bearer a.b.c', 'Token x', 'Bearer ' + 'A'.repeat(8000)).map((v) => ({ authorization: v })),
  fc.oneof(printable(120), fc.constantFrom('pgd_live_', 'pgi_test_x', 'pgd_live_' + 'A'.repeat(43), ' ')).map((v) => ({ 'x-api-key': v })),
);

const junkIdempotencyKey = fc.oneof(
  fc.uuid(),
  printable(80),
  fc.constantFrom('', ' ', '"quoted"', 'a'.repeat(300), 'key with spaces', '*'),
);

const junkId = fc.oneof({ arbitrary: fc.uuid(), weight: 6 }, { arbitrary: fc.constantFrom('x', '0', '-1', 'null', 'undefined', '%00', '..', 'a'.repeat(500), '00000000-0000-0000-0000-00000000000g', "1' OR '1'='1"), weight: 2 }, { arbitrary: printable(40).filter((s) => s.length > 0), weight: 2 },
  // sent as they are, not percent-encoded: URLs the router cannot decode
  { arbitrary: fc.constantFrom('RAW:%zz', 'RAW:%E0%A4%A', 'RAW:%', 'RAW:%C0%AF', 'RAW:a%2', 'RAW:%FF%FE'), weight: 1 });

const junkQuery = (route: WriteRoute) => {
  const declared = route.queryParams.map((p) => p.name);
  const names = declared.length ? fc.oneof(fc.constantFrom(...declared), fc.string({ minLength: 1, maxLength: 10 })) : fc.string({ minLength: 1, maxLength: 10 });
  return fc.array(fc.tuple(names, fc.oneof(fc.string({ maxLength: 30 }), fc.constantFrom('', '[]', '{}', '%', '\u0000', 'metric', 'imperial', 'SI'))), { maxLength: 3 })
    .map((pairs) => (pairs.length ? '?' + pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&') : ''));
};

/** A multipart body that breaks the route's form: a required part missing, a torn body, a wrong boundary. */
const badMultipart = (route: WriteRoute) => {
  const schema = route.multipartSchema ?? {};
  const props = Object.keys((schema.properties as Record<string, unknown> | undefined) ?? {});
  const required = (schema.required as string[] | undefined) ?? [];
  const boundary = fc.stringMatching(/^[a-zA-Z0-9]{8,30}$/);
  const part = (b: string, name: string, value: string, file: boolean) =>
    `--${b}\r\ncontent-disposition: form-data; name="${name}"${file ? '; filename="x.bin"\r\ncontent-type: application/octet-stream' : ''}\r\n\r\n${value}\r\n`;
  return fc.oneof(
    // every declared part but one required, with junk values
    fc.tuple(boundary, fc.constantFrom(...(required.length ? required : ['file'])), fc.string({ maxLength: 100 })).map(([b, drop, v]) => ({
      kind: 'multipart:missing-part',
      contentType: `multipart/form-data; boundary=${b}`,
      payload: props.filter((p) => p !== drop).map((p) => part(b, p, v, p === 'file')).join('') + `--${b}--\r\n`,
    })),
    // torn: no closing boundary, or a part with no headers end
    fc.tuple(boundary, fc.string({ maxLength: 200 })).map(([b, v]) => ({ kind: 'multipart:torn', contentType: `multipart/form-data; boundary=${b}`, payload: `--${b}\r\ncontent-disposition: form-data; name="file"; filename="a.csv"\r\n${v}` })),
    // the boundary in the header is not the one in the body
    fc.tuple(boundary, boundary, fc.string({ maxLength: 100 })).filter(([a, b]) => a !== b).map(([a, b, v]) => ({ kind: 'multipart:wrong-boundary', contentType: `multipart/form-data; boundary=${a}`, payload: part(b, props[0] ?? 'file', v, true) + `--${b}--\r\n` })),
    fc.constant({ kind: 'multipart:no-boundary', contentType: 'multipart/form-data', payload: '--x\r\n\r\n' }),
  );
};

export interface CaseContext {
  /** Headers of a caller allowed to run the route's action (or none for public routes). */
  credentialsFor(route: WriteRoute): Record<string, string>;
  isValid: (route: WriteRoute, body: unknown) => boolean;
  /** The largest body the API accepts; one more byte must be a 413. */
  bodyLimit: number;
}

/** One refused request against one route. */
export function caseFor(route: WriteRoute, ctx: CaseContext): fc.Arbitrary<FuzzCase> {
  const url = fc.tuple(junkId, junkQuery(route)).map(([id, q]) => route.path.replace(/\{[^}]+\}/g, id.startsWith('RAW:') ? id.slice(4) : encodeURIComponent(id)) + q);
  // a route with neither a body nor a path id can only be refused for its credentials
  const onlyAuth = !route.jsonSchema && !route.multipartSchema && !route.path.includes('{');
  const good = fc.constant(ctx.credentialsFor(route)).map((h) => ({ junk: false, h }));
  const junk = junkAuth.map((h) => ({ junk: true, h }));
  const creds = onlyAuth ? junk : fc.oneof({ arbitrary: good, weight: 4 }, { arbitrary: junk, weight: 1 });
  const extra = fc.record({ idem: fc.option(junkIdempotencyKey, { freq: 2 }), accept: fc.option(fc.constantFrom('application/xml', '*/*', 'text/html', 'application/json'), { freq: 3 }) });
  const headersOf = (h: Record<string, string>, x: { idem: string | null; accept: string | null }): Record<string, string> => ({
    ...h,
    ...(x.idem !== null ? { 'idempotency-key': x.idem } : {}),
    ...(x.accept !== null ? { accept: x.accept } : {}),
  });
  const bodies: fc.Arbitrary<{ kind: string; contentType?: string; payload?: string | Buffer }>[] = [];
  if (route.jsonSchema || !route.multipartSchema) {
    bodies.push(
      fc.tuple(invalidJsonBody(route, ctx.isValid), jsonContentType).map(([b, ct]) => ({ kind: b.kind, contentType: ct, payload: JSON.stringify(b.body) })),
      fc.tuple(malformedJsonText, jsonContentType).map(([p, ct]) => ({ kind: 'json:malformed', contentType: ct, payload: p })),
    );
  }
  if (route.multipartSchema) bodies.push(badMultipart(route));
  bodies.push(
    fc.tuple(junkContentType, fc.string({ maxLength: 200 })).map(([ct, p]) => ({ kind: 'content-type:junk', contentType: ct, payload: p })),
    fc.constant({ kind: 'body:empty-json', contentType: 'application/json', payload: '' }),
  );
  const oversize = fc.constant({ kind: 'body:over-limit', contentType: 'application/json', payload: `{"x":"${'a'.repeat(ctx.bodyLimit)}"}` });
  const body = fc.oneof({ arbitrary: fc.oneof(...bodies), weight: 60 }, { arbitrary: oversize, weight: 1 });
  // with a path id, any body is refused (the id names nothing); only body-carrying routes need a refused body
  return fc.tuple(url, creds, extra, body).map(([u, c, x, b]) => {
    const headers = headersOf(c.h, x);
    if (b.contentType !== undefined) headers['content-type'] = b.contentType;
    return { route, kind: b.kind + (c.junk ? '+junk-auth' : ''), request: { method: route.method, url: u, headers, payload: b.payload } };
  });
}

/** Routes that can be sent refused input at all (a public route with no body and no id cannot). */
export function fuzzable(routes: WriteRoute[]): WriteRoute[] {
  return routes.filter((r) => r.jsonSchema || r.multipartSchema || r.path.includes('{') || !r.isPublic);
}

/** Cases spread evenly over the routes, so a route added tomorrow gets its share. */
export function allCases(routes: WriteRoute[], ctx: CaseContext): fc.Arbitrary<FuzzCase> {
  return fc.constantFrom(...fuzzable(routes)).chain((r) => caseFor(r, ctx));
}

// ── checks ──────────────────────────────────────────────────────────────────────────────────

/** What is wrong with the answer to a refused request; empty when it is a proper 4xx problem. */
export function violations(res: FuzzResponse): string[] {
  const out: string[] = [];
  if (res.status >= 500) out.push(`answered ${res.status}`);
  else if (res.status < 400) out.push(`accepted refused input with ${res.status}`);
  const ct = String(res.headers['content-type'] ?? '');
  if (!/^application\/problem\+json/i.test(ct)) out.push(`content-type "${ct}" is not application/problem+json`);
  else {
    try {
      const p = JSON.parse(res.body) as { status?: unknown; title?: unknown };
      if (p.status !== res.status) out.push(`problem.status ${String(p.status)} differs from HTTP ${res.status}`);
      if (typeof p.title !== 'string') out.push('problem has no title');
    } catch {
      out.push('problem body is not JSON');
    }
  }
  return out;
}

export interface FuzzSummary {
  cases: number;
  routes: number;
  byStatus: Record<string, number>;
  byKind: Record<string, number>;
  failures: { signature: string; example: { method: string; url: string; headers: Record<string, string>; payload: string; status: number; body: string } }[];
  seed: number;
  seconds: number;
}

/** Sends `numRuns` generated cases (a few at a time) and gathers every distinct kind of violation. */
export async function runFuzz(opts: { routes: WriteRoute[]; ctx: CaseContext; numRuns: number; seed: number; concurrency?: number; send: (r: FuzzRequest) => Promise<FuzzResponse> }): Promise<FuzzSummary> {
  const t0 = Date.now();
  const cases = fc.sample(allCases(opts.routes, opts.ctx), { numRuns: opts.numRuns, seed: opts.seed });
  const summary: FuzzSummary = { cases: 0, routes: new Set(cases.map((c) => `${c.route.method} ${c.route.path}`)).size, byStatus: {}, byKind: {}, failures: [], seed: opts.seed, seconds: 0 };
  const seen = new Set<string>();
  let next = 0;
  const worker = async () => {
    while (next < cases.length) {
      const c = cases[next++]!;
      let res: FuzzResponse;
      try {
        res = await opts.send(c.request);
      } catch (e) {
        const message = (e as Error).message;
        // over loopback HTTP, a server that refuses an over-limit body may answer 413 and close the
        // connection before the client has written it all (RFC 9110 §15.5.14 allows closing): the
        // client then sees EPIPE or ECONNRESET instead of the answer. That is a refusal, not a fault;
        // the in-process suite (inject) checks the 413 problem itself.
        if (c.kind.startsWith('body:over-limit') && /\b(EPIPE|ECONNRESET)\b/.test(message)) {
          summary.cases++;
          summary.byStatus[413] = (summary.byStatus[413] ?? 0) + 1;
          summary.byKind['body:over-limit'] = (summary.byKind['body:over-limit'] ?? 0) + 1;
          continue;
        }
        res = { status: 599, headers: {}, body: `transport error: ${message}` };
      }
      summary.cases++;
      summary.byStatus[res.status] = (summary.byStatus[res.status] ?? 0) + 1;
      const kind = c.kind.replace(/\+.*/, '');
      summary.byKind[kind] = (summary.byKind[kind] ?? 0) + 1;
      for (const v of violations(res)) {
        const signature = `${c.route.method} ${c.route.path} [${c.kind}]: ${v}`;
        if (seen.has(signature)) continue;
        seen.add(signature);
        const payload = typeof c.request.payload === 'string' ? c.request.payload : String(c.request.payload ?? '');
        summary.failures.push({ signature, example: { ...c.request, url: c.request.url.length > 200 ? `${c.request.url.slice(0, 200)}…` : c.request.url, payload: payload.length > 400 ? `${payload.slice(0, 400)}… (${payload.length} chars)` : payload, status: res.status, body: res.body.slice(0, 400) } });
      }
    }
  };
  await Promise.all(Array.from({ length: opts.concurrency ?? 4 }, worker));
  summary.seconds = (Date.now() - t0) / 1000;
  return summary;
}

// ── rows ────────────────────────────────────────────────────────────────────────────────────

const NOT_COUNTED = new Set(['knex_migrations', 'knex_migrations_lock']);

/**
 * Row counts of every table. With `scope`, only rows of that organization (and of its people), so a
 * suite sharing the database with others that write meanwhile still sees only its own writes.
 */
export async function rowCounts(db: Knex, scope?: { organizationId: string; ids: string[] }): Promise<Record<string, number>> {
  const cols = await db('information_schema.columns').where({ table_schema: 'public' }).select('table_name', 'column_name');
  const tables = new Map<string, Set<string>>();
  for (const c of cols as { table_name: string; column_name: string }[]) {
    if (NOT_COUNTED.has(c.table_name)) continue;
    if (!tables.has(c.table_name)) tables.set(c.table_name, new Set());
    tables.get(c.table_name)!.add(c.column_name);
  }
  const out: Record<string, number> = {};
  for (const [table, columns] of [...tables].sort()) {
    let q = db(table).count({ n: '*' });
    if (scope) {
      if (columns.has('organization_id')) q = q.where('organization_id', scope.organizationId);
      else if (columns.has('user_id')) q = q.whereIn('user_id', db('users').where('organization_id', scope.organizationId).select('id'));
      else if (columns.has('delivery_id')) q = q.whereIn('delivery_id', db('webhook_deliveries').where('organization_id', scope.organizationId).select('id'));
      else if (columns.has('scope')) q = q.where((w) => { for (const id of [scope.organizationId, ...scope.ids]) w.orWhere('scope', 'like', `%${id}%`); });
      else if (table === 'organizations') q = q.where('id', scope.organizationId);
      else continue;
    }
    out[table] = Number((await q)[0]!.n);
  }
  return out;
}

export function rowDiff(before: Record<string, number>, after: Record<string, number>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const t of new Set([...Object.keys(before), ...Object.keys(after)])) if (before[t] !== after[t]) out[t] = `${before[t] ?? 0} -> ${after[t] ?? 0}`;
  return out;
}

// ── list queries ────────────────────────────────────────────────────────────────────────────

export interface ListRoute {
  path: string;
  action?: string;
  /** The filters the route declares (from its `filter` parameter's description). */
  filters: string[];
  sortable: string[];
}

/** Every list operation of the document: a GET whose parameters are the simple-rest trio. */
export function listRoutes(doc: OpenApiDoc): ListRoute[] {
  const out: ListRoute[] = [];
  for (const [path, item] of Object.entries(doc.paths)) {
    const op = item.get as { parameters?: { name: string; in: string; description?: string }[]; 'x-pourgate-action'?: string } | undefined;
    const filter = op?.parameters?.find((p) => p.in === 'query' && p.name === 'filter');
    if (!op || !filter || path.includes('{')) continue;
    const filters = /filters: (.*)$/.exec(filter.description ?? '')?.[1];
    const sort = op.parameters?.find((p) => p.name === 'sort')?.description ?? '';
    out.push({
      path,
      action: op['x-pourgate-action'],
      filters: filters && filters !== 'none' ? filters.split(', ') : [],
      sortable: /fields: (.*)$/.exec(sort)?.[1]?.split(', ') ?? [],
    });
  }
  return out;
}

/** Values a filter of any type may be sent: well-typed, wrong-typed, absurd, NUL-laden, nested. */
const filterValue: fc.Arbitrary<Json> = fc.oneof(
  fc.uuid(),
  fc.constantFrom('x', '', 'yesterday', '0000-01-01', '2016-12-31T23:59:60Z', '2026-12-02', '2026-12-02T10:00:00Z', 'a\u0000b', "'; drop table readings; --", '%', '_', '\\', 'true', '1e308'),
  fc.string({ maxLength: 40 }),
  fc.string({ maxLength: 300 }),
  fc.constantFrom(1e20, -1, 0, 1.5, Number.MAX_SAFE_INTEGER, -0, 1e308),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.oneof(fc.uuid(), fc.string({ maxLength: 20 }), fc.integer()), { maxLength: 5 }),
  fc.array(fc.uuid(), { minLength: 501, maxLength: 520 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.string({ maxLength: 5 }), { maxKeys: 2 }),
);

/** One list request with a generated sort, range and filter (declared names mostly, some junk). */
export function listCaseFor(route: ListRoute): fc.Arbitrary<{ route: ListRoute; url: string }> {
  const name = route.filters.length ? fc.oneof({ arbitrary: fc.constantFrom(...route.filters), weight: 5 }, { arbitrary: fc.constantFrom('__proto__', 'constructor', 'toString', 'a/b', 'x\u0000'), weight: 1 }) : fc.constantFrom('__proto__', 'nope');
  const filter = fc.oneof(
    fc.dictionary(name, filterValue, { maxKeys: 3 }).map((f) => JSON.stringify(f)),
    fc.constantFrom('[]', 'null', '"x"', '{', '{"a":', '1e999'),
  );
  const field = route.sortable.length ? fc.oneof(fc.constantFrom(...route.sortable), fc.string({ maxLength: 10 })) : fc.string({ maxLength: 10 });
  const sort = fc.oneof(fc.tuple(field, fc.constantFrom('ASC', 'DESC', 'asc', 'sideways', '')).map((s) => JSON.stringify(s)), fc.constantFrom('[]', '["id"]', 'x', '[1,2]'));
  const n = fc.oneof(fc.nat(50), fc.constantFrom(1e20, -1, 1.5, 999_999, 1_000_000, 1_000_001, 2 ** 31, Number.MAX_SAFE_INTEGER));
  const range = fc.oneof(fc.tuple(n, n).map((r) => JSON.stringify(r)), fc.constantFrom('[0]', '[]', '[1e20,1e20]', '"0-9"', '[0,"9"]'));
  return fc
    .record({ filter: fc.option(filter, { freq: 4 }), sort: fc.option(sort, { freq: 2 }), range: fc.option(range, { freq: 2 }) })
    .map((q) => {
      const params = new URLSearchParams();
      for (const [k, v] of Object.entries(q)) if (v !== null) params.set(k, v);
      return { route, url: `${route.path}?${params.toString()}` };
    });
}

/** What is wrong with a list answer: a 5xx, or an error that is not a problem. A 200 is fine. */
export function listViolations(res: FuzzResponse): string[] {
  if (res.status === 200) return [];
  return violations(res);
}
