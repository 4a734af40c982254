import { Inject, Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Knex } from 'knex';
import pg from 'pg';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { NotificationsService } from '../notifications/notifications.service.js';
import { WebhooksService } from '../webhooks/webhooks.service.js';

/** The channel a trigger on `events` notifies at the commit of every transaction that wrote one (migration 0031). */
export const OUTBOX_CHANNEL = 'pourgate_outbox';

/**
 * The outbox relay (worker processes): turns new event rows into one delivery row per matching
 * endpoint (and the e-mail notices) and queues them. It wakes when PostgreSQL notifies
 * OUTBOX_CHANNEL (LISTEN on a connection of its own, outside Knex's pool, reopened when lost), and
 * polls every WEBHOOK_RELAY_INTERVAL_MS in every worker as well, for what a lost connection missed; rows are claimed with FOR UPDATE SKIP LOCKED and marked relayed in the same
 * transaction, and a delivery row is unique per (endpoint, event), so N workers never relay an
 * event twice. The sweep, which re-queues deliveries whose job was lost (Redis restarted empty),
 * is a periodic job (api/src/schedule), run once per period whatever the number of workers.
 */
@Injectable()
export class OutboxRelay implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('OutboxRelay');
  private timer?: NodeJS.Timeout;
  private running = false;
  /** a notice came while a round was running: run once more after it */
  private again = false;
  private stopped = false;
  private listener: pg.Client | null = null;
  private reconnect?: NodeJS.Timeout;

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly webhooks: WebhooksService,
    private readonly notifications: NotificationsService,
    private readonly config: ConfigService<Env, true>,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.get('OUTBOX_RELAY', { infer: true }) === 'off') return;
    const every = this.config.get('WEBHOOK_RELAY_INTERVAL_MS', { infer: true });
    this.timer = setInterval(() => void this.tick(), every);
    void this.listen();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    clearInterval(this.timer);
    clearTimeout(this.reconnect);
    const l = this.listener;
    this.listener = null;
    await l?.end().catch(() => undefined);
    while (this.running) await new Promise((r) => setTimeout(r, 20));
  }

  /** LISTEN on a client of its own; on any loss, a new one a second later (the timer covers the gap). */
  private async listen(): Promise<void> {
    if (this.stopped) return;
    const client = new pg.Client({ connectionString: this.config.get('DATABASE_URL', { infer: true }), application_name: 'pourgate-outbox-relay' });
    let lost = false;
    const again = (why: string) => {
      if (lost) return;
      lost = true;
      if (this.listener === client) this.listener = null;
      client.end().catch(() => undefined);
      if (this.stopped) return;
      this.logger.warn(`outbox listener lost (${why}); polling every ${this.config.get('WEBHOOK_RELAY_INTERVAL_MS', { infer: true })} ms until it is back`);
      this.reconnect = setTimeout(() => void this.listen(), 1000);
      this.reconnect.unref();
    };
    client.on('error', (e) => again(e.message));
    client.on('end', () => again('connection closed'));
    client.on('notification', (n) => {
      if (n.channel === OUTBOX_CHANNEL) void this.tick();
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${OUTBOX_CHANNEL}`);
      if (this.stopped) return void client.end().catch(() => undefined);
      this.listener = client;
      // events written while nobody listened
      void this.tick();
    } catch (e) {
      again((e as Error).message);
    }
  }

  /** Whether the relay is listening for notices now (tests, readiness). */
  listening(): boolean {
    return this.listener !== null;
  }

  private async tick(): Promise<void> {
    if (this.stopped) return;
    if (this.running) {
      this.again = true;
      return;
    }
    this.running = true;
    try {
      do {
        this.again = false;
        while (!this.stopped && (await this.relayBatch()) > 0);
      } while (this.again && !this.stopped);
    } catch (e) {
      this.logger.warn(`relay paused: ${(e as Error).message}`);
    } finally {
      this.running = false;
    }
  }

  /** One claim-and-fan-out round; returns how many events it took. */
  async relayBatch(limit = 200): Promise<number> {
    const created = await this.db.transaction(async (trx) => {
      const events = await trx('events').whereNull('relayed_at').orderBy('seq').limit(limit).forUpdate().skipLocked().select('id', 'seq', 'organization_id', 'type', 'subject_id');
      if (!events.length) return null;
      // e-mail notices ride on the same claim, so an event is taken for webhooks and mail at once
      await this.notifications.fanOut(trx, events);
      const orgs = [...new Set(events.map((e) => e.organization_id))];
      const endpoints = await trx('webhook_endpoints').whereIn('organization_id', orgs).where({ enabled: true }).select('id', 'organization_id', 'event_types');
      const rows = events.flatMap((ev) =>
        endpoints
          .filter((ep) => ep.organization_id === ev.organization_id && (ep.event_types.length === 0 || ep.event_types.includes(ev.type)))
          .map((ep) => ({ organization_id: ev.organization_id, endpoint_id: ep.id, event_id: ev.id, event_type: ev.type })),
      );
      const inserted = rows.length ? await trx('webhook_deliveries').insert(rows).onConflict(['endpoint_id', 'event_id']).ignore().returning(['id', 'endpoint_id', 'event_id']) : [];
      await trx('events').whereIn('id', events.map((e) => e.id)).update({ relayed_at: trx.fn.now() });
      return { count: events.length, inserted };
    });
    if (!created) return 0;
    for (const d of created.inserted) await this.webhooks.enqueue(d.id, d.endpoint_id, d.event_id);
    return created.count;
  }

  /** Deliveries the database says are waiting but that may have no job in Redis. */
  async sweep(): Promise<number> {
    const stale = await this.db('webhook_deliveries')
      .where((q) => q.where('status', 'pending').andWhere('updated_at', '<', this.db.raw("now() - interval '10 seconds'")))
      .orWhere((q) => q.where('status', 'delivering').andWhere('updated_at', '<', this.db.raw("now() - interval '2 minutes'")))
      .orWhere((q) => q.where('status', 'retrying').andWhere('next_attempt_at', '<', this.db.raw("now() - interval '2 minutes'")))
      .limit(1000)
      .select('id', 'endpoint_id', 'event_id');
    for (const d of stale) await this.webhooks.enqueue(d.id, d.endpoint_id, d.event_id);
    return stale.length;
  }
}
