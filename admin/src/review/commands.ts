import type { DataProvider } from 'react-admin';

/**
 * Commands that are not CRUD (review, release, preview) sent through the console's data provider,
 * so they share its token handling and problem+json mapping: ra-data-simple-rest's `create` is a
 * JSON POST to `/v1/<path>` that hands back the answer's body.
 */
export async function postCommand<T>(dataProvider: DataProvider, path: string, body: unknown = {}): Promise<T> {
  const { data } = await dataProvider.create(path, { data: body as Record<string, unknown> });
  return data as T;
}

export interface ReviewBody {
  decision: 'waive' | 'uphold';
  note?: string;
  scrap?: boolean;
}

export function reviewReading<T>(dataProvider: DataProvider, id: string, body: ReviewBody): Promise<T> {
  return postCommand<T>(dataProvider, `readings/${encodeURIComponent(id)}/review`, body);
}

export function releaseBatch<T>(dataProvider: DataProvider, id: string): Promise<T> {
  return postCommand<T>(dataProvider, `batches/${encodeURIComponent(id)}/release`, {});
}
