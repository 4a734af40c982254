import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem, flexSystem } from './support/shop.js';
import { seedControlDemo } from '../../seeds/control-demo.js';
import { schemaRegistry } from '../../api/src/common/schemas/schema-registry.js';

// Checks: limits x̄ ± 2.660·MR̄ and the moving-range limit 3.267·MR̄ (NIST/SEMATECH e-Handbook
// §6.3.2.2); a point beyond 3σ (Western Electric rule 1) and eight in a row on one side of the centre
// (rule 4), Western Electric Statistical Quality Control Handbook (1956). Temperatures are test data.

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
let systemId: string;
let probeId: string;
let scaleId: string;
let batchId: string;
let chartId: string;
let clock = Date.now() - 3600_000;

const as = (role: Role) => ({ authorization: auth[role] });

/** Part A temperatures posted in order (a device time a second apart), waited for until judged. */
async function temperatures(values: number[]): Promise<string[]> {
  const readings = values.map((v) => ({ batchId, deviceId: probeId, clientReadingId: randomUUID(), quantity: 'temperature', subject: 'part_a', value: v, unit: 'degC', deviceTime: new Date((clock += 1000)).toISOString() }));
  const res = await t.http.post('/v1/readings/bulk').set(as('engineer')).send({ readings });
  expect(res.status).toBe(202);
  const ids: string[] = res.body.items.map((i: { id: string }) => i.id);
  for (let i = 0; i < 200; i++) {
    const pending = await testDb()('readings').whereIn('id', ids).where('status', 'pending').count({ n: '*' });
    if (Number(pending[0]!.n) === 0) return ids;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`readings were never judged: ${t.logs.text().split('\n').filter((l) => /judg|rror/.test(l)).slice(-5).join('\n')}`);
}

const count = async (table: string) => Number((await testDb()(table).where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);

// 20 baseline temperatures around 22 °C (test data)
const BASELINE = [22.1, 21.9, 22.0, 22.2, 21.8, 22.1, 22.0, 21.9, 22.2, 22.0, 21.8, 22.1, 21.9, 22.0, 22.2, 21.9, 22.1, 22.0, 21.8, 22.0];
const mean = BASELINE.reduce((s, v) => s + v, 0) / BASELINE.length;
const mrBar = BASELINE.slice(1).reduce((s, v, i) => s + Math.abs(v - BASELINE[i]!), 0) / (BASELINE.length - 1);

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('control');
  auth = await tokensFor(t.http, org);
  const sys = await t.http.post('/v1/material-systems').set(as('engineer')).send(flexSystem({ ratio: { a: 100, b: 100 }, specificGravityA: 1.1, specificGravityB: 1.1 }));
  expect(sys.status).toBe(201);
  systemId = sys.body.id;
  [{ id: probeId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'thermometer', serial: `T-${randomUUID()}`, name: 'drum probe' }).returning('id');
  [{ id: scaleId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: 'bench scale', readability_kg: 0.001, capacity_kg: 5, calibration_due: '2099-01-01' }).returning('id');
  const b = await t.http.post('/v1/batches').set(as('engineer')).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(b.status).toBe(201);
  batchId = b.body.id;
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('charts', () => {
  it('refuses an unknown metric, a foreign system and a viewer, storing nothing', async () => {
    expectProblem(await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'moon_phase' }), 422, '/metric');
    expectProblem(await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: randomUUID(), metric: 'ratio_error_percent' }), 422, '/materialSystemId');
    expectProblem(await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'ratio_error_percent', rules: ['WE9'] }), 422);
    expect((await t.http.post('/v1/control/charts').set(as('viewer')).send({ materialSystemId: systemId, metric: 'ratio_error_percent' })).status).toBe(403);
    expect(await count('control_charts')).toBe(0);
  });

  it('shows trial limits computed in PostgreSQL from the points, and raises no signal on them', async () => {
    const res = await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'component_temperature_a_c', rules: ['WE1', 'WE4'], name: 'Drum A temperature' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ limitsKind: 'trial', baseline: null, rules: ['WE1', 'WE4'], unit: '°C' });
    chartId = res.body.id;
    await temperatures(BASELINE);
    const d = await t.http.get(`/v1/control/charts/${chartId}/data`).set(as('viewer'));
    expect(d.status).toBe(200);
    expect(d.body.limitsKind).toBe('trial');
    expect(d.body.warnings.join(' ')).toMatch(/trial/);
    expect(d.body.points).toHaveLength(20);
    expect(d.body.points.map((p: { value: number }) => p.value)).toEqual(BASELINE);
    expect(d.body.points[0].movingRange).toBeNull();
    expect(d.body.points[1].movingRange).toBeCloseTo(0.2, 9);
    expect(d.body.limits.centre).toBeCloseTo(mean, 9);
    expect(d.body.limits.mrBar).toBeCloseTo(mrBar, 9);
    expect(d.body.limits.ucl).toBeCloseTo(mean + 2.66 * mrBar, 9);
    expect(d.body.limits.lcl).toBeCloseTo(mean - 2.66 * mrBar, 9);
    expect(d.body.limits.mrUcl).toBeCloseTo(3.267 * mrBar, 9);
    expect(d.body.limits.sigma).toBeCloseTo(mrBar / 1.128, 9);
    expect(await count('control_signals')).toBe(0);
  });

  it('capability against the system’s component window (18–27 °C), with a warning under 30 points', async () => {
    const d = await t.http.get(`/v1/control/charts/${chartId}/data`).set(as('viewer'));
    const sigma = mrBar / 1.128;
    expect(d.body.specification).toEqual({ lsl: 18, usl: 27 });
    expect(d.body.capability.n).toBe(20);
    expect(d.body.capability.cp).toBeCloseTo(9 / (6 * sigma), 9);
    expect(d.body.capability.cpk).toBeCloseTo(Math.min(27 - mean, mean - 18) / (3 * sigma), 9);
    expect(d.body.capability.warnings.join(' ')).toMatch(/only 20 points/);
  });

  it('refuses a baseline with too few points or an empty period, changing nothing', async () => {
    expectProblem(await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ firstN: 10 }), 422, '/firstN');
    const now = new Date().toISOString();
    expectProblem(await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ from: now, to: now }), 422, '/to');
    expectProblem(await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ from: '2001-01-01T00:00:00Z', to: '2001-02-01T00:00:00Z' }), 422, '/from');
    expectProblem(await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({}), 422, '/firstN');
    expect((await testDb()('control_charts').where({ id: chartId }).first('baseline')).baseline).toBeNull();
  });

  it('freezes the first 20 points as the baseline (audited)', async () => {
    const res = await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ firstN: 20 });
    expect(res.status).toBe(200);
    expect(res.body.limitsKind).toBe('frozen');
    expect(res.body.baseline).toMatchObject({ method: 'first_n', n: 20 });
    expect(res.body.baseline.centre).toBeCloseTo(mean, 9);
    expect(res.body.baseline.ucl).toBeCloseTo(mean + 2.66 * mrBar, 9);
    expect(await testDb()('audit_events').where({ organization_id: org.id, action: 'control_chart.baseline_frozen', target_id: chartId }).first('id')).toBeTruthy();
  });
});

describe('signals', () => {
  let spikeReading: string;
  let spikeSignal: string;

  it('a point beyond 3σ raises a WE1 signal on that reading, with a drift.detected event', async () => {
    [spikeReading] = await temperatures([23.5]);
    const list = await t.http.get('/v1/control/signals').query({ filter: JSON.stringify({ chartId }) }).set(as('viewer'));
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(1);
    expect(list.body[0]).toMatchObject({ rule: 'WE1', readingId: spikeReading, batchId, value: 23.5, acknowledged: false, acknowledgement: null });
    spikeSignal = list.body[0].id;
    const ev = await testDb()('events').where({ organization_id: org.id, type: 'drift.detected', subject_id: spikeSignal }).first('payload');
    expect(ev.payload).toMatchObject({ signalId: spikeSignal, rule: 'WE1', readingId: spikeReading, metric: 'component_temperature_a_c' });
    // the payload is what schemas/event.drift.detected.schema.json promises webhook receivers
    expect(schemaRegistry().validate('event.drift.detected', ev.payload)).toEqual([]);
  });

  it('eight in a row above the centre raise WE4 on the eighth; a ninth raises nothing more', async () => {
    const ids = await temperatures([22.1, 22.2, 22.1, 22.15, 22.2, 22.1, 22.05]);
    const list = await t.http.get('/v1/control/signals').query({ filter: JSON.stringify({ chartId, rule: 'WE4' }) }).set(as('viewer'));
    expect(list.body).toHaveLength(1);
    expect(list.body[0].readingId).toBe(ids[6]);
    expect(list.body[0].points).toHaveLength(8);
    expect(list.body[0].points[0].readingId).toBe(spikeReading);
    await temperatures([22.1]);
    expect(await count('control_signals')).toBe(2);
    const d = await t.http.get(`/v1/control/charts/${chartId}/data`).set(as('viewer'));
    const marked = d.body.points.filter((p: { signals: unknown[] }) => p.signals.length > 0);
    expect(marked.map((p: { readingId: string }) => p.readingId).sort()).toEqual([spikeReading, ids[6]].sort());
  });

  it('acknowledges with a note (audited, drift.acknowledged event); without a note or twice is refused', async () => {
    expectProblem(await t.http.post(`/v1/control/signals/${spikeSignal}/acknowledge`).set(as('engineer')).send({ note: '   ' }), 422, '/note');
    expect((await t.http.post(`/v1/control/signals/${spikeSignal}/acknowledge`).set(as('viewer')).send({ note: 'x' })).status).toBe(403);
    const res = await t.http.post(`/v1/control/signals/${spikeSignal}/acknowledge`).set(as('engineer')).send({ note: 'Drum heater left on over lunch; switched off.' });
    expect(res.status).toBe(200);
    expect(res.body.acknowledged).toBe(true);
    expect(res.body.acknowledgement.note).toBe('Drum heater left on over lunch; switched off.');
    expect(await testDb()('audit_events').where({ organization_id: org.id, action: 'control_signal.acknowledged', target_id: spikeSignal }).first('id')).toBeTruthy();
    const acked = await testDb()('events').where({ organization_id: org.id, type: 'drift.acknowledged', subject_id: spikeSignal }).first('payload');
    expect(acked).toBeTruthy();
    expect(schemaRegistry().validate('event.drift.acknowledged', acked.payload)).toEqual([]);
    expectProblem(await t.http.post(`/v1/control/signals/${spikeSignal}/acknowledge`).set(as('engineer')).send({ note: 'again' }), 409);
    const open = await t.http.get('/v1/control/signals').query({ filter: JSON.stringify({ acknowledged: false }) }).set(as('viewer'));
    expect(open.body.map((s: { rule: string }) => s.rule)).toEqual(['WE4']);
  });

  it('exports the chart as CSV, one row per point', async () => {
    const res = await t.http.get(`/v1/control/charts/${chartId}/data.csv`).set(as('viewer'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const lines = res.text.trim().split(/\r\n/);
    expect(lines[0]).toBe('at,value,moving_range,centre,lcl,ucl,limits,signals,reading_id,batch_id');
    expect(lines).toHaveLength(1 + 29);
    expect(lines.filter((l) => l.includes(',WE1,')).length).toBe(1);
  });

  it('a bad chart query is a 400 problem', async () => {
    expectProblem(await t.http.get(`/v1/control/charts/${chartId}/data`).query({ limit: 'lots' }).set(as('viewer')), 400, '/limit');
    expectProblem(await t.http.get(`/v1/control/charts/${chartId}/data`).query({ from: '2026-02-01T00:00:00Z', to: '2026-01-01T00:00:00Z' }).set(as('viewer')), 400, '/to');
  });
});

describe('batch figures', () => {
  it('the ratio error of a batch is (A/B) / (A/B target) − 1 once both parts are weighed', async () => {
    const b = await t.http.post('/v1/batches').set(as('engineer')).send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
    const row = await testDb()('batches').where({ id: b.body.id }).first('targets');
    const ta = row.targets.targets.components.A.mass.value as number;
    const tb = row.targets.targets.components.B.mass.value as number;
    const post = (subject: string, value: number) => ({ batchId: b.body.id, deviceId: scaleId, clientReadingId: randomUUID(), quantity: 'mass', subject, value, unit: 'kg' });
    const res = await t.http.post('/v1/readings/bulk').set(as('engineer')).send({ readings: [post('part_a', ta), post('part_b', tb * 1.02)] });
    expect(res.status).toBe(202);
    let p: { value: number } | undefined;
    for (let i = 0; i < 100 && !p; i++) {
      await new Promise((r) => setTimeout(r, 100));
      const pending = Number((await testDb()('readings').where({ batch_id: b.body.id, status: 'pending' }).count({ n: '*' }))[0]!.n);
      if (pending === 0) p = await testDb()('control_points').where({ batch_id: b.body.id, metric: 'ratio_error_percent' }).first('value');
    }
    expect(p!.value).toBeCloseTo((1 / 1.02 - 1) * 100, 6);
    const shot = await testDb()('control_points').where({ batch_id: b.body.id, metric: 'shot_mass_error_percent' }).first('value');
    expect(shot.value).toBeCloseTo(((ta + tb * 1.02) / (ta + tb) - 1) * 100, 6);
  });
});

describe('demo seed', () => {
  it('seeds a drifting bench whose frozen chart shows the signals its rules raised; a second run adds nothing', async () => {
    const demo = await makeOrg('control-demo');
    const demoAuth = await tokensFor(t.http, demo);
    const sys = await t.http.post('/v1/material-systems').set('authorization', demoAuth.engineer).send(flexSystem({ name: 'Demo Flex 28' }));
    expect(sys.status).toBe(201);
    expect(await seedControlDemo(testDb(), demo.id)).toBeGreaterThan(40);
    expect(await seedControlDemo(testDb(), demo.id)).toBe(0);
    const [chart] = (await t.http.get('/v1/control/charts').set('authorization', demoAuth.viewer)).body;
    const d = await t.http.get(`/v1/control/charts/${chart.id}/data`).set('authorization', demoAuth.viewer);
    expect(d.body.limitsKind).toBe('frozen');
    expect(d.body.points).toHaveLength(40);
    const signals = (await t.http.get('/v1/control/signals').set('authorization', demoAuth.viewer)).body as { rule: string; value: number }[];
    expect(signals.length).toBeGreaterThan(0);
    // every signal is on a drifting point, after the 25 of the baseline
    const late = new Set(d.body.points.slice(25).flatMap((p: { signals: { id: string }[] }) => p.signals.map((x) => x.id)));
    expect(signals.every((s) => late.has((s as unknown as { id: string }).id))).toBe(true);
    expect(signals.some((s) => s.rule === 'WE1' && s.value > d.body.limits.ucl)).toBe(true);
  });
});
