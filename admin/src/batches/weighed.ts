/**
 * What was weighed for a batch, from its readings: the latest settled, judged mass of each part,
 * and the A:B ratio error those masses make against the target (e = (m_A/m_B) ÷ (t_A/t_B) − 1,
 * the same definition the API judges by).
 */
import type { Reading } from '../review/labels';

export type WeighedPart = 'A' | 'B' | 'pigment' | 'mixed';

const SUBJECT_PART: Record<string, WeighedPart> = { part_a: 'A', part_b: 'B', pigment: 'pigment', mixed: 'mixed' };

export interface Weighed {
  /** kg, the latest settled reading of each part that was judged (not `unused`). */
  massKg: Partial<Record<WeighedPart, number>>;
  reading: Partial<Record<WeighedPart, Reading>>;
}

export function weighedMasses(readings: readonly Reading[]): Weighed {
  const out: Weighed = { massKg: {}, reading: {} };
  const sorted = [...readings].sort((a, b) => (a.receivedAt < b.receivedAt ? -1 : a.receivedAt > b.receivedAt ? 1 : a.id < b.id ? -1 : 1));
  for (const r of sorted) {
    const part = SUBJECT_PART[r.subject];
    if (r.quantity !== 'mass' || !part || !r.stable || r.status === 'unused') continue;
    out.massKg[part] = r.valueSi;
    out.reading[part] = r;
  }
  return out;
}

/** Relative ratio error e of weighed masses against a target ratio; null when it cannot be formed. */
export function ratioError(massA: number | undefined, massB: number | undefined, target: { a: number; b: number }): number | null {
  if (massA === undefined || massB === undefined || !(massB > 0) || !(target.a > 0) || !(target.b > 0)) return null;
  return massA / massB / (target.a / target.b) - 1;
}

/** Where a value sits on a bar from `min` to `max`, as a fraction 0…1 (clamped). */
export function positionOn(value: number, min: number, max: number): number {
  if (!(max > min)) return 0.5;
  return Math.min(1, Math.max(0, (value - min) / (max - min)));
}

/** The span a tolerance bar shows: the band and the measured value, with some room either side. */
export function barDomain(low: number, high: number, target: number, measured?: number): { min: number; max: number } {
  const values = [low, high, target, ...(measured === undefined ? [] : [measured])];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = Math.max((high - low) * 0.6, Math.abs(target) * 0.02, 1e-9);
  return { min: lo - pad, max: hi + pad };
}
