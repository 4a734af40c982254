/**
 * Judging one reading: pure, no I/O. The processor gathers the facts (the reading, its device, the
 * batch's stored targets, the batch's other latest stable masses and milestones) and this decides.
 */
import { judgeRatio, type MixRatio, type Part, weightRatioFromVolumeRatio, withinRatioTolerance } from './ratio.js';

export type ReadingQuantity = 'mass' | 'temperature' | 'humidity' | 'milestone';
export type ReadingSubject = 'part_a' | 'part_b' | 'pigment' | 'mixed' | 'mold' | 'ambient' | 'mix_start' | 'pour' | 'demold';
export type Verdict = 'accepted' | 'rejected' | 'unused';

export const MILESTONE_SUBJECTS = ['mix_start', 'pour', 'demold'] as const;
export const MASS_SUBJECTS = ['part_a', 'part_b', 'pigment', 'mixed'] as const;

export interface Reason {
  code: string;
  message: string;
  measured: number | null;
  limit: number | null;
  unit: string | null;
}

interface Window {
  min: number;
  max: number;
}

export interface SystemFacts {
  ratioBasis: 'weight' | 'volume';
  ratio: MixRatio;
  specificGravityA: number;
  specificGravityB: number;
  isocyanatePart: Part;
  ratioTolerancePercent?: number;
  massTolerancePercent?: number;
  componentTemperatureWindow?: Window;
  moldTemperatureWindow?: Window;
  ambientTemperatureWindow?: Window;
  maxRelativeHumidity?: number;
  maxPigmentPercent?: number;
  /** s */
  potLife?: number;
  /** s */
  demoldTime?: number;
}

/** The batch's target masses, kg. */
export interface MassTargets {
  a: number;
  b: number;
  pigment: number;
  total: number;
}

export interface JudgeInput {
  quantity: ReadingQuantity;
  subject: ReadingSubject;
  /** kg, °C, % RH; for a milestone, unused. */
  valueSi: number;
  stable: boolean;
  device: { capacityKg: number | null; calibrationDue: string | null };
  /** YYYY-MM-DD, the day the reading was taken. */
  day: string;
  system: SystemFacts | null;
  targets?: MassTargets | null;
  /** The latest stable mass (kg) of the other part of A:B in the batch, if any. */
  otherPartMassKg: number | null;
  /** The latest stable A and B masses (kg), for the pigment share. */
  partMassesKg?: { a: number | null; b: number | null };
  /** For a pour: seconds since mix start; for a demold: seconds since the pour; null when not recorded. */
  elapsedS?: number | null;
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

const round = (x: number, digits = 4) => Math.round(x * 10 ** digits) / 10 ** digits;

/** A mass against its target within ±tolerance (the same edge rule as the ratio: exactly at the limit passes). */
function massCheck(reasons: Reason[], what: string, codeBase: string, measured: number, target: number, tolerancePercent: number, low: string, high: string): void {
  if (!(target > 0)) return;
  const error = measured / target - 1;
  if (withinRatioTolerance(error, tolerancePercent)) return;
  const over = error > 0;
  const limit = round(target * (1 + (over ? 1 : -1) * (tolerancePercent / 100)), 6);
  reasons.push({
    code: `${codeBase}_${over ? 'HIGH' : 'LOW'}`,
    message: `${what} is ${round(measured, 6)} kg, ${round(Math.abs(error) * 100, 2)} % ${over ? 'over' : 'under'} its target of ${round(target, 6)} kg (±${tolerancePercent} %): ${over ? high : low}`,
    measured: round(measured, 6),
    limit,
    unit: 'kg',
  });
}

function windowCheck(reasons: Reason[], what: string, codeBase: string, value: number, w: Window | undefined, below: string, above: string): void {
  if (!w) return;
  if (value < w.min) reasons.push({ code: `${codeBase}_BELOW_WINDOW`, message: `${what} ${value} °C is below the window of ${w.min}–${w.max} °C: ${below}`, measured: value, limit: w.min, unit: 'degC' });
  if (value > w.max) reasons.push({ code: `${codeBase}_ABOVE_WINDOW`, message: `${what} ${value} °C is above the window of ${w.min}–${w.max} °C: ${above}`, measured: value, limit: w.max, unit: 'degC' });
}

export function judgeReading(r: JudgeInput): JudgeResult {
  const reasons: Reason[] = [];
  const s = r.system;
  if (r.quantity === 'milestone') return judgeMilestone(r);
  if (r.quantity === 'mass' && !r.stable) {
    return { status: 'unused', reasons: [{ code: 'SCALE_NOT_STABLE', message: 'The scale had not settled; the reading is kept but not judged.', measured: r.valueSi, limit: null, unit: 'kg' }] };
  }
  if (r.device.calibrationDue !== null && r.device.calibrationDue < r.day) {
    reasons.push({ code: 'CALIBRATION_OVERDUE', message: `The device was due for calibration on ${r.device.calibrationDue}.`, measured: null, limit: null, unit: null });
  }
  if (r.quantity === 'mass' && r.device.capacityKg !== null && r.valueSi > r.device.capacityKg) {
    reasons.push({ code: 'OVER_CAPACITY', message: `${r.valueSi} kg is over the scale's capacity of ${r.device.capacityKg} kg.`, measured: r.valueSi, limit: r.device.capacityKg, unit: 'kg' });
  }
  // a reading the device cannot vouch for is not compared with anything
  if (reasons.length) return { status: 'rejected', reasons };

  const ratioTolerance = s?.ratioTolerancePercent ?? DEFAULT_TOLERANCE_PERCENT;
  const massTolerance = s?.massTolerancePercent ?? ratioTolerance;
  if (r.quantity === 'mass' && (r.subject === 'part_a' || r.subject === 'part_b') && s && r.otherPartMassKg !== null) {
    const massA = r.subject === 'part_a' ? r.valueSi : r.otherPartMassKg;
    const massB = r.subject === 'part_b' ? r.valueSi : r.otherPartMassKg;
    if (massB > 0) {
      const j = judgeRatio({ massA, massB, target: targetWeightRatio(s), tolerancePercent: ratioTolerance, isocyanatePart: s.isocyanatePart });
      if (!j.withinTolerance) reasons.push({ code: j.code, message: j.message, measured: j.errorPercent, limit: j.error > 0 ? ratioTolerance : -ratioTolerance, unit: '%' });
    }
  }
  // the parts are judged by their ratio; how much was mixed, by the mixed shot (A + B + pigment)
  if (r.quantity === 'mass' && r.subject === 'mixed' && r.targets) {
    massCheck(reasons, 'The mixed shot', 'TOTAL_MASS', r.valueSi, r.targets.total, massTolerance, 'the part will be short (voids, under-filled corners).', 'more than the mold needs: overpacking, flash and a higher exotherm.');
  }
  if (r.quantity === 'mass' && r.subject === 'pigment') {
    if (r.targets && r.targets.pigment > 0) massCheck(reasons, 'The pigment', 'PIGMENT_MASS', r.valueSi, r.targets.pigment, massTolerance, 'the colour will be lighter than the standard.', 'the colour will be deeper than the standard.');
    const a = r.partMassesKg?.a ?? null;
    const b = r.partMassesKg?.b ?? null;
    if (s?.maxPigmentPercent !== undefined && a !== null && b !== null && a + b > 0) {
      const share = (r.valueSi / (a + b)) * 100;
      if (share > s.maxPigmentPercent + 1e-9) {
        reasons.push({ code: 'PIGMENT_OVER_LIMIT', message: `Pigment is ${round(share, 2)} % of A + B, over the system's limit of ${s.maxPigmentPercent} %: too much carrier can upset the cure and the physical properties.`, measured: round(share, 4), limit: s.maxPigmentPercent, unit: '%' });
      }
    }
  }
  if (r.quantity === 'temperature' && s) {
    if (COMPONENT_SUBJECTS.includes(r.subject)) windowCheck(reasons, 'The component at', 'TEMPERATURE', r.valueSi, s.componentTemperatureWindow, 'condition the components before pouring (slower rise, higher density).', 'the pot life will be shorter and the rise faster.');
    if (r.subject === 'mold') windowCheck(reasons, 'The mold at', 'MOLD_TEMPERATURE', r.valueSi, s.moldTemperatureWindow, 'expect a thick, soft skin, voids and a longer demold.', 'expect a thin skin, blisters and a faster cure near the surface.');
    if (r.subject === 'ambient') windowCheck(reasons, 'The shop air at', 'AMBIENT_TEMPERATURE', r.valueSi, s.ambientTemperatureWindow, 'the mix and the mold cool; expect slower rise and cure.', 'the pot life will be shorter.');
  }
  if (r.quantity === 'humidity' && s?.maxRelativeHumidity !== undefined && r.valueSi > s.maxRelativeHumidity) {
    reasons.push({ code: 'HUMIDITY_ABOVE_LIMIT', message: `Relative humidity ${r.valueSi} % is above the limit of ${s.maxRelativeHumidity} %: moisture reacts with the isocyanate side (bubbles, a poorer skin). Keep containers closed.`, measured: r.valueSi, limit: s.maxRelativeHumidity, unit: '%' });
  }
  return { status: reasons.length ? 'rejected' : 'accepted', reasons };
}

function judgeMilestone(r: JudgeInput): JudgeResult {
  const reasons: Reason[] = [];
  const s = r.system;
  const elapsed = r.elapsedS ?? null;
  if (r.subject === 'pour' && s?.potLife !== undefined && elapsed !== null && elapsed > s.potLife) {
    reasons.push({ code: 'POT_LIFE_EXCEEDED', message: `Poured ${round(elapsed, 1)} s after mix start, past the pot life of ${s.potLife} s: the mix was already gelling (poor flow, knit lines, voids).`, measured: round(elapsed, 3), limit: s.potLife, unit: 's' });
  }
  if (r.subject === 'demold' && s?.demoldTime !== undefined && elapsed !== null && elapsed < s.demoldTime) {
    reasons.push({ code: 'DEMOLDED_EARLY', message: `Demolded ${round(elapsed, 1)} s after the pour, before the demold time of ${s.demoldTime} s: the part may tear, distort or take a set.`, measured: round(elapsed, 3), limit: s.demoldTime, unit: 's' });
  }
  return { status: reasons.length ? 'rejected' : 'accepted', reasons };
}
