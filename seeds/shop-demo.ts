import type { Knex } from 'knex';
import { computeBatchTargets, type BatchTargetsInput } from '@pourgate/batching';
import { readSystemInput, parametersOf, type MaterialSystemInput } from '@pourgate/batching';
import { readMoldGeometry, type MoldGeometryInput } from '@pourgate/batching';
import { isoDay, judgeCupTest, judgeReading, type MaterialSystemParameters } from '@pourgate/batching';

/**
 * The demo shop's materials and work: invented systems, molds, lots, cup tests, work orders and
 * planned batches. Every name and number here is made up for the demo (plausible for the trade, not
 * any supplier's data). Idempotent: rows are found by their natural keys and only missing ones added.
 */

const SEEDED_BY = 'demo seed';

const SYSTEMS: (MaterialSystemInput & { name: string; kind: 'flexible' | 'integral-skin' | 'other' })[] = [
  {
    name: 'Demo Flex 28',
    kind: 'flexible',
    ratioBasis: 'weight',
    ratio: { a: 100, b: 55 },
    specificGravityA: 1.04,
    specificGravityB: 1.22,
    isocyanatePart: 'B',
    freeRiseDensity: { value: 28, unit: 'kg/m3' },
    freeRiseReferenceTemperature: { value: 22, unit: 'degC' },
    freeRiseDensitySlope: { value: -0.25, unit: 'kg/m3/degC' },
    componentTemperatureWindow: { min: { value: 18, unit: 'degC' }, max: { value: 27, unit: 'degC' } },
    moldTemperatureWindow: { min: { value: 45, unit: 'degC' }, max: { value: 60, unit: 'degC' } },
    ambientTemperatureWindow: { min: { value: 16, unit: 'degC' }, max: { value: 32, unit: 'degC' } },
    maxRelativeHumidity: 75,
    potLife: { value: 75, unit: 's' },
    demoldTime: { value: 8, unit: 'min' },
    fullCureTime: { value: 24, unit: 'h' },
    maxPigmentPercent: 5,
    maxPackFactor: 3.5,
    exothermMassLimit: { value: 3, unit: 'kg' },
    ncoPercent: 32.5,
    hydroxylNumber: 35,
    waterPbw: 3.2,
    cautionsText: 'Demo data: fast system — mix for 8 seconds at most and pour at once.',
    // the reactivity window and density band its cup tests are judged against (ASTM D7487 terms)
    creamTimeWindow: { min: { value: 9, unit: 's' }, max: { value: 15, unit: 's' } },
    riseTimeWindow: { min: { value: 60, unit: 's' }, max: { value: 85, unit: 's' } },
    tackFreeTimeWindow: { min: { value: 120, unit: 's' }, max: { value: 160, unit: 's' } },
    freeRiseDensityBand: { min: { value: 26.5, unit: 'kg/m3' }, max: { value: 29.5, unit: 'kg/m3' } },
  },
  {
    name: 'Demo Flex 45 Slow',
    kind: 'flexible',
    ratioBasis: 'volume',
    ratio: { a: 2, b: 1 },
    specificGravityA: 1.02,
    specificGravityB: 1.23,
    isocyanatePart: 'B',
    freeRiseDensity: { value: 2.8, unit: 'pcf' },
    freeRiseReferenceTemperature: { value: 72, unit: 'degF' },
    componentTemperatureWindow: { min: { value: 65, unit: 'degF' }, max: { value: 80, unit: 'degF' } },
    potLife: { value: 3, unit: 'min' },
    demoldTime: { value: 15, unit: 'min' },
    fullCureTime: { value: 48, unit: 'h' },
    maxPigmentPercent: 3,
    maxPackFactor: 2.5,
  },
  {
    name: 'Demo Skin 55',
    kind: 'integral-skin',
    ratioBasis: 'weight',
    ratio: { a: 100, b: 40 },
    specificGravityA: 1.05,
    specificGravityB: 1.23,
    isocyanatePart: 'B',
    freeRiseDensity: { value: 120, unit: 'kg/m3' },
    freeRiseReferenceTemperature: { value: 23, unit: 'degC' },
    freeRiseDensitySlope: { value: -0.9, unit: 'kg/m3/degC' },
    componentTemperatureWindow: { min: { value: 20, unit: 'degC' }, max: { value: 28, unit: 'degC' } },
    moldTemperatureWindow: { min: { value: 40, unit: 'degC' }, max: { value: 50, unit: 'degC' } },
    ambientTemperatureWindow: { min: { value: 18, unit: 'degC' }, max: { value: 30, unit: 'degC' } },
    maxRelativeHumidity: 65,
    potLife: { value: 40, unit: 's' },
    demoldTime: { value: 6, unit: 'min' },
    fullCureTime: { value: 72, unit: 'h' },
    maxPigmentPercent: 4,
    maxPackFactor: 5,
    exothermMassLimit: { value: 1.5, unit: 'kg' },
    ncoPercent: 28,
    hydroxylNumber: 130,
    waterPbw: 0.3,
    cautionsText: 'Demo data: heat the mold to 45–50 °C for a good skin; release agent on every shot.',
  },
];

const MOLDS: (MoldGeometryInput & { name: string; code: string })[] = [
  {
    name: 'Seat cushion',
    code: 'SEAT-01',
    cavity: { kind: 'water_fill', waterMass: { value: 14.2, unit: 'kg' }, waterTemperature: { value: 21, unit: 'degC' } },
    cavities: 1,
    defaultPackFactor: 1.8,
    notes: 'Aluminium, hinged lid. Volume by water fill.',
  },
  {
    name: 'Armrest, 2-up',
    code: 'ARM-02',
    cavity: { kind: 'box', length: { value: 280, unit: 'mm' }, width: { value: 70, unit: 'mm' }, height: { value: 60, unit: 'mm' } },
    inserts: [{ kind: 'entered', volume: { value: 0.12, unit: 'L' } }],
    cavities: 2,
    defaultPackFactor: 3.5,
    notes: 'Steel core insert in each cavity.',
  },
  {
    name: 'Test cup',
    code: 'CUP-1',
    cavity: { kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: 115, unit: 'mm' } },
    cavities: 1,
    notes: 'Paper cup for free-rise checks.',
  },
];

/** A day relative to the day the seed runs, `YYYY-MM-DD`: the demo stays current. */
function day(offset: number): string {
  return new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
}

/** Lots: [system, part, lot number, received, expires] (days from today). One is past its date on purpose. */
const LOTS: [string | null, 'A' | 'B' | 'pigment', string, number, number][] = [
  ['Demo Flex 28', 'A', 'DF28-A-0117', -28, 152],
  ['Demo Flex 28', 'B', 'DF28-B-0117', -28, 152],
  ['Demo Flex 45 Slow', 'A', 'DF45-A-0093', -60, 120],
  ['Demo Flex 45 Slow', 'B', 'DF45-B-0071', -200, -20],
  ['Demo Skin 55', 'A', 'DS55-A-0042', -14, 166],
  ['Demo Skin 55', 'B', 'DS55-B-0042', -14, 166],
  [null, 'pigment', 'PIG-BLACK-07', -90, 640],
  // a fresh drum of isocyanate whose cup test failed: held for new batches until an engineer releases it
  ['Demo Flex 28', 'B', 'DF28-B-0131', -3, 177],
];

/** Cup tests of Demo Flex 28: [A °C, B °C, cream s, top of cup s, tack free s, kg/m³, days from today]. */
const CUPS: [number, number, number, number, number, number, number][] = [
  [19.0, 19.5, 14, 82, 150, 28.9, -27],
  [21.5, 22.0, 12, 76, 140, 28.1, -26],
  [22.5, 22.0, 12, 74, 138, 27.9, -25],
  [24.0, 24.5, 11, 70, 131, 27.4, -22],
  [26.0, 25.5, 10, 66, 125, 27.0, -21],
];

/** The failed cup test of lot DF28-B-0131: slow cream and rise, heavy foam (invented demo values). */
const FAILED_CUP: [number, number, number, number, number, number, number] = [22.0, 22.5, 19, 97, 175, 31.6, -2];

const ORDERS = [
  { externalRef: 'WO-DEMO-0001', partNumber: 'CUSH-SEAT-STD', mold: 'Seat cushion', system: 'Demo Flex 28', quantity: 120, dueOn: day(17), notes: 'Black, standard firmness.' },
  { externalRef: 'WO-DEMO-0002', partNumber: 'ARM-L-SKIN', mold: 'Armrest, 2-up', system: 'Demo Skin 55', quantity: 60, dueOn: day(38), notes: null },
];

export async function seedShopDemo(db: Knex, orgId: string): Promise<number> {
  let added = 0;
  const systemIds = new Map<string, { id: string; revisionId: string; cols: ReturnType<typeof readSystemInput>['cols'] }>();
  for (const s of SYSTEMS) {
    const { cols, errors } = readSystemInput(s);
    if (errors.length) throw new Error(`demo system ${s.name}: ${JSON.stringify(errors)}`);
    let ms = await db('material_systems').where({ organization_id: orgId, name: s.name }).first();
    if (!ms) {
      [ms] = await db('material_systems').insert({ organization_id: orgId, name: s.name, kind: s.kind, current_revision: 1 }).returning('*');
      await db('material_system_revisions').insert({ ...cols, organization_id: orgId, material_system_id: ms.id, revision: 1, change_note: 'Demo data', created_by_label: SEEDED_BY });
      added++;
    }
    const rev = await db('material_system_revisions').where({ material_system_id: ms.id, revision: ms.current_revision }).first();
    systemIds.set(s.name, { id: ms.id, revisionId: rev.id, cols: rev });
  }

  const molds = new Map<string, { id: string; cavity_volume_m3: number; cavities: number; default_pack_factor: number | null }>();
  for (const m of MOLDS) {
    let row = await db('molds').where({ organization_id: orgId, name: m.name }).first();
    if (!row) {
      const { geometry, errors } = readMoldGeometry(m);
      if (!geometry) throw new Error(`demo mold ${m.name}: ${JSON.stringify(errors)}`);
      [row] = await db('molds')
        .insert({
          organization_id: orgId, name: m.name, code: m.code, cavity_kind: m.cavity.kind, cavity_measurement: JSON.stringify(m.cavity), inserts: JSON.stringify(m.inserts ?? []),
          gross_cavity_volume_m3: geometry.volume.grossCavityVolume, insert_volume_m3: geometry.volume.insertVolume, cavity_volume_m3: geometry.volume.cavityVolume,
          cavities: geometry.volume.cavities, total_volume_m3: geometry.volume.totalVolume, default_pack_factor: geometry.defaultPackFactor, notes: m.notes ?? null,
        })
        .returning('*');
      added++;
    }
    molds.set(m.name, row);
  }

  const lots = new Map<string, { id: string; part: string; lot_number: string; expires_on: string }>();
  for (const [system, part, lotNumber, received, expires] of LOTS) {
    let row = await db('lots').where({ organization_id: orgId, part, lot_number: lotNumber }).first();
    if (!row) {
      [row] = await db('lots').insert({ organization_id: orgId, part, material_system_id: system ? systemIds.get(system)!.id : null, lot_number: lotNumber, received_on: day(received), expires_on: day(expires) }).returning('*');
      added++;
    }
    lots.set(lotNumber, { id: row.id, part: row.part, lot_number: row.lot_number, expires_on: isoDay(row.expires_on)! });
  }

  const flex = systemIds.get('Demo Flex 28')!;
  const flexParameters: MaterialSystemParameters = parametersOf(flex.cols, 'flexible');
  const cupsOnFile = Number((await db('qc_cup_tests').where({ organization_id: orgId, material_system_id: flex.id }).count({ n: '*' }))[0]!.n);
  const cupRows = cupsOnFile > 0 ? [] : [...CUPS.map((c) => ({ c, lotB: 'DF28-B-0117' })), { c: FAILED_CUP, lotB: 'DF28-B-0131' }];
  for (const { c: [a, b, cream, top, tack, density, daysAgo], lotB } of cupRows) {
    const testedAt = `${day(daysAgo)}T07:40:00Z`;
    // judged as the API judges a cup test: the system's window and band, the density at the reference temperature
    const judged = judgeCupTest(
      { temperature: (a + b) / 2, creamTime: cream, riseTime: top, tackFreeTime: tack, freeRiseDensity: density },
      { creamTimeWindow: flexParameters.creamTimeWindow, riseTimeWindow: flexParameters.riseTimeWindow, tackFreeTimeWindow: flexParameters.tackFreeTimeWindow, freeRiseDensityBand: flexParameters.freeRiseDensityBand, referenceTemperature: flexParameters.freeRiseReferenceTemperature, slope: flexParameters.freeRiseDensitySlope },
    );
    const [cup] = await db('qc_cup_tests').insert({
      organization_id: orgId, material_system_id: flex.id, material_system_revision_id: flex.revisionId, lot_a_id: lots.get('DF28-A-0117')!.id, lot_b_id: lots.get(lotB)!.id,
      component_temperature_a_c: a, component_temperature_b_c: b, cream_time_s: cream, top_of_cup_time_s: top, tack_free_time_s: tack, free_rise_density_kg_m3: density, tested_at: testedAt, created_by_label: SEEDED_BY,
      verdict: judged.verdict, findings: JSON.stringify(judged.findings), free_rise_density_at_reference_kg_m3: judged.correctedDensity,
    }).returning('id');
    // the new drum is held; the lot of part A also went into the passing cups, so only the new drum is held
    if (judged.verdict === 'failed') await db('lots').where({ id: lots.get(lotB)!.id }).update({ held_at: new Date(testedAt), held_by_cup_test_id: cup.id });
    added++;
  }

  const orders = new Map<string, string>();
  for (const o of ORDERS) {
    let row = await db('work_orders').where({ organization_id: orgId, external_ref: o.externalRef }).first('id');
    if (!row) {
      [row] = await db('work_orders')
        .insert({ organization_id: orgId, external_ref: o.externalRef, part_number: o.partNumber, mold_id: molds.get(o.mold)!.id, material_system_id: systemIds.get(o.system)!.id, quantity: o.quantity, due_on: o.dueOn, notes: o.notes, state: 'open', request_hash: 'demo-seed', created_by_label: SEEDED_BY })
        .returning('id');
      added++;
    }
    orders.set(o.externalRef, row.id);
  }

  // planned batches: the same snapshot the API stores (every SI input, its sources, the targets)
  const batches = [
    { note: 'Demo batch: first seat cushion of the order', order: 'WO-DEMO-0001', system: 'Demo Flex 28', mold: 'Seat cushion', lotA: 'DF28-A-0117', lotB: 'DF28-B-0117', pigment: 'PIG-BLACK-07', packFactor: 1.8, pigmentPercent: 2, overfillPercent: 3, retentionPercent: 4, componentTemperature: 22.5, plannedFor: day(1) },
    { note: 'Demo batch: short shot on the seat cushion (part B ran out)', order: 'WO-DEMO-0001', system: 'Demo Flex 28', mold: 'Seat cushion', lotA: 'DF28-A-0117', lotB: 'DF28-B-0117', pigment: null, packFactor: 1.8, pigmentPercent: 0, overfillPercent: 3, retentionPercent: 4, componentTemperature: 22.5, plannedFor: day(0), shortShot: true },
    { note: 'Demo batch: armrest pair', order: 'WO-DEMO-0002', system: 'Demo Skin 55', mold: 'Armrest, 2-up', lotA: 'DS55-A-0042', lotB: 'DS55-B-0042', pigment: null, packFactor: 3.6, pigmentPercent: 0, overfillPercent: 2, retentionPercent: 5, componentTemperature: 24, plannedFor: day(2) },
  ];
  let scale = await db('devices').where({ organization_id: orgId, serial: 'DEMO-SCALE-01' }).first('id', 'readability_kg', 'capacity_kg');
  if (!scale) {
    [scale] = await db('devices').insert({ organization_id: orgId, kind: 'scale', serial: 'DEMO-SCALE-01', name: 'Demo bench scale', readability_kg: 0.0001, capacity_kg: 30, calibration_due: day(200) }).returning(['id', 'readability_kg', 'capacity_kg']);
    added++;
  }
  for (const b of batches as (typeof batches[number] & { shortShot?: boolean })[]) {
    if (await db('batches').where({ organization_id: orgId, notes: b.note }).first('id')) continue;
    const sys = systemIds.get(b.system)!;
    const mold = molds.get(b.mold)!;
    const used = [['A', b.lotA], ['B', b.lotB], ['pigment', b.pigment]].filter((x): x is [string, string] => x[1] !== null).map(([part, n]) => ({ part, lot: lots.get(n)! }));
    const cups = sys.id === flex.id ? CUPS.map(([a, bb, , , , density]) => ({ temperature: (a + bb) / 2, density })) : [];
    const input: BatchTargetsInput = {
      system: parametersOf(sys.cols, SYSTEMS.find((x) => x.name === b.system)!.kind),
      mold: { volume: mold.cavity_volume_m3, cavities: mold.cavities, defaultPackFactor: mold.default_pack_factor ?? undefined },
      options: {
        packFactor: b.packFactor, pigmentPercent: b.pigmentPercent, overfillPercent: b.overfillPercent, retentionPercent: b.retentionPercent,
        componentTemperature: b.componentTemperature, scale: { readability: 0.0001, capacity: 30 }, today: b.plannedFor,
        lots: used.map(({ part, lot }) => ({ part: part as 'A' | 'B' | 'pigment', lotCode: lot.lot_number, expiresOn: lot.expires_on })),
      },
      cupTests: cups,
    };
    const targets = computeBatchTargets(input);
    const sources = {
      system: { id: sys.id, name: b.system, revision: 1, revisionId: sys.revisionId },
      mold: { id: mold.id, name: b.mold, code: MOLDS.find((m) => m.name === b.mold)!.code },
      scale: { inline: true },
      lots: used.map(({ part, lot }) => ({ part, id: lot.id, lotNumber: lot.lot_number, expiresOn: lot.expires_on })),
      cupTests: cups.length,
      plannedFor: b.plannedFor,
    };
    const options = { packFactor: b.packFactor, pigmentPercent: b.pigmentPercent, overfillPercent: b.overfillPercent, retentionPercent: b.retentionPercent, componentTemperature: { value: b.componentTemperature, unit: 'degC' }, scale: { readability: { value: 0.1, unit: 'g' }, capacity: { value: 30, unit: 'kg' } }, plannedFor: b.plannedFor };
    const [row] = await db('batches')
      .insert({
        organization_id: orgId, work_order_id: orders.get(b.order), material_system_id: sys.id, material_system_revision_id: sys.revisionId, subject: 'mold', mold_id: mold.id,
        lot_a_id: lots.get(b.lotA)!.id, lot_b_id: lots.get(b.lotB)!.id, lot_pigment_id: b.pigment ? lots.get(b.pigment)!.id : null, state: b.shortShot ? 'on_hold' : 'planned', planned_for: b.plannedFor, notes: b.note,
        options: JSON.stringify(options), computation_version: targets.computationVersion,
        targets: JSON.stringify({ computationVersion: targets.computationVersion, computedAt: new Date().toISOString(), input, sources, targets }),
        total_mass_kg: targets.totalMass.value, created_by_label: SEEDED_BY,
      })
      .returning('id');
    await db('batch_state_transitions').insert({ organization_id: orgId, batch_id: row.id, from_state: null, to_state: 'planned', actor_type: 'system', actor_label: SEEDED_BY, reason: 'demo data' });
    added++;
    if (b.shortShot) added += await shortShot(db, orgId, row.id, scale.id, input, targets);
  }
  return added;
}

/**
 * The short shot of the demo: part A weighed on target, part B only 70 % of its target (the drum ran
 * out), judged as the API judges them — B is rejected as a short shot and the batch waits on hold.
 */
async function shortShot(db: Knex, orgId: string, batchId: string, deviceId: string, input: BatchTargetsInput, targets: ReturnType<typeof computeBatchTargets>): Promise<number> {
  const a = targets.components.A.mass.value;
  const b = Math.round(targets.components.B.mass.value * 0.7 * 10_000) / 10_000;
  const facts = { a: targets.components.A.massUnrounded.value, b: targets.components.B.massUnrounded.value, pigment: 0, total: targets.totalMass.value, readability: 0.0001 };
  const at = Date.now() - 40 * 60_000;
  let n = 0;
  const weighed: [string, number, number | null][] = [['part_a', a, null], ['part_b', b, a]];
  for (const [i, [subject, kg, other]] of weighed.entries()) {
    const verdict = judgeReading({ quantity: 'mass', subject: subject as 'part_a' | 'part_b', valueSi: kg, stable: true, device: { capacityKg: 30, calibrationDue: null }, day: new Date(at).toISOString().slice(0, 10), system: input.system, targets: facts, otherPartMassKg: other });
    const time = new Date(at + i * 60_000);
    await db('readings').insert({ organization_id: orgId, batch_id: batchId, device_id: deviceId, client_reading_id: `demo-short-shot-${subject}`, quantity: 'mass', subject, value_si: kg, unit_given: 'g', value_given: Math.round(kg * 1000 * 10) / 10, stable: true, device_time: time, received_at: time, skew_seconds: 0, status: verdict.status, reasons: JSON.stringify(verdict.reasons), judged_at: time });
    n++;
  }
  await db('batch_state_transitions').insert([
    { organization_id: orgId, batch_id: batchId, from_state: 'planned', to_state: 'weighing', actor_type: 'system', actor_label: 'reading judge', reason: 'first reading received' },
    { organization_id: orgId, batch_id: batchId, from_state: 'weighing', to_state: 'on_hold', actor_type: 'system', actor_label: 'reading judge', reason: 'part B rejected: RATIO_POLYOL_HEAVY, SHORT_SHOT' },
  ]);
  return n;
}
