import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Role } from '@pourgate/permissions';
import { closeTestDb, makeOrg, type OrgFixture, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { makePdf } from './support/pdf.js';
import { expectProblem, flexSystem, shopCounts } from './support/shop.js';

const LIMIT = 64 * 1024;
let t: TestApp;
let org: OrgFixture;
let other: OrgFixture;
let auth: Record<Role, string>;
let otherAuth: Record<Role, string>;
let dir: string;
let systemId: string;

/** Every file the store holds, relative to its folder. */
function stored(): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => path.relative(dir, path.join(e.parentPath, e.name))).sort();
}

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pourgate-documents-'));
  t = await startTestApp({ DOCUMENTS_DIR: dir, DOCUMENT_MAX_BYTES: String(LIMIT) });
  org = await makeOrg('docs');
  other = await makeOrg('docs-other');
  auth = await tokensFor(t.http, org);
  otherAuth = await tokensFor(t.http, other);
  systemId = (await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem())).body.id;
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
  fs.rmSync(dir, { recursive: true, force: true });
});

const upload = (role: Role, file: Buffer, kind = 'SDS', name = 'demo-flex-part-b-sds.pdf', type = 'application/pdf', system = systemId, token = auth[role]) =>
  t.http.post(`/v1/material-systems/${system}/documents`).set('authorization', token).field('kind', kind).attach('file', file, { filename: name, contentType: type });

describe('SDS and TDS documents of a material system', () => {
  let docId: string;
  const pdf = makePdf('Safety data sheet - Demo Flex part B');

  it('an engineer uploads a real PDF; it is stored byte for byte', async () => {
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const res = await upload('engineer', pdf);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'SDS', fileName: 'demo-flex-part-b-sds.pdf', contentType: 'application/pdf', sizeBytes: pdf.length, materialSystemId: systemId });
    expect(res.body.sha256).toBe(createHash('sha256').update(pdf).digest('hex'));
    docId = res.body.id;
    expect(stored()).toEqual([`${org.id}/${docId}.pdf`]);
    expect(fs.readFileSync(path.join(dir, org.id, `${docId}.pdf`)).equals(pdf)).toBe(true);
    const tds = await upload('engineer', makePdf('Technical data sheet'), 'TDS', 'tds.pdf');
    expect(tds.status).toBe(201);
  });

  it('everyone who reads shop data can list and download it (workers must reach the SDS)', async () => {
    const list = await t.http.get(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.viewer);
    expect(list.status).toBe(200);
    expect(list.body.map((d: { kind: string }) => d.kind)).toEqual(['SDS', 'TDS']);
    const sds = await t.http.get(`/v1/material-systems/${systemId}/documents`).query({ kind: 'SDS' }).set('authorization', auth.viewer);
    expect(sds.body).toHaveLength(1);
    const dl = await t.http.get(list.body[0].href).set('authorization', auth.viewer).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(dl.status).toBe(200);
    expect(dl.headers['content-type']).toBe('application/pdf');
    expect(dl.headers['content-disposition']).toContain('filename="demo-flex-part-b-sds.pdf"');
    expect((dl.body as Buffer).equals(pdf)).toBe(true);
    const system = await t.http.get(`/v1/material-systems/${systemId}`).set('authorization', auth.viewer);
    expect(system.body.documents).toEqual({ sds: 1, tds: 1 });
  });

  it('targets for the system point to its SDS', async () => {
    const res = await t.http.post('/v1/targets/preview').set('authorization', auth.viewer).send({ system: { id: systemId }, freeRiseCup: { volume: { value: 500, unit: 'mL' } } });
    expect(res.status).toBe(200);
    expect(res.body.documents.sdsOnFile).toBe(true);
    expect(res.body.documents.safetyDataSheets.map((d: { id: string }) => d.id)).toEqual([docId]);
  });

  it('a file that is not a PDF is refused by its content (415), whatever its name and type say', async () => {
    const before = await shopCounts(org.id);
    const files = stored();
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c489', 'hex');
    const res = await upload('engineer', png, 'SDS', 'looks-like.pdf', 'application/pdf');
    expectProblem(res, 415, '/file');
    expect(await shopCounts(org.id)).toEqual(before);
    expect(stored()).toEqual(files);
  });

  it('a PDF over the size limit is refused with 413', async () => {
    const big = makePdf('Too large', LIMIT + 4096);
    expect(big.length).toBeGreaterThan(LIMIT);
    const before = await shopCounts(org.id);
    const files = stored();
    const res = await upload('engineer', big);
    expectProblem(res, 413);
    expect(res.body.type).toBe('/v1/problems/payload-too-large');
    expect(await shopCounts(org.id)).toEqual(before);
    expect(stored()).toEqual(files);
  });

  it('bad forms: no multipart → 415; an unknown kind or no file → 422', async () => {
    const before = await shopCounts(org.id);
    expectProblem(await t.http.post(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.engineer).send({ kind: 'SDS' }), 415);
    expectProblem(await upload('engineer', pdf, 'MSDS'), 422, '/kind');
    expectProblem(await t.http.post(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.engineer).field('kind', 'SDS'), 422, '/file');
    expect(await shopCounts(org.id)).toEqual(before);
  });

  it('JSON routes are untouched by multipart: a form sent to one is a 422, not a 500', async () => {
    const res = await t.http.post('/v1/molds').set('authorization', auth.engineer).field('name', 'x');
    expectProblem(res, 422);
    expect((await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem())).status).toBe(201);
  });

  it('a viewer cannot upload (403); another organization gets 404', async () => {
    const before = await shopCounts(org.id);
    expectProblem(await upload('viewer', pdf), 403);
    expectProblem(await upload('engineer', pdf, 'SDS', 'x.pdf', 'application/pdf', systemId, otherAuth.engineer), 404);
    expect(await shopCounts(org.id)).toEqual(before);
    expectProblem(await t.http.get(`/v1/material-systems/${systemId}/documents`).set('authorization', otherAuth.viewer), 404);
    expectProblem(await t.http.get(`/v1/material-systems/${systemId}/documents/${docId}/content`).set('authorization', otherAuth.viewer), 404);
  });
});

describe('retried uploads', () => {
  it('honours an Idempotency-Key on the upload: the same file again is the first document, another file is a 422', async () => {
    const key = `upload-${Date.now()}`;
    const file = makePdf('Safety data sheet - retried upload');
    const send = (f: Buffer) => t.http.post(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.engineer).set('idempotency-key', key).field('kind', 'SDS').attach('file', f, { filename: 'retry.pdf', contentType: 'application/pdf' });
    const first = await send(file);
    expect(first.status).toBe(201);
    const again = await send(file);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body.id).toBe(first.body.id);
    const other = await send(makePdf('Another sheet'));
    expect(other.status).toBe(422);
    expect(other.body.type).toBe('/v1/problems/idempotency-key-reused');
    expect(stored().filter((f) => f.includes(first.body.id))).toHaveLength(1);
  });
});
