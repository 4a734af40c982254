import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { closeTestDb, makeOrg, OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, TestApp } from './support/app.js';
import type { Role } from '@pourgate/permissions';

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
const secrets: string[] = [];

beforeAll(async () => {
  t = await startTestApp({ LOG_LEVEL: 'debug' });
  org = await makeOrg('keys');
  auth = await tokensFor(t.http, org);
}, 120_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

async function issue(body: Record<string, unknown>, as: Role = 'admin') {
  const res = await t.http.post('/v1/api-keys').set('authorization', auth[as]).send(body);
  if (res.body.secret) secrets.push(res.body.secret);
  return res;
}

describe('API key lifecycle', () => {
  it('a new key works, shows its secret once, and records last use', async () => {
    const res = await issue({ name: 'Scale 1', kind: 'device', environment: 'live', scopes: ['devices:read', 'readings:write'] });
    expect(res.status).toBe(201);
    expect(res.body.secret).toMatch(/^pgd_live_/);
    expect(res.body.prefix).toBe(res.body.secret.slice(0, 16));
    expect(res.body.state).toBe('active');
    const use = await t.http.get('/v1/devices').set('x-api-key', res.body.secret);
    expect(use.status).toBe(200);
    expect(use.headers['content-range']).toMatch(/^devices \d+-\d+\/\d+$/);
    await new Promise((r) => setTimeout(r, 200));
    const shown = await t.http.get(`/v1/api-keys/${res.body.id}`).set('authorization', auth.admin);
    expect(shown.body.secret).toBeUndefined();
    expect(shown.body.lastUsedAt).not.toBeNull();
    expect(shown.body.lastUsedIp).toBeTruthy();
    const stored = await testDb()('api_keys').where({ id: res.body.id }).first();
    expect(stored.secret_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(stored)).not.toContain(res.body.secret);
  });

  it('wrong, revoked and expired keys are 401 problem+json', async () => {
    const wrong = await t.http.get('/v1/devices').set('x-api-key', 'pgd_live_' + 'A'.repeat(43));
    expect(wrong.status).toBe(401);
    expect(wrong.headers['content-type']).toMatch(/problem\+json/);
    const k = await issue({ name: 'To revoke', kind: 'integration', scopes: ['devices:read'] });
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(200);
    const rev = await t.http.post(`/v1/api-keys/${k.body.id}/revoke`).set('authorization', auth.admin);
    expect(rev.body.state).toBe('revoked');
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(401);
    const e = await issue({ name: 'To expire', kind: 'integration', scopes: ['devices:read'], expiresAt: new Date(Date.now() + 60_000).toISOString() });
    await testDb()('api_keys').where({ id: e.body.id }).update({ expires_at: new Date(Date.now() - 1000) });
    expect((await t.http.get('/v1/devices').set('x-api-key', e.body.secret)).status).toBe(401);
  });

  it('rotation: the old key works inside the grace period and fails after it', async () => {
    const k = await issue({ name: 'Rotating', kind: 'device', scopes: ['devices:read'] });
    const rot = await t.http.post(`/v1/api-keys/${k.body.id}/rotate`).set('authorization', auth.admin).send({ graceSeconds: 60 });
    expect(rot.status).toBe(201);
    secrets.push(rot.body.secret);
    expect(rot.body.secret).not.toBe(k.body.secret);
    expect(rot.body.rotatedFrom).toBe(k.body.id);
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(200);
    expect((await t.http.get('/v1/devices').set('x-api-key', rot.body.secret)).status).toBe(200);
    const old = await t.http.get(`/v1/api-keys/${k.body.id}`).set('authorization', auth.admin);
    expect(old.body.state).toBe('grace');
    await testDb()('api_keys').where({ id: k.body.id }).update({ grace_until: new Date(Date.now() - 1000) });
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(401);
    expect((await t.http.get('/v1/devices').set('x-api-key', rot.body.secret)).status).toBe(200);
  });

  it('scopes and kinds: a key never opens a person’s route nor a route outside its scopes', async () => {
    const k = await issue({ name: 'Narrow', kind: 'device', scopes: ['readings:write'] });
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(403);
    expect((await t.http.get('/v1/me').set('x-api-key', k.body.secret)).status).toBe(403);
    expect((await t.http.get('/v1/api-keys').set('x-api-key', k.body.secret)).status).toBe(403);
    // a key in the URL is not a credential
    expect((await t.http.get(`/v1/devices?api_key=${k.body.secret}`)).status).toBe(401);
  });

  it('integrators issue device keys only; viewers issue none', async () => {
    expect((await issue({ name: 'ERP', kind: 'integration', scopes: ['work-orders:write'] }, 'integrator')).status).toBe(403);
    expect((await issue({ name: 'Scale 9', kind: 'device', scopes: ['readings:write'] }, 'integrator')).status).toBe(201);
    expect((await issue({ name: 'Scale 10', kind: 'device', scopes: ['readings:write'] }, 'viewer')).status).toBe(403);
  });

  it('create, rotate and revoke are in the audit log', async () => {
    const res = await t.http.get('/v1/audit-events').set('authorization', auth.admin).query({ filter: JSON.stringify({ action: ['api_key.created', 'api_key.rotated', 'api_key.revoked'] }), range: '[0,99]' });
    expect(res.status).toBe(200);
    const actions = new Set(res.body.map((e: { action: string }) => e.action));
    expect(actions).toEqual(new Set(['api_key.created', 'api_key.rotated', 'api_key.revoked']));
  });

  it('no secret appears in any log line or list response', async () => {
    const list = await t.http.get('/v1/api-keys').set('authorization', auth.admin).query({ range: '[0,99]' });
    const listText = JSON.stringify(list.body);
    const logs = t.logs.text();
    expect(secrets.length).toBeGreaterThanOrEqual(6);
    expect(logs.length).toBeGreaterThan(0);
    expect(logs).toContain('[redacted]');
    for (const s of secrets) {
      expect(listText).not.toContain(s);
      expect(logs).not.toContain(s);
      expect(logs).not.toContain(s.slice(16));
    }
  });
});
