/**
 * The life of a batch, as data: every state, and which moves are legal. A batch is planned, then
 * weighed (the first reading arrives), mixed (the mix-start milestone) and poured (curing); a
 * rejected reading holds it at any point for review; a held batch is released when every rejection
 * is waived, or scrapped.
 */
export const BATCH_STATES = {
  planned: 'Targets computed; nothing weighed yet',
  weighing: 'Part A, part B and pigment are being weighed',
  mixed: 'A met B: the pot life is running',
  curing: 'Poured into the mold: curing until the demold time',
  on_hold: 'A reading was rejected; an engineer must waive or uphold it',
  released: 'Every reading accepted or every rejection waived',
  scrapped: 'Upheld rejection: the batch is not to be used',
} as const;

export type BatchState = keyof typeof BATCH_STATES;

export const BATCH_TRANSITIONS: Readonly<Record<BatchState, readonly BatchState[]>> = {
  planned: ['weighing', 'mixed', 'on_hold', 'scrapped'],
  weighing: ['mixed', 'on_hold', 'released', 'scrapped'],
  mixed: ['curing', 'on_hold', 'released', 'scrapped'],
  curing: ['on_hold', 'released', 'scrapped'],
  on_hold: ['released', 'scrapped'],
  released: ['on_hold'],
  scrapped: [],
};

export function canMove(from: string, to: BatchState): boolean {
  return (BATCH_TRANSITIONS[from as BatchState] ?? []).includes(to);
}

/** The event (besides batch.state_changed) that entering each state emits. */
export const STATE_EVENTS: Partial<Record<BatchState, 'batch.released' | 'batch.on_hold' | 'batch.scrapped'>> = {
  released: 'batch.released',
  on_hold: 'batch.on_hold',
  scrapped: 'batch.scrapped',
};
