/**
 * PROCESS_ROLE decides what this process does: `api` serves HTTP only, `worker` runs the queue
 * processors only, `all` (the default) does both. Read at module-definition time, because Nest
 * discovers Bull processors from the provider list.
 */
export function processRole(): 'api' | 'worker' | 'all' {
  const r = process.env.PROCESS_ROLE;
  return r === 'api' || r === 'worker' ? r : 'all';
}

export const workerEnabled = () => processRole() !== 'api';
export const apiEnabled = () => processRole() !== 'worker';
