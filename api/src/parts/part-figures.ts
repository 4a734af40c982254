import { isoDay } from '@pourgate/batching';
import type { BatchFacts, PartRow } from './parts.repository.js';

export type Decision = 'accepted' | 'rework' | 'scrap';
export interface PartCounts {
  accepted: number;
  rework: number;
  scrap: number;
  undecided: number;
}

export const noParts = (): PartCounts => ({ accepted: 0, rework: 0, scrap: 0, undecided: 0 });

/**
 * The parts of a batch by disposition: its recorded parts when it has any; else one per cavity,
 * all with the batch's decision (undecided until it has one).
 */
export function partCounts(b: BatchFacts, parts: PartRow[]): PartCounts {
  const out = noParts();
  if (parts.length) {
    for (const p of parts) out[p.disposition ?? 'undecided']++;
    return out;
  }
  const n = b.subject === 'mold' ? (b.cavities ?? b.targets.input?.mold?.cavities ?? 1) : 0;
  out[b.decision ?? 'undecided'] += n;
  return out;
}

export function addCounts(a: PartCounts, b: PartCounts): PartCounts {
  return { accepted: a.accepted + b.accepted, rework: a.rework + b.rework, scrap: a.scrap + b.scrap, undecided: a.undecided + b.undecided };
}

export function lotsOf(b: BatchFacts) {
  const out: { part: 'A' | 'B' | 'pigment'; id: string; lotNumber: string }[] = [];
  if (b.lot_a_id) out.push({ part: 'A', id: b.lot_a_id, lotNumber: b.lot_a_number ?? '' });
  if (b.lot_b_id) out.push({ part: 'B', id: b.lot_b_id, lotNumber: b.lot_b_number ?? '' });
  if (b.lot_pigment_id) out.push({ part: 'pigment', id: b.lot_pigment_id, lotNumber: b.lot_pigment_number ?? '' });
  return out;
}

export const plannedFor = (b: BatchFacts) => isoDay(b.planned_for)!;

/** RFC 4180 CSV: a header row and one row per record; fields quoted when they need it. */
export function toCsv(header: string[], rows: (string | number | null | undefined)[][]): string {
  const cell = (v: string | number | null | undefined) => {
    if (v === null || v === undefined) return '';
    const s = String(v);
    // a leading =, +, - or @ would be read as a formula by a spreadsheet
    const safe = /^[=+\-@]/.test(s) && typeof v === 'string' ? `'${s}` : s;
    return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
  };
  return [header, ...rows].map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
