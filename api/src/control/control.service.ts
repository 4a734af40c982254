import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { capability, chartableSubgroup, RUN_RULE_IDS, evaluateRunRules, grandMean, historyNeeded, MOVING_RANGE_CONSTANTS, RUN_RULES, type RunRuleId, subgroupLimits, withinSigma } from '@pourgate/batching';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import type { ListQuery } from '../common/lists/list-query.js';
import { type FieldError, malformed, ProblemException, validationProblem } from '../common/problems.js';
import { KNEX } from '../database/database.module.js';
import { DevicesService } from '../devices/devices.service.js';
import { EventsService } from '../events/events.service.js';
import { LotsService } from '../lots/lots.service.js';
import { MaterialSystemsService } from '../materials/material-systems.service.js';
import { type ChartKind, CONTROL_METRIC_NAMES, CONTROL_METRICS, type ControlMetric, DEFAULT_CHART_POINTS, DEFAULT_RULES, MAX_CHART_POINTS, MIN_BASELINE_POINTS } from './control.metrics.js';
import { type BaselineRecord, type ChartRow, ControlRepository, type NewPoint, type ReadingFacts, type SignalRow, type SubgroupRow } from './control.repository.js';

export interface ChartInput {
  name?: string;
  materialSystemId: string;
  metric: ControlMetric;
  kind?: ChartKind;
  stationId?: string | null;
  deviceId?: string | null;
  lotId?: string | null;
  rules?: RunRuleId[];
}

export interface ChartUpdate {
  name?: string;
  rules?: RunRuleId[];
}

export interface BaselineInput {
  firstN?: number;
  from?: string;
  to?: string;
}

export interface ChartDataQuery {
  from?: string;
  to?: string;
  limit?: string;
}

const ms = (d: Date | string) => new Date(d).toISOString();

type SignalMark = { id: string; rule: RunRuleId; acknowledged: boolean };

/** Subgroups a period's baseline takes at most (a year of batches fits many times over). */
const MAX_BASELINE_SUBGROUPS = 100_000;

/** Points a baseline must hold for the chart's rules to mean anything. */
export function minBaselinePoints(rules: readonly RunRuleId[]): number {
  return Math.max(MIN_BASELINE_POINTS, ...rules.map((r) => RUN_RULES[r].span));
}

function limitsFrom(centre: number, mrBar: number) {
  const { d2, E2, D4 } = MOVING_RANGE_CONSTANTS;
  const sigma = mrBar / d2;
  return {
    centre,
    mrBar: mrBar as number | null,
    sigma,
    ucl: centre + E2 * mrBar,
    lcl: centre - E2 * mrBar,
    mrUcl: (D4 * mrBar) as number | null,
    rBar: null as number | null,
    subgroupSize: null as number | null,
    zones: { oneSigma: [centre - sigma, centre + sigma], twoSigma: [centre - 2 * sigma, centre + 2 * sigma] },
  };
}

/** X̄–R limits drawn for subgroups of n (each subgroup gets its own in the chart data). */
function subgroupLimitsFrom(centre: number, sigma: number, n: number) {
  const l = subgroupLimits(centre, sigma, n);
  const s = l.sigmaMean;
  return {
    centre,
    mrBar: null as number | null,
    sigma,
    ucl: l.ucl,
    lcl: l.lcl,
    mrUcl: null as number | null,
    rBar: l.rCentre as number | null,
    subgroupSize: n as number | null,
    zones: { oneSigma: [centre - s, centre + s], twoSigma: [centre - 2 * s, centre + 2 * s] },
  };
}

/** The most common subgroup size (the larger on a tie): the one a chart's drawn limits are for. */
function commonSize(rows: readonly SubgroupRow[]): number {
  const counts = new Map<number, number>();
  for (const r of rows) counts.set(r.n, (counts.get(r.n) ?? 0) + 1);
  return [...counts].sort((a, b) => b[1] - a[1] || b[0] - a[0])[0]![0];
}

function baselineLimits(c: ChartRow, b: BaselineRecord) {
  return c.kind === 'xbar_r' ? subgroupLimitsFrom(b.centre, b.sigmaWithin!, b.subgroupSize!) : limitsFrom(b.centre, b.mrBar);
}

export function chartView(c: ChartRow) {
  const meta = CONTROL_METRICS[c.metric];
  const b = c.baseline;
  return {
    id: c.id,
    name: c.name,
    materialSystemId: c.material_system_id,
    metric: c.metric,
    kind: c.kind,
    metricLabel: meta.label,
    unit: meta.unit,
    stationId: c.station_id,
    deviceId: c.device_id,
    lotId: c.lot_id,
    rules: c.rules,
    limitsKind: b ? 'frozen' : 'trial',
    baseline: b ? baselineView(c, b) : null,
    createdAt: c.created_at,
    createdBy: c.created_by_label,
  };
}

function baselineView(c: ChartRow, b: BaselineRecord) {
  const { sigmaWithin: _s, rBar: _r, subgroupSize: _n, ...rest } = b;
  return { ...rest, ...baselineLimits(c, b) };
}

export function signalView(s: SignalRow) {
  return {
    id: s.id,
    chartId: s.chart_id,
    chartName: s.chart_name,
    materialSystemId: s.material_system_id,
    metric: s.metric,
    rule: s.rule,
    ruleDescription: RUN_RULES[s.rule as RunRuleId]?.description ?? s.rule,
    value: s.value,
    readingId: s.reading_id,
    batchId: s.batch_id,
    points: s.points,
    raisedAt: s.raised_at,
    acknowledged: s.acknowledged_at !== null,
    acknowledgement: s.acknowledged_at ? { at: s.acknowledged_at, by: s.acknowledged_by_label, note: s.acknowledgement_note } : null,
  };
}

/** Control charts, their baselines, run-rule signals and capability. */
@Injectable()
export class ControlService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: ControlRepository,
    private readonly audit: AuditService,
    private readonly events: EventsService,
    private readonly systems: MaterialSystemsService,
    private readonly devices: DevicesService,
    private readonly lots: LotsService,
  ) {}

  /**
   * Called by the judging job once a reading's verdict is stored, in its transaction: turns the
   * reading into chart points (a temperature as it is; a part's mass into its batch's ratio and shot
   * errors) and checks every frozen chart that takes the point against its rules. A reading judged
   * twice changes nothing: points are keyed by source and signals by (chart, rule, point).
   */
  async evaluateReading(trx: Knex.Transaction, readingId: string): Promise<{ signals: number }> {
    const r = await this.repo.readingFacts(trx, readingId);
    if (!r || (r.status !== 'accepted' && r.status !== 'rejected')) return { signals: 0 };
    return { signals: await this.takePoints(trx, await this.pointsOf(trx, r)) };
  }

  /** In the cup test's transaction: its free-rise density becomes a point of the system's charts. */
  async recordCupTest(trx: Knex.Transaction, t: { id: string; organizationId: string; materialSystemId: string; lotAId: string | null; lotBId: string | null; freeRiseDensityKgM3: number; testedAt: Date | string }): Promise<{ signals: number }> {
    const point: NewPoint = {
      organization_id: t.organizationId, material_system_id: t.materialSystemId, metric: 'free_rise_density_kg_m3', station_id: null, device_id: null,
      lot_a_id: t.lotAId, lot_b_id: t.lotBId, batch_id: null, reading_id: null, cup_test_id: t.id, value: t.freeRiseDensityKgM3, at: new Date(t.testedAt), source_key: t.id,
    };
    return { signals: await this.takePoints(trx, [point]) };
  }

  /**
   * In the transaction that records a demolded part's mass: its molded density becomes a point (one
   * per part; the parts of a batch are one subgroup on an X̄–R chart). A re-weighed part moves its point.
   */
  async recordPartDensity(trx: Knex.Transaction, p: { partId: string; organizationId: string; materialSystemId: string; batchId: string; stationId: string | null; deviceId: string | null; readingId: string | null; lotAId: string | null; lotBId: string | null; densityKgM3: number; at: Date | string }): Promise<{ signals: number }> {
    const point: NewPoint = {
      organization_id: p.organizationId, material_system_id: p.materialSystemId, metric: 'part_density_kg_m3', station_id: p.stationId, device_id: p.deviceId,
      lot_a_id: p.lotAId, lot_b_id: p.lotBId, batch_id: p.batchId, reading_id: p.readingId, cup_test_id: null, value: p.densityKgM3, at: new Date(p.at), source_key: `part:${p.partId}`,
    };
    return { signals: await this.takePoints(trx, [point]) };
  }

  /** Stores points and checks every frozen chart that takes one: its individuals, or its batch's subgroup. */
  private async takePoints(trx: Knex.Transaction, points: NewPoint[]): Promise<number> {
    let raised = 0;
    for (const p of points) {
      const stored = await this.repo.upsertPoint(trx, p);
      for (const chart of await this.repo.chartsForPoint(trx, p)) {
        if (chart.kind !== 'xbar_r') raised += await this.checkRules(trx, chart, stored);
        else if (p.batch_id) raised += await this.checkSubgroupRules(trx, chart, p);
      }
    }
    return raised;
  }

  private async pointsOf(trx: Knex.Transaction, r: ReadingFacts): Promise<NewPoint[]> {
    const base = { organization_id: r.organization_id, material_system_id: r.material_system_id, station_id: r.station_id, device_id: r.device_id, lot_a_id: r.lot_a_id, lot_b_id: r.lot_b_id, batch_id: r.batch_id, cup_test_id: null };
    if (r.quantity === 'temperature' && (r.subject === 'part_a' || r.subject === 'part_b')) {
      const metric: ControlMetric = r.subject === 'part_a' ? 'component_temperature_a_c' : 'component_temperature_b_c';
      return [{ ...base, lot_a_id: r.subject === 'part_a' ? r.lot_a_id : null, lot_b_id: r.subject === 'part_b' ? r.lot_b_id : null, metric, reading_id: r.id, value: Number(r.value_si), at: new Date(r.at), source_key: r.id }];
    }
    if (r.quantity !== 'mass' || !['part_a', 'part_b', 'pigment'].includes(r.subject)) return [];
    const t = r.targets?.targets;
    const targetA = t?.components?.A?.mass?.value;
    const targetB = t?.components?.B?.mass?.value;
    if (!(targetA! > 0) || !(targetB! > 0)) return [];
    const masses = await this.repo.latestMasses(trx, r.batch_id);
    const a = masses.find((m) => m.subject === 'part_a');
    const b = masses.find((m) => m.subject === 'part_b');
    if (!a || !b || !(Number(b.value_si) > 0)) return [];
    const pigment = Number(masses.find((m) => m.subject === 'pigment')?.value_si ?? 0);
    const targetPigment = t?.components?.pigment?.mass?.value ?? 0;
    const targetTotal = t?.totalMass?.value ?? targetA! + targetB! + targetPigment;
    const at = new Date(Math.max(new Date(a.at).getTime(), new Date(b.at).getTime()));
    const ratioError = ((Number(a.value_si) / Number(b.value_si)) / (targetA! / targetB!) - 1) * 100;
    const shotError = ((Number(a.value_si) + Number(b.value_si) + pigment) / targetTotal - 1) * 100;
    const batchPoint = { ...base, reading_id: r.id, at, device_id: r.device_id };
    return [
      { ...batchPoint, metric: 'ratio_error_percent', value: ratioError, source_key: r.batch_id },
      { ...batchPoint, metric: 'shot_mass_error_percent', value: shotError, source_key: r.batch_id },
    ];
  }

  /**
   * Checks a chart's rules on a new point and on the points after it: judgings run side by side, so
   * a point may be stored after later ones and complete a pattern that ends on one of them.
   */
  private async checkRules(trx: Knex.Transaction, chart: ChartRow, point: { id: string; at: Date }): Promise<number> {
    const b = chart.baseline!;
    const rules = chart.rules as RunRuleId[];
    await this.repo.lockChart(trx, chart.id);
    const h = historyNeeded(rules);
    const before = await this.repo.pointsUpTo(trx, chart, point, h);
    const after = await this.repo.pointsAfter(trx, chart, point, h);
    const series = [...before, ...after];
    const from = before.length - 1;
    const limits = limitsFrom(b.centre, b.mrBar);
    let n = 0;
    for (const s of evaluateRunRules(series.map((p) => Number(p.value)), limits, rules)) {
      if (s.index < from) continue;
      const last = series[s.index]!;
      const points = s.points.map((i) => series[i]!).map((p) => ({ id: String(p.id), value: Number(p.value), at: ms(p.at), readingId: p.reading_id, batchId: p.batch_id }));
      const row = await this.repo.insertSignal(trx, { organization_id: chart.organization_id, chart_id: chart.id, rule: s.rule, point_id: String(last.id), reading_id: last.reading_id, batch_id: last.batch_id, value: Number(last.value), points });
      if (!row) continue;
      n++;
      await this.emitDrift(trx, chart, row.id, s.rule, { readingId: last.reading_id, batchId: last.batch_id, value: Number(last.value), centre: limits.centre, ucl: limits.ucl, lcl: limits.lcl });
    }
    return n;
  }

  /**
   * An X̄–R chart's rules on the subgroup of the point's batch: each mean standardised against its
   * own limits (σ/√n), so subgroups of different sizes share one scale of zones. The subgroup is
   * checked as it grows (a new value of the batch can complete a pattern); a signal is raised once
   * per rule and subgroup.
   */
  private async checkSubgroupRules(trx: Knex.Transaction, chart: ChartRow, p: NewPoint): Promise<number> {
    const b = chart.baseline!;
    const rules = chart.rules as RunRuleId[];
    await this.repo.lockChart(trx, chart.id);
    const { rows } = await this.repo.subgroups(trx, chart, { limit: historyNeeded(rules), upToBatch: p.batch_id! });
    const last = rows[rows.length - 1];
    // the batch's subgroup is not chartable yet (one value so far) or no longer (more than ten)
    if (!last || last.batch_id !== p.batch_id) return 0;
    const sigmaOf = (g: SubgroupRow) => subgroupLimits(b.centre, b.sigmaWithin!, g.n).sigmaMean;
    const z = rows.map((g) => (g.mean - b.centre) / sigmaOf(g));
    let n = 0;
    for (const s of evaluateRunRules(z, { centre: 0, sigma: 1 }, rules)) {
      if (s.index !== rows.length - 1) continue;
      const points = s.points.map((i) => rows[i]!).map((g) => ({ id: g.first_id, value: g.mean, at: ms(g.at), readingId: null, batchId: g.batch_id }));
      const row = await this.repo.insertSignal(trx, { organization_id: chart.organization_id, chart_id: chart.id, rule: s.rule, point_id: last.first_id, reading_id: p.reading_id, batch_id: last.batch_id, value: last.mean, points });
      if (!row) continue;
      n++;
      const own = subgroupLimits(b.centre, b.sigmaWithin!, last.n);
      await this.emitDrift(trx, chart, row.id, s.rule, { readingId: p.reading_id, batchId: last.batch_id, value: last.mean, centre: b.centre, ucl: own.ucl, lcl: own.lcl });
    }
    return n;
  }

  private async emitDrift(trx: Knex.Transaction, chart: ChartRow, signalId: string, rule: RunRuleId, at: { readingId: string | null; batchId: string | null; value: number; centre: number; ucl: number; lcl: number }): Promise<void> {
    await this.events.emit(trx, {
      organizationId: chart.organization_id,
      type: 'drift.detected',
      subjectType: 'control_signal',
      subjectId: signalId,
      data: { signalId, chartId: chart.id, chartName: chart.name, materialSystemId: chart.material_system_id, metric: chart.metric, rule, ruleDescription: RUN_RULES[rule].description, ...at },
    });
  }

  private async checkScope(c: RequestContext, body: ChartInput): Promise<void> {
    const orgId = c.principal.organizationId;
    const errors: FieldError[] = [];
    // each reference through the module that owns it
    const known: Record<'materialSystemId' | 'stationId' | 'deviceId' | 'lotId', (id: string) => Promise<boolean>> = {
      materialSystemId: async (id) => !!(await this.systems.revision(orgId, id)),
      stationId: (id) => this.devices.stationExists(orgId, id),
      deviceId: async (id) => (await this.devices.existingIds(orgId, [id])).has(id),
      lotId: async (id) => (await this.lots.rows(orgId, [id])).has(id),
    };
    for (const [field, exists] of Object.entries(known) as [keyof typeof known, (id: string) => Promise<boolean>][]) {
      const id = body[field];
      if (id && !(await exists(id))) errors.push({ pointer: `/${field}`, detail: 'nothing with that id in your organization', code: 'reference' });
    }
    if ([body.stationId, body.deviceId, body.lotId].filter(Boolean).length > 1) errors.push({ pointer: '/stationId', detail: 'a chart narrows to one of station, device or lot', code: 'conflicting' });
    if (body.kind === 'xbar_r' && !CONTROL_METRICS[body.metric].subgroups) {
      errors.push({ pointer: '/kind', detail: `a batch gives one ${CONTROL_METRICS[body.metric].label.toLowerCase()} value (one per ${CONTROL_METRICS[body.metric].per}), so it has no subgroups: chart it as individuals`, code: 'conflicting' });
    }
    if (body.lotId && body.metric === 'free_rise_density_kg_m3') errors.push({ pointer: '/lotId', detail: 'cup-test density is charted per system', code: 'conflicting' });
    if (errors.length) throw validationProblem(errors);
  }

  /** The metrics, chart kinds and run rules, in words, for a console or an integrator defining a chart. */
  catalogue() {
    return {
      metrics: CONTROL_METRIC_NAMES.map((metric) => {
        const m = CONTROL_METRICS[metric];
        return { metric, label: m.label, unit: m.unit, per: m.per, kinds: m.subgroups ? ['individuals', 'xbar_r'] : ['individuals'] };
      }),
      rules: RUN_RULE_IDS.map((rule) => ({ rule, source: RUN_RULES[rule].source, description: RUN_RULES[rule].description, span: RUN_RULES[rule].span })),
      defaultRules: DEFAULT_RULES,
      minBaselinePoints: minBaselinePoints(DEFAULT_RULES),
    };
  }

  async createChart(c: RequestContext, body: ChartInput) {
    await this.checkScope(c, body);
    const actor = actorOf(c.principal);
    const rules = [...new Set(body.rules ?? DEFAULT_RULES)];
    return this.db.transaction(async (trx) => {
      const row = await this.repo.createChart(trx, {
        organization_id: c.principal.organizationId,
        name: body.name?.trim() || CONTROL_METRICS[body.metric].label,
        material_system_id: body.materialSystemId,
        metric: body.metric,
        kind: body.kind ?? 'individuals',
        station_id: body.stationId ?? null,
        device_id: body.deviceId ?? null,
        lot_id: body.lotId ?? null,
        rules,
        created_by_label: actor.actorLabel,
      });
      await this.audit.record({ organizationId: row.organization_id, ...actor, action: 'control_chart.created', targetType: 'control_chart', targetId: row.id, details: { metric: row.metric, kind: row.kind, rules }, ip: c.ip, userAgent: c.userAgent }, trx);
      return chartView(row);
    });
  }

  private async chart(c: RequestContext, id: string, trx?: Knex.Transaction): Promise<ChartRow> {
    const row = await this.repo.findChart(trx ?? this.db, c.principal.organizationId, id, !!trx);
    if (!row) throw new ProblemException(404, { detail: 'No control chart with that id in your organization.' });
    return row;
  }

  async getChart(c: RequestContext, id: string) {
    return chartView(await this.chart(c, id));
  }

  async listCharts(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.listCharts(c.principal.organizationId, q);
    return { rows: rows.map(chartView), total };
  }

  async updateChart(c: RequestContext, id: string, body: ChartUpdate) {
    const actor = actorOf(c.principal);
    return this.db.transaction(async (trx) => {
      const chart = await this.chart(c, id, trx);
      const rules = body.rules ? [...new Set(body.rules)] : undefined;
      if (rules && chart.baseline && chart.baseline.n < minBaselinePoints(rules)) {
        throw validationProblem([{ pointer: '/rules', detail: `the frozen baseline holds ${chart.baseline.n} points; these rules need ${minBaselinePoints(rules)}`, code: 'minimum' }]);
      }
      const row = await this.repo.updateChart(trx, chart.id, { ...(body.name ? { name: body.name.trim() } : {}), ...(rules ? { rules } : {}) });
      await this.audit.record({ organizationId: chart.organization_id, ...actor, action: 'control_chart.changed', targetType: 'control_chart', targetId: chart.id, details: { ...body }, ip: c.ip, userAgent: c.userAgent }, trx);
      return chartView(row);
    });
  }

  /** Freezes limits from the first N points or from a period; too few points is a 422 and nothing changes. */
  async freezeBaseline(c: RequestContext, id: string, body: BaselineInput) {
    const errors: FieldError[] = [];
    const hasN = body.firstN !== undefined;
    const hasPeriod = body.from !== undefined || body.to !== undefined;
    if (hasN === hasPeriod) errors.push({ pointer: '/firstN', detail: 'give either firstN or a period (from and to)', code: 'oneOf' });
    const from = body.from ? new Date(body.from) : undefined;
    const to = body.to ? new Date(body.to) : undefined;
    if (hasPeriod && (!from || !to)) errors.push({ pointer: from ? '/to' : '/from', detail: 'a period needs both from and to', code: 'required' });
    if (from && to && !(from < to)) errors.push({ pointer: '/to', detail: 'must be after from (the period is empty)', code: 'minimum' });
    if (errors.length) throw validationProblem(errors);
    const actor = actorOf(c.principal);
    return this.db.transaction(async (trx) => {
      const chart = await this.chart(c, id, trx);
      const need = minBaselinePoints(chart.rules as RunRuleId[]);
      const how = { method: hasN ? ('first_n' as const) : ('period' as const), firstN: body.firstN ?? null, from: from ? from.toISOString() : null, to: to ? to.toISOString() : null, frozenAt: new Date().toISOString(), frozenBy: actor.actorLabel };
      const baseline = chart.kind === 'xbar_r' ? await this.subgroupBaseline(trx, chart, need, hasN ? { firstN: body.firstN! } : { from: from!, to: to! }, how) : await this.individualsBaseline(chart, need, hasN ? { firstN: body.firstN! } : { from: from!, to: to! }, how);
      const row = await this.repo.updateChart(trx, chart.id, { baseline });
      await this.audit.record({ organizationId: chart.organization_id, ...actor, action: 'control_chart.baseline_frozen', targetType: 'control_chart', targetId: chart.id, details: { ...baseline }, ip: c.ip, userAgent: c.userAgent }, trx);
      return chartView(row);
    });
  }

  private async individualsBaseline(chart: ChartRow, need: number, pick: { firstN: number } | { from: Date; to: Date }, how: Pick<BaselineRecord, 'method' | 'firstN' | 'from' | 'to' | 'frozenAt' | 'frozenBy'>): Promise<BaselineRecord> {
    const hasN = 'firstN' in pick;
    {
      const f = await this.repo.baselineFigures(chart, pick);
      if (f.n < need || f.centre === null || f.mr_bar === null) {
        throw validationProblem([{ pointer: hasN ? '/firstN' : '/from', detail: `the baseline would hold ${f.n} points; this chart's rules need at least ${need}`, code: 'minimum' }], 'Too few points for a baseline.');
      }
      if (hasN && f.n < pick.firstN) {
        throw validationProblem([{ pointer: '/firstN', detail: `the chart has only ${f.n} points so far`, code: 'maximum' }], 'Too few points for a baseline.');
      }
      return { ...how, n: f.n, centre: Number(f.centre), mrBar: Number(f.mr_bar), sdOverall: f.sd === null ? null : Number(f.sd), firstPointAt: ms(f.first_at!), lastPointAt: ms(f.last_at!) };
    }
  }

  /** An X̄–R baseline: the first N subgroups (batches) or those of a period; x̿ and σ from their means and ranges. */
  private async subgroupBaseline(trx: Knex.Transaction, chart: ChartRow, need: number, pick: { firstN: number } | { from: Date; to: Date }, how: Pick<BaselineRecord, 'method' | 'firstN' | 'from' | 'to' | 'frozenAt' | 'frozenBy'>): Promise<BaselineRecord> {
    const hasN = 'firstN' in pick;
    const { rows } = await this.repo.subgroups(trx, chart, hasN ? { limit: pick.firstN, oldest: true } : { from: pick.from, to: pick.to, limit: MAX_BASELINE_SUBGROUPS, oldest: true });
    if (rows.length < need) {
      throw validationProblem([{ pointer: hasN ? '/firstN' : '/from', detail: `the baseline would hold ${rows.length} subgroups (batches with 2 to 10 values); this chart's rules need at least ${need}`, code: 'minimum' }], 'Too few subgroups for a baseline.');
    }
    if (hasN && rows.length < pick.firstN) {
      throw validationProblem([{ pointer: '/firstN', detail: `the chart has only ${rows.length} subgroups so far`, code: 'maximum' }], 'Too few subgroups for a baseline.');
    }
    const rBar = rows.reduce((t, g) => t + g.range, 0) / rows.length;
    return {
      ...how, n: rows.length, centre: grandMean(rows), mrBar: 0, sigmaWithin: withinSigma(rows), rBar, subgroupSize: commonSize(rows), sdOverall: null,
      firstPointAt: ms(rows[0]!.at), lastPointAt: ms(rows[rows.length - 1]!.at),
    };
  }

  /** The chart's points, moving ranges, limits (frozen, or trial from the points shown), signals and capability. */
  async chartData(c: RequestContext, id: string, q: ChartDataQuery) {
    const chart = await this.chart(c, id);
    const errors: FieldError[] = [];
    const date = (name: 'from' | 'to') => {
      const v = q[name];
      if (v === undefined) return null;
      const d = new Date(v);
      if (Number.isNaN(d.getTime())) errors.push({ pointer: `/${name}`, detail: 'must be an ISO 8601 date-time', code: 'format' });
      return d;
    };
    const from = date('from');
    const to = date('to');
    const limit = q.limit === undefined ? DEFAULT_CHART_POINTS : Number(q.limit);
    if (!Number.isInteger(limit) || limit < 2 || limit > MAX_CHART_POINTS) errors.push({ pointer: '/limit', detail: `must be an integer from 2 to ${MAX_CHART_POINTS}`, code: 'range' });
    if (from && to && !(from < to)) errors.push({ pointer: '/to', detail: 'must be after from (the period is empty)', code: 'minimum' });
    if (errors.length) throw malformed('The chart query is not valid.', errors);
    const s = await this.repo.series(chart, from, to, limit);
    const frozen = chart.baseline;
    const warnings: string[] = [];
    const xbar = chart.kind === 'xbar_r' ? await this.subgroupData(chart, from, to, limit, warnings) : null;
    const limits = xbar ? xbar.limits : frozen ? limitsFrom(frozen.centre, frozen.mrBar) : s.mean !== null && s.mrBar !== null ? limitsFrom(s.mean, Number(s.mrBar)) : null;
    const byPoint = xbar ? new Map<string, SignalMark[]>() : await this.marksOn(chart.id, s.points.map((p) => String(p.id)));
    const values = s.points.map((p) => Number(p.value));
    const spec = await this.specLimits(c, chart);
    if (!frozen) warnings.push(`trial limits: computed from the ${xbar ? 'subgroups' : 'points'} shown; freeze a baseline to watch the process against fixed limits`);
    return {
      chart: chartView(chart),
      limitsKind: frozen ? 'frozen' : 'trial',
      limits,
      subgroups: xbar ? xbar.subgroups : null,
      points: s.points.map((p) => ({
        id: String(p.id),
        value: Number(p.value),
        movingRange: p.moving_range === null ? null : Number(p.moving_range),
        at: ms(p.at),
        readingId: p.reading_id,
        batchId: p.batch_id,
        cupTestId: p.cup_test_id,
        signals: byPoint.get(String(p.id)) ?? [],
      })),
      summary: { n: s.n, mean: s.mean, mrBar: xbar || s.mrBar === null ? null : Number(s.mrBar), sdOverall: s.sd === null ? null : Number(s.sd), subgroups: xbar ? xbar.subgroups.length : null },
      specification: spec,
      capability: values.length && limits ? capability(values, spec, limits.sigma) : null,
      warnings,
    };
  }

  private async marksOn(chartId: string, pointIds: string[]): Promise<Map<string, SignalMark[]>> {
    const byPoint = new Map<string, SignalMark[]>();
    for (const m of await this.repo.signalsOnPoints(chartId, pointIds)) byPoint.set(m.point_id, [...(byPoint.get(m.point_id) ?? []), { id: m.id, rule: m.rule as RunRuleId, acknowledged: m.acknowledged_at !== null }]);
    return byPoint;
  }

  /** An X̄–R chart's subgroups in the period, each with its own limits (frozen, or trial from those shown). */
  private async subgroupData(chart: ChartRow, from: Date | null, to: Date | null, limit: number, warnings: string[]) {
    const g = await this.repo.subgroups(this.db, chart, { from, to, limit });
    const b = chart.baseline;
    const basis = b ? { centre: b.centre, sigma: b.sigmaWithin!, n: b.subgroupSize! } : g.rows.length >= 2 ? { centre: grandMean(g.rows), sigma: withinSigma(g.rows), n: commonSize(g.rows) } : null;
    if (g.left) warnings.push(`${g.left} batch${g.left === 1 ? '' : 'es'} left out of the subgroups: a subgroup needs 2 to 10 values`);
    const marks = await this.marksOn(chart.id, g.rows.map((r) => r.first_id));
    const subgroups = g.rows.map((r) => {
      const l = basis && chartableSubgroup(r.n) ? subgroupLimits(basis.centre, basis.sigma, r.n) : null;
      return { id: r.first_id, batchId: r.batch_id, n: r.n, mean: r.mean, range: r.range, at: ms(r.at), ucl: l?.ucl ?? null, lcl: l?.lcl ?? null, rCentre: l?.rCentre ?? null, rUcl: l?.rUcl ?? null, rLcl: l?.rLcl ?? null, signals: marks.get(r.first_id) ?? [] };
    });
    return { subgroups, limits: basis ? subgroupLimitsFrom(basis.centre, basis.sigma, basis.n) : null };
  }

  /** The system's tolerance as specification limits of the chart's metric (null when it has none). */
  private async specLimits(c: RequestContext, chart: ChartRow): Promise<{ lsl: number | null; usl: number | null }> {
    const t = ((await this.systems.revision(c.principal.organizationId, chart.material_system_id)) ?? {}) as Record<string, unknown>;
    const num = (k: string) => (t[k] === null || t[k] === undefined ? null : Number(t[k]));
    switch (chart.metric) {
      case 'ratio_error_percent':
      case 'shot_mass_error_percent': {
        const tol = num('ratio_tolerance_percent');
        return tol === null ? { lsl: null, usl: null } : { lsl: -tol, usl: tol };
      }
      case 'component_temperature_a_c':
      case 'component_temperature_b_c':
        return { lsl: num('component_temperature_min_c'), usl: num('component_temperature_max_c') };
      case 'free_rise_density_kg_m3':
        return { lsl: num('free_rise_density_min_kg_m3'), usl: num('free_rise_density_max_kg_m3') };
      case 'part_density_kg_m3':
        return { lsl: null, usl: null };
    }
  }

  /** The chart's points as CSV (one row per point: time, value, moving range, limits, signals). */
  async chartCsv(c: RequestContext, id: string, q: ChartDataQuery): Promise<string> {
    const d = await this.chartData(c, id, q);
    const head = ['at', 'value', 'moving_range', 'centre', 'lcl', 'ucl', 'limits', 'signals', 'reading_id', 'batch_id'];
    const lines = d.points.map((p) => [p.at, p.value, p.movingRange ?? '', d.limits?.centre ?? '', d.limits?.lcl ?? '', d.limits?.ucl ?? '', d.limitsKind, p.signals.map((s) => s.rule).join(' '), p.readingId ?? '', p.batchId ?? ''].join(','));
    return [head.join(','), ...lines].join('\r\n') + '\r\n';
  }

  async listSignals(c: RequestContext, q: ListQuery) {
    const { rows, total } = await this.repo.listSignals(c.principal.organizationId, q);
    return { rows: rows.map(signalView), total };
  }

  async getSignal(c: RequestContext, id: string) {
    const s = await this.repo.findSignal(this.db, c.principal.organizationId, id);
    if (!s) throw new ProblemException(404, { detail: 'No signal with that id in your organization.' });
    return signalView(s);
  }

  /** An engineer has looked into a signal: the note says what was found (audited, and an event). */
  async acknowledge(c: RequestContext, id: string, body: { note: string }) {
    const note = body.note?.trim();
    if (!note) throw validationProblem([{ pointer: '/note', detail: 'say what was found or done', code: 'required' }]);
    const actor = actorOf(c.principal);
    await this.db.transaction(async (trx) => {
      const s = await this.repo.findSignal(trx, c.principal.organizationId, id, true);
      if (!s) throw new ProblemException(404, { detail: 'No signal with that id in your organization.' });
      if (s.acknowledged_at) throw new ProblemException(409, { slug: 'conflict', detail: `This signal was already acknowledged by ${s.acknowledged_by_label ?? 'someone'}.` });
      await this.repo.acknowledge(trx, id, { by: actor.actorId, label: actor.actorLabel, note });
      await this.events.emit(trx, {
        organizationId: s.organization_id,
        type: 'drift.acknowledged',
        subjectType: 'control_signal',
        subjectId: id,
        data: { signalId: id, chartId: s.chart_id, materialSystemId: s.material_system_id, metric: s.metric, rule: s.rule, note, acknowledgedBy: actor.actorLabel },
      });
      await this.audit.record({ organizationId: s.organization_id, ...actor, action: 'control_signal.acknowledged', targetType: 'control_signal', targetId: id, details: { note, chartId: s.chart_id, rule: s.rule }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return this.getSignal(c, id);
  }
}
