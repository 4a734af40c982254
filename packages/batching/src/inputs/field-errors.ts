import { BatchingInputError } from '../errors.js';

/** One refused field of a request: a JSON pointer into the request, a sentence, a machine code. */
export interface FieldError {
  pointer: string;
  detail: string;
  code?: string;
}

/**
 * The computation points into its own input; `mapPointer` turns each issue's pointer into one that
 * names the request's field. Duplicates (the same field, the same sentence) are dropped.
 */
export function translate(e: BatchingInputError, mapPointer: (pointer: string, code: string) => string): FieldError[] {
  const seen = new Set<string>();
  const out: FieldError[] = [];
  for (const issue of e.issues) {
    const pointer = mapPointer(issue.pointer, issue.code) || '/';
    const key = `${pointer}|${issue.detail}`;
    if (seen.has(key)) continue;
    seen.add(key);
    out.push({ pointer, detail: issue.detail, code: issue.code });
  }
  return out;
}
