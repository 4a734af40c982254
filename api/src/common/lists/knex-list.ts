import type { Knex } from 'knex';
import { filterKind, type FilterKind, type FilterSpec, type ListQuery, type ListSpec } from './list-query.js';

/**
 * Applies parsed list filters to a Knex query. `columns` maps API field names to SQL columns
 * (unmapped fields use their own name), so the API can rename without leaking schema details.
 */
export function applyFilters(qb: Knex.QueryBuilder, q: ListQuery, spec: ListSpec, columns: Record<string, string> = {}): Knex.QueryBuilder {
  for (const [field, value] of Object.entries(q.filter)) {
    const kind = filterKind((spec.filters as Record<string, FilterKind | FilterSpec>)[field]!);
    const col = columns[field] ?? field;
    switch (kind) {
      case 'eq':
        if (Array.isArray(value)) qb.whereIn(col, value as string[]);
        else qb.where(col, value as string);
        break;
      case 'in':
        qb.whereIn(col, value as string[]);
        break;
      case 'text':
        qb.whereILike(col, `%${String(value).replace(/[\\%_]/g, (c) => '\\' + c)}%`);
        break;
      case 'gte':
        qb.where(col, '>=', value as string);
        break;
      case 'lte':
        qb.where(col, '<=', value as string);
        break;
      case 'bool':
        qb.where(col, value as boolean);
        break;
    }
  }
  return qb;
}

/**
 * Beyond this many matching rows a list's total is reported as unknown (`Content-Range: …/*`, as
 * RFC 9110 allows): an exact count would read every matching row, which grows with the table while
 * the page itself does not.
 */
export const COUNT_CAP = 10_000;

/**
 * Runs a filtered list: one page (with a stable tie-break on id) and the total count, or null when
 * more than COUNT_CAP rows match. `total`, when given, is the exact count kept elsewhere (a
 * maintained counter), used instead of counting the rows.
 */
export async function listPage<T>(base: Knex.QueryBuilder, q: ListQuery, spec: ListSpec, columns: Record<string, string> = {}, cap = COUNT_CAP, total?: () => Promise<number>): Promise<{ rows: T[]; total: number | null }> {
  applyFilters(base, q, spec, columns);
  const sortCol = columns[q.sort.field] ?? q.sort.field;
  const rowsQ = base.clone().orderBy(sortCol, q.sort.order).orderBy(columns.id ?? 'id', q.sort.order).offset(q.offset).limit(q.limit);
  if (total) {
    const [rows, n] = await Promise.all([rowsQ, total()]);
    return { rows: rows as T[], total: n };
  }
  const capped = base.clone().clearSelect().clearOrder().select(base.client.raw('1')).limit(cap + 1).as('capped');
  const countQ = base.client.queryBuilder().count<{ count: string }[]>({ count: '*' }).from(capped);
  const [rows, count] = await Promise.all([rowsQ, countQ]);
  const n = Number(count[0]?.count ?? 0);
  return { rows: rows as T[], total: n > cap ? null : n };
}
