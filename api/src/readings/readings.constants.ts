export const JUDGE_QUEUE = 'reading-judging';

/** A pending reading older than this is taken to have lost its job and is queued again. */
export const SWEEP_AFTER_MS = 5_000;
export const SWEEP_EVERY_MS = 15_000;
/** A sweep re-queues up to SWEEP_PAGES pages of SWEEP_PAGE pending readings (the rest wait for the next). */
export const SWEEP_PAGE = 500;
export const SWEEP_PAGES = 40;

/** Device clocks further off than this are flagged on the reading. */
export const MAX_CLOCK_SKEW_S = 300;

export const MAX_BULK_READINGS = 1000;

/** Judging jobs a worker runs at once. */
export const JUDGE_CONCURRENCY = 4;

/** Readings per judging job of a bulk post or import (one Bull job each would cost more than the insert). */
export const JUDGE_CHUNK = 50;

/** Under a stream of single posts, one judging job at most this often (milliseconds); a lone post is queued at once. */
export const JUDGE_GATHER_MS = 5;

/** One reading (job id = reading id), or readings posted together (a chunk of a bulk post, or single posts gathered by `judgeSoon`), judged one after another. */
export type JudgeJob = { readingId: string; readingIds?: undefined } | { readingIds: string[]; readingId?: undefined };
