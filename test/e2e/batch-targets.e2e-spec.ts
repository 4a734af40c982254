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
    const coarse = await t.http.post('/v1/targets/preview').query({ units: 'metric' }).set(as('engineer')).send(inlineCheck({ pigmentPercent: 2, scale: { readability: { value: 1, unit: 'g' } } }));
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

  it('an expired lot and an overdue scale are warned about, for the day of the pour', async () => {
    await testDb()('devices').where({ id: scaleId }).update({ calibration_due: '2026-01-01' });
    const res = await t.http.post('/v1/batches').set(as('engineer')).send({ workOrderId: orderId, options: { packFactor: 2, lots: { A: lotA, B: lotBOld }, scaleDeviceId: scaleId, plannedFor: '2026-04-20' } });
    expect(res.status).toBe(201);
    expect(res.body.summary.warnings).toEqual(expect.arrayContaining(['LOT_EXPIRED', 'SCALE_CALIBRATION_OVERDUE']));
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
