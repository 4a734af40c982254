import { expect } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import type { OrgFixture } from './fixtures.js';
import { testDb } from './fixtures.js';

export { flexSystem } from './systems.js';

/** A mold given as a box in millimetres. */
export function boxMold(overrides: Record<string, unknown> = {}) {
  return {
    name: `Test block ${randomUUID().slice(0, 6)}`,
    cavity: { kind: 'box', length: { value: 300, unit: 'mm' }, width: { value: 200, unit: 'mm' }, height: { value: 50, unit: 'mm' } },
    cavities: 1,
    defaultPackFactor: 1.5,
    ...overrides,
  };
}

export function expectProblem(res: { status: number; headers: Record<string, string>; body: { errors?: { pointer: string }[] } }, status: number, pointer?: string) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  if (pointer !== undefined) expect((res.body.errors ?? []).map((e) => e.pointer)).toContain(pointer);
}

/** Row counts of the shop tables of one organization, to show that a refused request wrote nothing. */
export async function shopCounts(orgId: string): Promise<Record<string, number>> {
  const tables = ['material_systems', 'material_system_revisions', 'lots', 'molds', 'work_orders', 'batches', 'batch_state_transitions', 'qc_cup_tests', 'material_system_documents', 'audit_events'];
  const out: Record<string, number> = {};
  for (const t of tables) out[t] = Number((await testDb()(t).where({ organization_id: orgId }).count({ n: '*' }))[0]!.n);
  return out;
}

async function systemRow(org: OrgFixture) {
  const [ms] = await testDb()('material_systems').insert({ organization_id: org.id, name: `foreign ${randomUUID()}`, kind: 'flexible' }).returning('id');
  const [rev] = await testDb()('material_system_revisions')
    .insert({ organization_id: org.id, material_system_id: ms.id, revision: 1, ratio_basis: 'weight', ratio_a: 100, ratio_b: 50, specific_gravity_a: 1.1, specific_gravity_b: 1.2, isocyanate_part: 'B', free_rise_density_kg_m3: 45, free_rise_reference_temperature_c: 22 })
    .returning('id');
  return { systemId: ms.id as string, revisionId: rev.id as string };
}

/** One record of each shop resource in an organization, keyed by the path's collection (for the route matrix). */
export const shopFixtures: Record<string, (org: OrgFixture) => Promise<string>> = {
  'material-systems': async (org) => (await systemRow(org)).systemId,
  lots: async (org) => (await testDb()('lots').insert({ organization_id: org.id, part: 'pigment', lot_number: `F-${randomUUID()}`, received_on: '2026-01-05', expires_on: '2027-01-05' }).returning('id'))[0].id,
  molds: async (org) =>
    (await testDb()('molds').insert({ organization_id: org.id, name: `foreign ${randomUUID()}`, cavity_kind: 'entered', cavity_measurement: JSON.stringify({ kind: 'entered', volume: { value: 1, unit: 'L' } }), gross_cavity_volume_m3: 0.001, cavity_volume_m3: 0.001, total_volume_m3: 0.001 }).returning('id'))[0].id,
  'work-orders': async (org) => (await testDb()('work_orders').insert({ organization_id: org.id, external_ref: `F-${randomUUID()}`, quantity: 1, request_hash: 'x' }).returning('id'))[0].id,
  batches: async (org) => {
    const { systemId, revisionId } = await systemRow(org);
    return (
      await testDb()('batches')
        .insert({ organization_id: org.id, material_system_id: systemId, material_system_revision_id: revisionId, subject: 'free_rise_cup', planned_for: '2026-01-05', options: '{}', computation_version: 'fixture', targets: '{}', total_mass_kg: 0.1 })
        .returning('id')
    )[0].id;
  },
  parts: async (org) => {
    const batchId = await shopFixtures.batches!(org);
    return (
      await testDb()('parts')
        .insert({ organization_id: org.id, batch_id: batchId, mass_kg: 0.1, mass_source: 'entered', cavity_volume_m3: 0.002, molded_density_kg_m3: 50, target_density_kg_m3: 50, tolerance_percent: 10, density_verdict: 'within' })
        .returning('id')
    )[0].id;
  },
  'defect-causes': async (org) => (await testDb()('defect_causes').insert({ organization_id: org.id, code: `f_${randomUUID().slice(0, 8)}`, name: 'foreign cause' }).returning('id'))[0].id,
  imports: async (org) =>
    (await testDb()('reading_imports').insert({ organization_id: org.id, file_name: 'fixture.csv', sha256: randomUUID(), size_bytes: 1, content: Buffer.from('x'), status: 'done', actor_type: 'system' }).returning('id'))[0].id,
  'qc-cup-tests': async (org) => {
    const { systemId } = await systemRow(org);
    return (await testDb()('qc_cup_tests').insert({ organization_id: org.id, material_system_id: systemId, component_temperature_a_c: 22, component_temperature_b_c: 22, free_rise_density_kg_m3: 45, tested_at: new Date() }).returning('id'))[0].id;
  },
};
