import { Process, Processor } from '@nestjs/bull';
import { Inject, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Job } from 'bull';
import type { Knex } from 'knex';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { envelope } from '../events/events.service.js';
import { parseRetryAfter, parseSchedule, retryDelay } from './retry-schedule.js';
import { sendWebhook } from './webhook-sender.js';
import { DeliveryFailed, WEBHOOK_QUEUE } from './webhooks.constants.js';
import type { DeliveryRow, EndpointRow } from './webhooks.repository.js';
import { WebhooksService } from './webhooks.service.js';

const RETRY_AFTER_STATUSES = new Set([429, 502, 503, 504]);

/**
 * Delivers one event to one endpoint. Bull retries it on the Standard Webhooks schedule (the
 * backoff strategy in webhooks.module.ts); every attempt is recorded; after the last one the
 * delivery is dead-lettered and the owners are told. 410 Gone disables the endpoint.
 */
@Processor(WEBHOOK_QUEUE)
export class DeliveryProcessor {
  private readonly logger = new Logger('WebhookDelivery');
  private readonly schedule: number[];

  constructor(@Inject(KNEX) private readonly db: Knex, private readonly webhooks: WebhooksService, private readonly config: ConfigService<Env, true>) {
    this.schedule = parseSchedule(config.get('WEBHOOK_RETRY_SCHEDULE', { infer: true }));
  }

  @Process({ concurrency: 16 })
  async deliver(job: Job<{ deliveryId: string }>): Promise<{ statusCode: number | null }> {
    const d = await this.db<DeliveryRow>('webhook_deliveries').where({ id: job.data.deliveryId }).first();
    if (!d || d.status === 'succeeded' || d.status === 'cancelled') return { statusCode: d?.last_status_code ?? null };
    const e = await this.db<EndpointRow>('webhook_endpoints').where({ id: d.endpoint_id }).first();
    const ev = await this.db('events').where({ id: d.event_id }).first();
    if (!e || !ev || !e.enabled) {
      await this.db('webhook_deliveries').where({ id: d.id }).update({ status: 'cancelled', last_error: e ? 'endpoint disabled' : 'endpoint deleted' });
      await job.discard();
      return { statusCode: null };
    }
    const attempt = d.attempts + 1;
    await this.db('webhook_deliveries').where({ id: d.id }).update({ status: 'delivering', attempts: attempt });
    const body = JSON.stringify(envelope(ev));
    const startedAt = new Date();
    const r = await sendWebhook({ url: e.url, id: ev.id, body, secrets: this.webhooks.signingSecrets(e), timeoutMs: this.config.get('WEBHOOK_TIMEOUT_MS', { infer: true }), allow: this.webhooks.allow, now: startedAt });
    await this.db('webhook_attempts').insert({ delivery_id: d.id, attempt, started_at: startedAt, duration_ms: r.durationMs, status_code: r.statusCode, error: r.error ?? null, response_snippet: r.responseSnippet ?? null });
    const base = { last_status_code: r.statusCode, last_error: r.error ?? null, last_duration_ms: r.durationMs };

    if (r.statusCode !== null && r.statusCode >= 200 && r.statusCode < 300) {
      await this.db('webhook_deliveries').where({ id: d.id }).update({ ...base, status: 'succeeded', delivered_at: this.db.fn.now(), next_attempt_at: null });
      return { statusCode: r.statusCode };
    }
    if (r.statusCode === 410) {
      await this.db.transaction(async (trx) => {
        await trx('webhook_endpoints').where({ id: e.id }).update({ enabled: false, disabled_reason: `the receiver answered 410 Gone on ${startedAt.toISOString()}` });
        await trx('webhook_deliveries').where({ id: d.id }).update({ ...base, status: 'cancelled' });
      });
      await job.discard();
      throw new Error('410 Gone: endpoint disabled');
    }
    const last = attempt >= (job.opts.attempts ?? 1) || r.ssrf;
    const why = r.error ?? `HTTP ${r.statusCode}`;
    if (last) {
      await this.db('webhook_deliveries').where({ id: d.id }).update({ ...base, status: 'dead', next_attempt_at: null });
      if (r.ssrf) await job.discard();
      await this.webhooks.notifyDead({ ...d, ...base, attempts: attempt } as DeliveryRow, e).catch((err: Error) => this.logger.warn(`dead-letter mail not sent: ${err.message}`));
      throw new Error(`${why}; dead-lettered after ${attempt} attempts`);
    }
    const retryAfter = r.statusCode !== null && RETRY_AFTER_STATUSES.has(r.statusCode) ? parseRetryAfter(r.retryAfter) : null;
    const delay = retryDelay(this.schedule, attempt, retryAfter);
    await this.db('webhook_deliveries').where({ id: d.id }).update({ ...base, status: 'retrying', next_attempt_at: new Date(Date.now() + delay) });
    throw new DeliveryFailed(why, delay);
  }
}
