import createClient, { type Client } from 'openapi-fetch';
import { randomUUID } from 'node:crypto';
import { PourgateProblem, parseRetryAfter } from './errors.js';
import type { BatchTargets, BulkReadingsResult, EventType, PourgateEvent, Reading, ReadingAck, ReadingInput, Session } from './models.js';
import type { paths } from './schema.js';
import { createTransport, type Credentials, type TransportOptions } from './transport.js';

export interface PourgateOptions extends Omit<TransportOptions, 'credentials'> {
  /** Where the API answers, without /v1: for example http://127.0.0.1:3000 */
  baseUrl: string;
  /** A machine's API key (pgd_… for devices, pgi_… for integrations). */
  apiKey?: string;
  /** A person's access token, or a function returning the current one. */
  token?: string | (() => string | Promise<string>);
  /** With token: called once after a 401 to get a fresh access token. */
  refresh?: () => Promise<string>;
}

/** Paths whose GET speaks the simple-rest list protocol (sort, range, filter; Content-Range). */
export type ListPath = {
  [P in keyof paths]: paths[P] extends { get: { parameters: { query?: { range?: string } } } } ? P : never;
}[keyof paths];

/** One row of a list path: the item schema of its 200 body (e.g. `reading.view` for /v1/readings). */
export type ListItem<P extends ListPath> = paths[P] extends { get: { responses: { 200: { content: { 'application/json': (infer T)[] } } } } } ? T : never;

export interface PaginateOptions {
  filter?: Record<string, unknown>;
  sort?: [field: string, order: 'ASC' | 'DESC'];
  /** Rows per request (default 100; the API allows up to 500). */
  pageSize?: number;
  /** Path parameters, for lists under a resource (e.g. { id } of /v1/material-systems/{id}/revisions). */
  path?: Record<string, string>;
}

export interface EventFeedOptions {
  /** The cursor to resume after (a previous feed's `cursor`); the oldest events when omitted. */
  after?: string;
  /** Events per request (default 100, at most 1000). */
  limit?: number;
  types?: EventType[];
  /** Keep polling when caught up, instead of ending (stop with `signal`). */
  follow?: boolean;
  /** Wait between polls when caught up, in ms (default 1000). */
  pollIntervalMs?: number;
  signal?: AbortSignal;
}

type FetchResult = { data?: unknown; error?: unknown; response: Response };

/** A range header `resource start-end/total` as the list routes send it. */
export function parseContentRange(value: string | null): { start: number; end: number; total: number | null } | null {
  const m = value?.match(/^\s*\S+\s+(\d+)-(\d+)\/(\d+|\*)\s*$/);
  return m ? { start: Number(m[1]), end: Number(m[2]), total: m[3] === '*' ? null : Number(m[3]) } : null;
}

/**
 * The Pourgate client. `api` is the typed openapi-fetch client for every route; the methods below
 * cover what scales, loggers and ERPs do most, and throw `PourgateProblem` on any error.
 */
export class Pourgate {
  readonly api: Client<paths>;
  readonly baseUrl: string;

  constructor(opts: PourgateOptions) {
    const credentials: Credentials = opts.apiKey ? { apiKey: opts.apiKey } : opts.token ? { token: opts.token, refresh: opts.refresh } : {};
    this.baseUrl = opts.baseUrl.replace(/\/+$/, '').replace(/\/v1$/, '');
    this.api = createClient<paths>({ baseUrl: this.baseUrl, fetch: createTransport({ ...opts, credentials }) });
  }

  /**
   * Signs a person in and returns a client that keeps its session: on a 401 it trades the refresh
   * token for a new pair (refresh tokens work once, so the newest one is always kept).
   */
  static async signIn(opts: Omit<PourgateOptions, 'apiKey' | 'token' | 'refresh'> & { email: string; password: string }): Promise<Pourgate> {
    const { email, password, ...rest } = opts;
    const anonymous = new Pourgate(rest);
    let session: Session = await anonymous.unwrap(anonymous.api.POST('/v1/auth/sign-in', { body: { email, password } }));
    return new Pourgate({
      ...rest,
      token: () => session.accessToken,
      refresh: async () => {
        session = await anonymous.unwrap(anonymous.api.POST('/v1/auth/refresh', { body: { refreshToken: session.refreshToken } }));
        return session.accessToken;
      },
    });
  }

  /** The data of a successful call, or a thrown `PourgateProblem`. */
  async unwrap<T>(call: Promise<{ data?: T; error?: unknown; response: Response }>): Promise<T> {
    const { data, error, response } = await call;
    if (response.ok) return data as T;
    throw PourgateProblem.from(response.status, response.statusText, response.headers.get('content-type'), error, response.headers.get('x-request-id'), parseRetryAfter(response.headers.get('retry-after')));
  }

  /**
   * Posts one reading. Its clientReadingId (generated when not given) makes every retry of it,
   * by this client or after a restart, land on the same stored reading.
   */
  postReading(input: ReadingInput): Promise<ReadingAck> {
    const body = { ...input, clientReadingId: input.clientReadingId ?? randomUUID() };
    return this.unwrap(this.api.POST('/v1/readings', { body }));
  }

  /** Posts up to 1000 readings at once, all or nothing. */
  postReadings(inputs: ReadingInput[]): Promise<BulkReadingsResult> {
    const readings = inputs.map((r) => ({ ...r, clientReadingId: r.clientReadingId ?? randomUUID() }));
    return this.unwrap(this.api.POST('/v1/readings/bulk', { body: { readings } }));
  }

  getReading(id: string): Promise<Reading> {
    return this.unwrap(this.api.GET('/v1/readings/{id}', { params: { path: { id } } }));
  }

  /** Polls a reading until the judge has decided (status other than pending). */
  async waitForVerdict(id: string, opts: { timeoutMs?: number; intervalMs?: number } = {}): Promise<Reading> {
    const deadline = Date.now() + (opts.timeoutMs ?? 30_000);
    for (;;) {
      const r = await this.getReading(id);
      if (r.status !== 'pending') return r;
      if (Date.now() > deadline) throw new Error(`reading ${id} was still pending after ${opts.timeoutMs ?? 30_000} ms`);
      await new Promise((res) => setTimeout(res, opts.intervalMs ?? 250));
    }
  }

  batchTargets(batchId: string): Promise<BatchTargets> {
    return this.unwrap(this.api.GET('/v1/batches/{id}/targets', { params: { path: { id: batchId } } }));
  }

  /** Every row of a list, fetched a page at a time by the range parameter until Content-Range's total. */
  async *paginate<P extends ListPath>(path: P, opts: PaginateOptions = {}): AsyncGenerator<ListItem<P>> {
    const size = opts.pageSize ?? 100;
    for (let start = 0; ; ) {
      const query: Record<string, string> = { range: JSON.stringify([start, start + size - 1]) };
      if (opts.filter) query.filter = JSON.stringify(opts.filter);
      if (opts.sort) query.sort = JSON.stringify(opts.sort);
      const call = (this.api.GET as (p: string, o: unknown) => Promise<FetchResult>)(path, { params: { query, path: opts.path } });
      const { response } = await call;
      const rows = (await this.unwrap(call)) as ListItem<P>[];
      for (const row of rows) yield row;
      const range = parseContentRange(response.headers.get('content-range'));
      start += rows.length;
      if (rows.length === 0 || (range?.total != null ? start >= range.total : rows.length < size)) return;
    }
  }

  /** The event feed as an async iterator (see EventFeed). */
  events(opts: EventFeedOptions = {}): EventFeed {
    return new EventFeed(this, opts);
  }
}

/**
 * Iterates `GET /v1/events` page by page. `cursor` moves once a whole page has been handed out, so
 * a consumer that stores it and resumes with `after` gets every event at least once (de-duplicate
 * on `event.id`, as webhook receivers do on `webhook-id`).
 */
export class EventFeed implements AsyncIterable<PourgateEvent> {
  cursor: string | undefined;

  constructor(
    private readonly client: Pourgate,
    private readonly opts: EventFeedOptions,
  ) {
    this.cursor = opts.after;
  }

  async *[Symbol.asyncIterator](): AsyncGenerator<PourgateEvent> {
    const { limit = 100, types, follow = false, pollIntervalMs = 1000, signal } = this.opts;
    while (!signal?.aborted) {
      const query = { limit, ...(this.cursor ? { after: this.cursor } : {}), ...(types?.length ? { type: types } : {}) };
      const page = await this.client.unwrap(this.client.api.GET('/v1/events', { params: { query }, signal }));
      // the document types `data` loosely; PourgateEvent narrows it by `type`
      for (const e of page.events) yield e as PourgateEvent;
      if (page.next) this.cursor = page.next;
      if (page.hasMore) continue;
      if (!follow) return;
      await new Promise<void>((resolve) => {
        const t = setTimeout(resolve, pollIntervalMs);
        signal?.addEventListener('abort', () => (clearTimeout(t), resolve()), { once: true });
      });
    }
  }
}
