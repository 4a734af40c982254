/**
 * A DATE column as `YYYY-MM-DD`. node-postgres turns DATE into a JavaScript Date at local
 * midnight, so the local calendar fields (not toISOString, which shifts by the zone) give the day.
 */
export function isoDay(v: Date | string | null | undefined): string | null {
  if (v === null || v === undefined) return null;
  if (typeof v === 'string') return v.slice(0, 10);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${v.getFullYear()}-${pad(v.getMonth() + 1)}-${pad(v.getDate())}`;
}

/** Today's date in UTC, `YYYY-MM-DD`. */
export function todayUtc(): string {
  return new Date().toISOString().slice(0, 10);
}
