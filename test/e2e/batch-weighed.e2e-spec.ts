import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { flexSystem } from './support/shop.js';

// What was weighed for a batch comes from the API (the batch page draws it, it does not work it out):
// the latest settled, judged mass of each part and the ratio error e = (m_A / m_B) ÷ (t_A / t_B) − 1,
// t_A : t_B the batch's target weight ratio.
// Readings are written straight into the table so the figures are known.

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
let scaleId: string;
let batchId: string;
let ta: number;
let tb: number;

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('weighed');
  auth = await tokensFor(t.http, org);
  const sys = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem({ ratio: { a: 100, b: 50 }, specificGravityA: 1.1, specificGravityB: 1.2 }));
  expect(sys.status).toBe(201);
  const batch = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: sys.body.id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(batch.status).toBe(201);
  batchId = batch.body.id;
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 5, calibration_due: '2099-01-01' }).returning('id');
  const targets = (await testDb()('batches').where({ id: batchId }).first('targets')).targets.targets;
  ta = targets.components.A.mass.value;
  tb = targets.components.B.mass.value;
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

const at = (s: number) => new Date(Date.now() - 60_000 + s * 1000);
const row = (over: Record<string, unknown>) => ({ organization_id: org.id, batch_id: batchId, device_id: scaleId, client_reading_id: randomUUID(), quantity: 'mass', subject: 'part_a', value_si: 0.1, unit_given: 'kg', value_given: 0.1, stable: true, status: 'accepted', ...over });
const check = async () => {
  const res = await t.http.get(`/v1/batches/${batchId}/release-check`).set('authorization', auth.viewer);
  expect(res.status).toBe(200);
  return res.body;
};

describe('GET /v1/batches/{id}/release-check: what was weighed', () => {
  it('says nothing is weighed yet, with no ratio error', async () => {
    const b = await check();
    expect(b.weighed).toEqual({ partA: null, partB: null, pigment: null, mixed: null, ratioErrorPercent: null });
    expect(b.readings).toEqual({ total: 0, rejected: 0 });
  });

  it('takes the latest settled, judged mass of each part and the ratio error against the batch targets', async () => {
    await testDb()('readings').insert([
      row({ subject: 'part_a', value_si: ta * 0.5, received_at: at(1) }),
      // the latest A: 3 % heavy; an unsettled and a pending reading after it do not count
      row({ subject: 'part_a', value_si: ta * 1.03, received_at: at(2), status: 'rejected' }),
      row({ subject: 'part_a', value_si: ta * 9, received_at: at(3), stable: false, status: 'unused' }),
      row({ subject: 'part_a', value_si: ta * 7, received_at: at(4), status: 'pending' }),
      row({ subject: 'part_b', value_si: tb, received_at: at(5) }),
    ]);
    const b = await check();
    expect(b.weighed.partA.massKg).toBeCloseTo(ta * 1.03, 9);
    expect(b.weighed.partB.massKg).toBeCloseTo(tb, 9);
    expect(b.weighed.pigment).toBeNull();
    // against the system's weight ratio 100:50, as the judge compares: e = (m_A / m_B) ÷ 2 − 1
    expect(b.weighed.ratioErrorPercent).toBeCloseTo(((ta * 1.03) / tb / 2 - 1) * 100, 3);
    expect(b.readings).toEqual({ total: 5, rejected: 1 });
  });

  it('gives no ratio error while a part weighs zero', async () => {
    await testDb()('readings').insert(row({ subject: 'part_b', value_si: 0, received_at: at(10) }));
    const b = await check();
    expect(b.weighed.partB.massKg).toBe(0);
    expect(b.weighed.ratioErrorPercent).toBeNull();
  });
});
