/**
 * Dates as the console shows them. Every function takes `now` and the locale/time zone so tests
 * (and screenshots) do not depend on the machine's clock or settings.
 */
export interface FormatOptions {
  locale?: string;
  timeZone?: string;
}

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

function toTime(value: string | number | Date | null | undefined): number | null {
  if (value === null || value === undefined || value === '') return null;
  const t = value instanceof Date ? value.getTime() : typeof value === 'number' ? value : Date.parse(value);
  return Number.isFinite(t) ? t : null;
}

/** "12 Mar 2025, 14:03" in the person's locale. */
export function formatDateTime(value: string | number | Date | null | undefined, opts: FormatOptions = {}): string {
  const t = toTime(value);
  if (t === null) return '—';
  return new Intl.DateTimeFormat(opts.locale, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone: opts.timeZone,
  }).format(t);
}

export function formatDate(value: string | number | Date | null | undefined, opts: FormatOptions = {}): string {
  const t = toTime(value);
  if (t === null) return '—';
  return new Intl.DateTimeFormat(opts.locale, { day: 'numeric', month: 'short', year: 'numeric', timeZone: opts.timeZone }).format(t);
}

/**
 * "just now", "5 minutes ago", "in 3 days": whole units, rounded toward the nearer one, with
 * anything under 45 seconds either way called "just now" / "in a moment".
 */
export function formatRelative(value: string | number | Date | null | undefined, now: number = Date.now(), opts: FormatOptions = {}): string {
  const t = toTime(value);
  if (t === null) return '—';
  const diff = t - now;
  const abs = Math.abs(diff);
  if (abs < 45_000) return diff <= 0 ? 'just now' : 'in a moment';
  const rtf = new Intl.RelativeTimeFormat(opts.locale ?? 'en', { numeric: 'auto' });
  const sign = diff < 0 ? -1 : 1;
  if (abs < 45 * MINUTE) return rtf.format(sign * Math.max(1, Math.round(abs / MINUTE)), 'minute');
  if (abs < 22 * HOUR) return rtf.format(sign * Math.round(abs / HOUR), 'hour');
  if (abs < 26 * DAY) return rtf.format(sign * Math.round(abs / DAY), 'day');
  if (abs < 320 * DAY) return rtf.format(sign * Math.round(abs / (30.4375 * DAY)), 'month');
  return rtf.format(sign * Math.round(abs / (365.25 * DAY)), 'year');
}

/** The "last used" cell of a key, or the "last sign-in" of a person. */
export function lastUsedLabel(value: string | null | undefined, now: number = Date.now(), never = 'Never used'): string {
  return toTime(value) === null ? never : formatRelative(value, now);
}

/** "No expiry", "Expires in 89 days", "Expired 3 days ago". */
export function expiryLabel(value: string | null | undefined, now: number = Date.now()): string {
  const t = toTime(value);
  if (t === null) return 'No expiry';
  return t > now ? `Expires ${formatRelative(t, now)}` : `Expired ${formatRelative(t, now)}`;
}

/** An ISO instant `days` after `now`, for the "expires after" choices. */
export function addDaysIso(days: number, now: number = Date.now()): string {
  return new Date(now + days * DAY).toISOString();
}

/**
 * The audit filter's date pickers give a calendar day (YYYY-MM-DD, the person's own day); the API
 * compares instants. "From" is that day's first millisecond, "to" its last, both in local time.
 */
export function dayStartIso(day: string | null | undefined): string | undefined {
  if (!day || !/^\d{4}-\d{2}-\d{2}$/.test(day)) return undefined;
  const [y, m, d] = day.split('-').map(Number) as [number, number, number];
  return new Date(y, m - 1, d, 0, 0, 0, 0).toISOString();
}

export function dayEndIso(day: string | null | undefined): string | undefined {
  if (!day || !/^\d{4}-\d{2}-\d{2}$/.test(day)) return undefined;
  const [y, m, d] = day.split('-').map(Number) as [number, number, number];
  return new Date(y, m - 1, d, 23, 59, 59, 999).toISOString();
}

/** Back from an ISO instant to the local calendar day a date picker shows. */
export function isoToDay(value: string | null | undefined): string {
  const t = toTime(value);
  if (t === null) return '';
  const d = new Date(t);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** "2 Dec" / "Dec 2": a calendar day (YYYY-MM-DD) on a chart axis, without the year. */
export function formatDayShort(day: string, opts: FormatOptions = {}): string {
  const t = toTime(`${day}T12:00:00`);
  if (t === null) return day;
  return new Intl.DateTimeFormat(opts.locale, { day: 'numeric', month: 'short', timeZone: opts.timeZone }).format(t);
}
