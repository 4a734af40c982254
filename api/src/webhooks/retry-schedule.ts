/**
 * The retry schedule of the Standard Webhooks specification: immediately, then after 5 s, 5 min,
 * 30 min, 2 h, 5 h, 10 h, 14 h, 20 h and 24 h (WEBHOOK_RETRY_SCHEDULE, seconds, comma-separated;
 * tests compress it). Each wait gets ±20 % jitter so a recovering receiver is not hit in lockstep.
 */
export function parseSchedule(spec: string): number[] {
  return spec.split(',').map((s) => Number(s.trim()) * 1000);
}

/** Delay before attempt number `attempt + 1` (1-based attempts already made). */
export function retryDelay(schedule: number[], attemptsMade: number, retryAfterMs: number | null, random = Math.random): number {
  const base = schedule[Math.min(attemptsMade, schedule.length - 1)] ?? 0;
  const jittered = Math.round(base * (0.8 + 0.4 * random()));
  // a receiver that says when to come back (429/502/504 with Retry-After) is believed, within a day
  return retryAfterMs !== null ? Math.min(Math.max(retryAfterMs, jittered), 86_400_000) : jittered;
}

/** Retry-After as seconds or an HTTP date (RFC 9110 §10.2.3), in ms; null when absent or unreadable. */
export function parseRetryAfter(value: string | undefined, now = Date.now()): number | null {
  if (!value) return null;
  if (/^\d+$/.test(value.trim())) return Number(value.trim()) * 1000;
  const at = Date.parse(value);
  return Number.isNaN(at) ? null : Math.max(0, at - now);
}
