/**
 * Judging one reading: pure, no I/O. The processor gathers the facts (the reading, its device, the
 * batch's stored targets, the batch's other latest stable masses and milestones) and this decides.
 */
import { finding, type Finding, type FindingFacts, type SystemKind } from './findings.js';
import { ratioError, sideOf, type MixRatio, type Part, weightRatioFromVolumeRatio, withinRatioTolerance } from './ratio.js';

export type ReadingQuantity = 'mass' | 'temperature' | 'humidity' | 'milestone';
export type ReadingSubject = 'part_a' | 'part_b' | 'pigment' | 'mixed' | 'mold' | 'ambient' | 'mix_start' | 'pour' | 'demold';
export type Verdict = 'accepted' | 'rejected' | 'unused';

export const MILESTONE_SUBJECTS = ['mix_start', 'pour', 'demold'] as const;
export const MASS_SUBJECTS = ['part_a', 'part_b', 'pigment', 'mixed'] as const;

/** A reason in a verdict: a finding of the shared vocabulary (findings.ts). */
export type Reason = Finding;

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
  /** ± parts by weight of B per the system's A parts (data sheets write 100 : 45 ± 2); replaces the percent. */
  ratioTolerancePbw?: number;
  massTolerancePercent?: number;
  kind?: SystemKind;
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

/**
 * The batch's target masses, kg (unrounded). When the pigment is pre-blended in a part, that part's
 * target includes it (and `pigment`, weighed separately, is 0): the ratio is judged on a : b.
 */
export interface MassTargets {
  a: number;
  b: number;
  pigment: number;
  total: number;
  /** Scale readability of the batch's scale, kg, for rounding the sentences. */
  readability?: number;
  /** Pigment share of A + B (percent) and its basis, for the limit check. */
  pigmentPercentOfAB?: number;
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
  /** The latest stable A and B masses (kg), for the pigment share and the mixed shot. */
  partMassesKg?: { a: number | null; b: number | null };
  /** For a pour: seconds since mix start; for a demold: seconds since the pour; null when not recorded. */
  elapsedS?: number | null;
}

export interface JudgeResult {
  status: Verdict;
  reasons: Reason[];
}

export const DEFAULT_TOLERANCE_PERCENT = 5;
/**
 * A weighed mass more than this far under its target is a short shot, not a near miss: common
 * practice treats a part a fifth light as a part that will not fill.
 */
export const SHORT_SHOT_PERCENT = 20;
const COMPONENT_SUBJECTS: readonly ReadingSubject[] = ['part_a', 'part_b', 'mixed'];
/** Below a microgram nothing was weighed: no scale a shop uses resolves it. */
const WEIGHED_KG = 1e-9;

/** The system's ratio by weight, whatever basis it is stated on. */
export function targetWeightRatio(s: SystemFacts): MixRatio {
  return s.ratioBasis === 'volume' ? weightRatioFromVolumeRatio(s.ratio, s.specificGravityA, s.specificGravityB) : s.ratio;
}

/** The ± percent band the masses are held to: the system's mass tolerance, else its ratio tolerance. */
export function massTolerancePercent(s: SystemFacts | null): number {
  if (s?.massTolerancePercent !== undefined) return s.massTolerancePercent;
  if (s?.ratioTolerancePbw !== undefined) return (s.ratioTolerancePbw / targetWeightRatio(s).b) * 100;
  return s?.ratioTolerancePercent ?? DEFAULT_TOLERANCE_PERCENT;
}

const round = (x: number, digits = 4) => Math.round(x * 10 ** digits) / 10 ** digits;

/** A mass against its target within ±tolerance (exactly at the limit passes); far under is a short shot. */
function massCheck(reasons: Reason[], codes: { low: Reason['code']; high: Reason['code'] }, measured: number, target: number, tolerancePercent: number, facts: FindingFacts, shortShot: boolean): void {
  // a target under a microgram is no target (targets that small are refused when the batch is planned)
  if (!(target >= WEIGHED_KG)) return;
  const error = measured / target - 1;
  if (withinRatioTolerance(error, tolerancePercent)) return;
  const over = error > 0;
  const limit = round(target * (1 + (over ? 1 : -1) * (tolerancePercent / 100)), 6);
  const all = { ...facts, target: Number(target.toPrecision(9)), tolerance: tolerancePercent };
  if (shortShot && !over && -error * 100 > SHORT_SHOT_PERCENT) {
    reasons.push(finding('SHORT_SHOT', { measured: round(measured, 6), limit: round(target * (1 - SHORT_SHOT_PERCENT / 100), 6), unit: 'kg' }, all));
    return;
  }
  reasons.push(finding(over ? codes.high : codes.low, { measured: round(measured, 6), limit, unit: 'kg' }, all));
}

function windowCheck(reasons: Reason[], below: Reason['code'], above: Reason['code'], value: number, w: Window | undefined): void {
  if (!w) return;
  if (value < w.min) reasons.push(finding(below, { measured: value, limit: w.min, unit: 'degC' }, { otherEdge: w.max }));
  if (value > w.max) reasons.push(finding(above, { measured: value, limit: w.max, unit: 'degC' }, { otherEdge: w.min }));
}

/**
 * The ratio of a pour with both parts weighed (both above zero): within ± percent of e, or within
 * ± pbw of B per the system's A parts. The expected ratio is the batch's targets' (a pre-blended
 * pigment included in its part), else the system's.
 */
function ratioCheck(reasons: Reason[], s: SystemFacts, massA: number, massB: number, targets: MassTargets | null | undefined): void {
  const target: MixRatio = targets && targets.a > 0 && targets.b > 0 ? { a: targets.a, b: targets.b } : targetWeightRatio(s);
  const facts = (heavy: Part): FindingFacts => ({ part: heavy, side: sideOf(heavy, s.isocyanatePart), ...(s.kind ? { kind: s.kind } : {}) });
  const code = (heavy: Part) => (sideOf(heavy, s.isocyanatePart) === 'isocyanate' ? 'RATIO_ISOCYANATE_HEAVY' : 'RATIO_POLYOL_HEAVY') as Reason['code'];
  if (s.ratioTolerancePbw !== undefined) {
    const partsA = s.ratio.a;
    const expectedB = (partsA * target.b) / target.a;
    const measuredB = (partsA * massB) / massA;
    const diff = measuredB - expectedB;
    if (Math.abs(diff) <= s.ratioTolerancePbw + 1e-9) return;
    const heavy: Part = diff > 0 ? 'B' : 'A';
    reasons.push(finding(code(heavy), { measured: round(Math.abs(diff), 4), limit: s.ratioTolerancePbw, unit: 'pbw' }, facts(heavy)));
    return;
  }
  const tolerance = s.ratioTolerancePercent ?? DEFAULT_TOLERANCE_PERCENT;
  const e = ratioError(massA, massB, target);
  if (withinRatioTolerance(e, tolerance)) return;
  // e > 0: A heavy relative to B; the size of e with the heavy part named (the sign in words)
  const heavy: Part = e > 0 ? 'A' : 'B';
  reasons.push(finding(code(heavy), { measured: round(Math.abs(e) * 100, 4), limit: tolerance, unit: '%' }, facts(heavy)));
}

export function judgeReading(r: JudgeInput): JudgeResult {
  const reasons: Reason[] = [];
  const s = r.system;
  if (r.quantity === 'milestone') return judgeMilestone(r);
  if (r.quantity === 'mass' && !r.stable) {
    return { status: 'unused', reasons: [finding('SCALE_NOT_STABLE', { measured: r.valueSi, unit: 'kg' })] };
  }
  if (r.device.calibrationDue !== null && r.device.calibrationDue < r.day) {
    reasons.push(finding('CALIBRATION_OVERDUE', {}, { date: r.device.calibrationDue }));
  }
  if (r.quantity === 'mass' && r.device.capacityKg !== null && r.valueSi > r.device.capacityKg) {
    reasons.push(finding('OVER_CAPACITY', { measured: r.valueSi, limit: r.device.capacityKg, unit: 'kg' }));
  }
  // a reading the device cannot vouch for is not compared with anything
  if (reasons.length) return { status: 'rejected', reasons };

  const massTolerance = massTolerancePercent(s);
  const readability = r.targets?.readability;
  const rd = readability !== undefined ? { readability } : {};
  if (r.quantity === 'mass' && (r.subject === 'part_a' || r.subject === 'part_b')) {
    const part: Part = r.subject === 'part_a' ? 'A' : 'B';
    if (!(r.valueSi >= WEIGHED_KG)) {
      reasons.push(finding('PART_NOT_WEIGHED', { measured: r.valueSi, unit: 'kg' }, { part }));
    } else {
      // the ratio only with both parts' stable masses above zero
      if (s && r.otherPartMassKg !== null && r.otherPartMassKg >= WEIGHED_KG) {
        ratioCheck(reasons, s, part === 'A' ? r.valueSi : r.otherPartMassKg, part === 'B' ? r.valueSi : r.otherPartMassKg, r.targets);
      }
      // and each part against its own band, even when the ratio holds
      if (r.targets) {
        const target = part === 'A' ? r.targets.a : r.targets.b;
        massCheck(reasons, part === 'A' ? { low: 'PART_A_MASS_LOW', high: 'PART_A_MASS_HIGH' } : { low: 'PART_B_MASS_LOW', high: 'PART_B_MASS_HIGH' }, r.valueSi, target, massTolerance, { part, ...rd }, true);
      }
    }
  }
  if (r.quantity === 'mass' && r.subject === 'mixed') {
    if (r.partMassesKg) {
      for (const [part, m] of [['A', r.partMassesKg.a], ['B', r.partMassesKg.b]] as const) {
        if (m === null || !(m >= WEIGHED_KG)) reasons.push(finding('PART_NOT_WEIGHED', { measured: m, unit: 'kg' }, { part }));
      }
    }
    if (r.targets) massCheck(reasons, { low: 'TOTAL_MASS_LOW', high: 'TOTAL_MASS_HIGH' }, r.valueSi, r.targets.total, massTolerance, { ...rd }, true);
  }
  if (r.quantity === 'mass' && r.subject === 'pigment') {
    if (r.targets && r.targets.pigment > 0) massCheck(reasons, { low: 'PIGMENT_MASS_LOW', high: 'PIGMENT_MASS_HIGH' }, r.valueSi, r.targets.pigment, massTolerance, { part: 'pigment', ...rd }, false);
    const a = r.partMassesKg?.a ?? null;
    const b = r.partMassesKg?.b ?? null;
    if (s?.maxPigmentPercent !== undefined && a !== null && b !== null && a + b > 0) {
      const share = (r.valueSi / (a + b)) * 100;
      if (share > s.maxPigmentPercent + 1e-9) reasons.push(finding('PIGMENT_OVER_LIMIT', { measured: round(share, 4), limit: s.maxPigmentPercent, unit: '%' }, { basis: 'A + B' }));
    }
  }
  if (r.quantity === 'temperature' && s) {
    if (COMPONENT_SUBJECTS.includes(r.subject)) windowCheck(reasons, 'TEMPERATURE_BELOW_WINDOW', 'TEMPERATURE_ABOVE_WINDOW', r.valueSi, s.componentTemperatureWindow);
    if (r.subject === 'mold') windowCheck(reasons, 'MOLD_TEMPERATURE_BELOW_WINDOW', 'MOLD_TEMPERATURE_ABOVE_WINDOW', r.valueSi, s.moldTemperatureWindow);
    if (r.subject === 'ambient') windowCheck(reasons, 'AMBIENT_TEMPERATURE_BELOW_WINDOW', 'AMBIENT_TEMPERATURE_ABOVE_WINDOW', r.valueSi, s.ambientTemperatureWindow);
  }
  if (r.quantity === 'humidity' && s?.maxRelativeHumidity !== undefined && r.valueSi > s.maxRelativeHumidity) {
    reasons.push(finding('HUMIDITY_ABOVE_LIMIT', { measured: r.valueSi, limit: s.maxRelativeHumidity, unit: '%' }));
  }
  return { status: reasons.length ? 'rejected' : 'accepted', reasons };
}

function judgeMilestone(r: JudgeInput): JudgeResult {
  const reasons: Reason[] = [];
  const s = r.system;
  const elapsed = r.elapsedS ?? null;
  if (r.subject === 'pour' && s?.potLife !== undefined && elapsed !== null && elapsed > s.potLife) {
    reasons.push(finding('POT_LIFE_EXCEEDED', { measured: round(elapsed, 3), limit: s.potLife, unit: 's' }));
  }
  if (r.subject === 'demold' && s?.demoldTime !== undefined && elapsed !== null && elapsed < s.demoldTime) {
    reasons.push(finding('DEMOLDED_EARLY', { measured: round(elapsed, 3), limit: s.demoldTime, unit: 's' }));
  }
  return { status: reasons.length ? 'rejected' : 'accepted', reasons };
}
