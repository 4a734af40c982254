import { afterAll, beforeAll, describe, expect, it, jest } from '@jest/globals';
import { randomBytes, randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { sha256 } from '../../api/src/auth/tokens.service.js';
import { ReadingsIngestService } from '../../api/src/readings/readings-ingest.service.js';
import { ReadingsService } from '../../api/src/readings/readings.service.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem, flexSystem } from './support/shop.js';

// Checks: ±5 % ratio tolerance and "excess isocyanate side: harder; excess polyol side: softer and
// tackier" are common practice; components conditioned near 22 °C (window 18–27 °C here) likewise.
// 1 lb = 0.45359237 kg exactly (NIST SP 811).

let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let systemId: string;
let scaleId: string;
let probeId: string;
let deviceKey: string;

const as = (role: Role) => ({ authorization: auth[role] });

// a 50 L free-rise bucket at 40 kg/m³ is 2 kg of mix: 1 kg of A and 1 kg of B at 100:100
async function newBatch(a: Record<Role, string> = auth, sys = systemId): Promise<string> {
  const res = await t.http.post('/v1/batches').set('authorization', a.engineer).send({ materialSystemId: sys, freeRiseCup: { volume: { value: 50, unit: 'L' } } });
  expect(res.status).toBe(201);
  return res.body.id;
}

function reading(batchId: string, over: Record<string, unknown> = {}) {
  return { batchId, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'mass', subject: 'part_a', value: 1, unit: 'kg', stable: true, ...over };
}

async function judged(id: string): Promise<Record<string, any>> {
  for (let i = 0; i < 100; i++) {
    const res = await t.http.get(`/v1/readings/${id}`).set(as('viewer'));
    if (res.body.status !== 'pending') return res.body;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`reading ${id} was never judged`);
}

async function postJudged(body: Record<string, unknown>) {
  const res = await t.http.post('/v1/readings').set(as('engineer')).send(body);
  expect(res.status).toBe(202);
  return judged(res.body.id);
}

const batchState = async (id: string) => (await testDb()('batches').where({ id }).first('state')).state as string;
const readingCount = async (orgId = org.id) => Number((await testDb()('readings').where({ organization_id: orgId }).count({ n: '*' }))[0]!.n);

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('readings');
  other = await makeOrg('readings-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  // 100:100 by weight, B the isocyanate side, ±5 % on the ratio, ±10 % on each mass
  const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({ ratio: { a: 100, b: 100 }, specificGravityA: 1.1, specificGravityB: 1.1, massTolerancePercent: 10 }));
  expect(sys.status).toBe(201);
  systemId = sys.body.id;
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 5, calibration_due: '2099-01-01' }).returning('id');
  [{ id: probeId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'thermometer', serial: `T-${randomUUID()}`, name: 'drum probe' }).returning('id');
  deviceKey = `pgd_live_${randomBytes(32).toString('base64url')}`;
  await testDb()('api_keys').insert({ organization_id: org.id, name: 'scale key', kind: 'device', environment: 'live', scopes: ['readings:write'], prefix: deviceKey.slice(0, 16), secret_hash: sha256(deviceKey), device_id: scaleId });
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('ingest', () => {
  it('answers 202 with a status URL, moves the batch to weighing, and takes the device from a bound key', async () => {
    const batchId = await newBatch();
    const { deviceId: _drop, ...body } = reading(batchId, { value: 2, unit: 'lb' });
    const res = await t.http.post('/v1/readings').set('x-api-key', deviceKey).send(body);
    expect(res.status).toBe(202);
    expect(res.body).toMatchObject({ status: 'pending', statusUrl: `/v1/readings/${res.body.id}` });
    const r = await judged(res.body.id);
    expect(r.deviceId).toBe(scaleId);
    expect(r.valueSi).toBeCloseTo(2 * 0.45359237, 12);
    expect(r.status).toBe('accepted');
    expect(await batchState(batchId)).toBe('weighing');
    const events = await testDb()('events').where({ organization_id: org.id, subject_id: res.body.id }).select('type');
    expect(events.map((e) => e.type)).toEqual(['reading.accepted']);
  });

  it('stores one row for the same reading posted three times at once; the replays answer 200', async () => {
    const body = reading(await newBatch());
    const all = await Promise.all([1, 2, 3].map(() => t.http.post('/v1/readings').set(as('engineer')).send(body)));
    expect(all.map((r) => r.status).sort()).toEqual([200, 200, 202]);
    expect(new Set(all.map((r) => r.body.id)).size).toBe(1);
    expect(all.filter((r) => r.body.replayed).length).toBe(2);
    expect(Number((await testDb()('readings').where({ client_reading_id: body.clientReadingId }).count({ n: '*' }))[0]!.n)).toBe(1);
  });

  it('flags a device clock more than 5 minutes off', async () => {
    const batchId = await newBatch();
    const r = await postJudged(reading(batchId, { deviceTime: new Date(Date.now() - 10 * 60_000).toISOString() }));
    expect(r.clockSkewFlagged).toBe(true);
    expect(r.clockSkewSeconds).toBeGreaterThan(590);
    const ok = await postJudged(reading(batchId, { deviceTime: new Date().toISOString() }));
    expect(ok.clockSkewFlagged).toBe(false);
  });

  it('takes up to 1000 readings at once', async () => {
    const batchId = await newBatch();
    const res = await t.http.post('/v1/readings/bulk').set(as('engineer')).send({ readings: [reading(batchId, { quantity: 'temperature', subject: 'ambient', value: 21, unit: 'degC', deviceId: probeId }), reading(batchId, { quantity: 'humidity', subject: 'ambient', value: 45, unit: '%', deviceId: probeId })] });
    expect(res.status).toBe(202);
    expect(res.body.items).toHaveLength(2);
    for (const i of res.body.items) expect((await judged(i.id)).status).toBe('accepted');
  });
});

describe('refused input writes nothing', () => {
  let batchId: string;
  let foreignBatch: string;
  beforeAll(async () => {
    batchId = await newBatch();
    const sys = await t.http.post('/v1/material-systems').set('authorization', otherAuth.engineer).send(flexSystem());
    foreignBatch = await newBatch(otherAuth, sys.body.id);
  });
  const cases: [string, () => unknown, number, string][] = [
    ['a string for the value', () => reading(batchId, { value: '1.0' }), 422, '/value'],
    ['NaN spelled as a string', () => reading(batchId, { value: 'NaN' }), 422, '/value'],
    ['a number for the unit', () => reading(batchId, { unit: 5 }), 422, '/unit'],
    ['a negative mass', () => reading(batchId, { value: -0.2 }), 422, '/value'],
    ['an unknown unit', () => reading(batchId, { unit: 'stone-ish' }), 422, '/unit'],
    ['an unknown quantity', () => reading(batchId, { quantity: 'pressure' }), 422, '/quantity'],
    ['an unknown batch', () => reading(randomUUID()), 422, '/batchId'],
    ["another organization's batch", () => reading(foreignBatch), 422, '/batchId'],
    ['no device for a person', () => reading(batchId, { deviceId: undefined }), 422, '/deviceId'],
    ['1001 readings', () => ({ readings: Array.from({ length: 1001 }, () => reading(batchId)) }), 422, '/readings'],
    ['one bad item among good ones', () => ({ readings: [reading(batchId), reading(batchId, { unit: 'furlong' })] }), 422, '/readings/1/unit'],
  ];
  it.each(cases)('%s', async (_label, body, status, pointer) => {
    const before = await readingCount();
    const b = body() as Record<string, unknown>;
    const path = 'readings' in b ? '/v1/readings/bulk' : '/v1/readings';
    expectProblem(await t.http.post(path).set(as('engineer')).send(b), status, pointer);
    expect(await readingCount()).toBe(before);
  });
  it('refuses a viewer (403) and writes nothing', async () => {
    const before = await readingCount();
    expectProblem(await t.http.post('/v1/readings').set(as('viewer')).send(reading(batchId)), 403);
    expect(await readingCount()).toBe(before);
  });
});

describe('judging', () => {
  it.each([
    ['A heavy by exactly 5.0 % passes', 'part_a', 1.05, 'accepted', null],
    ['A heavy by 5.1 % is rejected, polyol side named (softer and tackier)', 'part_a', 1.051, 'rejected', /^Part A \(the polyol side\) is heavy by 5\.1 %, outside ±5 %: .*softer and tackier/],
    ['B heavy by exactly 5.0 % passes', 'part_b', 1.05, 'accepted', null],
    ['B heavy by 5.1 % is rejected, isocyanate side named (firmer, for a flexible foam)', 'part_b', 1.051, 'rejected', /^Part B \(the isocyanate side\) is heavy by 5\.1 %, outside ±5 %: .*firmer and harsher/],
  ] as const)('%s', async (_label, heavy, heavyMass, status, message) => {
    const batchId = await newBatch();
    const light = heavy === 'part_a' ? 'part_b' : 'part_a';
    // e = (m_A/m_B) ÷ (target m_A/m_B) − 1 against 100:100, the light part weighed first at 1 kg.
    // A heavy: m_A = 1.05 gives e = +5.0 %. B heavy: e = −5.0 % needs m_B = 1 / 0.95 (so m_A/m_B = 0.95).
    expect((await postJudged(reading(batchId, { subject: light, value: 1 }))).status).toBe('accepted');
    const mass = heavy === 'part_a' ? heavyMass : 1 / (2 - heavyMass);
    const r = await postJudged(reading(batchId, { subject: heavy, value: mass }));
    expect(r.status).toBe(status);
    if (message) {
      expect(r.reasons[0]).toMatchObject({ code: heavy === 'part_a' ? 'RATIO_POLYOL_HEAVY' : 'RATIO_ISOCYANATE_HEAVY', unit: '%' });
      expect(Math.abs(r.reasons[0].measured)).toBeCloseTo(5.1, 6);
      expect(r.reasons[0].message).toMatch(message);
      expect(await batchState(batchId)).toBe('on_hold');
    } else {
      expect(await batchState(batchId)).toBe('weighing');
    }
  });

  it('judges a component temperature just inside and just outside the window (18–27 °C)', async () => {
    const batchId = await newBatch();
    const inside = await postJudged(reading(batchId, { deviceId: probeId, quantity: 'temperature', subject: 'part_a', value: 80.6, unit: 'degF' })); // 27.0 °C
    expect(inside.status).toBe('accepted');
    const outside = await postJudged(reading(batchId, { deviceId: probeId, quantity: 'temperature', subject: 'part_b', value: 27.1, unit: 'degC' }));
    expect(outside.status).toBe('rejected');
    expect(outside.reasons[0]).toMatchObject({ code: 'TEMPERATURE_ABOVE_WINDOW', measured: 27.1, limit: 27, unit: 'degC' });
    const cold = await postJudged(reading(batchId, { deviceId: probeId, quantity: 'temperature', subject: 'part_a', value: 17.9, unit: 'degC' }));
    expect(cold.reasons[0]).toMatchObject({ code: 'TEMPERATURE_BELOW_WINDOW', limit: 18 });
  });

  it('sets aside an unstable reading and rejects one over the scale capacity', async () => {
    const batchId = await newBatch();
    const shaky = await postJudged(reading(batchId, { stable: false }));
    expect(shaky.status).toBe('unused');
    expect(shaky.reasons[0].code).toBe('SCALE_NOT_STABLE');
    const heavy = await postJudged(reading(batchId, { value: 5.001 }));
    expect(heavy.reasons).toHaveLength(1);
    expect(heavy.status).toBe('rejected');
    expect(heavy.reasons[0]).toMatchObject({ code: 'OVER_CAPACITY', measured: 5.001, limit: 5, unit: 'kg' });
  });

  it('rejects a reading from a scale past its calibration date', async () => {
    const [{ id }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'old scale', capacity_kg: 5, calibration_due: '2020-01-01' }).returning('id');
    const r = await postJudged(reading(await newBatch(), { deviceId: id }));
    expect(r.status).toBe('rejected');
    expect(r.reasons.map((x: { code: string }) => x.code)).toContain('CALIBRATION_OVERDUE');
  });
});

describe('judging: mold, shop air, humidity, the mixed shot and timing', () => {
  // TDS-style windows: mold 40–50 °C, shop air 18–30 °C, at most 70 % RH (values from memory, typical of
  // supplier sheets); pot life 90 s and demold 12 min come from flexSystem. 104 °F = 40 °C exactly.
  let floorSystemId: string;
  beforeAll(async () => {
    const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({
      moldTemperatureWindow: { min: { value: 40, unit: 'degC' }, max: { value: 50, unit: 'degC' } },
      ambientTemperatureWindow: { min: { value: 18, unit: 'degC' }, max: { value: 30, unit: 'degC' } },
      maxRelativeHumidity: 70,
    }));
    expect(sys.status).toBe(201);
    floorSystemId = sys.body.id;
  });
  const probe = (batchId: string, over: Record<string, unknown>) => reading(batchId, { deviceId: probeId, quantity: 'temperature', unit: 'degC', ...over });
  const milestone = (batchId: string, subject: string, at: Date) => ({ batchId, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'milestone', subject, deviceTime: at.toISOString() });

  it('judges the mold in °F and °C and the shop air against their own windows', async () => {
    const batchId = await newBatch(auth, floorSystemId);
    expect((await postJudged(probe(batchId, { subject: 'mold', value: 104, unit: 'degF' }))).status).toBe('accepted');
    const cold = await postJudged(probe(batchId, { subject: 'mold', value: 103.8, unit: 'degF' }));
    expect(cold.reasons[0]).toMatchObject({ code: 'MOLD_TEMPERATURE_BELOW_WINDOW', limit: 40, unit: 'degC' });
    expect((await postJudged(probe(batchId, { subject: 'mold', value: 50.2 }))).reasons[0].code).toBe('MOLD_TEMPERATURE_ABOVE_WINDOW');
    expect((await postJudged(probe(batchId, { subject: 'ambient', value: 30 }))).status).toBe('accepted');
    expect((await postJudged(probe(batchId, { subject: 'ambient', value: 31 }))).reasons[0].code).toBe('AMBIENT_TEMPERATURE_ABOVE_WINDOW');
  });

  it('rejects humidity over the limit and accepts it at the limit', async () => {
    const batchId = await newBatch(auth, floorSystemId);
    expect((await postJudged(probe(batchId, { quantity: 'humidity', subject: 'ambient', value: 70, unit: '%RH' }))).status).toBe('accepted');
    const damp = await postJudged(probe(batchId, { quantity: 'humidity', subject: 'ambient', value: 71, unit: '%' }));
    expect(damp.reasons[0]).toMatchObject({ code: 'HUMIDITY_ABOVE_LIMIT', measured: 71, limit: 70, unit: '%' });
    expect(await batchState(batchId)).toBe('on_hold');
  });

  it('judges the mixed shot against the batch total', async () => {
    const batchId = await newBatch(auth, floorSystemId);
    const total = Number((await testDb()('batches').where({ id: batchId }).first('total_mass_kg')).total_mass_kg);
    await postJudged(reading(batchId, { subject: 'part_a', value: total / 2 }));
    await postJudged(reading(batchId, { subject: 'part_b', value: total / 2 }));
    expect((await postJudged(reading(batchId, { subject: 'mixed', value: total * 0.97 }))).status).toBe('accepted');
    const short = await postJudged(reading(batchId, { subject: 'mixed', value: total * 0.9 }));
    expect(short.reasons[0]).toMatchObject({ code: 'TOTAL_MASS_LOW', unit: 'kg' });
    expect(short.reasons[0].limit).toBeCloseTo(total * 0.95, 6);
  });

  it('times the pot life from mix start to pour and the demold from pour, moving the batch to mixed and curing', async () => {
    const onTime = await newBatch(auth, floorSystemId);
    const t0 = new Date(Date.now() - 30 * 60_000);
    const mix = await postJudged(milestone(onTime, 'mix_start', t0));
    expect(mix).toMatchObject({ status: 'accepted', quantity: 'milestone', unitSi: 's' });
    expect(await batchState(onTime)).toBe('mixed');
    const pour = await postJudged(milestone(onTime, 'pour', new Date(t0.getTime() + 90_000)));
    expect(pour).toMatchObject({ status: 'accepted', valueSi: 90 });
    expect(await batchState(onTime)).toBe('curing');
    const early = await postJudged(milestone(onTime, 'demold', new Date(t0.getTime() + 90_000 + 11 * 60_000)));
    expect(early.reasons[0]).toMatchObject({ code: 'DEMOLDED_EARLY', measured: 660, limit: 720, unit: 's' });
    expect(await batchState(onTime)).toBe('on_hold');

    const late = await newBatch(auth, floorSystemId);
    await postJudged(milestone(late, 'mix_start', t0));
    const overrun = await postJudged(milestone(late, 'pour', new Date(t0.getTime() + 95_000)));
    expect(overrun.reasons[0]).toMatchObject({ code: 'POT_LIFE_EXCEEDED', measured: 95, limit: 90, unit: 's' });
  });

  it('refuses a milestone with a value and a mass of a milestone subject, writing nothing', async () => {
    const batchId = await newBatch(auth, floorSystemId);
    const before = await readingCount();
    const withValue = await t.http.post('/v1/readings').set(as('engineer')).send({ ...milestone(batchId, 'pour', new Date()), value: 1, unit: 's' });
    expectProblem(withValue, 422, '/value');
    const massPour = await t.http.post('/v1/readings').set(as('engineer')).send(reading(batchId, { subject: 'pour' }));
    expectProblem(massPour, 422, '/subject');
    expect(await readingCount()).toBe(before);
  });
});

describe('review', () => {
  async function rejectedBatch() {
    const batchId = await newBatch();
    const r = await postJudged(reading(batchId, { value: 5.5 }));
    expect(r.status).toBe('rejected');
    return { batchId, readingId: r.id as string };
  }

  it('lists the review queue by status and reason code', async () => {
    const { readingId } = await rejectedBatch();
    const res = await t.http.get('/v1/readings').query({ filter: JSON.stringify({ status: 'rejected', reasonCode: 'OVER_CAPACITY' }) }).set(as('viewer'));
    expect(res.status).toBe(200);
    expect(res.headers['content-range']).toMatch(/^readings \d+-\d+\/\d+$/);
    expect(res.body.map((r: { id: string }) => r.id)).toContain(readingId);
    expect(res.body.every((r: { status: string }) => r.status === 'rejected')).toBe(true);
  });

  it('lists only the rejections still waiting for a decision with reviewed: false', async () => {
    const open = await rejectedBatch();
    const decided = await rejectedBatch();
    expect((await t.http.post(`/v1/readings/${decided.readingId}/review`).set(as('engineer')).send({ decision: 'uphold' })).status).toBe(200);
    const list = async (batchId: string, reviewed: boolean) => (await t.http.get('/v1/readings').query({ filter: JSON.stringify({ status: 'rejected', batchId, reviewed }) }).set(as('viewer'))).body.map((r: { id: string }) => r.id);
    expect(await list(open.batchId, false)).toEqual([open.readingId]);
    expect(await list(decided.batchId, false)).toEqual([]);
    expect(await list(decided.batchId, true)).toEqual([decided.readingId]);
    expectProblem(await t.http.get('/v1/readings').query({ filter: JSON.stringify({ reviewed: 'no' }) }).set(as('viewer')), 400, '/filter/reviewed');
  });

  it('a waiver needs a note; once every rejection is waived and A and B are weighed the batch can be released', async () => {
    const { batchId, readingId } = await rejectedBatch();
    expect(await batchState(batchId)).toBe('on_hold');
    // weighed again by hand, within their bands
    expect((await postJudged(reading(batchId, { subject: 'part_a', value: 1 }))).status).toBe('accepted');
    expect((await postJudged(reading(batchId, { subject: 'part_b', value: 1 }))).status).toBe('accepted');
    expectProblem(await t.http.post(`/v1/batches/${batchId}/release`).set(as('engineer')), 409);
    expectProblem(await t.http.post(`/v1/readings/${readingId}/review`).set(as('engineer')).send({ decision: 'waive' }), 422, '/note');
    expectProblem(await t.http.post(`/v1/readings/${readingId}/review`).set(as('viewer')).send({ decision: 'waive', note: 'x' }), 403);
    const w = await t.http.post(`/v1/readings/${readingId}/review`).set(as('engineer')).send({ decision: 'waive', note: 'tare was wrong; re-weighed by hand' });
    expect(w.status).toBe(200);
    expect(w.body.review).toMatchObject({ decision: 'waive', note: 'tare was wrong; re-weighed by hand' });
    expectProblem(await t.http.post(`/v1/readings/${readingId}/review`).set(as('engineer')).send({ decision: 'uphold' }), 409);
    const rel = await t.http.post(`/v1/batches/${batchId}/release`).set(as('engineer'));
    expect(rel.status).toBe(200);
    expect(rel.body.state).toBe('released');
    const types = (await testDb()('events').where({ organization_id: org.id }).whereIn('subject_id', [batchId, readingId]).orderBy('seq').select('type')).map((e) => e.type);
    expect(types).toEqual(expect.arrayContaining(['reading.rejected', 'reading.waived', 'batch.on_hold', 'batch.released']));
    expect(await testDb()('audit_events').where({ organization_id: org.id, action: 'reading.waived', target_id: readingId }).first()).toBeTruthy();
  });

  it('uphold keeps the batch on hold, or scraps it with scrap: true', async () => {
    const held = await rejectedBatch();
    const u = await t.http.post(`/v1/readings/${held.readingId}/review`).set(as('engineer')).send({ decision: 'uphold', note: 'confirmed' });
    expect(u.status).toBe(200);
    expect(await batchState(held.batchId)).toBe('on_hold');
    expectProblem(await t.http.post(`/v1/batches/${held.batchId}/release`).set(as('engineer')), 409);
    const scrapped = await rejectedBatch();
    await t.http.post(`/v1/readings/${scrapped.readingId}/review`).set(as('engineer')).send({ decision: 'uphold', scrap: true });
    expect(await batchState(scrapped.batchId)).toBe('scrapped');
    const events = await testDb()('events').where({ subject_id: scrapped.batchId, type: 'batch.scrapped' });
    expect(events).toHaveLength(1);
  });

  it("does not show another organization's reading", async () => {
    const { readingId } = await rejectedBatch();
    expectProblem(await t.http.get(`/v1/readings/${readingId}`).set('authorization', otherAuth.viewer), 404);
  });
});

describe('judging the whole pour (issue 15)', () => {
  it('1. rejects both parts 30 % short even though their ratio holds: a short shot, its own reason per part', async () => {
    const batchId = await newBatch();
    const a = await postJudged(reading(batchId, { subject: 'part_a', value: 700, unit: 'g' }));
    expect(a.status).toBe('rejected');
    expect(a.reasons.map((r: { code: string }) => r.code)).toEqual(['SHORT_SHOT']);
    expect(a.reasons[0]).toMatchObject({ measured: 0.7, unit: 'kg', facts: { part: 'A', target: 1 } });
    const b = await postJudged(reading(batchId, { subject: 'part_b', value: 700, unit: 'g' }));
    // in ratio (no RATIO_ reason) but short
    expect(b.reasons.map((r: { code: string }) => r.code)).toEqual(['SHORT_SHOT']);
    expect(b.reasons[0].message).toMatch(/^Short shot: part B is 700 g, 30 % under its target of 1 kg/);
    expect(await batchState(batchId)).toBe('on_hold');
  });

  it('1. rejects a part just outside its own band (±10 %) with the limit in kg, and a zero part as not weighed', async () => {
    const batchId = await newBatch();
    expect((await postJudged(reading(batchId, { subject: 'part_a', value: 1.1 }))).status).toBe('accepted');
    const over = await postJudged(reading(batchId, { subject: 'part_a', value: 1.101 }));
    expect(over.reasons[0]).toMatchObject({ code: 'PART_A_MASS_HIGH', measured: 1.101, limit: 1.1, unit: 'kg' });
    const zero = await postJudged(reading(batchId, { subject: 'part_b', value: 0 }));
    expect(zero.reasons.map((r: { code: string }) => r.code)).toEqual(['PART_NOT_WEIGHED']);
    // the ratio is not judged against a zero part
    const later = await postJudged(reading(await newBatch(), { subject: 'part_a', value: 1 }));
    expect(later.status).toBe('accepted');
  });

  it('8. writes reasons in the reader’s unit system (an imperial user reads °F), rounded', async () => {
    const batchId = await newBatch();
    const cold = await postJudged(reading(batchId, { deviceId: probeId, quantity: 'temperature', subject: 'part_a', value: 15.5555555555556, unit: 'degC' }));
    expect(cold.reasons[0].message).toMatch(/^The component at 15\.6 °C is below the window of 18–27 °C/);
    await testDb()('users').where({ id: org.people.viewer.id }).update({ unit_system: 'imperial' });
    try {
      const seen = (await t.http.get(`/v1/readings/${cold.id}`).set(as('viewer'))).body;
      // °F = °C × 9/5 + 32 (NIST SP 811): 15.56 °C is 60 °F, 18–27 °C is 64.4–80.6 °F
      expect(seen.reasons[0].message).toMatch(/^The component at 60 °F is below the window of 64\.4–80\.6 °F/);
      expect(seen.reasons[0].code).toBe('TEMPERATURE_BELOW_WINDOW');
    } finally {
      await testDb()('users').where({ id: org.people.viewer.id }).update({ unit_system: 'metric' });
    }
  });
});

describe('complete before release (issue 15, item 2)', () => {
  it('refuses to release a batch with part B or the pigment missing, listing what is missing, and releases it once complete', async () => {
    const pigmented = await t.http.post('/v1/batches').set(as('engineer')).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 50, unit: 'L' } }, options: { pigmentPercent: 2 } });
    expect(pigmented.status).toBe(201);
    const batchId = pigmented.body.id as string;
    const targets = (await t.http.get(`/v1/batches/${batchId}/targets`).set(as('viewer'))).body;
    const kg = (c: 'A' | 'B' | 'pigment') => targets.components[c].mass.si.value as number;
    expect((await postJudged(reading(batchId, { subject: 'part_a', value: kg('A') }))).status).toBe('accepted');
    const check = await t.http.get(`/v1/batches/${batchId}/release-check`).set(as('viewer'));
    expect(check.status).toBe(200);
    expect(check.body).toMatchObject({ ready: false, required: ['part_a', 'part_b', 'pigment'], openRejections: 0 });
    expect(check.body.missing.map((m: { item: string; problem: string }) => `${m.item}:${m.problem}`)).toEqual(['part_b:not_recorded', 'pigment:not_recorded']);
    const refused = await t.http.post(`/v1/batches/${batchId}/release`).set(as('engineer'));
    expectProblem(refused, 409, '/missing/part_b');
    expect(refused.body.errors.map((e: { pointer: string }) => e.pointer)).toEqual(['/missing/part_b', '/missing/pigment']);
    expect(await batchState(batchId)).toBe('weighing');
    expect((await postJudged(reading(batchId, { subject: 'part_b', value: kg('B') }))).status).toBe('accepted');
    expect((await postJudged(reading(batchId, { subject: 'pigment', value: kg('pigment') }))).status).toBe('accepted');
    expect((await t.http.get(`/v1/batches/${batchId}/release-check`).set(as('viewer'))).body).toMatchObject({ ready: true, missing: [] });
    const released = await t.http.post(`/v1/batches/${batchId}/release`).set(as('engineer'));
    expect(released.status).toBe(200);
    expect(released.body.state).toBe('released');
  });

  it('asks for the milestones and temperatures the system requires', async () => {
    const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({ ratio: { a: 100, b: 100 }, specificGravityA: 1.1, specificGravityB: 1.1, releaseRequires: ['component_temperature', 'mix_start'] }));
    expect(sys.status).toBe(201);
    expect(sys.body.releaseRequires).toEqual(['component_temperature', 'mix_start']);
    const batchId = await newBatch(auth, sys.body.id);
    await postJudged(reading(batchId, { subject: 'part_a', value: 1 }));
    await postJudged(reading(batchId, { subject: 'part_b', value: 1 }));
    const check = (await t.http.get(`/v1/batches/${batchId}/release-check`).set(as('viewer'))).body;
    expect(check.missing.map((m: { item: string }) => m.item)).toEqual(['component_temperature', 'mix_start']);
    await postJudged(reading(batchId, { deviceId: probeId, quantity: 'temperature', subject: 'part_b', value: 22, unit: 'degC' }));
    await postJudged({ batchId, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'milestone', subject: 'mix_start' });
    expect((await t.http.post(`/v1/batches/${batchId}/release`).set(as('engineer'))).status).toBe(200);
  });
});

describe('the sweeper', () => {
  it('re-queues a long outage’s pending readings in one pass, page after page, none left behind', async () => {
    const batchId = await newBatch();
    const receivedAt = new Date(Date.now() - 60_000);
    // more than two pages of readings stored while Redis was away (pending, no job)
    const rows = Array.from({ length: 1_100 }, (_, i) => ({ organization_id: org.id, batch_id: batchId, device_id: scaleId, client_reading_id: `outage-${randomUUID()}`, quantity: 'mass', subject: 'part_a', value_si: 1, unit_given: 'kg', value_given: 1, stable: true, received_at: new Date(receivedAt.getTime() + (i % 7)) }));
    const ids: string[] = (await testDb()('readings').insert(rows).returning('id')).map((r: { id: string }) => r.id);
    const ingest = t.app.get(ReadingsIngestService);
    const queued: string[] = [];
    const spy = jest.spyOn(ingest, 'enqueue').mockImplementation(async (id: string) => { queued.push(id); return true; });
    try {
      const n = await t.app.get(ReadingsService).sweep(5_000);
      expect(n).toBeGreaterThanOrEqual(ids.length);
      const seen = new Set(queued);
      expect(ids.filter((id) => !seen.has(id))).toEqual([]);
    } finally {
      spy.mockRestore();
      await testDb()('readings').whereIn('id', ids).where({ status: 'pending' }).delete();
    }
  });
});
