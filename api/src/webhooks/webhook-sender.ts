import http from 'node:http';
import https from 'node:https';
import { Webhook } from 'standardwebhooks';
import net from 'node:net';
import { plainSendError } from './plain-reason.js';
import { addressRange, AllowList, guardedLookup, isPublicAddress, SsrfError } from './ssrf-guard.js';

export interface SendResult {
  statusCode: number | null;
  durationMs: number;
  retryAfter?: string;
  error?: string;
  ssrf?: boolean;
  responseSnippet?: string;
}

/** Signs with every given secret (two during a rotation overlap): `v1,<sig> v1,<sig>`. */
export function signatureHeader(secrets: string[], id: string, at: Date, body: string): string {
  return secrets.map((s) => new Webhook(s).sign(id, at, body)).join(' ');
}

/**
 * One delivery attempt. The exact bytes signed are the bytes sent; redirects are not followed
 * (a 3xx is a failure); the socket only connects to addresses the SSRF guard allows.
 */
export function sendWebhook(opts: { url: string; id: string; body: string; secrets: string[]; timeoutMs: number; allow: AllowList; now?: Date }): Promise<SendResult> {
  const started = Date.now();
  const at = opts.now ?? new Date();
  const url = new URL(opts.url);
  const headers = {
    'content-type': 'application/json',
    'user-agent': 'Pourgate-Webhooks/1',
    'webhook-id': opts.id,
    'webhook-timestamp': String(Math.floor(at.getTime() / 1000)),
    'webhook-signature': signatureHeader(opts.secrets, opts.id, at, opts.body),
    'content-length': String(Buffer.byteLength(opts.body)),
  };
  const lib = url.protocol === 'https:' ? https : http;
  // Node connects to an IP literal without calling `lookup`, so literals are checked here, before
  // any socket is opened; names are checked in the lookup (the address checked is the one used)
  const literal = url.hostname.replace(/^\[|\]$/g, '');
  if (net.isIP(literal) && !isPublicAddress(literal) && !opts.allow.allows(literal, literal)) {
    const e = new SsrfError(literal, literal, addressRange(literal));
    return Promise.resolve({ statusCode: null, durationMs: Date.now() - started, error: e.message, ssrf: true });
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    return Promise.resolve({ statusCode: null, durationMs: 0, error: `unsupported scheme ${url.protocol}`, ssrf: true });
  }
  return new Promise((resolve) => {
    const done = (r: Omit<SendResult, 'durationMs'>) => resolve({ ...r, durationMs: Date.now() - started });
    const req = lib.request(url, { method: 'POST', headers, lookup: guardedLookup(opts.allow), timeout: opts.timeoutMs }, (res) => {
      let snippet = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => {
        if (snippet.length < 500) snippet += chunk.slice(0, 500 - snippet.length);
      });
      res.on('end', () => done({ statusCode: res.statusCode ?? null, retryAfter: res.headers['retry-after'], responseSnippet: snippet }));
      res.on('error', (e) => done({ statusCode: res.statusCode ?? null, error: e.message }));
    });
    req.on('timeout', () => req.destroy(new Error(`no answer within ${opts.timeoutMs} ms`)));
    req.on('error', (e) => {
      const ssrf = e instanceof SsrfError || (e as { cause?: unknown }).cause instanceof SsrfError;
      done({ statusCode: null, error: ssrf ? e.message : plainSendError(e, url), ssrf });
    });
    req.end(opts.body);
  });
}
