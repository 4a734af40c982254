import { Injectable } from '@nestjs/common';
import type { RequestContext } from '../auth/principal.js';
import { malformed } from '../common/problems.js';
import { OverviewRepository } from './overview.repository.js';

export interface OverviewQuery {
  timeZone: string;
  days: number;
  materialSystemId?: string;
}

const RATIO_POINTS = 200;
const round = (x: number, digits: number) => Math.round(x * 10 ** digits) / 10 ** digits;

/** A zone name the runtime knows (IANA); anything else is a 400 naming the parameter. */
function checkTimeZone(timeZone: string): void {
  try {
    new Intl.DateTimeFormat('en', { timeZone });
  } catch {
    throw malformed('Unknown time zone.', [{ pointer: '/timeZone', detail: `"${timeZone}" is not an IANA time zone (e.g. Europe/Lisbon, America/Chicago)`, code: 'format' }]);
  }
}

/** The calendar date of `at` in `timeZone`, YYYY-MM-DD. */
export function dayIn(at: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)!.value;
  return `${get('year')}-${get('month')}-${get('day')}`;
}

/** The instant a calendar day starts in `timeZone` (DST-safe: the zone's offset at that day's noon). */
export function startOfDay(day: string, timeZone: string): Date {
  const noonUtc = new Date(`${day}T12:00:00Z`);
  const local = new Date(noonUtc.toLocaleString('en-US', { timeZone }));
  const utc = new Date(noonUtc.toLocaleString('en-US', { timeZone: 'UTC' }));
  const offsetMs = local.getTime() - utc.getTime();
  return new Date(Date.parse(`${day}T00:00:00Z`) - offsetMs);
}

/** `day` shifted by `n` calendar days. */
export function addDays(day: string, n: number): string {
  const d = new Date(`${day}T12:00:00Z`);
  d.setUTCDate(d.getUTCDate() + n);
  return d.toISOString().slice(0, 10);
}

@Injectable()
export class OverviewService {
  constructor(private readonly repo: OverviewRepository) {}

  async overview(c: RequestContext, q: OverviewQuery, now = new Date()) {
    checkTimeZone(q.timeZone);
    const org = c.principal.organizationId;
    const today = dayIn(now, q.timeZone);
    const first = addDays(today, -(q.days - 1));
    const todayStart = startOfDay(today, q.timeZone);
    const since = startOfDay(first, q.timeZone);
    const [poursToday, readingsToday, openRejections, plannedToday, byDay, systems] = await Promise.all([
      this.repo.poursSince(org, todayStart),
      this.repo.readingsSince(org, todayStart),
      this.repo.openRejections(org),
      this.repo.plannedOn(org, today),
      this.repo.judgedByDay(org, since, q.timeZone),
      this.repo.systemsWithReadings(org, since),
    ]);
    const counted = new Map(byDay.map((r) => [r.day, r]));
    const rejectionRateByDay = Array.from({ length: q.days }, (_, i) => {
      const day = addDays(first, i);
      const r = counted.get(day);
      const judged = r?.judged ?? 0;
      const rejected = r?.rejected ?? 0;
      return { day, judged, rejected, ratePercent: judged ? round((rejected / judged) * 100, 2) : null };
    });
    const judged = rejectionRateByDay.reduce((s, d) => s + d.judged, 0);
    const rejected = rejectionRateByDay.reduce((s, d) => s + d.rejected, 0);

    const systemId = q.materialSystemId ?? systems[0]?.id ?? null;
    const rows = systemId ? await this.repo.ratioPoints(org, systemId, RATIO_POINTS) : [];
    const points = rows
      .filter((r) => r.target_a_kg > 0 && r.target_b_kg > 0)
      .map((r) => ({
        batchId: r.batch_id,
        plannedFor: r.planned_for,
        errorPercent: round((r.mass_a_kg / r.mass_b_kg / (r.target_a_kg / r.target_b_kg) - 1) * 100, 4),
        tolerancePercent: r.tolerance_percent,
        lastReadingAt: r.last_reading_at.toISOString(),
      }))
      .reverse();
    return {
      generatedAt: now.toISOString(),
      timeZone: q.timeZone,
      today,
      days: q.days,
      poursToday,
      plannedToday,
      readingsToday,
      openRejections,
      judged,
      rejected,
      rejectionRatePercent: judged ? round((rejected / judged) * 100, 2) : null,
      rejectionRateByDay,
      ratioError: {
        materialSystemId: points.length || q.materialSystemId ? systemId : null,
        systems,
        points,
        outside: points.filter((p) => Math.abs(p.errorPercent) > p.tolerancePercent + 1e-9).length,
      },
    };
  }
}
