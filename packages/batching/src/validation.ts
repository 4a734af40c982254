/**
 * Collects every problem with an input before throwing, so one 422 can point at all bad fields at
 * once instead of making a caller fix them one round trip at a time.
 */
import { BatchingInputError, type InputIssue } from './errors.js';

export interface NumberRule {
  /** Reject `undefined`/`null` (otherwise an absent value passes and the check returns false). */
  readonly required?: boolean;
  /** Lower bound, inclusive. */
  readonly min?: number;
  /** Lower bound, exclusive (`0` for "greater than zero"). */
  readonly above?: number;
  /** Upper bound, inclusive. */
  readonly max?: number;
  /** Upper bound, exclusive. */
  readonly below?: number;
  readonly integer?: boolean;
  /** Unit named in the messages, e.g. `kg/m3`. */
  readonly unit?: string;
}

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Days since 1970-01-01 for a valid `YYYY-MM-DD`, or null. */
export function isoDateToDayNumber(value: string): number | null {
  const match = ISO_DATE.exec(value);
  if (!match) return null;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const time = Date.UTC(year, month - 1, day);
  const date = new Date(time);
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) return null;
  return time / 86_400_000;
}

export class IssueCollector {
  private readonly collected: InputIssue[] = [];

  get issues(): readonly InputIssue[] {
    return this.collected;
  }

  add(pointer: string, detail: string, code: string): void {
    this.collected.push({ pointer, detail, code });
  }

  /** True when the value is present and passes the rule; records an issue when it fails. */
  number(pointer: string, value: unknown, rule: NumberRule = {}): value is number {
    if (value === undefined || value === null) {
      if (rule.required) this.add(pointer, 'is required', 'required');
      return false;
    }
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      this.add(pointer, 'must be a finite number', 'not_a_number');
      return false;
    }
    const unit = rule.unit ? ` ${rule.unit}` : '';
    if (rule.integer && !Number.isInteger(value)) {
      this.add(pointer, 'must be a whole number', 'not_an_integer');
      return false;
    }
    if (rule.above !== undefined && !(value > rule.above)) {
      this.add(pointer, rule.above === 0 ? 'must be greater than 0' : `must be greater than ${rule.above}${unit}`,
        rule.above === 0 ? 'must_be_positive' : 'out_of_range');
      return false;
    }
    if (rule.min !== undefined && value < rule.min) {
      this.add(pointer, `must be at least ${rule.min}${unit}`, 'out_of_range');
      return false;
    }
    if (rule.below !== undefined && !(value < rule.below)) {
      this.add(pointer, `must be less than ${rule.below}${unit}`, 'out_of_range');
      return false;
    }
    if (rule.max !== undefined && value > rule.max) {
      this.add(pointer, `must be at most ${rule.max}${unit}`, 'out_of_range');
      return false;
    }
    return true;
  }

  /** True when the value is a real calendar date written `YYYY-MM-DD`. */
  date(pointer: string, value: unknown, required = false): value is string {
    if (value === undefined || value === null) {
      if (required) this.add(pointer, 'is required', 'required');
      return false;
    }
    if (typeof value !== 'string' || isoDateToDayNumber(value) === null) {
      this.add(pointer, 'must be a calendar date written YYYY-MM-DD', 'not_a_date');
      return false;
    }
    return true;
  }

  /** True when the value is one of the allowed strings. */
  oneOf<T extends string>(pointer: string, value: unknown, allowed: readonly T[], required = true): value is T {
    if (value === undefined || value === null) {
      if (required) this.add(pointer, 'is required', 'required');
      return false;
    }
    if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
      this.add(pointer, `must be one of ${allowed.join(', ')}`, 'not_allowed');
      return false;
    }
    return true;
  }

  throwIfAny(): void {
    if (this.collected.length > 0) throw new BatchingInputError(this.collected);
  }
}
