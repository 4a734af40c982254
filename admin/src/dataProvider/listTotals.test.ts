import { describe, expect, it } from 'vitest';
import { createDataProvider } from './index';
import type { HttpClient } from './httpClient';

/** A client that answers every list with the given Content-Range. */
function clientWith(contentRange: string, rows: unknown[]): HttpClient {
  return {
    fetchJson: async () => ({ status: 200, headers: new Headers({ 'Content-Range': contentRange }), body: JSON.stringify(rows), json: rows }),
  } as unknown as HttpClient;
}

describe('list totals', () => {
  const rows = Array.from({ length: 25 }, (_, i) => ({ id: String(i) }));
  const params = { pagination: { page: 2, perPage: 25 }, sort: { field: 'id', order: 'ASC' as const }, filter: {} };
  it('passes an exact total through', async () => {
    const page = await createDataProvider(clientWith('readings 25-49/120', rows)).getList('readings', params);
    expect(page.total).toBe(120);
  });
  it('pages without a total when the API answers * (more rows than it counts)', async () => {
    const page = await createDataProvider(clientWith('readings 25-49/*', rows)).getList('readings', params);
    expect(page.total).toBeUndefined();
    expect(page.pageInfo).toEqual({ hasPreviousPage: true, hasNextPage: true });
    const last = await createDataProvider(clientWith('readings 50-59/*', rows.slice(0, 10))).getList('readings', { ...params, pagination: { page: 3, perPage: 25 } });
    expect(last.pageInfo).toEqual({ hasPreviousPage: true, hasNextPage: false });
  });
});
