import { formatNumber } from '../format/quantities';
import { MEASUREMENT_FIELDS, MEASUREMENT_KINDS, type MeasurementKind } from './volumeHelper';
import type { Mold } from '../views/sdk';

export interface MeasurementRecord {
  kind: MeasurementKind;
  [field: string]: { value: number; unit: string } | MeasurementKind;
}

export type { Mold };

const UNIT_TEXT: Record<string, string> = { cm3: 'cm³', m3: 'm³', in3: 'in³', ft3: 'ft³', degC: '°C', degF: '°F', gal: 'US gal' };

/** "Box 280 × 70 × 60 mm", "Water fill 14.2 kg at 21 °C", as the mold was measured. */
export function measurementText(m: MeasurementRecord | undefined): string {
  if (!m) return '—';
  const kind = MEASUREMENT_KINDS.find((k) => k.id === m.kind)?.name ?? m.kind;
  const q = (f: string) => {
    const v = m[f] as { value: number; unit: string } | undefined;
    return v ? { n: formatNumber(v.value, { significant: 5 }), u: UNIT_TEXT[v.unit] ?? v.unit } : null;
  };
  const fields = MEASUREMENT_FIELDS[m.kind]?.map((f) => q(f.field)) ?? [];
  if (fields.some((f) => !f)) return kind;
  if (m.kind === 'water_fill') return `${kind} ${fields[0]!.n} ${fields[0]!.u} at ${fields[1]!.n} ${fields[1]!.u}`;
  const sameUnit = fields.every((f) => f!.u === fields[0]!.u);
  return sameUnit ? `${kind} ${fields.map((f) => f!.n).join(' × ')} ${fields[0]!.u}` : `${kind} ${fields.map((f) => `${f!.n} ${f!.u}`).join(' × ')}`;
}

/** An empty measurement of a kind, every quantity with a default unit, for the form. */
export function blankMeasurement(kind: MeasurementKind, metric = true): Record<string, unknown> {
  const unit = { length: metric ? 'mm' : 'in', mass: metric ? 'kg' : 'lb', temperature: metric ? 'degC' : 'degF', volume: metric ? 'L' : 'in3' } as const;
  const out: Record<string, unknown> = { kind };
  for (const k of Object.keys(MEASUREMENT_FIELDS) as MeasurementKind[]) {
    for (const f of MEASUREMENT_FIELDS[k]) if (!(f.field in out)) out[f.field] = { value: null, unit: unit[f.dimension as keyof typeof unit] };
  }
  return out;
}

/** The edit form starts from the mold as measured, with every other kind's inputs ready and empty. */
export function moldFormValues(m: Mold, metric = true): Record<string, unknown> {
  const fill = (x: MeasurementRecord) => ({ ...blankMeasurement(x.kind, metric), ...x });
  return { ...m, cavity: fill(m.cavity), inserts: (m.inserts ?? []).map(fill) };
}
