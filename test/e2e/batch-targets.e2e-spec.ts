import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, expectProblem, flexSystem, shopCounts } from './support/shop.js';

// Exact definitions, NIST SP 811 appendix B: 1 lb = 0.45359237 kg, 1 in = 0.0254 m.
const LB = 0.45359237;
const G_PER_LB = 453.59237;

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let erpKey: string;

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('targets');
  other = await makeOrg('targets-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  const key = await t.http.post('/v1/api-keys').set('authorization', auth.admin).send({ name: 'ERP', kind: 'integration', scopes: ['work-orders:write', 'targets:read'] });
  expect(key.status).toBe(201);
  erpKey = key.body.secret;
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

const as = (role: Role) => ({ authorization: auth[role] });
const erp = { 'x-api-key': '' };

/** The inline system and mold of the handbook check: 12 × 12 × 2 in at 3 lb/ft³. */
const inlineCheck = (options: Record<string, unknown> = {}) => ({
  system: {
    ratioBasis: 'weight',
    ratio: { a: 100, b: 50 },
    specificGravityA: 1.1,
    specificGravityB: 1.2,
    isocyanatePart: 'B',
    freeRiseDensity: { value: 1.5, unit: 'pcf' },
    freeRiseReferenceTemperature: { value: 72, unit: 'degF' },
  },
  mold: { cavity: { kind: 'box', length: { value: 12, unit: 'in' }, width: { value: 12, unit: 'in' }, height: { value: 2, unit: 'in' } } },
  options: { targetDensity: { value: 3, unit: 'lb/ft3' }, ...options },
});

describe('POST /v1/targets/preview', () => {
  it('imperial: a 12 × 12 × 2 in cavity at 3 lb/ft³ needs 0.5 lb of foam (288 in³ = 1/6 ft³; NIST SP 811)', async () => {
    const before = await shopCounts(org.id);
    const res = await t.http.post('/v1/targets/preview').query({ units: 'imperial' }).set(as('viewer')).send(inlineCheck());
    expect(res.status).toBe(200);
    expect(res.body.unitSystem).toBe('imperial');
    expect(res.body.foamMass.unit).toBe('lb');
    expect(res.body.foamMass.value).toBeCloseTo(0.5, 12);
    expect(res.body.foamMass.si).toEqual({ value: expect.any(Number), unit: 'kg' });
    expect(res.body.foamMass.si.value).toBeCloseTo(0.5 * LB, 12);
    expect(res.body.cavityVolume.unit).toBe('in3');
    expect(res.body.cavityVolume.value).toBeCloseTo(288, 9);
    expect(res.body.targetDensity).toMatchObject({ unit: 'lb/ft3' });
    expect(res.body.targetDensity.value).toBeCloseTo(3, 12);
    expect(res.body.packFactor.value).toBeCloseTo(2, 12);
    // A:B 100:50 by weight splits 0.5 lb as 1/3 lb and 1/6 lb (the definition of a weight ratio)
    expect(res.body.components.A.mass.value).toBeCloseTo(1 / 3, 12);
    expect(res.body.components.B.mass.value).toBeCloseTo(1 / 6, 12);
    expect(res.body.components.B.side).toBe('isocyanate');
    expect(res.body.expectedFreeRiseDensity.temperature.unit).toBe('degF');
    expect(res.body.expectedFreeRiseDensity.temperature.value).toBeCloseTo(72, 9);
    expect(res.body.cautions.map((c: { code: string }) => c.code)).toEqual(['ISOCYANATE_SENSITISER', 'PROTECTIVE_EQUIPMENT', 'EXOTHERM', 'GOVERNING_DOCUMENTS']);
    expect(res.body.cautions.map((c: { text: string }) => c.text).join(' ')).toMatch(/SDS/);
    expect(res.body.sources).toMatchObject({ system: { inline: true }, mold: { inline: true } });
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('metric: the same cavity needs 226.796185 g (0.5 × 453.59237 g), with SI alongside', async () => {
    const res = await t.http.post('/v1/targets/preview').query({ units: 'metric' }).set(as('viewer')).send(inlineCheck());
    expect(res.status).toBe(200);
    expect(res.body.foamMass.unit).toBe('g');
    expect(res.body.foamMass.value).toBeCloseTo(226.796185, 6);
    expect(res.body.foamMass.si.value).toBeCloseTo(0.226796185, 9);
    expect(res.body.cavityVolume.unit).toBe('L');
    expect(res.body.cavityVolume.value).toBeCloseTo(288 * 0.0254 ** 3 * 1000, 9);
    expect(res.body.targetDensity.value).toBeCloseTo(3 * LB / 0.3048 ** 3, 9);
  });

  it("without ?units, a person's preference decides, and an API key gets the organization's", async () => {
    await testDb()('users').where({ id: org.people.viewer.id }).update({ unit_system: 'imperial' });
    const mine = await t.http.post('/v1/targets/preview').set(as('viewer')).send(inlineCheck());
    expect(mine.body.unitSystem).toBe('imperial');
    const key = await t.http.post('/v1/targets/preview').set({ 'x-api-key': erpKey }).send(inlineCheck());
    expect(key.status).toBe(200);
    expect(key.body.unitSystem).toBe('metric');
    expectProblem(await t.http.post('/v1/targets/preview').query({ units: 'cubits' }).set(as('viewer')).send(inlineCheck()), 400, '/units');
  });

  it('grosses up by both allowance conventions: m × (1 + a) and m ÷ (1 − a)', async () => {
    const dflt = await t.http.post('/v1/targets/preview').query({ units: 'imperial' }).set(as('engineer')).send(inlineCheck({ overfillPercent: 10, retentionPercent: 5 }));
    expect(dflt.body.mixedMass.value).toBeCloseTo((0.5 * 1.1) / 0.95, 12);
    const both = await t.http.post('/v1/targets/preview').query({ units: 'imperial' }).set(as('engineer')).send(inlineCheck({ overfillPercent: 10, retentionPercent: 5, allowanceConvention: { overfill: 'multiplicative', retention: 'multiplicative' } }));
    expect(both.body.mixedMass.value).toBeCloseTo(0.5 * 1.1 * 1.05, 12);
  });

  it('pigment at 2 % of A+B (common practice) and masses rounded to the scale, with a warning when the band is under 5 divisions', async () => {
    const fine = await t.http.post('/v1/targets/preview').query({ units: 'metric' }).set(as('engineer')).send(inlineCheck({ pigmentPercent: 2, scale: { readability: { value: 0.1, unit: 'g' } } }));
    expect(fine.status).toBe(200);
    const ab = (0.5 * G_PER_LB) / 1.02;
    expect(fine.body.components.pigment.mass.value).toBeCloseTo(Math.round(ab * 0.02 * 10) / 10, 9);
    expect(fine.body.components.A.mass.value).toBeCloseTo(Math.round(((ab * 2) / 3) * 10) / 10, 9);
    expect(fine.body.components.B.mass.value).toBeCloseTo(Math.round((ab / 3) * 10) / 10, 9);
    expect(fine.body.warnings.map((w: { code: string }) => w.code)).not.toContain('TOLERANCE_BELOW_SCALE_RESOLUTION');
    // B is about 74 g: ±5 % is about 3.5 g, under 5 divisions of a 1 g scale
    const coarse = await t.http.post('/v1/targets/preview').query({ units: 'metric' }).set(as('engineer')).send(inlineCheck({ scale: { readability: { value: 1, unit: 'g' } } }));
    // with the pigment, 4.4 g of it is only 4.4 divisions of that scale: refused (at least 10 divisions)
    const refused = await t.http.post('/v1/targets/preview').query({ units: 'metric' }).set(as('engineer')).send(inlineCheck({ pigmentPercent: 2, scale: { readability: { value: 1, unit: 'g' } } }));
    expectProblem(refused, 422, '/options/scale/readability/value');
    const w = coarse.body.warnings.find((x: { code: string }) => x.code === 'TOLERANCE_BELOW_SCALE_RESOLUTION');
    expect(w).toBeDefined();
    expect(w.display.unit).toBe('g');
    expect(w.display.limit).toBeCloseTo(5, 9);
  });

  it.each([
    ['a pack factor that makes no physical sense', { packFactor: 50, targetDensity: undefined }, '/options/packFactor'],
    ['a zero pack factor', { packFactor: 0, targetDensity: undefined }, '/options/packFactor'],
    ['a target density implying a pack factor above 10', { targetDensity: { value: 40, unit: 'pcf' } }, '/options/targetDensity/value'],
    ['a negative target density', { targetDensity: { value: -3, unit: 'pcf' } }, '/options/targetDensity/value'],
    ['an unknown density unit', { targetDensity: { value: 3, unit: 'lb/gal' } }, '/options/targetDensity/unit'],
    ['a density and a pack factor at once', { packFactor: 2 }, '/options/packFactor'],
    ['retention of 100 %', { retentionPercent: 100 }, '/options/retentionPercent'],
  ])('%s → 422 at %s', async (_label, options, pointer) => {
    const res = await t.http.post('/v1/targets/preview').set(as('engineer')).send(inlineCheck(options));
    expectProblem(res, 422, pointer);
  });

  it('zero or negative volumes, densities, SGs and ratios inline → 422 at each field', async () => {
    const body = inlineCheck();
    body.system.specificGravityA = 0;
    body.system.ratio.b = -50;
    (body.mold.cavity as Record<string, unknown>).height = { value: 0, unit: 'in' };
    const res = await t.http.post('/v1/targets/preview').set(as('engineer')).send(body);
    expectProblem(res, 422);
    const pointers = res.body.errors.map((e: { pointer: string }) => e.pointer);
    expect(pointers).toEqual(expect.arrayContaining(['/system/specificGravityA', '/system/ratio/b']));
    const density = inlineCheck();
    density.system.freeRiseDensity = { value: 0, unit: 'pcf' };
    expectProblem(await t.http.post('/v1/targets/preview').set(as('engineer')).send(density), 422, '/system/freeRiseDensity/value');
    const volume = inlineCheck();
    (volume.mold.cavity as Record<string, unknown>).height = { value: -2, unit: 'in' };
    expectProblem(await t.http.post('/v1/targets/preview').set(as('engineer')).send(volume), 422, '/mold/cavity/height/value');
  });
});

describe('a batch from a work order posted by the ERP', () => {
  let systemId: string;
  let moldId: string;
  let lotA: string;
  let lotB: string;
  let lotBOld: string;
  let scaleId: string;
  let orderId: string;
  let batchId: string;

  beforeAll(async () => {
    systemId = (await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({ freeRiseDensity: { value: 40, unit: 'kg/m3' }, maxPigmentPercent: 5 }))).body.id;
    // 300 × 200 × 50 mm = 3 L
    moldId = (await t.http.post('/v1/molds').set(as('engineer')).send(boxMold({ defaultPackFactor: 1.5 }))).body.id;
    const lot = async (part: string, lotNumber: string, expiresOn: string) =>
      (await t.http.post('/v1/lots').set(as('engineer')).send({ part, materialSystemId: systemId, lotNumber, receivedOn: '2024-01-02', expiresOn })).body.id as string;
    lotA = await lot('A', 'TA-1', '2099-01-01');
    lotB = await lot('B', 'TB-1', '2099-01-01');
    lotBOld = await lot('B', 'TB-0', '2025-01-31');
    const scale = await t.http.post('/v1/devices').set(as('admin')).send({ kind: 'scale', serial: `SC-${Date.now()}`, name: 'Bench scale', readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2099-01-01' });
    expect(scale.status).toBe(201);
    scaleId = scale.body.id;
    erp['x-api-key'] = erpKey;
  });

  it('the ERP posts the work order with its key (scope work-orders:write)', async () => {
    const res = await t.http.post('/v1/work-orders').set(erp).send({ externalRef: 'WO-T-1', partNumber: 'CUSH-900', moldId, materialSystemId: systemId, quantity: 40, dueOn: '2026-05-01' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ externalRef: 'WO-T-1', state: 'open', quantity: 40, dueOn: '2026-05-01', moldId, materialSystemId: systemId });
    orderId = res.body.id;
  });

  it('an engineer plans a batch from it: targets computed and stored, state planned, first transition written', async () => {
    const res = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: orderId, options: { packFactor: 2, pigmentPercent: 2, lots: { A: lotA, B: lotB }, scaleDeviceId: scaleId, plannedFor: '2026-04-20' } });
    expect(res.status).toBe(201);
    batchId = res.body.id;
    expect(res.body).toMatchObject({ state: 'planned', workOrderId: orderId, workOrderExternalRef: 'WO-T-1', moldId, materialSystemId: systemId, materialSystemRevision: 1, subject: 'mold', plannedFor: '2026-04-20' });
    // ρ = pack factor × free-rise density = 80 kg/m³; m = ρ V = 80 × 0.003 = 0.24 kg
    expect(res.body.summary.targetDensityKgM3).toBeCloseTo(80, 12);
    expect(res.body.summary.foamMassKg).toBeCloseTo(0.24, 12);
    expect(res.body.cautions.map((c: { code: string }) => c.code)).toContain('ISOCYANATE_SENSITISER');
    const row = await testDb()('batches').where({ id: batchId }).first();
    expect(row.state).toBe('planned');
    expect(row.computation_version).toBe(row.targets.computationVersion);
    expect(row.targets.input.system.freeRiseDensity).toBe(40);
    expect(row.targets.input.mold.volume).toBeCloseTo(0.003, 15);
    const transitions = await testDb()('batch_state_transitions').where({ batch_id: batchId });
    expect(transitions).toHaveLength(1);
    expect(transitions[0]).toMatchObject({ from_state: null, to_state: 'planned', actor_type: 'user' });
    const listed = await t.http.get(`/v1/batches/${batchId}/transitions`).set(as('viewer'));
    expect(listed.body).toEqual([expect.objectContaining({ from: null, to: 'planned' })]);
  });

  it('the ERP reads the stored targets: organization units, SI alongside, cautions', async () => {
    const res = await t.http.get(`/v1/batches/${batchId}/targets`).set(erp);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ batchId, state: 'planned', unitSystem: 'metric', computationVersion: expect.any(String) });
    expect(res.body.foamMass).toMatchObject({ unit: 'g', si: { unit: 'kg' } });
    expect(res.body.foamMass.value).toBeCloseTo(240, 9);
    expect(res.body.scaleReadability.value).toBeCloseTo(0.1, 12);
    // rounded to the 0.1 g division of the scale
    const a = res.body.components.A.mass.value;
    expect(Math.abs(a * 10 - Math.round(a * 10))).toBeLessThan(1e-9);
    expect(res.body.sources.lots.map((l: { lotNumber: string }) => l.lotNumber)).toEqual(['TA-1', 'TB-1']);
    expect(res.body.cautions.length).toBeGreaterThanOrEqual(4);
    expect(res.body.documents).toEqual({ safetyDataSheets: [], sdsOnFile: false });
    const imperial = await t.http.get(`/v1/batches/${batchId}/targets`).query({ units: 'imperial' }).set(erp);
    expect(imperial.body.foamMass.unit).toBe('lb');
    expect(imperial.body.foamMass.value).toBeCloseTo(0.24 / LB, 12);
  });

  it('the ERP key cannot plan batches nor read shop lists (403)', async () => {
    expectProblem(await t.http.post('/v1/batches').set(erp).send({ workOrderId: orderId, options: { packFactor: 2 } }), 403);
    expectProblem(await t.http.get('/v1/batches').set(erp), 403);
  });

  it('an expired lot (let in by an engineer’s override) and an overdue scale are warned about, for the day of the pour', async () => {
    await testDb()('devices').where({ id: scaleId }).update({ calibration_due: '2026-01-01' });
    const body = { workOrderId: orderId, options: { packFactor: 2, lots: { A: lotA, B: lotBOld }, scaleDeviceId: scaleId, plannedFor: '2026-04-20' } };
    expect((await t.http.post('/v1/batches').set(as('engineer')).send(body)).status).toBe(409);
    const res = await t.http.post('/v1/batches').set(as('engineer')).send({ ...body, lotOverride: { reason: 'trial pour' } });
    expect(res.status).toBe(201);
    expect(res.body.summary.warnings).toEqual(expect.arrayContaining(['LOT_EXPIRED', 'CALIBRATION_OVERDUE']));
    await testDb()('devices').where({ id: scaleId }).update({ calibration_due: '2099-01-01' });
  });

  it('revisions keep old batches’ parameters; new batches use the current revision unless told otherwise', async () => {
    const current = (await t.http.get(`/v1/material-systems/${systemId}`).set(as('engineer'))).body;
    const put = await t.http.put(`/v1/material-systems/${systemId}`).set(as('engineer')).send(flexSystem({ name: current.name, freeRiseDensity: { value: 50, unit: 'kg/m3' } }));
    expect(put.body.revision).toBe(2);
    await t.http.put(`/v1/molds/${moldId}`).set(as('engineer')).send(boxMold({ name: 'Block, deeper', cavity: { kind: 'box', length: { value: 300, unit: 'mm' }, width: { value: 200, unit: 'mm' }, height: { value: 100, unit: 'mm' } } }));

    const old = await t.http.get(`/v1/batches/${batchId}/targets`).set(erp);
    expect(old.body.sources.system.revision).toBe(1);
    expect(old.body.targetDensity.si.value).toBeCloseTo(80, 12);
    expect(old.body.cavityVolume.si.value).toBeCloseTo(0.003, 15);
    expect((await t.http.get(`/v1/batches/${batchId}`).set(as('viewer'))).body.materialSystemRevision).toBe(1);

    const fresh = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: orderId, options: { packFactor: 2 } });
    expect(fresh.body.materialSystemRevision).toBe(2);
    expect(fresh.body.summary.targetDensityKgM3).toBeCloseTo(100, 12);
    expect(fresh.body.summary.foamMassKg).toBeCloseTo(0.6, 12);
    const pinned = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: orderId, materialSystemRevision: 1, options: { packFactor: 2 } });
    expect(pinned.body.materialSystemRevision).toBe(1);
    expect(pinned.body.summary.targetDensityKgM3).toBeCloseTo(80, 12);
  });

  it('an ad hoc free-rise cup batch needs no work order', async () => {
    const res = await t.http.post('/v1/batches').set(as('engineer')).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ subject: 'free_rise_cup', moldId: null, workOrderId: null, state: 'planned' });
    expect(res.body.summary.packFactor).toBe(1);
  });

  describe('bad batches: 422 or 404 problem+json with pointers, and nothing written', () => {
    let foreignMold: string;
    let foreignOrder: string;
    let thermometer: string;
    let otherSystemLot: string;
    beforeAll(async () => {
      foreignMold = (await t.http.post('/v1/molds').set({ authorization: otherAuth.engineer }).send(boxMold())).body.id;
      foreignOrder = (await t.http.post('/v1/work-orders').set({ authorization: otherAuth.engineer }).send({ externalRef: 'WO-OTHER', quantity: 1 })).body.id;
      thermometer = (await t.http.post('/v1/devices').set(as('admin')).send({ kind: 'thermometer', serial: `TH-${Date.now()}`, name: 'Probe' })).body.id;
      const sys2 = (await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem())).body.id;
      otherSystemLot = (await t.http.post('/v1/lots').set(as('engineer')).send({ part: 'A', materialSystemId: sys2, lotNumber: 'OTHER-A', receivedOn: '2026-01-02', expiresOn: '2099-01-01' })).body.id;
    });

    const cases: [string, () => Record<string, unknown>, string][] = [
      ['a lot of the wrong part', () => ({ workOrderId: orderId, options: { packFactor: 2, lots: { A: lotB } } }), '/options/lots/A'],
      ['a lot of another system', () => ({ workOrderId: orderId, options: { packFactor: 2, lots: { A: otherSystemLot } } }), '/options/lots/A'],
      ['a mold of another organization', () => ({ materialSystemId: systemId, moldId: foreignMold, options: { packFactor: 2 } }), '/moldId'],
      ['a work order of another organization', () => ({ workOrderId: foreignOrder, materialSystemId: systemId, moldId, options: { packFactor: 2 } }), '/workOrderId'],
      ['a thermometer as the scale', () => ({ workOrderId: orderId, options: { packFactor: 2, scaleDeviceId: thermometer } }), '/options/scaleDeviceId'],
      ['a pack factor that makes no physical sense', () => ({ workOrderId: orderId, options: { packFactor: 25 } }), '/options/packFactor'],
      ['a negative target density', () => ({ workOrderId: orderId, options: { targetDensity: { value: -80, unit: 'kg/m3' } } }), '/options/targetDensity/value'],
      ['an unknown temperature unit', () => ({ workOrderId: orderId, options: { packFactor: 2, componentTemperature: { value: 22, unit: 'Réaumur' } } }), '/options/componentTemperature/unit'],
      ['a revision that does not exist', () => ({ workOrderId: orderId, materialSystemRevision: 9, options: { packFactor: 2 } }), '/materialSystemRevision'],
      ['no mold and no cup', () => ({ materialSystemId: systemId, options: { packFactor: 2 } }), '/moldId'],
      ['a zero cup volume', () => ({ materialSystemId: systemId, freeRiseCup: { volume: { value: 0, unit: 'mL' } } }), '/freeRiseCup/volume/value'],
    ];
    it.each(cases)('%s', async (_label, body, pointer) => {
      const before = await shopCounts(org.id);
      const res = await t.http.post('/v1/batches').set(as('engineer')).send(body());
      expectProblem(res, 422, pointer);
      expect(await shopCounts(org.id)).toEqual(before);
    });

    it('a viewer cannot plan (403); another organization cannot see the batch or its targets (404)', async () => {
      const before = await shopCounts(org.id);
      expectProblem(await t.http.post('/v1/batches').set(as('viewer')).send({ workOrderId: orderId, options: { packFactor: 2 } }), 403);
      expect(await shopCounts(org.id)).toEqual(before);
      expectProblem(await t.http.get(`/v1/batches/${batchId}`).set({ authorization: otherAuth.engineer }), 404);
      expectProblem(await t.http.get(`/v1/batches/${batchId}/targets`).set({ authorization: otherAuth.viewer }), 404);
      expectProblem(await t.http.post('/v1/targets/preview').set({ authorization: otherAuth.engineer }).send({ system: { id: systemId }, mold: { id: moldId }, options: { packFactor: 2 } }), 422, '/system/id');
      expectProblem(await t.http.post('/v1/targets/preview').set(as('engineer')).send({ system: { id: systemId }, mold: { id: foreignMold }, options: { packFactor: 2 } }), 422, '/mold/id');
    });
  });
});

describe('judging the whole pour: targets (issue 15)', () => {
  const system = (over: Record<string, unknown> = {}) => ({ ...inlineCheck().system, freeRiseDensity: { value: 30, unit: 'kg/m3' }, freeRiseReferenceTemperature: { value: 22, unit: 'degC' }, freeRiseDensitySlope: { value: -0.3, unit: 'kg/m3/degC' }, ...over });
  const preview = (body: Record<string, unknown>, units = 'metric') => t.http.post('/v1/targets/preview').query({ units }).set(as('viewer')).send(body);
  const cup = { freeRiseCup: { volume: { value: 1, unit: 'L' } } };

  it('5. refuses inputs with no physical sense with a pointer, never a number (and never a 500)', async () => {
    // a component at 200 °C gave −17.3 kg/m³ (a mold) and a RangeError (a free-rise cup)
    expectProblem(await preview({ system: system(), mold: inlineCheck().mold, options: { packFactor: 2, componentTemperature: { value: 200, unit: 'degC' } } }), 422, '/options/componentTemperature/value');
    expectProblem(await preview({ system: system(), ...cup, options: { componentTemperature: { value: 200, unit: 'degC' } } }), 422, '/options/componentTemperature/value');
    expectProblem(await preview({ system: system({ specificGravityA: 12 }), ...cup }), 422, '/system/specificGravityA');
    expectProblem(await preview({ system: system({ ratio: { a: 1e308, b: 1 } }), ...cup }), 422, '/system/ratio/a');
    expectProblem(await preview({ system: system({ ncoPercent: 48, hydroxylNumber: 5000 }), ...cup }), 422, '/system/hydroxylNumber');
    expectProblem(await preview({ system: system(), mold: { cavity: { kind: 'entered', volume: { value: 1e9, unit: 'm3' } } }, options: { packFactor: 2 } }), 422, '/mold/cavity');
  });

  it('6. uses the system slope, and says why, when three cups at 22.0–22.2 °C fit +15 kg/m³/°C', async () => {
    const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({ freeRiseDensitySlope: { value: -0.3, unit: 'kg/m3/degC' } }));
    for (const [temperature, density] of [[22.0, 40], [22.1, 41.5], [22.2, 43]] as const) {
      const r = await t.http.post('/v1/qc-cup-tests').set(as('engineer')).send({ materialSystemId: sys.body.id, componentTemperatureA: { value: temperature, unit: 'degC' }, componentTemperatureB: { value: temperature, unit: 'degC' }, freeRiseDensity: { value: density, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' });
      expect(r.status).toBe(201);
    }
    const res = await preview({ system: { id: sys.body.id }, ...cup, options: { componentTemperature: { value: 30, unit: 'degC' } } });
    expect(res.status).toBe(200);
    expect(res.body.expectedFreeRiseDensity).toMatchObject({ method: 'system_slope', fitRejected: 'too_few_points' });
    expect(res.body.expectedFreeRiseDensity.methodReason).toMatch(/cup tests were not used because fewer than 5 cup tests/);
    // 40 − 0.3 × 8 = 37.6 kg/m³, not the 164 kg/m³ of the three-cup line
    expect(res.body.expectedFreeRiseDensity.density.si.value).toBeCloseTo(37.6, 9);
  });

  it('7. refuses a scale on which a target rounds to zero or spans fewer than 10 divisions', async () => {
    // 0.2 kg of mix on a 1 kg readability rounded every target to 0 with only a warning
    const res = await preview({ system: system(), mold: { cavity: { kind: 'entered', volume: { value: 0.2 / 60, unit: 'm3' } } }, options: { packFactor: 2, scale: { readability: { value: 1, unit: 'kg' } } } });
    expectProblem(res, 422, '/options/scale/readability/value');
    expect(res.body.errors[0].detail).toMatch(/at least 10 divisions/);
    expect((await preview({ system: system(), mold: { cavity: { kind: 'entered', volume: { value: 0.2 / 60, unit: 'm3' } } }, options: { packFactor: 2, scale: { readability: { value: 1, unit: 'g' } } } })).status).toBe(200);
  });

  it('3. doses pigment as the trade does: 2 % of the polyol side at 100:55 is 1.29 % of A+B; pre-blended in B it is in B’s target', async () => {
    // 2 × 100/155 = 1.2903 % of A + B (polyol is A); copying a paste sheet as % of A+B overdoses by 55 %
    const polyol = await preview({ system: system({ ratio: { a: 100, b: 55 }, pigmentDoseBasis: 'polyol' }), ...cup, options: { pigmentPercent: 2 } });
    expect(polyol.status).toBe(200);
    expect(polyol.body.components.pigment.percentOfAB).toBeCloseTo(200 / 155, 9);
    expect(polyol.body.components.pigment.dosed).toEqual({ percent: 2, basis: 'polyol' });
    const inB = await preview({ system: system({ ratio: { a: 100, b: 55 }, pigmentPlacement: 'B' }), ...cup, options: { pigmentPercent: 2 } });
    const c = inB.body.components;
    expect(c.pigment.placement).toBe('B');
    expect(c.pigment.mass.si.value).toBe(0);
    expect(c.B.massUnrounded.si.value).toBeCloseTo(c.A.massUnrounded.si.value * 0.55 + c.pigment.massUnrounded.si.value, 12);
  });

  it('3. counts the pigment carrier’s OH in the isocyanate index (equivalent-weight method)', async () => {
    // 100 A (polyol, OH 56.1: 0.1 eq) : 50 B (%NCO 16.808: 4202 ÷ 16.808 = 250 g/eq, 0.2 eq) is index 200; 2 % of A+B of a carrier of OH 56.1
    // adds 3 g × 56.1/56 100 = 0.003 eq → 0.2/0.103 × 100 = 194.17
    const base = system({ ncoPercent: 16.808, hydroxylNumber: 56.1 });
    expect((await preview({ system: base, ...cup })).body.isocyanateIndex.value).toBeCloseTo(200, 6);
    const carried = await preview({ system: { ...base, pigmentCarrierHydroxylNumber: 56.1 }, ...cup, options: { pigmentPercent: 2 } });
    expect(carried.body.isocyanateIndex.value).toBeCloseTo((0.2 / 0.103) * 100, 6);
  });

  it('4. takes the ratio tolerance in parts by weight: 100:50 ± 2 pbw is the narrower 2/52 = 3.85 %', async () => {
    const res = await preview({ system: system({ ratioTolerancePbw: 2 }), ...cup });
    expect(res.status).toBe(200);
    expect(res.body.ratioTolerancePercent).toBeCloseTo((2 / 52) * 100, 9);
  });

  it('8. writes warnings in the reader’s units and grades the pack factor: below 1 a danger, just above 1 a caution', async () => {
    const cold = await preview({ system: { ...system(), componentTemperatureWindow: { min: { value: 18, unit: 'degC' }, max: { value: 27, unit: 'degC' } } }, mold: inlineCheck().mold, options: { packFactor: 1.05, componentTemperature: { value: 15.5555555555556, unit: 'degC' } } }, 'imperial');
    expect(cold.status).toBe(200);
    const byCode = Object.fromEntries(cold.body.warnings.map((w: { code: string }) => [w.code, w]));
    // 15.56 °C = 60 °F and 18–27 °C = 64.4–80.6 °F (NIST SP 811)
    expect(byCode.TEMPERATURE_BELOW_WINDOW.message).toMatch(/^The component at 60 °F is below the window of 64\.4–80\.6 °F/);
    // expected free-rise density at 15.56 °C is 30 + 0.3 × 6.44 = 31.93 kg/m³: 1.05 × 30 / 31.93 = 0.987, under 1
    expect(byCode.PACK_FACTOR_BELOW_ONE.severity).toBe('danger');
    const marginal = await preview({ system: system(), mold: inlineCheck().mold, options: { packFactor: 1.05 } });
    expect(marginal.body.warnings.map((w: { code: string; severity: string }) => `${w.code}:${w.severity}`)).toContain('PACK_FACTOR_MARGINAL:caution');
  });
});
