import { describe, expect, it } from '@jest/globals';
import { plannedJobs, staleRepeats } from './schedules.js';

const base = { OUTBOX_RELAY: 'on', NOTIFICATIONS: 'on', SMTP_URL: 'smtp://127.0.0.1:25', NOTIFY_INTERVAL_MS: 1000, NOTIFY_DIGEST_CRON: '0 6 * * *', NOTIFY_DIGEST_TZ: 'UTC', NOTIFY_DIGEST_INTERVAL_MS: undefined } as const;

describe('periodic jobs', () => {
  it('sends the digest once a day (what the profile offers) unless a test interval is given', () => {
    const digest = plannedJobs(base).find((j) => j.name === 'digest-send');
    expect(digest?.repeat).toEqual({ cron: '0 6 * * *', tz: 'UTC' });
    expect(plannedJobs({ ...base, NOTIFY_DIGEST_INTERVAL_MS: 5000 }).find((j) => j.name === 'digest-send')?.repeat).toEqual({ every: 5000 });
  });

  it('leaves out the mail jobs without a mail server and the relay sweep when the relay is off', () => {
    expect(plannedJobs({ ...base, SMTP_URL: undefined }).map((j) => j.name)).toEqual(['judge-sweep', 'import-sweep', 'relay-sweep']);
    expect(plannedJobs({ ...base, OUTBOX_RELAY: 'off', NOTIFICATIONS: 'off' }).map((j) => j.name)).toEqual(['judge-sweep', 'import-sweep']);
  });

  it('removes registered schedules whose cadence changed or that the plan no longer holds, and keeps the rest', () => {
    const plan = plannedJobs({ ...base, NOTIFICATIONS: 'off' });
    const registered = [
      { key: 'a', name: 'judge-sweep', id: 'judge-sweep', every: 15000, cron: null, tz: null },
      { key: 'b', name: 'import-sweep', id: 'import-sweep', every: 60000, cron: null, tz: null },
      { key: 'c', name: 'digest-send', id: 'digest-send', every: null, cron: '0 * * * *', tz: 'UTC' },
    ];
    expect(staleRepeats(registered, plan).map((r) => r.key)).toEqual(['b', 'c']);
  });
});
