import type { Batch, BatchState } from '../views/sdk';

export type { Batch, BatchState };

export const BATCH_STATE: Readonly<Record<BatchState, { label: string; tone: 'good' | 'caution' | 'bad' | 'quiet' | 'info'; blurb: string }>> = {
  planned: { label: 'Planned', tone: 'quiet', blurb: 'Targets computed; nothing weighed yet' },
  weighing: { label: 'Weighing', tone: 'info', blurb: 'Parts are being weighed' },
  mixed: { label: 'Mixed', tone: 'info', blurb: 'A met B: the pot life is running' },
  curing: { label: 'Curing', tone: 'info', blurb: 'Poured; curing until the demold time' },
  on_hold: { label: 'On hold', tone: 'caution', blurb: 'A rejected reading waits for a decision' },
  released: { label: 'Released', tone: 'good', blurb: 'Cleared for demold and use' },
  scrapped: { label: 'Scrapped', tone: 'bad', blurb: 'Not to be used' },
};

/** "Seat cushion · Demo Flex 28", the way the floor names a batch. */
export function batchTitle(b: Pick<Batch, 'moldName' | 'subject' | 'materialSystemName'> | null | undefined): string {
  if (!b) return 'Batch';
  const what = b.subject === 'free_rise_cup' ? 'Free-rise cup' : (b.moldName ?? 'Mold');
  return `${what} · ${b.materialSystemName}`;
}

/** The first block of the id, enough to tell batches apart on a sheet or a screen. */
export function shortRef(id: string | null | undefined): string {
  return id ? id.slice(0, 8).toUpperCase() : '—';
}
