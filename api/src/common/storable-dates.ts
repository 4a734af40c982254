/**
 * Dates and date-times as PostgreSQL can store them and a person can mean them. JSON Schema's
 * formats (and ajv-formats) accept year 0000 and leap seconds, which the database refuses; every
 * date the API takes, in a body or a list filter, passes these checks first.
 */
export const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
export const DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})[Tt ](\d{2}):(\d{2}):(\d{2})(\.\d{1,9})?([Zz]|[+-]\d{2}:\d{2})$/;

/** A calendar date PostgreSQL can store and a person can mean: year 0001–9999, a real day. */
export function isStorableDate(y: number, m: number, d: number): boolean {
  if (y < 1 || y > 9999 || m < 1 || m > 12 || d < 1) return false;
  return d <= new Date(Date.UTC(2000, m, 0)).getUTCDate() - (m === 2 && !(y % 4 === 0 && (y % 100 !== 0 || y % 400 === 0)) ? 1 : 0);
}

/** An RFC 3339 date-time PostgreSQL stores as it was meant: no leap second, year 0001–9999, hours 00–23. */
export function isStorableDateTime(v: string): boolean {
  const m = DATE_TIME.exec(v);
  if (!m) return false;
  const [y, mo, d, h, mi, s] = m.slice(1, 7).map(Number) as [number, number, number, number, number, number];
  if (!isStorableDate(y, mo, d) || h > 23 || mi > 59 || s > 59) return false;
  const off = m[8]!;
  if (off.length === 6 && (Number(off.slice(1, 3)) > 23 || Number(off.slice(4, 6)) > 59)) return false;
  return true;
}
