import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { KNEX } from '../database/database.module.js';
import type { ChartKind, ControlMetric } from './control.metrics.js';

export const signalsListSpec: ListSpec = {
  resource: 'control-signals',
  sortable: ['raisedAt', 'rule'],
  filters: { chartId: 'eq', rule: 'eq', acknowledged: 'bool', materialSystemId: 'eq', metric: 'eq', batchId: 'eq', raisedAfter: 'gte', raisedBefore: 'lte', id: 'in' },
  defaultSort: ['raisedAt', 'DESC'],
};
const signalColumns = {
  raisedAt: 's.raised_at', rule: 's.rule', chartId: 's.chart_id', materialSystemId: 'c.material_system_id', metric: 'c.metric', batchId: 's.batch_id', raisedAfter: 's.raised_at', raisedBefore: 's.raised_at', id: 's.id',
};

export const chartsListSpec: ListSpec = {
  resource: 'control-charts',
  sortable: ['createdAt', 'name', 'metric'],
  filters: { materialSystemId: 'eq', metric: 'eq', stationId: 'eq', deviceId: 'eq', lotId: 'eq', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
const chartColumns = { createdAt: 'created_at', name: 'name', metric: 'metric', materialSystemId: 'material_system_id', stationId: 'station_id', deviceId: 'device_id', lotId: 'lot_id', id: 'id' };

export interface BaselineRecord {
  method: 'first_n' | 'period';
  /** X̄–R charts: the within-subgroup σ, mean range and most common subgroup size of the baseline. */
  sigmaWithin?: number;
  rBar?: number;
  subgroupSize?: number;
  firstN: number | null;
  from: string | null;
  to: string | null;
  n: number;
  centre: number;
  /** Individuals charts; 0 on X̄–R charts (which keep `sigmaWithin`). */
  mrBar: number;
  sdOverall: number | null;
  firstPointAt: string;
  lastPointAt: string;
  frozenAt: string;
  frozenBy: string | null;
}

export interface ChartRow {
  id: string;
  organization_id: string;
  name: string;
  material_system_id: string;
  metric: ControlMetric;
  kind: ChartKind;
  station_id: string | null;
  device_id: string | null;
  lot_id: string | null;
  rules: string[];
  baseline: BaselineRecord | null;
  created_at: Date;
  created_by_label: string | null;
}

export interface SignalRow {
  id: string;
  organization_id: string;
  chart_id: string;
  rule: string;
  point_id: string;
  reading_id: string | null;
  batch_id: string | null;
  value: number;
  points: { id: string; value: number; at: string; readingId: string | null; batchId: string | null }[];
  raised_at: Date;
  acknowledged_at: Date | null;
  acknowledged_by: string | null;
  acknowledged_by_label: string | null;
  acknowledgement_note: string | null;
  material_system_id: string;
  metric: ControlMetric;
  chart_name: string;
}

export interface PointRow {
  id: string;
  value: number;
  at: Date;
  reading_id: string | null;
  batch_id: string | null;
  cup_test_id: string | null;
  moving_range: number | null;
}

export interface NewPoint {
  organization_id: string;
  material_system_id: string;
  metric: ControlMetric;
  station_id: string | null;
  device_id: string | null;
  lot_a_id: string | null;
  lot_b_id: string | null;
  batch_id: string | null;
  reading_id: string | null;
  cup_test_id: string | null;
  value: number;
  at: Date;
  source_key: string;
}

/** The facts of a judged reading that a chart needs (its batch's system, station, scale, lots, targets). */
export interface ReadingFacts {
  id: string;
  organization_id: string;
  batch_id: string;
  device_id: string;
  quantity: string;
  subject: string;
  status: string;
  value_si: number;
  at: Date;
  material_system_id: string;
  station_id: string | null;
  lot_a_id: string | null;
  lot_b_id: string | null;
  targets: { targets?: { components?: Record<string, { mass?: { value: number } }>; totalMass?: { value: number } } } | null;
}

/** A batch's values on an X̄–R chart, as PostgreSQL groups them. */
export interface SubgroupRow {
  first_id: string;
  batch_id: string;
  n: number;
  mean: number;
  range: number;
  at: Date;
}

type Db = Knex | Knex.Transaction;
type Scope = Pick<ChartRow, 'organization_id' | 'material_system_id' | 'metric' | 'station_id' | 'device_id' | 'lot_id'>;

/** Every Knex query of control charts, their points and signals. */
@Injectable()
export class ControlRepository {
  constructor(@Inject(KNEX) readonly db: Knex) {}

  /** The points a chart covers: its system and metric, narrowed to a station, device or lot. */
  private scoped(db: Db, s: Scope) {
    const q = db('control_points as p').where({ 'p.organization_id': s.organization_id, 'p.material_system_id': s.material_system_id, 'p.metric': s.metric });
    if (s.station_id) q.where('p.station_id', s.station_id);
    if (s.device_id) q.where('p.device_id', s.device_id);
    if (s.lot_id) q.where((w) => w.where('p.lot_a_id', s.lot_id).orWhere('p.lot_b_id', s.lot_id));
    return q;
  }

  /**
   * A read model inside the judging transaction: the readings module calls this module as it stores a
   * verdict, so it cannot be called back through its service (a module cycle); these two queries read
   * the reading, its batch and its device rows where that transaction sees them.
   */
  async readingFacts(trx: Db, readingId: string): Promise<ReadingFacts | undefined> {
    return trx('readings as r')
      .join('batches as b', 'b.id', 'r.batch_id')
      .leftJoin('devices as d', 'd.id', 'r.device_id')
      .where('r.id', readingId)
      .first(
        'r.id', 'r.organization_id', 'r.batch_id', 'r.device_id', 'r.quantity', 'r.subject', 'r.status', 'r.value_si',
        trx.raw('coalesce(r.device_time, r.received_at) as at'),
        'b.material_system_id', trx.raw('coalesce(b.station_id, d.station_id) as station_id'), 'b.lot_a_id', 'b.lot_b_id', 'b.targets',
      );
  }

  /** The newest judged mass of each weighed part of a batch (a re-weigh replaces the first). */
  async latestMasses(trx: Db, batchId: string): Promise<{ subject: string; value_si: number; device_id: string; at: Date }[]> {
    return trx('readings')
      .distinctOn('subject')
      .where({ batch_id: batchId, quantity: 'mass' })
      .whereIn('subject', ['part_a', 'part_b', 'pigment'])
      // a part still pending is being judged beside this one (no lock orders them): its mass counts
      .whereIn('status', ['pending', 'accepted', 'rejected'])
      .orderBy([{ column: 'subject' }, { column: 'received_at', order: 'desc' }])
      .select('subject', 'value_si', 'device_id', trx.raw('coalesce(device_time, received_at) as at'));
  }

  /** Inserts a point or updates a batch's value (a re-weigh); its place in time stays the first. */
  async upsertPoint(trx: Db, p: NewPoint): Promise<{ id: string; at: Date }> {
    const [row] = await trx('control_points').insert(p).onConflict(['metric', 'source_key']).merge(['value']).returning(['id', 'at']);
    return row;
  }

  /** Charts with a frozen baseline whose scope takes this point. */
  async chartsForPoint(trx: Db, p: NewPoint): Promise<ChartRow[]> {
    return trx('control_charts')
      .where({ organization_id: p.organization_id, material_system_id: p.material_system_id, metric: p.metric })
      .whereNotNull('baseline')
      .where((w) => w.whereNull('station_id').orWhere('station_id', p.station_id))
      .where((w) => w.whereNull('device_id').orWhere('device_id', p.device_id))
      .where((w) => w.whereNull('lot_id').orWhereIn('lot_id', [p.lot_a_id, p.lot_b_id].filter((x): x is string => !!x)))
      .select('*');
  }

  /** The `n` points of a chart up to and including one point, oldest first. */
  async pointsUpTo(trx: Db, chart: ChartRow, point: { id: string; at: Date }, n: number): Promise<PointRow[]> {
    const rows = await this.scoped(trx, chart)
      .whereRaw('(p.at, p.id) <= (?, ?)', [point.at, point.id])
      .orderBy([{ column: 'p.at', order: 'desc' }, { column: 'p.id', order: 'desc' }])
      .limit(n)
      .select('p.id', 'p.value', 'p.at', 'p.reading_id', 'p.batch_id', 'p.cup_test_id');
    return rows.reverse();
  }

  /** Up to `n` points of a chart after one point, oldest first (a late judging fills a gap behind them). */
  async pointsAfter(trx: Db, chart: ChartRow, point: { id: string; at: Date }, n: number): Promise<PointRow[]> {
    return this.scoped(trx, chart)
      .whereRaw('(p.at, p.id) > (?, ?)', [point.at, point.id])
      .orderBy([{ column: 'p.at' }, { column: 'p.id' }])
      .limit(n)
      .select('p.id', 'p.value', 'p.at', 'p.reading_id', 'p.batch_id', 'p.cup_test_id');
  }

  /** Serialises rule checks of one chart: each sees the points the one before it committed. */
  async lockChart(trx: Knex.Transaction, id: string): Promise<void> {
    await trx('control_charts').where({ id }).forNoKeyUpdate().first('id');
  }

  async insertSignal(trx: Db, s: Omit<SignalRow, 'id' | 'raised_at' | 'acknowledged_at' | 'acknowledged_by' | 'acknowledged_by_label' | 'acknowledgement_note' | 'material_system_id' | 'metric' | 'chart_name'>): Promise<{ id: string; raised_at: Date } | undefined> {
    const [row] = await trx('control_signals').insert({ ...s, points: JSON.stringify(s.points) }).onConflict(['chart_id', 'rule', 'point_id']).ignore().returning(['id', 'raised_at']);
    return row;
  }

  /**
   * A chart's points in a period (the newest `limit`), each with its moving range, and the
   * period's mean, MR̄ and overall standard deviation: window functions over the chart index.
   */
  async series(chart: ChartRow, from: Date | null, to: Date | null, limit: number): Promise<{ points: PointRow[]; n: number; mean: number | null; mrBar: number | null; sd: number | null }> {
    const inner = this.scoped(this.db, chart)
      .modify((q) => {
        if (from) q.where('p.at', '>=', from);
        if (to) q.where('p.at', '<', to);
      })
      .orderBy([{ column: 'p.at', order: 'desc' }, { column: 'p.id', order: 'desc' }])
      .limit(limit)
      .select('p.id', 'p.value', 'p.at', 'p.reading_id', 'p.batch_id', 'p.cup_test_id');
    const { rows } = (await this.db.raw(
      `WITH pts AS (?),
            ranged AS (SELECT *, abs(value - lag(value) OVER (ORDER BY at, id)) AS moving_range FROM pts)
       SELECT id::text, value, at, reading_id, batch_id, cup_test_id, moving_range,
              count(*) OVER () AS n, avg(value) OVER () AS mean, avg(moving_range) OVER () AS mr_bar, stddev_samp(value) OVER () AS sd
         FROM ranged ORDER BY at, id`,
      [inner],
    )) as { rows: (PointRow & { n: string; mean: number; mr_bar: number | null; sd: number | null })[] };
    const first = rows[0];
    return { points: rows, n: rows.length, mean: first ? Number(first.mean) : null, mrBar: first?.mr_bar ?? null, sd: first?.sd ?? null };
  }

  /**
   * A chart's subgroups (a batch's points; only sizes 2 … 10, which the constants cover), oldest
   * first: the newest `limit` of a period, the first `limit` (`oldest`), or the newest up to and
   * including one batch's subgroup (`upTo`, for the rule check). `left` counts the batches left out.
   */
  async subgroups(db: Db, chart: Scope, pick: { from?: Date | null; to?: Date | null; limit: number; oldest?: boolean; upToBatch?: string }): Promise<{ rows: SubgroupRow[]; left: number }> {
    const inner = this.scoped(db, chart)
      .whereNotNull('p.batch_id')
      .modify((q) => {
        if (pick.from) q.where('p.at', '>=', pick.from);
        if (pick.to) q.where('p.at', '<', pick.to);
      })
      .groupBy('p.batch_id')
      .select('p.batch_id', db.raw('count(*)::int AS n'), db.raw('avg(p.value) AS mean'), db.raw('max(p.value) - min(p.value) AS range'), db.raw('min(p.at) AS at'), db.raw('min(p.id) AS first_id'));
    const upTo = pick.upToBatch ? 'WHERE (g.at, g.first_id) <= (SELECT at, first_id FROM g WHERE batch_id = ?)' : '';
    const order = pick.oldest ? 'ASC' : 'DESC';
    const { rows } = (await db.raw(
      `WITH g AS (?), kept AS (SELECT * FROM g ${upTo ? upTo + ' AND' : 'WHERE'} g.n BETWEEN 2 AND 10)
       SELECT first_id::text, batch_id, n, mean, range, at, (SELECT count(*)::int FROM g WHERE n NOT BETWEEN 2 AND 10) AS left_out
         FROM kept ORDER BY at ${order}, first_id ${order} LIMIT ?`,
      pick.upToBatch ? [inner, pick.upToBatch, pick.limit] : [inner, pick.limit],
    )) as { rows: (SubgroupRow & { left_out: number })[] };
    const out = rows.map((r) => ({ first_id: r.first_id, batch_id: r.batch_id, n: r.n, mean: Number(r.mean), range: Number(r.range), at: r.at }));
    return { rows: pick.oldest ? out : out.reverse(), left: rows[0]?.left_out ?? 0 };
  }

  /** A baseline's figures: the first N points of the chart, or those of a period, in PostgreSQL. */
  async baselineFigures(chart: ChartRow, pick: { firstN?: number; from?: Date; to?: Date }) {
    const inner = this.scoped(this.db, chart)
      .modify((q) => {
        if (pick.from) q.where('p.at', '>=', pick.from);
        if (pick.to) q.where('p.at', '<', pick.to);
        if (pick.firstN) q.limit(pick.firstN);
      })
      .orderBy([{ column: 'p.at' }, { column: 'p.id' }])
      .select('p.id', 'p.value', 'p.at');
    const { rows } = (await this.db.raw(
      `WITH pts AS (?), ranged AS (SELECT *, abs(value - lag(value) OVER (ORDER BY at, id)) AS mr FROM pts)
       SELECT count(*)::int AS n, avg(value) AS centre, avg(mr) AS mr_bar, stddev_samp(value) AS sd, min(at) AS first_at, max(at) AS last_at FROM ranged`,
      [inner],
    )) as { rows: { n: number; centre: number | null; mr_bar: number | null; sd: number | null; first_at: Date | null; last_at: Date | null }[] };
    return rows[0]!;
  }

  async createChart(trx: Db, row: Omit<ChartRow, 'id' | 'created_at' | 'baseline'>): Promise<ChartRow> {
    const [c] = await trx('control_charts').insert(row).returning('*');
    return c;
  }

  async findChart(db: Db, orgId: string, id: string, lock = false): Promise<ChartRow | undefined> {
    const q = db('control_charts').where({ organization_id: orgId, id });
    if (lock) q.forUpdate();
    return q.first();
  }

  async updateChart(trx: Db, id: string, patch: Partial<Pick<ChartRow, 'name' | 'rules'>> & { baseline?: BaselineRecord | null }): Promise<ChartRow> {
    const [c] = await trx('control_charts').where({ id }).update({ ...patch, ...(patch.baseline !== undefined ? { baseline: patch.baseline === null ? null : JSON.stringify(patch.baseline) } : {}) }).returning('*');
    return c;
  }

  listCharts(orgId: string, q: ListQuery) {
    return listPage<ChartRow>(this.db('control_charts').where({ organization_id: orgId }).select('*'), q, chartsListSpec, chartColumns);
  }

  private signals(db: Db, orgId: string) {
    return db('control_signals as s').join('control_charts as c', 'c.id', 's.chart_id').where('s.organization_id', orgId).select('s.*', 'c.material_system_id', 'c.metric', 'c.name as chart_name');
  }

  listSignals(orgId: string, q: ListQuery) {
    const base = this.signals(this.db, orgId);
    const ack = q.filter.acknowledged;
    const rest = { ...q, filter: { ...q.filter } };
    delete rest.filter.acknowledged;
    if (ack === true) base.whereNotNull('s.acknowledged_at');
    if (ack === false) base.whereNull('s.acknowledged_at');
    return listPage<SignalRow>(base, rest, signalsListSpec, signalColumns);
  }

  findSignal(db: Db, orgId: string, id: string, lock = false): Promise<SignalRow | undefined> {
    const q = this.signals(db, orgId).where('s.id', id);
    if (lock) q.forUpdate('s');
    return q.first();
  }

  /** Signals of a chart on the given points (to mark them on the chart). */
  signalsOnPoints(chartId: string, pointIds: string[]): Promise<{ id: string; rule: string; point_id: string; acknowledged_at: Date | null }[]> {
    if (pointIds.length === 0) return Promise.resolve([]);
    return this.db('control_signals').where('chart_id', chartId).whereIn('point_id', pointIds).select('id', 'rule', this.db.raw('point_id::text as point_id'), 'acknowledged_at');
  }

  async acknowledge(trx: Db, id: string, a: { by: string | null; label: string | null; note: string }) {
    await trx('control_signals').where({ id }).update({ acknowledged_at: trx.fn.now(), acknowledged_by: a.by, acknowledged_by_label: a.label, acknowledgement_note: a.note });
  }

}
