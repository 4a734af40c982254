import SwaggerParser from '@apidevtools/swagger-parser';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { startTestApp, TestApp } from './support/app.js';

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

  it('serves the interactive docs at /docs', async () => {
    const res = await t.http.get('/docs');
    expect(res.status).toBe(200);
    expect(res.text).toContain('swagger-ui');
  });
});
