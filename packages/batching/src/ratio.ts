/**
 * Mix ratio: weight ratio from a volume ratio, volumes for volume dispensing, and the ratio error of
 * a weighed pour judged against the ± tolerance.
 */

export type Part = 'A' | 'B';
export type Side = 'isocyanate' | 'polyol';
export type RatioBasis = 'weight' | 'volume';

/** Parts of A to parts of B, e.g. `{ a: 100, b: 45 }` for 100:45. Only the quotient matters. */
export interface MixRatio {
  readonly a: number;
  readonly b: number;
}

/**
 * Comparisons of ratio errors against a tolerance allow this much slack (in units of e, i.e.
 * relative), so that a pour of exactly 105:100 against 100:100 — whose e comes out of binary
 * arithmetic as 0.050000000000000044 — is judged at exactly 5 %.
 */
export const RATIO_EPSILON = 1e-9;

/**
 * Density of water that a specific gravity multiplies, kg/m³: SG × 1000 is the density in kg/m³ (the
 * convention by which a data sheet's SG and g/cm³ are the same number).
 */
export const SPECIFIC_GRAVITY_REFERENCE_DENSITY = 1000;

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a finite number greater than 0; got ${value}.`);
}

function requireRatio(name: string, ratio: MixRatio): void {
  requirePositive(`${name}.a`, ratio.a);
  requirePositive(`${name}.b`, ratio.b);
}

/** m_A / m_B (or V_A / V_B) of a ratio. */
export function ratioQuotient(ratio: MixRatio): number {
  requireRatio('ratio', ratio);
  return ratio.a / ratio.b;
}

/** Which side a part is, given which part is the isocyanate. */
export function sideOf(part: Part, isocyanatePart: Part): Side {
  return part === isocyanatePart ? 'isocyanate' : 'polyol';
}

/**
 * Weight ratio from a volume ratio: each volume part weighs its SG, so
 * weight ratio = volume ratio × SG_A / SG_B. B keeps its number of parts (100:100 by volume at SGs
 * 1.23 and 1.05 is 117.143:100 by weight).
 */
export function weightRatioFromVolumeRatio(volumeRatio: MixRatio, specificGravityA: number, specificGravityB: number): MixRatio {
  requireRatio('volumeRatio', volumeRatio);
  requirePositive('specificGravityA', specificGravityA);
  requirePositive('specificGravityB', specificGravityB);
  return { a: (volumeRatio.a * specificGravityA) / specificGravityB, b: volumeRatio.b };
}

/** Volume ratio from a weight ratio: the inverse of weightRatioFromVolumeRatio. */
export function volumeRatioFromWeightRatio(weightRatio: MixRatio, specificGravityA: number, specificGravityB: number): MixRatio {
  requireRatio('weightRatio', weightRatio);
  requirePositive('specificGravityA', specificGravityA);
  requirePositive('specificGravityB', specificGravityB);
  return { a: (weightRatio.a * specificGravityB) / specificGravityA, b: weightRatio.b };
}

/** The share of the A+B mass that is A and that is B, from a weight ratio. */
export function massFractions(weightRatio: MixRatio): { readonly a: number; readonly b: number } {
  requireRatio('weightRatio', weightRatio);
  const total = weightRatio.a + weightRatio.b;
  return { a: weightRatio.a / total, b: weightRatio.b / total };
}

/**
 * Volumes (m³) of the A and B masses (kg), for dispensing by volume: V = m ÷ (SG × 1000 kg/m³).
 */
export function componentVolumes(
  masses: { readonly a: number; readonly b: number },
  specificGravityA: number,
  specificGravityB: number,
  referenceDensity = SPECIFIC_GRAVITY_REFERENCE_DENSITY,
): { readonly a: number; readonly b: number } {
  requirePositive('specificGravityA', specificGravityA);
  requirePositive('specificGravityB', specificGravityB);
  requirePositive('referenceDensity', referenceDensity);
  if (!(masses.a >= 0) || !(masses.b >= 0)) throw new RangeError('masses must be finite and not negative.');
  return { a: masses.a / (specificGravityA * referenceDensity), b: masses.b / (specificGravityB * referenceDensity) };
}

/**
 * The ratio error of a pour: e = (m_A / m_B) ÷ (target m_A / m_B) − 1. Positive when A is heavy
 * relative to B, negative when B is. Rounded to 1e-12 to drop binary junk.
 */
export function ratioError(massA: number, massB: number, targetWeightRatio: MixRatio): number {
  requirePositive('massB', massB);
  if (!Number.isFinite(massA) || massA < 0) throw new RangeError(`massA must be finite and not negative; got ${massA}.`);
  const e = massA / massB / ratioQuotient(targetWeightRatio) - 1;
  return Math.round(e * 1e12) / 1e12;
}

/** Whether |e| is within ± tolerance (percent), with RATIO_EPSILON of slack. */
export function withinRatioTolerance(error: number, tolerancePercent: number): boolean {
  if (!Number.isFinite(tolerancePercent) || tolerancePercent < 0) {
    throw new RangeError(`tolerancePercent must be finite and not negative; got ${tolerancePercent}.`);
  }
  return Math.abs(error) <= tolerancePercent / 100 + RATIO_EPSILON;
}

export type RatioVerdictCode = 'RATIO_ON_TARGET' | 'RATIO_WITHIN_TOLERANCE' | 'RATIO_ISOCYANATE_HEAVY' | 'RATIO_POLYOL_HEAVY';

/** What an excess of each side tends to do to the foam (common shop knowledge). */
export const OFF_RATIO_CONSEQUENCES: Readonly<Record<Side, string>> = {
  isocyanate: 'Excess isocyanate side tends to make the foam harder and more brittle.',
  polyol: 'Excess polyol side tends to make the foam softer and tackier, and slower to cure.',
};

export interface RatioJudgement {
  /** e = (m_A / m_B) ÷ (target m_A / m_B) − 1, dimensionless. */
  readonly error: number;
  readonly errorPercent: number;
  readonly tolerancePercent: number;
  readonly withinTolerance: boolean;
  /** The part that is heavy relative to the other; null when exactly on ratio. */
  readonly heavyPart: Part | null;
  readonly heavySide: Side | null;
  readonly code: RatioVerdictCode;
  /** The usual consequence of the heavy side (also given inside tolerance, as a trend to watch). */
  readonly consequence: string | null;
  /** One sentence for a person. */
  readonly message: string;
}

export interface RatioJudgementInput {
  /** Net mass of A poured, kg. */
  readonly massA: number;
  /** Net mass of B poured, kg. */
  readonly massB: number;
  /** The system's weight ratio. */
  readonly target: MixRatio;
  /** ± tolerance on e, percent (5 for ±5 %). */
  readonly tolerancePercent: number;
  readonly isocyanatePart: Part;
}

function formatPercent(fraction: number): string {
  return `${(fraction * 100).toFixed(2).replace(/\.?0+$/, '')} %`;
}

/**
 * Judges a weighed pour against the ratio tolerance: which side is heavy, by how much, and the
 * usual consequence. At ±5 %, e = ±5.0 % passes and ±5.1 % fails.
 */
export function judgeRatio(input: RatioJudgementInput): RatioJudgement {
  const error = ratioError(input.massA, input.massB, input.target);
  const withinTolerance = withinRatioTolerance(error, input.tolerancePercent);
  const heavyPart: Part | null = error > 0 ? 'A' : error < 0 ? 'B' : null;
  const heavySide = heavyPart ? sideOf(heavyPart, input.isocyanatePart) : null;
  const consequence = heavySide ? OFF_RATIO_CONSEQUENCES[heavySide] : null;
  const code: RatioVerdictCode = !heavySide
    ? 'RATIO_ON_TARGET'
    : withinTolerance
      ? 'RATIO_WITHIN_TOLERANCE'
      : heavySide === 'isocyanate'
        ? 'RATIO_ISOCYANATE_HEAVY'
        : 'RATIO_POLYOL_HEAVY';
  const band = `±${formatPercent(input.tolerancePercent / 100)}`;
  const message = !heavySide
    ? 'The A:B ratio is on target.'
    : withinTolerance
      ? `The A:B ratio is off by ${formatPercent(error)} (${heavySide} side heavy), within ${band}.`
      : `The A:B ratio is off by ${formatPercent(error)}, outside ${band}: the ${heavySide} side (part ${heavyPart}) is heavy. ${consequence}`;
  return {
    error,
    errorPercent: Math.round(error * 100 * 1e10) / 1e10,
    tolerancePercent: input.tolerancePercent,
    withinTolerance,
    heavyPart,
    heavySide,
    code,
    consequence,
    message,
  };
}
