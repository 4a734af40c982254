/**
 * Masses of a pour: the foam the cavity holds, the mixed mass grossed up by the allowances, and the
 * A, B and pigment masses, rounded to what the scale can show.
 *
 * Allowance convention (the default, and why):
 * - overfill is extra foam wanted on top of what the cavity holds (flash, vents, a margin against
 *   short fills), so it is a share of the foam mass: m × (1 + overfill) — the *multiplicative* form;
 * - container retention is the share of what was mixed that stays behind in the cup and on the stick,
 *   so only (1 − loss) of the mixed mass is delivered, and the mixed mass is m ÷ (1 − loss) — the
 *   *delivered* form.
 * Both forms are available for either allowance (see AllowanceConvention); they differ in the second
 * order: 5 % delivered is ×1.0526, 5 % multiplicative ×1.05.
 *
 * Pigment is a percent of A+B and rides inside the mixed mass: A + B + pigment = the mixed mass, with
 * pigment = pct/100 × (A + B), so the mold still receives the mass the target density asks for.
 */
import { massFractions, type MixRatio } from './ratio.js';

function requireNonNegative(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a finite number not below 0; got ${value}.`);
}

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a finite number greater than 0; got ${value}.`);
}

/** Foam mass (kg) in a cavity: density (kg/m³) × volume (m³). */
export function foamMass(density: number, volume: number): number {
  requireNonNegative('density', density);
  requireNonNegative('volume', volume);
  return density * volume;
}

export type AllowanceForm = 'multiplicative' | 'delivered';

/** Multiplicative allowance: m × (1 + allowance), allowance a fraction ≥ 0. */
export function withMultiplicativeAllowance(mass: number, allowance: number): number {
  requireNonNegative('mass', mass);
  requireNonNegative('allowance', allowance);
  return mass * (1 + allowance);
}

/** Delivered mass: what must be mixed so that m arrives when a fraction `loss` stays behind, m ÷ (1 − loss). */
export function withDeliveredAllowance(mass: number, loss: number): number {
  requireNonNegative('mass', mass);
  requireNonNegative('loss', loss);
  if (loss >= 1) throw new RangeError(`loss must be below 1 (100 %); got ${loss}.`);
  return mass / (1 - loss);
}

export function applyAllowance(mass: number, fraction: number, form: AllowanceForm): number {
  return form === 'delivered' ? withDeliveredAllowance(mass, fraction) : withMultiplicativeAllowance(mass, fraction);
}

export interface AllowanceConvention {
  readonly overfill: AllowanceForm;
  readonly retention: AllowanceForm;
}

/** Overfill multiplies, retention divides (see the top of this file). */
export const DEFAULT_ALLOWANCE_CONVENTION: AllowanceConvention = Object.freeze({
  overfill: 'multiplicative',
  retention: 'delivered',
});

export interface Allowances {
  /** Extra foam on top of the cavity's, percent of the foam mass. */
  readonly overfillPercent?: number;
  /** Share of the mixed mass left in the container, percent. */
  readonly retentionPercent?: number;
}

/** Mass to mix (kg, A + B + pigment) for a foam mass, grossed up by the allowances. */
export function mixedMass(
  foam: number,
  allowances: Allowances = {},
  convention: AllowanceConvention = DEFAULT_ALLOWANCE_CONVENTION,
): number {
  const overfilled = applyAllowance(foam, (allowances.overfillPercent ?? 0) / 100, convention.overfill);
  return applyAllowance(overfilled, (allowances.retentionPercent ?? 0) / 100, convention.retention);
}

/** Pigment mass (kg) for a percent of the A + B mass: pct/100 × (A + B). */
export function pigmentMass(massAB: number, pigmentPercent: number): number {
  requireNonNegative('massAB', massAB);
  requireNonNegative('pigmentPercent', pigmentPercent);
  return (pigmentPercent / 100) * massAB;
}

export interface PourMasses {
  /** kg */
  readonly a: number;
  /** kg */
  readonly b: number;
  /** kg */
  readonly pigment: number;
}

/**
 * Splits a mixed mass (A + B + pigment, kg) into its parts: A + B = mixed ÷ (1 + pct/100), pigment
 * = pct/100 × (A + B), and A and B by the weight ratio.
 */
export function splitMixedMass(mixed: number, weightRatio: MixRatio, pigmentPercent = 0): PourMasses {
  requireNonNegative('mixed', mixed);
  requireNonNegative('pigmentPercent', pigmentPercent);
  const massAB = mixed / (1 + pigmentPercent / 100);
  const fractions = massFractions(weightRatio);
  return { a: massAB * fractions.a, b: massAB * fractions.b, pigment: pigmentMass(massAB, pigmentPercent) };
}

/** Digits after the decimal point of a number as JavaScript writes it (0.05 → 2, 1e-7 → 7, 20 → 0). */
export function decimalPlaces(value: number): number {
  const match = /^-?\d+(?:\.(\d+))?(?:e([+-]\d+))?$/i.exec(String(value));
  if (!match) return 0;
  const fraction = match[1]?.length ?? 0;
  const exponent = Number(match[2] ?? 0);
  return Math.max(0, fraction - exponent);
}

/**
 * Rounds to the nearest multiple of a scale's readability d (both in the same unit), halves away
 * from zero, and gives the decimal number the scale would show: 3 × 0.1 comes back as 0.3, not
 * 0.30000000000000004. The quotient is cut to 9 decimals before rounding so that 0.35 ÷ 0.1 =
 * 3.4999999999999996 still counts as the half it is written as.
 */
export function roundToReadability(value: number, readability: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`value must be finite; got ${value}.`);
  requirePositive('readability', readability);
  const quotient = Number((Math.abs(value) / readability).toFixed(9));
  const steps = Math.sign(value) * Math.round(quotient);
  const places = Math.min(decimalPlaces(readability), 100);
  const rounded = Number((steps * readability).toFixed(places));
  return rounded === 0 ? 0 : rounded;
}

/** Each mass rounded to the readability; the total is the sum of the rounded parts. */
export function roundPourMasses(masses: PourMasses, readability: number): PourMasses & { readonly total: number } {
  const a = roundToReadability(masses.a, readability);
  const b = roundToReadability(masses.b, readability);
  const pigment = roundToReadability(masses.pigment, readability);
  return { a, b, pigment, total: roundToReadability(a + b + pigment, readability) };
}
