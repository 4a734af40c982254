// A shift at the demo shop, played against a running Pourgate with the other fakes: the ERP posts
// two work orders, the engineer plans three batches, two bench scales weigh them at stations S1 and
// S2 (one comes out off-ratio), a logger finds a part A drum too cold, the ERP's receiver verifies
// every webhook, and the engineer's mail lands in the catcher. Everything here is invented demo data.
// `npm run demo` runs it after starting the service; it keeps the ERP receiver up until Ctrl-C.
import fs from 'node:fs/promises';
import path from 'node:path';
import { Pourgate, PourgateProblem, type BatchTargets } from '@pourgate/sdk';
import { weighBatch } from './bench-scale.js';
import { cli, isMain } from './cli.js';
import { startErp, type Erp } from './erp.js';
import { runLogger } from './temperature-logger.js';

export interface ShiftOptions {
  api: string;
  /** The console's address for links (the API serves it at /). */
  consoleUrl?: string;
  /** The mail catcher's HTTP listing (GET /messages). */
  mailUrl?: string | null;
  erpPort?: number;
  password?: string;
  /** Where the logger's CSV goes. */
  csvDir?: string;
  paceMs?: number;
  log?: (line: string) => void;
}

export interface ShiftResult {
  erp: Erp;
  story: string;
  batches: { label: string; id: string; station: string; outcome: string }[];
  mail: { to: string[]; subject: string }[];
}

const PASSWORD = 'pourgate-demo';

async function findOrCreateDevice(integrator: Pourgate, body: { kind: 'scale' | 'logger'; serial: string; name: string; stationCode: string; readability?: { value: number; unit: string }; capacity?: { value: number; unit: string }; calibrationDue?: string }) {
  for await (const d of integrator.paginate('/v1/devices')) if (d.serial === body.serial) return d.id;
  return (await integrator.unwrap<{ id: string }>(integrator.api.POST('/v1/devices', { body }))).id;
}

async function deviceKey(integrator: Pourgate, deviceId: string, name: string): Promise<string> {
  const k = await integrator.unwrap<{ secret: string }>(integrator.api.POST('/v1/api-keys', { body: { name, kind: 'device', scopes: ['readings:write', 'targets:read'], deviceId } }));
  return k.secret;
}

async function idByName(client: Pourgate, list: '/v1/material-systems' | '/v1/molds', name: string): Promise<string> {
  for await (const r of client.paginate(list)) if (r.name === name) return r.id;
  throw new Error(`the demo seed has no ${list.slice(4)} named "${name}": run npm start once (it seeds the demo)`);
}

async function until<T>(what: string, fn: () => T | undefined | Promise<T | undefined>, ms = 20_000): Promise<T | undefined> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) return undefined;
    await new Promise((r) => setTimeout(r, 250));
  }
}

const g = (t: BatchTargets, c: 'A' | 'B' | 'pigment') => `${(t.components[c].mass?.si.value ?? 0) * 1000} g`;

export async function playShift(opts: ShiftOptions): Promise<ShiftResult> {
  const log = opts.log ?? ((l: string) => console.log(l));
  const consoleUrl = (opts.consoleUrl ?? opts.api).replace(/\/+$/, '');
  const password = opts.password ?? PASSWORD;
  const as = (email: string) => Pourgate.signIn({ baseUrl: opts.api, email, password });
  const [admin, integrator, engineer] = await Promise.all([as('admin@demo.test'), as('integrator@demo.test'), as('engineer@demo.test')]);
  const tag = new Date().toISOString().slice(0, 16).replace(/[-:T]/g, '');

  // IT: an integration key for the ERP, device keys for the station hardware
  const erpKey = await admin.unwrap<{ secret: string }>(admin.api.POST('/v1/api-keys', { body: { name: `ERP gateway (demo ${tag})`, kind: 'integration', scopes: ['work-orders:write', 'targets:read', 'events:read', 'shop:read'] } }));
  const scale1 = await findOrCreateDevice(integrator, { kind: 'scale', serial: 'DEMO-SC-101', name: 'Bench scale, station 1', stationCode: 'S1', readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2027-09-30' });
  const scale2 = await findOrCreateDevice(integrator, { kind: 'scale', serial: 'DEMO-SC-202', name: 'Bench scale, station 2', stationCode: 'S2', readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2027-09-30' });
  const logger2 = await findOrCreateDevice(integrator, { kind: 'logger', serial: 'DEMO-TL-203', name: 'Temperature logger, station 2', stationCode: 'S2' });
  const [scale1Key, scale2Key, loggerKey] = await Promise.all([deviceKey(integrator, scale1, `Scale S1 (demo ${tag})`), deviceKey(integrator, scale2, `Scale S2 (demo ${tag})`), deviceKey(integrator, logger2, `Logger S2 (demo ${tag})`)]);

  // the ERP: its receiver first, then the webhook endpoint that points at it (earlier runs' removed)
  let secret = '';
  const erpClient = new Pourgate({ baseUrl: opts.api, apiKey: erpKey.secret });
  const erp = await startErp({ client: erpClient, secret: () => secret, port: opts.erpPort ?? 4100, log: (l) => log(`    [erp] ${l}`) });
  for await (const ep of integrator.paginate('/v1/webhook-endpoints')) {
    if (ep.url === erp.receiver.url) await integrator.unwrap(integrator.api.DELETE('/v1/webhook-endpoints/{id}', { params: { path: { id: ep.id } } }));
  }
  const endpoint = await integrator.unwrap<{ id: string; secret: string }>(
    integrator.api.POST('/v1/webhook-endpoints', { body: { url: erp.receiver.url, description: 'ERP gateway (demo)', eventTypes: ['work_order.created', 'reading.rejected', 'batch.on_hold', 'batch.released'] } }),
  );
  secret = endpoint.secret;

  log('\n  1. Work orders arrive from the ERP');
  const [flex, skin, seat, arm] = await Promise.all([idByName(erpClient, '/v1/material-systems', 'Demo Flex 28'), idByName(erpClient, '/v1/material-systems', 'Demo Skin 55'), idByName(erpClient, '/v1/molds', 'Seat cushion'), idByName(erpClient, '/v1/molds', 'Armrest, 2-up')]);
  const [wo1, wo2] = await erp.postWorkOrders([
    { externalRef: `WO-SHIFT-${tag}-1`, partNumber: 'CUSH-SEAT-STD', materialSystemId: flex, moldId: seat, quantity: 24, notes: 'Demo shift: seat cushions, black' },
    { externalRef: `WO-SHIFT-${tag}-2`, partNumber: 'ARM-L-SKIN', materialSystemId: skin, moldId: arm, quantity: 12, notes: 'Demo shift: armrest pairs' },
  ]);

  log('\n  2. The engineer plans the batches');
  const plan = async (workOrderId: string, materialSystemId: string, moldId: string, station: string, scaleDeviceId: string, pigmentPercent: number, notes: string) =>
    (await engineer.unwrap<{ id: string }>(engineer.api.POST('/v1/batches', { body: { workOrderId, materialSystemId, moldId, stationCode: station, options: { scaleDeviceId, pigmentPercent, componentTemperature: { value: 22, unit: 'degC' } }, notes } }))).id;
  const b1 = await plan(wo1!.id, flex, seat, 'S1', scale1, 2, 'Demo shift: first seat cushion');
  const b2 = await plan(wo1!.id, flex, seat, 'S1', scale1, 2, 'Demo shift: second seat cushion');
  const b3 = await plan(wo2!.id, skin, arm, 'S2', scale2, 0, 'Demo shift: armrest pair');
  const targets = await erp.targetsForWorkOrder(wo1!.id);
  log(`    [erp] fetched targets for ${targets.length} batches of ${wo1!.externalRef}: A ${g(targets[0]!, 'A')}, B ${g(targets[0]!, 'B')}, pigment ${g(targets[0]!, 'pigment')}`);

  log('\n  3. Station 1 weighs two seat cushions');
  const s1 = new Pourgate({ baseUrl: opts.api, apiKey: scale1Key });
  const w1 = await weighBatch(s1, { batchId: b1, station: 'S1', paceMs: opts.paceMs ?? 150, waitForVerdicts: true, log: (l) => log(`    [scale S1] ${l}`) });
  const w2 = await weighBatch(s1, { batchId: b2, station: 'S1', offRatioPercent: 9, paceMs: opts.paceMs ?? 150, waitForVerdicts: true, log: (l) => log(`    [scale S1] ${l}`) });

  log('\n  4. Station 2: the logger reads the drums, then the scale weighs an armrest pair');
  const csvDir = opts.csvDir ?? path.resolve('.data/demo');
  await fs.mkdir(csvDir, { recursive: true });
  const csvFile = path.join(csvDir, `logger-S2-${tag}.csv`);
  const lg = new Pourgate({ baseUrl: opts.api, apiKey: loggerKey });
  const samples = await runLogger(lg, {
    batchId: b3,
    deviceId: logger2,
    // the part A drum came in from the cold store this morning
    channels: [
      { subject: 'part_a', startC: 14.5 },
      { subject: 'part_b', startC: 21.5 },
      { subject: 'mold', startC: 24 },
      { subject: 'ambient', startC: 22 },
    ],
    roomC: 22,
    timeConstantS: 3600,
    intervalS: 120,
    samples: 3,
    csvFile,
    log: (l) => log(`    [logger S2] ${l}`),
  });
  const s2 = new Pourgate({ baseUrl: opts.api, apiKey: scale2Key });
  const w3 = await weighBatch(s2, { batchId: b3, station: 'S2', paceMs: opts.paceMs ?? 150, waitForVerdicts: true, log: (l) => log(`    [scale S2] ${l}`) });
  const cold = await lg.waitForVerdict(samples.find((s) => s.subject === 'part_a')!.ack!.id);

  // the engineer releases the good batch
  let released = false;
  try {
    await engineer.unwrap(engineer.api.POST('/v1/batches/{id}/release', { params: { path: { id: b1 } } }));
    released = true;
  } catch (e) {
    log(`    could not release the first batch: ${e instanceof PourgateProblem ? e.detail ?? e.title : (e as Error).message}`);
  }

  log('\n  5. What reached the ERP and the engineer');
  await until('webhooks', () => (erp.events().filter((e) => e.type === 'batch.on_hold').length >= 2 && (!released || erp.events().some((e) => e.type === 'batch.released')) ? true : undefined));
  for (const e of erp.events()) log(`    [erp] verified ${e.type.padEnd(18)} ${e.subject.type} ${e.subject.id.slice(0, 8)}`);
  let mail: { to: string[]; subject: string; receivedAt?: string }[] = [];
  if (opts.mailUrl) {
    const start = Date.now() - 10 * 60_000;
    await until('mail', async () => {
      const all = (await (await fetch(`${opts.mailUrl}/messages`)).json()) as { to: string[]; subject: string; receivedAt: string }[];
      mail = all.filter((m) => Date.parse(m.receivedAt) >= start && m.to.includes('engineer@demo.test'));
      return mail.length ? true : undefined;
    }, 10_000);
    if (mail.length) for (const m of mail) log(`    [mail] to ${m.to.join(', ')}: ${m.subject}`);
    else log('    [mail] nothing for engineer@demo.test yet');
  }

  const reasons = (w: typeof w2) => Object.values(w.settled).flatMap((p) => p.verdict?.reasons?.map((r) => r.code) ?? []);
  const batches = [
    { label: 'Seat cushion #1', id: b1, station: 'S1', outcome: released ? 'on target, released' : reasons(w1).length ? `rejected: ${reasons(w1).join(', ')}` : 'on target' },
    { label: 'Seat cushion #2', id: b2, station: 'S1', outcome: `part B 9 % heavy: ${reasons(w2).join(', ') || 'accepted?'}, on hold` },
    { label: 'Armrest pair', id: b3, station: 'S2', outcome: `part A drum at ${cold.given.value} °C: ${cold.reasons?.map((r) => r.code).join(', ') || cold.status}, on hold${reasons(w3).length ? `; scale: ${reasons(w3).join(', ')}` : ''}` },
  ];
  const review = `${consoleUrl}/#/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected' }))}`;
  const story = [
    '',
    '  The shift, in short',
    `    ERP posted ${wo1!.externalRef} (24 seat cushions) and ${wo2!.externalRef} (12 armrest pairs); the engineer planned three batches.`,
    ...batches.map((b) => `    ${b.label.padEnd(16)} station ${b.station}  ${b.outcome}\n      ${consoleUrl}/#/batches/${b.id}/show`),
    `    The ERP received ${erp.events().length} verified webhooks at ${erp.receiver.url}; it keeps listening.`,
    `    The logger's CSV (the import format): ${csvFile}`,
    '',
    '  Look around (sign in as engineer@demo.test / pourgate-demo)',
    `    review queue      ${review}`,
    `    batches           ${consoleUrl}/#/batches`,
    `    pour sheet        ${consoleUrl}/#/batches/${b3}/pour-sheet`,
    `    webhook log       ${consoleUrl}/#/webhook-deliveries   (integrator@demo.test)`,
    ...(opts.mailUrl ? [`    caught mail       ${opts.mailUrl}/`] : []),
    '',
    '  Safety: isocyanates are respiratory and skin sensitisers and large masses of mixed foam can overheat.',
    '  Work with ventilation, gloves and eye protection; the SDS, local codes and licensed practice govern.',
    '',
  ].join('\n');
  return { erp, story, batches, mail };
}

if (isMain(import.meta.url)) {
  const argv = await (await cli('$0 [--api http://127.0.0.1:3000]', 'shop-shift: play a demo shift against a running Pourgate (ERP, two scales, a logger)'))
    .option('mail', { type: 'string', default: 'http://127.0.0.1:55080', describe: 'The mail catcher listing ("" for none)' })
    .option('erp-port', { type: 'number', default: 4100, describe: "Port of the ERP's webhook receiver on 127.0.0.1" })
    .option('pace', { type: 'number', default: 150, describe: 'Milliseconds between scale readings' })
    .parseAsync();
  const r = await playShift({ api: argv.api, mailUrl: argv.mail || null, erpPort: argv['erp-port'], paceMs: argv.pace });
  console.log(r.story);
  console.log('  Ctrl-C to stop.');
  const stop = () => void r.erp.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
