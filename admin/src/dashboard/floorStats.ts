/**
 * The overview's shop-floor figures, computed in the console from bounded API lists (the latest
 * readings and batches): the API has no aggregate endpoint for them yet. Pure functions, so the
 * charts show exactly what these return.
 */
import type { Batch } from '../batches/types';
import type { Reading } from '../review/types';
import { ratioError, weighedMasses } from '../batches/weighed';

/** Local calendar day of an instant, YYYY-MM-DD. */
export function localDay(t: string | number | Date): string {
  const d = new Date(t);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** The local days from `days − 1` days ago up to today, oldest first. */
export function lastDays(days: number, now: number): string[] {
  const out: string[] = [];
  const today = new Date(now);
  for (let i = days - 1; i >= 0; i--) out.push(localDay(new Date(today.getFullYear(), today.getMonth(), today.getDate() - i, 12)));
  return out;
}

/** Batches poured today: at least one settled mass reading of theirs arrived since local midnight. */
export function poursToday(readings: readonly Reading[], now: number): number {
  const today = localDay(now);
  const batches = new Set<string>();
  for (const r of readings) if (r.quantity === 'mass' && r.stable && localDay(r.receivedAt) === today) batches.add(r.batchId);
  return batches.size;
}

export interface DayRate {
  day: string;
  judged: number;
  rejected: number;
  /** Percent of judged readings rejected; null on a day with nothing judged. */
  rate: number | null;
}

/** Share of judged readings (accepted or rejected) rejected, per local day. */
export function rejectionByDay(readings: readonly Reading[], days: number, now: number): DayRate[] {
  const byDay = new Map(lastDays(days, now).map((d) => [d, { judged: 0, rejected: 0 }]));
  for (const r of readings) {
    if (r.status !== 'accepted' && r.status !== 'rejected') continue;
    const slot = byDay.get(localDay(r.receivedAt));
    if (!slot) continue;
    slot.judged += 1;
    if (r.status === 'rejected') slot.rejected += 1;
  }
  return [...byDay].map(([day, s]) => ({ day, ...s, rate: s.judged ? (s.rejected / s.judged) * 100 : null }));
}

export interface RatioPoint {
  batchId: string;
  at: string;
  /** Ratio error, percent. */
  errorPercent: number;
}

/**
 * The A:B ratio error of every batch with both parts weighed, per material system, oldest first.
 * The target ratio is the batch's own target masses (as stored, rounded to the scale), which is
 * within a scale division of the system's ratio.
 */
export function ratioErrorsBySystem(batches: readonly Batch[], readings: readonly Reading[]): Map<string, RatioPoint[]> {
  const byBatch = new Map<string, Reading[]>();
  for (const r of readings) {
    const list = byBatch.get(r.batchId);
    if (list) list.push(r);
    else byBatch.set(r.batchId, [r]);
  }
  const out = new Map<string, RatioPoint[]>();
  for (const b of batches) {
    const rs = byBatch.get(b.id);
    if (!rs) continue;
    const w = weighedMasses(rs);
    const e = ratioError(w.massKg.A, w.massKg.B, { a: b.summary.massAKg, b: b.summary.massBKg });
    if (e === null) continue;
    const at = [w.reading.A?.receivedAt, w.reading.B?.receivedAt].filter(Boolean).sort().pop()!;
    const list = out.get(b.materialSystemId) ?? [];
    list.push({ batchId: b.id, at, errorPercent: e * 100 });
    out.set(b.materialSystemId, list);
  }
  for (const list of out.values()) list.sort((a, b) => (a.at < b.at ? -1 : a.at > b.at ? 1 : 0));
  return out;
}

/** Points outside ± tolerance, for the chart's caption. */
export function outside(points: readonly RatioPoint[], tolerancePercent: number): number {
  return points.filter((p) => Math.abs(p.errorPercent) > tolerancePercent + 1e-9).length;
}
