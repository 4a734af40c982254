import { toSI, UnitError, type Dimension } from '../units.js';
import type { Quantity } from '../targets.js';
import type { FieldError } from './field-errors.js';

/** A quantity as the API takes it: `{ value, unit }` in any accepted unit of its dimension. */
export type { Quantity };

export interface QuantityRule {
  /** Greater than zero (in SI; every dimension but temperature has its zero at SI zero). */
  positive?: boolean;
  /** Not below zero. */
  nonNegative?: boolean;
}

/** Absolute zero, °C: no temperature is below it. */
export const ABSOLUTE_ZERO_C = -273.15;

/**
 * Reads `{ value, unit }` quantities into SI, collecting every problem as a FieldError located by
 * JSON Pointer, so one 422 answers for all bad fields of a request.
 */
export class QuantityReader {
  readonly errors: FieldError[] = [];

  add(pointer: string, detail: string, code: string): void {
    this.errors.push({ pointer, detail, code });
  }

  /** SI value; `undefined` when absent, `null` when explicitly null, or when it failed (see errors). */
  read(dimension: Dimension, q: Quantity | null | undefined, pointer: string, rule: QuantityRule = {}): number | null | undefined {
    if (q === undefined) return undefined;
    if (q === null) return null;
    let si: number;
    try {
      si = toSI(dimension, q.value, q.unit);
    } catch (e) {
      if (e instanceof UnitError) {
        this.add(e.code === 'VALUE_NOT_FINITE' ? `${pointer}/value` : `${pointer}/unit`, e.message, e.code === 'VALUE_NOT_FINITE' ? 'type' : 'unit');
        return undefined;
      }
      throw e;
    }
    if (rule.positive && !(si > 0)) {
      this.add(`${pointer}/value`, 'must be greater than zero', 'exclusiveMinimum');
      return undefined;
    }
    if (rule.nonNegative && si < 0) {
      this.add(`${pointer}/value`, 'must not be negative', 'minimum');
      return undefined;
    }
    if (dimension === 'temperature' && si < ABSOLUTE_ZERO_C) {
      this.add(`${pointer}/value`, 'is below absolute zero', 'minimum');
      return undefined;
    }
    return si;
  }

  /**
   * A rate of density per temperature difference, e.g. `kg/m3/degC` or `lb/ft3/degF`: the density
   * part converts as a density, the temperature part as a difference (×5/9, no offset).
   */
  readDensityPerTemperature(q: Quantity | null | undefined, pointer: string): number | null | undefined {
    if (q === undefined) return undefined;
    if (q === null) return null;
    const unit = String(q.unit ?? '').trim();
    const cut = unit.lastIndexOf('/');
    const densityUnit = cut > 0 ? unit.slice(0, cut).trim() : '';
    const temperatureUnit = cut > 0 ? unit.slice(cut + 1).trim() : '';
    try {
      const perDegree = toSI('temperature_difference', 1, temperatureUnit);
      return toSI('density', q.value, densityUnit) / perDegree;
    } catch (e) {
      if (e instanceof UnitError) {
        this.add(e.code === 'VALUE_NOT_FINITE' ? `${pointer}/value` : `${pointer}/unit`, `write it as <density unit>/<temperature unit>, e.g. kg/m3/degC or lb/ft3/degF; ${e.message}`, e.code === 'VALUE_NOT_FINITE' ? 'type' : 'unit');
        return undefined;
      }
      throw e;
    }
  }
}

/** `null` and `undefined` both become `undefined`, as the computation's optional fields expect. */
export function opt<T>(v: T | null | undefined): T | undefined {
  return v === null || v === undefined ? undefined : v;
}
