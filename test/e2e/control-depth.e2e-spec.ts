import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import { Webhook } from 'standardwebhooks';
import type { Role } from '@pourgate/permissions';
import { startErpReceiver, type ErpReceiver } from '../../fakes/src/erp-receiver.js';
import { startSmtpCatcher, type SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { boxMold, expectProblem, flexSystem } from './support/shop.js';

// X̄–R with a batch's values as one subgroup: x̿ ± 3σ/√n with σ = R̄/d2, so for subgroups of three the
// limits are x̿ ± A2·R̄ with A2 = 1.023 and the range limit D4·R̄ with D4 = 2.574 (NIST/SEMATECH
// e-Handbook §6.3.2, the Shewhart table). A subgroup mean beyond 3σ is Western Electric rule 1
// (Western Electric Statistical Quality Control Handbook, 1956). Temperatures and densities are test data.

let t: TestApp;
let mail: SmtpCatcher;
let receiver: ErpReceiver;
const hook = { secret: '' };
let org: OrgFixture;
let auth: Record<Role, string>;
let systemId: string;
let probeId: string;
const quietEmail = `quiet-${randomUUID()}@drift.test`;
let clock = Date.now() - 3600_000;

const as = (role: Role) => ({ authorization: auth[role] });
const count = async (table: string, where: Record<string, unknown> = {}) =>
  Number(
    (
      await testDb()(table)
        .where({ organization_id: org.id, ...where })
        .count({ n: '*' })
    )[0]!.n,
  );

async function until<T>(fn: () => Promise<T | undefined | null | false>, ms = 20_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end)
      throw new Error(
        `condition not met in time: ${t.logs
          .text()
          .split('\n')
          .filter((l) => /rror|warn/i.test(l))
          .slice(-5)
          .join('\n')}`,
      );
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** A batch whose part A temperature is read once per value, all judged before it returns. */
async function batchWithTemperatures(values: number[]): Promise<string> {
  const b = await t.http
    .post('/v1/batches')
    .set(as('engineer'))
    .send({ materialSystemId: systemId, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(b.status).toBe(201);
  const readings = values.map((v) => ({
    batchId: b.body.id,
    deviceId: probeId,
    clientReadingId: randomUUID(),
    quantity: 'temperature',
    subject: 'part_a',
    value: v,
    unit: 'degC',
    deviceTime: new Date((clock += 1000)).toISOString(),
  }));
  const res = await t.http.post('/v1/readings/bulk').set(as('engineer')).send({ readings });
  expect(res.status).toBe(202);
  await until(async () => (await count('readings', { batch_id: b.body.id, status: 'pending' })) === 0);
  return b.body.id;
}

// twenty batches of three part A temperatures around 22 °C (test data)
const GROUPS = Array.from({ length: 20 }, (_, i) => [22 + ((i % 3) - 1) * 0.1, 22.1 + ((i % 2) - 0.5) * 0.2, 21.9 + ((i % 4) - 1.5) * 0.1]);
const means = GROUPS.map((g) => g.reduce((s, v) => s + v, 0) / g.length);
const ranges = GROUPS.map((g) => Math.max(...g) - Math.min(...g));
const xbarbar = means.reduce((s, v) => s + v, 0) / means.length;
const rBar = ranges.reduce((s, v) => s + v, 0) / ranges.length;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  receiver = await startErpReceiver({ secret: () => hook.secret });
  t = await startTestApp({
    PROCESS_ROLE: 'all',
    NOTIFICATIONS: 'on',
    SMTP_URL: mail.smtpUrl,
    WEBHOOK_ALLOWED_HOSTS: '127.0.0.1',
    WEBHOOK_RELAY_INTERVAL_MS: '50',
    NOTIFY_INTERVAL_MS: '50',
    PUBLIC_URL: 'http://127.0.0.1:3000',
  });
  org = await makeOrg('control-depth');
  auth = await tokensFor(t.http, org);
  await testDb()('users').insert({ organization_id: org.id, email: quietEmail, name: 'Quiet engineer', role: 'engineer', password_hash: 'x', notify_drift: 'off' });
  const sys = await t.http
    .post('/v1/material-systems')
    .set(as('engineer'))
    .send(flexSystem({ ratio: { a: 100, b: 100 }, specificGravityA: 1.1, specificGravityB: 1.1 }));
  expect(sys.status).toBe(201);
  systemId = sys.body.id;
  [{ id: probeId }] = await testDb()('devices')
    .insert({ organization_id: org.id, kind: 'thermometer', serial: `T-${randomUUID()}`, name: 'drum probe' })
    .returning('id');
  const ep = await t.http
    .post('/v1/webhook-endpoints')
    .set(as('integrator'))
    .send({ url: receiver.url, description: 'Quality system', eventTypes: ['drift.detected', 'drift.acknowledged'] });
  expect(ep.status).toBe(201);
  hook.secret = ep.body.secret;
}, 60_000);
afterAll(async () => {
  await t.close();
  await receiver.close();
  await mail.close();
  await closeTestDb();
});

describe('X̄–R charts: a batch’s values as one subgroup', () => {
  let chartId: string;

  it('the catalogue says which metrics can be drawn as X̄–R and which rules exist, from their sources', async () => {
    const res = await t.http.get('/v1/control/catalogue').set(as('viewer'));
    expect(res.status).toBe(200);
    const kinds = Object.fromEntries(res.body.metrics.map((m: { metric: string; kinds: string[] }) => [m.metric, m.kinds]));
    expect(kinds.ratio_error_percent).toEqual(['individuals']);
    expect(kinds.component_temperature_a_c).toEqual(['individuals', 'xbar_r']);
    expect(kinds.part_density_kg_m3).toEqual(['individuals', 'xbar_r']);
    expect(res.body.rules).toHaveLength(12);
    expect(res.body.rules.find((r: { rule: string }) => r.rule === 'N7')).toMatchObject({ source: 'Nelson', span: 15 });
    expect(res.body.defaultRules).toEqual(['WE1', 'WE2', 'WE3', 'WE4']);
  });

  it('refuses X̄–R for a metric a batch gives once, storing nothing', async () => {
    expectProblem(await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'ratio_error_percent', kind: 'xbar_r' }), 422, '/kind');
    expectProblem(await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'component_temperature_a_c', kind: 'pareto' }), 422, '/kind');
    expect(await count('control_charts')).toBe(0);
  });

  it('groups the points by batch in PostgreSQL, with trial limits x̿ ± A2·R̄ and D4·R̄ for subgroups of three', async () => {
    const res = await t.http
      .post('/v1/control/charts')
      .set(as('engineer'))
      .send({ materialSystemId: systemId, metric: 'component_temperature_a_c', kind: 'xbar_r', rules: ['WE1'], name: 'Drum A temperature by batch' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'xbar_r', limitsKind: 'trial', baseline: null });
    chartId = res.body.id;
    for (const g of GROUPS) await batchWithTemperatures(g);
    // a batch read once is no subgroup: left out, and said so
    await batchWithTemperatures([22.0]);
    const d = await t.http.get(`/v1/control/charts/${chartId}/data`).set(as('viewer'));
    expect(d.status).toBe(200);
    expect(d.body.subgroups).toHaveLength(20);
    expect(d.body.summary.subgroups).toBe(20);
    expect(d.body.warnings.join(' ')).toMatch(/1 batch left out/);
    expect(d.body.subgroups.map((g: { mean: number }) => g.mean).map((m: number) => m.toFixed(9))).toEqual(means.map((m) => m.toFixed(9)));
    expect(d.body.subgroups.every((g: { n: number }) => g.n === 3)).toBe(true);
    expect(d.body.limits.centre).toBeCloseTo(xbarbar, 9);
    expect(d.body.limits.subgroupSize).toBe(3);
    expect(d.body.limits.ucl).toBeCloseTo(xbarbar + 1.023 * rBar, 3);
    expect(d.body.limits.lcl).toBeCloseTo(xbarbar - 1.023 * rBar, 3);
    expect(d.body.limits.rBar).toBeCloseTo(rBar, 9);
    expect(d.body.subgroups[0].rUcl).toBeCloseTo(2.574 * rBar, 9);
    expect(d.body.limits.sigma).toBeCloseTo(rBar / 1.693, 9);
    expect(d.body.limits.mrBar).toBeNull();
    expect(await count('control_signals')).toBe(0);
  }, 120_000);

  it('freezes 20 subgroups; a batch running hot raises WE1 on its subgroup, an event and mail to the engineers who want it', async () => {
    expectProblem(await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ firstN: 21 }), 422, '/firstN');
    const res = await t.http.post(`/v1/control/charts/${chartId}/baseline`).set(as('engineer')).send({ firstN: 20 });
    expect(res.status).toBe(200);
    expect(res.body.baseline).toMatchObject({ method: 'first_n', n: 20, subgroupSize: 3, mrBar: null });
    expect(res.body.baseline.centre).toBeCloseTo(xbarbar, 9);
    const hot = await batchWithTemperatures([23.4, 23.6, 23.5]);
    const list = await t.http
      .get('/v1/control/signals')
      .query({ filter: JSON.stringify({ chartId }) })
      .set(as('viewer'));
    expect(list.body).toHaveLength(1);
    expect(list.body[0]).toMatchObject({ rule: 'WE1', batchId: hot, acknowledged: false });
    expect(list.body[0].value).toBeCloseTo(23.5, 9);

    const got = await receiver.waitFor((r) => r.event?.type === 'drift.detected', 20_000);
    expect(got.verified).toBe(true);
    expect(() => new Webhook(hook.secret).verify(got.rawBody, got.headers)).not.toThrow();
    expect(got.event?.data).toMatchObject({ signalId: list.body[0].id, chartId, rule: 'WE1', batchId: hot, metric: 'component_temperature_a_c' });

    const m = await mail.waitFor((x) => x.to.includes(org.people.engineer.email) && x.subject.startsWith('Drift on'), 20_000);
    expect(m.subject).toContain('Drum A temperature by batch');
    expect(m.text).toContain(`#/control?chart=${chartId}`);

    const ack = await t.http.post(`/v1/control/signals/${list.body[0].id}/acknowledge`).set(as('engineer')).send({ note: 'Drum left on the heater band.' });
    expect(ack.status).toBe(200);
    const acked = await receiver.waitFor((r) => r.event?.type === 'drift.acknowledged', 20_000);
    expect(acked.verified).toBe(true);
    expect(acked.event?.data).toMatchObject({ signalId: list.body[0].id, note: 'Drum left on the heater band.' });
    // the engineer who turned drift mail off, and the other roles, got none
    await until(async () => (await count('drift_notices', { status: 'sent' })) >= 1);
    const drift = mail.messages.filter((x) => x.subject.startsWith('Drift on'));
    expect(drift.filter((x) => x.to.includes(quietEmail) || x.to.includes(org.people.admin.email) || x.to.includes(org.people.viewer.email))).toEqual([]);
    expect(drift.filter((x) => x.to.includes(org.people.engineer.email))).toHaveLength(1);
  }, 60_000);
});

describe('cup-test free-rise density on a chart', () => {
  const post = (density: number) =>
    t.http
      .post('/v1/qc-cup-tests')
      .set(as('engineer'))
      .send({
        materialSystemId: systemId,
        componentTemperatureA: { value: 22, unit: 'degC' },
        componentTemperatureB: { value: 22, unit: 'degC' },
        freeRiseDensity: { value: density, unit: 'kg/m3' },
        testedAt: new Date((clock += 60_000)).toISOString(),
      });

  it('each recorded cup test is a point; a frozen chart raises WE1 on a cup far off, with no batch or reading', async () => {
    const c = await t.http
      .post('/v1/control/charts')
      .set(as('engineer'))
      .send({ materialSystemId: systemId, metric: 'free_rise_density_kg_m3', rules: ['WE1'] });
    expect(c.status).toBe(201);
    // 20 cups around 50 kg/m³ (test data)
    for (let i = 0; i < 20; i++) expect((await post(50 + ((i % 5) - 2) * 0.4)).status).toBe(201);
    const d = await t.http.get(`/v1/control/charts/${c.body.id}/data`).set(as('viewer'));
    expect(d.body.points).toHaveLength(20);
    expect(d.body.points.every((p: { cupTestId: string | null; batchId: string | null }) => p.cupTestId && p.batchId === null)).toBe(true);
    expect(d.body.subgroups).toBeNull();
    expect((await t.http.post(`/v1/control/charts/${c.body.id}/baseline`).set(as('engineer')).send({ firstN: 20 })).status).toBe(200);
    const off = await post(58);
    expect(off.status).toBe(201);
    const signals = (
      await t.http
        .get('/v1/control/signals')
        .query({ filter: JSON.stringify({ chartId: c.body.id }) })
        .set(as('viewer'))
    ).body;
    expect(signals).toHaveLength(1);
    expect(signals[0]).toMatchObject({ rule: 'WE1', value: 58, batchId: null, readingId: null });
    expect(await testDb()('control_points').where({ cup_test_id: off.body.id }).first('id')).toBeTruthy();
  });

  it('a refused cup test leaves no point', async () => {
    const before = await count('control_points', { metric: 'free_rise_density_kg_m3' });
    expectProblem(await post(-5), 422, '/freeRiseDensity/value');
    expect(await count('control_points', { metric: 'free_rise_density_kg_m3' })).toBe(before);
  });
});

describe('molded part density on a chart', () => {
  it('each recorded part is a point; the parts of one batch are one subgroup of an X̄–R chart', async () => {
    const c = await t.http.post('/v1/control/charts').set(as('engineer')).send({ materialSystemId: systemId, metric: 'part_density_kg_m3', kind: 'xbar_r' });
    expect(c.status).toBe(201);
    const mold = await t.http.post('/v1/molds').set(as('engineer')).send(boxMold({ cavities: 3 }));
    expect(mold.status).toBe(201);
    const b = await t.http.post('/v1/batches').set(as('engineer')).send({ materialSystemId: systemId, moldId: mold.body.id });
    expect(b.status).toBe(201);
    // a 3 L cavity (300 × 200 × 50 mm): 0.180, 0.186 and 0.174 kg are 60, 62 and 58 kg/m³ (density = mass ÷ volume)
    for (const [cavity, grams] of [[1, 180], [2, 186], [3, 174]] as const) {
      expect((await t.http.post(`/v1/batches/${b.body.id}/parts`).set(as('engineer')).send({ cavity, mass: { value: grams, unit: 'g' } })).status).toBe(201);
    }
    const d = await t.http.get(`/v1/control/charts/${c.body.id}/data`).set(as('viewer'));
    expect(d.status).toBe(200);
    expect(d.body.points.map((p: { value: number }) => p.value.toFixed(6))).toEqual(['60.000000', '62.000000', '58.000000']);
    expect(d.body.subgroups).toHaveLength(1);
    expect(d.body.subgroups[0]).toMatchObject({ batchId: b.body.id, n: 3 });
    expect(d.body.subgroups[0].mean).toBeCloseTo(60, 9);
    expect(d.body.subgroups[0].range).toBeCloseTo(4, 9);
  });
});

describe('drift mail on the profile', () => {
  it('an engineer turns drift mail off and on; the profile says which', async () => {
    const off = await t.http.patch('/v1/me').set(as('engineer')).send({ notifyDrift: 'off' });
    expect(off.status).toBe(200);
    expect(off.body.notifyDrift).toBe('off');
    expectProblem(await t.http.patch('/v1/me').set(as('engineer')).send({ notifyDrift: 'digest' }), 422, '/notifyDrift');
    expect((await t.http.patch('/v1/me').set(as('engineer')).send({ notifyDrift: 'each' })).body.notifyDrift).toBe('each');
  });
});
