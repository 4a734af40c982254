/**
 * Bad input to the computation, located by JSON Pointer (RFC 6901) so the API can answer 422 with
 * `errors[]` pointing at each field (the shape matches the problem-details `FieldError`).
 */
export interface InputIssue {
  /** Path to the offending field, e.g. `/system/specificGravityA`. */
  readonly pointer: string;
  /** A sentence for a person. */
  readonly detail: string;
  /** A stable machine code, e.g. `must_be_positive`. */
  readonly code: string;
}

export class BatchingInputError extends Error {
  override readonly name = 'BatchingInputError';
  readonly issues: readonly InputIssue[];

  constructor(issues: readonly InputIssue[]) {
    super(
      issues.length === 1
        ? `Invalid batching input at ${issues[0]!.pointer}: ${issues[0]!.detail}`
        : `Invalid batching input (${issues.length} issues): ${issues.map((i) => i.pointer).join(', ')}`,
    );
    this.issues = Object.freeze([...issues]);
  }
}

/** Escapes one segment of a JSON Pointer (RFC 6901 §3: `~` → `~0`, `/` → `~1`). */
export function pointerSegment(segment: string | number): string {
  return String(segment).replace(/~/g, '~0').replace(/\//g, '~1');
}

/** Joins a base pointer and segments into one JSON Pointer. */
export function joinPointer(base: string, ...segments: (string | number)[]): string {
  return base + segments.map((s) => `/${pointerSegment(s)}`).join('');
}
