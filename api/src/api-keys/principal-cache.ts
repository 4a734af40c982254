import { Inject, Injectable, Logger, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Redis } from 'ioredis';
import pg from 'pg';
import type { Principal } from '../auth/principal.js';
import type { Env } from '../config/env.js';
import { REDIS } from '../queues/queues.module.js';

/** Where every process hears that keys changed (revoked, rotated, scopes changed): Redis pub/sub. */
export const API_KEY_CHANNEL = 'pourgate:api-keys:changed';
/** PostgreSQL's notice of any committed change to a key row, however it was made (migration 0031). */
export const API_KEY_PG_CHANNEL = 'pourgate_api_keys';
/** The longest an entry is trusted without a change notice (a last resort; notices arrive in milliseconds). */
export const PRINCIPAL_TTL_MS = 30_000;
const MAX_ENTRIES = 10_000;

interface Entry {
  principal: Principal & { kind: 'api_key' };
  /** the earliest of: cached + PRINCIPAL_TTL_MS, the key's expiry, the end of its grace period */
  validUntil: number;
}

/**
 * API-key principals in memory, by secret hash, so a machine's request does not look its key up in
 * PostgreSQL each time. Correct only while this process hears every change: the service publishes
 * each change it makes on API_KEY_CHANNEL (Redis, after the commit), and PostgreSQL notifies
 * API_KEY_PG_CHANNEL at the commit of any change to a key row (a trigger), so a change made by hand
 * in SQL is heard too; each process drops the entries named. The cache is used only while both are
 * listened to; from a lost connection until it is back (and the cache emptied), every request reads
 * PostgreSQL, so a revoke never waits on a reconnection.
 * A lookup that started before a change notice is not stored (generation check), so a reading of
 * the old row cannot outlive the notice.
 */
@Injectable()
export class PrincipalCache implements OnModuleInit, OnApplicationShutdown {
  private readonly log = new Logger('PrincipalCache');
  private readonly entries = new Map<string, Entry>();
  private sub: Redis | null = null;
  private subscribed = false;
  private listener: pg.Client | null = null;
  private listening = false;
  private stopped = false;
  private reconnect?: NodeJS.Timeout;
  private generation = 0;

  constructor(
    private readonly config: ConfigService<Env, true>,
    @Inject(REDIS) private readonly redis: Redis,
  ) {}

  onModuleInit(): void {
    const sub = new Redis(this.config.get('REDIS_URL', { infer: true }), { maxRetriesPerRequest: null, autoResubscribe: false, connectTimeout: 2000, lazyConnect: false });
    this.sub = sub;
    sub.on('error', () => this.drop('redis'));
    sub.on('close', () => this.drop('redis'));
    sub.on('ready', () => {
      sub
        .subscribe(API_KEY_CHANNEL)
        .then(() => {
          // anything cached before the gap may have missed a notice
          this.invalidateAll();
          this.subscribed = true;
        })
        .catch((e: Error) => this.log.warn(`not subscribed to key changes (${e.message}); keys are read from PostgreSQL`));
    });
    sub.on('message', (channel: string, message: string) => {
      if (channel === API_KEY_CHANNEL) this.apply(message);
    });
    void this.listen();
  }

  /** LISTEN for key-row changes on a PostgreSQL connection of its own, reopened a second after a loss. */
  private async listen(): Promise<void> {
    if (this.stopped) return;
    const client = new pg.Client({ connectionString: this.config.get('DATABASE_URL', { infer: true }), application_name: 'pourgate-api-keys' });
    let lost = false;
    const again = () => {
      if (lost) return;
      lost = true;
      if (this.listener === client) this.listener = null;
      this.drop('postgres');
      client.end().catch(() => undefined);
      if (this.stopped) return;
      this.reconnect = setTimeout(() => void this.listen(), 1000);
      this.reconnect.unref();
    };
    client.on('error', again);
    client.on('end', again);
    client.on('notification', (n) => {
      if (n.channel === API_KEY_PG_CHANNEL && n.payload) this.forget([n.payload]);
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${API_KEY_PG_CHANNEL}`);
      if (this.stopped || lost) return void client.end().catch(() => undefined);
      this.listener = client;
      this.invalidateAll();
      this.listening = true;
    } catch {
      again();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    this.subscribed = this.listening = false;
    clearTimeout(this.reconnect);
    this.sub?.disconnect();
    const l = this.listener;
    this.listener = null;
    await l?.end().catch(() => undefined);
  }

  private get live(): boolean {
    return this.subscribed && this.listening;
  }

  /** The cached principal of a secret hash, while the subscription is live and the entry valid. */
  get(hash: string): Principal | undefined {
    if (!this.live) return undefined;
    const e = this.entries.get(hash);
    if (!e) return undefined;
    if (e.validUntil <= Date.now()) {
      this.entries.delete(hash);
      return undefined;
    }
    return e.principal;
  }

  /** A token to pass back to `set`: the state of the world when the lookup began. */
  begin(): number {
    return this.generation;
  }

  /** Keeps a lookup's result, unless the subscription is down or a change was heard since `gen`. */
  set(hash: string, principal: Principal & { kind: 'api_key' }, gen: number, endsAt: (Date | null)[]): void {
    if (!this.live || gen !== this.generation) return;
    if (this.entries.size >= MAX_ENTRIES) this.entries.clear();
    const ends = endsAt.filter((d): d is Date => !!d).map((d) => d.getTime());
    this.entries.set(hash, { principal, validUntil: Math.min(Date.now() + PRINCIPAL_TTL_MS, ...ends) });
  }

  /**
   * After a change to these keys committed: dropped here at once, and in every other process when
   * the notice arrives. A notice that cannot be sent is retried; if Redis is down the other
   * processes' subscriptions are down too, and they read PostgreSQL until they subscribe again.
   */
  async changed(ids: string[]): Promise<void> {
    if (ids.length === 0) return;
    this.forget(ids);
    const message = JSON.stringify({ ids });
    for (let attempt = 0; attempt < 3; attempt++) {
      try {
        await this.redis.publish(API_KEY_CHANNEL, message);
        return;
      } catch (e) {
        if (attempt === 2) this.log.error(`key change not announced to other processes: ${(e as Error).message}`);
        else await new Promise((r) => setTimeout(r, 100 * (attempt + 1)));
      }
    }
  }

  private apply(message: string): void {
    try {
      const { ids } = JSON.parse(message) as { ids?: unknown };
      if (Array.isArray(ids)) this.forget(ids.filter((x): x is string => typeof x === 'string'));
      else this.invalidateAll();
    } catch {
      this.invalidateAll();
    }
  }

  private forget(ids: string[]): void {
    this.generation++;
    const gone = new Set(ids);
    for (const [hash, e] of this.entries) if (gone.has(e.principal.id)) this.entries.delete(hash);
  }

  private invalidateAll(): void {
    this.generation++;
    this.entries.clear();
  }

  private drop(which: 'redis' | 'postgres'): void {
    if (which === 'redis') this.subscribed = false;
    else this.listening = false;
    this.invalidateAll();
  }
}
