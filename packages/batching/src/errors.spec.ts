import { describe, expect, it } from '@jest/globals';
import { BatchingInputError, joinPointer, pointerSegment } from './errors.js';

describe('BatchingInputError', () => {
  it('carries every issue and names the pointers in its message', () => {
    const error = new BatchingInputError([
      { pointer: '/system/specificGravityA', detail: 'must be greater than 0', code: 'must_be_positive' },
      { pointer: '/mold/volume', detail: 'must be greater than 0', code: 'must_be_positive' },
    ]);
    expect(error).toBeInstanceOf(Error);
    expect(error.name).toBe('BatchingInputError');
    expect(error.issues.map((i) => i.pointer)).toEqual(['/system/specificGravityA', '/mold/volume']);
    expect(error.message).toContain('/mold/volume');
  });

  it('gives the detail itself when there is a single issue', () => {
    const error = new BatchingInputError([{ pointer: '/options/packFactor', detail: 'must be at most 10', code: 'out_of_range' }]);
    expect(error.message).toBe('Invalid batching input at /options/packFactor: must be at most 10');
  });

  it('keeps its issues from being changed afterwards', () => {
    const issues = [{ pointer: '/a', detail: 'x', code: 'c' }];
    const error = new BatchingInputError(issues);
    issues.push({ pointer: '/b', detail: 'y', code: 'c' });
    expect(error.issues).toHaveLength(1);
    expect(Object.isFrozen(error.issues)).toBe(true);
  });
});

describe('JSON pointers', () => {
  it('escapes ~ and / as RFC 6901 requires', () => {
    expect(pointerSegment('a/b~c')).toBe('a~1b~0c');
    expect(joinPointer('/lots', 0, 'expiresOn')).toBe('/lots/0/expiresOn');
    expect(joinPointer('', 'system')).toBe('/system');
  });
});
