import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createCipheriv, createHash, randomBytes, randomUUID } from 'node:crypto';
import { startSmtpCatcher, type SmtpCatcher } from '../../fakes/src/smtp-catcher.js';
import { sha256 } from '../../api/src/auth/tokens.service.js';
import { validateEnv } from '../../api/src/config/env.js';
import { documentsConfig } from '../../api/src/documents/documents.config.js';
import { S3DocumentStore } from '../../api/src/documents/s3-document-store.js';
import { WebhooksService } from '../../api/src/webhooks/webhooks.service.js';
import type { EndpointRow } from '../../api/src/webhooks/webhooks.repository.js';
import { closeTestDb, makeOrg, type OrgFixture, PASSWORD, signIn, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { shopFixtures } from './support/shop.js';

/**
 * Access as an attacker tests it: key scopes beyond the issuer's, a revoked key's rotation grace,
 * sessions outliving a password change, invitation answers that tell who has an account, device
 * keys reading other devices, cacheable secrets, dead mail links, and secrets at rest.
 */
let t: TestApp;
let mail: SmtpCatcher;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<string, string>;

beforeAll(async () => {
  mail = await startSmtpCatcher();
  t = await startTestApp({ SMTP_URL: mail.smtpUrl, PUBLIC_URL: 'http://127.0.0.1:3999', WEBHOOK_ALLOWED_HOSTS: '127.0.0.1' });
  org = await makeOrg('access');
  other = await makeOrg('access-other');
  auth = await tokensFor(t.http, org);
}, 120_000);
// apps started by single tests (other settings) are closed with the suite's: closing one early
// ends connections the others still use
const extraApps: TestApp[] = [];
async function extraApp(env: Record<string, string>): Promise<TestApp> {
  const a = await startTestApp(env);
  extraApps.push(a);
  return a;
}
afterAll(async () => {
  await t.close();
  for (const a of extraApps) await a.close();
  await mail.close();
  await closeTestDb();
});

const issue = (as: string, body: Record<string, unknown>) => t.http.post('/v1/api-keys').set('authorization', auth[as]!).send(body);

describe('1. a key holds no scope its issuer may not grant', () => {
  it('an integrator’s device key with work-orders:write is refused, naming the scope, and nothing is written', async () => {
    const before = await testDb()('api_keys').where({ organization_id: org.id }).count({ n: '*' });
    const res = await issue('integrator', { name: 'Sneaky scale', kind: 'device', scopes: ['readings:write', 'work-orders:write'] });
    expect(res.status).toBe(403);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(res.body.detail).toContain('work-orders:write');
    expect(res.body.detail).toMatch(/^These scopes cannot go on this key: work-orders:write \(/);
    expect(res.body.errors).toEqual([expect.objectContaining({ pointer: '/scopes/1' })]);
    const after = await testDb()('api_keys').where({ organization_id: org.id }).count({ n: '*' });
    expect(after).toEqual(before);
  });

  it('even an admin cannot put an integration scope on a device key', async () => {
    const res = await issue('admin', { name: 'Scale with events', kind: 'device', scopes: ['events:read'] });
    expect(res.status).toBe(403);
    expect(res.body.detail).toContain('events:read');
  });

  it('a device key stored with a scope beyond the device scopes cannot use it', async () => {
    const secret = `pgd_live_${randomBytes(32).toString('base64url')}`;
    await testDb()('api_keys').insert({ organization_id: org.id, name: 'old wide device key', kind: 'device', environment: 'live', scopes: ['readings:write', 'work-orders:write'], prefix: secret.slice(0, 16), secret_hash: sha256(secret) });
    const res = await t.http.post('/v1/work-orders').set('x-api-key', secret).send({});
    expect(res.status).toBe(403);
  });
});

describe('2. revoking ends every secret of a key', () => {
  it('after a rotation with grace, revoking the successor also ends the old secret; rotating a revoked key is 409', async () => {
    const k = await issue('admin', { name: 'Leaky', kind: 'integration', scopes: ['devices:read'] });
    const rot = await t.http.post(`/v1/api-keys/${k.body.id}/rotate`).set('authorization', auth.admin!).send({ graceSeconds: 3600 });
    expect(rot.status).toBe(201);
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(200);
    const rev = await t.http.post(`/v1/api-keys/${rot.body.id}/revoke`).set('authorization', auth.admin!);
    expect(rev.status).toBe(200);
    expect(rev.body.state).toBe('revoked');
    expect((await t.http.get('/v1/devices').set('x-api-key', rot.body.secret)).status).toBe(401);
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(401);
    expect((await t.http.get(`/v1/api-keys/${k.body.id}`).set('authorization', auth.admin!)).body.state).toBe('revoked');
    for (const id of [k.body.id, rot.body.id]) {
      const again = await t.http.post(`/v1/api-keys/${id}/rotate`).set('authorization', auth.admin!).send({ graceSeconds: 60 });
      expect(again.status).toBe(409);
    }
    const audit = await testDb()('audit_events').where({ organization_id: org.id, action: 'api_key.revoked', target_id: rot.body.id }).first();
    expect([...audit.details.ended].sort()).toEqual([k.body.id, rot.body.id].sort());
  });

  it('revoking the predecessor in grace ends its successor too', async () => {
    const k = await issue('admin', { name: 'Leaky 2', kind: 'integration', scopes: ['devices:read'] });
    const rot = await t.http.post(`/v1/api-keys/${k.body.id}/rotate`).set('authorization', auth.admin!).send({ graceSeconds: 3600 });
    await t.http.post(`/v1/api-keys/${k.body.id}/revoke`).set('authorization', auth.admin!);
    expect((await t.http.get('/v1/devices').set('x-api-key', k.body.secret)).status).toBe(401);
    expect((await t.http.get('/v1/devices').set('x-api-key', rot.body.secret)).status).toBe(401);
  });
});

describe('4. a password change ends the person’s other sessions', () => {
  it('other sessions (refresh and access) end, the current one goes on, and the audit says how many ended', async () => {
    const email = `pw.${randomUUID()}@fixture.test`;
    await testDb()('users').insert({ organization_id: org.id, email, name: 'Pass Word', role: 'viewer', password_hash: (await testDb()('users').where({ id: org.people.viewer.id }).first()).password_hash });
    const laptop = await signIn(t.http, email);
    const phone = await signIn(t.http, email);
    const tablet = await signIn(t.http, email);
    const change = await t.http.patch('/v1/me').set('authorization', `Bearer ${laptop.token}`).send({ currentPassword: PASSWORD, newPassword: 'a-brand-new-password-9' });
    expect(change.status).toBe(200);
    for (const s of [phone, tablet]) {
      expect((await t.http.post('/v1/auth/refresh').send({ refreshToken: s.refreshToken })).status).toBe(401);
      expect((await t.http.get('/v1/me').set('authorization', `Bearer ${s.token}`)).status).toBe(401);
    }
    expect((await t.http.get('/v1/me').set('authorization', `Bearer ${laptop.token}`)).status).toBe(200);
    const refreshed = await t.http.post('/v1/auth/refresh').send({ refreshToken: laptop.refreshToken });
    expect(refreshed.status).toBe(200);
    expect((await t.http.get('/v1/me').set('authorization', `Bearer ${refreshed.body.accessToken}`)).status).toBe(200);
    const user = await testDb()('users').where({ email }).first();
    const audit = await testDb()('audit_events').where({ action: 'user.password_changed', target_id: user.id }).first();
    expect(audit.details.sessionsEnded).toBe(2);
    expect(JSON.stringify(audit)).not.toContain('a-brand-new-password-9');
    expect(t.logs.text()).not.toContain('a-brand-new-password-9');
  }, 120_000);

  it('a wrong current password is 422 and ends nothing', async () => {
    const a = await signIn(t.http, org.people.engineer.email);
    const b = await signIn(t.http, org.people.engineer.email);
    const res = await t.http.patch('/v1/me').set('authorization', `Bearer ${a.token}`).send({ currentPassword: 'not-it-at-all', newPassword: 'whatever-password-2' });
    expect(res.status).toBe(422);
    expect((await t.http.get('/v1/me').set('authorization', `Bearer ${b.token}`)).status).toBe(200);
    expect(t.logs.text()).not.toContain('whatever-password-2');
  }, 120_000);

  it('signing out ends the access token of that session at once', async () => {
    const s = await signIn(t.http, org.people.engineer.email);
    await t.http.post('/v1/auth/sign-out').send({ refreshToken: s.refreshToken });
    expect((await t.http.get('/v1/me').set('authorization', `Bearer ${s.token}`)).status).toBe(401);
  });
});

describe('5. invitations answer alike whether or not the address has an account elsewhere', () => {
  it('same status and shape; the mail tells the person, and carries no link for a taken address', async () => {
    const taken = other.people.engineer.email;
    const fresh = `fresh.${randomUUID()}@fixture.test`;
    const a = await t.http.post('/v1/invitations').set('authorization', auth.admin!).send({ email: taken, role: 'viewer' });
    const b = await t.http.post('/v1/invitations').set('authorization', auth.admin!).send({ email: fresh, role: 'viewer' });
    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    expect(Object.keys(a.body).sort()).toEqual(Object.keys(b.body).sort());
    expect(a.body.state).toBe(b.body.state);
    const list = await t.http.get('/v1/invitations').set('authorization', auth.admin!).query({ range: '[0,99]' });
    const states = list.body.filter((i: { email: string }) => [taken, fresh].includes(i.email)).map((i: { state: string }) => i.state);
    expect(states).toEqual(['pending', 'pending']);
    const audit = await testDb()('audit_events').where({ organization_id: org.id, action: 'invitation.sent' }).whereIn('target_id', [a.body.id, b.body.id]);
    expect(audit.map((e) => Object.keys(e.details).sort().join())).toEqual(['email,role', 'email,role']);
    const toTaken = await mail.waitFor((m) => m.to.includes(taken));
    expect(toTaken.text).toContain('already has a Pourgate account');
    expect(toTaken.text).not.toContain('token=');
    const toFresh = await mail.waitFor((m) => m.to.includes(fresh));
    expect(toFresh.text).toContain('accept-invitation?token=');
    // accepting signs the person in: the answer carries a session, so it is not cached either
    const token = decodeURIComponent(/token=([^\s]+)/.exec(toFresh.text)![1]!);
    const accepted = await t.http.post('/v1/invitations/accept').send({ token, name: 'Fresh Person', password: 'a-long-password-3' });
    expect(accepted.status).toBe(200);
    expect(accepted.headers['cache-control']).toBe('no-store');
  });
});

describe('6. a device key reads only its own device’s readings', () => {
  let scaleA: string;
  let scaleB: string;
  const readings: Record<string, string> = {};
  let deviceKey: string;
  let unboundKey: string;
  let integrationKey: string;

  beforeAll(async () => {
    const batchId = await shopFixtures.batches!(org);
    for (const [name, slot] of [['A', 'a'], ['B', 'b']] as const) {
      const [d] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `S-${randomUUID()}`, name: `scale ${name}` }).returning('id');
      if (slot === 'a') scaleA = d.id;
      else scaleB = d.id;
      readings[slot] = (await testDb()('readings').insert({ organization_id: org.id, batch_id: batchId, device_id: d.id, client_reading_id: randomUUID(), quantity: 'mass', subject: 'part_a', value_si: 1, unit_given: 'kg', value_given: 1, status: 'accepted' }).returning('id'))[0].id;
    }
    deviceKey = (await issue('integrator', { name: 'Scale A', kind: 'device', scopes: ['readings:write'], deviceId: scaleA })).body.secret;
    unboundKey = (await issue('integrator', { name: 'Unbound scale', kind: 'device', scopes: ['readings:write'] })).body.secret;
    integrationKey = (await issue('admin', { name: 'Line PLC', kind: 'integration', scopes: ['readings:write'] })).body.secret;
  });

  it('lists and fetches only its device’s readings; another device’s reading is 404', async () => {
    const list = await t.http.get('/v1/readings').set('x-api-key', deviceKey).query({ range: '[0,99]' });
    expect(list.status).toBe(200);
    expect(new Set(list.body.map((r: { deviceId: string }) => r.deviceId))).toEqual(new Set([scaleA]));
    const widened = await t.http.get('/v1/readings').set('x-api-key', deviceKey).query({ filter: JSON.stringify({ deviceId: scaleB }) });
    expect(widened.body.map((r: { id: string }) => r.id)).not.toContain(readings.b);
    expect((await t.http.get(`/v1/readings/${readings.a}`).set('x-api-key', deviceKey)).status).toBe(200);
    const foreign = await t.http.get(`/v1/readings/${readings.b}`).set('x-api-key', deviceKey);
    expect(foreign.status).toBe(404);
    expect(foreign.headers['content-type']).toMatch(/problem\+json/);
  });

  it('a device key bound to no device reads none', async () => {
    const list = await t.http.get('/v1/readings').set('x-api-key', unboundKey);
    expect(list.status).toBe(200);
    expect(list.body).toEqual([]);
    expect((await t.http.get(`/v1/readings/${readings.a}`).set('x-api-key', unboundKey)).status).toBe(404);
  });

  it('an integration key and people keep the organization’s view', async () => {
    for (const h of [{ 'x-api-key': integrationKey }, { authorization: auth.viewer! }]) {
      const list = await t.http.get('/v1/readings').set(h).query({ range: '[0,99]' });
      const ids = list.body.map((r: { id: string }) => r.id);
      expect(ids).toEqual(expect.arrayContaining([readings.a, readings.b]));
      expect((await t.http.get(`/v1/readings/${readings.b}`).set(h)).status).toBe(200);
    }
  });
});

describe('8. responses carrying a token or a secret are never cached', () => {
  it('sign-in, refresh, key create and rotate, webhook create and secret rotation answer Cache-Control: no-store', async () => {
    const s = await t.http.post('/v1/auth/sign-in').send({ email: org.people.integrator.email, password: PASSWORD });
    expect(s.headers['cache-control']).toBe('no-store');
    const r = await t.http.post('/v1/auth/refresh').send({ refreshToken: s.body.refreshToken });
    expect(r.headers['cache-control']).toBe('no-store');
    const k = await issue('admin', { name: 'Cache test', kind: 'integration', scopes: ['devices:read'] });
    expect(k.status).toBe(201);
    expect(k.headers['cache-control']).toBe('no-store');
    const rot = await t.http.post(`/v1/api-keys/${k.body.id}/rotate`).set('authorization', auth.admin!).send({ graceSeconds: 0 });
    expect(rot.headers['cache-control']).toBe('no-store');
    const ep = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.admin!).send({ url: 'http://127.0.0.1:9/hook' });
    expect(ep.status).toBe(201);
    expect(ep.headers['cache-control']).toBe('no-store');
    const rs = await t.http.post(`/v1/webhook-endpoints/${ep.body.id}/rotate-secret`).set('authorization', auth.admin!).send({ overlapSeconds: 60 });
    expect(rs.body.secret).toMatch(/^whsec_/);
    expect(rs.headers['cache-control']).toBe('no-store');
  });
});

describe('9. links in mail point where the API listens', () => {
  it('PUBLIC_URL unset: it follows HOST and PORT', () => {
    const env = validateEnv({ DATABASE_URL: 'postgres://x@h/db', REDIS_URL: 'redis://h:1', PORT: '4123', HOST: '0.0.0.0' });
    expect(env.PUBLIC_URL).toBe('http://127.0.0.1:4123');
  });

  it('a development app whose PUBLIC_URL names another port warns at boot; a matching one does not', async () => {
    const warned = await extraApp({ NODE_ENV: 'development', PORT: '4123', PUBLIC_URL: 'http://127.0.0.1:3000' });
    const quiet = await extraApp({ NODE_ENV: 'development', PORT: '4124', PUBLIC_URL: 'http://127.0.0.1:4124' });
    expect(warned.logs.text()).toMatch(/PUBLIC_URL http:\/\/127\.0\.0\.1:3000 points at port 3000, but the API listens on [^ ]+:4123/);
    expect(quiet.logs.text()).not.toContain('points at port');
  }, 120_000);
});

describe('10. object storage credentials and secrets at rest', () => {
  it('with no S3 keys the SDK’s default credential chain answers; static keys only when both are set', async () => {
    const saved = { id: process.env.AWS_ACCESS_KEY_ID, secret: process.env.AWS_SECRET_ACCESS_KEY };
    process.env.AWS_ACCESS_KEY_ID = 'AKIDFROMTHECHAIN';
    process.env.AWS_SECRET_ACCESS_KEY = 'secret-from-the-chain';
    try {
      const chain = new S3DocumentStore(documentsConfig({ S3_ENDPOINT: 'http://127.0.0.1:9' }).s3!);
      expect((await (await chain.client()).s3.config.credentials()).accessKeyId).toBe('AKIDFROMTHECHAIN');
      await chain.destroy();
      const fixed = new S3DocumentStore(documentsConfig({ S3_ENDPOINT: 'http://127.0.0.1:9', S3_ACCESS_KEY_ID: 'own-id', S3_SECRET_ACCESS_KEY: 'own-secret' }).s3!);
      expect((await (await fixed.client()).s3.config.credentials()).accessKeyId).toBe('own-id');
      await fixed.destroy();
      expect(() => documentsConfig({ S3_ENDPOINT: 'http://127.0.0.1:9', S3_ACCESS_KEY_ID: 'only-one' })).toThrow(/S3_SECRET_ACCESS_KEY/);
    } finally {
      for (const [k, v] of [['AWS_ACCESS_KEY_ID', saved.id], ['AWS_SECRET_ACCESS_KEY', saved.secret]] as const) {
        if (v === undefined) delete process.env[k];
        else process.env[k] = v;
      }
    }
  });

  it('production refuses the development keys and secrets at boot, naming the variable', () => {
    const base = { DATABASE_URL: 'postgres://x@h/db', REDIS_URL: 'redis://h:1', NODE_ENV: 'production', JWT_SECRET: 'a-production-signing-key-of-32-chars!', SECRETS_KEY: 'a-production-secrets-key' };
    expect(() => validateEnv(base)).not.toThrow();
    expect(() => validateEnv({ ...base, JWT_SECRET: undefined })).toThrow(/JWT_SECRET/);
    expect(() => validateEnv({ ...base, SECRETS_KEY: undefined })).toThrow(/SECRETS_KEY/);
    expect(() => validateEnv({ ...base, SECRETS_KEY_PREVIOUS: 'development-only-secrets-key' })).toThrow(/SECRETS_KEY_PREVIOUS/);
    const s3 = { NODE_ENV: 'production', S3_ENDPOINT: 'https://objects.example.test' };
    expect(() => documentsConfig({ ...s3, S3_ACCESS_KEY_ID: 'pourgate-local', S3_SECRET_ACCESS_KEY: 'real-secret' })).toThrow(/S3_ACCESS_KEY_ID/);
    expect(() => documentsConfig({ ...s3, S3_ACCESS_KEY_ID: 'real-id', S3_SECRET_ACCESS_KEY: 'pourgate-local-secret' })).toThrow(/S3_SECRET_ACCESS_KEY/);
    expect(documentsConfig(s3).s3!.credentials).toBeNull();
  });

  it('webhook secrets are sealed with a versioned HKDF key; after SECRETS_KEY rotates, old rows still sign', async () => {
    const ep = await t.http.post('/v1/webhook-endpoints').set('authorization', auth.admin!).send({ url: 'http://127.0.0.1:9/rotating' });
    expect(ep.status).toBe(201);
    const row = (await testDb()('webhook_endpoints').where({ id: ep.body.id }).first()) as EndpointRow;
    expect(row.secret_key_version).toMatch(/^[0-9a-f]{12}$/);
    expect(row.secret_enc).toMatch(/^v2\./);
    expect(row.secret_enc).not.toContain(ep.body.secret.slice(6));
    const current = process.env.SECRETS_KEY ?? 'development-only-secrets-key';
    const rotated = await extraApp({ SECRETS_KEY: 'the-next-secrets-key-value', SECRETS_KEY_PREVIOUS: current });
    const forgetful = await extraApp({ SECRETS_KEY: 'the-next-secrets-key-value' });
    {
      const hooks = rotated.app.get(WebhooksService);
      expect(hooks.box.version).not.toBe(row.secret_key_version);
      expect(hooks.signingSecrets(row)).toEqual([ep.body.secret]);
      // a row sealed before versions existed (single-hash key) opens too
      const legacy = { ...row, secret_enc: legacySeal(current, ep.body.secret), secret_key_version: null };
      expect(hooks.signingSecrets(legacy)).toEqual([ep.body.secret]);
      expect(() => forgetful.app.get(WebhooksService).signingSecrets(row)).toThrow(/SECRETS_KEY_PREVIOUS/);
    }
  }, 120_000);
});

describe('bad input to these routes', () => {
  it('is a 4xx problem, writes nothing and logs no secret', async () => {
    const before = await testDb()('api_keys').where({ organization_id: org.id }).count({ n: '*' });
    const cases = [
      issue('admin', { name: 'x', kind: 'device', scopes: ['nope:scope'] }),
      issue('admin', { name: 'x', kind: 'integration', scopes: 'devices:read' }),
      t.http.post(`/v1/api-keys/${randomUUID()}/rotate`).set('authorization', auth.admin!).send({ graceSeconds: -1 }),
      t.http.post('/v1/auth/sign-in').send({ email: org.people.admin.email, password: 12345 }),
      t.http.patch('/v1/me').set('authorization', auth.viewer!).send({ newPassword: 'short' }),
      t.http.post('/v1/invitations').set('authorization', auth.admin!).send({ email: 'not an address', role: 'viewer' }),
    ];
    for (const res of await Promise.all(cases)) {
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
    }
    expect(await testDb()('api_keys').where({ organization_id: org.id }).count({ n: '*' })).toEqual(before);
    expect(t.logs.text()).not.toContain(PASSWORD);
  });
});

/** The sealing used before keys were versioned: AES-256-GCM under SHA-256("pourgate-secret-box:" + key). */
function legacySeal(secretsKey: string, plain: string): string {
  const key = createHash('sha256').update(`pourgate-secret-box:${secretsKey}`).digest();
  const iv = randomBytes(12);
  const c = createCipheriv('aes-256-gcm', key, iv);
  const body = Buffer.concat([c.update(plain, 'utf8'), c.final()]);
  return ['v1', iv.toString('base64url'), c.getAuthTag().toString('base64url'), body.toString('base64url')].join('.');
}
