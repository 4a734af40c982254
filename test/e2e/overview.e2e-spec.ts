import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem, flexSystem } from './support/shop.js';

// The overview's figures are counted by the API over every reading, not a sample: readings are
// written straight into the table here (with chosen statuses and times) so the counts are known.

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let systemId: string;
let scaleId: string;
let batchA: string;
let batchB: string;

const as = (role: Role) => ({ authorization: auth[role] });
const now = Date.now();
const hoursAgo = (h: number) => new Date(now - h * 3_600_000);

async function newBatch(): Promise<string> {
  const res = await t.http
    .post('/v1/batches')
    .set(as('engineer'))
    .send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(res.status).toBe(201);
  return res.body.id;
}

function row(batchId: string, over: Record<string, unknown>) {
  return {
    organization_id: org.id,
    batch_id: batchId,
    device_id: scaleId,
    client_reading_id: randomUUID(),
    quantity: 'mass',
    subject: 'part_a',
    value_si: 0.1,
    unit_given: 'kg',
    value_given: 0.1,
    stable: true,
    status: 'accepted',
    received_at: new Date(now),
    ...over,
  };
}

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('overview');
  other = await makeOrg('overview-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  const sys = await t.http
    .post('/v1/material-systems')
    .set(as('engineer'))
    .send(flexSystem({ ratio: { a: 100, b: 100 }, specificGravityA: 1.1, specificGravityB: 1.1 }));
  expect(sys.status).toBe(201);
  systemId = sys.body.id;
  [{ id: scaleId }] = await testDb()('devices')
    .insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 5, calibration_due: '2099-01-01' })
    .returning('id');
  batchA = await newBatch();
  batchB = await newBatch();
  const targets = await testDb()('batches').where({ id: batchA }).first('targets');
  const ta = targets.targets.targets.components.A.mass.value as number;
  const tb = targets.targets.targets.components.B.mass.value as number;
  const rows = [
    // 13 open rejections, one of them 20 days old (outside the 14-day window, still open)
    ...Array.from({ length: 12 }, () => row(batchA, { status: 'rejected', subject: 'pigment', received_at: hoursAgo(0.01) })),
    row(batchA, { status: 'rejected', subject: 'pigment', received_at: hoursAgo(24 * 20) }),
    // two decided rejections: not open
    row(batchA, { status: 'rejected', subject: 'pigment', review_decision: 'waive', review_note: 'ok', received_at: hoursAgo(0.01) }),
    row(batchA, { status: 'rejected', subject: 'pigment', review_decision: 'uphold', received_at: hoursAgo(0.01) }),
    // batch A: both parts weighed today, A 2 % heavy against its own targets
    row(batchA, { subject: 'part_a', value_si: ta * 1.02, received_at: hoursAgo(0.02) }),
    row(batchA, { subject: 'part_b', value_si: tb, received_at: hoursAgo(0.015) }),
    // batch B: weighed three days ago, A 8 % light (outside ±5 %); an unsettled reading is no pour
    row(batchB, { subject: 'part_a', value_si: ta * 0.92, received_at: hoursAgo(72) }),
    row(batchB, { subject: 'part_b', value_si: tb, received_at: hoursAgo(72) }),
    row(batchB, { subject: 'part_a', value_si: 99, stable: false, status: 'unused', received_at: hoursAgo(72) }),
    // still pending: neither judged nor rejected
    row(batchB, { subject: 'mixed', status: 'pending', received_at: hoursAgo(0.01) }),
  ];
  await testDb()('readings').insert(rows);
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('GET /v1/overview', () => {
  it('counts open rejections over every reading, not only recent ones', async () => {
    const res = await t.http.get('/v1/overview').set(as('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.openRejections).toBe(13);
    expect(res.body.timeZone).toBe('UTC');
    expect(res.body.days).toBe(14);
  });

  it('counts pours today (batches with a settled mass reading) and the rejection rate per day', async () => {
    const res = await t.http.get('/v1/overview').query({ days: 7 }).set(as('engineer'));
    expect(res.status).toBe(200);
    const b = res.body;
    // today: batch A (both parts) and batch B, whose "mixed" reading today is a settled mass though not judged yet
    expect(b.poursToday).toBe(2);
    expect(b.readingsToday).toBe(12 + 2 + 2 + 1);
    expect(b.rejectionRateByDay).toHaveLength(7);
    expect(b.rejectionRateByDay[6].day).toBe(b.today);
    const today = b.rejectionRateByDay[6];
    // judged today: 12 + 2 rejected pigment readings and 2 accepted parts; pending is not judged
    expect(today).toEqual({ day: b.today, judged: 16, rejected: 14, ratePercent: 87.5 });
    // the 20-day-old rejection is outside 7 days; three days ago: two accepted parts (the unused one is not judged)
    expect(b.judged).toBe(16 + 2);
    expect(b.rejected).toBe(14);
    expect(b.rejectionRatePercent).toBeCloseTo((14 / 18) * 100, 2);
  });

  it('charts the A:B ratio error per batch against each batch tolerance, oldest first', async () => {
    const res = await t.http.get('/v1/overview').set(as('engineer'));
    const chart = res.body.ratioError;
    expect(chart.materialSystemId).toBe(systemId);
    expect(chart.systems.map((s: { id: string }) => s.id)).toEqual([systemId]);
    expect(chart.points.map((p: { batchId: string }) => p.batchId)).toEqual([batchB, batchA]);
    // e = (m_A / m_B) ÷ (t_A / t_B) − 1 with m_B = t_B: +2 % and −8 %
    expect(chart.points[1].errorPercent).toBeCloseTo(2, 6);
    expect(chart.points[0].errorPercent).toBeCloseTo(-8, 6);
    expect(chart.points[0].tolerancePercent).toBe(5);
    expect(chart.outside).toBe(1);
  });

  it('counts days in the time zone asked for', async () => {
    const res = await t.http.get('/v1/overview').query({ timeZone: 'Pacific/Kiritimati', days: 3 }).set(as('viewer'));
    expect(res.status).toBe(200);
    expect(res.body.timeZone).toBe('Pacific/Kiritimati');
    // UTC+14: the zone's date is the UTC date or the next one
    const utcToday = new Date().toISOString().slice(0, 10);
    expect(res.body.today >= utcToday).toBe(true);
    expect(res.body.rejectionRateByDay.map((d: { day: string }) => d.day).at(-1)).toBe(res.body.today);
  });

  it('shows another organization nothing of this one', async () => {
    const res = await t.http.get('/v1/overview').set('authorization', otherAuth.viewer);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ openRejections: 0, poursToday: 0, judged: 0, ratioError: { points: [], systems: [] } });
    const foreign = await t.http.get('/v1/overview').query({ materialSystemId: systemId }).set('authorization', otherAuth.viewer);
    expect(foreign.status).toBe(200);
    expect(foreign.body.ratioError.points).toEqual([]);
  });

  it.each([
    [{ timeZone: 'Mars/Olympus' }, '/timeZone'],
    [{ timeZone: "UTC'; drop table readings; --" }, '/timeZone'],
    [{ days: 0 }, '/days'],
    [{ days: 91 }, '/days'],
    [{ days: 'many' }, '/days'],
    [{ materialSystemId: 'x' }, '/materialSystemId'],
    [{ colour: 'red' }, '/colour'],
  ])('refuses %j with a 400 problem pointing at the parameter', async (query, pointer) => {
    const res = await t.http.get('/v1/overview').query(query).set(as('viewer'));
    expectProblem(res, 400, pointer);
  });

  it('needs a person: no anonymous access', async () => {
    const res = await t.http.get('/v1/overview');
    expect(res.status).toBe(401);
  });
});
