// A temperature logger with channels on the components (part A and part B drums), the mold and the
// room. Each channel starts where it was put and drifts toward room temperature by Newton's law of
// cooling, T(t) = T_room + (T0 − T_room)·e^(−t/τ); a sample per channel every interval goes to
// Pourgate through the SDK, or into the CSV file the import endpoint takes, or both.
import fs from 'node:fs/promises';
import type { Pourgate, ReadingAck } from '@pourgate/sdk';
import { cli, clientFor, isMain, sleep } from './cli.js';

export type ChannelSubject = 'part_a' | 'part_b' | 'mold' | 'ambient';

export interface Channel {
  subject: ChannelSubject;
  /** Where the probe starts, °C. */
  startC: number;
}

export interface LoggerOptions {
  batchId: string;
  /** The logger's device id: written in the CSV (a bound key needs none for posting). */
  deviceId?: string;
  channels: Channel[];
  /** Room temperature the channels drift toward, °C (default 22). */
  roomC?: number;
  /** Time constant τ of the drift, in seconds (default 1800: drums warm slowly). */
  timeConstantS?: number;
  /** Seconds between samples (default 60). */
  intervalS?: number;
  /** Samples per channel (default 3). */
  samples?: number;
  /** Sleep the interval between samples; otherwise the samples are timed back from now, sent at once. */
  realtime?: boolean;
  /** Post each sample to Pourgate (default true when a client is given). */
  post?: boolean;
  /** Write every sample here as CSV (the import format). */
  csvFile?: string;
  /** Prefix of the clientReadingIds (default "logger"). */
  tag?: string;
  now?: () => number;
  log?: (line: string) => void;
}

export interface LoggedSample {
  clientReadingId: string;
  batchId: string;
  deviceId: string;
  deviceTime: string;
  quantity: 'temperature';
  subject: ChannelSubject;
  value: number;
  unit: 'degC';
  ack?: ReadingAck;
}

/** Newton's law of cooling (or warming): the temperature after `seconds` in a room at `roomC`. */
export function driftToward(startC: number, roomC: number, seconds: number, timeConstantS: number): number {
  return roomC + (startC - roomC) * Math.exp(-seconds / timeConstantS);
}

export const CSV_COLUMNS = ['client_reading_id', 'batch_id', 'device_id', 'device_time', 'quantity', 'subject', 'value', 'unit'] as const;

function csvField(v: string | number): string {
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** The logger's export: a header row and one row per sample (RFC 4180 quoting, CRLF line ends). */
export function toCsv(samples: LoggedSample[]): string {
  const rows = samples.map((s) => [s.clientReadingId, s.batchId, s.deviceId, s.deviceTime, s.quantity, s.subject, s.value, s.unit].map(csvField).join(','));
  return [CSV_COLUMNS.join(','), ...rows].join('\r\n') + '\r\n';
}

export async function runLogger(client: Pourgate | null, opts: LoggerOptions): Promise<LoggedSample[]> {
  const log = opts.log ?? (() => undefined);
  const now = opts.now ?? Date.now;
  const room = opts.roomC ?? 22;
  const tau = opts.timeConstantS ?? 1800;
  const interval = opts.intervalS ?? 60;
  const n = opts.samples ?? 3;
  const post = client !== null && opts.post !== false;
  const tag = opts.tag ?? 'logger';
  const t0 = opts.realtime ? now() : now() - (n - 1) * interval * 1000;
  const out: LoggedSample[] = [];
  for (let i = 0; i < n; i++) {
    if (opts.realtime && i > 0) await sleep(interval * 1000);
    const at = opts.realtime ? now() : t0 + i * interval * 1000;
    const batch: LoggedSample[] = opts.channels.map((ch) => ({
      clientReadingId: `${tag}-${opts.batchId.slice(0, 8)}-${ch.subject}-${i + 1}`,
      batchId: opts.batchId,
      deviceId: opts.deviceId ?? '',
      deviceTime: new Date(at).toISOString(),
      quantity: 'temperature',
      subject: ch.subject,
      value: Math.round(driftToward(ch.startC, room, (at - t0) / 1000, tau) * 10) / 10,
      unit: 'degC',
    }));
    if (post) {
      const { items } = await client!.postReadings(batch.map(({ clientReadingId, batchId, deviceTime, quantity, subject, value, unit }) => ({ clientReadingId, batchId, deviceTime, quantity, subject, value, unit })));
      items.forEach((ack, k) => (batch[k]!.ack = ack));
    }
    log(batch.map((s) => `${s.subject} ${s.value.toFixed(1)} °C`).join(', '));
    out.push(...batch);
  }
  if (opts.csvFile) {
    await fs.writeFile(opts.csvFile, toCsv(out));
    log(`wrote ${out.length} samples to ${opts.csvFile}`);
  }
  return out;
}

if (isMain(import.meta.url)) {
  const argv = await (await cli('$0 --batch <id> [options]', 'temperature-logger: log component, mold and ambient temperatures for a batch'))
    .option('batch', { type: 'string', demandOption: true, describe: 'Batch the samples belong to' })
    .option('device', { type: 'string', describe: 'The logger\'s device id (written in the CSV)' })
    .option('part-a', { type: 'number', default: 21, describe: 'Part A drum probe at the start, °C' })
    .option('part-b', { type: 'number', default: 21, describe: 'Part B drum probe at the start, °C' })
    .option('mold', { type: 'number', default: 24, describe: 'Mold probe at the start, °C' })
    .option('room', { type: 'number', default: 22, describe: 'Room temperature the probes drift toward, °C' })
    .option('tau', { type: 'number', default: 1800, describe: 'Time constant of the drift, seconds' })
    .option('interval', { type: 'number', default: 60, describe: 'Seconds between samples' })
    .option('samples', { type: 'number', default: 3, describe: 'Samples per channel' })
    .option('realtime', { type: 'boolean', default: false, describe: 'Wait the interval between samples (else back-dated, sent at once)' })
    .option('csv', { type: 'string', describe: 'Also write the samples to this CSV file (the import format)' })
    .option('post', { type: 'boolean', default: true, describe: 'Post the samples (--no-post: only write the CSV)' })
    .parseAsync();
  const client = !argv.post ? null : clientFor(argv.api, argv.key);
  await runLogger(client, {
    batchId: argv.batch,
    deviceId: argv.device,
    channels: [
      { subject: 'part_a', startC: argv['part-a'] },
      { subject: 'part_b', startC: argv['part-b'] },
      { subject: 'mold', startC: argv.mold },
      { subject: 'ambient', startC: argv.room },
    ],
    roomC: argv.room,
    timeConstantS: argv.tau,
    intervalS: argv.interval,
    samples: argv.samples,
    realtime: argv.realtime,
    csvFile: argv.csv,
    log: (l) => console.log(`[logger] ${l}`),
  });
}
