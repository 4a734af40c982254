import { useCallback, useEffect, useRef, useState } from 'react';

export interface ApiState<T> {
  data: T | undefined;
  error: unknown;
  isPending: boolean;
  /** Asks again (after a change the answer depends on). */
  reload: () => void;
}

/**
 * One API answer for a screen: asked when `key` changes (null: not yet), the latest answer kept,
 * a late answer to an older key dropped.
 */
export function useApi<T>(key: string | null, load: () => Promise<T>): ApiState<T> {
  const [state, setState] = useState<{ data?: T; error?: unknown; isPending: boolean }>({ isPending: !!key });
  const [tick, setTick] = useState(0);
  const latest = useRef(0);
  const loader = useRef(load);
  loader.current = load;
  useEffect(() => {
    if (!key) return;
    const mine = ++latest.current;
    setState((s) => ({ ...s, isPending: true }));
    loader.current().then(
      (data) => mine === latest.current && setState({ data, isPending: false }),
      (error: unknown) => mine === latest.current && setState({ error, isPending: false }),
    );
  }, [key, tick]);
  const reload = useCallback(() => setTick((t) => t + 1), []);
  return { data: state.data, error: state.error, isPending: state.isPending, reload };
}

/** The sentence a failed call's problem carries (its detail), else the error's message. */
export function problemText(error: unknown, fallback = 'The request failed.'): string {
  const body = error && typeof error === 'object' && 'body' in error ? (error as { body?: { detail?: unknown } }).body : undefined;
  if (body && typeof body.detail === 'string' && body.detail) return body.detail;
  return (error instanceof Error && error.message) || fallback;
}
