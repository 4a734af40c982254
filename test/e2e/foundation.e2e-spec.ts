import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { startTestApp, TestApp } from './support/app.js';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

function expectProblem(res: { status: number; headers: Record<string, string>; body: unknown; text: string }, status: number) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  const body = JSON.parse(res.text) as Record<string, unknown>;
  expect(body).toMatchObject({ status, title: expect.any(String), type: expect.any(String) });
  return body;
}

describe('health and readiness', () => {
  it('GET /v1/health answers ok without touching dependencies', async () => {
    const res = await t.http.get('/v1/health');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.headers['x-request-id']).toBeTruthy();
  });

  it('GET /v1/ready reports PostgreSQL and Redis up', async () => {
    const res = await t.http.get('/v1/ready');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.info.postgres.status).toBe('up');
    expect(res.body.info.redis.status).toBe('up');
  });
});

describe('errors are RFC 9457 problem details, never a 500', () => {
  it('unknown route -> 404', async () => {
    const body = expectProblem(await t.http.get('/v1/no-such-thing'), 404);
    expect(body.instance).toBe('/v1/no-such-thing');
  });

  it('wrong method on a known path -> 405 with Allow', async () => {
    const res = await t.http.delete('/v1/health');
    expectProblem(res, 405);
    expect(res.headers.allow).toContain('GET');
  });

  it('malformed JSON -> 400', async () => {
    const res = await t.http.post('/v1/auth/sign-in').set('content-type', 'application/json').send('{"broken": ');
    expectProblem(res, 400);
  });

  it('wrong content type -> 415', async () => {
    const res = await t.http.post('/v1/auth/sign-in').set('content-type', 'text/csv').send('a,b\n1,2');
    expectProblem(res, 415);
  });

  it('oversized body -> 413', async () => {
    const big = JSON.stringify({ blob: 'x'.repeat(1_100_000) });
    const res = await t.http.post('/v1/auth/sign-in').set('content-type', 'application/json').send(big);
    expectProblem(res, 413);
  });

  it('each problem type is described at its own URI', async () => {
    const res = await t.http.get('/v1/problems/validation-failed');
    expect(res.status).toBe(200);
    expect(res.body.type).toBe('/v1/problems/validation-failed');
  });
});
