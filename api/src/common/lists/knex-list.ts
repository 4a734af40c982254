import type { Knex } from 'knex';
import type { FilterKind, ListQuery, ListSpec } from './list-query.js';

/**
 * Applies parsed list filters to a Knex query. `columns` maps API field names to SQL columns
 * (unmapped fields use their own name), so the API can rename without leaking schema details.
 */
export function applyFilters(qb: Knex.QueryBuilder, q: ListQuery, spec: ListSpec, columns: Record<string, string> = {}): Knex.QueryBuilder {
  for (const [field, value] of Object.entries(q.filter)) {
    const kind = (spec.filters as Record<string, FilterKind>)[field];
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

/** Runs a filtered list: one page (with a stable tie-break on id) and the total count. */
export async function listPage<T>(base: Knex.QueryBuilder, q: ListQuery, spec: ListSpec, columns: Record<string, string> = {}): Promise<{ rows: T[]; total: number }> {
  applyFilters(base, q, spec, columns);
  const countQ = base.clone().clearSelect().clearOrder().count<{ count: string }[]>({ count: '*' });
  const sortCol = columns[q.sort.field] ?? q.sort.field;
  const rowsQ = base.clone().orderBy(sortCol, q.sort.order).orderBy(columns.id ?? 'id', q.sort.order).offset(q.offset).limit(q.limit);
  const [rows, count] = await Promise.all([rowsQ, countQ]);
  return { rows: rows as T[], total: Number(count[0]?.count ?? 0) };
}
