import { problemToHttpError } from './problem';
import { accessTokenLapsing, pickTokens, type TokenResponse, type TokenStore } from './session';

export interface HttpResult {
  status: number;
  headers: Headers;
  body: string;
  json: any;
  /** The raw answer, for `asBlob` requests (documents). */
  blob?: Blob;
}

export interface RequestOptions extends RequestInit {
  /** Public routes (sign-in, refresh, accepting an invitation): no token, no refresh. */
  anonymous?: boolean;
  /** Read a successful answer as a Blob (a PDF download) instead of text. */
  asBlob?: boolean;
}

export type FetchJson = (url: string, options?: RequestOptions) => Promise<HttpResult>;

export interface HttpClientOptions {
  store: TokenStore;
  /** Where `POST {refreshToken}` renews the pair. */
  refreshUrl: string;
  fetch?: typeof fetch;
  now?: () => number;
  /** Called with every fresh token response (it carries the person, too). */
  onRefreshed?: (body: TokenResponse) => void;
  /** Called once the session cannot be renewed; react-admin then sends the person to sign-in. */
  onSessionEnded?: () => void;
}

export interface HttpClient {
  fetchJson: FetchJson;
  /** Renews the tokens; concurrent callers share one request. */
  refresh(): Promise<boolean>;
}

/**
 * The console's only way to reach the API: adds the bearer token, renews it once when a request
 * is refused with 401 (or just before it lapses), and turns problem+json answers into HttpError.
 */
export function createHttpClient(opts: HttpClientOptions): HttpClient {
  const fetchImpl = opts.fetch ?? ((input: RequestInfo | URL, init?: RequestInit) => globalThis.fetch(input, init));
  const now = opts.now ?? Date.now;
  const { store } = opts;
  let inFlight: Promise<boolean> | null = null;

  function endSession() {
    store.clear();
    opts.onSessionEnded?.();
  }

  async function renew(): Promise<boolean> {
    const tokens = store.read();
    if (!tokens?.refreshToken) return false;
    let res: Response;
    try {
      res = await fetchImpl(opts.refreshUrl, {
        method: 'POST',
        headers: { Accept: 'application/json', 'Content-Type': 'application/json' },
        body: JSON.stringify({ refreshToken: tokens.refreshToken }),
      });
    } catch {
      // offline for a moment: keep the session, the caller sees its own error
      return false;
    }
    if (!res.ok) {
      endSession();
      return false;
    }
    const body = (await res.json()) as TokenResponse;
    // the refresh token rotates: the old one is now spent, always keep the new one
    store.write(pickTokens(body));
    opts.onRefreshed?.(body);
    return true;
  }

  function refresh(): Promise<boolean> {
    inFlight ??= renew().finally(() => {
      inFlight = null;
    });
    return inFlight;
  }

  async function send(url: string, options: RequestOptions, token: string | null) {
    const { anonymous: _anonymous, asBlob, headers: given, ...init } = options;
    const headers = new Headers(given ?? undefined);
    if (!headers.has('Accept')) headers.set('Accept', 'application/json');
    if (init.body != null && !(init.body instanceof FormData) && !headers.has('Content-Type')) {
      headers.set('Content-Type', 'application/json');
    }
    if (token) headers.set('Authorization', `Bearer ${token}`);
    const response = await fetchImpl(url, { ...init, headers });
    const blob = asBlob && response.ok ? await response.blob() : undefined;
    const body = blob ? '' : await response.text();
    let json: unknown;
    if (body) {
      try {
        json = JSON.parse(body);
      } catch {
        json = undefined;
      }
    }
    return { status: response.status, statusText: response.statusText, headers: response.headers, body, json, blob };
  }

  const fetchJson: FetchJson = async (url, options = {}) => {
    let res: Awaited<ReturnType<typeof send>>;
    if (options.anonymous) {
      res = await send(url, options, null);
    } else {
      let renewed = false;
      let tokens = store.read();
      if (tokens && accessTokenLapsing(tokens, now())) {
        renewed = await refresh();
        tokens = store.read();
      }
      const used = tokens?.accessToken ?? null;
      res = await send(url, options, used);
      if (res.status === 401 && used) {
        const current = store.read()?.accessToken ?? null;
        // another request may have renewed the pair while this one was on the wire
        const retry = current !== null && current !== used ? true : !renewed && (await refresh());
        if (retry) res = await send(url, options, store.read()?.accessToken ?? null);
        if (res.status === 401 && store.read()) endSession();
      }
    }
    if (res.status < 200 || res.status >= 300) throw problemToHttpError(res);
    return res;
  };

  return { fetchJson, refresh };
}
