import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Queue } from 'bull';
import type { Knex } from 'knex';
import { randomUUID } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import { actorOf, type RequestContext } from '../auth/principal.js';
import { listPage } from '../common/lists/knex-list.js';
import type { ListQuery, ListSpec } from '../common/lists/list-query.js';
import { ProblemException } from '../common/problems.js';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { MailService } from '../mail/mail.service.js';
import { SecretBox, newWebhookSecret } from '../common/secret-box.js';
import { secretsKeysPrevious } from '../config/env.js';
import { AllowList, checkWebhookUrl } from './ssrf-guard.js';
import { plainStatus } from './plain-reason.js';
import { sendWebhook, type SendResult } from './webhook-sender.js';
import { deliveryJobId, WEBHOOK_QUEUE } from './webhooks.constants.js';
import { type DeliveryRow, deliveryView, type EndpointRow, endpointView, WebhooksRepository } from './webhooks.repository.js';

export const endpointsListSpec: ListSpec = {
  resource: 'webhook-endpoints',
  sortable: ['createdAt', 'url'],
  filters: { enabled: 'bool', q: 'text', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};
export const deliveriesListSpec: ListSpec = {
  resource: 'webhook-deliveries',
  sortable: ['createdAt', 'updatedAt', 'status', 'attempts'],
  filters: { endpointId: 'eq', status: 'eq', eventType: 'eq', eventId: 'eq', createdAt_gte: 'gte', id: 'in' },
  defaultSort: ['createdAt', 'DESC'],
};

export interface EndpointInput {
  url: string;
  description?: string;
  eventTypes?: string[];
  enabled?: boolean;
}

function notFound(what: string) {
  return new ProblemException(404, { detail: `No ${what} with that id in your organization.` });
}

/** Webhook endpoints and their deliveries: the integrator-facing side of outgoing events. */
@Injectable()
export class WebhooksService {
  private readonly logger = new Logger('Webhooks');
  readonly box: SecretBox;
  readonly allow: AllowList;

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly repo: WebhooksRepository,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly config: ConfigService<Env, true>,
    @InjectQueue(WEBHOOK_QUEUE) private readonly queue: Queue,
  ) {
    this.box = new SecretBox(config.get('SECRETS_KEY', { infer: true }), secretsKeysPrevious(config.get('SECRETS_KEY_PREVIOUS', { infer: true })));
    this.allow = new AllowList(config.get('WEBHOOK_ALLOWED_HOSTS', { infer: true }));
  }

  private async checkUrl(url: string) {
    const why = await checkWebhookUrl(url, this.allow);
    if (why) {
      throw new ProblemException(422, { slug: 'validation-failed', title: 'Webhook URL refused', detail: `The URL ${why}. Webhooks only go to public addresses (an operator can allow development hosts with WEBHOOK_ALLOWED_HOSTS).`, errors: [{ pointer: '/url', detail: why, code: 'ssrf' }] });
    }
  }

  async listEndpoints(c: RequestContext, q: ListQuery) {
    const { rows, total } = await listPage<EndpointRow>(this.db('webhook_endpoints').where({ organization_id: c.principal.organizationId }), q, endpointsListSpec, { createdAt: 'created_at', q: 'url' });
    return { rows: rows.map(endpointView), total };
  }

  async getEndpoint(c: RequestContext, id: string) {
    const r = await this.repo.endpoint(c.principal.organizationId, id);
    if (!r) throw notFound('webhook endpoint');
    return endpointView(r);
  }

  async createEndpoint(c: RequestContext, body: EndpointInput) {
    await this.checkUrl(body.url);
    const secret = newWebhookSecret();
    const sealed = this.box.seal(secret);
    const id = await this.db.transaction(async (trx) => {
      const [row] = await trx('webhook_endpoints').insert({ organization_id: c.principal.organizationId, url: body.url, description: body.description ?? '', event_types: body.eventTypes ?? [], enabled: body.enabled ?? true, secret_enc: sealed.sealed, secret_key_version: sealed.version, created_by: c.principal.kind === 'user' ? c.principal.id : null }).returning('id');
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'webhook_endpoint.created', targetType: 'webhook_endpoint', targetId: row.id, details: { url: body.url }, ip: c.ip, userAgent: c.userAgent }, trx);
      return row.id as string;
    });
    return { ...(await this.getEndpoint(c, id)), secret };
  }

  async updateEndpoint(c: RequestContext, id: string, body: Partial<EndpointInput>) {
    const cur = await this.repo.endpoint(c.principal.organizationId, id);
    if (!cur) throw notFound('webhook endpoint');
    if (body.url !== undefined && body.url !== cur.url) await this.checkUrl(body.url);
    const patch: Record<string, unknown> = {};
    if (body.url !== undefined) patch.url = body.url;
    if (body.description !== undefined) patch.description = body.description;
    if (body.eventTypes !== undefined) patch.event_types = body.eventTypes;
    if (body.enabled !== undefined) {
      patch.enabled = body.enabled;
      if (body.enabled) patch.disabled_reason = null;
      else if (cur.enabled) patch.disabled_reason = 'disabled by a person';
    }
    if (Object.keys(patch).length) {
      await this.db.transaction(async (trx) => {
        await trx('webhook_endpoints').where({ id }).update(patch);
        await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'webhook_endpoint.changed', targetType: 'webhook_endpoint', targetId: id, details: { fields: Object.keys(patch) }, ip: c.ip, userAgent: c.userAgent }, trx);
      });
    }
    return this.getEndpoint(c, id);
  }

  async deleteEndpoint(c: RequestContext, id: string) {
    const view = await this.getEndpoint(c, id);
    await this.db.transaction(async (trx) => {
      await trx('webhook_endpoints').where({ id }).delete();
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'webhook_endpoint.deleted', targetType: 'webhook_endpoint', targetId: id, details: { url: view.url }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return view;
  }

  /** A new secret now; the old one keeps signing (alongside) for the overlap. */
  async rotateSecret(c: RequestContext, id: string, overlapSeconds: number) {
    const cur = await this.repo.endpoint(c.principal.organizationId, id);
    if (!cur) throw notFound('webhook endpoint');
    const secret = newWebhookSecret();
    const sealed = this.box.seal(secret);
    await this.db.transaction(async (trx) => {
      await trx('webhook_endpoints').where({ id }).update({ secret_enc: sealed.sealed, secret_key_version: sealed.version, previous_secret_enc: cur.secret_enc, previous_secret_key_version: cur.secret_key_version, previous_secret_until: new Date(Date.now() + overlapSeconds * 1000) });
      await this.audit.record({ organizationId: c.principal.organizationId, ...actorOf(c.principal), action: 'webhook_endpoint.secret_rotated', targetType: 'webhook_endpoint', targetId: id, details: { overlapSeconds }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    return { ...(await this.getEndpoint(c, id)), secret };
  }

  /** The secrets that sign right now: the current one, and the previous during an overlap. */
  signingSecrets(e: EndpointRow): string[] {
    const out = [this.box.open(e.secret_enc, e.secret_key_version)];
    if (e.previous_secret_enc && e.previous_secret_until && e.previous_secret_until > new Date()) out.push(this.box.open(e.previous_secret_enc, e.previous_secret_key_version));
    return out;
  }

  /**
   * Sends a `webhook.test` event at once and reports what the receiver answered, in plain words when
   * it failed. The send is kept like any delivery (event, delivery, attempt) so it shows in the
   * delivery log; the event is marked relayed, so the relay never sends it to other endpoints.
   */
  async test(c: RequestContext, id: string): Promise<SendResult & { eventId: string; deliveryId: string; verdict: 'delivered' | 'failed'; reason?: string }> {
    const e = await this.repo.endpoint(c.principal.organizationId, id);
    if (!e) throw notFound('webhook endpoint');
    const eventId = randomUUID();
    const occurredAt = new Date();
    const subject = { type: 'webhook_endpoint', id: e.id };
    const data = { message: 'A test event from Pourgate', endpointId: e.id };
    const body = JSON.stringify({ id: eventId, type: 'webhook.test', occurredAt: occurredAt.toISOString(), subject, data });
    const r = await sendWebhook({ url: e.url, id: eventId, body, secrets: this.signingSecrets(e), timeoutMs: this.config.get('WEBHOOK_TIMEOUT_MS', { infer: true }), allow: this.allow, now: occurredAt });
    const ok = r.statusCode !== null && r.statusCode >= 200 && r.statusCode < 300;
    const reason = ok ? undefined : (r.error ?? plainStatus(r.statusCode!));
    const deliveryId = await this.db.transaction(async (trx) => {
      await trx('events').insert({ id: eventId, organization_id: e.organization_id, type: 'webhook.test', subject_type: subject.type, subject_id: subject.id, payload: JSON.stringify(data), occurred_at: occurredAt, relayed_at: trx.fn.now() });
      const [d] = await trx('webhook_deliveries')
        .insert({ organization_id: e.organization_id, endpoint_id: e.id, event_id: eventId, event_type: 'webhook.test', status: ok ? 'succeeded' : 'dead', attempts: 1, last_status_code: r.statusCode, last_error: reason ?? null, last_duration_ms: r.durationMs, delivered_at: ok ? trx.fn.now() : null })
        .returning('id');
      await trx('webhook_attempts').insert({ delivery_id: d.id, attempt: 1, started_at: occurredAt, duration_ms: r.durationMs, status_code: r.statusCode, error: reason ?? null, response_snippet: r.responseSnippet ?? null });
      return d.id as string;
    });
    return { ...r, eventId, deliveryId, verdict: ok ? 'delivered' : 'failed', ...(reason ? { reason } : {}) };
  }

  async listDeliveries(c: RequestContext, q: ListQuery) {
    const cols = { createdAt: 'created_at', updatedAt: 'updated_at', endpointId: 'endpoint_id', eventType: 'event_type', eventId: 'event_id', createdAt_gte: 'created_at' };
    const { rows, total } = await listPage<DeliveryRow>(this.db('webhook_deliveries').where({ organization_id: c.principal.organizationId }), q, deliveriesListSpec, cols);
    return { rows: rows.map(deliveryView), total };
  }

  async getDelivery(c: RequestContext, id: string) {
    const r = await this.repo.delivery(id);
    if (!r || r.organization_id !== c.principal.organizationId) throw notFound('webhook delivery');
    const attempts = await this.db('webhook_attempts').where({ delivery_id: id }).orderBy('attempt');
    return {
      ...deliveryView(r),
      attemptLog: attempts.map((a) => ({ attempt: a.attempt, startedAt: a.started_at, durationMs: a.duration_ms, statusCode: a.status_code, error: a.error, responseSnippet: a.response_snippet })),
    };
  }

  /** Sends a delivery again from its first attempt (same event, same webhook-id). */
  async replay(c: RequestContext, id: string) {
    const r = await this.repo.delivery(id);
    if (!r || r.organization_id !== c.principal.organizationId) throw notFound('webhook delivery');
    if (r.status === 'pending' || r.status === 'delivering' || r.status === 'retrying') throw new ProblemException(409, { detail: `This delivery is ${r.status}; it will be tried again by itself.` });
    await this.requeue(r, c);
    return this.getDelivery(c, id);
  }

  async replayFailedSince(c: RequestContext, since: string, endpointId?: string) {
    const q = this.db<DeliveryRow>('webhook_deliveries').where({ organization_id: c.principal.organizationId, status: 'dead' }).where('created_at', '>=', since);
    if (endpointId) q.where({ endpoint_id: endpointId });
    const rows = await q.limit(10_000);
    for (const r of rows) await this.requeue(r, c);
    return { replayed: rows.length };
  }

  private async requeue(r: DeliveryRow, c: RequestContext) {
    await this.db.transaction(async (trx) => {
      await trx('webhook_deliveries').where({ id: r.id }).update({ status: 'pending', attempts: 0, next_attempt_at: null, replays: r.replays + 1 });
      await this.audit.record({ organizationId: r.organization_id, ...actorOf(c.principal), action: 'webhook_delivery.replayed', targetType: 'webhook_delivery', targetId: r.id, details: { eventId: r.event_id }, ip: c.ip, userAgent: c.userAgent }, trx);
    });
    const jobId = deliveryJobId(r.endpoint_id, r.event_id);
    const old = await this.queue.getJob(jobId);
    if (old) await old.remove().catch(() => undefined);
    await this.enqueue(r.id, r.endpoint_id, r.event_id);
  }

  /** Queues a delivery; when Redis is away the sweeper queues it later (the row is the truth). */
  async enqueue(deliveryId: string, endpointId: string, eventId: string): Promise<void> {
    try {
      await this.queue.add({ deliveryId }, { jobId: deliveryJobId(endpointId, eventId), attempts: this.scheduleLength(), backoff: { type: 'standard-webhooks' }, removeOnComplete: 1000, removeOnFail: 5000 });
    } catch (e) {
      this.logger.warn(`delivery ${deliveryId} not queued now (${(e as Error).message}); the sweeper will queue it`);
    }
  }

  scheduleLength(): number {
    return this.config.get('WEBHOOK_RETRY_SCHEDULE', { infer: true }).split(',').length;
  }

  /** Dead letters: tell the organization's admins (and whoever made the endpoint) by e-mail. */
  async notifyDead(d: DeliveryRow, e: EndpointRow): Promise<void> {
    const admins = await this.db('users').where({ organization_id: d.organization_id, disabled: false }).andWhere((q) => q.where({ role: 'admin' }).orWhere({ id: e.created_by })).pluck('email');
    if (!admins.length) return;
    await this.mail.send({
      to: admins,
      subject: `Webhook delivery failed for good: ${d.event_type} to ${new URL(e.url).host}`,
      text: `Pourgate gave up delivering event ${d.event_id} (${d.event_type}) to ${e.url} after ${d.attempts} attempts.\nLast answer: ${d.last_status_code ?? 'none'} ${d.last_error ?? ''}\n\nReplay it from the console or with POST /v1/webhook-deliveries/${d.id}/replay once the receiver is back.`,
    });
  }
}
