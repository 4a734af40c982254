import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomBytes, randomUUID } from 'node:crypto';
import type { Role } from '@pourgate/permissions';
import { sha256 } from '../../api/src/auth/tokens.service.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { expectProblem, flexSystem } from './support/shop.js';

let t: TestApp;
let org: OrgFixture;
let auth: Record<Role, string>;
let batchId: string;
let probeId: string;
let loggerKey: string;

const HEADER = 'client_reading_id,batch_id,device_id,device_time,quantity,subject,value,unit';
const upload = (csv: string | Buffer, name = 'logger.csv', token = auth.engineer, header = 'authorization') =>
  t.http.post('/v1/imports').set(header, token).attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), { filename: name, contentType: 'text/csv' });
const readings = async () => Number((await testDb()('readings').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);

async function finished(id: string): Promise<{ final: Record<string, any>; seen: number[] }> {
  const seen: number[] = [];
  for (const deadline = Date.now() + 60_000; Date.now() < deadline; ) {
    const res = await t.http.get(`/v1/imports/${id}`).set('authorization', auth.viewer);
    expect(res.status).toBe(200);
    seen.push(res.body.percent);
    if (res.body.status === 'done' || res.body.status === 'failed') return { final: res.body, seen };
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`import ${id} never finished`);
}

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('imports');
  auth = await tokensFor(t.http, org);
  const sys = await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem());
  expect(sys.status).toBe(201);
  const batch = await t.http.post('/v1/batches').set('authorization', auth.engineer).send({ materialSystemId: sys.body.id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(batch.status).toBe(201);
  batchId = batch.body.id;
  [{ id: probeId }] = await testDb()('devices').insert({ organization_id: org.id, kind: 'logger', serial: `L-${randomUUID()}`, name: 'drum logger' }).returning('id');
  loggerKey = `pgd_live_${randomBytes(32).toString('base64url')}`;
  await testDb()('api_keys').insert({ organization_id: org.id, name: 'logger key', kind: 'device', environment: 'live', scopes: ['readings:write'], prefix: loggerKey.slice(0, 16), secret_hash: sha256(loggerKey), device_id: probeId });
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('CSV import', () => {
  it('imports the good rows, lists the bad ones by line number, and reaches 100 %', async () => {
    const at = (m: number) => new Date(Date.UTC(2026, 5, 1, 8, m)).toISOString();
    const good = Array.from({ length: 600 }, (_, i) => `imp-${i},${batchId},${probeId},${at(i % 60)},temperature,part_a,${(20 + (i % 5) * 0.5).toFixed(1)},degC`);
    const lines = [HEADER, ...good.slice(0, 300),
      `bad-1,${batchId},${probeId},${at(1)},temperature,part_a,warm,degC`, // line 302: value not a number
      `bad-2,${batchId},${probeId},${at(2)},temperature,part_a,21,furlongs`, // line 303: unknown unit
      `bad-3,${randomUUID()},${probeId},${at(3)},temperature,part_a,21,degC`, // line 304: unknown batch
      ...good.slice(300)];
    const before = await readings();
    const res = await upload(lines.join('\n') + '\n');
    expect(res.status).toBe(202);
    expect(res.body).toMatchObject({ status: 'queued', total: 603, statusUrl: `/v1/imports/${res.body.id}`, replayed: false });
    const { final, seen } = await finished(res.body.id);
    expect(final).toMatchObject({ status: 'done', total: 603, processed: 603, percent: 100, accepted: 600, rejectedRows: 3 });
    expect(final.badRows.map((b: { line: number }) => b.line)).toEqual([302, 303, 304]);
    expect(final.badRows[0].errors[0]).toMatchObject({ field: 'value' });
    expect(final.badRows[1].errors[0]).toMatchObject({ field: 'unit' });
    expect(final.badRows[2].errors[0]).toMatchObject({ field: 'batch_id' });
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1]!);
    expect(await readings()).toBe(before + 600);
    // the imported readings are judged like posted ones
    const judged = await testDb()('readings').where({ organization_id: org.id, client_reading_id: 'imp-0' }).first('status');
    expect(['pending', 'accepted']).toContain(judged.status);
  }, 90_000);

  it('imports the same file once: a second upload answers 200 with the first import', async () => {
    const csv = `${HEADER}\nonce-1,${batchId},${probeId},,temperature,part_b,22,degC\n`;
    const first = await upload(csv, 'a.csv');
    expect(first.status).toBe(202);
    await finished(first.body.id);
    const before = await readings();
    const again = await upload(csv, 'renamed.csv');
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ id: first.body.id, replayed: true, status: 'done', accepted: 1 });
    expect(await readings()).toBe(before);
  });

  it('takes the device from a device key when device_id is empty, and counts rows already posted as duplicates', async () => {
    const csv = `client_reading_id,batch_id,quantity,subject,value,unit\nkey-1,${batchId},humidity,ambient,45,%\nimp-0,${batchId},temperature,part_a,20,degC\n`;
    const res = await upload(csv, 'key.csv', loggerKey, 'x-api-key');
    expect(res.status).toBe(202);
    const { final } = await finished(res.body.id);
    expect(final).toMatchObject({ status: 'done', accepted: 1, duplicates: 1, rejectedRows: 0 });
    expect((await testDb()('readings').where({ organization_id: org.id, client_reading_id: 'key-1' }).first('device_id')).device_id).toBe(probeId);
  });

  it.each([
    ['an unknown column', `${HEADER},colour\nx,${randomUUID()},,,mass,part_a,1,kg,red\n`, '/file/header'],
    ['a missing required column', 'client_reading_id,quantity,subject\nx,mass,part_a\n', '/file/header'],
    ['an empty file', '', '/file'],
  ])('refuses %s at upload (422) and keeps nothing', async (_label, csv, pointer) => {
    const before = Number((await testDb()('reading_imports').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n);
    expectProblem(await upload(csv), 422, pointer);
    expect(Number((await testDb()('reading_imports').where({ organization_id: org.id }).count({ n: '*' }))[0]!.n)).toBe(before);
  });

  it('refuses a body that is not multipart (415), a binary file (415) and a viewer (403)', async () => {
    expectProblem(await t.http.post('/v1/imports').set('authorization', auth.engineer).send({ file: 'x' }), 415);
    expectProblem(await upload(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0, 0, 0xff, 0xfe])), 415);
    expectProblem(await upload(`${HEADER}\n`, 'v.csv', auth.viewer), 403);
  });

  it('lists imports newest first with Content-Range', async () => {
    const res = await t.http.get('/v1/imports').set('authorization', auth.viewer);
    expect(res.status).toBe(200);
    expect(res.headers['content-range']).toMatch(/^imports 0-\d+\/\d+$/);
    expect(res.body.length).toBeGreaterThanOrEqual(3);
    expect(res.body[0]).not.toHaveProperty('content');
  });
});
