import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { closeTestDb, makeOrg, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';

// An app with no development allow-list: what production does with private addresses.
let strict: TestApp;
let admin: string;
beforeAll(async () => {
  strict = await startTestApp({ WEBHOOK_ALLOWED_HOSTS: '' });
  admin = (await tokensFor(strict.http, await makeOrg('ssrf-create'))).admin;
});
afterAll(async () => {
  await strict.close();
  await closeTestDb();
});

describe('SSRF guard at endpoint creation', () => {
  it.each(['http://127.0.0.1:9/hook', 'http://10.0.0.1/hook', 'http://169.254.169.254/latest/meta-data', 'http://[::1]:9/hook', 'http://localhost.:9/hook'])('refuses %s with a clear problem', async (url) => {
    const res = await strict.http.post('/v1/webhook-endpoints').set('authorization', admin).send({ url });
    expect(res.status).toBe(422);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(res.body.errors[0].pointer).toBe('/url');
    expect(res.body.detail).toMatch(/public addresses/);
  });
});
