import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.module.js';

export interface DayCountRow {
  day: string;
  judged: number;
  rejected: number;
}

export interface RatioPointRow {
  batch_id: string;
  material_system_id: string;
  planned_for: string;
  mass_a_kg: number;
  mass_b_kg: number;
  target_a_kg: number;
  target_b_kg: number;
  tolerance_percent: number;
  last_reading_at: Date;
}

/**
 * The overview is a read model: figures counted in PostgreSQL over the readings and batches of one
 * organization, exact at any volume (indexed by organization, status and time). It writes nothing.
 * Days are calendar days in the caller's time zone (`AT TIME ZONE`), so "today" is the shop's today.
 */
@Injectable()
export class OverviewRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /** Batches with at least one settled mass reading received since the zone's midnight. */
  async poursSince(organizationId: string, since: Date): Promise<number> {
    const r = await this.db('readings').where({ organization_id: organizationId, quantity: 'mass', stable: true }).where('received_at', '>=', since).countDistinct({ n: 'batch_id' }).first();
    return Number(r?.n ?? 0);
  }

  async readingsSince(organizationId: string, since: Date): Promise<number> {
    const r = await this.db('readings').where({ organization_id: organizationId }).where('received_at', '>=', since).count({ n: '*' }).first();
    return Number(r?.n ?? 0);
  }

  /**
   * Rejected readings nobody has waived or upheld yet, whenever they came in: the exact figure kept
   * with every verdict and review (reading_rejection_counts, migration 0031), one row to read.
   */
  async openRejections(organizationId: string): Promise<number> {
    const r = await this.db('reading_rejection_counts').where({ organization_id: organizationId, reason_code: '' }).first('open');
    return Number(r?.open ?? 0);
  }

  async plannedOn(organizationId: string, day: string): Promise<number> {
    const r = await this.db('batches').where({ organization_id: organizationId, planned_for: day }).count({ n: '*' }).first();
    return Number(r?.n ?? 0);
  }

  /** Judged (accepted or rejected) and rejected readings per calendar day of `timeZone`, from `since`. */
  async judgedByDay(organizationId: string, since: Date, timeZone: string): Promise<DayCountRow[]> {
    const rows = await this.db('readings')
      .where({ organization_id: organizationId })
      .whereIn('status', ['accepted', 'rejected'])
      .where('received_at', '>=', since)
      .select(this.db.raw("to_char(received_at AT TIME ZONE ?, 'YYYY-MM-DD') AS day", [timeZone]))
      .select(this.db.raw('count(*)::int AS judged'))
      .select(this.db.raw("count(*) FILTER (WHERE status = 'rejected')::int AS rejected"))
      .groupBy('day')
      .orderBy('day');
    return rows as DayCountRow[];
  }

  /**
   * The A:B ratio error of the latest batches of one material system with both parts weighed: the
   * latest settled, judged (not `unused`) mass of each part against the batch's stored target masses.
   */
  async ratioPoints(organizationId: string, materialSystemId: string, limit: number): Promise<RatioPointRow[]> {
    const { rows } = await this.db.raw<{ rows: RatioPointRow[] }>(
      `WITH latest AS (
         SELECT DISTINCT ON (r.batch_id, r.subject) r.batch_id, r.subject, r.value_si, r.received_at
           FROM readings r
           JOIN batches b ON b.id = r.batch_id
          WHERE r.organization_id = :org AND b.material_system_id = :system
            AND r.quantity = 'mass' AND r.stable AND r.status IN ('accepted', 'rejected')
            AND r.subject IN ('part_a', 'part_b')
          ORDER BY r.batch_id, r.subject, r.received_at DESC, r.id DESC
       )
       SELECT b.id AS batch_id, b.material_system_id, to_char(b.planned_for, 'YYYY-MM-DD') AS planned_for,
              a.value_si AS mass_a_kg, bb.value_si AS mass_b_kg,
              (b.targets #>> '{targets,components,A,mass,value}')::float8 AS target_a_kg,
              (b.targets #>> '{targets,components,B,mass,value}')::float8 AS target_b_kg,
              COALESCE((b.targets #>> '{targets,ratioTolerancePercent}')::float8, 5) AS tolerance_percent,
              GREATEST(a.received_at, bb.received_at) AS last_reading_at
         FROM batches b
         JOIN latest a ON a.batch_id = b.id AND a.subject = 'part_a'
         JOIN latest bb ON bb.batch_id = b.id AND bb.subject = 'part_b'
        WHERE b.organization_id = :org AND b.material_system_id = :system AND bb.value_si > 0
        ORDER BY last_reading_at DESC
        LIMIT :limit`,
      { org: organizationId, system: materialSystemId, limit },
    );
    return rows;
  }

  /** The material systems with readings, most recently weighed first: the chart's choices. */
  async systemsWithReadings(organizationId: string, since: Date): Promise<Array<{ id: string; name: string }>> {
    return this.db('material_systems as s')
      .where('s.organization_id', organizationId)
      .whereExists(
        this.db('batches as b')
          .join('readings as r', 'r.batch_id', 'b.id')
          .whereRaw('b.material_system_id = s.id')
          .where('r.received_at', '>=', since)
          .where('r.quantity', 'mass')
          .select(this.db.raw('1')),
      )
      .select('s.id', 's.name')
      .orderBy('s.name');
  }
}
