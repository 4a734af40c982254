import { Ajv } from 'ajv';

/**
 * Every environment variable the service reads, validated at boot. A bad value stops the process
 * with a message that names the variable, instead of failing later somewhere else.
 */
export const envSchema = {
  type: 'object',
  properties: {
    NODE_ENV: { enum: ['development', 'test', 'production'], default: 'development' },
    HOST: { type: 'string', default: '127.0.0.1' },
    PORT: { type: 'integer', minimum: 1, maximum: 65535, default: 3000 },
    PUBLIC_URL: { type: 'string', pattern: '^https?://', description: 'Base of links in mail; unset: the address the API listens on (HOST, PORT)' },
    DATABASE_URL: { type: 'string', pattern: '^postgres(ql)?://' },
    DATABASE_POOL_MAX: { type: 'integer', minimum: 1, maximum: 200, default: 10 },
    REDIS_URL: { type: 'string', pattern: '^rediss?://' },
    PROCESS_ROLE: { enum: ['api', 'worker', 'all'], default: 'all' },
    LOG_LEVEL: { enum: ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'], default: 'info' },
    BODY_LIMIT_BYTES: { type: 'integer', minimum: 1024, default: 1048576 },
    CORS_ORIGINS: { type: 'string', default: 'http://127.0.0.1:3000,http://localhost:3000,http://127.0.0.1:5173,http://localhost:5173' },
    JWT_SECRET: { type: 'string', minLength: 32, default: 'development-only-secret-change-me-in-production' },
    ADMIN_DIST: { type: 'string', default: '' },
    SMTP_URL: { type: 'string', pattern: '^smtps?://', description: 'SMTP server for invitations and notices' },
    MAIL_FROM: { type: 'string', default: 'Pourgate <pourgate@localhost>' },
    ACCESS_TOKEN_TTL_SECONDS: { type: 'integer', minimum: 60, maximum: 86400, default: 900 },
    REFRESH_TOKEN_TTL_SECONDS: { type: 'integer', minimum: 600, default: 2592000 },
    INVITATION_TTL_HOURS: { type: 'integer', minimum: 1, maximum: 720, default: 72 },
    SIGNIN_MAX_FAILURES: { type: 'integer', minimum: 1, default: 5 },
    SIGNIN_LOCK_SECONDS: { type: 'integer', minimum: 1, default: 900 },
    SIGNIN_IP_LIMIT_PER_MINUTE: { type: 'integer', minimum: 1, default: 30 },
    RATE_LIMIT_NAMESPACE: { type: 'string', default: 'pourgate-rl:' },
    SECRETS_KEY: { type: 'string', minLength: 16, default: 'development-only-secrets-key' },
    SECRETS_KEY_PREVIOUS: { type: 'string', default: '', description: 'Former SECRETS_KEY values (comma-separated) whose sealed secrets must still open after a rotation' },
    WEBHOOK_ALLOWED_HOSTS: { type: 'string', default: '' },
    WEBHOOK_RETRY_SCHEDULE: { type: 'string', pattern: '^\\s*\\d+(\\.\\d+)?(\\s*,\\s*\\d+(\\.\\d+)?)*\\s*$', default: '0,5,300,1800,7200,18000,36000,50400,72000,86400' },
    WEBHOOK_TIMEOUT_MS: { type: 'integer', minimum: 100, maximum: 60000, default: 15000 },
    WEBHOOK_RELAY_INTERVAL_MS: { type: 'integer', minimum: 20, maximum: 60000, default: 100 },
    OUTBOX_RELAY: { enum: ['on', 'off'], default: 'on' },
    NOTIFICATIONS: { enum: ['on', 'off'], default: 'on', description: 'Whether this worker sends rejection e-mails' },
    NOTIFY_INTERVAL_MS: { type: 'integer', minimum: 20, maximum: 600000, default: 1000, description: 'How often one-by-one rejection e-mails are sent' },
    NOTIFY_DIGEST_CRON: { type: 'string', minLength: 9, default: '0 6 * * *', description: 'When the daily rejection digest goes out (cron, in NOTIFY_DIGEST_TZ): 06:00 by default' },
    NOTIFY_DIGEST_TZ: { type: 'string', minLength: 1, default: 'UTC' },
    NOTIFY_DIGEST_INTERVAL_MS: { type: 'integer', minimum: 100, maximum: 86400000, description: 'Tests and demos only: send digests every so many ms instead of on NOTIFY_DIGEST_CRON' },
    WORKER_HEALTH_PORT: { type: 'integer', minimum: 0, maximum: 65535, default: 3100, description: 'PROCESS_ROLE=worker: port of the health endpoint for orchestrators (0: none)' },
    SHUTDOWN_TIMEOUT_MS: { type: 'integer', minimum: 1000, maximum: 600000, default: 25000, description: 'How long a stopping process waits for running jobs before it exits anyway' },
    LOG_FORMAT: { enum: ['auto', 'json', 'pretty'], default: 'auto', description: 'auto: readable lines at a terminal outside production, JSON otherwise' },
    QUEUE_DASHBOARD: { enum: ['on', 'off'], default: 'on', description: 'The queue dashboard for admins at /queues/' },
    QUEUE_PREFIX: { type: 'string', pattern: '^[A-Za-z0-9:_-]+$', default: 'bull' },
  },
  required: ['DATABASE_URL', 'REDIS_URL'],
} as const;

export interface Env {
  NODE_ENV: 'development' | 'test' | 'production';
  HOST: string;
  PORT: number;
  PUBLIC_URL: string;
  DATABASE_URL: string;
  DATABASE_POOL_MAX: number;
  REDIS_URL: string;
  PROCESS_ROLE: 'api' | 'worker' | 'all';
  LOG_LEVEL: string;
  BODY_LIMIT_BYTES: number;
  CORS_ORIGINS: string;
  JWT_SECRET: string;
  ADMIN_DIST: string;
  SMTP_URL?: string;
  MAIL_FROM: string;
  ACCESS_TOKEN_TTL_SECONDS: number;
  REFRESH_TOKEN_TTL_SECONDS: number;
  INVITATION_TTL_HOURS: number;
  SIGNIN_MAX_FAILURES: number;
  SIGNIN_LOCK_SECONDS: number;
  SIGNIN_IP_LIMIT_PER_MINUTE: number;
  RATE_LIMIT_NAMESPACE: string;
  SECRETS_KEY: string;
  SECRETS_KEY_PREVIOUS: string;
  WEBHOOK_ALLOWED_HOSTS: string;
  WEBHOOK_RETRY_SCHEDULE: string;
  WEBHOOK_TIMEOUT_MS: number;
  WEBHOOK_RELAY_INTERVAL_MS: number;
  OUTBOX_RELAY: 'on' | 'off';
  NOTIFICATIONS: 'on' | 'off';
  NOTIFY_INTERVAL_MS: number;
  NOTIFY_DIGEST_CRON: string;
  NOTIFY_DIGEST_TZ: string;
  NOTIFY_DIGEST_INTERVAL_MS?: number;
  WORKER_HEALTH_PORT: number;
  SHUTDOWN_TIMEOUT_MS: number;
  LOG_FORMAT: 'auto' | 'json' | 'pretty';
  QUEUE_DASHBOARD: 'on' | 'off';
  QUEUE_PREFIX: string;
}

const ajv = new Ajv({ coerceTypes: true, useDefaults: true, allErrors: true });
const check = ajv.compile(envSchema);

/** Validates and coerces the environment; throws an Error naming each bad variable. */
export function validateEnv(raw: Record<string, unknown>): Env {
  const known = Object.keys(envSchema.properties);
  const picked: Record<string, unknown> = {};
  for (const k of known) if (raw[k] !== undefined && raw[k] !== '') picked[k] = raw[k];
  if (!check(picked)) {
    const lines = (check.errors ?? []).map((e) => {
      const name = e.instancePath.replace(/^\//, '') || (e.params as { missingProperty?: string }).missingProperty || '?';
      return `  ${name}: ${e.message}`;
    });
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const env = picked as unknown as Env;
  if (env.NODE_ENV === 'production' && env.JWT_SECRET === envSchema.properties.JWT_SECRET.default) {
    throw new Error('Invalid configuration:\n  JWT_SECRET: must be set to a secret of your own in production');
  }
  if (env.NODE_ENV === 'production' && env.SECRETS_KEY === envSchema.properties.SECRETS_KEY.default) {
    throw new Error('Invalid configuration:\n  SECRETS_KEY: must be set to a secret of your own in production');
  }
  if (env.NODE_ENV === 'production' && secretsKeysPrevious(env.SECRETS_KEY_PREVIOUS).includes(envSchema.properties.SECRETS_KEY.default)) {
    throw new Error('Invalid configuration:\n  SECRETS_KEY_PREVIOUS: must not hold the development key in production');
  }
  // links in mail point where the API listens unless told otherwise (a proxy, a domain name)
  env.PUBLIC_URL ??= `http://${linkHost(env.HOST)}:${env.PORT}`;
  return { ...raw, ...env } as Env;
}

/** SECRETS_KEY_PREVIOUS as a list. */
export function secretsKeysPrevious(spec: string | undefined): string[] {
  return (spec ?? '').split(',').map((k) => k.trim()).filter(Boolean);
}

/** A host a browser can open: a wildcard listen address becomes loopback; IPv6 goes in brackets. */
function linkHost(host: string): string {
  if (host === '0.0.0.0' || host === '::' || host === '') return '127.0.0.1';
  return host.includes(':') ? `[${host}]` : host;
}

/**
 * Why links in mail would not reach this API, or null when they do: PUBLIC_URL names another
 * port (or a loopback host while the API listens elsewhere). Worth a warning in development, where
 * nothing sits in between; behind a proxy in production a difference is normal.
 */
export function publicUrlMismatch(env: Pick<Env, 'PUBLIC_URL' | 'HOST' | 'PORT'>): string | null {
  let url: URL;
  try {
    url = new URL(env.PUBLIC_URL);
  } catch {
    return `PUBLIC_URL ${env.PUBLIC_URL} is not a URL`;
  }
  const port = Number(url.port || (url.protocol === 'https:' ? 443 : 80));
  if (port !== env.PORT) return `PUBLIC_URL ${env.PUBLIC_URL} points at port ${port}, but the API listens on ${env.HOST}:${env.PORT}; links in mail will not reach it`;
  return null;
}
