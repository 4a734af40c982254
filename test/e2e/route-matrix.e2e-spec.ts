import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomBytes, randomUUID } from 'node:crypto';
import { ACTIONS, type Action, type ActionRule, API_KEY_SCOPES, refusedScopes, roleAllows, ROLES, type Role } from '@pourgate/permissions';
import { sha256 } from '../../api/src/auth/tokens.service.js';
import { closeTestDb, makeOrg, type OrgFixture, testDb, tokensFor } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/app.js';
import { shopFixtures } from './support/shop.js';

/**
 * Every route of the OpenAPI document × every role × (own organization, other organization),
 * expected statuses derived from the same matrix the guards use. A route that declares neither an
 * action nor `public`, or an `{id}` route with no fixture below, fails this suite.
 */
interface Op {
  method: string;
  path: string;
  action?: Action;
  isPublic: boolean;
}

let t: TestApp;
let mine: OrgFixture;
let theirs: OrgFixture;
let auth: Record<Role, string>;
let allScopesKey: string;
let ops: Op[] = [];
const foreignIds: Record<string, string> = {};

/** Makes one record of each resource in the other organization; keyed by the path's collection. */
const fixtures: Record<string, (org: OrgFixture) => Promise<string>> = {
  users: async (org) => org.people.viewer.id,
  invitations: async (org) => (await testDb()('invitations').insert({ organization_id: org.id, email: `inv-${randomUUID()}@fixture.test`, role: 'viewer', token_hash: sha256(randomUUID()), expires_at: new Date(Date.now() + 3600_000) }).returning('id'))[0].id,
  'api-keys': async (org) => (await testDb()('api_keys').insert({ organization_id: org.id, name: 'foreign', kind: 'device', environment: 'live', scopes: ['devices:read'], prefix: 'pgd_live_xxxxxxx', secret_hash: sha256(randomUUID()) }).returning('id'))[0].id,
  devices: async (org) => (await testDb()('devices').insert({ organization_id: org.id, kind: 'thermometer', serial: `F-${randomUUID()}`, name: 'foreign probe' }).returning('id'))[0].id,
  ...shopFixtures,
  readings: async (org) => {
    const batchId = await shopFixtures.batches!(org);
    const [dev] = await testDb()('devices').insert({ organization_id: org.id, kind: 'scale', serial: `F-${randomUUID()}`, name: 'foreign scale' }).returning('id');
    return (await testDb()('readings').insert({ organization_id: org.id, batch_id: batchId, device_id: dev.id, client_reading_id: randomUUID(), quantity: 'mass', subject: 'part_a', value_si: 1, unit_given: 'kg', value_given: 1, status: 'rejected' }).returning('id'))[0].id;
  },
  // one chart: its id stands for every control/{id} route (a signal with that id does not exist there either)
  control: async (org) => (await testDb()('control_charts').insert({ organization_id: org.id, name: 'foreign chart', material_system_id: await shopFixtures['material-systems']!(org), metric: 'ratio_error_percent', rules: ['WE1'] }).returning('id'))[0].id,
  'webhook-endpoints': async (org) => (await foreignEndpoint(org)).id,
  'webhook-deliveries': async (org) => {
    const ep = await foreignEndpoint(org);
    const [ev] = await testDb()('events').insert({ organization_id: org.id, type: 'batch.created', subject_type: 'batch', subject_id: 'x', payload: '{}', relayed_at: new Date() }).returning('id');
    return (await testDb()('webhook_deliveries').insert({ organization_id: org.id, endpoint_id: ep.id, event_id: ev.id, event_type: 'batch.created', status: 'dead' }).returning('id'))[0].id;
  },
};

async function foreignEndpoint(org: OrgFixture): Promise<{ id: string }> {
  const [row] = await testDb()('webhook_endpoints').insert({ organization_id: org.id, url: 'https://erp.invalid/hooks', secret_enc: 'v1.x.x.x' }).returning('id');
  return row;
}

const collectionOf = (path: string) => path.replace(/^\/v1\//, '').split('/')[0];

function call(method: string, url: string, headers: Record<string, string>) {
  const r = (t.http as unknown as Record<string, (u: string) => import('supertest').Test>)[method](url);
  for (const [k, v] of Object.entries(headers)) r.set(k, v);
  return ['post', 'put', 'patch'].includes(method) ? r.send({}) : r;
}

beforeAll(async () => {
  t = await startTestApp();
  mine = await makeOrg('matrix-a');
  theirs = await makeOrg('matrix-b');
  auth = await tokensFor(t.http, mine);
  const secret = `pgi_live_${randomBytes(32).toString('base64url')}`;
  await testDb()('api_keys').insert({ organization_id: mine.id, name: 'all scopes', kind: 'integration', environment: 'live', scopes: [...API_KEY_SCOPES], prefix: secret.slice(0, 16), secret_hash: sha256(secret) });
  allScopesKey = secret;
  const doc = (await t.http.get('/v1/openapi.json')).body as { paths: Record<string, Record<string, Record<string, unknown>>> };
  ops = Object.entries(doc.paths).flatMap(([path, item]) =>
    Object.entries(item).map(([method, op]) => ({ method, path, action: op['x-pourgate-action'] as Action | undefined, isPublic: op['x-pourgate-public'] === true })),
  );
  for (const op of ops.filter((o) => o.path.includes('{id}'))) {
    const col = collectionOf(op.path);
    if (fixtures[col] && !foreignIds[col]) foreignIds[col] = await fixtures[col](theirs);
  }
}, 180_000);
afterAll(async () => {
  await t.close();
  await closeTestDb();
});

describe('route × role × organization matrix', () => {
  it('every route declares an action from the matrix, or is public', () => {
    expect(ops.length).toBeGreaterThan(15);
    const undeclared = ops.filter((o) => !o.isPublic && !(o.action && o.action in ACTIONS)).map((o) => `${o.method.toUpperCase()} ${o.path}`);
    expect(undeclared).toEqual([]);
  });

  it('every {id} route has a fixture in the other organization', () => {
    const missing = [...new Set(ops.filter((o) => o.path.includes('{id}') && !o.isPublic).map((o) => collectionOf(o.path)))].filter((c) => !fixtures[c]);
    expect(missing).toEqual([]);
  });

  it('people: allowed roles pass the guard, others get 403; nobody gets in without credentials', async () => {
    const wrong: string[] = [];
    for (const op of ops.filter((o) => !o.isPublic)) {
      const url = op.path.replace('{id}', randomUUID());
      const anon = await call(op.method, url, {});
      if (anon.status !== 401) wrong.push(`${op.method} ${op.path} anonymous -> ${anon.status}`);
      for (const role of ROLES) {
        const res = await call(op.method, url, { authorization: auth[role] });
        const allowed = (ACTIONS[op.action!] as ActionRule).roles.includes(role);
        const ok = allowed ? ![401, 403].includes(res.status) && res.status < 500 : res.status === 403;
        if (!ok) wrong.push(`${op.method} ${op.path} as ${role} -> ${res.status} (expected ${allowed ? 'through the guard' : 403})`);
      }
    }
    expect(wrong).toEqual([]);
  }, 180_000);

  it('another organization’s records answer 404 to every role that may see its own', async () => {
    const wrong: string[] = [];
    for (const op of ops.filter((o) => !o.isPublic && o.path.includes('{id}'))) {
      const url = op.path.replace('{id}', foreignIds[collectionOf(op.path)]);
      for (const role of ROLES) {
        if (!(ACTIONS[op.action!] as ActionRule).roles.includes(role)) continue;
        const res = await call(op.method, url, { authorization: auth[role] });
        const ok = op.method === 'get' ? res.status === 404 : [404, 422].includes(res.status);
        if (!ok) wrong.push(`${op.method} ${op.path} as ${role} -> ${res.status}`);
      }
    }
    expect(wrong).toEqual([]);
  }, 180_000);

  it('an API key passes only where the action names a scope, and never on people’s routes', async () => {
    const wrong: string[] = [];
    for (const op of ops.filter((o) => !o.isPublic)) {
      const res = await call(op.method, op.path.replace('{id}', randomUUID()), { 'x-api-key': allScopesKey });
      const scoped = Boolean((ACTIONS[op.action!] as ActionRule).scope);
      const ok = scoped ? ![401, 403].includes(res.status) && res.status < 500 : res.status === 403;
      if (!ok) wrong.push(`${op.method} ${op.path} with key -> ${res.status}`);
    }
    expect(wrong).toEqual([]);
  }, 180_000);
});

describe('key creation: every role × kind × scope', () => {
  it('a key is issued only with scopes its issuer may grant and its kind may hold; a refusal names the scope', async () => {
    const wrong: string[] = [];
    for (const role of ROLES) {
      for (const kind of ['device', 'integration'] as const) {
        for (const scope of API_KEY_SCOPES) {
          const res = await t.http.post('/v1/api-keys').set('authorization', auth[role]).send({ name: `${role} ${kind} ${scope}`, kind, scopes: [scope] });
          const mayManage = roleAllows(role, 'api-keys:manage') && !(role === 'integrator' && kind === 'integration');
          const expected = mayManage && refusedScopes(role, kind, [scope]).length === 0 ? 201 : 403;
          if (res.status !== expected) wrong.push(`${role} ${kind} ${scope} -> ${res.status} (expected ${expected})`);
          else if (expected === 403 && mayManage && !String(res.body.detail).includes(scope)) wrong.push(`${role} ${kind} ${scope}: the refusal does not name the scope`);
          else if (expected === 201 && (res.body.kind !== kind || res.body.scopes.join() !== scope)) wrong.push(`${role} ${kind} ${scope}: issued ${res.body.kind} ${res.body.scopes}`);
        }
      }
    }
    expect(wrong).toEqual([]);
  }, 180_000);
});
