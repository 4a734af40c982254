import { problemOf } from '../dataProvider/problem';

/**
 * For a dialog's submit handler: the field errors to hand back to the form, or undefined after
 * reporting a failure that names no field through `notify`.
 */
export function formErrorsOrNotify(error: unknown, notify: (message: string, options?: { type: 'error' }) => void): Record<string, string> | undefined {
  const problem = problemOf(error);
  if (problem?.errors && Object.keys(problem.errors).length > 0) return problem.errors;
  notify((error as Error)?.message || 'The request failed.', { type: 'error' });
  return undefined;
}
