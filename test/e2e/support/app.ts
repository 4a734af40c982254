import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import type { AddressInfo } from 'node:net';
import { Writable } from 'node:stream';
import request from 'supertest';
import { createApp } from '../../../api/src/app.factory.js';

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
  close(): Promise<void>;
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
    const app = await createApp({ logStream: logs });
    return {
      app,
      logs,
      http: request(app.getHttpServer()),
      async close() {
        await app.close();
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
