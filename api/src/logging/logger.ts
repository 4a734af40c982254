import type { LoggerService } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import pinoPkg from 'pino';
import pinoPretty from 'pino-pretty';
import type { DestinationStream, Logger, LoggerOptions } from 'pino';

const pino = pinoPkg as unknown as (opts: LoggerOptions, stream?: DestinationStream) => Logger;

/**
 * Paths that can carry a secret. pino replaces them before a line is written, so neither the
 * request log nor an error log ever holds a password, token or key.
 */
export const REDACT_PATHS = [
  'req.headers.authorization',
  'req.headers["x-api-key"]',
  'req.headers.cookie',
  'res.headers["set-cookie"]',
  '*.password',
  '*.secret',
  '*.token',
  '*.refreshToken',
  '*.accessToken',
  '*.apiKey',
];

export type LogFormat = 'auto' | 'json' | 'pretty';

/**
 * JSON lines for log shippers; readable lines for a person at a terminal. `auto` is readable only
 * outside production and only when stdout is a terminal (piped or redirected output stays JSON).
 */
export function prettyLogs(format: LogFormat, nodeEnv: string | undefined, stdoutIsTTY: boolean): boolean {
  if (format !== 'auto') return format === 'pretty';
  return nodeEnv !== 'production' && stdoutIsTTY;
}

/** pino-pretty as an in-process stream (no worker thread): one readable line per entry. */
export function prettyStream(destination?: NodeJS.WritableStream, colorize = true): DestinationStream {
  return pinoPretty({
    colorize,
    destination: destination ?? 1,
    sync: true,
    translateTime: 'SYS:HH:MM:ss.l',
    ignore: 'pid,hostname,service',
    singleLine: true,
  }) as unknown as DestinationStream;
}

/** A given stream (tests) is used as it is; otherwise stdout, readable or JSON by `prettyLogs`. */
export function createLogger(level: string, stream?: DestinationStream, format: LogFormat = 'auto'): Logger {
  if (!stream && prettyLogs(format, process.env.NODE_ENV, process.stdout.isTTY === true)) stream = prettyStream();
  return pino(
    {
      level,
      redact: { paths: REDACT_PATHS, censor: '[redacted]' },
      base: { service: 'pourgate', pid: process.pid },
      timestamp: pinoPkg.stdTimeFunctions.isoTime,
      serializers: {
        req: (req: { id: string; method: string; url: string; headers: Record<string, unknown>; ip?: string }) => ({
          id: req.id,
          method: req.method,
          // query strings never carry credentials here (keys travel in headers), but strip them anyway
          url: req.url?.split('?')[0],
          ip: req.ip,
          headers: { 'user-agent': req.headers?.['user-agent'], authorization: req.headers?.authorization, 'x-api-key': req.headers?.['x-api-key'] },
        }),
      },
    },
    stream,
  );
}

/** A request id: the caller's X-Request-Id when it is sane, otherwise a new UUID. */
export function genReqId(req: IncomingMessage): string {
  const given = req.headers['x-request-id'];
  return typeof given === 'string' && /^[A-Za-z0-9._:-]{1,128}$/.test(given) ? given : randomUUID();
}

/** Nest's logger interface on top of the same pino instance Fastify uses. */
export class PinoNestLogger implements LoggerService {
  constructor(private readonly logger: Logger) {}
  log(message: unknown, context?: string) {
    this.logger.info({ context }, String(message));
  }
  error(message: unknown, stack?: string, context?: string) {
    this.logger.error({ context, stack }, String(message));
  }
  warn(message: unknown, context?: string) {
    this.logger.warn({ context }, String(message));
  }
  debug(message: unknown, context?: string) {
    this.logger.debug({ context }, String(message));
  }
  verbose(message: unknown, context?: string) {
    this.logger.trace({ context }, String(message));
  }
  fatal(message: unknown, context?: string) {
    this.logger.fatal({ context }, String(message));
  }
}
