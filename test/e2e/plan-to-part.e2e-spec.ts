import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, expectProblem, flexSystem } from './support/shop.js';

// From plan to part: a work order's batch plan, the finished part and its specimens, the batch's
// disposition, consumption and completion, lot genealogy and recall, and the lot override.
// Test data: a 300 × 200 × 50 mm cavity (3 L) twice, free rise 40 kg/m³ packed 1.5× → 60 kg/m³.

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let systemId: string;
let moldId: string;
let orderId: string;
let lotA: string;
let lotB: string;
let batchId: string;
let scaleId: string;
const as = (role: Role) => ({ authorization: auth[role] });

async function judged(id: string) {
  for (let i = 0; i < 100; i++) {
    const r = await t.http.get(`/v1/readings/${id}`).set(as('viewer'));
    if (r.body.status !== 'pending') return r.body;
    await new Promise((res) => setTimeout(res, 100));
  }
  throw new Error('never judged');
}
const count = async (table: string) => Number((await testDb()(table).where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);
const lot = async (part: string, extra: Record<string, unknown> = {}) =>
  (await t.http.post('/v1/lots').set(as('engineer')).send({ part, materialSystemId: part === 'pigment' ? null : systemId, lotNumber: `${part}-${randomUUID().slice(0, 8)}`, receivedOn: '2026-01-05', expiresOn: '2099-01-05', ...extra })).body.id as string;

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('plan-to-part');
  other = await makeOrg('plan-to-part-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({
    partDensityTolerancePercent: 10,
    coreDensityBand: { min: { value: 50, unit: 'kg/m3' }, max: { value: 70, unit: 'kg/m3' } },
    indentationForceBand: { min: { value: 100, unit: 'N' }, max: { value: 300, unit: 'N' } },
  }));
  expect(sys.status).toBe(201);
  expect(sys.body.partSpec).toMatchObject({ densityTolerancePercent: 10, coreDensityMinKgM3: 50, indentationForceMaxN: 300, durometerScale: null });
  systemId = sys.body.id;
  moldId = (await t.http.post('/v1/molds').set(as('engineer')).send(boxMold({ cavities: 2 }))).body.id;
  orderId = (await t.http.post('/v1/work-orders').set(as('engineer')).send({ externalRef: `WO-${randomUUID().slice(0, 8)}`, partNumber: 'SEAT-1', quantity: 5, moldId, materialSystemId: systemId })).body.id;
  lotA = await lot('A');
  lotB = await lot('B');
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 30 }).returning('id');
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('planning', () => {
  it('proposes ceil(remaining parts ÷ cavities) batches, with bodies POST /v1/batches takes', async () => {
    const plan = await t.http.get(`/v1/work-orders/${orderId}/batch-plan`).set(as('viewer'));
    expect(plan.status).toBe(200);
    expect(plan.body).toMatchObject({ ordered: 5, cavities: 2, batchesPlanned: 0, partsRemaining: 5, proposedBatches: 3 });
    expect(plan.body.batches).toHaveLength(3);
    const created = await t.http.post('/v1/batches').set(as('engineer')).send({ ...plan.body.batches[0], stationCode: null, options: { ...plan.body.batches[0].options, lots: { A: lotA, B: lotB } } });
    expect(created.status).toBe(201);
    expect(created.body.lots.map((l: { id: string }) => l.id).sort()).toEqual([lotA, lotB].sort());
    expect(created.body.summary.targetDensityKgM3).toBeCloseTo(60, 9);
    batchId = created.body.id;
    const after = await t.http.get(`/v1/work-orders/${orderId}/batch-plan`).set(as('viewer'));
    expect(after.body).toMatchObject({ batchesPlanned: 1, partsPlanned: 2, partsRemaining: 3, proposedBatches: 2 });
  });

  it('a lot of another organization is a 422 with its pointer, and nothing is written', async () => {
    const foreign = (await testDb()('lots').insert({ organization_id: other.id, part: 'pigment', lot_number: `F-${randomUUID()}`, received_on: '2026-01-05', expires_on: '2099-01-05' }).returning('id'))[0].id;
    const before = await count('batches');
    const res = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: orderId, options: { lots: { A: lotA, pigment: foreign } } });
    expectProblem(res, 422, '/options/lots/pigment');
    expect(await count('batches')).toBe(before);
  });
});

describe('part acceptance', () => {
  let partId: string;
  it('molded density = mass ÷ cavity volume, judged against the target ± the system’s tolerance', async () => {
    const good = await t.http.post(`/v1/batches/${batchId}/parts`).set(as('engineer')).send({ cavity: 1, mass: { value: 180, unit: 'g' } });
    expect(good.status).toBe(201);
    // 0.180 kg ÷ 0.003 m³ = 60 kg/m³ (definition of density)
    expect(good.body.moldedDensityKgM3).toBeCloseTo(60, 9);
    expect(good.body).toMatchObject({ densityVerdict: 'within', massSource: 'entered', tolerancePercent: 10, workOrderId: orderId });
    partId = good.body.id;
    const light = await t.http.post(`/v1/batches/${batchId}/parts`).set(as('engineer')).send({ cavity: 2, mass: { value: 0.3, unit: 'lb' }, deviceId: scaleId });
    // 0.3 lb = 0.136077711 kg → 45.36 kg/m³, 24 % under 60
    expect(light.body.moldedDensityKgM3).toBeCloseTo((0.3 * 0.45359237) / 0.003, 9);
    expect(light.body).toMatchObject({ densityVerdict: 'below', massSource: 'scale', deviceId: scaleId });
  });

  it('refuses impossible parts with a 422 and a pointer, writing nothing', async () => {
    const before = await count('parts');
    expectProblem(await t.http.post(`/v1/batches/${batchId}/parts`).set(as('engineer')).send({ mass: { value: 0, unit: 'kg' } }), 422);
    expectProblem(await t.http.post(`/v1/batches/${batchId}/parts`).set(as('engineer')).send({ mass: { value: 1, unit: 'g' } }), 422, '/mass/value');
    expectProblem(await t.http.post(`/v1/batches/${batchId}/parts`).set(as('engineer')).send({ cavity: 3, mass: { value: 180, unit: 'g' } }), 422, '/cavity');
    expect((await t.http.post(`/v1/batches/${batchId}/parts`).set({ authorization: otherAuth.engineer }).send({ mass: { value: 180, unit: 'g' } })).status).toBe(404);
    expect(await count('parts')).toBe(before);
  });

  it('judges specimens against the system’s spec; a core density specimen without dimensions is a 422', async () => {
    const before = await count('part_specimens');
    expectProblem(await t.http.post(`/v1/parts/${partId}/specimens`).set(as('engineer')).send({ test: 'core_density', mass: { value: 3.75, unit: 'g' } }), 422, '/dimensions');
    expectProblem(await t.http.post(`/v1/parts/${partId}/specimens`).set(as('engineer')).send({ test: 'core_density', mass: { value: 3.75, unit: 'g' }, dimensions: { length: { value: 50, unit: 'mm' }, width: { value: 0, unit: 'mm' }, thickness: { value: 25, unit: 'mm' } } }), 422, '/dimensions/width/value');
    expectProblem(await t.http.post(`/v1/parts/${partId}/specimens`).set(as('engineer')).send({ test: 'durometer', durometer: { scale: 'A', value: 120 } }), 422, '/durometer/value');
    expect(await count('part_specimens')).toBe(before);
    // 3.75 g in 50 × 50 × 25 mm = 62.5 cm³ → 60 kg/m³ (ASTM D3574 Test A / ISO 845: mass ÷ volume)
    const core = await t.http.post(`/v1/parts/${partId}/specimens`).set(as('engineer')).send({ test: 'core_density', mass: { value: 3.75, unit: 'g' }, dimensions: { length: { value: 50, unit: 'mm' }, width: { value: 50, unit: 'mm' }, thickness: { value: 25, unit: 'mm' } } });
    expect(core.status).toBe(201);
    expect(core.body.specimens[0].densityKgM3).toBeCloseTo(60, 9);
    expect(core.body.specimens[0]).toMatchObject({ verdict: 'within', spec: { min: 50, max: 70 } });
    // 80 lbf × 4.448222 N/lbf = 355.86 N (NIST SP 811): above 300 N
    const ifd = await t.http.post(`/v1/parts/${partId}/specimens`).set(as('engineer')).send({ test: 'indentation_force', force: { value: 80, unit: 'lbf' } });
    expect(ifd.body.specimens[1].forceN).toBeCloseTo(355.85776, 4);
    expect(ifd.body.specimens[1].verdict).toBe('above');
  });

  it('disposes of the batch with defect causes from the organization’s list; once', async () => {
    const causes = await t.http.get('/v1/defect-causes').query({ range: '[0,49]' }).set(as('viewer'));
    expect(causes.body.map((x: { code: string }) => x.code)).toEqual(expect.arrayContaining(['voids', 'short_fill', 'skin_defects', 'splits', 'shrinkage', 'tack']));
    const added = await t.http.post('/v1/defect-causes').set(as('engineer')).send({ code: 'knit_lines', name: 'Knit lines' });
    expect(added.status).toBe(201);
    const parts = (await t.http.get('/v1/parts').query({ filter: JSON.stringify({ batchId }) }).set(as('viewer'))).body as { id: string; cavity: number }[];
    const second = parts.find((p) => p.cavity === 2)!;
    const before = await count('batch_dispositions');
    expectProblem(await t.http.post(`/v1/batches/${batchId}/disposition`).set(as('engineer')).send({ decision: 'scrap' }), 422, '/defectCauses');
    expectProblem(await t.http.post(`/v1/batches/${batchId}/disposition`).set(as('engineer')).send({ decision: 'accepted', parts: [{ partId: second.id, decision: 'scrap', defectCauses: ['no_such'] }] }), 422, '/parts/0/defectCauses/0');
    expect(await count('batch_dispositions')).toBe(before);
    const res = await t.http.post(`/v1/batches/${batchId}/disposition`).set(as('engineer')).send({ decision: 'accepted', parts: [{ partId: second.id, decision: 'scrap', defectCauses: ['voids'] }], note: 'cavity 2 light' });
    expect(res.status).toBe(201);
    expect(res.body.parts).toEqual({ accepted: 1, rework: 0, scrap: 1, undecided: 0 });
    expect((await t.http.post(`/v1/batches/${batchId}/disposition`).set(as('engineer')).send({ decision: 'accepted' })).status).toBe(409);
    const events = await testDb()('events').where({ organization_id: org.id, type: 'batch.disposed' }).select('payload');
    expect(events.map((e) => e.payload)).toEqual([expect.objectContaining({ batchId, decision: 'accepted', parts: { accepted: 1, rework: 0, scrap: 1 } })]);
    const pareto = await t.http.get('/v1/defects/pareto').query({ groupBy: 'mold' }).set(as('viewer'));
    expect(pareto.status).toBe(200);
    const group = pareto.body.groups.find((g: { key: string }) => g.key === moldId);
    expect(group.bars).toEqual([{ code: 'voids', name: 'Voids', count: 1, percent: 100, cumulativePercent: 100 }]);
  });
});

describe('consumption', () => {
  it('a work order with no batch has no consumption: 409', async () => {
    const empty = (await t.http.post('/v1/work-orders').set(as('engineer')).send({ externalRef: `WO-${randomUUID().slice(0, 8)}`, quantity: 1 })).body.id;
    expectProblem(await t.http.get(`/v1/work-orders/${empty}/consumption`).set(as('viewer')), 409);
  });

  it('planned vs actual by lot from accepted readings, parts and yield; CSV; completion emits the back-flush event once', async () => {
    const batch = (await t.http.get(`/v1/batches/${batchId}`).set(as('viewer'))).body;
    const post = async (subject: string, value: number) => judged((await t.http.post('/v1/readings').set(as('engineer')).send({ batchId, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'mass', subject, value, unit: 'kg' })).body.id);
    expect((await post('part_a', batch.summary.massAKg)).status).toBe('accepted');
    expect((await post('part_b', batch.summary.massBKg)).status).toBe('accepted');
    const res = await t.http.get(`/v1/work-orders/${orderId}/consumption`).set(as('viewer'));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ batches: 1, parts: { accepted: 1, rework: 0, scrap: 1, undecided: 0 }, yield: 0.5 });
    expect(res.body.scrapMassKg).toBeCloseTo(0.3 * 0.45359237, 9);
    const a = res.body.materials.find((m: { part: string }) => m.part === 'A');
    expect(a).toMatchObject({ lotId: lotA, batches: 1 });
    expect(a.actualKg).toBeCloseTo(batch.summary.massAKg, 9);
    expect(a.plannedKg).toBeCloseTo(batch.summary.massAKg, 9);
    const csv = await t.http.get(`/v1/work-orders/${orderId}/consumption.csv`).set(as('viewer'));
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.text.split('\r\n')[0]).toBe('work_order,part_number,ordered,batches,parts_accepted,parts_rework,parts_scrap,parts_undecided,yield,scrap_mass_kg,material,lot,lot_batches,planned_kg,actual_kg,variance_kg');
    expect(csv.text).toContain(',0.5,');
    // the sheet rounds kilograms to 0.1 g: 0.3 lb = 0.136 077 711 kg (NIST SP 811: 1 lb = 0.453 592 37 kg)
    expect(csv.text).toContain(',0.5,0.1361,');
    const done = await t.http.post(`/v1/work-orders/${orderId}/complete`).set(as('engineer')).send({});
    expect(done.status).toBe(200);
    expect(done.body.state).toBe('done');
    expect((await t.http.post(`/v1/work-orders/${orderId}/complete`).set(as('engineer')).send({})).status).toBe(409);
    const [event] = await testDb()('events').where({ organization_id: org.id, type: 'work_order.completed' }).select('payload');
    expect(event.payload).toMatchObject({ workOrderId: orderId, parts: { ordered: 5, accepted: 1, scrap: 1 }, yield: 0.5 });
    expect(event.payload.materials.map((m: { part: string }) => m.part)).toEqual(['A', 'B']);
  });
});

describe('genealogy, recall and the lot override', () => {
  it('lot → batches → work orders → parts, and batch → lots', async () => {
    const g = await t.http.get(`/v1/lots/${lotA}/genealogy`).set(as('viewer'));
    expect(g.status).toBe(200);
    expect(g.body.batches.map((b: { batchId: string }) => b.batchId)).toEqual([batchId]);
    expect(g.body.workOrders).toEqual([expect.objectContaining({ id: orderId, batches: 1 })]);
    expect(g.body.parts).toEqual({ accepted: 1, rework: 0, scrap: 1, undecided: 0 });
    const b = await t.http.get(`/v1/batches/${batchId}/genealogy`).set(as('viewer'));
    expect(b.body.lots.map((l: { part: string; id: string }) => [l.part, l.id])).toEqual([['A', lotA], ['B', lotB]]);
    expect(b.body.parts).toHaveLength(2);
    expect(b.body.disposition.decision).toBe('accepted');
    expect((await t.http.get(`/v1/lots/${lotA}/genealogy`).set({ authorization: otherAuth.viewer })).status).toBe(404);
  });

  it('recalls a lot: the report lists every batch, its parts, work order and disposition (JSON and CSV)', async () => {
    const res = await t.http.post(`/v1/lots/${lotB}/recall`).set(as('engineer')).send({ reason: 'supplier notice: wrong blowing agent' });
    expect(res.status).toBe(200);
    expect(res.body.totals).toEqual({ batches: 1, workOrders: 1, parts: 2 });
    expect(res.body.rows[0]).toMatchObject({ batchId, partCount: 2, disposition: 'accepted', workOrderId: orderId, partNumber: 'SEAT-1' });
    expect((await t.http.post(`/v1/lots/${lotB}/recall`).set(as('engineer')).send({ reason: 'again' })).status).toBe(409);
    const csv = await t.http.get(`/v1/lots/${lotB}/recall.csv`).set(as('viewer'));
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.text.trim().split('\r\n')).toHaveLength(2);
    expect(csv.text).toContain(batchId);
    const [event] = await testDb()('events').where({ organization_id: org.id, type: 'lot.recalled' }).select('payload');
    expect(event.payload).toMatchObject({ lotId: lotB, affectedBatches: 1, affectedWorkOrders: 1 });
  });

  it('an expired (shelf life after opening), held or recalled lot needs an engineer’s override, audited', async () => {
    const opened = await lot('A', { openedOn: '2026-02-01', shelfLifeDaysAfterOpening: 30 });
    const view = (await t.http.get(`/v1/lots/${opened}`).set(as('viewer'))).body;
    expect(view).toMatchObject({ usableUntil: '2026-03-03', expired: true, shelfLifeDaysAfterOpening: 30 });
    const wo = (await t.http.post('/v1/work-orders').set(as('engineer')).send({ externalRef: `WO-${randomUUID().slice(0, 8)}`, quantity: 2, moldId, materialSystemId: systemId })).body.id;
    const before = await count('batches');
    const refused = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: wo, options: { lots: { A: opened, B: lotB }, plannedFor: '2026-04-01' } });
    expectProblem(refused, 409, '/options/lots/A');
    expect(refused.body.errors.map((e: { code: string }) => e.code).sort()).toEqual(['lot_expired', 'lot_recalled']);
    expect(await count('batches')).toBe(before);
    const ok = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: wo, options: { lots: { A: opened, B: lotB }, plannedFor: '2026-04-01' }, lotOverride: { reason: 'lab retest passed, QA-17' } });
    expect(ok.status).toBe(201);
    expect(ok.body.lotOverride).toMatchObject({ reason: 'lab retest passed, QA-17', by: org.people.engineer.email });
    expect(ok.body.lotOverride.lots.map((l: { code: string }) => l.code).sort()).toEqual(['lot_expired', 'lot_recalled']);
    const audit = await testDb()('audit_events').where({ organization_id: org.id, action: 'batch.lot_override', target_id: ok.body.id }).first();
    expect(audit.details).toMatchObject({ reason: 'lab retest passed, QA-17' });
  });
});
