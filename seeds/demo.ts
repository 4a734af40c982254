import argon2 from 'argon2';
import type { Knex } from 'knex';
import { seedShopDemo } from './shop-demo.js';
import { seedControlDemo } from './control-demo.js';
import { seedPlanToPartDemo } from './plan-to-part-demo.js';

/** The password of every demo account. Local demo only: the seed refuses to run in production. */
export const DEMO_PASSWORD = 'pourgate-demo';

export const DEMO_ORGS = [
  {
    slug: 'demo-shop',
    name: 'Demo shop',
    unitSystem: 'metric' as const,
    people: [
      { email: 'admin@demo.test', name: 'Ines Varga', role: 'admin' },
      { email: 'engineer@demo.test', name: 'Tomas Okafor', role: 'engineer' },
      { email: 'integrator@demo.test', name: 'Priya Lindqvist', role: 'integrator' },
      { email: 'viewer@demo.test', name: 'Sam Delacroix', role: 'viewer' },
    ],
  },
  {
    // a second, unrelated organization: proves that nothing crosses organizations
    slug: 'other-shop',
    name: 'Other shop',
    unitSystem: 'imperial' as const,
    people: [
      { email: 'admin@other.test', name: 'Jo Marsh', role: 'admin' },
      { email: 'engineer@other.test', name: 'Ravi Castell', role: 'engineer' },
    ],
  },
];

/**
 * The demo scenario: an invented foam shop and a second organization. Idempotent: rows are
 * found by their natural keys and only missing ones are added.
 */
export async function seedDemo(db: Knex): Promise<string> {
  if (process.env.NODE_ENV === 'production') throw new Error('The demo seed refuses to run with NODE_ENV=production.');
  let added = 0;
  const hash = await argon2.hash(DEMO_PASSWORD);
  for (const org of DEMO_ORGS) {
    let row = await db('organizations').where({ slug: org.slug }).first();
    if (!row) {
      [row] = await db('organizations').insert({ slug: org.slug, name: org.name, unit_system: org.unitSystem }).returning('*');
      added++;
    }
    for (const p of org.people) {
      const exists = await db('users').where({ email: p.email }).first('id');
      if (exists) continue;
      await db('users').insert({ organization_id: row.id, email: p.email, name: p.name, role: p.role, password_hash: hash, unit_system: org.unitSystem });
      added++;
    }
    if (org.slug === 'demo-shop') added += await seedShopDemo(db, row.id);
    if (org.slug === 'demo-shop') added += await seedControlDemo(db, row.id);
    if (org.slug === 'demo-shop') added += await seedPlanToPartDemo(db, row.id);
  }
  return added ? `${added} rows added` : 'up to date';
}
