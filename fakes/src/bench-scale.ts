// A bench scale at a pouring station, bridged to Pourgate with the SDK. For one batch it fetches the
// targets and weighs like an operator would: tare the cup, pour part A (the display wanders while
// the pour goes on: unstable readings), let it settle (one stable net mass), then part B, then the
// pigment, and finally the whole shot. Every mass is rounded to the scale's readability. It can be told to weigh off-ratio,
// short, or on a scale that never settles.
import type { BatchTargets, Pourgate, ReadingAck, Reading } from '@pourgate/sdk';
import { cli, clientFor, isMain, sleep } from './cli.js';

export type Component = 'A' | 'B' | 'pigment';
const SUBJECT = { A: 'part_a', B: 'part_b', pigment: 'pigment' } as const;

export interface WeighOptions {
  batchId: string;
  /** Part B this many percent over (+) or under (−) its target: an off-ratio shot. */
  offRatioPercent?: number;
  /** Every component this many percent under its target: a short shot. */
  shortPercent?: number;
  /** The scale never settles: the final readings go out flagged unstable. */
  unstable?: boolean;
  /** Readings sent while pouring each component (default 2). */
  pouringReadings?: number;
  /** Readability d in grams when the targets name no scale (default 0.1 g). */
  readabilityG?: number;
  /** Prefix of the clientReadingIds (default "scale"): the same weighing posted again is a replay. */
  station?: string;
  /** Pause between readings in ms (0 in tests). */
  paceMs?: number;
  /** Random numbers for the pouring readings (tests pass a fixed sequence). */
  random?: () => number;
  /** Wait for the judge's verdict on each settled reading. */
  waitForVerdicts?: boolean;
  log?: (line: string) => void;
}

export interface PostedReading {
  component: Component;
  stable: boolean;
  valueG: number;
  ack: ReadingAck;
  verdict?: Reading;
}

export interface Weighing {
  targets: BatchTargets;
  readabilityG: number;
  /** Target net masses in grams, rounded to the readability. */
  targetG: Record<Component, number>;
  readings: PostedReading[];
  /** The settled reading of each component weighed. */
  settled: Partial<Record<Component, PostedReading>>;
  /** The whole shot on the scale at the end (A + B + pigment, subject "mixed"), judged against the batch total. */
  shot?: { valueG: number; ack: ReadingAck; verdict?: Reading };
}

/** Rounds to the nearest scale division, as the display does; the digits of d, no float noise. */
export function toDivision(grams: number, d: number): number {
  const decimals = Math.max(0, Math.ceil(-Math.log10(d) - 1e-9));
  return Number((Math.round(grams / d) * d).toFixed(decimals));
}

/** What the scale shows for one component: unstable steps on the way up, then the settled net mass. */
export function pourProfile(finalG: number, d: number, steps: number, random: () => number): number[] {
  const out: number[] = [];
  for (let i = 1; i <= steps; i++) {
    const share = i / (steps + 1);
    out.push(toDivision(Math.max(0, finalG * share * (0.9 + 0.2 * random())), d));
  }
  out.push(toDivision(finalG, d));
  return out;
}

export async function weighBatch(client: Pourgate, opts: WeighOptions): Promise<Weighing> {
  const log = opts.log ?? (() => undefined);
  const random = opts.random ?? Math.random;
  const targets = await client.batchTargets(opts.batchId);
  const d = targets.scaleReadability ? targets.scaleReadability.si.value * 1000 : (opts.readabilityG ?? 0.1);
  const grams = (c: Component) => (targets.components[c]?.mass?.si.value ?? 0) * 1000;
  const targetG = { A: toDivision(grams('A'), d), B: toDivision(grams('B'), d), pigment: toDivision(grams('pigment'), d) };
  const factor = (c: Component) => (1 - (opts.shortPercent ?? 0) / 100) * (c === 'B' ? 1 + (opts.offRatioPercent ?? 0) / 100 : 1);
  const station = opts.station ?? 'scale';
  const result: Weighing = { targets, readabilityG: d, targetG, readings: [], settled: {} };
  for (const c of ['A', 'B', 'pigment'] as const) {
    if (targetG[c] <= 0) continue;
    log(`tare: cup on the scale, display zeroed for ${c === 'pigment' ? 'the pigment' : `part ${c}`} (target ${targetG[c]} g, d = ${d} g)`);
    const shown = pourProfile(grams(c) * factor(c), d, opts.pouringReadings ?? 2, random);
    for (const [i, valueG] of shown.entries()) {
      const settledNow = i === shown.length - 1 && !opts.unstable;
      const ack = await client.postReading({
        batchId: opts.batchId,
        clientReadingId: `${station}-${opts.batchId.slice(0, 8)}-${c}-${i + 1}`,
        quantity: 'mass',
        subject: SUBJECT[c],
        value: valueG,
        unit: 'g',
        stable: settledNow,
        deviceTime: new Date().toISOString(),
      });
      const posted: PostedReading = { component: c, stable: settledNow, valueG, ack };
      result.readings.push(posted);
      if (i < shown.length - 1) log(`pouring: ${valueG} g (unstable)`);
      else {
        result.settled[c] = posted;
        log(`${settledNow ? 'stable' : 'still moving'}: ${c} ${valueG} g -> reading ${ack.id}${ack.replayed ? ' (replayed)' : ''}`);
      }
      if (opts.paceMs) await sleep(opts.paceMs);
    }
  }
  // the cup, tare taken off once: the scale shows the whole shot before it goes to the mixer
  const weighed = Object.values(result.settled);
  if (weighed.length) {
    const valueG = toDivision(weighed.reduce((sum, p) => sum + p.valueG, 0), d);
    const ack = await client.postReading({ batchId: opts.batchId, clientReadingId: `${station}-${opts.batchId.slice(0, 8)}-shot`, quantity: 'mass', subject: 'mixed', value: valueG, unit: 'g', stable: !opts.unstable, deviceTime: new Date().toISOString() });
    result.shot = { valueG, ack };
    log(`whole shot: ${valueG} g -> reading ${ack.id}`);
  }
  if (opts.waitForVerdicts) {
    for (const p of Object.values(result.settled)) {
      p.verdict = await client.waitForVerdict(p.ack.id);
      log(`verdict on ${p.component}: ${p.verdict.status}${p.verdict.reasons?.length ? ` (${p.verdict.reasons.map((r) => r.code).join(', ')})` : ''}`);
    }
    if (result.shot) {
      result.shot.verdict = await client.waitForVerdict(result.shot.ack.id);
      log(`verdict on the shot: ${result.shot.verdict.status}${result.shot.verdict.reasons?.length ? ` (${result.shot.verdict.reasons.map((r) => r.code).join(', ')})` : ''}`);
    }
  }
  return result;
}

if (isMain(import.meta.url)) {
  const argv = await (await cli('$0 --batch <id> [options]', 'bench-scale: weigh one batch at a station and post the readings'))
    .option('batch', { type: 'string', demandOption: true, describe: 'Batch id (its targets say what to weigh)' })
    .option('off-ratio', { type: 'number', default: 0, describe: 'Weigh part B this many percent over (negative: under) its target' })
    .option('short', { type: 'number', default: 0, describe: 'Weigh every component this many percent light' })
    .option('unstable', { type: 'boolean', default: false, describe: 'The scale never settles (final readings flagged unstable)' })
    .option('readability', { type: 'number', default: 0.1, describe: 'Scale division in grams, when the batch names no scale' })
    .option('station', { type: 'string', default: 'S1', describe: 'Station code, prefix of the reading ids' })
    .option('pace', { type: 'number', default: 400, describe: 'Milliseconds between readings' })
    .parseAsync();
  const client = clientFor(argv.api, argv.key);
  const w = await weighBatch(client, {
    batchId: argv.batch,
    offRatioPercent: argv['off-ratio'],
    shortPercent: argv.short,
    unstable: argv.unstable,
    readabilityG: argv.readability,
    station: argv.station,
    paceMs: argv.pace,
    waitForVerdicts: true,
    log: (l) => console.log(`[scale ${argv.station}] ${l}`),
  });
  const rejected = Object.values(w.settled).filter((p) => p.verdict?.status === 'rejected');
  process.exitCode = rejected.length ? 2 : 0;
}
