/**
 * Judging one reading: pure, no I/O. The processor gathers the facts (the reading, its device, the
 * batch's stored targets and the other part's latest stable mass) and this decides.
 */
import { judgeRatio, type MixRatio, type Part, weightRatioFromVolumeRatio } from '../batching/ratio.js';

export type ReadingQuantity = 'mass' | 'temperature' | 'humidity';
export type ReadingSubject = 'part_a' | 'part_b' | 'pigment' | 'mixed' | 'mold' | 'ambient';
export type Verdict = 'accepted' | 'rejected' | 'unused';

export interface Reason {
  code: string;
  message: string;
  measured: number | null;
  limit: number | null;
  unit: string | null;
}

export interface SystemFacts {
  ratioBasis: 'weight' | 'volume';
  ratio: MixRatio;
  specificGravityA: number;
  specificGravityB: number;
  isocyanatePart: Part;
  ratioTolerancePercent?: number;
  componentTemperatureWindow?: { min: number; max: number };
}

export interface JudgeInput {
  quantity: ReadingQuantity;
  subject: ReadingSubject;
  /** kg, °C or % RH. */
  valueSi: number;
  stable: boolean;
  device: { capacityKg: number | null; calibrationDue: string | null };
  /** YYYY-MM-DD, the day the reading was received. */
  day: string;
  system: SystemFacts | null;
  /** The latest stable mass (kg) of the other part of A:B in the batch, if any. */
  otherPartMassKg: number | null;
}

export interface JudgeResult {
  status: Verdict;
  reasons: Reason[];
}

export const DEFAULT_TOLERANCE_PERCENT = 5;
const COMPONENT_SUBJECTS: readonly ReadingSubject[] = ['part_a', 'part_b', 'mixed'];

/** The system's ratio by weight, whatever basis it is stated on. */
export function targetWeightRatio(s: SystemFacts): MixRatio {
  return s.ratioBasis === 'volume' ? weightRatioFromVolumeRatio(s.ratio, s.specificGravityA, s.specificGravityB) : s.ratio;
}

export function judgeReading(r: JudgeInput): JudgeResult {
  const reasons: Reason[] = [];
  if (r.quantity === 'mass' && !r.stable) {
    return { status: 'unused', reasons: [{ code: 'SCALE_NOT_STABLE', message: 'The scale had not settled; the reading is kept but not judged.', measured: r.valueSi, limit: null, unit: 'kg' }] };
  }
  if (r.device.calibrationDue !== null && r.device.calibrationDue < r.day) {
    reasons.push({ code: 'CALIBRATION_OVERDUE', message: `The device was due for calibration on ${r.device.calibrationDue}.`, measured: null, limit: null, unit: null });
  }
  if (r.quantity === 'mass' && r.device.capacityKg !== null && r.valueSi > r.device.capacityKg) {
    reasons.push({ code: 'OVER_CAPACITY', message: `${r.valueSi} kg is over the scale's capacity of ${r.device.capacityKg} kg.`, measured: r.valueSi, limit: r.device.capacityKg, unit: 'kg' });
  }
  if (r.quantity === 'mass' && (r.subject === 'part_a' || r.subject === 'part_b') && r.system && r.otherPartMassKg !== null && reasons.length === 0) {
    const massA = r.subject === 'part_a' ? r.valueSi : r.otherPartMassKg;
    const massB = r.subject === 'part_b' ? r.valueSi : r.otherPartMassKg;
    if (massB > 0) {
      const tolerance = r.system.ratioTolerancePercent ?? DEFAULT_TOLERANCE_PERCENT;
      const j = judgeRatio({ massA, massB, target: targetWeightRatio(r.system), tolerancePercent: tolerance, isocyanatePart: r.system.isocyanatePart });
      if (!j.withinTolerance) reasons.push({ code: j.code, message: j.message, measured: j.errorPercent, limit: j.error > 0 ? tolerance : -tolerance, unit: '%' });
    }
  }
  const w = r.system?.componentTemperatureWindow;
  if (r.quantity === 'temperature' && w && COMPONENT_SUBJECTS.includes(r.subject)) {
    if (r.valueSi < w.min) reasons.push({ code: 'TEMPERATURE_BELOW_WINDOW', message: `${r.valueSi} °C is below the window of ${w.min}–${w.max} °C: condition the components before pouring.`, measured: r.valueSi, limit: w.min, unit: 'degC' });
    if (r.valueSi > w.max) reasons.push({ code: 'TEMPERATURE_ABOVE_WINDOW', message: `${r.valueSi} °C is above the window of ${w.min}–${w.max} °C: the pot life will be shorter.`, measured: r.valueSi, limit: w.max, unit: 'degC' });
  }
  return { status: reasons.length ? 'rejected' : 'accepted', reasons };
}
