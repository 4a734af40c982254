import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Role } from '@pourgate/permissions';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import { closeTestDb, makeOrg, type OrgFixture, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
// a built console of our own: an entry page and one content-hashed script, big enough to compress
const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'pourgate-console-'));
const script = `console.log(${JSON.stringify('pour '.repeat(4000))});\n`;

beforeAll(async () => {
  fs.mkdirSync(path.join(dist, 'assets'));
  fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Pourgate</title><script type="module" src="/assets/index-C0ffee12.js"></script>');
  fs.writeFileSync(path.join(dist, 'assets', 'index-C0ffee12.js'), script);
  t = await startTestApp({ ADMIN_DIST: dist });
  org = await makeOrg('queue-dashboard');
  auth = await tokensFor(t.http, org);
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
  fs.rmSync(dist, { recursive: true, force: true });
});

describe('queue dashboard (admins only)', () => {
  it('answers 401 to a browser without a pass, and to a forged or foreign pass', async () => {
    const none = await t.http.get('/queues/');
    expect(none.status).toBe(401);
    expect(none.headers['content-type']).toMatch(/application\/problem\+json/);
    const forged = await t.http.get('/queues/').set('cookie', `pourgate_queues=${Buffer.from(JSON.stringify({ sub: org.people.admin.id, exp: 4102444800 })).toString('base64url')}.${randomBytes(32).toString('base64url')}`);
    expect(forged.status).toBe(401);
    expect((await t.http.get('/queues/api/queues')).status).toBe(401);
  });

  it('answers 403 to other roles, by pass request and by bearer token', async () => {
    for (const role of ['engineer', 'integrator', 'viewer'] as const) {
      expect((await t.http.post('/v1/admin/queue-sessions').set('authorization', auth[role]).send({})).status).toBe(403);
      const page = await t.http.get('/queues/').set('authorization', auth[role]);
      expect(page.status).toBe(403);
      expect(page.body.detail).toMatch(/queues:read/);
    }
  });

  it('gives an admin a 15-minute pass cookie for the dashboard path that opens the page and its data', async () => {
    const pass = await t.http.post('/v1/admin/queue-sessions').set('authorization', auth.admin).send({});
    expect(pass.status).toBe(201);
    expect(pass.body.url).toBe('/queues/');
    const ttl = Date.parse(pass.body.expiresAt) - Date.now();
    expect(ttl).toBeGreaterThan(14 * 60_000);
    expect(ttl).toBeLessThanOrEqual(15 * 60_000);
    const setCookie = String(pass.headers['set-cookie']);
    expect(setCookie).toMatch(/^pourgate_queues=[\w-]+\.[\w-]+; Path=\/queues; Max-Age=900; HttpOnly; SameSite=Strict/);
    const cookie = setCookie.split(';')[0]!;

    const page = await t.http.get('/queues/').set('cookie', cookie);
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/text\/html/);
    expect(page.headers['cache-control']).toBe('no-store');
    const data = await t.http.get('/queues/api/queues').set('cookie', cookie);
    expect(data.status).toBe(200);
    const names = (data.body.queues as { name: string; readOnlyMode: boolean }[]).map((q) => q.name);
    expect(names).toEqual(expect.arrayContaining(['reading-judging', 'reading-imports', 'webhook-deliveries', 'periodic']));
    expect((data.body.queues as { readOnlyMode: boolean }[]).every((q) => q.readOnlyMode)).toBe(true);
    // a client may use its bearer token instead of the cookie
    expect((await t.http.get('/queues/').set('authorization', auth.admin)).status).toBe(200);
  });
});

describe('the console as served', () => {
  it('sends hashed assets precompressed (brotli, else gzip) and cached for a year; the entry page revalidated', async () => {
    const entry = await t.http.get('/');
    expect(entry.status).toBe(200);
    expect(entry.headers['cache-control']).toBe('no-cache');

    // in-process, so the bytes are those sent (an HTTP client would decompress them)
    const br = await t.app.inject({ method: 'GET', url: '/assets/index-C0ffee12.js', headers: { 'accept-encoding': 'br, gzip' } });
    expect(br.statusCode).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(String(br.headers.vary)).toMatch(/accept-encoding/i);
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(zlib.brotliDecompressSync(br.rawPayload).toString('utf8')).toBe(script);
    expect(br.rawPayload.length).toBeLessThan(script.length / 10);

    const gz = await t.app.inject({ method: 'GET', url: '/assets/index-C0ffee12.js', headers: { 'accept-encoding': 'gzip' } });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(zlib.gunzipSync(gz.rawPayload).toString('utf8')).toBe(script);
    const plain = await t.app.inject({ method: 'GET', url: '/assets/index-C0ffee12.js', headers: { 'accept-encoding': 'identity' } });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body).toBe(script);
  });
});
