/**
 * Isocyanate index by the equivalent-weight method of the polyurethane handbooks.
 *
 * An equivalent weight is the mass carrying one equivalent of reactive groups:
 * - isocyanate: 4202 / %NCO (42.02 g/mol of NCO × 100);
 * - polyol: 56100 / OH number (56.1 g/mol of KOH × 1000 mg/g);
 * - water: 9.0 (18.015 / 2: each water molecule consumes two NCO groups).
 * index = 100 × NCO equivalents ÷ (OH + water equivalents); 100 is stoichiometric.
 */
import type { Part } from './ratio.js';

export const NCO_EQUIVALENT_NUMERATOR = 4202;
export const OH_EQUIVALENT_NUMERATOR = 56100;
export const WATER_EQUIVALENT_WEIGHT = 9.0;

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a finite number greater than 0; got ${value}.`);
}

function requireNonNegative(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a finite number not below 0; got ${value}.`);
}

/** Equivalent weight (g/eq) of an isocyanate of the given %NCO. */
export function ncoEquivalentWeight(ncoPercent: number): number {
  requirePositive('ncoPercent', ncoPercent);
  if (ncoPercent > 100) throw new RangeError(`ncoPercent must be at most 100; got ${ncoPercent}.`);
  return NCO_EQUIVALENT_NUMERATOR / ncoPercent;
}

/** Equivalent weight (g/eq) of a polyol of the given OH number (mg KOH/g). */
export function ohEquivalentWeight(hydroxylNumber: number): number {
  requirePositive('hydroxylNumber', hydroxylNumber);
  return OH_EQUIVALENT_NUMERATOR / hydroxylNumber;
}

export interface IndexFormulation {
  /** Mass (any unit, the same for all three masses, e.g. pbw) of the isocyanate. */
  readonly isocyanateMass: number;
  readonly ncoPercent: number;
  /** Mass of the polyol. */
  readonly polyolMass: number;
  /** OH number of the polyol, mg KOH/g. */
  readonly hydroxylNumber: number;
  /** Mass of water (blowing agent); 0 when absent. */
  readonly waterMass?: number;
}

/** Equivalents that react with NCO: OH of the polyol plus water. */
export function hydroxylEquivalents(polyolMass: number, hydroxylNumber: number, waterMass = 0): number {
  requireNonNegative('polyolMass', polyolMass);
  requireNonNegative('waterMass', waterMass);
  return polyolMass / ohEquivalentWeight(hydroxylNumber) + waterMass / WATER_EQUIVALENT_WEIGHT;
}

/** index = 100 × NCO equivalents ÷ (OH + water equivalents). */
export function isocyanateIndex(formulation: IndexFormulation): number {
  requireNonNegative('isocyanateMass', formulation.isocyanateMass);
  const reactive = hydroxylEquivalents(formulation.polyolMass, formulation.hydroxylNumber, formulation.waterMass ?? 0);
  if (!(reactive > 0)) throw new RangeError('The polyol side carries no reactive equivalents.');
  const nco = formulation.isocyanateMass / ncoEquivalentWeight(formulation.ncoPercent);
  return (100 * nco) / reactive;
}

export interface IsocyanateDemand {
  readonly index: number;
  readonly ncoPercent: number;
  readonly hydroxylNumber: number;
  /** Parts of polyol; 100 for parts per hundred polyol. */
  readonly polyolParts?: number;
  /** Parts of water in the same basis as polyolParts. */
  readonly waterParts?: number;
}

/** Parts of isocyanate (pbw, per polyolParts — 100 by default) for a target index. */
export function isocyanatePartsForIndex(demand: IsocyanateDemand): number {
  requirePositive('index', demand.index);
  const reactive = hydroxylEquivalents(demand.polyolParts ?? 100, demand.hydroxylNumber, demand.waterParts ?? 0);
  return (demand.index / 100) * reactive * ncoEquivalentWeight(demand.ncoPercent);
}

/**
 * The index an off-ratio pour gives. With e = (m_A/m_B) ÷ (target m_A/m_B) − 1, NCO equivalents
 * follow the isocyanate part's mass and OH equivalents the polyol part's, so the index scales by
 * (1 + e) when A is the isocyanate and by 1 ÷ (1 + e) when B is. Said by side: an isocyanate side
 * heavy by 5 % gives index × 1.05; a polyol side heavy by 5 % gives index ÷ 1.05.
 */
export function indexAfterRatioError(targetIndex: number, ratioError: number, isocyanatePart: Part): number {
  requirePositive('targetIndex', targetIndex);
  if (!Number.isFinite(ratioError) || ratioError <= -1) throw new RangeError(`ratioError must be finite and above −1; got ${ratioError}.`);
  return isocyanatePart === 'A' ? targetIndex * (1 + ratioError) : targetIndex / (1 + ratioError);
}
