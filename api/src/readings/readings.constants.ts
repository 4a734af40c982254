export const JUDGE_QUEUE = 'reading-judging';

/** A pending reading older than this is taken to have lost its job and is queued again. */
export const SWEEP_AFTER_MS = 5_000;
export const SWEEP_EVERY_MS = 15_000;

/** Device clocks further off than this are flagged on the reading. */
export const MAX_CLOCK_SKEW_S = 300;

export const MAX_BULK_READINGS = 1000;

/** Judging jobs a worker runs at once. */
export const JUDGE_CONCURRENCY = 4;

export interface JudgeJob {
  readingId: string;
}
