import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomBytes } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { sha256 } from '../../api/src/auth/tokens.service.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, expectProblem, flexSystem, shopCounts } from './support/shop.js';

// Exact definitions, NIST SP 811 appendix B: 1 lb = 0.45359237 kg, 1 in = 0.0254 m, 1 ft = 0.3048 m.
const LB = 0.45359237;
const IN = 0.0254;
const FT = 0.3048;
const PCF = LB / FT ** 3; // 16.018463... kg/m³

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let readKey: string;

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('shop');
  other = await makeOrg('shop-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  readKey = `pgi_live_${randomBytes(32).toString('base64url')}`;
  await testDb()('api_keys').insert({ organization_id: org.id, name: 'reader', kind: 'integration', environment: 'live', scopes: ['shop:read'], prefix: readKey.slice(0, 16), secret_hash: sha256(readKey) });
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

const post = (path: string, body: unknown, as: Role = 'engineer') => t.http.post(path).set('authorization', auth[as]).send(body as object);

describe('material systems', () => {
  it('takes shop units and stores SI (NIST SP 811 definitions)', async () => {
    const res = await post('/v1/material-systems', flexSystem({
      freeRiseDensity: { value: 2.5, unit: 'pcf' },
      freeRiseReferenceTemperature: { value: 72, unit: 'degF' },
      freeRiseDensitySlope: { value: -0.02, unit: 'lb/ft3/degF' },
      componentTemperatureWindow: { min: { value: 65, unit: 'degF' }, max: { value: 80, unit: 'degF' } },
      exothermMassLimit: { value: 4, unit: 'lb' },
      potLife: { value: 1.5, unit: 'min' },
    }));
    expect(res.status).toBe(201);
    expect(res.body.revision).toBe(1);
    expect(res.body.freeRiseDensityKgM3).toBeCloseTo(2.5 * PCF, 9);
    expect(res.body.freeRiseDensityKgM3).toBeCloseTo(40.0462, 4);
    // t/°C = (t/°F − 32) / 1.8 (NIST SP 811 §B.9)
    expect(res.body.freeRiseReferenceTemperatureC).toBeCloseTo((72 - 32) / 1.8, 9);
    expect(res.body.componentTemperatureMinC).toBeCloseTo((65 - 32) / 1.8, 9);
    // a slope per degree is a temperature difference: ×5/9 only, no 32 °F offset
    expect(res.body.freeRiseDensitySlopeKgM3PerC).toBeCloseTo((-0.02 * PCF) / (5 / 9), 9);
    expect(res.body.exothermMassLimitKg).toBeCloseTo(4 * LB, 12);
    expect(res.body.potLifeS).toBe(90);
    expect(res.body.demoldTimeS).toBe(720);
    expect(res.body.fullCureTimeS).toBe(86400);
    const stored = await testDb()('material_system_revisions').where({ material_system_id: res.body.id }).first();
    expect(stored.free_rise_density_kg_m3).toBeCloseTo(2.5 * PCF, 9);
  });

  it('defaults the ratio tolerance to ±5 % (common practice) and derives the weight ratio of a volume system', async () => {
    // weight ratio = volume ratio × SG_A / SG_B (the definition of specific gravity; common practice)
    const res = await post('/v1/material-systems', flexSystem({ ratioBasis: 'volume', ratio: { a: 100, b: 100 }, specificGravityA: 1.23, specificGravityB: 1.05 }));
    expect(res.status).toBe(201);
    expect(res.body.ratioTolerancePercent).toBe(5);
    expect(res.body.derived.weightRatio.a).toBeCloseTo((100 * 1.23) / 1.05, 9);
    expect(res.body.derived.weightRatio.b).toBe(100);
    expect(res.body.derived.isocyanateIndex).toBeNull();
  });

  it('works out the isocyanate index by the equivalent-weight method of the polyurethane handbooks', async () => {
    const res = await post('/v1/material-systems', flexSystem({ ratio: { a: 100, b: 45 }, isocyanatePart: 'B', ncoPercent: 32, hydroxylNumber: 60, waterPbw: 2 }));
    expect(res.status).toBe(201);
    // NCO eq. weight 4202/%NCO, OH eq. weight 56100/OH number, water eq. weight 9.0
    const nco = 45 / (4202 / 32);
    const oh = 100 / (56100 / 60);
    const water = (100 * 2) / 100 / 9.0;
    expect(res.body.derived.isocyanateIndex).toBeCloseTo((100 * nco) / (oh + water), 6);
  });

  it('a PUT that changes a parameter writes a new revision; one that changes none does not', async () => {
    const body = flexSystem();
    const created = await post('/v1/material-systems', body);
    const id = created.body.id;
    const same = await t.http.put(`/v1/material-systems/${id}`).set('authorization', auth.engineer).send(body);
    expect(same.status).toBe(200);
    expect(same.body.revision).toBe(1);
    const changed = await t.http.put(`/v1/material-systems/${id}`).set('authorization', auth.engineer).send({ ...body, freeRiseDensity: { value: 42, unit: 'kg/m3' }, changeNote: 'new supplier lot data' });
    expect(changed.status).toBe(200);
    expect(changed.body.revision).toBe(2);
    expect(changed.body.freeRiseDensityKgM3).toBe(42);
    const revs = await t.http.get(`/v1/material-systems/${id}/revisions`).set('authorization', auth.viewer);
    expect(revs.status).toBe(200);
    expect(revs.headers['content-range']).toBe('material-system-revisions 0-1/2');
    expect(revs.body.map((r: { revision: number; freeRiseDensityKgM3: number }) => [r.revision, r.freeRiseDensityKgM3])).toEqual([[2, 42], [1, 40]]);
    expect(revs.body[0].changeNote).toBe('new supplier lot data');
    const audit = await testDb()('audit_events').where({ organization_id: org.id, target_id: id }).pluck('action');
    expect(audit.sort()).toEqual(['material_system.created', 'material_system.revised']);
  });

  it('lists speak ra-data-simple-rest', async () => {
    const res = await t.http.get('/v1/material-systems').set('authorization', auth.viewer).query({ range: '[0,1]', sort: '["name","ASC"]', filter: JSON.stringify({ kind: 'flexible' }) });
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(2);
    expect(res.headers['content-range']).toMatch(/^material-systems 0-1\/\d+$/);
    expect(Number(res.headers['content-range'].split('/')[1])).toBeGreaterThanOrEqual(4);
  });

  it('a duplicate name is a 409 conflict', async () => {
    const body = flexSystem();
    expect((await post('/v1/material-systems', body)).status).toBe(201);
    expectProblem(await post('/v1/material-systems', body), 409, '/name');
  });
});

describe('molds', () => {
  it('a 12 × 12 × 2 in box holds 288 in³ (1 in = 0.0254 m, NIST SP 811)', async () => {
    const res = await post('/v1/molds', boxMold({ cavity: { kind: 'box', length: { value: 12, unit: 'in' }, width: { value: 12, unit: 'in' }, height: { value: 2, unit: 'in' } } }));
    expect(res.status).toBe(201);
    expect(res.body.cavityVolumeM3).toBeCloseTo(288 * IN ** 3, 15);
    expect(res.body.cavity).toEqual({ kind: 'box', length: { value: 12, unit: 'in' }, width: { value: 12, unit: 'in' }, height: { value: 2, unit: 'in' } });
  });

  it('a water fill is mass ÷ density of water at its temperature (998.2 kg/m³ at 20 °C: CRC Handbook, from memory)', async () => {
    const res = await post('/v1/molds', boxMold({ cavity: { kind: 'water_fill', waterMass: { value: 2000, unit: 'g' }, waterTemperature: { value: 68, unit: 'degF' } } }));
    expect(res.status).toBe(201);
    expect(res.body.cavityVolumeM3 * 1000).toBeCloseTo(2 / 0.9982, 4);
  });

  it('a cylinder less its inserts, times its cavities (π d² h / 4)', async () => {
    const res = await post('/v1/molds', boxMold({
      cavity: { kind: 'cylinder', diameter: { value: 100, unit: 'mm' }, height: { value: 12, unit: 'cm' } },
      inserts: [{ kind: 'box', length: { value: 20, unit: 'mm' }, width: { value: 20, unit: 'mm' }, height: { value: 20, unit: 'mm' } }],
      cavities: 2,
    }));
    expect(res.status).toBe(201);
    const gross = (Math.PI * 0.1 ** 2 * 0.12) / 4;
    expect(res.body.grossCavityVolumeM3).toBeCloseTo(gross, 12);
    expect(res.body.insertVolumeM3).toBeCloseTo(8e-6, 12);
    expect(res.body.cavityVolumeM3).toBeCloseTo(gross - 8e-6, 12);
    expect(res.body.totalVolumeM3).toBeCloseTo(2 * (gross - 8e-6), 12);
  });
});

describe('lots and QC cup tests', () => {
  let systemId: string;
  beforeAll(async () => {
    systemId = (await post('/v1/material-systems', flexSystem())).body.id;
  });

  it('records lots of each part; an expired one says so; a pigment lot needs no system', async () => {
    const a = await post('/v1/lots', { part: 'A', materialSystemId: systemId, lotNumber: 'A-2601', receivedOn: '2026-01-05', expiresOn: '2099-07-05' });
    expect(a.status).toBe(201);
    expect(a.body).toMatchObject({ part: 'A', lotNumber: 'A-2601', receivedOn: '2026-01-05', expiresOn: '2099-07-05', expired: false });
    const old = await post('/v1/lots', { part: 'B', materialSystemId: systemId, lotNumber: 'B-2401', receivedOn: '2024-01-05', expiresOn: '2024-07-05' });
    expect(old.body.expired).toBe(true);
    const pig = await post('/v1/lots', { part: 'pigment', lotNumber: 'P-BLK-7', receivedOn: '2026-01-05', expiresOn: '2028-01-05' });
    expect(pig.status).toBe(201);
    const list = await t.http.get('/v1/lots').set('authorization', auth.viewer).query({ filter: JSON.stringify({ materialSystemId: systemId }) });
    expect(list.body.map((l: { lotNumber: string }) => l.lotNumber).sort()).toEqual(['A-2601', 'B-2401']);
    const opened = await t.http.put(`/v1/lots/${a.body.id}`).set('authorization', auth.engineer).send({ part: 'A', materialSystemId: systemId, lotNumber: 'A-2601', receivedOn: '2026-01-05', expiresOn: '2099-07-05', openedOn: '2026-02-01' });
    expect(opened.body.openedOn).toBe('2026-02-01');
  });

  it('fits expected free-rise density by least squares over cup tests (three collinear points give their line exactly)', async () => {
    const cup = (a: unknown, b: unknown, density: number) =>
      post('/v1/qc-cup-tests', { materialSystemId: systemId, componentTemperatureA: a, componentTemperatureB: b, creamTime: { value: 12, unit: 's' }, topOfCupTime: { value: 75, unit: 's' }, tackFreeTime: { value: 3, unit: 'min' }, freeRiseDensity: { value: density, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' });
    // mean component temperatures 18, 22 and 26 °C (71.6 °F = 22 °C exactly)
    expect((await cup({ value: 17, unit: 'degC' }, { value: 19, unit: 'degC' }, 30.4)).status).toBe(201);
    const second = await cup({ value: 71.6, unit: 'degF' }, { value: 71.6, unit: 'degF' }, 29.2);
    expect(second.status).toBe(201);
    expect(second.body).toMatchObject({ creamTimeS: 12, topOfCupTimeS: 75, tackFreeTimeS: 180, freeRiseDensityKgM3: 29.2, materialSystemRevision: 1 });
    expect(second.body.componentTemperatureAC).toBeCloseTo(22, 12);
    expect((await cup({ value: 26, unit: 'degC' }, { value: 26, unit: 'degC' }, 28.0)).status).toBe(201);
    // a line is trusted from five cups over at least 4 °C (two more on the same line: 20 and 24 °C)
    expect((await cup({ value: 20, unit: 'degC' }, { value: 20, unit: 'degC' }, 29.8)).status).toBe(201);
    expect((await cup({ value: 24, unit: 'degC' }, { value: 24, unit: 'degC' }, 28.6)).status).toBe(201);
    const fit = await t.http.get(`/v1/material-systems/${systemId}/free-rise-fit`).set('authorization', auth.viewer);
    expect(fit.status).toBe(200);
    expect(fit.body.cupTests).toBe(5);
    expect(fit.body).toMatchObject({ trusted: true, notTrustedBecause: null });
    expect(fit.body.fit.slopeKgM3PerC).toBeCloseTo(-0.3, 9);
    expect(fit.body.fit.interceptKgM3).toBeCloseTo(35.8, 9);
    const preview = await t.http.post('/v1/targets/preview').set('authorization', auth.viewer).send({ system: { id: systemId }, freeRiseCup: { volume: { value: 1, unit: 'L' } }, options: { componentTemperature: { value: 20, unit: 'degC' } } });
    expect(preview.status).toBe(200);
    expect(preview.body.expectedFreeRiseDensity.method).toBe('cup_test_fit');
    expect(preview.body.expectedFreeRiseDensity.density.si.value).toBeCloseTo(35.8 - 0.3 * 20, 9);
  });

  it('a cream time after the top-of-cup time is refused (ASTM D7487 order of events)', async () => {
    const res = await post('/v1/qc-cup-tests', { materialSystemId: systemId, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, creamTime: { value: 90, unit: 's' }, topOfCupTime: { value: 60, unit: 's' }, freeRiseDensity: { value: 30, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' });
    expectProblem(res, 422, '/topOfCupTime/value');
  });
});

describe('lots qualified by cup test (issue 15, item 9; ASTM D7487 terms)', () => {
  // The system's window and band are invented test data; the density correction is the system's own
  // straight line (−0.3 kg/m³ per °C here).
  let systemId: string;
  let lotA: string;
  let lotB: string;
  beforeAll(async () => {
    const sys = await post('/v1/material-systems', flexSystem({
      freeRiseDensitySlope: { value: -0.3, unit: 'kg/m3/degC' },
      creamTimeWindow: { min: { value: 8, unit: 's' }, max: { value: 14, unit: 's' } },
      riseTimeWindow: { min: { value: 60, unit: 's' }, max: { value: 90, unit: 's' } },
      tackFreeTimeWindow: { min: { value: 2, unit: 'min' }, max: { value: 4, unit: 'min' } },
      freeRiseDensityBand: { min: { value: 38, unit: 'kg/m3' }, max: { value: 42, unit: 'kg/m3' } },
    }));
    expect(sys.status).toBe(201);
    expect(sys.body).toMatchObject({ creamTimeMinS: 8, creamTimeMaxS: 14, tackFreeTimeMaxS: 240, freeRiseDensityMinKgM3: 38 });
    systemId = sys.body.id;
    lotA = (await post('/v1/lots', { part: 'A', materialSystemId: systemId, lotNumber: `QA-${Date.now()}`, receivedOn: '2026-01-05', expiresOn: '2099-07-05' })).body.id;
    lotB = (await post('/v1/lots', { part: 'B', materialSystemId: systemId, lotNumber: `QB-${Date.now()}`, receivedOn: '2026-01-05', expiresOn: '2099-07-05' })).body.id;
  });
  const cup = (over: Record<string, unknown>) => post('/v1/qc-cup-tests', { materialSystemId: systemId, lotAId: lotA, lotBId: lotB, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, creamTime: { value: 11, unit: 's' }, topOfCupTime: { value: 75, unit: 's' }, tackFreeTime: { value: 3, unit: 'min' }, freeRiseDensity: { value: 40, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z', ...over });

  it('passes a cup inside the window, the density corrected to the reference temperature', async () => {
    // at 28 °C, 38.5 kg/m³ is 38.5 + 0.3 × 6 = 40.3 kg/m³ at 22 °C: inside 38–42
    const ok = await cup({ componentTemperatureA: { value: 28, unit: 'degC' }, componentTemperatureB: { value: 28, unit: 'degC' }, freeRiseDensity: { value: 38.5, unit: 'kg/m3' } });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ verdict: 'passed', findings: [] });
    expect(ok.body.freeRiseDensityAtReferenceKgM3).toBeCloseTo(40.3, 9);
    expect((await t.http.get(`/v1/lots/${lotA}`).set('authorization', auth.viewer)).body.hold).toBeNull();
  });

  it('a failed cup test holds its lots: no new batch until an engineer releases them (audited, with events)', async () => {
    const slow = await cup({ creamTime: { value: 16, unit: 's' }, freeRiseDensity: { value: 44, unit: 'kg/m3' } });
    expect(slow.status).toBe(201);
    expect(slow.body.verdict).toBe('failed');
    expect(slow.body.findings.map((f: { code: string }) => f.code)).toEqual(['CREAM_TIME_ABOVE_WINDOW', 'FREE_RISE_DENSITY_ABOVE_BAND']);
    expect(slow.body.findings[0].message).toMatch(/^Cream time 16 s is above the window of 8–14 s/);
    const lot = (await t.http.get(`/v1/lots/${lotA}`).set('authorization', auth.viewer)).body;
    expect(lot.hold).toMatchObject({ cupTestId: slow.body.id });
    const held = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } }, options: { lots: { A: lotA } } });
    expectProblem(held, 409, '/options/lots/A');
    expect(held.body.detail).toMatch(/on hold/);
    expectProblem(await t.http.post(`/v1/lots/${lotA}/release-hold`).set('authorization', auth.viewer).send({ note: 'x' }), 403);
    expectProblem(await t.http.post(`/v1/lots/${lotA}/release-hold`).set('authorization', auth.engineer).send({ note: '' }), 422, '/note');
    const released = await t.http.post(`/v1/lots/${lotA}/release-hold`).set('authorization', auth.engineer).send({ note: 'repeat cup at 22 °C passed; supplier confirmed the lot' });
    expect(released.status).toBe(200);
    expect(released.body.hold).toBeNull();
    expect(released.body.lastHoldRelease).toMatchObject({ note: 'repeat cup at 22 °C passed; supplier confirmed the lot' });
    expectProblem(await t.http.post(`/v1/lots/${lotA}/release-hold`).set('authorization', auth.engineer).send({ note: 'again' }), 409);
    const ok = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } }, options: { lots: { A: lotA } } });
    expect(ok.status).toBe(201);
    const events = await testDb()('events').where({ organization_id: org.id }).whereIn('type', ['lot.held', 'lot.hold_released']).orderBy('seq').select('type', 'subject_id');
    expect(events.filter((e) => e.subject_id === lotA).map((e) => e.type)).toEqual(['lot.held', 'lot.hold_released']);
    expect(events.filter((e) => e.subject_id === lotB).map((e) => e.type)).toEqual(['lot.held']);
    expect(await testDb()('audit_events').where({ organization_id: org.id, action: 'lot.hold_released', target_id: lotA }).first()).toBeTruthy();
  });
});

describe('bad input: 422 with a pointer, and nothing written', () => {
  let systemId: string;
  let otherSystemId: string;
  let lotB: string;
  beforeAll(async () => {
    systemId = (await post('/v1/material-systems', flexSystem())).body.id;
    otherSystemId = (await t.http.post('/v1/material-systems').set('authorization', otherAuth.engineer).send(flexSystem())).body.id;
    lotB = (await post('/v1/lots', { part: 'B', materialSystemId: systemId, lotNumber: 'BAD-B-1', receivedOn: '2026-01-05', expiresOn: '2026-07-05' })).body.id;
  });

  const cases: [string, string, () => Record<string, unknown>, string][] = [
    ['zero specific gravity', '/v1/material-systems', () => flexSystem({ specificGravityA: 0 }), '/specificGravityA'],
    ['negative ratio part', '/v1/material-systems', () => flexSystem({ ratio: { a: 100, b: -45 } }), '/ratio/b'],
    ['zero free-rise density', '/v1/material-systems', () => flexSystem({ freeRiseDensity: { value: 0, unit: 'kg/m3' } }), '/freeRiseDensity/value'],
    ['negative free-rise density in pcf', '/v1/material-systems', () => flexSystem({ freeRiseDensity: { value: -2, unit: 'pcf' } }), '/freeRiseDensity/value'],
    ['unknown density unit', '/v1/material-systems', () => flexSystem({ freeRiseDensity: { value: 40, unit: 'stone/acre' } }), '/freeRiseDensity/unit'],
    ['a mass unit for a temperature', '/v1/material-systems', () => flexSystem({ freeRiseReferenceTemperature: { value: 22, unit: 'kg' } }), '/freeRiseReferenceTemperature/unit'],
    ['a temperature below absolute zero', '/v1/material-systems', () => flexSystem({ freeRiseReferenceTemperature: { value: -500, unit: 'degF' } }), '/freeRiseReferenceTemperature/value'],
    ['a maximum pack factor that makes no physical sense', '/v1/material-systems', () => flexSystem({ maxPackFactor: 40 }), '/maxPackFactor'],
    ['a window upside down', '/v1/material-systems', () => flexSystem({ componentTemperatureWindow: { min: { value: 30, unit: 'degC' }, max: { value: 18, unit: 'degC' } } }), '/componentTemperatureWindow/max/value'],
    ['a tolerance of 0 %', '/v1/material-systems', () => flexSystem({ ratioTolerancePercent: 0 }), '/ratioTolerancePercent'],
    ['a zero-height box', '/v1/molds', () => boxMold({ cavity: { kind: 'box', length: { value: 300, unit: 'mm' }, width: { value: 200, unit: 'mm' }, height: { value: 0, unit: 'mm' } } }), '/cavity/height/value'],
    ['a negative entered volume', '/v1/molds', () => boxMold({ cavity: { kind: 'entered', volume: { value: -3, unit: 'L' } } }), '/cavity/volume/value'],
    ['an unknown length unit', '/v1/molds', () => boxMold({ cavity: { kind: 'box', length: { value: 3, unit: 'cubit' }, width: { value: 200, unit: 'mm' }, height: { value: 50, unit: 'mm' } } }), '/cavity/length/unit'],
    ['a box without its height', '/v1/molds', () => boxMold({ cavity: { kind: 'box', length: { value: 3, unit: 'in' }, width: { value: 2, unit: 'in' } } }), '/cavity/height'],
    ['a diameter on a box', '/v1/molds', () => boxMold({ cavity: { kind: 'box', length: { value: 3, unit: 'in' }, width: { value: 2, unit: 'in' }, height: { value: 2, unit: 'in' }, diameter: { value: 2, unit: 'in' } } }), '/cavity/diameter'],
    ['water too hot for the table', '/v1/molds', () => boxMold({ cavity: { kind: 'water_fill', waterMass: { value: 2, unit: 'kg' }, waterTemperature: { value: 80, unit: 'degC' } } }), '/cavity/waterTemperature/value'],
    ['inserts larger than the cavity', '/v1/molds', () => boxMold({ inserts: [{ kind: 'entered', volume: { value: 5, unit: 'L' } }] }), '/inserts'],
    ['a default pack factor that makes no physical sense', '/v1/molds', () => boxMold({ defaultPackFactor: 25 }), '/defaultPackFactor'],
    ['a negative default pack factor', '/v1/molds', () => boxMold({ defaultPackFactor: -1 }), '/defaultPackFactor'],
    ['zero cavities', '/v1/molds', () => boxMold({ cavities: 0 }), '/cavities'],
    ['a part A lot without a system', '/v1/lots', () => ({ part: 'A', lotNumber: 'X-1', receivedOn: '2026-01-05', expiresOn: '2026-07-05' }), '/materialSystemId'],
    ['a lot that expires before it arrives', '/v1/lots', () => ({ part: 'A', materialSystemId: systemId, lotNumber: 'X-2', receivedOn: '2026-01-05', expiresOn: '2025-07-05' }), '/expiresOn'],
    ['a lot of another organization’s system', '/v1/lots', () => ({ part: 'A', materialSystemId: otherSystemId, lotNumber: 'X-3', receivedOn: '2026-01-05', expiresOn: '2026-07-05' }), '/materialSystemId'],
    ['a cup test of another organization’s system', '/v1/qc-cup-tests', () => ({ materialSystemId: otherSystemId, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, freeRiseDensity: { value: 30, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' }), '/materialSystemId'],
    ['a cup test with a part B lot as its part A lot', '/v1/qc-cup-tests', () => ({ materialSystemId: systemId, lotAId: lotB, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, freeRiseDensity: { value: 30, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' }), '/lotAId'],
    // physical bounds (issue 15, item 5): each with its source in packages/batching/src/bounds.ts
    ['a specific gravity of 12 (liquid PU components are near 0.9–1.6, from memory)', '/v1/material-systems', () => flexSystem({ specificGravityA: 12 }), '/specificGravityA'],
    ['a ratio of 1e308:1', '/v1/material-systems', () => flexSystem({ ratio: { a: 1e308, b: 1 } }), '/ratio/a'],
    ['%NCO 48 with OH 5000 (index 7; glycerol, OH 1829, is about the highest polyol)', '/v1/material-systems', () => flexSystem({ ncoPercent: 48, hydroxylNumber: 5000 }), '/hydroxylNumber'],
    ['a free-rise density that rises with temperature', '/v1/material-systems', () => flexSystem({ freeRiseDensitySlope: { value: 15, unit: 'kg/m3/degC' } }), '/freeRiseDensitySlope/value'],
    ['a pbw tolerance on a volume ratio', '/v1/material-systems', () => flexSystem({ ratioBasis: 'volume', ratioTolerancePbw: 2 }), '/ratioTolerancePbw'],
    ['a cream-time window upside down', '/v1/material-systems', () => flexSystem({ creamTimeWindow: { min: { value: 20, unit: 's' }, max: { value: 10, unit: 's' } } }), '/creamTimeWindow/max/value'],
    ['a cup test with a zero density', '/v1/qc-cup-tests', () => ({ materialSystemId: systemId, componentTemperatureA: { value: 22, unit: 'degC' }, componentTemperatureB: { value: 22, unit: 'degC' }, freeRiseDensity: { value: 0, unit: 'kg/m3' }, testedAt: '2026-03-02T09:00:00Z' }), '/freeRiseDensity/value'],
  ];

  it.each(cases)('%s → 422 at the field', async (_label, path, body, pointer) => {
    const before = await shopCounts(org.id);
    const res = await post(path, body());
    expectProblem(res, 422, pointer);
    expect(res.body.type).toBe('/v1/problems/validation-failed');
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('a bad PUT leaves the system and its revisions as they were', async () => {
    const before = await shopCounts(org.id);
    const res = await t.http.put(`/v1/material-systems/${systemId}`).set('authorization', auth.engineer).send(flexSystem({ specificGravityB: -1 }));
    expectProblem(res, 422, '/specificGravityB');
    expect(await shopCounts(org.id)).toEqual(before);
    expect((await t.http.get(`/v1/material-systems/${systemId}`).set('authorization', auth.viewer)).body.revision).toBe(1);
  });
});

describe('roles and organizations', () => {
  let systemId: string;
  let moldId: string;
  beforeAll(async () => {
    systemId = (await post('/v1/material-systems', flexSystem())).body.id;
    moldId = (await post('/v1/molds', boxMold())).body.id;
  });

  it.each(['viewer', 'integrator', 'admin'] as const)('a %s reads shop data but cannot write it (403)', async (role) => {
    expect((await t.http.get(`/v1/material-systems/${systemId}`).set('authorization', auth[role])).status).toBe(200);
    expect((await t.http.get('/v1/molds').set('authorization', auth[role])).status).toBe(200);
    const before = await shopCounts(org.id);
    expectProblem(await post('/v1/material-systems', flexSystem(), role), 403);
    expectProblem(await post('/v1/molds', boxMold(), role), 403);
    expectProblem(await t.http.put(`/v1/molds/${moldId}`).set('authorization', auth[role]).send(boxMold()), 403);
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('a key scoped shop:read reads, and cannot write', async () => {
    expect((await t.http.get('/v1/material-systems').set('x-api-key', readKey)).status).toBe(200);
    expectProblem(await t.http.post('/v1/molds').set('x-api-key', readKey).send(boxMold()), 403);
  });

  it('another organization’s ids are 404, to read and to change', async () => {
    for (const path of [`/v1/material-systems/${systemId}`, `/v1/molds/${moldId}`, `/v1/material-systems/${systemId}/revisions`]) {
      expectProblem(await t.http.get(path).set('authorization', otherAuth.engineer), 404);
    }
    expectProblem(await t.http.put(`/v1/material-systems/${systemId}`).set('authorization', otherAuth.engineer).send(flexSystem()), 404);
    expectProblem(await t.http.put(`/v1/molds/${moldId}`).set('authorization', otherAuth.engineer).send(boxMold()), 404);
    const list = await t.http.get('/v1/material-systems').set('authorization', otherAuth.engineer).query({ filter: JSON.stringify({ id: [systemId] }) });
    expect(list.body).toEqual([]);
  });
});
