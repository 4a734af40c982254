import { describe, expect, it } from 'vitest';
import { fieldErrorsByKey, parseRetryAfter, pointerToField, problemOf, problemToHttpError } from './problem';

describe('pointerToField', () => {
  it('turns a top-level pointer into the field name', () => {
    expect(pointerToField('/email')).toBe('email');
  });

  it('turns nested pointers into dotted react-hook-form paths', () => {
    expect(pointerToField('/readings/3/value')).toBe('readings.3.value');
    expect(pointerToField('/mold/cavity/volume')).toBe('mold.cavity.volume');
  });

  it('unescapes ~1 and ~0 as RFC 6901 says, in that order', () => {
    expect(pointerToField('/ratio~1basis')).toBe('ratio/basis');
    expect(pointerToField('/a~0b')).toBe('a~b');
    // "~01" is "~1" literally, not "/"
    expect(pointerToField('/x~01')).toBe('x~1');
  });

  it('accepts the URI-fragment form', () => {
    expect(pointerToField('#/lots/0/code')).toBe('lots.0.code');
  });

  it('names no field for the whole document', () => {
    expect(pointerToField('')).toBeNull();
    expect(pointerToField('/')).toBeNull();
  });
});

describe('fieldErrorsByKey', () => {
  it('keys errors by field and joins two failures of one field', () => {
    expect(
      fieldErrorsByKey([
        { pointer: '/name', detail: 'is required' },
        { pointer: '/scopes/1', detail: 'is not a known scope' },
        { pointer: '/name', detail: 'is too long' },
        { pointer: '', detail: 'body must be an object' },
      ]),
    ).toEqual({ name: 'is required; is too long', 'scopes.1': 'is not a known scope' });
  });
});

describe('parseRetryAfter', () => {
  it('reads delta-seconds and HTTP dates', () => {
    expect(parseRetryAfter('42')).toBe(42);
    const now = Date.parse('2025-03-01T10:00:00Z');
    expect(parseRetryAfter('Sat, 01 Mar 2025 10:00:30 GMT', now)).toBe(30);
    expect(parseRetryAfter(null)).toBeUndefined();
    expect(parseRetryAfter('soon')).toBeUndefined();
  });
});

describe('problemToHttpError', () => {
  it('uses the detail as message and hands react-admin errors keyed by field', () => {
    const err = problemToHttpError({
      status: 422,
      statusText: 'Unprocessable Entity',
      json: {
        type: '/v1/problems/validation-failed',
        title: 'The request is not valid',
        status: 422,
        detail: 'The request has invalid fields.',
        errors: [
          { pointer: '/readings/3/value', detail: 'must be a number', code: 'type' },
          { pointer: '/email', detail: 'must be an e-mail address', code: 'format' },
        ],
      },
    });
    expect(err.message).toBe('The request has invalid fields.');
    expect(err.status).toBe(422);
    expect(err.body.errors).toEqual({ 'readings.3.value': 'must be a number', email: 'must be an e-mail address' });
    expect(err.body.fieldErrors).toHaveLength(2);
    expect(err.body.type).toBe('/v1/problems/validation-failed');
    expect(problemOf(err)?.errors?.email).toBe('must be an e-mail address');
  });

  it('falls back to the title, then the status text', () => {
    expect(problemToHttpError({ status: 409, json: { title: 'Conflict', status: 409 } }).message).toBe('Conflict');
    expect(problemToHttpError({ status: 502, statusText: 'Bad Gateway', json: undefined }).message).toBe('Bad Gateway');
    expect(problemToHttpError({ status: 500 }).message).toBe('The request failed (HTTP 500).');
  });

  it('leaves errors out when no entry names a field, so forms do not treat it as a validation failure', () => {
    const err = problemToHttpError({ status: 403, json: { title: 'Forbidden', status: 403, detail: 'Integrators issue device keys only.', errors: [] } });
    expect(err.body.errors).toBeUndefined();
    expect(err.message).toBe('Integrators issue device keys only.');
  });

  it('carries Retry-After for throttled calls', () => {
    const err = problemToHttpError({ status: 429, headers: new Headers({ 'Retry-After': '17' }), json: { title: 'Too Many Requests', status: 429 } });
    expect(err.body.retryAfter).toBe(17);
  });
});
