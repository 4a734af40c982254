import type { Env } from '../config/env.js';
import { SWEEP_EVERY_MS } from '../readings/readings.constants.js';

/** The Bull queue that carries every periodic job of the service. */
export const SCHEDULE_QUEUE = 'periodic';

export type PeriodicJobName = 'judge-sweep' | 'import-sweep' | 'relay-sweep' | 'notice-send' | 'digest-send';

export type Repeat = { every: number } | { cron: string; tz: string };

export interface PeriodicJob {
  name: PeriodicJobName;
  repeat: Repeat;
  /** What it does, for logs and DEVELOPERS.md. */
  purpose: string;
  /** Re-queues what Redis lost: run once at once when the schedule is registered again after Redis came back empty. */
  recovers?: true;
}

/**
 * The periodic jobs a deployment runs, from its settings. Each is a Bull repeatable job whose job id
 * is its name: every worker registers the same list at boot and Bull keeps one entry per id, and
 * each period's run has one id (`repeat:<hash>:<time slot>`), so it runs once per period, in one
 * worker, however many workers there are. `every` slots are aligned on the clock (multiples of
 * the interval), so a restart does not reset the period.
 */
export function plannedJobs(env: Pick<Env, 'OUTBOX_RELAY' | 'NOTIFICATIONS' | 'SMTP_URL' | 'NOTIFY_INTERVAL_MS' | 'NOTIFY_DIGEST_CRON' | 'NOTIFY_DIGEST_TZ' | 'NOTIFY_DIGEST_INTERVAL_MS'>): PeriodicJob[] {
  const jobs: PeriodicJob[] = [
    { name: 'judge-sweep', repeat: { every: SWEEP_EVERY_MS }, purpose: 're-queue readings left pending (their judging job was lost)', recovers: true },
    { name: 'import-sweep', repeat: { every: 30_000 }, purpose: 're-queue logger imports whose job was lost', recovers: true },
  ];
  if (env.OUTBOX_RELAY !== 'off') jobs.push({ name: 'relay-sweep', repeat: { every: 15_000 }, purpose: 're-queue webhook deliveries whose job was lost', recovers: true });
  if (env.NOTIFICATIONS !== 'off' && env.SMTP_URL) {
    jobs.push({ name: 'notice-send', repeat: { every: env.NOTIFY_INTERVAL_MS }, purpose: 'send one-by-one rejection e-mails that are due' });
    jobs.push({
      name: 'digest-send',
      repeat: env.NOTIFY_DIGEST_INTERVAL_MS ? { every: env.NOTIFY_DIGEST_INTERVAL_MS } : { cron: env.NOTIFY_DIGEST_CRON, tz: env.NOTIFY_DIGEST_TZ },
      purpose: 'send the daily digest of rejected readings',
    });
  }
  return jobs;
}

/** What Bull reports for a registered repeatable job (getRepeatableJobs). */
export interface RegisteredRepeat {
  key: string;
  name: string;
  id?: string | null;
  cron?: string | null;
  tz?: string | null;
  every?: number | null;
}

/** Registered entries that the plan no longer holds (a changed cadence, a job switched off). */
export function staleRepeats(registered: RegisteredRepeat[], plan: PeriodicJob[]): RegisteredRepeat[] {
  return registered.filter((r) => {
    const p = plan.find((j) => j.name === r.name && r.id === j.name);
    if (!p) return true;
    return 'every' in p.repeat ? r.every !== p.repeat.every || !!r.cron : r.cron !== p.repeat.cron || r.tz !== p.repeat.tz;
  });
}
