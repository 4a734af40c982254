import { displayUnits, fromSI, type Dimension, type UnitSystem } from '@pourgate/batching';

/** The SI symbols the computation writes, and the dimension each belongs to. */
const SI_DIMENSIONS: Readonly<Record<string, Dimension>> = {
  kg: 'mass',
  m3: 'volume',
  'kg/m3': 'density',
  degC: 'temperature',
  s: 'time',
};

export interface DisplayedQuantity {
  value: number;
  unit: string;
  si: { value: number; unit: string };
}

function isQuantity(node: unknown): node is { value: number; unit: string } {
  if (!node || typeof node !== 'object' || Array.isArray(node)) return false;
  const keys = Object.keys(node);
  const q = node as { value?: unknown; unit?: unknown };
  return keys.length === 2 && typeof q.value === 'number' && typeof q.unit === 'string';
}

/** One SI quantity in the display unit of its dimension, with the SI value alongside. */
export function displayQuantity(value: number, siUnit: string, system: UnitSystem): DisplayedQuantity | { value: number; unit: string } {
  const dimension = SI_DIMENSIONS[siUnit];
  if (!dimension) return { value, unit: siUnit };
  const unit = displayUnits(system)[dimension];
  return { value: fromSI(dimension, value, unit), unit, si: { value, unit: siUnit } };
}

/**
 * A copy of a computed result with every SI `{ value, unit }` shown in the caller's unit system
 * and its SI value kept beside it as `si`. Warnings' `measured`/`limit` (SI) gain a `display` twin.
 * Dimensionless figures ('1', '%', days) are left as they are.
 */
export function inDisplayUnits<T>(node: T, system: UnitSystem): unknown {
  if (Array.isArray(node)) return node.map((n) => inDisplayUnits(n, system));
  if (!node || typeof node !== 'object') return node;
  if (isQuantity(node)) return displayQuantity(node.value, node.unit, system);
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(node as Record<string, unknown>)) out[k] = inDisplayUnits(v, system);
  const w = node as { measured?: unknown; limit?: unknown; unit?: unknown; code?: unknown };
  if (typeof w.code === 'string' && typeof w.unit === 'string' && SI_DIMENSIONS[w.unit]) {
    const dimension = SI_DIMENSIONS[w.unit]!;
    const unit = displayUnits(system)[dimension];
    out.display = {
      measured: typeof w.measured === 'number' ? fromSI(dimension, w.measured, unit) : null,
      limit: typeof w.limit === 'number' ? fromSI(dimension, w.limit, unit) : null,
      unit,
    };
  }
  return out;
}
