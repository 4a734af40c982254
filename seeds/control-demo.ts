import type { Knex } from 'knex';
import { evaluateRunRules, individualsLimits, type RunRuleId, WESTERN_ELECTRIC_RULES } from '@pourgate/batching';

const SEEDED_BY = 'demo seed';
const CHART_NAME = 'Bench 2 ratio error';
const BASELINE_POINTS = 25;

/**
 * The invented ratio errors (%) of bench 2: 25 steady batches, then a scale creeping heavy on part A
 * by about 0.12 % a batch. Invented numbers (demo data).
 */
export function bench2RatioErrors(): number[] {
  return Array.from({ length: 40 }, (_, i) => {
    const noise = 0.4 * Math.sin(i * 1.7) + 0.25 * Math.cos(i * 2.9);
    const drift = i >= BASELINE_POINTS ? 0.12 * (i - BASELINE_POINTS + 1) : 0;
    return Math.round((noise + drift) * 1000) / 1000;
  });
}

/**
 * A drifting station for the control charts: bench 2 of the demo shop, a ratio-error chart with a
 * baseline frozen on its first 25 batches, and the signals its Western Electric rules raised as the
 * drift came in. Idempotent: nothing is added when the chart exists.
 */
export async function seedControlDemo(db: Knex, orgId: string): Promise<number> {
  const system = await db('material_systems').where({ organization_id: orgId, name: 'Demo Flex 28' }).first('id');
  if (!system) return 0;
  if (await db('control_charts').where({ organization_id: orgId, name: CHART_NAME }).first('id')) return 0;
  let station = await db('stations').where({ organization_id: orgId, code: 'DEMO-B2' }).first('id');
  if (!station) [station] = await db('stations').insert({ organization_id: orgId, code: 'DEMO-B2', name: 'Bench 2' }).returning('id');

  const values = bench2RatioErrors();
  const start = Date.now() - (values.length + 3) * 20 * 60_000;
  const points: { id: string; value: number; at: Date }[] = [];
  for (const [i, value] of values.entries()) {
    const at = new Date(start + i * 20 * 60_000);
    const [p] = await db('control_points')
      .insert({ organization_id: orgId, material_system_id: system.id, metric: 'ratio_error_percent', station_id: station.id, value, at, source_key: `demo-bench2-${orgId}-${i}` })
      .onConflict(['metric', 'source_key'])
      .merge(['value'])
      .returning(['id', 'value', 'at']);
    points.push({ id: String(p.id), value: Number(p.value), at: new Date(p.at) });
  }

  const base = individualsLimits(values.slice(0, BASELINE_POINTS));
  const rules: RunRuleId[] = WESTERN_ELECTRIC_RULES;
  const baseline = {
    method: 'first_n', firstN: BASELINE_POINTS, from: null, to: null, n: BASELINE_POINTS, centre: base.centre, mrBar: base.mrBar, sdOverall: null,
    firstPointAt: points[0]!.at.toISOString(), lastPointAt: points[BASELINE_POINTS - 1]!.at.toISOString(), frozenAt: points[BASELINE_POINTS - 1]!.at.toISOString(), frozenBy: SEEDED_BY,
  };
  const [chart] = await db('control_charts')
    .insert({ organization_id: orgId, name: CHART_NAME, material_system_id: system.id, metric: 'ratio_error_percent', station_id: station.id, rules, baseline: JSON.stringify(baseline), created_by_label: SEEDED_BY })
    .returning('id');

  // the signals the judging job would have raised as each batch came in after the baseline
  let added = 2 + values.length;
  for (const s of evaluateRunRules(values, base, rules)) {
    if (s.index < BASELINE_POINTS) continue;
    const last = points[s.index]!;
    await db('control_signals').insert({
      organization_id: orgId, chart_id: chart.id, rule: s.rule, point_id: last.id, value: last.value, raised_at: last.at,
      points: JSON.stringify(s.points.map((i) => ({ id: points[i]!.id, value: points[i]!.value, at: points[i]!.at.toISOString(), readingId: null, batchId: null }))),
    });
    added++;
  }
  return added;
}
