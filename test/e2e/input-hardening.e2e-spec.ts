import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { rowCounts, rowDiff } from '../faults/fuzz-core.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem } from './support/shop.js';

// The probes that reached a 500 (or a 200) before: each now answers a 4xx problem and writes nothing.

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
const as = (role: Role) => ({ authorization: auth[role] });
const counts = () => rowCounts(testDb(), { organizationId: org.id, ids: Object.values(org.people).map((p) => p.id) });

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('hardening');
  auth = await tokensFor(t.http, org);
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('list queries', () => {
  it.each([
    ['/v1/readings', { batchId: 'x' }, '/filter/batchId'],
    ['/v1/readings', { receivedAfter: '0000-01-01T00:00:00Z' }, '/filter/receivedAfter'],
    ['/v1/readings', { receivedAfter: 'soon' }, '/filter/receivedAfter'],
    ['/v1/readings', { reviewed: 'yes' }, '/filter/reviewed'],
    ['/v1/batches', { plannedAfter: '2026-02-30' }, '/filter/plannedAfter'],
    ['/v1/lots', { q: 'a\u0000b' }, '/filter/q'],
    ['/v1/devices', { id: ['not-a-uuid'] }, '/filter/id'],
  ])('%s filter %j → 400 at %s', async (path, filter, pointer) => {
    const res = await t.http
      .get(path)
      .query({ filter: JSON.stringify(filter) })
      .set(as('engineer'));
    expectProblem(res, 400, pointer);
  });

  it('refuses a range starting at 1e20 (it was a database error)', async () => {
    const res = await t.http.get('/v1/readings').query({ range: '[1e20,1e20]' }).set(as('engineer'));
    expectProblem(res, 400, '/range/0');
  });

  it('still answers well-typed filters', async () => {
    const res = await t.http
      .get('/v1/readings')
      .query({ filter: JSON.stringify({ batchId: randomUUID(), receivedAfter: '2026-01-01', reviewed: false }) })
      .set(as('engineer'));
    expect(res.status).toBe(200);
    expect(res.body).toEqual([]);
  });
});

describe('bodies', () => {
  it('refuses a NUL character in any stored string with 422 and writes nothing', async () => {
    const before = await counts();
    const res = await t.http.post('/v1/lots').set(as('engineer')).send({ lotNumber: 'L\u00001', part: 'A', receivedOn: '2026-11-01', expiresOn: '2027-05-01' });
    expectProblem(res, 422, '/lotNumber');
    const dev = await t.http.post('/v1/devices').set(as('admin')).send({ kind: 'thermometer', serial: 'T-1', name: 'drum\u0000probe' });
    expectProblem(dev, 422, '/name');
    expect(rowDiff(before, await counts())).toEqual({});
  });

  it('answers a form-urlencoded body on a JSON route with 415, even an empty form the schema would take as {}', async () => {
    const before = await counts();
    for (const payload of ['', 'stationId=x']) {
      const res = await t.http.post('/v1/live/tickets').set(as('engineer')).set('content-type', 'application/x-www-form-urlencoded').send(payload);
      expectProblem(res, 415);
    }
    const lot = await t.http.post('/v1/lots').set(as('engineer')).set('content-type', 'application/x-www-form-urlencoded').send('lotNumber=L1&part=A');
    expectProblem(lot, 415);
    expect(rowDiff(before, await counts())).toEqual({});
  });

  it('refuses a leap second or year 0000 that the schema format allowed, with 422', async () => {
    for (const deviceTime of ['2016-12-31T23:59:60Z', '0000-06-01T10:00:00Z']) {
      const res = await t.http
        .post('/v1/readings')
        .set(as('engineer'))
        .send({ batchId: randomUUID(), deviceId: randomUUID(), clientReadingId: randomUUID(), quantity: 'mass', subject: 'part_a', value: 1, unit: 'kg', deviceTime });
      expectProblem(res, 422, '/deviceTime');
    }
  });

  it('answers PATCH /v1/me with nothing to change as 200, the profile unchanged', async () => {
    const before = await t.http.get('/v1/me').set(as('viewer'));
    for (const body of [{}, { currentPassword: 'not-a-change' }]) {
      const res = await t.http.patch('/v1/me').set(as('viewer')).send(body);
      expect(res.status).toBe(200);
      expect(res.body).toEqual(before.body);
    }
  });
});

describe('problem types', () => {
  it.each(['__proto__', 'constructor', 'toString', 'hasOwnProperty'])('/v1/problems/%s is a 404 problem, not an Object.prototype member', async (slug) => {
    const res = await t.http.get(`/v1/problems/${slug}`);
    expectProblem(res, 404);
  });

  it('still describes a real problem type', async () => {
    const res = await t.http.get('/v1/problems/validation-failed');
    expect(res.status).toBe(200);
    expect(res.body.type).toBe('/v1/problems/validation-failed');
  });
});
