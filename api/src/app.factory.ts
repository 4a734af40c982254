import 'reflect-metadata';
import rateLimit from '@fastify/rate-limit';
import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, NestFastifyApplication } from '@nestjs/platform-fastify';
import { SwaggerModule } from '@nestjs/swagger';
import helmet from 'helmet';
import { Redis } from 'ioredis';
import path from 'node:path';
import { type FastifyReply, type FastifyRequest, LogController } from 'fastify';
import type { DestinationStream } from 'pino';
import { AppModule } from './app.module.js';
import { frameworkErrorProblem, ProblemDetailsFilter } from './common/filters/problem-details.filter.js';
import { RouteTable } from './common/filters/route-table.js';
import { validateEnv } from './config/env.js';
import { PROJECT_ROOT } from './config/paths.js';
import { createLogger, genReqId, PinoNestLogger } from './logging/logger.js';
import { buildOpenApiDocument } from './openapi/openapi.js';
import { serveConsole } from './static/console-assets.js';

export interface CreateAppOptions {
  /** Where log lines go (tests capture them); stdout by default. */
  logStream?: DestinationStream;
  /** Sees every response as sent, body serialised (the e2e suites check each against the OpenAPI document). */
  onSend?: (req: FastifyRequest, reply: FastifyReply, payload: unknown) => void;
}

/** Builds the whole HTTP application, initialised and ready; `main.ts` only adds `listen`. */
export async function createApp(opts: CreateAppOptions = {}): Promise<NestFastifyApplication> {
  const env = validateEnv(process.env);
  const logger = createLogger(env.LOG_LEVEL, opts.logStream, env.LOG_FORMAT);
  const adapter = new FastifyAdapter({
    loggerInstance: logger,
    genReqId,
    bodyLimit: env.BODY_LIMIT_BYTES,
    trustProxy: false,
    // no Nest middleware anywhere (hooks and guards instead): no middie hook on every request
    skipMiddie: true,
    frameworkErrors: frameworkErrorProblem as never,
    // one line per request (below), not Fastify's two ("incoming request", "request completed")
    logController: new LogController({ disableRequestLogging: true }),
  });
  const routes = new RouteTable();
  routes.attach(adapter.getInstance());
  const app = await NestFactory.create<NestFastifyApplication>(AppModule.forRoot(), adapter, {
    logger: new PinoNestLogger(logger),
    bufferLogs: false,
    // Fastify's own JSON parser only: Nest's default set adds a form-urlencoded parser, through which
    // a form body reached a JSON route as an object (an empty form is {}) instead of a 415
    bodyParser: false,
  });
  const fastify = app.getHttpAdapter().getInstance();
  // the request's line, written once it is answered; nothing is built when info is off
  fastify.addHook('onResponse', (req, reply, done) => {
    if (logger.isLevelEnabled('info')) req.log.info({ req, res: { statusCode: reply.statusCode }, responseTime: Math.round(reply.elapsedTime * 10) / 10 }, 'request completed');
    done();
  });
  fastify.addHook('onSend', async (req, reply, payload) => {
    reply.header('x-request-id', req.id);
    opts.onSend?.(req, reply, payload);
  });
  // Security headers on every answer, from one helmet middleware built here once (the Fastify
  // plugin rebuilt every one of helmet's middlewares on each request)
  const securityHeaders = helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
      },
    },
  });
  fastify.addHook('onRequest', (req, reply, done) => securityHeaders(req.raw, reply.raw, (err?: unknown) => done(err as Error | undefined)));
  // Per-address throttle for the routes that opt in (sign-in, refresh), shared by every API
  // process through Redis. Failed sign-ins are also counted per account (TokensService).
  const rateRedis = new Redis(env.REDIS_URL, { maxRetriesPerRequest: 1, enableOfflineQueue: false, connectTimeout: 2000 });
  rateRedis.on('error', () => undefined); // an outage shows in /v1/ready; throttling skips meanwhile (skipOnError)
  fastify.addHook('onClose', async () => rateRedis.disconnect());
  await app.register(rateLimit as never, {
    global: false,
    max: env.SIGNIN_IP_LIMIT_PER_MINUTE,
    timeWindow: 60_000,
    redis: rateRedis,
    nameSpace: env.RATE_LIMIT_NAMESPACE,
    skipOnError: true,
    errorResponseBuilder: (_req: unknown, ctx: { after: string; ttl: number }) => ({
      statusCode: 429,
      retryAfterSeconds: Math.ceil(ctx.ttl / 1000),
      message: `Too many attempts from this address; try again in ${ctx.after}.`,
    }),
  });
  app.enableCors({
    origin: env.CORS_ORIGINS.split(',').map((s) => s.trim()).filter(Boolean),
    methods: ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE'],
    allowedHeaders: ['Authorization', 'Content-Type', 'Range', 'Idempotency-Key', 'X-Api-Key', 'X-Request-Id'],
    exposedHeaders: ['Content-Range', 'Retry-After', 'X-Request-Id', 'Location'],
    maxAge: 600,
  });
  app.setGlobalPrefix('v1');
  // the filter logs through this app's own logger (Nest's static Logger follows the newest app)
  app.useGlobalFilters(new ProblemDetailsFilter(routes, { error: (msg: unknown, stack?: unknown) => logger.error({ context: 'ProblemDetails', stack }, String(msg)) }));
  app.enableShutdownHooks();

  const doc = buildOpenApiDocument(app);
  SwaggerModule.setup('docs', app, doc, {
    useGlobalPrefix: false,
    jsonDocumentUrl: '/v1/openapi.json',
    raw: ['json'],
    customSiteTitle: 'Pourgate API',
  });

  // loaded only when switched on: the dashboard's packages cost a process ~25 MiB it would never use
  if (env.QUEUE_DASHBOARD === 'on') await (await import('./queues/queue-dashboard.js')).registerQueueDashboard(app);
  await serveConsole(app, env.ADMIN_DIST || path.join(PROJECT_ROOT, 'admin', 'dist'), path.join(PROJECT_ROOT, 'api', 'placeholder'), logger);

  await app.init();
  await fastify.ready();
  return app;
}
