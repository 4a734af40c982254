import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { AddressInfo } from 'node:net';
import { Writable } from 'node:stream';
import request from 'supertest';
import { createApp } from '../../../api/src/app.factory.js';
import { type OpenApiDoc, ResponseContract } from './contract.js';

/** Collects every log line the app writes, so tests can assert what is (and is not) logged. */
export class LogCapture extends Writable {
  readonly lines: string[] = [];
  override _write(chunk: Buffer, _enc: string, done: () => void): void {
    this.lines.push(...chunk.toString('utf8').split('\n').filter(Boolean));
    done();
  }
  text(): string {
    return this.lines.join('\n');
  }
}

export interface TestApp {
  app: NestFastifyApplication;
  http: ReturnType<typeof request>;
  logs: LogCapture;
  /** Responses that did not match the served OpenAPI document; close() fails when there are any. */
  contractMismatches: string[];
  close(): Promise<void>;
}

const contracts = new Map<string, ResponseContract>();
/** One compiled contract per document text (every test app of a worker serves the same one). */
function contractFor(text: string): ResponseContract {
  let c = contracts.get(text);
  if (!c) {
    c = new ResponseContract(JSON.parse(text) as OpenApiDoc);
    contracts.set(text, c);
  }
  return c;
}

let appCount = 0;

/**
 * The real application on the test PostgreSQL and Redis that `npm test` started. Test apps serve
 * HTTP only unless a suite asks for workers (PROCESS_ROLE: 'all'); each has a queue prefix of its
 * own, so suites running side by side never take each other's jobs. Only a suite that asks for them
 * sends rejection e-mails (NOTIFICATIONS: 'on'), so each message reaches that suite's mail catcher.
 */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const saved: Record<string, string | undefined> = {};
  const prefix = `test-${process.pid}-${++appCount}`;
  for (const [k, v] of Object.entries({ LOG_LEVEL: 'info', PROCESS_ROLE: 'api', QUEUE_PREFIX: prefix, NOTIFICATIONS: 'off', ...env })) {
    saved[k] = process.env[k];
    process.env[k] = v;
  }
  const logs = new LogCapture();
  try {
    // every response the suite receives is checked against the served OpenAPI document
    const mismatches: string[] = [];
    let contract: ResponseContract | undefined;
    const app = await createApp({
      logStream: logs,
      onSend: (req, reply, payload) => {
        if (!contract) return;
        try {
          const wrong = contract.check({ method: req.method, route: req.routeOptions?.url, url: req.url, status: reply.statusCode, headers: reply.getHeaders(), payload });
          if (wrong && !mismatches.includes(wrong)) mismatches.push(wrong);
        } catch (e) {
          mismatches.push(`${req.method} ${req.url}: the contract check failed: ${(e as Error).message}`);
        }
      },
    });
    const served = await app.inject({ method: 'GET', url: '/v1/openapi.json' });
    contract = contractFor(served.body);
    return {
      app,
      logs,
      http: request(app.getHttpServer()),
      contractMismatches: mismatches,
      async close() {
        await app.close();
        if (mismatches.length) throw new Error(`${mismatches.length} response(s) did not match the OpenAPI document:\n- ${mismatches.join('\n- ')}`);
      },
    };
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
}

/** Puts a test app on a loopback port, so clients (the SDK, the fakes) reach it with fetch. */
export async function listenOnLoopback(t: TestApp): Promise<string> {
  await t.app.listen(0, '127.0.0.1');
  return `http://127.0.0.1:${(t.app.getHttpServer().address() as AddressInfo).port}`;
}
