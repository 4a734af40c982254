import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import pg from 'pg';
import type { Principal, RequestContext } from '../auth/principal.js';
import { ProblemException } from '../common/problems.js';
import type { Env } from '../config/env.js';
import { DevicesService } from '../devices/devices.service.js';
import { ReadingsService } from '../readings/readings.service.js';
import { type LiveClaims, signTicket, verifyTicket } from './live-ticket.js';

export const LIVE_CHANNEL = 'pourgate_live_readings';
export const TICKET_TTL_S = 60;
const MAX_WATCHED_DEVICES = 500;

export interface LiveDevice {
  id: string;
  name: string;
  stationCode: string | null;
}

type Reading = Awaited<ReturnType<ReadingsService['list']>>['rows'][number];

export interface LiveMessage {
  kind: 'received' | 'judged' | 'reviewed';
  reading: Reading;
  device: LiveDevice;
}

interface Subscriber {
  orgId: string;
  ctx: RequestContext;
  devices: Map<string, LiveDevice>;
  /** watching every device of the organization (also ones registered after the stream opened) */
  every: boolean;
  send(message: LiveMessage): void;
}

/**
 * The live station view. Readings reach it from PostgreSQL, not from the code that writes them:
 * triggers on `readings` NOTIFY every listening API process when a reading is inserted or its verdict
 * or review changes (migration 0028), so every path (one reading, a bulk post, a CSV import, the
 * judge, a review) is covered, several API processes each fan out to their own streams, and nothing
 * is read back unless someone in that organization is watching. One LISTEN connection per process,
 * opened with the first stream.
 */
@Injectable()
export class LiveService implements OnApplicationShutdown {
  private readonly log = new Logger('live');
  private readonly subscribers = new Set<Subscriber>();
  private listener: pg.Client | null = null;
  private connecting: Promise<void> | null = null;
  private closed = false;
  private readonly closers = new Set<() => void>();

  constructor(
    private readonly config: ConfigService<Env, true>,
    private readonly readings: ReadingsService,
    private readonly devices: DevicesService,
  ) {}

  /** A ticket for the stream, after checking that the station or device exists in the caller's organization. */
  async ticket(c: RequestContext, body: { stationId?: string; deviceId?: string }) {
    if (body.deviceId) await this.devices.get(c, body.deviceId);
    if (body.stationId) await this.watchedDevices(c, body.stationId, undefined, true);
    const exp = Math.floor(Date.now() / 1000) + TICKET_TTL_S;
    const claims: LiveClaims = { o: c.principal.organizationId, p: c.principal.id, pk: c.principal.kind, exp, ...(body.stationId ? { s: body.stationId } : {}), ...(body.deviceId ? { d: body.deviceId } : {}) };
    const ticket = signTicket(claims, this.config.get('JWT_SECRET', { infer: true }));
    return { ticket, expiresAt: new Date(exp * 1000).toISOString(), expiresInSeconds: TICKET_TTL_S, streamUrl: `/v1/live/stream?ticket=${encodeURIComponent(ticket)}` };
  }

  /** Checks a ticket and resolves what it watches; a bad or expired ticket is a 401 problem. */
  async open(ticket: string | undefined) {
    const claims = ticket ? verifyTicket(ticket, this.config.get('JWT_SECRET', { infer: true })) : null;
    if (!claims) throw new ProblemException(401, { title: 'Ticket refused', detail: 'The live-stream ticket is missing, expired or not genuine. Ask for a new one with POST /v1/live/tickets.' });
    // the ticket's holder, as far as reading the organization's readings goes (a device key sees its own device only)
    const principal = (claims.pk === 'api_key'
      ? { kind: 'api_key', id: claims.p, organizationId: claims.o, scopes: ['readings:read'], deviceId: claims.d ?? null, name: 'live stream', keyKind: claims.d ? 'device' : 'integration', prefix: '' }
      : { kind: 'user', id: claims.p, organizationId: claims.o, role: 'viewer', email: '', name: '' }) as Principal;
    const ctx: RequestContext = { principal, ip: '', userAgent: undefined, requestId: `live-${claims.p}` } as RequestContext;
    const devices = await this.watchedDevices(ctx, claims.s, claims.d, false);
    return { ctx, devices, every: !claims.s && !claims.d };
  }

  private async watchedDevices(c: RequestContext, stationId: string | undefined, deviceId: string | undefined, mustExist: boolean): Promise<Map<string, LiveDevice>> {
    const filter: Record<string, unknown> = deviceId ? { id: [deviceId] } : stationId ? { stationId } : {};
    const { rows } = await this.devices.list(c, { filter, sort: { field: 'name', order: 'asc' }, offset: 0, limit: MAX_WATCHED_DEVICES });
    if (mustExist && stationId && rows.length === 0) {
      throw new ProblemException(422, { title: 'Nothing to watch', detail: 'No device is registered at that station in your organization.', errors: [{ pointer: '/stationId', detail: 'no device at this station', code: 'reference' }] });
    }
    return new Map(rows.map((d: { id: string; name: string; stationCode?: string | null }) => [d.id, { id: d.id, name: d.name, stationCode: d.stationCode ?? null }]));
  }

  /** Adds a stream; the returned function removes it. */
  async subscribe(s: Omit<Subscriber, 'orgId'>, close: () => void): Promise<() => void> {
    const sub: Subscriber = { ...s, orgId: s.ctx.principal.organizationId };
    this.subscribers.add(sub);
    this.closers.add(close);
    await this.ensureListening();
    return () => {
      this.subscribers.delete(sub);
      this.closers.delete(close);
    };
  }

  private ensureListening(): Promise<void> {
    if (this.listener || this.closed) return Promise.resolve();
    this.connecting ??= (async () => {
      const client = new pg.Client({ connectionString: this.config.get('DATABASE_URL', { infer: true }), application_name: 'pourgate-live' });
      client.on('notification', (n) => {
        if (n.channel === LIVE_CHANNEL && n.payload) void this.dispatch(n.payload).catch((e: Error) => this.log.warn(`live dispatch failed: ${e.message}`));
      });
      client.on('error', (e) => this.log.warn(`live listener lost its connection: ${e.message}`));
      client.on('end', () => {
        if (this.listener === client) this.listener = null;
        // reconnect while someone is watching (a PostgreSQL restart); readings in between are missed, the page says so
        if (!this.closed && this.subscribers.size) setTimeout(() => void this.ensureListening().catch(() => undefined), 1000).unref();
      });
      await client.connect();
      await client.query(`LISTEN ${LIVE_CHANNEL}`);
      this.listener = client;
    })().finally(() => {
      this.connecting = null;
    });
    return this.connecting;
  }

  private async dispatch(payload: string) {
    const n = JSON.parse(payload) as { o: string; k: 'received' | 'changed'; ids: string[] };
    const subs = [...this.subscribers].filter((s) => s.orgId === n.o);
    if (!subs.length) return;
    // one read per notification, as the first subscriber's principal (same organization; per-device filtering below)
    const { rows } = await this.readings.list(subs[0]!.ctx, { filter: { id: n.ids }, sort: { field: 'receivedAt', order: 'asc' }, offset: 0, limit: n.ids.length });
    for (const reading of rows) {
      const kind = n.k === 'received' ? 'received' : reading.review ? 'reviewed' : 'judged';
      for (const s of subs) {
        const device = s.devices.get(reading.deviceId) ?? (s.every ? { id: reading.deviceId, name: 'A device registered after this view opened', stationCode: null } : undefined);
        if (!device) continue;
        s.send({ kind, reading, device });
      }
    }
  }

  async onApplicationShutdown() {
    this.closed = true;
    // open streams would hold the HTTP server open
    for (const close of [...this.closers]) close();
    const l = this.listener;
    this.listener = null;
    if (l) await l.end().catch(() => undefined);
  }
}
