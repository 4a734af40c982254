import { Global, Inject, Injectable, Logger, Module, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import knexPkg from 'knex';
import type { Knex } from 'knex';
import pg from 'pg';
import type { Env } from '../config/env.js';

const { knex } = knexPkg;
export const KNEX = Symbol('KNEX');

// bigint counts and numeric columns arrive as strings by default; numeric is parsed where it is read.
pg.types.setTypeParser(pg.types.builtins.INT8, (v: string) => Number(v));
// DATE columns (calibration due, lot expiry) are calendar days, not instants: keep them as 'YYYY-MM-DD'.
pg.types.setTypeParser(pg.types.builtins.DATE, (v: string) => v);

const knexLogger = new Logger('Knex');

export function createKnex(url: string, poolMax = 10): Knex {
  return knex({
    // knex logs to console by default; send its warnings to the service log instead
    log: {
      warn: (m: unknown) => knexLogger.warn(String(m)),
      error: (m: unknown) => knexLogger.error(String(m)),
      deprecate: (m: unknown) => knexLogger.warn(String(m)),
      debug: (m: unknown) => knexLogger.debug(String(m)),
    },
    client: 'pg',
    connection: { connectionString: url, application_name: 'pourgate', connectionTimeoutMillis: 3000 },
    pool: { min: 0, max: poolMax, acquireTimeoutMillis: 5000 },
    acquireConnectionTimeout: 5000,
  });
}

@Injectable()
class KnexShutdown implements OnApplicationShutdown {
  constructor(@Inject(KNEX) private readonly db: Knex) {}
  async onApplicationShutdown(): Promise<void> {
    await this.db.destroy();
  }
}

/** The one PostgreSQL pool of the process, injected as `@Inject(KNEX)`. */
@Global()
@Module({
  providers: [
    {
      provide: KNEX,
      inject: [ConfigService],
      useFactory: (config: ConfigService<Env, true>) => createKnex(config.get('DATABASE_URL', { infer: true }), config.get('DATABASE_POOL_MAX', { infer: true })),
    },
    KnexShutdown,
  ],
  exports: [KNEX],
})
export class DatabaseModule {}
