import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { closeTestDb, makeOrg, OrgFixture, PASSWORD } from './support/fixtures.js';
import { startTestApp, TestApp } from './support/app.js';

// An app of its own with low limits and its own rate-limit namespace, so no other suite is throttled.
let t: TestApp;
let org: OrgFixture;
beforeAll(async () => {
  t = await startTestApp({ SIGNIN_MAX_FAILURES: '3', SIGNIN_LOCK_SECONDS: '60', SIGNIN_IP_LIMIT_PER_MINUTE: '8', RATE_LIMIT_NAMESPACE: `rl-test-${Date.now()}:` });
  org = await makeOrg('throttle');
});
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('failed sign-ins are throttled', () => {
  it('per account: after 3 failures even the right password gets 429 with Retry-After', async () => {
    const email = org.people.viewer.email;
    for (let i = 0; i < 3; i++) expect((await t.http.post('/v1/auth/sign-in').send({ email, password: 'wrong-wrong' })).status).toBe(401);
    const locked = await t.http.post('/v1/auth/sign-in').send({ email, password: PASSWORD });
    expect(locked.status).toBe(429);
    expect(locked.headers['content-type']).toMatch(/problem\+json/);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    expect(locked.body.detail).not.toContain('does not exist');
  });

  it('per address: the 9th attempt in a minute is refused with 429 and Retry-After', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 9; i++) statuses.push((await t.http.post('/v1/auth/sign-in').send({ email: `ghost${i}@fixture.test`, password: 'whatever-1' })).status);
    // earlier requests of this suite count too: somewhere before the 9th the limit of 8 is hit
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
    const res = await t.http.post('/v1/auth/sign-in').send({ email: 'ghost@fixture.test', password: 'whatever-1' });
    expect(res.status).toBe(429);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });
});
