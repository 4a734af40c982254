import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ErrorObject, ValidateFunction } from 'ajv';
import addFormatsPkg from 'ajv-formats';
import fs from 'node:fs';
import path from 'node:path';
import { SCHEMAS_DIR } from '../../config/paths.js';
import type { FieldError } from '../problems.js';
import { DATE, isStorableDate, isStorableDateTime } from '../storable-dates.js';

const addFormats = addFormatsPkg as unknown as (ajv: Ajv2020) => Ajv2020;
const ID_PREFIX = 'urn:pourgate:schema:';

/** OpenAPI extension keywords we allow in schemas (documentation only, no validation effect). */
const ANNOTATIONS = ['x-unit', 'x-enum-descriptions'];

export type Schema = Record<string, unknown>;

/** Schemas of answers and events (`*.view`, `*.view.*`, `event.*`): the API writes them, no request carries them. */
const ANSWER_ONLY = /(^|\.)view($|\.)|^event\./;

/**
 * The JSON Schemas in `schemas/` (one file per shape, `<name>.schema.json`, `$id` =
 * `urn:pourgate:schema:<name>`). The validation pipe compiles them with ajv, and the OpenAPI
 * document embeds the very same objects as components, so each shape is defined once.
 */
export class SchemaRegistry {
  private readonly schemas = new Map<string, Schema>();
  private readonly bodyAjv: Ajv2020;
  private readonly queryAjv: Ajv2020;
  private readonly compiled = new Map<string, ValidateFunction>();

  constructor(dir = SCHEMAS_DIR) {
    // strict, except that `required` inside if/then may name properties declared by the parent
    const opts = { allErrors: true, useDefaults: true, strict: true, strictRequired: false, keywords: ANNOTATIONS };
    this.bodyAjv = storableDates(addFormats(new Ajv2020({ ...opts, coerceTypes: false })));
    this.queryAjv = storableDates(addFormats(new Ajv2020({ ...opts, coerceTypes: 'array' })));
    for (const file of fs.readdirSync(dir).filter((f) => f.endsWith('.schema.json')).sort()) {
      const schema = JSON.parse(fs.readFileSync(path.join(dir, file), 'utf8')) as Schema;
      const name = file.replace(/\.schema\.json$/, '');
      if (schema.$id !== ID_PREFIX + name) throw new Error(`${file}: $id must be "${ID_PREFIX}${name}"`);
      this.schemas.set(name, schema);
      this.bodyAjv.addSchema(schema);
      this.queryAjv.addSchema(schema);
    }
    // the shapes a request can carry are compiled now, so a broken one stops the boot, not a
    // request; the answers' and events' shapes (never validated at run time: the test suites check
    // them, and a test compiles every schema both ways) and the query-coercing variants are
    // compiled at first use. Compiling all of them twice at boot cost the process ~15 MiB.
    for (const name of this.schemas.keys()) if (!ANSWER_ONLY.test(name)) this.compiled.set(`body:${name}`, this.bodyAjv.getSchema(ID_PREFIX + name)!);
  }

  names(): string[] {
    return [...this.schemas.keys()];
  }

  get(name: string): Schema {
    const s = this.schemas.get(name);
    if (!s) throw new Error(`unknown schema "${name}" (no schemas/${name}.schema.json)`);
    return s;
  }

  /** Validates `value` in place (defaults applied; queries coerced from strings). */
  validate(name: string, value: unknown, kind: 'body' | 'query' = 'body'): FieldError[] {
    this.get(name);
    const key = `${kind}:${name}`;
    let fn = this.compiled.get(key);
    if (!fn) {
      const ajv = kind === 'query' ? this.queryAjv : this.bodyAjv;
      fn = ajv.getSchema(ID_PREFIX + name)!;
      this.compiled.set(key, fn);
    }
    if (!fn(value)) return toFieldErrors(fn.errors ?? []);
    // the pointers are worked out only for a body that holds a NUL at all (almost none do)
    return hasNul(value) ? nulCharacters(value) : [];
  }

  /** The schemas as OpenAPI 3.1 components: `$ref`s between files rewritten to component refs. */
  openApiComponents(): Record<string, Schema> {
    const out: Record<string, Schema> = {};
    for (const [name, schema] of this.schemas) {
      const { $id: _id, $schema: _s, $defs, ...rest } = schema;
      out[name] = rewriteRefs(rest, name) as Schema;
      // a schema's own definitions become components of their own (x.view's $defs/item: x.view.item)
      for (const [def, sub] of Object.entries(($defs ?? {}) as Record<string, unknown>)) out[`${name}.${def}`] = rewriteRefs(sub, name) as Schema;
    }
    return out;
  }
}

/**
 * `date` and `date-time` as PostgreSQL can store them: ajv-formats accepts year 0000 and leap
 * seconds, which the database refuses (a 500 before this). Years 0001–9999, seconds 00–59.
 */
function storableDates(ajv: Ajv2020): Ajv2020 {
  ajv.addFormat('date', {
    type: 'string',
    validate: (v: string) => {
      const m = DATE.exec(v);
      return !!m && isStorableDate(Number(m[1]), Number(m[2]), Number(m[3]));
    },
  });
  ajv.addFormat('date-time', { type: 'string', validate: isStorableDateTime });
  return ajv;
}

/** Whether any string or key in a value holds U+0000; no allocation on the way. */
export function hasNul(value: unknown): boolean {
  if (typeof value === 'string') return value.includes('\u0000');
  if (!value || typeof value !== 'object') return false;
  if (Array.isArray(value)) {
    for (const v of value) if (hasNul(v)) return true;
    return false;
  }
  for (const k in value as Record<string, unknown>) {
    if (k.includes('\u0000') || hasNul((value as Record<string, unknown>)[k])) return true;
  }
  return false;
}

/**
 * One rule for every schema: no string anywhere in a request may hold U+0000 (PostgreSQL's text
 * cannot store it). Keys count too. Returns a pointer to each offending value.
 */
export function nulCharacters(value: unknown, pointer = ''): FieldError[] {
  if (typeof value === 'string') return value.includes('\u0000') ? [{ pointer: pointer || '/', detail: 'must not contain a NUL character (U+0000)', code: 'nul' }] : [];
  if (!value || typeof value !== 'object') return [];
  const out: FieldError[] = [];
  for (const [k, v] of Object.entries(value)) {
    const at = `${pointer}/${k.replace(/~/g, '~0').replace(/\//g, '~1')}`;
    if (k.includes('\u0000')) out.push({ pointer: at, detail: 'a field name must not contain a NUL character (U+0000)', code: 'nul' });
    out.push(...nulCharacters(v, at));
  }
  return out;
}

/** `$ref`s as the document needs them: to another file's component, or to a definition (`#/$defs/…`) hoisted to one. */
function rewriteRefs(node: unknown, self: string): unknown {
  if (Array.isArray(node)) return node.map((n) => rewriteRefs(n, self));
  if (!node || typeof node !== 'object') return node;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(node)) {
    if (k === '$ref' && typeof v === 'string' && (v.startsWith(ID_PREFIX) || v.startsWith('#/'))) {
      const [name, frag] = v.startsWith('#') ? [self, v.slice(1)] : v.slice(ID_PREFIX.length).split('#');
      const def = /^\/\$defs\/([^/]+)(.*)$/.exec(frag ?? '');
      out[k] = def ? `#/components/schemas/${name}.${def[1]}${def[2]}` : `#/components/schemas/${name}${frag ?? ''}`;
    } else out[k] = rewriteRefs(v, self);
  }
  return out;
}

export function toFieldErrors(errors: ErrorObject[]): FieldError[] {
  const seen = new Set<string>();
  const out: FieldError[] = [];
  for (const e of errors) {
    let pointer = e.instancePath || '';
    let detail = e.message ?? 'is invalid';
    const p = e.params as Record<string, unknown>;
    if (e.keyword === 'required') {
      pointer += `/${String(p.missingProperty)}`;
      detail = 'is required';
    } else if (e.keyword === 'additionalProperties') {
      pointer += `/${String(p.additionalProperty)}`;
      detail = 'is not a known field';
    } else if (e.keyword === 'enum') {
      detail = `must be one of: ${(p.allowedValues as unknown[]).join(', ')}`;
    }
    // "if/then" and "anyOf" wrappers repeat what their branches said
    if (e.keyword === 'if' || e.keyword === 'anyOf' || e.keyword === 'oneOf') continue;
    const key = `${pointer}|${detail}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push({ pointer: pointer || '/', detail, code: e.keyword });
  }
  return out;
}

let shared: SchemaRegistry | undefined;
/** The process-wide registry (the schema files do not change while the process runs). */
export function schemaRegistry(): SchemaRegistry {
  shared ??= new SchemaRegistry();
  return shared;
}
