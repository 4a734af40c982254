import { describe, expect, it } from '@jest/globals';
import type { ConfigService } from '@nestjs/config';
import type { Queue } from 'bull';
import type { Env } from '../config/env.js';
import { ScheduleService } from './schedule.service.js';
import { plannedJobs, type RegisteredRepeat } from './schedules.js';

const settings: Record<string, unknown> = { OUTBOX_RELAY: 'on', NOTIFICATIONS: 'off', SMTP_URL: undefined, NOTIFY_INTERVAL_MS: 1000, NOTIFY_DIGEST_CRON: '0 6 * * *', NOTIFY_DIGEST_TZ: 'UTC', NOTIFY_DIGEST_INTERVAL_MS: undefined };
const config = { get: (k: string) => settings[k] } as unknown as ConfigService<Env, true>;

/** A queue that records what is added, holding the repeatable jobs given (what Redis still has). */
function fakeQueue(registered: RegisteredRepeat[]) {
  const added: { name: string; data: unknown; opts: Record<string, unknown> }[] = [];
  const handlers: (() => void)[] = [];
  const queue = {
    getRepeatableJobs: async () => registered,
    removeRepeatableByKey: async () => undefined,
    add: async (name: string, data: unknown, opts: Record<string, unknown>) => void added.push({ name, data, opts }),
    client: { on: (_e: string, h: () => void) => void handlers.push(h), off: () => undefined },
  } as unknown as Queue;
  return { queue, added, reconnect: () => handlers.forEach((h) => h()) };
}

describe('ScheduleService', () => {
  it('after Redis came back empty registers the plan again and runs the sweeps at once, queueing every pending reading however new', async () => {
    const redis = fakeQueue([]);
    const svc = new ScheduleService(redis.queue, config);
    await svc.onApplicationBootstrap();
    const atBoot = redis.added.length;
    expect(redis.added.every((a) => a.opts.repeat)).toBe(true); // at boot: the schedule only
    redis.reconnect();
    await new Promise((r) => setTimeout(r, 10));
    const after = redis.added.slice(atBoot);
    const sweeps = plannedJobs(settings as never).filter((j) => j.recovers).map((j) => j.name);
    expect(sweeps).toEqual(['judge-sweep', 'import-sweep', 'relay-sweep']);
    expect(after.filter((a) => a.opts.repeat).map((a) => a.name)).toEqual(plannedJobs(settings as never).map((j) => j.name));
    expect(after.filter((a) => !a.opts.repeat)).toEqual(sweeps.map((name) => ({ name, data: { recovery: true }, opts: expect.objectContaining({ attempts: 1 }) })));
    svc.onModuleDestroy();
  });

  it('adds nothing when a reconnect finds the schedule still registered', async () => {
    const plan = plannedJobs(settings as never);
    const redis = fakeQueue(plan.map((j) => ({ key: `${j.name}:${j.name}`, name: j.name, id: j.name, every: 'every' in j.repeat ? j.repeat.every : null, cron: null, tz: null })));
    const svc = new ScheduleService(redis.queue, config);
    await svc.onApplicationBootstrap();
    const atBoot = redis.added.length;
    redis.reconnect();
    await new Promise((r) => setTimeout(r, 10));
    expect(redis.added.length).toBe(atBoot);
    svc.onModuleDestroy();
  });
});
