import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startObjectStore, type ObjectStore } from '../../fakes/src/object-store.js';
import { closeTestDb, makeOrg, type OrgFixture, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { makePdf } from './support/pdf.js';
import { flexSystem } from './support/shop.js';

// The same documents API, this time through the AWS S3 SDK into the S3-compatible stand-in.
let store: ObjectStore;
let t: TestApp;
let org: OrgFixture;
let auth: Record<string, string>;
let systemId: string;

beforeAll(async () => {
  store = await startObjectStore({ dir: fs.mkdtempSync(path.join(os.tmpdir(), 'pourgate-objects-')) });
  // the stand-in's keys, as npm start sets them (without keys the SDK's default credential chain is used)
  t = await startTestApp({ S3_ENDPOINT: store.url, S3_BUCKET: 'shop-documents', S3_ACCESS_KEY_ID: 'pourgate-local', S3_SECRET_ACCESS_KEY: 'pourgate-local-secret', DOCUMENT_MAX_BYTES: String(64 * 1024) });
  org = await makeOrg('s3');
  auth = await tokensFor(t.http, org);
  systemId = (await t.http.post('/v1/material-systems').set('authorization', auth.engineer).send(flexSystem())).body.id;
}, 60_000);
afterAll(async () => {
  await t.close();
  await store.close();
  fs.rmSync(store.dir, { recursive: true, force: true });
  await closeTestDb();
});

describe('documents in S3-compatible object storage', () => {
  it('an upload lands in the bucket under its key and downloads byte for byte', async () => {
    const pdf = makePdf('Safety data sheet - part A');
    const res = await t.http.post(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.engineer).field('kind', 'SDS').attach('file', pdf, { filename: 'part-a-sds.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(201);
    expect(store.keys('shop-documents')).toEqual([`${org.id}/${res.body.id}.pdf`]);
    const got = await t.http.get(`/v1/material-systems/${systemId}/documents/${res.body.id}/content`).set('authorization', auth.viewer).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(got.status).toBe(200);
    expect(Buffer.compare(got.body as Buffer, pdf)).toBe(0);
  });

  it('a refused upload leaves nothing in the bucket', async () => {
    const before = store.keys('shop-documents');
    const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(100)]);
    const res = await t.http.post(`/v1/material-systems/${systemId}/documents`).set('authorization', auth.engineer).field('kind', 'SDS').attach('file', png, { filename: 'fake.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(415);
    expect(store.keys('shop-documents')).toEqual(before);
  });
});
