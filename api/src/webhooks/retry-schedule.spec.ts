import { describe, expect, it } from '@jest/globals';
import { parseRetryAfter, parseSchedule, retryDelay } from './retry-schedule.js';

describe('webhook retry schedule', () => {
  // the schedule published by the Standard Webhooks specification
  const standard = parseSchedule('0,5,300,1800,7200,18000,36000,50400,72000,86400');

  it('follows the standard schedule, with jitter within ±20 %', () => {
    expect(standard).toHaveLength(10);
    expect(retryDelay(standard, 2, null, () => 0.5)).toBe(300_000);
    expect(retryDelay(standard, 2, null, () => 0)).toBe(240_000);
    expect(retryDelay(standard, 2, null, () => 1)).toBe(360_000);
    expect(retryDelay(standard, 0, null, () => 0.9)).toBe(0);
  });

  it('honours Retry-After in seconds and as an HTTP date (RFC 9110)', () => {
    expect(parseRetryAfter('120')).toBe(120_000);
    const now = Date.parse('Tue, 01 Dec 2026 10:00:00 GMT');
    expect(parseRetryAfter('Tue, 01 Dec 2026 10:01:30 GMT', now)).toBe(90_000);
    expect(parseRetryAfter('soon')).toBeNull();
    expect(retryDelay(standard, 0, 120_000, () => 0.5)).toBe(120_000);
    expect(retryDelay(standard, 0, 10 * 86_400_000, () => 0.5)).toBe(86_400_000);
  });
});
