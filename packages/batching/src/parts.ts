/**
 * The finished part: molded density from its mass and the cavity volume, test specimens (core
 * density, indentation force deflection, durometer) judged against the system's spec, and the
 * figures of a work order (batches proposed, yield, a Pareto of defect causes). Pure functions.
 */
import { FOAM_DENSITY_BOUNDS } from './bounds.js';

/** NIST SP 811 Appendix B.8: 1 lbf = 4.448 222 N. */
export const NEWTONS_PER_POUND_FORCE = 4.448222;

/** A part heavier than this is not a foam part of one cavity (the cavities themselves stop at 5 m³). */
export const MAX_PART_MASS_KG = 500;
/** Durometer readings run from 0 to 100 on every scale (ASTM D2240). */
export const DUROMETER_BOUNDS = { min: 0, max: 100 } as const;
/** An indentation force above this is not a foam (from memory: firm seating foams stay below ~2 kN at 25 %). */
export const MAX_INDENTATION_FORCE_N = 10_000;
/** ± band on the molded density when the system states none, percent (common practice: ±10 %). */
export const DEFAULT_PART_DENSITY_TOLERANCE_PERCENT = 10;

export type BandVerdict = 'within' | 'below' | 'above';

/** Density = mass ÷ volume (definition; the procedure of ASTM D3574 Test A and ISO 845). */
export function densityOf(massKg: number, volumeM3: number): number {
  if (!(massKg > 0) || !Number.isFinite(massKg)) throw new RangeError('mass must be a positive number');
  if (!(volumeM3 > 0) || !Number.isFinite(volumeM3)) throw new RangeError('volume must be a positive number');
  return massKg / volumeM3;
}

/** The volume of a rectangular specimen from its three dimensions (m). */
export function specimenVolume(lengthM: number, widthM: number, thicknessM: number): number {
  for (const d of [lengthM, widthM, thicknessM]) if (!(d > 0) || !Number.isFinite(d)) throw new RangeError('each dimension must be a positive number');
  return lengthM * widthM * thicknessM;
}

/** Whether a density is one a polyurethane foam (flexible to integral skin) can have. */
export function isFoamDensity(kgM3: number): boolean {
  return kgM3 >= FOAM_DENSITY_BOUNDS.min && kgM3 <= FOAM_DENSITY_BOUNDS.max;
}

/** A value against a ± percent band around a target: the verdict and the deviation in percent. */
export function judgeAgainstTarget(value: number, target: number, tolerancePercent: number): { verdict: BandVerdict; deviationPercent: number; min: number; max: number } {
  const deviationPercent = ((value - target) / target) * 100;
  const min = target * (1 - tolerancePercent / 100);
  const max = target * (1 + tolerancePercent / 100);
  const eps = 1e-9 * Math.abs(target);
  const verdict: BandVerdict = value < min - eps ? 'below' : value > max + eps ? 'above' : 'within';
  return { verdict, deviationPercent, min, max };
}

/** A value against a min–max band (either edge may be absent); null when there is no band at all. */
export function judgeBand(value: number, band: { min: number | null; max: number | null } | null | undefined): BandVerdict | null {
  if (!band || (band.min === null && band.max === null)) return null;
  if (band.min !== null && value < band.min) return 'below';
  if (band.max !== null && value > band.max) return 'above';
  return 'within';
}

/** Force in newtons from a value in N or lbf (NIST SP 811: 1 lbf = 4.448 222 N). */
export function forceToNewtons(value: number, unit: 'N' | 'lbf'): number {
  return unit === 'N' ? value : value * NEWTONS_PER_POUND_FORCE;
}

/** Batches a work order needs: ceil(parts ÷ cavities), one part per cavity per pour. */
export function proposedBatchCount(partsRemaining: number, cavities: number): number {
  if (!Number.isInteger(cavities) || cavities < 1) throw new RangeError('cavities must be a whole number ≥ 1');
  if (!(partsRemaining > 0)) return 0;
  return Math.ceil(partsRemaining / cavities);
}

/** Good parts ÷ all parts decided (null when none is decided yet). */
export function yieldOf(counts: { accepted: number; rework: number; scrap: number }): number | null {
  const total = counts.accepted + counts.rework + counts.scrap;
  return total === 0 ? null : counts.accepted / total;
}

export interface ParetoBar {
  readonly code: string;
  readonly count: number;
  readonly percent: number;
  readonly cumulativePercent: number;
}

/** A Pareto chart: causes by count, largest first (ties by code), with their share and the running share. */
export function pareto(counts: readonly { code: string; count: number }[]): ParetoBar[] {
  const rows = counts.filter((c) => c.count > 0).sort((a, b) => b.count - a.count || a.code.localeCompare(b.code));
  const total = rows.reduce((s, r) => s + r.count, 0);
  let running = 0;
  return rows.map((r) => {
    running += r.count;
    return { code: r.code, count: r.count, percent: (r.count / total) * 100, cumulativePercent: (running / total) * 100 };
  });
}

/** The last day a lot may be used: its expiry, or its opening day plus the shelf life after opening if earlier. */
export function usableUntil(expiresOn: string, openedOn: string | null, shelfLifeDaysAfterOpening: number | null): string {
  if (!openedOn || shelfLifeDaysAfterOpening === null || shelfLifeDaysAfterOpening === undefined) return expiresOn;
  const d = new Date(`${openedOn}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + shelfLifeDaysAfterOpening);
  const opened = d.toISOString().slice(0, 10);
  return opened < expiresOn ? opened : expiresOn;
}
