import { Injectable, Logger, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Transporter, TransportOptions } from 'nodemailer';
import type { Env } from '../config/env.js';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
}

/**
 * Sends mail through SMTP_URL. In development and tests that is the local catcher in fakes/;
 * without SMTP_URL the message is only logged (never silently dropped).
 */
@Injectable()
export class MailService implements OnApplicationShutdown {
  private readonly logger = new Logger('Mail');
  /** How to reach SMTP_URL; the transport (and nodemailer) is loaded at the first message, as most processes never send one. */
  private readonly options: TransportOptions | null;
  private transport: Promise<Transporter> | null = null;
  private readonly from: string;

  constructor(config: ConfigService<Env, true>) {
    const url = config.get('SMTP_URL', { infer: true });
    this.from = config.get('MAIL_FROM', { infer: true });
    // the local catcher speaks plain SMTP; real servers negotiate TLS as their URL says
    if (!url) this.options = null;
    else {
      const u = new URL(url);
      this.options = {
        host: u.hostname,
        port: Number(u.port || (u.protocol === 'smtps:' ? 465 : 25)),
        secure: u.protocol === 'smtps:',
        auth: u.username ? { user: decodeURIComponent(u.username), pass: decodeURIComponent(u.password) } : undefined,
        ignoreTLS: u.protocol === 'smtp:' && ['127.0.0.1', 'localhost', '[::1]'].includes(u.hostname),
      } as TransportOptions;
    }
  }

  async send(mail: OutgoingMail): Promise<void> {
    if (!this.options) {
      this.logger.warn(`SMTP_URL is not set; not sent: "${mail.subject}" to ${String(mail.to)}`);
      return;
    }
    const options = this.options;
    this.transport ??= import('nodemailer').then((m) => m.default.createTransport(options));
    await (await this.transport).sendMail({ from: this.from, ...mail });
  }

  async onApplicationShutdown(): Promise<void> {
    (await this.transport)?.close();
  }
}
