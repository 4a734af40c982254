import { ConfigService } from '@nestjs/config';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import http from 'node:http';
import { createApp } from './app.factory.js';
import type { Env } from './config/env.js';

/**
 * PROCESS_ROLE=worker serves no public HTTP: the API port stays closed, and orchestrators probe a
 * separate port (WORKER_HEALTH_PORT) that answers only GET /health and GET /ready, through the
 * same handlers the API serves under /v1 (answered in-process, never over the network).
 */
function startWorkerHealth(app: NestFastifyApplication, host: string, port: number): Promise<http.Server> {
  const fastify = app.getHttpAdapter().getInstance();
  const server = http.createServer((req, res) => {
    const path = (req.url ?? '/').split('?')[0];
    if (req.method !== 'GET' || (path !== '/health' && path !== '/ready')) {
      res.writeHead(404, { 'content-type': 'application/problem+json' }).end(JSON.stringify({ type: 'about:blank', title: 'Not Found', status: 404, detail: 'A worker answers only GET /health and GET /ready.' }));
      return;
    }
    fastify
      .inject({ method: 'GET', url: `/v1${path}` })
      .then((r) => {
        const body = path === '/health' ? JSON.stringify({ ...r.json(), role: 'worker' }) : r.body;
        res.writeHead(r.statusCode, { 'content-type': String(r.headers['content-type'] ?? 'application/json') }).end(body);
      })
      .catch((e: Error) => res.writeHead(500).end(e.message));
  });
  return new Promise((resolve, reject) => server.once('error', reject).listen(port, host, () => resolve(server)));
}

async function main(): Promise<void> {
  const app = await createApp();
  const config = app.get(ConfigService<Env, true>);
  const role = config.get('PROCESS_ROLE', { infer: true });
  const host = config.get('HOST', { infer: true });
  const log = app.getHttpAdapter().getInstance().log;

  // Nest closes the app on SIGTERM/SIGINT (queues wait for their running jobs); a job that hangs
  // must not keep the process alive for ever: after SHUTDOWN_TIMEOUT_MS it exits, and Bull hands
  // the cut-off job to another worker (stalled-job check).
  const timeoutMs = config.get('SHUTDOWN_TIMEOUT_MS', { infer: true });
  for (const sig of ['SIGTERM', 'SIGINT'] as const) {
    process.once(sig, () => {
      log.info({ signal: sig, timeoutMs }, 'shutting down: waiting for running jobs');
      setTimeout(() => {
        log.warn({ timeoutMs }, 'running jobs did not finish in time; exiting (they are retried elsewhere)');
        process.exit(1);
      }, timeoutMs).unref();
    });
  }

  if (role === 'worker') {
    const port = config.get('WORKER_HEALTH_PORT', { infer: true });
    if (port > 0) {
      const health = await startWorkerHealth(app, host, port);
      for (const sig of ['SIGTERM', 'SIGINT'] as const) process.once(sig, () => health.close());
    }
    log.info({ role, healthPort: port || null }, port ? `Pourgate worker running; health on http://${host}:${port}/health` : 'Pourgate worker running (no health port)');
    return;
  }
  const port = config.get('PORT', { infer: true });
  await app.listen(port, host);
  log.info({ port, host, role }, `Pourgate listening on http://${host}:${port}`);
}

main().catch((err: Error) => {
  // configuration errors name the bad variable; print them plainly, not as a stack
  process.stderr.write(`${err.message.startsWith('Invalid configuration') ? err.message : err.stack}\n`);
  process.exit(1);
});
