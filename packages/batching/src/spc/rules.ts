import { type ChartLimits, zScore } from './limits.js';

/**
 * Run rules on a chart of individuals or subgroup means, as their sources define them:
 * Western Electric Statistical Quality Control Handbook (1956), rules 1–4, and
 * L. S. Nelson, "The Shewhart Control Chart — Tests for Special Causes", Journal of Quality
 * Technology 16(4), 1984, tests 1–8. Zones are 1σ wide (C: within 1σ, B: 1–2σ, A: 2–3σ).
 *
 * A signal is raised on the point that completes the pattern. A run rule (k points in a row …)
 * fires once, on the k-th point of the run; a longer run does not fire again until it is broken.
 */
export const RUN_RULES = {
  WE1: { source: 'Western Electric', span: 1, description: 'One point beyond 3σ' },
  WE2: { source: 'Western Electric', span: 3, description: 'Two of three points in a row beyond 2σ, on the same side' },
  WE3: { source: 'Western Electric', span: 5, description: 'Four of five points in a row beyond 1σ, on the same side' },
  WE4: { source: 'Western Electric', span: 8, description: 'Eight points in a row on the same side of the centre line' },
  N1: { source: 'Nelson', span: 1, description: 'One point beyond 3σ' },
  N2: { source: 'Nelson', span: 9, description: 'Nine points in a row on the same side of the centre line' },
  N3: { source: 'Nelson', span: 6, description: 'Six points in a row steadily increasing or decreasing' },
  N4: { source: 'Nelson', span: 14, description: 'Fourteen points in a row alternating up and down' },
  N5: { source: 'Nelson', span: 3, description: 'Two of three points in a row beyond 2σ, on the same side' },
  N6: { source: 'Nelson', span: 5, description: 'Four of five points in a row beyond 1σ, on the same side' },
  N7: { source: 'Nelson', span: 15, description: 'Fifteen points in a row within 1σ of the centre line' },
  N8: { source: 'Nelson', span: 8, description: 'Eight points in a row beyond 1σ, on either side, none within 1σ' },
} as const;

export type RunRuleId = keyof typeof RUN_RULES;
export const RUN_RULE_IDS = Object.keys(RUN_RULES) as RunRuleId[];
export const WESTERN_ELECTRIC_RULES: RunRuleId[] = ['WE1', 'WE2', 'WE3', 'WE4'];
export const NELSON_RULES: RunRuleId[] = ['N1', 'N2', 'N3', 'N4', 'N5', 'N6', 'N7', 'N8'];

export interface RuleSignal {
  rule: RunRuleId;
  /** The point that completed the pattern. */
  index: number;
  /** Every point of the pattern, oldest first. */
  points: number[];
  /** Above (+1) or below (−1) the centre line, where the rule has a side. */
  side: 1 | -1 | null;
}

/** Points a rule looks at, plus one: the point before a run tells a new run from a longer one. */
export function historyNeeded(rules: readonly RunRuleId[]): number {
  return Math.max(1, ...rules.map((r) => RUN_RULES[r].span)) + 1;
}

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, k) => from + k);

/** m of the last k points (ending at i, which must be one of them) beyond t σ on one side. */
function mOfK(z: readonly number[], i: number, m: number, k: number, t: number): { points: number[]; side: 1 | -1 } | null {
  if (i < k - 1 || !(Math.abs(z[i]!) > t)) return null;
  const side = z[i]! > 0 ? 1 : -1;
  const points = range(i - k + 1, i).filter((j) => side * z[j]! > t);
  return points.length >= m ? { points, side } : null;
}

/** A run of exactly k points ending at i for which `ok(j)` holds (the point before breaks it). */
function runOf(i: number, k: number, ok: (j: number) => boolean): number[] | null {
  if (i < k - 1) return null;
  for (let j = i - k + 1; j <= i; j++) if (!ok(j)) return null;
  if (i - k >= 0 && ok(i - k)) return null;
  return range(i - k + 1, i);
}

function checkAt(rule: RunRuleId, x: readonly number[], z: readonly number[], i: number): RuleSignal | null {
  const sideOf = (j: number): 1 | -1 | 0 => (z[j]! > 0 ? 1 : z[j]! < 0 ? -1 : 0);
  const signal = (points: number[] | null, side: 1 | -1 | null): RuleSignal | null => (points ? { rule, index: i, points, side } : null);
  switch (rule) {
    case 'WE1':
    case 'N1':
      return Math.abs(z[i]!) > 3 ? signal([i], z[i]! > 0 ? 1 : -1) : null;
    case 'WE2':
    case 'N5': {
      const hit = mOfK(z, i, 2, 3, 2);
      return hit ? signal(hit.points, hit.side) : null;
    }
    case 'WE3':
    case 'N6': {
      const hit = mOfK(z, i, 4, 5, 1);
      return hit ? signal(hit.points, hit.side) : null;
    }
    case 'WE4':
    case 'N2': {
      const side = sideOf(i);
      if (side === 0) return null;
      return signal(runOf(i, rule === 'WE4' ? 8 : 9, (j) => sideOf(j) === side), side);
    }
    case 'N3': {
      // six points, five steps all up or all down; a tie breaks the trend
      if (i < 1 || x[i] === x[i - 1]) return null;
      const dir = Math.sign(x[i]! - x[i - 1]!);
      const steps = runOf(i, 5, (j) => j >= 1 && Math.sign(x[j]! - x[j - 1]!) === dir);
      return steps ? signal([steps[0]! - 1, ...steps], dir > 0 ? 1 : -1) : null;
    }
    case 'N4': {
      // fourteen points: thirteen steps, each the opposite way to the one before
      const alternates = (j: number) => j >= 2 && (x[j]! - x[j - 1]!) * (x[j - 1]! - x[j - 2]!) < 0;
      const turns = runOf(i, 12, alternates);
      return turns ? signal([turns[0]! - 2, turns[0]! - 1, ...turns], null) : null;
    }
    case 'N7':
      return signal(runOf(i, 15, (j) => Math.abs(z[j]!) < 1), null);
    case 'N8': {
      const points = runOf(i, 8, (j) => Math.abs(z[j]!) > 1);
      return points && points.some((j) => z[j]! > 0) && points.some((j) => z[j]! < 0) ? signal(points, null) : null;
    }
  }
}

/** Every signal the chosen rules raise over a whole series, in the order the points came. */
export function evaluateRunRules(values: readonly number[], limits: Pick<ChartLimits, 'centre' | 'sigma'>, rules: readonly RunRuleId[]): RuleSignal[] {
  const z = values.map((v) => zScore(v, limits));
  const out: RuleSignal[] = [];
  for (let i = 0; i < values.length; i++) {
    for (const rule of rules) {
      const s = checkAt(rule, values, z, i);
      if (s) out.push(s);
    }
  }
  return out;
}

/**
 * The signals raised by the newest point of `recent` (the last `historyNeeded(rules)` points are
 * enough): what a judging job checks as each value arrives.
 */
export function signalsOnLatest(recent: readonly number[], limits: Pick<ChartLimits, 'centre' | 'sigma'>, rules: readonly RunRuleId[]): RuleSignal[] {
  if (recent.length === 0) return [];
  const z = recent.map((v) => zScore(v, limits));
  const i = recent.length - 1;
  return rules.map((r) => checkAt(r, recent, z, i)).filter((s): s is RuleSignal => s !== null);
}
