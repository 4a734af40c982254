import type { Knex } from 'knex';
import { densityOf, judgeAgainstTarget } from '@pourgate/batching';

const SEEDED_BY = 'demo seed';
const NOTE = (n: number) => `Demo batch: plan to part, pour ${n} of WO-DEMO-0003`;

/**
 * The plan-to-part story of the demo shop (invented data): work order WO-DEMO-0003 for two seat
 * cushions, poured in two batches with a new drum of part A; the first cushion is accepted, the
 * second scrapped for voids, and the drum is then recalled. Runs after the shop demo (it reuses its
 * seat cushion batch's targets); idempotent: rows are found by their natural keys.
 */
export async function seedPlanToPartDemo(db: Knex, orgId: string): Promise<number> {
  const template = await db('batches').where({ organization_id: orgId, notes: 'Demo batch: first seat cushion of the order' }).first();
  if (!template) return 0;
  let added = 0;
  const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

  let lot = await db('lots').where({ organization_id: orgId, part: 'A', lot_number: 'DF28-A-0120' }).first();
  if (!lot) {
    [lot] = await db('lots').insert({ organization_id: orgId, part: 'A', material_system_id: template.material_system_id, lot_number: 'DF28-A-0120', received_on: day(-10), expires_on: day(170), opened_on: day(-6), shelf_life_days_after_opening: 60 }).returning('*');
    added++;
  }
  let order = await db('work_orders').where({ organization_id: orgId, external_ref: 'WO-DEMO-0003' }).first('id');
  if (!order) {
    [order] = await db('work_orders')
      .insert({ organization_id: orgId, external_ref: 'WO-DEMO-0003', part_number: 'CUSH-SEAT-STD', mold_id: template.mold_id, material_system_id: template.material_system_id, quantity: 2, due_on: day(3), notes: 'Two cushions for a trial fit.', state: 'in_progress', request_hash: 'demo-seed', created_by_label: SEEDED_BY })
      .returning('id');
    added++;
  }
  const snapshot = template.targets;
  snapshot.sources.lots = snapshot.sources.lots.map((l: { part: string }) => (l.part === 'A' ? { part: 'A', id: lot.id, lotNumber: lot.lot_number, expiresOn: String(lot.expires_on instanceof Date ? lot.expires_on.toISOString().slice(0, 10) : lot.expires_on) } : l));
  const volume: number = snapshot.input.mold.volume;
  const target: number = snapshot.targets.targetDensity.value;
  const foam: number = snapshot.targets.foamMass.value;
  // invented part masses: on target, and 13 % light where the voids were
  const pours = [{ n: 1, mass: Math.round(foam * 1000) / 1000, decision: 'accepted', causes: [] as string[] }, { n: 2, mass: Math.round(foam * 0.87 * 1000) / 1000, decision: 'scrap', causes: ['voids'] }];
  for (const p of pours) {
    if (await db('batches').where({ organization_id: orgId, notes: NOTE(p.n) }).first('id')) continue;
    const [b] = await db('batches')
      .insert({
        organization_id: orgId, work_order_id: order.id, material_system_id: template.material_system_id, material_system_revision_id: template.material_system_revision_id, subject: 'mold', mold_id: template.mold_id,
        lot_a_id: lot.id, lot_b_id: template.lot_b_id, lot_pigment_id: template.lot_pigment_id, state: 'released', planned_for: day(-2), notes: NOTE(p.n),
        options: JSON.stringify(template.options), computation_version: template.computation_version, targets: JSON.stringify(snapshot), total_mass_kg: template.total_mass_kg, created_by_label: SEEDED_BY,
      })
      .returning('id');
    await db('batch_state_transitions').insert({ organization_id: orgId, batch_id: b.id, from_state: null, to_state: 'released', actor_type: 'system', actor_label: SEEDED_BY, reason: 'demo data' });
    const density = densityOf(p.mass, volume);
    await db('parts').insert({
      organization_id: orgId, batch_id: b.id, cavity: 1, mass_kg: p.mass, mass_source: 'entered', cavity_volume_m3: volume, molded_density_kg_m3: density, target_density_kg_m3: target, tolerance_percent: 10,
      density_verdict: judgeAgainstTarget(density, target, 10).verdict, disposition: p.decision, defect_causes: JSON.stringify(p.causes), created_by_label: SEEDED_BY,
    });
    await db('batch_dispositions').insert({ organization_id: orgId, batch_id: b.id, decision: p.decision, defect_causes: JSON.stringify(p.causes), note: p.causes.length ? 'Voids under the skin at the bolster' : null, decided_by_label: SEEDED_BY });
    added += 3;
  }
  // the trade's defect causes, as the API seeds them on first use
  const causes = [['voids', 'Voids'], ['short_fill', 'Short fill'], ['skin_defects', 'Skin defects'], ['splits', 'Splits'], ['shrinkage', 'Shrinkage'], ['tack', 'Tack'], ['density_off', 'Density off target'], ['flash', 'Flash']];
  if (!(await db('defect_causes').where({ organization_id: orgId }).first('id'))) {
    await db('defect_causes').insert(causes.map(([code, name]) => ({ organization_id: orgId, code, name })));
    added++;
  }
  if (!lot.recalled_at) {
    await db('lots').where({ id: lot.id }).update({ recalled_at: new Date(), recall_reason: 'Supplier notice: drum DF28-A-0120 off-spec (demo)', recalled_by_label: SEEDED_BY });
    added++;
  }
  return added;
}
