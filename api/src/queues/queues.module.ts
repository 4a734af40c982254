import { BullModule } from '@nestjs/bull';
import { Global, Inject, Injectable, Module, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Redis, RedisOptions } from 'ioredis';
import type { Env } from '../config/env.js';

/** Queue names, in one place so producers and processors agree. */
export const QUEUES = {
  heartbeat: 'heartbeat',
} as const;

/**
 * Bull on the Redis of REDIS_URL. Bull opens three connections per queue; the blocking client
 * and the subscriber must not retry per request or check readiness (Bull's own requirement).
 */
export function bullRedisFactory(url: string) {
  const parsed = new URL(url);
  const base: RedisOptions = {
    host: parsed.hostname,
    port: Number(parsed.port || 6379),
    password: parsed.password || undefined,
    db: parsed.pathname.length > 1 ? Number(parsed.pathname.slice(1)) : 0,
    tls: parsed.protocol === 'rediss:' ? {} : undefined,
  };
  return (type: 'client' | 'subscriber' | 'bclient', opts?: RedisOptions) => {
    const redisOpts: RedisOptions = { ...opts, ...base };
    if (type !== 'client') Object.assign(redisOpts, { maxRetriesPerRequest: null, enableReadyCheck: false });
    else Object.assign(redisOpts, { maxRetriesPerRequest: 1 });
    return new Redis(redisOpts);
  };
}

export const REDIS = Symbol('REDIS');

/** A plain Redis client for counters and locks: fails fast (no offline queue) when Redis is down. */
export function createRedis(url: string): Redis {
  const r = new Redis(url, { maxRetriesPerRequest: 1, enableOfflineQueue: false, lazyConnect: false, connectTimeout: 2000 });
  // reconnects by itself; an outage shows in /v1/ready and in the callers' own warnings
  r.on('error', () => undefined);
  return r;
}

@Injectable()
class RedisShutdown implements OnApplicationShutdown {
  constructor(@Inject(REDIS) private readonly redis: Redis) {}
  async onApplicationShutdown(): Promise<void> {
    this.redis.disconnect();
  }
}

@Global()
@Module({
  providers: [
    { provide: REDIS, inject: [ConfigService], useFactory: (config: ConfigService<Env, true>) => createRedis(config.get('REDIS_URL', { infer: true })) },
    RedisShutdown,
  ],
  imports: [
    BullModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Env, true>) => ({
        createClient: bullRedisFactory(config.get('REDIS_URL', { infer: true })),
        prefix: config.get('QUEUE_PREFIX', { infer: true }),
        defaultJobOptions: { removeOnComplete: 1000, removeOnFail: 5000 },
        // a job whose worker died (SIGKILL, OOM) is taken back within ~15 s instead of ~60 s
        // (Bull's 30 s lock + 30 s stalled check); locks are renewed every lockDuration / 2
        settings: { lockDuration: 10_000, stalledInterval: 5_000 },
      }),
    }),
    BullModule.registerQueue({ name: QUEUES.heartbeat }),
  ],
  exports: [BullModule, REDIS],
})
export class QueuesModule {}
