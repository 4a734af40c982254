import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { Pourgate } from '@pourgate/sdk';
import { weighBatch } from '../../fakes/src/bench-scale.js';
import { startErp, type Erp } from '../../fakes/src/erp.js';
import { CSV_COLUMNS, runLogger } from '../../fakes/src/temperature-logger.js';
import { closeTestDb, makeOrg, type OrgFixture, PASSWORD, testDb } from './support/fixtures.js';
import { listenOnLoopback as listen, startTestApp, type TestApp } from './support/app.js';
import { flexSystem } from './support/shop.js';

// Each fake's own flow against the real API (the same functions their command lines call).
// Check values: ±5 % ratio tolerance and a component window of 18–27 °C around 22 °C are common
// practice; masses are the API's own targets, weighed at the scale's readability.

let t: TestApp;
let base: string;
let org: OrgFixture;
let integrator: Pourgate;
let engineer: Pourgate;
let erp: Erp;
let systemId: string;
const keys: Record<string, string> = {};
const devices: Record<string, string> = {};
const fast = { retry: { baseDelayMs: 20, maxDelayMs: 200 } };

async function deviceWithKey(kind: 'scale' | 'logger', name: string) {
  const body = kind === 'scale' ? { kind, serial: `F-${randomUUID().slice(0, 8)}`, name, stationCode: 'S2', readability: { value: 0.5, unit: 'g' }, capacity: { value: 15, unit: 'kg' }, calibrationDue: '2099-12-31' } : { kind, serial: `L-${randomUUID().slice(0, 8)}`, name, stationCode: 'S2' };
  const d = await integrator.unwrap<{ id: string }>(integrator.api.POST('/v1/devices', { body: body as never }));
  const k = await integrator.unwrap<{ secret: string }>(integrator.api.POST('/v1/api-keys', { body: { name, kind: 'device', scopes: ['readings:write', 'targets:read'], deviceId: d.id } }));
  devices[kind] = d.id;
  keys[kind] = k.secret;
}

async function newBatch(workOrderId?: string): Promise<string> {
  // 10 L at 40 kg/m³: the pigment target (about 8 g) spans at least 10 divisions of the 0.5 g scale
  const b = await engineer.unwrap<{ id: string }>(engineer.api.POST('/v1/batches', { body: { materialSystemId: systemId, workOrderId, freeRiseCup: { volume: { value: 10, unit: 'L' } }, options: { scaleDeviceId: devices.scale, pigmentPercent: 2 } } }));
  return b.id;
}

beforeAll(async () => {
  t = await startTestApp({ PROCESS_ROLE: 'all', WEBHOOK_ALLOWED_HOSTS: '127.0.0.1', WEBHOOK_RETRY_SCHEDULE: '0,0.3,0.3', WEBHOOK_RELAY_INTERVAL_MS: '50', WEBHOOK_TIMEOUT_MS: '3000' });
  base = await listen(t);
  org = await makeOrg('fakes');
  integrator = await Pourgate.signIn({ baseUrl: base, email: org.people.integrator.email, password: PASSWORD, ...fast });
  engineer = await Pourgate.signIn({ baseUrl: base, email: org.people.engineer.email, password: PASSWORD, ...fast });
  await deviceWithKey('scale', 'Station 2 scale');
  await deviceWithKey('logger', 'Station 2 logger');
  const admin = await Pourgate.signIn({ baseUrl: base, email: org.people.admin.email, password: PASSWORD, ...fast });
  const erpKey = await admin.unwrap<{ secret: string }>(admin.api.POST('/v1/api-keys', { body: { name: 'ERP', kind: 'integration', scopes: ['work-orders:write', 'targets:read', 'events:read', 'shop:read'] } }));
  let secret = '';
  erp = await startErp({ client: new Pourgate({ baseUrl: base, apiKey: erpKey.secret, ...fast }), secret: () => secret });
  secret = (await integrator.unwrap<{ secret: string }>(integrator.api.POST('/v1/webhook-endpoints', { body: { url: erp.receiver.url, description: 'ERP' } }))).secret;
  systemId = (await engineer.unwrap<{ id: string }>(engineer.api.POST('/v1/material-systems', { body: flexSystem({ ratio: { a: 100, b: 50 } }) as never }))).id;
}, 60_000);
afterAll(async () => {
  await erp?.close();
  await t.close();
  await closeTestDb();
});

describe('ERP', () => {
  it('posts work orders once (again: already there), hears of each and of its batch, and fetches the targets', async () => {
    const ref = `WO-F-${randomUUID().slice(0, 6)}`;
    const order = { externalRef: ref, quantity: 40, partNumber: 'PAD-01', materialSystemId: systemId };
    const [first] = await erp.postWorkOrders([order]);
    const [again] = await erp.postWorkOrders([order]);
    expect(first).toMatchObject({ externalRef: ref, created: true });
    expect(again).toMatchObject({ id: first!.id, created: false });
    const created = await erp.waitForEvent((e) => e.type === 'work_order.created' && (e.data as { externalRef?: string }).externalRef === ref);
    expect(created.data).toMatchObject({ workOrderId: first!.id, quantity: 40 });
    const batchId = await newBatch(first!.id);
    const [fetched] = await erp.targetsForWorkOrder(first!.id);
    expect(fetched?.batchId).toBe(batchId);
    const targets = erp.targets.get(batchId)!;
    expect(targets.batchId).toBe(batchId);
    // 100:50 by weight: A is twice B before rounding, and each rounded mass is on the 0.5 g division
    const unrounded = (c: 'A' | 'B') => (targets.components[c].massUnrounded as { si: { value: number } }).si.value;
    expect(unrounded('A') / unrounded('B')).toBeCloseTo(2, 9);
    for (const c of ['A', 'B'] as const) expect(Math.abs(targets.components[c].mass!.si.value * 2000 - Math.round(targets.components[c].mass!.si.value * 2000))).toBeLessThan(1e-6);
    // every delivery the ERP got was verified; none twice
    expect(erp.receiver.received.every((r) => r.verified)).toBe(true);
    const { events, cursor } = await erp.catchUp();
    expect(events.map((e) => e.id)).toEqual(expect.arrayContaining([created.id]));
    expect(cursor).toBeTruthy();
  });
});

describe('bench scale', () => {
  it('weighs A, B and pigment on target: unstable readings set aside, the settled ones accepted, all on the 0.5 g division', async () => {
    const batchId = await newBatch();
    const scale = new Pourgate({ baseUrl: base, apiKey: keys.scale!, ...fast });
    const w = await weighBatch(scale, { batchId, station: 'S2', waitForVerdicts: true, random: () => 0.5 });
    expect(w.readabilityG).toBe(0.5);
    expect(w.readings).toHaveLength(9);
    for (const r of w.readings) expect((r.valueG * 2) % 1).toBe(0);
    expect(Object.values(w.settled).map((p) => p.verdict?.status)).toEqual(['accepted', 'accepted', 'accepted']);
    // the whole shot on the scale, within the band of the batch total
    expect(w.shot?.verdict?.status).toBe('accepted');
    const unstable = w.readings.filter((r) => !r.stable);
    const stored = await testDb()('readings').whereIn('id', unstable.map((r) => r.ack.id)).select('status');
    expect(stored.map((s) => s.status)).toEqual(['unused', 'unused', 'unused', 'unused', 'unused', 'unused'].slice(0, unstable.length));
    // the same weighing again is a replay: nothing new stored
    const again = await weighBatch(scale, { batchId, station: 'S2', random: () => 0.5 });
    expect(again.readings.every((r) => r.ack.replayed)).toBe(true);
  });

  it('--off-ratio 8 makes part B heavy: rejected as isocyanate heavy, the batch goes on hold, and the ERP hears of it', async () => {
    const batchId = await newBatch();
    const scale = new Pourgate({ baseUrl: base, apiKey: keys.scale!, ...fast });
    const w = await weighBatch(scale, { batchId, station: 'S2', offRatioPercent: 8, waitForVerdicts: true });
    expect(w.settled.A?.verdict?.status).toBe('accepted');
    expect(w.settled.B?.verdict?.status).toBe('rejected');
    expect(w.settled.B?.verdict?.reasons?.map((r) => r.code)).toContain('RATIO_ISOCYANATE_HEAVY');
    await erp.waitForEvent((e) => e.type === 'batch.on_hold' && e.subject.id === batchId);
  });

  it('--short 12 weighs every part 12 % light: the A:B ratio still holds, the pigment is judged short', async () => {
    const batchId = await newBatch();
    const scale = new Pourgate({ baseUrl: base, apiKey: keys.scale!, ...fast });
    const w = await weighBatch(scale, { batchId, station: 'S2', shortPercent: 12, waitForVerdicts: true });
    for (const c of ['A', 'B'] as const) expect(Math.abs(w.settled[c]!.valueG / (w.targets.components[c].mass!.si.value * 1000) - 0.88)).toBeLessThan(0.01);
    expect(w.settled.B?.verdict?.reasons?.some((r) => r.code.startsWith('RATIO_'))).toBe(false);
    expect(w.settled.pigment?.verdict?.reasons?.map((r) => r.code)).toContain('PIGMENT_MASS_LOW');
    expect(w.shot?.verdict?.reasons?.map((r) => r.code)).toEqual(['TOTAL_MASS_LOW']);
  });

  it('--unstable never settles: every final reading is kept but not judged', async () => {
    const batchId = await newBatch();
    const scale = new Pourgate({ baseUrl: base, apiKey: keys.scale!, ...fast });
    const w = await weighBatch(scale, { batchId, station: 'S2', unstable: true, waitForVerdicts: true });
    expect(Object.values(w.settled).map((p) => p.verdict?.reasons?.[0]?.code)).toEqual(['SCALE_NOT_STABLE', 'SCALE_NOT_STABLE', 'SCALE_NOT_STABLE']);
  });
});

describe('temperature logger', () => {
  it('logs four channels drifting toward the room, rejects a cold part A drum, writes the import CSV, and replays harmlessly', async () => {
    const batchId = await newBatch();
    const logger = new Pourgate({ baseUrl: base, apiKey: keys.logger!, ...fast });
    const csvFile = path.join(await fs.mkdtemp(path.join(os.tmpdir(), 'pourgate-logger-')), 'log.csv');
    const opts = {
      batchId,
      deviceId: devices.logger,
      channels: [
        { subject: 'part_a' as const, startC: 12 },
        { subject: 'part_b' as const, startC: 21.5 },
        { subject: 'mold' as const, startC: 30 },
        { subject: 'ambient' as const, startC: 22 },
      ],
      roomC: 22,
      timeConstantS: 600,
      intervalS: 60,
      samples: 3,
      csvFile,
    };
    const samples = await runLogger(logger, opts);
    expect(samples).toHaveLength(12);
    const partA = samples.filter((s) => s.subject === 'part_a').map((s) => s.value);
    expect(partA[0]).toBe(12);
    expect(partA[1]!).toBeGreaterThan(partA[0]!);
    expect(partA[2]!).toBeLessThan(18); // still below the window after two minutes
    const mold = samples.filter((s) => s.subject === 'mold').map((s) => s.value);
    expect(mold[2]!).toBeLessThan(mold[0]!);
    const verdicts = await Promise.all(samples.map((s) => logger.waitForVerdict(s.ack!.id)));
    const byId = new Map(verdicts.map((v) => [v.id, v]));
    for (const s of samples.filter((x) => x.subject === 'part_a')) expect(byId.get(s.ack!.id)!.reasons?.[0]?.code).toBe('TEMPERATURE_BELOW_WINDOW');
    for (const s of samples.filter((x) => x.subject === 'part_b')) expect(byId.get(s.ack!.id)!.status).toBe('accepted');
    const csv = (await fs.readFile(csvFile, 'utf8')).split('\r\n');
    expect(csv[0]).toBe(CSV_COLUMNS.join(','));
    expect(csv).toHaveLength(14);
    expect(csv[1]!.split(',')).toEqual([samples[0]!.clientReadingId, batchId, devices.logger, samples[0]!.deviceTime, 'temperature', 'part_a', '12', 'degC']);
    const again = await runLogger(logger, { ...opts, csvFile: undefined, now: () => Date.now() + 5000 });
    expect(again.every((s) => s.ack?.replayed)).toBe(true);
  });
});
