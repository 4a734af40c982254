import { describe, expect, it } from 'vitest';
import { addDaysIso, dayEndIso, dayStartIso, expiryLabel, formatDate, formatDateTime, formatRelative, isoToDay, lastUsedLabel } from './dates';

const NOW = Date.parse('2025-06-02T12:00:00Z');
const ago = (ms: number) => new Date(NOW - ms).toISOString();
const ahead = (ms: number) => new Date(NOW + ms).toISOString();
const MIN = 60_000;
const H = 60 * MIN;
const D = 24 * H;

describe('formatRelative', () => {
  it('calls the last 45 seconds "just now"', () => {
    expect(formatRelative(ago(10_000), NOW)).toBe('just now');
    expect(formatRelative(ahead(10_000), NOW)).toBe('in a moment');
  });

  it('uses minutes, hours, days, months and years', () => {
    expect(formatRelative(ago(50_000), NOW)).toBe('1 minute ago');
    expect(formatRelative(ago(5 * MIN), NOW)).toBe('5 minutes ago');
    expect(formatRelative(ago(3 * H), NOW)).toBe('3 hours ago');
    expect(formatRelative(ago(1 * D), NOW)).toBe('yesterday');
    expect(formatRelative(ago(4 * D), NOW)).toBe('4 days ago');
    expect(formatRelative(ago(60 * D), NOW)).toBe('2 months ago');
    expect(formatRelative(ago(800 * D), NOW)).toBe('2 years ago');
    expect(formatRelative(ahead(89 * D), NOW)).toBe('in 3 months');
    expect(formatRelative(ahead(3 * D), NOW)).toBe('in 3 days');
  });

  it('shows a dash for missing or unreadable times', () => {
    expect(formatRelative(null, NOW)).toBe('—');
    expect(formatRelative('not a date', NOW)).toBe('—');
  });
});

describe('lastUsedLabel', () => {
  it('says "Never used" for keys that never called in', () => {
    expect(lastUsedLabel(null, NOW)).toBe('Never used');
    expect(lastUsedLabel(undefined, NOW, 'Never')).toBe('Never');
    expect(lastUsedLabel(ago(2 * H), NOW)).toBe('2 hours ago');
  });
});

describe('expiryLabel', () => {
  it('tells future from past expiry', () => {
    expect(expiryLabel(null, NOW)).toBe('No expiry');
    expect(expiryLabel(ahead(10 * D), NOW)).toBe('Expires in 10 days');
    expect(expiryLabel(ago(3 * D), NOW)).toBe('Expired 3 days ago');
  });
});

describe('formatDateTime / formatDate', () => {
  it('formats in the given locale and time zone', () => {
    expect(formatDateTime('2025-03-12T14:03:00Z', { locale: 'en-GB', timeZone: 'UTC' })).toBe('12 Mar 2025, 14:03');
    expect(formatDateTime('2025-03-12T14:03:00Z', { locale: 'en-GB', timeZone: 'Asia/Tokyo' })).toBe('12 Mar 2025, 23:03');
    expect(formatDate('2025-03-12T23:30:00Z', { locale: 'en-GB', timeZone: 'UTC' })).toBe('12 Mar 2025');
    expect(formatDateTime(null)).toBe('—');
  });
});

describe('day bounds for the audit filter', () => {
  it('spans the whole local day', () => {
    const start = Date.parse(dayStartIso('2025-06-12')!);
    const end = Date.parse(dayEndIso('2025-06-12')!);
    expect(end - start).toBe(D - 1);
    expect(new Date(start).getHours()).toBe(0);
    expect(new Date(end).getHours()).toBe(23);
    expect(isoToDay(dayStartIso('2025-06-12'))).toBe('2025-06-12');
    expect(isoToDay(dayEndIso('2025-06-12'))).toBe('2025-06-12');
  });

  it('ignores empty or malformed input', () => {
    expect(dayStartIso('')).toBeUndefined();
    expect(dayEndIso('12/03/2025')).toBeUndefined();
    expect(isoToDay(null)).toBe('');
  });

  it('adds whole days for key expiry', () => {
    expect(addDaysIso(90, NOW)).toBe('2025-08-31T12:00:00.000Z');
  });
});
