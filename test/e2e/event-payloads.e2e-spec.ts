import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { schemaRegistry } from '../../api/src/common/schemas/schema-registry.js';
import { EVENT_TYPE_NAMES } from '../../api/src/events/event-types.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, flexSystem } from './support/shop.js';

// Every event the API writes to the outbox carries a `data` that its published schema accepts.

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
let scaleId: string;

async function judged(id: string) {
  for (let i = 0; i < 100; i++) {
    const r = await t.http.get(`/v1/readings/${id}`).set('authorization', auth.viewer);
    if (r.body.status !== 'pending') return r.body;
    await new Promise((res) => setTimeout(res, 100));
  }
  throw new Error('never judged');
}
const post = async (batchId: string, subject: string, value: number) =>
  judged((await t.http.post('/v1/readings').set('authorization', auth.engineer).send({ batchId, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'mass', subject, value, unit: 'kg' })).body.id);

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('event-payloads');
  auth = await tokensFor(t.http, org);
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 10 }).returning('id');
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('event payloads', () => {
  it('match their schemas for a shift of work orders, batches, readings and reviews', async () => {
    const sys = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem({ ratio: { a: 100, b: 100 } }));
    const wo = await t.http.post('/v1/work-orders').set('authorization', auth.engineer).send({ externalRef: `WO-${randomUUID()}`, quantity: 4, materialSystemId: sys.body.id });
    expect(wo.status).toBe(201);
    expect((await t.http.put(`/v1/work-orders/${wo.body.id}`).set('authorization', auth.engineer).send({ externalRef: wo.body.externalRef, quantity: 5, materialSystemId: sys.body.id })).status).toBe(200);
    // 50 L at 40 kg/m³: 1 kg of A and 1 kg of B, so the parts weighed below are on or off their own targets
    const newBatch = async () => (await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: sys.body.id, workOrderId: wo.body.id, freeRiseCup: { volume: { value: 50, unit: 'L' } } })).body.id as string;
    const waived = await newBatch();
    await post(waived, 'part_a', 1);
    const off = await post(waived, 'part_b', 1.2);
    expect(off.status).toBe('rejected');
    expect((await t.http.post(`/v1/readings/${off.id}/review`).set('authorization', auth.engineer).send({ decision: 'waive', note: 'trial part' })).status).toBe(200);
    expect((await t.http.post(`/v1/batches/${waived}/release`).set('authorization', auth.engineer).send({})).status).toBe(200);
    const scrapped = await newBatch();
    await post(scrapped, 'part_a', 1);
    const bad = await post(scrapped, 'part_b', 0.8);
    expect((await t.http.post(`/v1/readings/${bad.id}/review`).set('authorization', auth.engineer).send({ decision: 'uphold', scrap: true, note: 'soft' })).status).toBe(200);

    // a lot whose cup test fails is held, and an engineer releases it
    const qc = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem({ creamTimeWindow: { min: { value: 8, unit: 's' }, max: { value: 14, unit: 's' } } }));
    const lot = await t.http.post('/v1/lots').set('authorization', auth.engineer).send({ part: 'B', materialSystemId: qc.body.id, lotNumber: `EV-${randomUUID().slice(0, 8)}`, receivedOn: '2026-01-05', expiresOn: '2099-01-05' });
    const failed = await t.http.post('/v1/qc-cup-tests').set('authorization', auth.engineer).send({ materialSystemId: qc.body.id, lotBId: lot.body.id, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, creamTime: { value: 20, unit: 's' }, freeRiseDensity: { value: 40, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' });
    expect(failed.body.verdict).toBe('failed');
    expect((await t.http.post(`/v1/lots/${lot.body.id}/release-hold`).set('authorization', auth.engineer).send({ note: 'repeat cup passed' })).status).toBe(200);

    // a molded batch disposed of, its work order completed (the back-flush event), a lot recalled
    const mold = await t.http.post('/v1/molds').set('authorization', auth.engineer).send(boxMold());
    const molded = await t.http.post('/v1/work-orders').set('authorization', auth.engineer).send({ externalRef: `WO-${randomUUID()}`, quantity: 1, materialSystemId: sys.body.id, moldId: mold.body.id });
    const lotA = await t.http.post('/v1/lots').set('authorization', auth.engineer).send({ part: 'A', materialSystemId: sys.body.id, lotNumber: `EV-${randomUUID().slice(0, 8)}`, receivedOn: '2026-01-05', expiresOn: '2099-01-05' });
    const pour = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ workOrderId: molded.body.id, options: { lots: { A: lotA.body.id } } });
    expect((await t.http.post(`/v1/batches/${pour.body.id}/disposition`).set('authorization', auth.engineer).send({ decision: 'scrap', defectCauses: ['voids'] })).status).toBe(201);
    expect((await t.http.post(`/v1/work-orders/${molded.body.id}/complete`).set('authorization', auth.engineer).send({})).status).toBe(200);
    expect((await t.http.post(`/v1/lots/${lotA.body.id}/recall`).set('authorization', auth.engineer).send({ reason: 'supplier notice' })).status).toBe(200);

    const events = await testDb()('events').where({ organization_id: org.id }).select('type', 'payload');
    const registry = schemaRegistry();
    const seen = new Set<string>();
    for (const e of events) {
      seen.add(e.type);
      expect({ type: e.type, errors: registry.validate(`event.${e.type}`, e.payload) }).toEqual({ type: e.type, errors: [] });
    }
    // every type came up in this shift but the endpoint test (built by the webhooks suite) and the
    // control charts' drift events (raised and checked against their schemas by the control suite)
    expect([...seen].sort()).toEqual(EVENT_TYPE_NAMES.filter((x) => x !== 'webhook.test' && !x.startsWith('drift.')).sort());
  });
});
