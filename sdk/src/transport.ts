import { randomUUID } from 'node:crypto';
import { PourgateNetworkError, parseRetryAfter } from './errors.js';

export interface RetryOptions {
  /** Further attempts after the first (default 4). */
  retries?: number;
  /** First backoff step in ms (default 300); doubles each attempt. */
  baseDelayMs?: number;
  /** Longest wait between attempts in ms (default 20 000). */
  maxDelayMs?: number;
  /** A Retry-After longer than this (seconds) is not waited for: the error is returned (default 120). */
  maxRetryAfterSeconds?: number;
  /** Statuses worth another attempt (default 429, 500, 502, 503, 504). */
  statuses?: number[];
}

export type Credentials =
  | { apiKey: string }
  | {
      /** A person's access token (or a function returning the current one). */
      token: string | (() => string | Promise<string>);
      /** Called once after a 401: return a fresh access token, and the request is sent again with it. */
      refresh?: () => Promise<string>;
    }
  | Record<string, never>;

export interface TransportOptions {
  credentials: Credentials;
  retry?: RetryOptions;
  /** Per attempt, in ms (default 30 000); a timed-out attempt counts as a network error. */
  timeoutMs?: number;
  fetch?: (input: Request) => Promise<Response>;
  /** Called before each retry (logging, metrics). */
  onRetry?: (info: { attempt: number; delayMs: number; reason: string; request: Request }) => void;
  /** Test hook: how to wait (default setTimeout). */
  sleep?: (ms: number) => Promise<void>;
}

/** The header machines send their key in (see the API's security scheme "apiKey"). */
export const API_KEY_HEADER = 'X-Api-Key';
export const IDEMPOTENCY_HEADER = 'Idempotency-Key';
const DEFAULT_STATUSES = [429, 500, 502, 503, 504];

const defaultSleep = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));

/** Full-jitter exponential backoff: a random wait up to base × 2^attempt, capped. */
export function backoffDelay(attempt: number, base: number, max: number, random = Math.random): number {
  return Math.round(random() * Math.min(max, base * 2 ** attempt));
}

/**
 * A fetch for openapi-fetch that authenticates, gives every POST one Idempotency-Key (kept across
 * its retries, so the server can recognise a repeat), and retries network errors, 429 and 5xx with
 * backoff and jitter, waiting at least what Retry-After asks.
 */
export function createTransport(opts: TransportOptions): (input: Request) => Promise<Response> {
  const doFetch = opts.fetch ?? ((r: Request) => globalThis.fetch(r));
  const sleep = opts.sleep ?? defaultSleep;
  const retries = opts.retry?.retries ?? 4;
  const base = opts.retry?.baseDelayMs ?? 300;
  const max = opts.retry?.maxDelayMs ?? 20_000;
  const maxRetryAfter = opts.retry?.maxRetryAfterSeconds ?? 120;
  const statuses = opts.retry?.statuses ?? DEFAULT_STATUSES;
  const timeoutMs = opts.timeoutMs ?? 30_000;
  const creds = opts.credentials;
  let refreshing: Promise<string> | null = null;
  let refreshedToken: string | null = null;

  const authHeader = async (): Promise<[string, string] | null> => {
    if ('apiKey' in creds && creds.apiKey) return [API_KEY_HEADER, creds.apiKey];
    if ('token' in creds && creds.token) {
      const t = refreshedToken ?? (typeof creds.token === 'function' ? await creds.token() : creds.token);
      return ['Authorization', `Bearer ${t}`];
    }
    return null;
  };

  return async (input: Request): Promise<Response> => {
    const method = input.method.toUpperCase();
    const headers = new Headers(input.headers);
    if (method === 'POST' && !headers.has(IDEMPOTENCY_HEADER)) headers.set(IDEMPOTENCY_HEADER, randomUUID());
    // buffered once, so every attempt sends the same bytes
    const body = input.body ? await input.arrayBuffer() : undefined;
    const explicit = new Set(headers.keys());
    let refreshed = false;
    for (let attempt = 0; ; attempt++) {
      const auth = await authHeader();
      if (auth && !explicit.has(auth[0].toLowerCase())) headers.set(auth[0], auth[1]);
      const signal = AbortSignal.any([input.signal, AbortSignal.timeout(timeoutMs)]);
      const request = new Request(input.url, { method, headers, body, signal, redirect: input.redirect });
      let response: Response;
      try {
        response = await doFetch(request);
      } catch (err) {
        if (input.signal.aborted) throw err; // the caller gave up: not ours to retry
        if (attempt >= retries) throw new PourgateNetworkError(`${method} ${input.url} failed after ${attempt + 1} attempt(s): ${(err as Error).message}`, attempt + 1, { cause: err });
        const delayMs = backoffDelay(attempt, base, max);
        opts.onRetry?.({ attempt: attempt + 1, delayMs, reason: (err as Error).message, request });
        await sleep(delayMs);
        continue;
      }
      if (response.status === 401 && 'refresh' in creds && creds.refresh && !refreshed) {
        refreshed = true;
        refreshing ??= creds.refresh().finally(() => (refreshing = null));
        refreshedToken = await refreshing;
        await response.body?.cancel();
        attempt--; // a refreshed credential is not a retry
        continue;
      }
      if (!statuses.includes(response.status) || attempt >= retries) return response;
      const retryAfter = parseRetryAfter(response.headers.get('retry-after'));
      if (retryAfter !== undefined && retryAfter > maxRetryAfter) return response;
      const backoff = backoffDelay(attempt, base, max);
      const delayMs = retryAfter !== undefined ? retryAfter * 1000 + Math.round(Math.random() * base) : backoff;
      opts.onRetry?.({ attempt: attempt + 1, delayMs, reason: `HTTP ${response.status}`, request });
      await response.body?.cancel();
      await sleep(delayMs);
    }
  };
}
