import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Knex } from 'knex';
import type { Env } from '../config/env.js';
import { KNEX } from '../database/database.module.js';
import { MailService } from '../mail/mail.service.js';
import { type DriftFacts, driftMail } from './drift-mail.js';
import { digestMail, type NoticeFacts, rejectionMail } from './rejection-mail.js';

const MAX_ATTEMPTS = 6;

interface NoticeRow {
  id: string;
  user_id: string;
  reading_id: string;
  attempts: number;
  email: string;
}

/**
 * Engineers' e-mail about rejected readings (one per reading, a digest, or none) and about drift
 * signals of control charts (one per signal, or none): each person's choice on their profile.
 */
@Injectable()
export class NotificationsService {
  private readonly log = new Logger('notifications');
  private readonly publicUrl: string;

  constructor(@Inject(KNEX) private readonly db: Knex, private readonly mail: MailService, config: ConfigService<Env, true>) {
    this.publicUrl = config.get('PUBLIC_URL', { infer: true });
  }

  /** In the relay's transaction: a notice row per engineer who wants one, for each reading.rejected. */
  async fanOut(trx: Knex.Transaction, events: { id: string; organization_id: string; type: string; subject_id: string }[]): Promise<number> {
    return (await this.fanOutRejections(trx, events)) + (await this.fanOutDrift(trx, events));
  }

  /** A notice per engineer who wants drift mail, for each drift.detected; the event's data is kept for the mail. */
  private async fanOutDrift(trx: Knex.Transaction, events: { id: string; organization_id: string; type: string }[]): Promise<number> {
    const drift = events.filter((e) => e.type === 'drift.detected');
    if (!drift.length) return 0;
    const people = await trx('users').whereIn('organization_id', [...new Set(drift.map((e) => e.organization_id))]).where({ role: 'engineer', disabled: false, notify_drift: 'each' }).select('id', 'organization_id');
    if (!people.length) return 0;
    const payloads = new Map<string, DriftFacts>((await trx('events').whereIn('id', drift.map((e) => e.id)).select('id', 'payload')).map((e) => [e.id, e.payload]));
    const rows = drift.flatMap((e) => {
      const facts = payloads.get(e.id);
      if (!facts) return [];
      return people.filter((p) => p.organization_id === e.organization_id).map((p) => ({ organization_id: e.organization_id, user_id: p.id, event_id: e.id, signal_id: facts.signalId, facts: JSON.stringify(facts) }));
    });
    if (rows.length) await trx('drift_notices').insert(rows).onConflict(['user_id', 'event_id']).ignore();
    return rows.length;
  }

  private async fanOutRejections(trx: Knex.Transaction, events: { id: string; organization_id: string; type: string; subject_id: string }[]): Promise<number> {
    const rejected = events.filter((e) => e.type === 'reading.rejected');
    if (!rejected.length) return 0;
    const people = await trx('users').whereIn('organization_id', [...new Set(rejected.map((e) => e.organization_id))]).where({ role: 'engineer', disabled: false }).whereNot('notify_rejections', 'off').select('id', 'organization_id', 'notify_rejections');
    const rows = rejected.flatMap((e) => people.filter((p) => p.organization_id === e.organization_id).map((p) => ({ organization_id: e.organization_id, user_id: p.id, event_id: e.id, reading_id: e.subject_id, mode: p.notify_rejections })));
    if (rows.length) await trx('rejection_notices').insert(rows).onConflict(['user_id', 'event_id']).ignore();
    return rows.length;
  }

  /** Sends due one-by-one notices (rejections, then drift); a failed send is retried with backoff, then given up. */
  async sendEach(limit = 20): Promise<number> {
    const rejections = await this.db.transaction(async (trx) => {
      const due = await this.claimDue(trx, 'each', limit);
      for (const n of due) {
        const [facts] = await this.facts(trx, [n.reading_id]);
        await this.deliver(trx, 'rejection_notices', [n], () => (facts ? rejectionMail(facts, this.publicUrl) : null), n.email);
      }
      return due.length;
    });
    const drift = await this.db.transaction(async (trx) => {
      const due = await trx('drift_notices as n').join('users as u', 'u.id', 'n.user_id')
        .where('n.status', 'pending').where('n.next_attempt_at', '<=', trx.fn.now())
        .orderBy('n.created_at').limit(limit).forUpdate('n').skipLocked().select('n.id', 'n.attempts', 'n.facts', 'u.email');
      for (const n of due) await this.deliver(trx, 'drift_notices', [n], () => driftMail(n.facts as DriftFacts, this.publicUrl), n.email);
      return due.length;
    });
    return rejections + drift;
  }

  /** One message per person gathering every pending digest notice. */
  async sendDigests(): Promise<number> {
    return this.db.transaction(async (trx) => {
      const due = await this.claimDue(trx, 'digest', 2000);
      const byUser = new Map<string, NoticeRow[]>();
      for (const n of due) byUser.set(n.user_id, [...(byUser.get(n.user_id) ?? []), n]);
      for (const notices of byUser.values()) {
        const facts = await this.facts(trx, notices.map((n) => n.reading_id));
        await this.deliver(trx, 'rejection_notices', notices, () => (facts.length ? digestMail(facts, this.publicUrl) : null), notices[0]!.email);
      }
      return byUser.size;
    });
  }

  /** Pending notices of one mode that are due, locked for this sender (others skip them). */
  private claimDue(trx: Knex.Transaction, mode: 'each' | 'digest', limit: number): Promise<NoticeRow[]> {
    return trx('rejection_notices as n').join('users as u', 'u.id', 'n.user_id')
      .where({ 'n.status': 'pending', 'n.mode': mode }).where('n.next_attempt_at', '<=', trx.fn.now())
      .orderBy('n.created_at').limit(limit).forUpdate('n').skipLocked().select('n.id', 'n.user_id', 'n.reading_id', 'n.attempts', 'u.email');
  }

  private async deliver(trx: Knex.Transaction, table: 'rejection_notices' | 'drift_notices', notices: Pick<NoticeRow, 'id' | 'attempts'>[], compose: () => { subject: string; text: string } | null, to: string): Promise<void> {
    const ids = notices.map((n) => n.id);
    const m = compose();
    // the reading is gone (its organization deleted): nothing to say
    if (!m) return void (await trx(table).whereIn('id', ids).update({ status: 'failed', last_error: 'reading not found' }));
    try {
      await this.mail.send({ to, ...m });
      await trx(table).whereIn('id', ids).update({ status: 'sent', sent_at: trx.fn.now(), attempts: trx.raw('attempts + 1') });
    } catch (e) {
      const attempts = Math.max(...notices.map((n) => n.attempts)) + 1;
      const delayS = Math.min(3600, 5 * 2 ** attempts);
      this.log.warn(`${table === 'drift_notices' ? 'drift' : 'rejection'} notice to ${to} not sent (attempt ${attempts}): ${(e as Error).message}`);
      await trx(table).whereIn('id', ids).update({
        attempts,
        last_error: (e as Error).message.slice(0, 500),
        ...(attempts >= MAX_ATTEMPTS ? { status: 'failed' } : { next_attempt_at: trx.raw(`now() + make_interval(secs => ${delayS})`) }),
      });
    }
  }

  private async facts(trx: Knex.Transaction, readingIds: string[]): Promise<NoticeFacts[]> {
    const rows = await trx('readings as r')
      .join('batches as b', 'b.id', 'r.batch_id')
      .leftJoin('work_orders as w', 'w.id', 'b.work_order_id')
      .leftJoin('devices as d', 'd.id', 'r.device_id')
      .whereIn('r.id', readingIds)
      .orderBy('r.received_at')
      .select('r.id', 'r.batch_id', 'r.quantity', 'r.subject', 'r.reasons', 'r.device_time', 'r.received_at', 'w.external_ref', 'd.name as device_name');
    return rows.map((r) => ({
      readingId: r.id,
      batchId: r.batch_id,
      batchLabel: r.external_ref ? `${r.external_ref} / ${String(r.batch_id).slice(0, 8)}` : String(r.batch_id).slice(0, 8),
      deviceName: r.device_name ?? null,
      quantity: r.quantity,
      subject: r.subject,
      takenAt: new Date(r.device_time ?? r.received_at).toISOString(),
      reasons: r.reasons,
    }));
  }
}
