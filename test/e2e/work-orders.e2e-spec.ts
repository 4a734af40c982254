import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, expectProblem, shopCounts } from './support/shop.js';

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let erp: Record<string, string>;
let narrowKey: Record<string, string>;

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('orders');
  other = await makeOrg('orders-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  const key = async (scopes: string[]) => (await t.http.post('/v1/api-keys').set('authorization', auth.admin).send({ name: `ERP ${scopes.join(' ')}`, kind: 'integration', scopes })).body.secret as string;
  erp = { 'x-api-key': await key(['work-orders:write', 'shop:read']) };
  narrowKey = { 'x-api-key': await key(['targets:read']) };
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

const orders = async (orgId: string, ref: string) => Number((await testDb()('work_orders').where({ organization_id: orgId, external_ref: ref }).count({ n: '*' }))[0]!.n);

describe('work orders are idempotent on the ERP’s reference', () => {
  it('the same reference and body again → 200 with the same order, and one row', async () => {
    const body = { externalRef: 'WO-1001', partNumber: 'ARM-L', quantity: 12, dueOn: '2026-06-01', notes: 'rush' };
    const first = await t.http.post('/v1/work-orders').set(erp).send(body);
    expect(first.status).toBe(201);
    expect(first.headers.location).toBe(`/v1/work-orders/${first.body.id}`);
    const again = await t.http.post('/v1/work-orders').set(erp).send(body);
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    // key order and explicit defaults do not make a body different
    const reordered = await t.http.post('/v1/work-orders').set(erp).send({ notes: 'rush', dueOn: '2026-06-01', quantity: 12, partNumber: 'ARM-L', externalRef: 'WO-1001', moldId: null, state: 'open' });
    expect(reordered.status).toBe(200);
    expect(reordered.body.id).toBe(first.body.id);
    expect(await orders(org.id, 'WO-1001')).toBe(1);
  });

  it('the same reference with a different body → 409 problem, and nothing changes', async () => {
    const body = { externalRef: 'WO-1002', quantity: 5 };
    const first = await t.http.post('/v1/work-orders').set(erp).send(body);
    expect(first.status).toBe(201);
    const before = await shopCounts(org.id);
    const res = await t.http.post('/v1/work-orders').set(erp).send({ ...body, quantity: 6 });
    expectProblem(res, 409, '/externalRef');
    expect(res.body.type).toBe('/v1/problems/conflict');
    expect(res.body.existingId).toBe(first.body.id);
    expect(await shopCounts(org.id)).toEqual(before);
    expect((await t.http.get(`/v1/work-orders/${first.body.id}`).set('authorization', auth.viewer)).body.quantity).toBe(5);
  });

  it('a replay of the first post still answers 200 after the order moved on', async () => {
    const body = { externalRef: 'WO-1003', quantity: 3 };
    const first = await t.http.post('/v1/work-orders').set(erp).send(body);
    const moved = await t.http.put(`/v1/work-orders/${first.body.id}`).set(erp).send({ state: 'in_progress' });
    expect(moved.body.state).toBe('in_progress');
    const replay = await t.http.post('/v1/work-orders').set(erp).send(body);
    expect(replay.status).toBe(200);
    expect(replay.body).toMatchObject({ id: first.body.id, state: 'in_progress' });
  });

  it('concurrent posts of one order make one row: one 201, the rest 200', async () => {
    const body = { externalRef: 'WO-RACE', quantity: 7 };
    const results = await Promise.all(Array.from({ length: 6 }, () => t.http.post('/v1/work-orders').set(erp).send(body)));
    expect(results.map((r) => r.status).sort()).toEqual([200, 200, 200, 200, 200, 201]);
    expect(new Set(results.map((r) => r.body.id)).size).toBe(1);
    expect(await orders(org.id, 'WO-RACE')).toBe(1);
  });

  it('references are per organization: another organization may use the same one', async () => {
    const res = await t.http.post('/v1/work-orders').set('authorization', otherAuth.engineer).send({ externalRef: 'WO-1001', quantity: 1 });
    expect(res.status).toBe(201);
    expect(await orders(other.id, 'WO-1001')).toBe(1);
    expect(await orders(org.id, 'WO-1001')).toBe(1);
  });
});

describe('work order rules', () => {
  it('the reference cannot change; the state can', async () => {
    const first = await t.http.post('/v1/work-orders').set('authorization', auth.engineer).send({ externalRef: 'WO-2001', quantity: 2 });
    expectProblem(await t.http.put(`/v1/work-orders/${first.body.id}`).set('authorization', auth.engineer).send({ externalRef: 'WO-2002' }), 422, '/externalRef');
    const done = await t.http.put(`/v1/work-orders/${first.body.id}`).set('authorization', auth.engineer).send({ state: 'done' });
    expect(done.body.state).toBe('done');
    expectProblem(await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ workOrderId: first.body.id }), 422, '/workOrderId');
  });

  it.each([
    ['zero parts', { externalRef: 'WO-3001', quantity: 0 }, '/quantity'],
    ['no reference', { quantity: 3 }, '/externalRef'],
    ['a state of our own', { externalRef: 'WO-3002', quantity: 3, state: 'paused' }, '/state'],
  ])('%s → 422', async (_label, body, pointer) => {
    const before = await shopCounts(org.id);
    expectProblem(await t.http.post('/v1/work-orders').set(erp).send(body), 422, pointer);
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('a mold of another organization → 422 at /moldId, nothing written', async () => {
    const foreign = (await t.http.post('/v1/molds').set('authorization', otherAuth.engineer).send(boxMold())).body.id;
    const before = await shopCounts(org.id);
    expectProblem(await t.http.post('/v1/work-orders').set(erp).send({ externalRef: 'WO-4001', quantity: 3, moldId: foreign }), 422, '/moldId');
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('who may post: engineers and keys scoped work-orders:write; not viewers, not other keys', async () => {
    expect((await t.http.post('/v1/work-orders').set('authorization', auth.engineer).send({ externalRef: 'WO-5001', quantity: 1 })).status).toBe(201);
    const before = await shopCounts(org.id);
    expectProblem(await t.http.post('/v1/work-orders').set('authorization', auth.viewer).send({ externalRef: 'WO-5002', quantity: 1 }), 403);
    expectProblem(await t.http.post('/v1/work-orders').set('authorization', auth.admin).send({ externalRef: 'WO-5003', quantity: 1 }), 403);
    expectProblem(await t.http.post('/v1/work-orders').set(narrowKey).send({ externalRef: 'WO-5004', quantity: 1 }), 403);
    expect(await shopCounts(org.id)).toEqual(before);
    const list = await t.http.get('/v1/work-orders').set(erp).query({ filter: JSON.stringify({ q: 'WO-5' }) });
    expect(list.body.map((o: { externalRef: string }) => o.externalRef)).toEqual(['WO-5001']);
  });

  it('another organization’s order is 404 to read and to change', async () => {
    const mine = (await t.http.post('/v1/work-orders').set(erp).send({ externalRef: 'WO-6001', quantity: 1 })).body.id;
    expectProblem(await t.http.get(`/v1/work-orders/${mine}`).set('authorization', otherAuth.viewer), 404);
    expectProblem(await t.http.put(`/v1/work-orders/${mine}`).set('authorization', otherAuth.engineer).send({ state: 'cancelled' }), 404);
  });
});

describe('work orders write events to the outbox', () => {
  it('a new order emits work_order.created once (a replay emits nothing); a change emits work_order.changed', async () => {
    const body = { externalRef: `WO-EV-${Date.now()}`, quantity: 3 };
    const first = await t.http.post('/v1/work-orders').set(erp).send(body);
    expect(first.status).toBe(201);
    expect((await t.http.post('/v1/work-orders').set(erp).send(body)).status).toBe(200);
    const id = first.body.id;
    const created = await testDb()('events').where({ organization_id: org.id, subject_id: id, type: 'work_order.created' });
    expect(created).toHaveLength(1);
    expect(created[0].payload).toMatchObject({ workOrderId: id, externalRef: body.externalRef, quantity: 3 });
    expect((await t.http.put(`/v1/work-orders/${id}`).set(erp).send({ quantity: 4 })).status).toBe(200);
    const changed = await testDb()('events').where({ organization_id: org.id, subject_id: id, type: 'work_order.changed' });
    expect(changed).toHaveLength(1);
    expect(changed[0].payload.changed).toEqual(['quantity']);
  });
});
