import { createBullBoard } from '@bull-board/api';
import { BullAdapter } from '@bull-board/api/bullAdapter';
import { FastifyAdapter as BoardAdapter } from '@bull-board/fastify';
import { getQueueToken } from '@nestjs/bull';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { Queue } from 'bull';
import type { FastifyInstance, FastifyReply, FastifyRequest } from 'fastify';
import { ALL_QUEUES } from './queue-names.js';
import { DASHBOARD_PATH, QueueDashboardService } from './queue-dashboard.service.js';

function problem(reply: FastifyReply, status: 401 | 403, detail: string) {
  return reply
    .code(status)
    .header('content-type', 'application/problem+json')
    .header('cache-control', 'no-store')
    .send({ type: 'about:blank', title: status === 401 ? 'Unauthorized' : 'Forbidden', status, detail });
}

/**
 * The queue dashboard (bull-board, read-only) at /queues/, for people whose role allows
 * `queues:read` (admins). A browser arrives with the pass cookie the console asked for; a client
 * may instead send its bearer token, checked by the API's own guard (GET /v1/me answered
 * in-process). No pass or token: 401; another role: 403. Read-only, because the queues hold the
 * jobs of every organization of this deployment: it shows ids, never lets anyone retry or delete.
 */
export async function registerQueueDashboard(app: NestFastifyApplication): Promise<void> {
  const fastify = app.getHttpAdapter().getInstance() as unknown as FastifyInstance;
  const passes = app.get(QueueDashboardService, { strict: false });
  const queues = ALL_QUEUES.map((name) => app.get<Queue>(getQueueToken(name), { strict: false }));
  const board = new BoardAdapter();
  board.setBasePath(DASHBOARD_PATH);
  createBullBoard({
    queues: queues.map((q) => new BullAdapter(q, { readOnlyMode: true })),
    serverAdapter: board,
    options: { uiConfig: { boardTitle: 'Pourgate queues' } },
  });

  const guard = async (req: FastifyRequest, reply: FastifyReply) => {
    const auth = req.headers.authorization;
    if (auth) {
      const me = await fastify.inject({ method: 'GET', url: '/v1/me', headers: { authorization: auth } });
      if (me.statusCode === 401) return problem(reply, 401, 'The bearer token was not accepted.');
      if (me.statusCode !== 200) return problem(reply, 403, 'This account may not see the queues.');
      const actions = (me.json() as { actions?: string[] }).actions ?? [];
      if (!actions.includes('queues:read')) return problem(reply, 403, 'Your role does not allow queues:read: the queue dashboard is for admins.');
      return;
    }
    const holder = passes.passHolder(req.headers.cookie);
    if (!holder) return problem(reply, 401, 'Open the queue dashboard from the console (Admin → Job queues): it needs a pass, valid 15 minutes.');
    if (!(await passes.mayView(holder))) return problem(reply, 403, 'Your role does not allow queues:read: the queue dashboard is for admins.');
  };

  await app.register(
    (async (scope: FastifyInstance) => {
      scope.addHook('onRequest', guard);
      // the pages are the dashboard's own: never cached, never framed
      scope.addHook('onSend', async (_req, reply) => {
        reply.header('cache-control', 'no-store');
      });
      await scope.register(board.registerPlugin() as never, { prefix: '/' });
    }) as never,
    { prefix: DASHBOARD_PATH },
  );
}
