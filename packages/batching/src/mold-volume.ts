/**
 * Cavity volume of a mold, in m³, from whichever measurement the shop has: box or cylinder
 * dimensions, a water fill, or a volume entered from CAD; less the inserts; times the cavities.
 */
import { joinPointer } from './errors.js';
import { IssueCollector } from './validation.js';

/**
 * Density of air-free water at 101.325 kPa, kg/m³, at each whole °C from 0 to 40: Kell's
 * formulation (G. S. Kell, "Density, thermal expansivity, and compressibility of liquid water from
 * 0° to 150 °C", J. Chem. Eng. Data 20 (1975) 97–105, eq. 16), evaluated at the row temperatures and
 * rounded to 0.001 kg/m³. The rows agree with the water density table of the CRC Handbook of
 * Chemistry and Physics ("Properties of water in the range 0–100 °C") to within about 0.005 kg/m³,
 * far below what a water fill can resolve.
 */
export const WATER_DENSITY_TABLE: readonly (readonly [temperature: number, density: number])[] = Object.freeze(
  [
    999.84, 999.899, 999.94, 999.964, 999.972, 999.964, 999.94, 999.901, 999.848, 999.781,
    999.7, 999.605, 999.497, 999.377, 999.244, 999.1, 998.943, 998.775, 998.596, 998.405,
    998.204, 997.992, 997.771, 997.538, 997.297, 997.045, 996.784, 996.513, 996.234, 995.945,
    995.647, 995.341, 995.026, 994.703, 994.372, 994.032, 993.684, 993.329, 992.965, 992.594,
    992.216,
  ].map((density, temperature) => Object.freeze([temperature, density] as const)),
);

export const WATER_TABLE_MIN_TEMPERATURE = 0;
export const WATER_TABLE_MAX_TEMPERATURE = 40;

/**
 * Density of water (kg/m³) at a temperature in °C, interpolated linearly between the table's 1 °C
 * rows (the curvature makes that good to about 0.002 kg/m³, 2 ppm).
 */
export function waterDensity(temperature: number): number {
  if (!Number.isFinite(temperature) || temperature < WATER_TABLE_MIN_TEMPERATURE || temperature > WATER_TABLE_MAX_TEMPERATURE) {
    throw new RangeError(
      `Water density is tabulated from ${WATER_TABLE_MIN_TEMPERATURE} to ${WATER_TABLE_MAX_TEMPERATURE} °C; got ${temperature} °C.`,
    );
  }
  const lower = Math.min(Math.floor(temperature), WATER_TABLE_MAX_TEMPERATURE - 1);
  const [t0, d0] = WATER_DENSITY_TABLE[lower]!;
  const [t1, d1] = WATER_DENSITY_TABLE[lower + 1]!;
  return d0 + ((d1 - d0) * (temperature - t0)) / (t1 - t0);
}

function requirePositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${name} must be a finite number greater than 0; got ${value}.`);
}

/** Volume (m³) of a rectangular cavity from its inside length, width and height (m). */
export function boxVolume(length: number, width: number, height: number): number {
  requirePositive('length', length);
  requirePositive('width', width);
  requirePositive('height', height);
  return length * width * height;
}

/** Volume (m³) of a cylindrical cavity from its inside diameter and height (m). */
export function cylinderVolume(diameter: number, height: number): number {
  requirePositive('diameter', diameter);
  requirePositive('height', height);
  return (Math.PI * diameter * diameter * height) / 4;
}

/** Volume (m³) held by a water fill: the water's mass (kg) ÷ its density at its temperature (°C). */
export function waterFillVolume(waterMass: number, waterTemperature: number): number {
  requirePositive('waterMass', waterMass);
  return waterMass / waterDensity(waterTemperature);
}

/** A way of knowing a volume. Lengths in m, masses in kg, temperatures in °C, volumes in m³. */
export type VolumeMeasurement =
  | { readonly kind: 'box'; readonly length: number; readonly width: number; readonly height: number }
  | { readonly kind: 'cylinder'; readonly diameter: number; readonly height: number }
  | { readonly kind: 'water_fill'; readonly waterMass: number; readonly waterTemperature: number }
  | { readonly kind: 'entered'; readonly volume: number };

export const VOLUME_MEASUREMENT_KINDS = ['box', 'cylinder', 'water_fill', 'entered'] as const;

export interface MoldGeometry {
  /** One cavity, as measured. A water fill made with the inserts in place already excludes them. */
  readonly cavity: VolumeMeasurement;
  /** Inserts, cores and embedded parts that the foam does not fill, each measured like a cavity. */
  readonly inserts?: readonly VolumeMeasurement[];
  /** Identical cavities filled from one pour; 1 when absent. */
  readonly cavities?: number;
}

export interface MoldVolume {
  /** One cavity as measured, m³. */
  readonly grossCavityVolume: number;
  /** Sum of the inserts of one cavity, m³. */
  readonly insertVolume: number;
  /** One cavity less its inserts, m³: what the foam of one cavity fills. */
  readonly cavityVolume: number;
  readonly cavities: number;
  /** All cavities, m³. */
  readonly totalVolume: number;
}

/** Volume (m³) of one measurement; throws RangeError for values that make no sense. */
export function measuredVolume(measurement: VolumeMeasurement): number {
  switch (measurement.kind) {
    case 'box':
      return boxVolume(measurement.length, measurement.width, measurement.height);
    case 'cylinder':
      return cylinderVolume(measurement.diameter, measurement.height);
    case 'water_fill':
      return waterFillVolume(measurement.waterMass, measurement.waterTemperature);
    case 'entered':
      requirePositive('volume', measurement.volume);
      return measurement.volume;
  }
}

function checkMeasurement(issues: IssueCollector, pointer: string, measurement: VolumeMeasurement | undefined): boolean {
  if (!measurement || typeof measurement !== 'object') {
    issues.add(pointer, 'is required', 'required');
    return false;
  }
  if (!issues.oneOf(joinPointer(pointer, 'kind'), measurement.kind, VOLUME_MEASUREMENT_KINDS)) return false;
  const positive = (field: string, value: unknown, unit: string): boolean =>
    issues.number(joinPointer(pointer, field), value, { required: true, above: 0, unit });
  switch (measurement.kind) {
    case 'box':
      return [
        positive('length', measurement.length, 'm'),
        positive('width', measurement.width, 'm'),
        positive('height', measurement.height, 'm'),
      ].every(Boolean);
    case 'cylinder':
      return [positive('diameter', measurement.diameter, 'm'), positive('height', measurement.height, 'm')].every(Boolean);
    case 'water_fill':
      return [
        positive('waterMass', measurement.waterMass, 'kg'),
        issues.number(joinPointer(pointer, 'waterTemperature'), measurement.waterTemperature, {
          required: true,
          min: WATER_TABLE_MIN_TEMPERATURE,
          max: WATER_TABLE_MAX_TEMPERATURE,
          unit: '°C (the range of the water density table)',
        }),
      ].every(Boolean);
    case 'entered':
      return positive('volume', measurement.volume, 'm3');
  }
}

/**
 * The volume the foam fills in a mold. Throws BatchingInputError with pointers under `pointerBase`
 * (e.g. `/geometry`) for any measurement that makes no sense, or inserts that fill the cavity.
 */
export function moldVolume(geometry: MoldGeometry, pointerBase = ''): MoldVolume {
  const issues = new IssueCollector();
  const cavityOk = checkMeasurement(issues, joinPointer(pointerBase, 'cavity'), geometry.cavity);
  const inserts = geometry.inserts ?? [];
  const insertsOk = inserts.map((insert, i) => checkMeasurement(issues, joinPointer(pointerBase, 'inserts', i), insert)).every(Boolean);
  const cavities = geometry.cavities ?? 1;
  issues.number(joinPointer(pointerBase, 'cavities'), cavities, { integer: true, min: 1 });
  issues.throwIfAny();

  const grossCavityVolume = cavityOk ? measuredVolume(geometry.cavity) : Number.NaN;
  const insertVolume = insertsOk ? inserts.reduce((sum, insert) => sum + measuredVolume(insert), 0) : Number.NaN;
  const cavityVolume = grossCavityVolume - insertVolume;
  if (!(cavityVolume > 0)) {
    issues.add(joinPointer(pointerBase, 'inserts'), 'the inserts take up the whole cavity (or more)', 'inserts_exceed_cavity');
    issues.throwIfAny();
  }
  return { grossCavityVolume, insertVolume, cavityVolume, cavities, totalVolume: cavityVolume * cavities };
}
