import { describe, expect, it } from '@jest/globals';
import { ProblemException } from './problems.js';
import { parseListQuery, type ListSpec } from './lists/list-query.js';
import { isStorableDate, isStorableDateTime } from './storable-dates.js';
import { nulCharacters, SchemaRegistry } from './schemas/schema-registry.js';

const spec: ListSpec = {
  resource: 'things',
  sortable: ['createdAt', 'id'],
  filters: { id: 'in', batchId: 'eq', receivedAfter: 'gte', reviewed: 'bool', q: 'text', status: { kind: 'eq', values: ['accepted', 'rejected'] }, count: { kind: 'gte', type: 'number' } },
  defaultSort: ['createdAt', 'DESC'],
};

function refused(query: Record<string, unknown>): { pointer: string; detail: string }[] {
  try {
    parseListQuery(query, spec);
  } catch (e) {
    expect(e).toBeInstanceOf(ProblemException);
    const p = e as ProblemException;
    expect(p.getStatus()).toBe(400);
    return p.problem.errors as { pointer: string; detail: string }[];
  }
  throw new Error(`accepted ${JSON.stringify(query)}`);
}

describe('storable dates', () => {
  // The Gregorian leap-year rule (divisible by 4, except centuries not divisible by 400) and
  // PostgreSQL's refusal of year 0 and of seconds = 60 in a timestamp are facts of the calendar and
  // of the database (from memory; RFC 3339 §5.7 allows the leap second that we refuse).
  it.each([
    [2024, 2, 29, true],
    [2023, 2, 29, false],
    [1900, 2, 29, false],
    [2000, 2, 29, true],
    [2026, 4, 31, false],
    [2026, 12, 31, true],
    [0, 1, 1, false],
    [10000, 1, 1, false],
    [2026, 13, 1, false],
    [2026, 1, 0, false],
  ])('%i-%i-%i storable: %s', (y, m, d, ok) => {
    expect(isStorableDate(y, m, d)).toBe(ok);
  });

  it.each([
    ['2026-12-02T10:00:00Z', true],
    ['2026-12-02T10:00:00.123456+05:30', true],
    ['2016-12-31T23:59:60Z', false],
    ['0000-01-01T00:00:00Z', false],
    ['2026-12-02T24:00:00Z', false],
    ['2026-12-02T10:00:00+24:00', false],
    ['2026-12-02T10:00:00', false],
    ['2026-02-30T10:00:00Z', false],
  ])('%s storable: %s', (v, ok) => {
    expect(isStorableDateTime(v)).toBe(ok);
  });

  it('the schema formats refuse what the database cannot store', () => {
    const reg = new SchemaRegistry();
    const base = {
      batchId: '6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b11',
      deviceId: '6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b12',
      clientReadingId: 'r-1',
      quantity: 'mass',
      subject: 'part_a',
      value: 1,
      unit: 'kg',
    };
    expect(reg.validate('reading.create', { ...base, deviceTime: '2026-12-02T10:00:00Z' })).toEqual([]);
    expect(reg.validate('reading.create', { ...base, deviceTime: '2016-12-31T23:59:60Z' })[0]).toMatchObject({ pointer: '/deviceTime', code: 'format' });
    expect(reg.validate('reading.create', { ...base, deviceTime: '0000-06-01T10:00:00Z' })[0]).toMatchObject({ pointer: '/deviceTime', code: 'format' });
  });
});

describe('NUL characters', () => {
  it('are pointed at wherever they are, in values and in keys', () => {
    expect(nulCharacters({ a: 'ok', b: ['x', 'y\u0000z'], c: { 'd/e': 'q\u0000' } })).toEqual([
      { pointer: '/b/1', detail: 'must not contain a NUL character (U+0000)', code: 'nul' },
      { pointer: '/c/d~1e', detail: 'must not contain a NUL character (U+0000)', code: 'nul' },
    ]);
    expect(nulCharacters({ 'k\u0000': 1 })[0]).toMatchObject({ pointer: '/k\u0000', code: 'nul' });
    expect(nulCharacters('plain')).toEqual([]);
  });

  it('any schema refuses them after its own checks pass', () => {
    const reg = new SchemaRegistry();
    const errors = reg.validate('reading.create', {
      batchId: '6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b11',
      deviceId: '6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b12',
      clientReadingId: 'r\u00001',
      quantity: 'mass',
      subject: 'part_a',
      value: 1,
      unit: 'kg',
    });
    expect(errors).toEqual([{ pointer: '/clientReadingId', detail: 'must not contain a NUL character (U+0000)', code: 'nul' }]);
  });
});

describe('list filters are checked against their value type', () => {
  it('accepts well-typed values', () => {
    const q = parseListQuery(
      {
        filter: JSON.stringify({
          batchId: '6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b11',
          receivedAfter: '2026-12-01',
          reviewed: false,
          status: 'rejected',
          count: 3,
          id: ['6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b11'],
        }),
      },
      spec,
    );
    expect(q.filter).toMatchObject({ reviewed: false, status: 'rejected', count: 3 });
  });

  it.each([
    [{ batchId: 'x' }, '/filter/batchId', 'UUID'],
    [{ batchId: 12 }, '/filter/batchId', 'UUID'],
    [{ id: ['6f1c1c58-5d5b-4d7e-9a31-0a3f3e0f6b11', 'nope'] }, '/filter/id', 'each value'],
    [{ receivedAfter: 'yesterday' }, '/filter/receivedAfter', 'date'],
    [{ receivedAfter: '0000-01-01' }, '/filter/receivedAfter', 'years 0001'],
    [{ receivedAfter: '2016-12-31T23:59:60Z' }, '/filter/receivedAfter', 'leap second'],
    [{ reviewed: 'no' }, '/filter/reviewed', 'true or false'],
    [{ status: 'lost' }, '/filter/status', 'one of'],
    [{ count: '3' }, '/filter/count', 'number'],
    [{ q: 'a\u0000b' }, '/filter/q', 'NUL'],
    [{ __proto__x: 1, 'a/b': 1 }, '/filter/a~1b', 'unknown'],
  ])('refuses %j at %s', (filter, pointer, words) => {
    const errors = refused({ filter: JSON.stringify(filter) });
    const e = errors.find((x) => x.pointer === pointer);
    expect(e?.detail).toContain(words);
  });

  it('refuses a filter named like an Object.prototype member', () => {
    expect(refused({ filter: '{"constructor":"x"}' })[0]!.pointer).toBe('/filter/constructor');
    expect(refused({ filter: '{"toString":"x"}' })[0]!.pointer).toBe('/filter/toString');
  });

  it('bounds the page start (a range start of 1e20 was a database error)', () => {
    expect(refused({ range: '[1e20,1e20]' })[0]!.pointer).toBe('/range/0');
    expect(refused({ range: '[1000001,1000010]' })[0]!.pointer).toBe('/range/0');
    expect(parseListQuery({ range: '[1000000,1000009]' }, spec).offset).toBe(1_000_000);
  });
});
