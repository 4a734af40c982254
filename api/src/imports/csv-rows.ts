/**
 * A logger CSV, row by row, as reading inputs: pure, no I/O. Parsing is csv-parse's; this maps the
 * columns and says, with line numbers, what cannot become a reading at all.
 */
import { parse } from 'csv-parse/sync';
import type { ReadingInput } from '../readings/readings.service.js';
import { CSV_OPTIONAL, CSV_REQUIRED } from './imports.constants.js';

export interface CsvRow {
  /** 1-based line in the file (the header is line 1). */
  line: number;
  input: ReadingInput;
}

export interface BadRow {
  line: number;
  errors: { field: string; detail: string }[];
}

export class CsvFileError extends Error {
  constructor(message: string, readonly field = 'file') {
    super(message);
  }
}

const TRUE = new Set(['true', '1', 'yes', 'y']);
const FALSE = new Set(['false', '0', 'no', 'n']);
// the ids are PostgreSQL uuids: a malformed one is this row's fault, and must never reach a query
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Header check and row mapping. Throws CsvFileError when the file as a whole cannot be read. */
export function parseReadingsCsv(text: string): { rows: CsvRow[]; bad: BadRow[] } {
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text.replace(/^\uFEFF/, ''), { info: true, relax_column_count: true, skip_empty_lines: true, trim: true }) as unknown as typeof records;
  } catch (e) {
    throw new CsvFileError(`The file is not valid CSV: ${(e as Error).message}`);
  }
  if (records.length === 0) throw new CsvFileError('The file is empty: it needs a header row and at least one reading.');
  const header = records[0]!.record.map((h) => h.toLowerCase());
  const known: readonly string[] = [...CSV_REQUIRED, ...CSV_OPTIONAL];
  const unknown = header.filter((h) => !known.includes(h));
  if (unknown.length) throw new CsvFileError(`Unknown column(s) ${unknown.map((u) => `"${u}"`).join(', ')}; the columns are ${known.join(', ')}.`, 'header');
  const missing = CSV_REQUIRED.filter((h) => !header.includes(h));
  if (missing.length) throw new CsvFileError(`Missing column(s) ${missing.join(', ')} in the header row.`, 'header');
  const dup = header.find((h, i) => header.indexOf(h) !== i);
  if (dup) throw new CsvFileError(`The column "${dup}" appears twice in the header row.`, 'header');

  const rows: CsvRow[] = [];
  const bad: BadRow[] = [];
  for (const { record, info } of records.slice(1)) {
    const line = info.lines;
    const cell = (name: string) => {
      const i = header.indexOf(name);
      const v = i >= 0 ? record[i] : undefined;
      return v === undefined || v === '' ? undefined : v;
    };
    const errors: BadRow['errors'] = [];
    if (record.length !== header.length) errors.push({ field: 'row', detail: `has ${record.length} cells; the header has ${header.length}` });
    for (const name of CSV_REQUIRED) if (cell(name) === undefined) errors.push({ field: name, detail: 'is empty' });
    for (const name of ['batch_id', 'device_id'] as const) {
      const id = cell(name);
      if (id !== undefined && !UUID.test(id)) errors.push({ field: name, detail: `"${id.slice(0, 60)}" is not an id (a UUID such as 6f1c2d3e-0000-4000-8000-000000000001)` });
    }
    const rawValue = cell('value');
    const value = rawValue === undefined ? undefined : Number(rawValue);
    if (rawValue !== undefined && !Number.isFinite(value)) errors.push({ field: 'value', detail: `"${rawValue}" is not a number` });
    const rawStable = cell('stable')?.toLowerCase();
    if (rawStable !== undefined && !TRUE.has(rawStable) && !FALSE.has(rawStable)) errors.push({ field: 'stable', detail: 'must be true or false' });
    const rawTime = cell('device_time');
    if (rawTime !== undefined && Number.isNaN(Date.parse(rawTime))) errors.push({ field: 'device_time', detail: `"${rawTime}" is not a date-time` });
    if (errors.length) {
      bad.push({ line, errors });
      continue;
    }
    const input: ReadingInput = {
      clientReadingId: cell('client_reading_id')!,
      batchId: cell('batch_id')!,
      quantity: cell('quantity') as ReadingInput['quantity'],
      subject: cell('subject') as ReadingInput['subject'],
      ...(cell('device_id') !== undefined ? { deviceId: cell('device_id') } : {}),
      ...(rawTime !== undefined ? { deviceTime: new Date(rawTime).toISOString() } : {}),
      ...(value !== undefined ? { value } : {}),
      ...(cell('unit') !== undefined ? { unit: cell('unit') } : {}),
      ...(rawStable !== undefined ? { stable: TRUE.has(rawStable) } : {}),
    };
    rows.push({ line, input });
  }
  return { rows, bad };
}

/** A field of the reading body → the CSV column it came from. */
export function columnOf(field: string): string {
  return { clientReadingId: 'client_reading_id', batchId: 'batch_id', deviceId: 'device_id', deviceTime: 'device_time' }[field] ?? field;
}
