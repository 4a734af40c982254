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
    expect(counts).toMatchObject({ material_systems: 3, molds: 3, lots: 7, qc_cup_tests: 5, work_orders: 2, batches: 2, batch_state_transitions: 2 });
    expect(await seedShopDemo(testDb(), org.id)).toBe(0);
    expect(await shopCounts(org.id)).toEqual(counts);
  });

  it('its rows read back through the API like any others, with one lot past its date', async () => {
    const systems = await t.http.get('/v1/material-systems').set('authorization', engineer);
    expect(systems.body.map((s: { kind: string }) => s.kind).sort()).toEqual(['flexible', 'flexible', 'integral-skin']);
    const lots = await t.http.get('/v1/lots').set('authorization', engineer);
    expect(lots.body.filter((l: { expired: boolean }) => l.expired)).toHaveLength(1);
    const batches = await t.http.get('/v1/batches').set('authorization', engineer);
    expect(batches.body).toHaveLength(2);
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
});
