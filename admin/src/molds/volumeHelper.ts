/**
 * The live volume read-out of the mold form: the same functions the API computes the stored
 * volume with (box, cylinder, water fill by the water density table, entered; less inserts; times
 * cavities), fed with the form's shop units converted to SI. The API still computes and stores the
 * volume on save; this only lets the engineer see it while measuring.
 */
import { moldVolume, waterDensity, WATER_TABLE_MAX_TEMPERATURE, WATER_TABLE_MIN_TEMPERATURE, type MoldVolume, type VolumeMeasurement } from '@pourgate/batching/mold-volume';
import { toSI, type Dimension } from '../format/quantities';

export type MeasurementKind = VolumeMeasurement['kind'];

export const MEASUREMENT_KINDS: readonly { id: MeasurementKind; name: string; hint: string }[] = [
  { id: 'box', name: 'Box', hint: 'Inside length × width × height' },
  { id: 'cylinder', name: 'Cylinder', hint: 'Inside diameter and height' },
  { id: 'water_fill', name: 'Water fill', hint: 'Mass of water that fills it, and the water’s temperature' },
  { id: 'entered', name: 'Known volume', hint: 'A volume from CAD or the mold maker' },
];

export const MEASUREMENT_FIELDS: Readonly<Record<MeasurementKind, readonly { field: string; label: string; dimension: Dimension }[]>> = {
  box: [
    { field: 'length', label: 'Length', dimension: 'length' },
    { field: 'width', label: 'Width', dimension: 'length' },
    { field: 'height', label: 'Height', dimension: 'length' },
  ],
  cylinder: [
    { field: 'diameter', label: 'Diameter', dimension: 'length' },
    { field: 'height', label: 'Height', dimension: 'length' },
  ],
  water_fill: [
    { field: 'waterMass', label: 'Water mass', dimension: 'mass' },
    { field: 'waterTemperature', label: 'Water temperature', dimension: 'temperature' },
  ],
  entered: [{ field: 'volume', label: 'Volume', dimension: 'volume' }],
};

interface FormQuantity {
  value?: unknown;
  unit?: string;
}
export interface FormMeasurement {
  kind?: MeasurementKind;
  [field: string]: FormQuantity | MeasurementKind | undefined;
}

export type VolumePreview =
  | { ok: true; volume: MoldVolume; waterDensity?: number }
  | { ok: false; missing: boolean; message: string };

function measurementSI(m: FormMeasurement | undefined, what: string): VolumeMeasurement | { missing: boolean; message: string } {
  if (!m?.kind || !MEASUREMENT_FIELDS[m.kind]) return { missing: true, message: `Choose how the ${what} was measured.` };
  const si: Record<string, number> = {};
  for (const f of MEASUREMENT_FIELDS[m.kind]) {
    const q = m[f.field] as FormQuantity | undefined;
    const v = toSI(f.dimension, q?.value, q?.unit ?? '');
    if (v === null) return { missing: true, message: `Enter the ${what}’s ${f.label.toLowerCase()}.` };
    if (f.dimension !== 'temperature' && !(v > 0)) return { missing: false, message: `The ${what}’s ${f.label.toLowerCase()} must be greater than zero.` };
    si[f.field] = v;
  }
  if (m.kind === 'water_fill' && (si.waterTemperature! < WATER_TABLE_MIN_TEMPERATURE || si.waterTemperature! > WATER_TABLE_MAX_TEMPERATURE)) {
    return { missing: false, message: `Water temperature must be ${WATER_TABLE_MIN_TEMPERATURE}–${WATER_TABLE_MAX_TEMPERATURE} °C (32–104 °F), the range of the water density table.` };
  }
  return { kind: m.kind, ...si } as VolumeMeasurement;
}

/** Volumes (m³) of what the form holds so far, or what is still missing or wrong. */
export function previewMoldVolume(form: { cavity?: FormMeasurement; inserts?: FormMeasurement[]; cavities?: unknown }): VolumePreview {
  const cavity = measurementSI(form.cavity, 'cavity');
  if (!('kind' in cavity)) return { ok: false, ...cavity };
  const inserts: VolumeMeasurement[] = [];
  for (const [i, m] of (form.inserts ?? []).entries()) {
    const si = measurementSI(m, `insert ${i + 1}`);
    if (!('kind' in si)) return { ok: false, ...si };
    inserts.push(si);
  }
  const cavities = form.cavities === undefined || form.cavities === '' || form.cavities === null ? 1 : Number(form.cavities);
  if (!Number.isInteger(cavities) || cavities < 1) return { ok: false, missing: false, message: 'Cavities must be a whole number, at least 1.' };
  try {
    const volume = moldVolume({ cavity, inserts, cavities });
    return { ok: true, volume, waterDensity: cavity.kind === 'water_fill' ? waterDensity(cavity.waterTemperature) : undefined };
  } catch {
    return { ok: false, missing: false, message: 'The inserts take up the whole cavity (or more).' };
  }
}
