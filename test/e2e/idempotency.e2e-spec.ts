import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem } from './support/shop.js';

// The Idempotency-Key header as the IETF httpapi working group's draft describes it
// (draft-ietf-httpapi-idempotency-key-header): same key + same request → the stored response;
// same key + another request → 422; the first still in flight → 409.

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;

const device = (over: Record<string, unknown> = {}) => ({ kind: 'thermometer', serial: `T-${randomUUID()}`, name: 'drum probe', ...over });
const devices = async () => Number((await testDb()('devices').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);
const post = (body: unknown, key?: string, who: Role = 'admin') => {
  const r = t.http.post('/v1/devices').set('authorization', auth[who]);
  if (key !== undefined) r.set('idempotency-key', key);
  return r.send(body as object);
};

beforeAll(async () => {
  t = await startTestApp();
  org = await makeOrg('idempotency');
  auth = await tokensFor(t.http, org);
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('Idempotency-Key', () => {
  it('answers a retry with the same key and body with the first response, writing once', async () => {
    const key = randomUUID();
    const body = device();
    const before = await devices();
    const first = await post(body, key);
    expect(first.status).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    // the same body with its keys in another order is the same request
    const again = await post(Object.fromEntries(Object.entries(body).reverse()), `"${key}"`);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(await devices()).toBe(before + 1);
  });

  it('refuses the same key with another body (422) and writes nothing', async () => {
    const key = randomUUID();
    expect((await post(device(), key)).status).toBe(201);
    const before = await devices();
    const other = await post(device(), key);
    expectProblem(other, 422);
    expect(other.body.type).toBe('/v1/problems/idempotency-key-reused');
    expect(await devices()).toBe(before);
  });

  it('answers 409 with Retry-After while the first request with the key is still running', async () => {
    const key = randomUUID();
    const body = device();
    // the first request holds the key: what the interceptor writes before it runs the handler
    const { requestHash } = await import('../../api/src/common/idempotency/idempotency.interceptor.js');
    await testDb()('idempotency_keys').insert({ scope: `${org.id}:user:${org.people.admin.id}`, key, request_hash: requestHash('POST', '/v1/devices', body), state: 'in_flight', expires_at: testDb().raw("now() + interval '1 hour'") });
    const before = await devices();
    const res = await post(body, key);
    expectProblem(res, 409);
    expect(res.body.type).toBe('/v1/problems/idempotency-key-in-flight');
    expect(res.headers['retry-after']).toBe('1');
    expect(await devices()).toBe(before);
  });

  it('lets the same key be used at once by two requests only once', async () => {
    const key = randomUUID();
    const body = device();
    const before = await devices();
    const answers = await Promise.all([post(body, key), post(body, key), post(body, key)]);
    const statuses = answers.map((r) => r.status).sort();
    // one ran; the others either waited for its stored answer or were told it is in flight
    expect(statuses.filter((s) => s === 201).length).toBeGreaterThanOrEqual(1);
    expect(statuses.every((s) => s === 201 || s === 409)).toBe(true);
    expect(await devices()).toBe(before + 1);
  });

  it('scopes keys to the caller: another person with the same key makes their own request', async () => {
    const key = randomUUID();
    const before = await devices();
    expect((await post(device(), key, 'admin')).status).toBe(201);
    const theirs = await post(device(), key, 'integrator');
    expect(theirs.status).toBe(201);
    expect(theirs.headers['idempotent-replayed']).toBeUndefined();
    expect(await devices()).toBe(before + 2);
  });

  it('keeps no key for a request that failed, so a corrected retry may reuse it', async () => {
    const key = randomUUID();
    expectProblem(await post({ kind: 'scale', serial: 'S-1', name: 'no readability' }, key), 422, '/readability');
    const fixed = await post(device(), key);
    expect(fixed.status).toBe(201);
  });

  it('refuses a key that is not printable ASCII or is too long (400)', async () => {
    const before = await devices();
    expectProblem(await post(device(), 'x'.repeat(256)), 400);
    expectProblem(await post(device(), 'has space'), 400);
    expect(await devices()).toBe(before);
  });

  it('documents the header on every authenticated POST except those idempotent by their own means', async () => {
    const doc = (await t.http.get('/v1/openapi.json')).body;
    const header = (op: { parameters?: { name: string }[] }) => (op.parameters ?? []).some((p) => p.name === 'Idempotency-Key');
    expect(header(doc.paths['/v1/devices'].post)).toBe(true);
    expect(header(doc.paths['/v1/readings'].post)).toBe(false);
    expect(header(doc.paths['/v1/auth/sign-in'].post)).toBe(false);
  });

  it('keeps a response that carries a secret only sealed, and replays it whole', async () => {
    const key = randomUUID();
    const body = { name: `erp ${randomUUID()}`, kind: 'integration', scopes: ['work-orders:write'] };
    const first = await t.http.post('/v1/api-keys').set('authorization', auth.admin).set('idempotency-key', key).send(body);
    expect(first.status).toBe(201);
    const secret = first.body.secret as string;
    expect(secret).toMatch(/^pg/);
    const row = await testDb()('idempotency_keys').where({ key }).first('response_body');
    // the table holds no usable secret: neither the key nor any part of it
    expect(row.response_body).not.toContain(secret);
    expect(row.response_body).not.toContain(secret.slice(-24));
    const again = await t.http.post('/v1/api-keys').set('authorization', auth.admin).set('idempotency-key', key).send(body);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.headers['cache-control']).toBe('no-store');
    expect(again.body).toEqual(first.body);
  });
});
