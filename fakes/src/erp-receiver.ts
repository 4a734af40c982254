// The ERP's webhook receiver, as a shop's ERP gateway would run it: it verifies every delivery with
// the SDK's verifyWebhook (the reference Standard Webhooks library underneath), de-duplicates on
// webhook-id, and records what it got.
// For tests and the demo it can be told to misbehave: fail N times, answer 410, ask to retry later.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { verifyWebhook } from '@pourgate/sdk';
import { Recorder } from './recorder.js';

export interface Received {
  webhookId: string;
  timestamp: string;
  verified: boolean;
  error?: string;
  event?: { id: string; type: string; data: Record<string, unknown> };
  rawBody: string;
  headers: Record<string, string>;
  at: number;
  answered: number;
}

export interface ReceiverBehaviour {
  /** Answer 503 to the next N requests. */
  failNext?: number;
  /** Answer this status with Retry-After to the next request. */
  retryAfter?: { status: 429 | 503; seconds: number; times: number };
  /** Answer 410 Gone from now on. */
  gone?: boolean;
}

export interface ErpReceiver {
  url: string;
  port: number;
  received: Received[];
  behaviour: ReceiverBehaviour;
  /** Distinct verified events, first delivery of each webhook-id. */
  events(): Received[];
  waitFor(match: (r: Received) => boolean, timeoutMs?: number): Promise<Received>;
  stop(): Promise<void>;
  start(): Promise<void>;
  close(): Promise<void>;
}

export async function startErpReceiver(opts: {
  secret: string | (() => string);
  port?: number;
  host?: string;
  path?: string;
  /** Called for every delivery, verified or not, after it is recorded. */
  onReceived?: (r: Received) => void;
}): Promise<ErpReceiver> {
  const host = opts.host ?? '127.0.0.1';
  const recorder = new Recorder<Received>('webhook');
  const received = recorder.items;
  const behaviour: ReceiverBehaviour = {};
  const secret = () => (typeof opts.secret === 'function' ? opts.secret() : opts.secret);

  const handler: http.RequestListener = (req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const rawBody = Buffer.concat(chunks).toString('utf8');
      const headers = Object.fromEntries(Object.entries(req.headers).map(([k, v]) => [k, String(v)]));
      let status = 204;
      const extra: Record<string, string> = {};
      if (behaviour.gone) status = 410;
      else if (behaviour.retryAfter && behaviour.retryAfter.times > 0) {
        behaviour.retryAfter.times--;
        status = behaviour.retryAfter.status;
        extra['retry-after'] = String(behaviour.retryAfter.seconds);
      } else if (behaviour.failNext && behaviour.failNext > 0) {
        behaviour.failNext--;
        status = 503;
      }
      const r: Received = { webhookId: headers['webhook-id'] ?? '', timestamp: headers['webhook-timestamp'] ?? '', verified: false, rawBody, headers, at: Date.now(), answered: status };
      try {
        r.event = verifyWebhook(headers, rawBody, secret()) as unknown as Received['event'];
        r.verified = true;
      } catch (e) {
        r.error = (e as Error).message;
        if (status === 204) status = 400;
        r.answered = status;
      }
      recorder.add(r);
      opts.onReceived?.(r);
      res.writeHead(status, { 'content-type': 'application/json', ...extra }).end(status < 300 ? '' : JSON.stringify({ status }));
    });
  };

  let server: http.Server | null = null;
  let port = opts.port ?? 0;
  const start = async () => {
    server = http.createServer(handler);
    await new Promise<void>((resolve) => server!.listen(port, host, () => resolve()));
    port = (server.address() as AddressInfo).port;
  };
  const stop = async () => {
    if (!server) return;
    const s = server;
    server = null;
    s.closeAllConnections();
    await new Promise<void>((resolve) => s.close(() => resolve()));
  };
  await start();

  return {
    get url() {
      return `http://${host}:${port}${opts.path ?? '/webhooks/pourgate'}`;
    },
    get port() {
      return port;
    },
    received,
    behaviour,
    events() {
      const seen = new Set<string>();
      return received.filter((r) => r.verified && r.answered < 300 && !seen.has(r.webhookId) && seen.add(r.webhookId));
    },
    waitFor(match, timeoutMs = 15_000) {
      return recorder.waitFor(match, timeoutMs);
    },
    start,
    stop,
    close: stop,
  };
}
