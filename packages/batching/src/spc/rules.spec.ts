/**
 * Each run rule against a short constructed sequence on a chart with centre 0 and σ = 1, so a value
 * is its own z-score. The expected signal follows from the rule's definition: Western Electric
 * Statistical Quality Control Handbook (1956), rules 1–4; Nelson, Journal of Quality Technology 16(4),
 * 1984, tests 1–8.
 */
import { describe, expect, it } from '@jest/globals';
import { evaluateRunRules, historyNeeded, NELSON_RULES, type RunRuleId, signalsOnLatest, WESTERN_ELECTRIC_RULES } from './rules.js';

const unit = { centre: 0, sigma: 1 };
const fired = (rule: RunRuleId, xs: number[]) => evaluateRunRules(xs, unit, [rule]).map((s) => s.index);

describe('run rules', () => {
  it('WE1 / N1: a point beyond 3σ signals on that point; exactly 3σ does not', () => {
    for (const r of ['WE1', 'N1'] as const) {
      expect(fired(r, [0.5, -0.2, 3.2, 0.1, -3.01])).toEqual([2, 4]);
      expect(fired(r, [3, -3, 0])).toEqual([]);
    }
  });

  it('WE2 / N5: two of three beyond 2σ on the same side; on opposite sides no signal', () => {
    for (const r of ['WE2', 'N5'] as const) {
      expect(fired(r, [0, 2.5, 0.3, 2.2])).toEqual([3]);
      expect(evaluateRunRules([0, 2.5, 0.3, 2.2], unit, [r])[0]!.points).toEqual([1, 3]);
      expect(fired(r, [0, 2.5, 0.3, -2.2])).toEqual([]);
      expect(fired(r, [2.5, 0, 0, 2.5])).toEqual([]);
    }
  });

  it('WE3 / N6: four of five beyond 1σ on the same side', () => {
    for (const r of ['WE3', 'N6'] as const) {
      expect(fired(r, [1.5, 1.2, 0.4, 1.8, 1.1])).toEqual([4]);
      expect(fired(r, [1.5, 1.2, 0.4, 0.8, 1.1])).toEqual([]);
      expect(fired(r, [1.5, -1.2, 1.4, -1.8, 1.1])).toEqual([]);
    }
  });

  it('WE4: eight in a row on one side, once per run; a point on the centre line breaks it', () => {
    const above = [0.1, 0.4, 0.2, 0.9, 0.3, 0.5, 0.2, 0.6];
    expect(fired('WE4', [-0.5, ...above])).toEqual([8]);
    expect(fired('WE4', [-0.5, ...above, 0.4, 0.3])).toEqual([8]);
    expect(fired('WE4', [...above.slice(0, 4), 0, ...above.slice(4)])).toEqual([]);
    expect(fired('WE4', above.map((v) => -v))).toEqual([7]);
  });

  it('N2: nine in a row on one side (eight are not enough)', () => {
    const eight = [0.1, 0.4, 0.2, 0.9, 0.3, 0.5, 0.2, 0.6];
    expect(fired('N2', eight)).toEqual([]);
    expect(fired('N2', [...eight, 0.7])).toEqual([8]);
  });

  it('N3: six points steadily increasing or decreasing; five are not; a tie breaks the trend', () => {
    expect(fired('N3', [0, 0.1, 0.2, 0.3, 0.4, 0.5])).toEqual([5]);
    expect(fired('N3', [0.5, 0.4, 0.3, 0.2, 0.1])).toEqual([]);
    expect(fired('N3', [0.5, 0.4, 0.3, 0.2, 0.1, 0])).toEqual([5]);
    expect(fired('N3', [0, 0.1, 0.2, 0.2, 0.3, 0.4, 0.5])).toEqual([]);
    expect(evaluateRunRules([0, 0.1, 0.2, 0.3, 0.4, 0.5], unit, ['N3'])[0]!.points).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it('N4: fourteen points alternating up and down; thirteen are not', () => {
    const saw = Array.from({ length: 14 }, (_, i) => (i % 2 ? 0.3 : -0.3));
    expect(fired('N4', saw.slice(0, 13))).toEqual([]);
    expect(fired('N4', saw)).toEqual([13]);
    expect(evaluateRunRules(saw, unit, ['N4'])[0]!.points).toHaveLength(14);
  });

  it('N7: fifteen points in a row within 1σ; one in zone B resets the count', () => {
    const hugging = Array.from({ length: 15 }, (_, i) => (i % 2 ? 0.4 : -0.4));
    expect(fired('N7', hugging)).toEqual([14]);
    expect(fired('N7', [...hugging.slice(0, 7), 1.5, ...hugging.slice(7)])).toEqual([]);
  });

  it('N8: eight in a row beyond 1σ on both sides, none within; all on one side is not this test', () => {
    const mixture = [1.5, -1.5, 1.2, -1.8, 1.4, -1.1, 1.6, -1.3];
    expect(fired('N8', mixture)).toEqual([7]);
    expect(fired('N8', mixture.map(Math.abs))).toEqual([]);
    expect(fired('N8', [...mixture.slice(0, 4), 0.5, ...mixture.slice(4)])).toEqual([]);
  });

  it('the newest point alone gives the same signals as the whole series, with historyNeeded points', () => {
    const series = [0.2, -0.1, 0.4, 0.5, 0.6, 0.8, 1.1, 1.3, 2.1, 2.4, 3.3, 0.2, -0.4, 0.4, -0.4, 0.4];
    const rules = [...WESTERN_ELECTRIC_RULES, ...NELSON_RULES];
    const all = evaluateRunRules(series, unit, rules);
    const h = historyNeeded(rules);
    for (let i = 0; i < series.length; i++) {
      const recent = series.slice(Math.max(0, i + 1 - h), i + 1);
      expect(signalsOnLatest(recent, unit, rules).map((s) => s.rule).sort()).toEqual(all.filter((s) => s.index === i).map((s) => s.rule).sort());
    }
    expect(all.length).toBeGreaterThan(0);
  });
});
