import { BatchingInputError, translate } from '@pourgate/batching';
import { ProblemException, validationProblem } from '../common/problems.js';

/**
 * Runs a computation and turns its BatchingInputError into a 422 whose pointers name the request's
 * fields (the computation points into its own input; `mapPointer` translates).
 */
export function withBatchingErrors<T>(fn: () => T, mapPointer: (pointer: string, code: string) => string = (p) => p): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof BatchingInputError) throw validationProblem(translate(e, mapPointer));
    throw e;
  }
}

/** PostgreSQL unique violation (SQLSTATE 23505), optionally of one named constraint. */
export function isUniqueViolation(e: unknown, constraint?: string): boolean {
  const err = e as { code?: string; constraint?: string };
  return err?.code === '23505' && (constraint === undefined || err.constraint === constraint);
}

export function notFound(what: string): ProblemException {
  return new ProblemException(404, { detail: `No ${what} with that id in your organization.` });
}

export function conflict(detail: string, pointer: string, reason: string): ProblemException {
  return new ProblemException(409, { slug: 'conflict', detail, errors: [{ pointer, detail: reason, code: 'conflict' }] });
}
