import SwaggerParser from '@apidevtools/swagger-parser';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { startTestApp, TestApp } from './support/app.js';
import { type OpenApiDoc, ResponseContract } from './support/contract.js';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('the OpenAPI document', () => {
  it('is served at /v1/openapi.json and valid by a general-purpose validator', async () => {
    const res = await t.http.get('/v1/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.openapi).toBe('3.1.0');
    // swagger-parser mutates what it is given; hand it a copy
    const api = await SwaggerParser.validate(structuredClone(res.body));
    expect(Object.keys(api.paths ?? {}).length).toBeGreaterThan(10);
  });

  it('embeds the JSON Schemas of schemas/ as components, and every route answers problem+json on error', async () => {
    const doc = (await t.http.get('/v1/openapi.json')).body;
    expect(doc.components.schemas['api-key.create'].required).toEqual(['name', 'kind', 'scopes']);
    expect(doc.components.schemas.problem.properties.errors.type).toBe('array');
    for (const [path, item] of Object.entries<Record<string, { responses: Record<string, { content?: Record<string, unknown> }> }>>(doc.paths)) {
      for (const [method, op] of Object.entries(item)) {
        expect([path, method, Object.keys(op.responses.default?.content ?? {})]).toEqual([path, method, ['application/problem+json']]);
      }
    }
  });

  it('documents a success body with a schema for every operation (a 2xx or 3xx response; 204 has none)', async () => {
    const doc = (await t.http.get('/v1/openapi.json')).body as OpenApiDoc;
    const lacking: string[] = [];
    let operations = 0;
    for (const [path, item] of Object.entries(doc.paths)) {
      for (const [method, op] of Object.entries(item)) {
        operations++;
        const success = Object.entries(op.responses ?? {}).filter(([code]) => /^[23](\d\d|XX)$/.test(code));
        const described = success.some(([code, r]) => code === '204' || Object.values(r.content ?? {}).some((m) => m.schema && Object.keys(m.schema).length > 0));
        if (!described) lacking.push(`${method.toUpperCase()} ${path} (${op.operationId}): ${success.map(([c]) => c).join(', ') || 'no 2xx/3xx response'}`);
      }
    }
    expect(operations).toBeGreaterThan(70);
    // each names a route whose controller method needs @Responds(status, 'x.view') or @ListRoute(spec, 'x.view')
    expect(lacking).toEqual([]);
  });

  it('names the view schema of every list item and documents Content-Range on every list', async () => {
    const doc = (await t.http.get('/v1/openapi.json')).body as OpenApiDoc;
    const lists = Object.entries(doc.paths).flatMap(([path, item]) => (item.get?.responses?.['200']?.headers?.['Content-Range'] ? [[path, item.get.responses['200']] as const] : []));
    expect(lists.length).toBeGreaterThan(15);
    for (const [path, resp] of lists) {
      const schema = resp.content?.['application/json']?.schema as { type?: string; items?: { $ref?: string } } | undefined;
      expect([path, schema?.type, schema?.items?.$ref]).toEqual([path, 'array', expect.stringMatching(/^#\/components\/schemas\/.+\.view$/)]);
    }
  });

  it('the response check of the e2e suites names the operation, the status and what is wrong', async () => {
    const doc = (await t.http.get('/v1/openapi.json')).body as OpenApiDoc;
    const contract = new ResponseContract(doc);
    const device = { id: '6f1c2d3e-0000-4000-8000-000000000001', kind: 'scale', serial: 'S-1', name: 'Scale 1', station: null, stationCode: null, readabilityKg: 0.001, capacityKg: 6, calibrationDue: null, calibrationOverdue: false, retired: false, createdAt: '2026-06-01T08:00:00.000Z', updatedAt: '2026-06-01T08:00:00.000Z' };
    const json = { 'content-type': 'application/json; charset=utf-8' };
    const check = (status: number, body: unknown, route = '/v1/devices/:id', method = 'GET', headers: Record<string, unknown> = json) =>
      contract.check({ method, route, url: route, status, headers, payload: JSON.stringify(body) });
    expect(check(200, device)).toBeNull();
    expect(check(200, { ...device, kind: 'kettle' })).toMatch(/^GET \/v1\/devices\/\{id\} \(Devices_get\) answered 200 .*body\/kind must be equal to one of the allowed values/);
    expect(check(200, { ...device, extra: 1 })).toMatch(/must NOT have additional properties/);
    expect(check(200, { ...device, createdAt: 'yesterday' })).toMatch(/body\/createdAt must match format "date-time"/);
    expect(check(404, { type: 'about:blank', title: 'Not Found', status: 404 }, '/v1/devices/:id', 'GET', { 'content-type': 'application/problem+json' })).toBeNull();
    expect(check(404, { title: 'Not Found' }, '/v1/devices/:id', 'GET', { 'content-type': 'application/problem+json' })).toMatch(/must have required property 'type'/);
    expect(check(202, device)).toMatch(/answered 202, which the document does not list/);
    expect(check(200, [device], '/v1/devices', 'GET')).toMatch(/without the documented content-range header/);
    expect(check(200, [device], '/v1/devices', 'GET', { ...json, 'content-range': 'devices 0-0/1' })).toBeNull();
    expect(check(200, {}, '/v1/gadgets/:id')).toMatch(/GET \/v1\/gadgets\/\{id\}: the route is not in the OpenAPI document/);
  });

  it('serves the interactive docs at /docs', async () => {
    const res = await t.http.get('/docs');
    expect(res.status).toBe(200);
    expect(res.text).toContain('swagger-ui');
  });
});
