import { describe, expect, it } from '@jest/globals';
import { BatchingInputError } from './errors.js';
import { IssueCollector, isoDateToDayNumber } from './validation.js';

describe('IssueCollector.number', () => {
  it('passes a value inside the rule and records nothing', () => {
    const issues = new IssueCollector();
    expect(issues.number('/a', 1.2, { above: 0, max: 10 })).toBe(true);
    expect(issues.issues).toEqual([]);
    expect(() => issues.throwIfAny()).not.toThrow();
  });

  it('records each kind of failure with a pointer and a code', () => {
    const issues = new IssueCollector();
    expect(issues.number('/zero', 0, { above: 0 })).toBe(false);
    expect(issues.number('/neg', -1, { min: 0 })).toBe(false);
    expect(issues.number('/big', 11, { max: 10 })).toBe(false);
    expect(issues.number('/edge', 100, { below: 100 })).toBe(false);
    expect(issues.number('/frac', 1.5, { integer: true })).toBe(false);
    expect(issues.number('/nan', Number.NaN)).toBe(false);
    expect(issues.number('/text', '3' as unknown)).toBe(false);
    expect(issues.number('/missing', undefined, { required: true })).toBe(false);
    expect(issues.issues.map((i) => [i.pointer, i.code])).toEqual([
      ['/zero', 'must_be_positive'],
      ['/neg', 'out_of_range'],
      ['/big', 'out_of_range'],
      ['/edge', 'out_of_range'],
      ['/frac', 'not_an_integer'],
      ['/nan', 'not_a_number'],
      ['/text', 'not_a_number'],
      ['/missing', 'required'],
    ]);
  });

  it('lets an optional absent value through without an issue, but reports it absent', () => {
    const issues = new IssueCollector();
    expect(issues.number('/opt', undefined, { above: 0 })).toBe(false);
    expect(issues.issues).toEqual([]);
  });

  it('keeps the bounds inclusive for min/max', () => {
    const issues = new IssueCollector();
    expect(issues.number('/a', 0, { min: 0, max: 100 })).toBe(true);
    expect(issues.number('/b', 100, { min: 0, max: 100 })).toBe(true);
  });

  it('throws one error carrying every issue', () => {
    const issues = new IssueCollector();
    issues.number('/a', -1, { above: 0 });
    issues.number('/b', -1, { above: 0 });
    expect(() => issues.throwIfAny()).toThrow(BatchingInputError);
    try {
      issues.throwIfAny();
    } catch (error) {
      expect((error as BatchingInputError).issues).toHaveLength(2);
    }
  });
});

describe('IssueCollector.date and oneOf', () => {
  it('accepts real calendar dates only', () => {
    const issues = new IssueCollector();
    expect(issues.date('/ok', '2024-02-29')).toBe(true);
    expect(issues.date('/bad', '2023-02-29')).toBe(false);
    expect(issues.date('/format', '29/02/2024')).toBe(false);
    expect(issues.date('/missing', undefined, true)).toBe(false);
    expect(issues.issues.map((i) => i.pointer)).toEqual(['/bad', '/format', '/missing']);
  });

  it('accepts only the listed strings', () => {
    const issues = new IssueCollector();
    expect(issues.oneOf('/basis', 'weight', ['weight', 'volume'] as const)).toBe(true);
    expect(issues.oneOf('/basis', 'mass', ['weight', 'volume'] as const)).toBe(false);
    expect(issues.issues[0]!.detail).toBe('must be one of weight, volume');
  });
});

describe('isoDateToDayNumber', () => {
  it('counts whole days between dates', () => {
    expect(isoDateToDayNumber('1970-01-02')).toBe(1);
    expect(isoDateToDayNumber('2024-03-01')! - isoDateToDayNumber('2024-02-28')!).toBe(2);
    expect(isoDateToDayNumber('2024-13-01')).toBeNull();
  });
});
