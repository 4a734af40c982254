import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { startTestApp, TestApp } from './support/app.js';
// the same code `npm start` and `npm test` use to run PostgreSQL; here a cluster of this suite's own
import { startPostgres } from '../../scripts/lib/services.mjs';

interface Pg {
  url(db: string): string;
  stop(): void;
}

// A PostgreSQL cluster of this suite's own, so stopping it disturbs no other suite.
const port = Number(process.env.READINESS_PGPORT ?? 55499);
let pg: Pg;
let t: TestApp;

beforeAll(async () => {
  pg = (await startPostgres({ name: `pg-readiness-${port}`, port, fast: true, databases: ['readiness'] })) as Pg;
  t = await startTestApp({ DATABASE_URL: pg.url('readiness') });
}, 90_000);
afterAll(async () => {
  await t.close();
  pg.stop();
});

describe('readiness follows PostgreSQL', () => {
  it('ready while PostgreSQL runs, 503 problem+json once it is stopped, health still alive', async () => {
    expect((await t.http.get('/v1/ready')).status).toBe(200);
    pg.stop();
    const down = await t.http.get('/v1/ready');
    expect(down.status).toBe(503);
    expect(down.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(down.headers['retry-after']).toBeTruthy();
    expect(down.body.checks.postgres.status).toBe('down');
    expect((await t.http.get('/v1/health')).status).toBe(200);
  }, 30_000);
});
