import type { ActorType } from '../api/views';

export const ACTOR_LABEL: Readonly<Record<ActorType, string>> = {
  user: 'Person',
  api_key: 'API key',
  system: 'Pourgate',
  anonymous: 'Not signed in',
};

export type DetailRow = { key: string; value: string };

/**
 * Flattens an event's details for the expanded row: nested objects become dotted keys, arrays
 * are listed inline, and values print as JSON would so that strings and numbers stay distinct.
 */
export function detailRows(details: unknown, prefix = '', depth = 0): DetailRow[] {
  if (details === null || details === undefined) return [];
  if (typeof details !== 'object' || Array.isArray(details)) return prefix ? [{ key: prefix, value: render(details) }] : [];
  const rows: DetailRow[] = [];
  for (const [k, v] of Object.entries(details as Record<string, unknown>)) {
    const key = prefix ? `${prefix}.${k}` : k;
    if (v && typeof v === 'object' && !Array.isArray(v) && depth < 3) rows.push(...detailRows(v, key, depth + 1));
    else rows.push({ key, value: render(v) });
  }
  return rows;
}

function render(v: unknown): string {
  if (typeof v === 'string') return v;
  if (v === undefined) return '—';
  return JSON.stringify(v);
}
