import { applyDecorators } from '@nestjs/common';
import { ApiHeader, ApiQuery, ApiResponse } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import type { FieldError } from '../problems.js';
import { malformed } from '../problems.js';
import { DATE, isStorableDate, isStorableDateTime } from '../storable-dates.js';

/**
 * What a list route allows: the fields one may sort on, the filters it understands (each mapped to
 * how it compares), and the default order. Lists speak the ra-data-simple-rest protocol:
 * `sort=["field","ASC"]`, `range=[start,end]` (inclusive), `filter={"field":value}`.
 */
export interface ListSpec<F extends string = string> {
  resource: string;
  sortable: readonly string[];
  filters: Readonly<Record<F, FilterKind | FilterSpec>>;
  defaultSort: [string, 'ASC' | 'DESC'];
  maxPageSize?: number;
}

export type FilterKind = 'eq' | 'in' | 'text' | 'gte' | 'lte' | 'bool';

/** What a filter's values are, so a value the column cannot hold is a 400, never a database error. */
export type FilterValueType = 'uuid' | 'date-time' | 'date' | 'date-or-time' | 'number' | 'integer' | 'boolean' | 'string';

/** A filter with its value type spelled out (or an allowed set of values), where the name does not tell. */
export interface FilterSpec {
  kind: FilterKind;
  type?: FilterValueType;
  values?: readonly string[];
}

/**
 * The value type of a filter: as declared, else from its name and kind (`id`, `…Id`: uuid; `bool`:
 * boolean; `gte`/`lte`: a date or a date-time; `text` and the rest: a bounded string).
 */
export function filterValueType(name: string, f: FilterKind | FilterSpec): FilterValueType {
  const spec = typeof f === 'string' ? { kind: f } : f;
  if (spec.type) return spec.type;
  if (name === 'id' || /Id$/.test(name)) return 'uuid';
  if (spec.kind === 'bool') return 'boolean';
  if (spec.kind === 'gte' || spec.kind === 'lte') return 'date-or-time';
  return 'string';
}

export const filterKind = (f: FilterKind | FilterSpec): FilterKind => (typeof f === 'string' ? f : f.kind);

export interface ListQuery {
  sort: { field: string; order: 'asc' | 'desc' };
  offset: number;
  limit: number;
  filter: Record<string, unknown>;
}

export const DEFAULT_PAGE_SIZE = 25;
export const MAX_PAGE_SIZE = 500;
/** The furthest a page may start: beyond it a list is a search, not a page (and OFFSET stays an int). */
export const MAX_OFFSET = 1_000_000;
/** At most this many values in one `in` (or array `eq`) filter. */
export const MAX_FILTER_VALUES = 500;

function parseJson(name: string, raw: string): unknown {
  try {
    return JSON.parse(raw);
  } catch {
    throw malformed(`The "${name}" query parameter is not valid JSON.`, [{ pointer: `/${name}`, detail: 'is not valid JSON', code: 'json' }]);
  }
}

/** Parses and bounds the simple-rest query params; a clear 400 for anything unparseable. */
export function parseListQuery(query: Record<string, unknown>, spec: ListSpec): ListQuery {
  const errors: FieldError[] = [];
  const max = spec.maxPageSize ?? MAX_PAGE_SIZE;
  let [field, order] = spec.defaultSort;
  if (query.sort !== undefined) {
    const s = parseJson('sort', String(query.sort));
    if (!Array.isArray(s) || s.length !== 2 || typeof s[0] !== 'string' || !['ASC', 'DESC'].includes(String(s[1]).toUpperCase())) {
      errors.push({ pointer: '/sort', detail: 'must be ["field","ASC"|"DESC"]', code: 'format' });
    } else if (!spec.sortable.includes(s[0])) {
      errors.push({ pointer: '/sort/0', detail: `cannot sort by "${s[0]}"; sortable: ${spec.sortable.join(', ')}`, code: 'enum' });
    } else {
      field = s[0];
      order = String(s[1]).toUpperCase() as 'ASC' | 'DESC';
    }
  }
  let offset = 0;
  let limit = DEFAULT_PAGE_SIZE;
  if (query.range !== undefined) {
    const r = parseJson('range', String(query.range));
    if (!Array.isArray(r) || r.length !== 2 || !r.every((n) => Number.isInteger(n) && n >= 0) || r[1] < r[0]) {
      errors.push({ pointer: '/range', detail: 'must be [start,end] with 0 <= start <= end (inclusive)', code: 'format' });
    } else if (r[0] > MAX_OFFSET) {
      errors.push({ pointer: '/range/0', detail: `a page starts at row ${MAX_OFFSET} at the latest; narrow the filter instead`, code: 'maximum' });
    } else if (r[1] - r[0] + 1 > max) {
      errors.push({ pointer: '/range', detail: `a page holds at most ${max} rows`, code: 'maximum' });
    } else {
      offset = r[0];
      limit = r[1] - r[0] + 1;
    }
  }
  const filter: Record<string, unknown> = {};
  if (query.filter !== undefined) {
    const f = parseJson('filter', String(query.filter));
    if (!f || typeof f !== 'object' || Array.isArray(f)) {
      errors.push({ pointer: '/filter', detail: 'must be a JSON object', code: 'type' });
    } else {
      for (const [k, v] of Object.entries(f as Record<string, unknown>)) {
        const declared = Object.hasOwn(spec.filters, k) ? (spec.filters as Record<string, FilterKind | FilterSpec>)[k] : undefined;
        if (!declared) {
          errors.push({ pointer: `/filter/${escapePointer(k)}`, detail: `unknown filter; known: ${Object.keys(spec.filters).join(', ') || 'none'}`, code: 'additionalProperties' });
          continue;
        }
        const bad = checkFilterValue(filterKind(declared), v) ?? checkFilterValueType(filterValueType(k, declared), typeof declared === 'string' ? undefined : declared.values, v);
        if (bad) errors.push({ pointer: `/filter/${escapePointer(k)}`, detail: bad, code: 'type' });
        else filter[k] = v;
      }
    }
  }
  if (errors.length) throw malformed('The list query is not valid.', errors);
  return { sort: { field, order: order.toLowerCase() as 'asc' | 'desc' }, offset, limit, filter };
}

/** RFC 6901: "~" and "/" in a member name. */
function escapePointer(k: string): string {
  return k.replace(/~/g, '~0').replace(/\//g, '~1');
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
function checkOneValue(type: FilterValueType, values: readonly string[] | undefined, x: unknown): string | null {
  if (typeof x === 'string' && x.includes('\u0000')) return 'must not contain a NUL character (U+0000)';
  if (values && !(typeof x === 'string' && values.includes(x))) return `must be one of: ${values.join(', ')}`;
  switch (type) {
    case 'uuid':
      return typeof x === 'string' && UUID.test(x) ? null : 'must be a UUID';
    case 'date': {
      const m = typeof x === 'string' ? DATE.exec(x) : null;
      return m && isStorableDate(Number(m[1]), Number(m[2]), Number(m[3])) ? null : 'must be a date, YYYY-MM-DD (years 0001–9999)';
    }
    case 'date-time':
      return typeof x === 'string' && isStorableDateTime(x) ? null : 'must be an RFC 3339 date-time with a zone (years 0001–9999, no leap second)';
    case 'date-or-time': {
      if (typeof x !== 'string') return 'must be a date (YYYY-MM-DD) or an RFC 3339 date-time';
      const m = DATE.exec(x);
      if (m) return isStorableDate(Number(m[1]), Number(m[2]), Number(m[3])) ? null : 'must be a real date, years 0001–9999';
      return isStorableDateTime(x) ? null : 'must be a date (YYYY-MM-DD) or an RFC 3339 date-time with a zone (years 0001–9999, no leap second)';
    }
    case 'number':
      return typeof x === 'number' && Number.isFinite(x) ? null : 'must be a finite number';
    case 'integer':
      return Number.isSafeInteger(x) ? null : 'must be an integer';
    case 'boolean':
      return typeof x === 'boolean' ? null : 'must be true or false';
    case 'string':
      return typeof x === 'string' && x.length <= 200 ? null : 'must be a string of at most 200 characters';
  }
}

/** Each value of a filter (one, or each of an array) against the filter's value type. */
function checkFilterValueType(type: FilterValueType, values: readonly string[] | undefined, v: unknown): string | null {
  if (Array.isArray(v)) {
    if (v.length > MAX_FILTER_VALUES) return `at most ${MAX_FILTER_VALUES} values`;
    for (const x of v) {
      const bad = checkOneValue(type, values, x);
      if (bad) return `each value ${bad}`;
    }
    return null;
  }
  return checkOneValue(type, values, v);
}

function checkFilterValue(kind: FilterKind, v: unknown): string | null {
  const scalar = (x: unknown) => typeof x === 'string' || typeof x === 'number' || typeof x === 'boolean';
  switch (kind) {
    case 'eq':
      return scalar(v) || (Array.isArray(v) && v.every(scalar)) ? null : 'must be a value or an array of values';
    case 'in':
      return Array.isArray(v) && v.every(scalar) ? null : 'must be an array of values';
    case 'text':
      return typeof v === 'string' && v.length <= 200 ? null : 'must be a string of at most 200 characters';
    case 'gte':
    case 'lte':
      return typeof v === 'string' || typeof v === 'number' ? null : 'must be a number or an ISO date-time';
    case 'bool':
      return typeof v === 'boolean' ? null : 'must be true or false';
  }
}

/**
 * Sets `Content-Range: <resource> <start>-<end>/<total>` as ra-data-simple-rest expects; `*` for a
 * total too large to count (see COUNT_CAP).
 */
export function setContentRange(reply: FastifyReply, resource: string, q: ListQuery, count: number, total: number | null): void {
  const end = count === 0 ? q.offset : q.offset + count - 1;
  reply.header('content-range', `${resource} ${q.offset}-${end}/${total ?? '*'}`);
}

/**
 * Documents the three list parameters, the Content-Range header and the page's body on a list route:
 * a JSON array of `itemSchema` (a schema of `schemas/`, e.g. `reading.view`).
 */
export function ListRoute(spec: ListSpec, itemSchema?: string) {
  return applyDecorators(
    ApiQuery({ name: 'sort', required: false, description: `JSON ["field","ASC"|"DESC"]; fields: ${spec.sortable.join(', ')}`, schema: { type: 'string' } }),
    ApiQuery({ name: 'range', required: false, description: `JSON [start,end], inclusive, at most ${spec.maxPageSize ?? MAX_PAGE_SIZE} rows`, schema: { type: 'string' } }),
    ApiQuery({ name: 'filter', required: false, description: `JSON object; filters: ${Object.keys(spec.filters).join(', ') || 'none'}`, schema: { type: 'string' } }),
    ApiHeader({ name: 'Range', required: false, description: 'ignored; the range query parameter wins' }),
    ApiResponse({
      status: 200,
      description: 'One page',
      headers: { 'Content-Range': { description: `${spec.resource} <start>-<end>/<total>; the total is * beyond the count cap`, schema: { type: 'string' } } },
      ...(itemSchema ? { content: { 'application/json': { schema: { type: 'array', items: { $ref: `#/components/schemas/${itemSchema}` } } } } } : {}),
    } as Parameters<typeof ApiResponse>[0]),
  );
}
