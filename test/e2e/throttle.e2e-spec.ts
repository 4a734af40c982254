import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import { closeTestDb, makeOrg, OrgFixture, PASSWORD, testDb } from './support/fixtures.js';
import { startTestApp, TestApp } from './support/app.js';

// An app of its own with low limits and its own rate-limit namespace, so no other suite is throttled.
let t: TestApp;
// for the races: one app that limits accounts only, one that limits addresses only
let perAccount: TestApp;
let perAddress: TestApp;
let org: OrgFixture;
beforeAll(async () => {
  t = await startTestApp({ SIGNIN_MAX_FAILURES: '3', SIGNIN_LOCK_SECONDS: '60', SIGNIN_IP_LIMIT_PER_MINUTE: '8', RATE_LIMIT_NAMESPACE: `rl-test-${Date.now()}:` });
  perAccount = await startTestApp({ SIGNIN_MAX_FAILURES: '3', SIGNIN_LOCK_SECONDS: '60', SIGNIN_IP_LIMIT_PER_MINUTE: '100000', RATE_LIMIT_NAMESPACE: `rl-account-${randomUUID()}:` });
  perAddress = await startTestApp({ SIGNIN_MAX_FAILURES: '100000', SIGNIN_LOCK_SECONDS: '60', SIGNIN_IP_LIMIT_PER_MINUTE: '5', RATE_LIMIT_NAMESPACE: `rl-address-${randomUUID()}:` });
  org = await makeOrg('throttle');
}, 120_000);
afterAll(async () => {
  await t.close();
  await perAccount.close();
  await perAddress.close();
  await closeTestDb();
});

/** How many of these sign-ins got as far as the password check (each check leaves a failure entry). */
async function checked(emails: string[]): Promise<number> {
  const rows = await testDb()('audit_events').where({ action: 'auth.sign_in_failed' }).whereIn('actor_label', emails).count({ n: '*' });
  return Number(rows[0]!.n);
}

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

describe('the limit is reserved before the password is checked', () => {
  it('12 parallel wrong guesses at one account: at most 3 are checked, the rest are 429', async () => {
    const email = org.people.engineer.email;
    const statuses = await Promise.all(Array.from({ length: 12 }, () => perAccount.http.post('/v1/auth/sign-in').send({ email, password: 'a-wrong-guess' }).then((r) => r.status)));
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(3);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(9);
    expect(statuses.every((s) => s === 401 || s === 429)).toBe(true);
    expect(await checked([email])).toBeLessThanOrEqual(3);
  });

  it('an address with no account is limited the same way (the answers do not tell them apart)', async () => {
    const ghost = `ghost-${randomUUID()}@fixture.test`;
    const statuses = await Promise.all(Array.from({ length: 12 }, () => perAccount.http.post('/v1/auth/sign-in').send({ email: ghost, password: 'a-wrong-guess' }).then((r) => r.status)));
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(3);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(9);
    expect(await checked([ghost])).toBeLessThanOrEqual(3);
    const known = await perAccount.http.post('/v1/auth/sign-in').send({ email: org.people.engineer.email, password: 'a-wrong-guess' });
    const unknown = await perAccount.http.post('/v1/auth/sign-in').send({ email: ghost, password: 'a-wrong-guess' });
    expect([known.status, known.body.title]).toEqual([unknown.status, unknown.body.title]);
  });

  it('16 parallel guesses from one address at 16 accounts: at most 5 are checked', async () => {
    const emails = Array.from({ length: 16 }, () => `spray-${randomUUID()}@fixture.test`);
    const statuses = await Promise.all(emails.map((email) => perAddress.http.post('/v1/auth/sign-in').send({ email, password: 'a-wrong-guess' }).then((r) => r.status)));
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(5);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(11);
    expect(await checked(emails)).toBeLessThanOrEqual(5);
  });
});
