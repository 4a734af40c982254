import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { seedShopDemo } from '../../seeds/shop-demo.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { shopCounts } from './support/shop.js';

let t: TestApp;
let org: OrgFixture;
let engineer: string;

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('demo-data');
  engineer = (await tokensFor(t.http, org)).engineer;
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('the shop demo seed', () => {
  it('adds the scenario once; running it again adds nothing', async () => {
    const first = await seedShopDemo(testDb(), org.id);
    expect(first).toBeGreaterThan(15);
    const counts = await shopCounts(org.id);
    expect(counts).toMatchObject({ material_systems: 3, molds: 3, lots: 8, qc_cup_tests: 6, work_orders: 2, batches: 3, batch_state_transitions: 5 });
    expect(await seedShopDemo(testDb(), org.id)).toBe(0);
    expect(await shopCounts(org.id)).toEqual(counts);
  });

  it('its rows read back through the API like any others, with one lot past its date', async () => {
    const systems = await t.http.get('/v1/material-systems').set('authorization', engineer);
    expect(systems.body.map((s: { kind: string }) => s.kind).sort()).toEqual(['flexible', 'flexible', 'integral-skin']);
    const lots = await t.http.get('/v1/lots').set('authorization', engineer);
    expect(lots.body.filter((l: { expired: boolean }) => l.expired)).toHaveLength(1);
    const batches = await t.http.get('/v1/batches').set('authorization', engineer);
    expect(batches.body).toHaveLength(3);
    for (const b of batches.body) {
      const targets = await t.http.get(`/v1/batches/${b.id}/targets`).set('authorization', engineer).query({ units: 'metric' });
      expect(targets.status).toBe(200);
      expect(targets.body.totalMass.si.value).toBeCloseTo(b.summary.totalMassKg, 12);
      expect(targets.body.warnings).toEqual([]);
    }
    const fit = await t.http.get(`/v1/material-systems/${systems.body.find((s: { name: string }) => s.name === 'Demo Flex 28').id}/free-rise-fit`).set('authorization', engineer);
    // warmer components rise lighter: the fitted slope is negative (common practice)
    expect(fit.body.fit.slopeKgM3PerC).toBeLessThan(0);
  });

  it('shows a short-shot rejection and a lot held by a failed cup test (issue 15)', async () => {
    const batches = (await t.http.get('/v1/batches').set('authorization', engineer)).body as { id: string; state: string; notes: string }[];
    const short = batches.find((b) => b.notes.includes('short shot'))!;
    expect(short.state).toBe('on_hold');
    const rejected = (await t.http.get('/v1/readings').set('authorization', engineer).query({ filter: JSON.stringify({ batchId: short.id, status: 'rejected' }) })).body;
    expect(rejected).toHaveLength(1);
    // B ran out: the ratio is off (A, the polyol side, heavy) and B is a short shot
    expect(rejected[0].subject).toBe('part_b');
    expect(rejected[0].reasons.map((r: { code: string }) => r.code)).toEqual(['RATIO_POLYOL_HEAVY', 'SHORT_SHOT']);
    expect(rejected[0].reasons[1].message).toMatch(/^Short shot: part B is .*, 30 % under its target/);
    const check = (await t.http.get(`/v1/batches/${short.id}/release-check`).set('authorization', engineer)).body;
    expect(check).toMatchObject({ ready: false, openRejections: 1 });
    const lots = (await t.http.get('/v1/lots').set('authorization', engineer)).body as { lotNumber: string; hold: { cupTestId: string } | null }[];
    const held = lots.filter((l) => l.hold !== null);
    expect(held.map((l) => l.lotNumber)).toEqual(['DF28-B-0131']);
    const cup = (await t.http.get(`/v1/qc-cup-tests/${held[0]!.hold!.cupTestId}`).set('authorization', engineer)).body;
    expect(cup.verdict).toBe('failed');
    expect(cup.findings.map((f: { code: string }) => f.code)).toEqual(['CREAM_TIME_ABOVE_WINDOW', 'RISE_TIME_ABOVE_WINDOW', 'TACK_FREE_TIME_ABOVE_WINDOW', 'FREE_RISE_DENSITY_ABOVE_BAND']);
    const passed = (await t.http.get('/v1/qc-cup-tests').set('authorization', engineer)).body.filter((c: { verdict: string }) => c.verdict === 'passed');
    expect(passed).toHaveLength(5);
  });
});
