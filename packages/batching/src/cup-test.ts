/**
 * Qualifying a lot by cup test. A system may state its reactivity window — cream time, rise time
 * (top of cup) and tack-free time — and a free-rise density band at its reference temperature, in
 * the terms of ASTM D7487 (polyurethane raw materials: reactivity of foam formulations, cup test).
 * A cup test is judged against them, its density first brought to the reference temperature with
 * the system's density model (its slope), so a cup poured cold is not failed for being cold.
 */
import { finding, type Finding, type FindingCode } from './findings.js';

interface Window {
  readonly min: number;
  readonly max: number;
}

export interface CupTestSpec {
  readonly creamTimeWindow?: Window;
  readonly riseTimeWindow?: Window;
  readonly tackFreeTimeWindow?: Window;
  /** kg/m³ at the reference temperature. */
  readonly freeRiseDensityBand?: Window;
  /** °C. */
  readonly referenceTemperature: number;
  /** kg/m³ per °C; no correction when absent. */
  readonly slope?: number;
}

export interface CupTestResult {
  /** Component temperature of the cup, °C (mean of A and B). */
  readonly temperature: number;
  /** s. */
  readonly creamTime?: number | null;
  readonly riseTime?: number | null;
  readonly tackFreeTime?: number | null;
  /** kg/m³ as measured. */
  readonly freeRiseDensity: number;
}

export type CupTestVerdict = 'passed' | 'failed' | 'not_judged';

export interface CupTestJudgement {
  readonly verdict: CupTestVerdict;
  readonly findings: Finding[];
  /** The measured density brought to the reference temperature, kg/m³ (null without a band). */
  readonly correctedDensity: number | null;
}

/** Whether the system states anything a cup test can be judged against. */
export function hasCupTestSpec(spec: CupTestSpec): boolean {
  return !!(spec.creamTimeWindow || spec.riseTimeWindow || spec.tackFreeTimeWindow || spec.freeRiseDensityBand);
}

/**
 * ρ_ref = ρ_measured − slope × (T − T_ref): the density the cup would have given at the reference
 * temperature, by the system's straight-line model.
 */
export function densityAtReference(density: number, temperature: number, spec: Pick<CupTestSpec, 'referenceTemperature' | 'slope'>): number {
  return density - (spec.slope ?? 0) * (temperature - spec.referenceTemperature);
}

export function judgeCupTest(cup: CupTestResult, spec: CupTestSpec): CupTestJudgement {
  if (!hasCupTestSpec(spec)) return { verdict: 'not_judged', findings: [], correctedDensity: null };
  const findings: Finding[] = [];
  const check = (value: number | null | undefined, w: Window | undefined, below: FindingCode, above: FindingCode, unit: string) => {
    if (value === null || value === undefined || !w) return;
    if (value < w.min) findings.push(finding(below, { measured: value, limit: w.min, unit }, { otherEdge: w.max }));
    else if (value > w.max) findings.push(finding(above, { measured: value, limit: w.max, unit }, { otherEdge: w.min }));
  };
  check(cup.creamTime, spec.creamTimeWindow, 'CREAM_TIME_BELOW_WINDOW', 'CREAM_TIME_ABOVE_WINDOW', 's');
  check(cup.riseTime, spec.riseTimeWindow, 'RISE_TIME_BELOW_WINDOW', 'RISE_TIME_ABOVE_WINDOW', 's');
  check(cup.tackFreeTime, spec.tackFreeTimeWindow, 'TACK_FREE_TIME_BELOW_WINDOW', 'TACK_FREE_TIME_ABOVE_WINDOW', 's');
  let corrected: number | null = null;
  if (spec.freeRiseDensityBand) {
    corrected = Math.round(densityAtReference(cup.freeRiseDensity, cup.temperature, spec) * 1e6) / 1e6;
    check(corrected, spec.freeRiseDensityBand, 'FREE_RISE_DENSITY_BELOW_BAND', 'FREE_RISE_DENSITY_ABOVE_BAND', 'kg/m3');
  }
  return { verdict: findings.length ? 'failed' : 'passed', findings, correctedDensity: corrected };
}
