import argon2 from 'argon2';
import knexPkg from 'knex';
import type { Knex } from 'knex';
import { randomUUID } from 'node:crypto';
import type request from 'supertest';
import type { Role } from '@pourgate/permissions';

const { knex } = knexPkg;

let shared: Knex | undefined;
/** A direct connection to the test database, for arranging fixtures and checking what was written. */
export function testDb(): Knex {
  shared ??= knex({ client: 'pg', connection: process.env.DATABASE_URL, pool: { min: 0, max: 4 } });
  return shared;
}

export async function closeTestDb(): Promise<void> {
  await shared?.destroy();
  shared = undefined;
}

export const PASSWORD = 'fixture-password-1';
let cachedHash: Promise<string> | undefined;

export interface OrgFixture {
  id: string;
  name: string;
  people: Record<Role, { id: string; email: string }>;
}

/** A fresh organization with one person of each role, so suites never disturb one another. */
export async function makeOrg(label: string): Promise<OrgFixture> {
  const db = testDb();
  cachedHash ??= argon2.hash(PASSWORD);
  const hash = await cachedHash;
  const tag = `${label}-${randomUUID().slice(0, 8)}`;
  const [org] = await db('organizations').insert({ name: `Fixture ${tag}`, slug: tag }).returning('*');
  const people = {} as OrgFixture['people'];
  for (const role of ['admin', 'engineer', 'integrator', 'viewer'] as const) {
    const email = `${role}.${tag}@fixture.test`;
    const [u] = await db('users').insert({ organization_id: org.id, email, name: `${role} of ${tag}`, role, password_hash: hash }).returning('id');
    people[role] = { id: u.id, email };
  }
  return { id: org.id, name: org.name, people };
}

export async function signIn(http: ReturnType<typeof request>, email: string, password = PASSWORD): Promise<{ token: string; refreshToken: string; body: Record<string, unknown> }> {
  const res = await http.post('/v1/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${res.text}`);
  return { token: res.body.accessToken, refreshToken: res.body.refreshToken, body: res.body };
}

/** Signs in every person of an org; returns role -> bearer header value. */
export async function tokensFor(http: ReturnType<typeof request>, org: OrgFixture): Promise<Record<Role, string>> {
  const out = {} as Record<Role, string>;
  for (const [role, p] of Object.entries(org.people) as [Role, { email: string }][]) {
    out[role] = `Bearer ${(await signIn(http, p.email)).token}`;
  }
  return out;
}
