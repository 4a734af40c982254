/**
 * A mold's cavity as the API takes it (measurements in shop units) and the volumes the computation
 * works out from it (m³): box, cylinder, water fill or entered volume, less inserts, times cavities.
 */
import { BatchingInputError } from '../errors.js';
import { moldVolume, type MoldVolume, type VolumeMeasurement } from '../mold-volume.js';
import { MAX_PACK_FACTOR } from '../targets.js';
import type { Dimension } from '../units.js';
import type { FieldError } from './field-errors.js';
import { translate } from './field-errors.js';
import { QuantityReader, type Quantity } from './quantities.js';

export type MeasurementKind = VolumeMeasurement['kind'];

export interface MeasurementInput {
  kind: MeasurementKind;
  length?: Quantity;
  width?: Quantity;
  height?: Quantity;
  diameter?: Quantity;
  waterMass?: Quantity;
  waterTemperature?: Quantity;
  volume?: Quantity;
}

export interface MoldGeometryInput {
  name?: string;
  code?: string | null;
  cavity: MeasurementInput;
  inserts?: MeasurementInput[];
  cavities?: number;
  defaultPackFactor?: number | null;
  notes?: string | null;
}

const FIELD_DIMENSION: Record<string, Dimension> = {
  length: 'length',
  width: 'length',
  height: 'length',
  diameter: 'length',
  waterMass: 'mass',
  waterTemperature: 'temperature',
  volume: 'volume',
};

const FIELDS_OF: Record<MeasurementKind, readonly string[]> = {
  box: ['length', 'width', 'height'],
  cylinder: ['diameter', 'height'],
  water_fill: ['waterMass', 'waterTemperature'],
  entered: ['volume'],
};

const KIND_WORDS: Record<MeasurementKind, string> = { box: 'a box', cylinder: 'a cylinder', water_fill: 'a water fill', entered: 'an entered volume' };

/** `/cavity/length` (the computation's pointer) → `/cavity/length/value` (the request's quantity), unless it is missing. */
function valuePointer(pointer: string, code: string): string {
  const last = pointer.split('/').pop() ?? '';
  return FIELD_DIMENSION[last] && code !== 'required' ? `${pointer}/value` : pointer;
}

function readMeasurement(q: QuantityReader, m: MeasurementInput, pointer: string): VolumeMeasurement | null {
  const si: Record<string, number> = {};
  let ok = true;
  for (const field of Object.keys(FIELD_DIMENSION)) {
    const given = (m as unknown as Record<string, Quantity | undefined>)[field];
    if (given === undefined) continue;
    if (!FIELDS_OF[m.kind].includes(field)) {
      q.add(`${pointer}/${field}`, `is not used by ${KIND_WORDS[m.kind]} (it takes ${FIELDS_OF[m.kind].join(', ')})`, 'not_for_kind');
      ok = false;
      continue;
    }
    const v = q.read(FIELD_DIMENSION[field]!, given, `${pointer}/${field}`, field === 'waterTemperature' ? {} : { positive: true });
    if (typeof v === 'number') si[field] = v;
    else ok = false;
  }
  return ok ? ({ kind: m.kind, ...si } as VolumeMeasurement) : null;
}

export interface MoldGeometrySI {
  cavity: VolumeMeasurement;
  inserts: VolumeMeasurement[];
  volume: MoldVolume;
  defaultPackFactor: number | null;
}

/** Measurements → SI volumes; every problem is collected with its pointer under `base`. */
export function readMoldGeometry(body: MoldGeometryInput, base = ''): { geometry: MoldGeometrySI | null; errors: FieldError[] } {
  const q = new QuantityReader();
  const cavity = readMeasurement(q, body.cavity, `${base}/cavity`);
  const inserts = (body.inserts ?? []).map((m, i) => readMeasurement(q, m, `${base}/inserts/${i}`));
  const pack = body.defaultPackFactor ?? null;
  if (pack !== null && !(pack > 0 && pack <= MAX_PACK_FACTOR)) {
    q.add(`${base}/defaultPackFactor`, pack <= 0 ? 'must be greater than 0' : `must be at most ${MAX_PACK_FACTOR}: a higher pack factor makes no physical sense`, 'out_of_range');
  }
  if (q.errors.length || !cavity || inserts.some((m) => m === null)) return { geometry: null, errors: q.errors };
  try {
    const volume = moldVolume({ cavity, inserts: inserts as VolumeMeasurement[], cavities: body.cavities ?? 1 }, base);
    return { geometry: { cavity, inserts: inserts as VolumeMeasurement[], volume, defaultPackFactor: pack }, errors: [] };
  } catch (e) {
    if (e instanceof BatchingInputError) return { geometry: null, errors: translate(e, valuePointer) };
    throw e;
  }
}
