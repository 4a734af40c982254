import { getQueueToken } from '@nestjs/bull';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { Queue } from 'bull';
import { QUEUES } from '../../api/src/queues/queues.module.js';
import { closeTestDb, makeOrg, OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, TestApp } from './support/app.js';

let t: TestApp;
let org: OrgFixture;
let admin: string;
beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', OUTBOX_RELAY: 'off' });
  org = await makeOrg('lists');
  admin = (await tokensFor(t.http, org)).admin;
  const rows = Array.from({ length: 12 }, (_, i) => ({ organization_id: org.id, kind: 'thermometer', serial: `T-${String(i).padStart(2, '0')}`, name: `Probe ${String(i).padStart(2, '0')}` }));
  await testDb()('devices').insert(rows);
}, 60_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('lists speak the ra-data-simple-rest protocol', () => {
  it('range is inclusive and Content-Range carries the total, exposed through CORS', async () => {
    const res = await t.http.get('/v1/devices').set('authorization', admin).set('origin', 'http://127.0.0.1:5173').query({ range: '[5,9]', sort: '["serial","ASC"]' });
    expect(res.status).toBe(200);
    expect(res.body.map((d: { serial: string }) => d.serial)).toEqual(['T-05', 'T-06', 'T-07', 'T-08', 'T-09']);
    expect(res.headers['content-range']).toBe('devices 5-9/12');
    expect(res.headers['access-control-expose-headers']).toContain('Content-Range');
  });

  it('sorts both ways and filters', async () => {
    const desc = await t.http.get('/v1/devices').set('authorization', admin).query({ range: '[0,2]', sort: '["serial","DESC"]' });
    expect(desc.body.map((d: { serial: string }) => d.serial)).toEqual(['T-11', 'T-10', 'T-09']);
    const filtered = await t.http.get('/v1/devices').set('authorization', admin).query({ filter: JSON.stringify({ q: 'probe 1' }) });
    expect(filtered.body.map((d: { serial: string }) => d.serial).sort()).toEqual(['T-10', 'T-11']);
    expect(filtered.headers['content-range']).toBe('devices 0-1/2');
    const many = await t.http.get('/v1/devices').set('authorization', admin).query({ filter: JSON.stringify({ id: [desc.body[0].id, desc.body[1].id] }) });
    expect(many.body).toHaveLength(2);
  });

  it.each([
    ['range', 'not json', '/range'],
    ['range', '[5,2]', '/range'],
    ['range', '[0,100000]', '/range'],
    ['sort', '["password","ASC"]', '/sort/0'],
    ['sort', '["name","SIDEWAYS"]', '/sort'],
    ['filter', '{"nope":1}', '/filter/nope'],
    ['filter', '[1,2]', '/filter'],
  ])('a bad %s (%s) is a 400 problem pointing at %s', async (param, value, pointer) => {
    const res = await t.http.get('/v1/devices').set('authorization', admin).query({ [param]: value });
    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(res.body.errors.map((e: { pointer: string }) => e.pointer)).toContain(pointer);
  });

  it('an empty page still has a Content-Range', async () => {
    const res = await t.http.get('/v1/devices').set('authorization', admin).query({ filter: JSON.stringify({ q: 'no such probe' }) });
    expect(res.body).toEqual([]);
    expect(res.headers['content-range']).toBe('devices 0-0/0');
  });
});

describe('totals too large to count', () => {
  it('reports an exact total up to the cap and * beyond it (RFC 9110 unknown length), the page unchanged', async () => {
    const { listPage } = await import('../../api/src/common/lists/knex-list.js');
    const { parseListQuery, setContentRange } = await import('../../api/src/common/lists/list-query.js');
    const spec = { resource: 'devices', sortable: ['serial'], filters: {}, defaultSort: ['serial', 'ASC'] as [string, 'ASC'] };
    const q = parseListQuery({ range: '[0,4]' }, spec);
    const base = () => testDb()('devices').where({ organization_id: org.id }).select('serial', 'id');
    expect((await listPage(base(), q, spec, {}, 12)).total).toBe(12);
    const over = await listPage<{ serial: string }>(base(), q, spec, {}, 11);
    expect(over.total).toBeNull();
    expect(over.rows.map((r) => r.serial)).toEqual(['T-00', 'T-01', 'T-02', 'T-03', 'T-04']);
    const headers: Record<string, string> = {};
    setContentRange({ header: (k: string, v: string) => (headers[k] = v) } as never, 'devices', q, over.rows.length, over.total);
    expect(headers['content-range']).toBe('devices 0-4/*');
  });
});

describe('Bull queues run on the real Redis', () => {
  it('a heartbeat job goes through Redis to the processor and back', async () => {
    const queue = t.app.get<Queue>(getQueueToken(QUEUES.heartbeat));
    const sentAt = new Date().toISOString();
    const job = await queue.add({ sentAt });
    const result = (await job.finished()) as { sentAt: string; handledAt: string; pid: number };
    expect(result.sentAt).toBe(sentAt);
    expect(result.pid).toBe(process.pid);
    expect(new Date(result.handledAt).getTime()).toBeGreaterThanOrEqual(new Date(sentAt).getTime());
  });
});
