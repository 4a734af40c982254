import { useEffect, useState } from 'react';

/** The current time, re-read every `everyMs` so "x minutes ago" labels stay true on an open page. */
export function useNow(everyMs = 30_000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), everyMs);
    return () => clearInterval(t);
  }, [everyMs]);
  return now;
}
