/**
 * Batch targets: everything a pour needs, composed from the pieces of this folder. All inputs and
 * outputs are SI — kg, m³, kg/m³, °C, s — with percents named `…Percent` and dates `YYYY-MM-DD`; every
 * output figure carries its unit. Bad input throws BatchingInputError with JSON pointers into the
 * input (`/system/specificGravityA`), for a 422.
 */
import { cautionsFor, type Caution } from './cautions.js';
import { expectedFreeRiseDensity, type CupTestPoint, type ExpectedDensityMethod, type FitRejection, type FreeRiseFit } from './density.js';
import { BatchingInputError, joinPointer } from './errors.js';
import { indexAfterRatioError, isocyanateIndex } from './isocyanate-index.js';
import {
  DEFAULT_ALLOWANCE_CONVENTION,
  mixedMass as grossUp,
  foamMass as foamMassOf,
  roundPourMasses,
  splitMixedMass,
  type AllowanceConvention,
  type AllowanceForm,
} from './mass.js';
import {
  componentVolumes,
  sideOf,
  volumeRatioFromWeightRatio,
  weightRatioFromVolumeRatio,
  type MixRatio,
  type Part,
  type RatioBasis,
  type Side,
} from './ratio.js';
import { IssueCollector } from './validation.js';
import {
  COMPONENT_TEMPERATURE_BOUNDS,
  DENSITY_MODEL_SPAN_C,
  FOAM_DENSITY_BOUNDS,
  HYDROXYL_NUMBER_BOUNDS,
  INDEX_BOUNDS,
  MAX_BATCH_MASS_KG,
  MAX_CAVITIES,
  MAX_CAVITY_VOLUME_M3,
  MAX_CUP_VOLUME_M3,
  MAX_RATIO_QUOTIENT,
  MAX_SLOPE_SHARE_PER_C,
  MINIMUM_TARGET_DIVISIONS,
  NCO_PERCENT_BOUNDS,
  SPECIFIC_GRAVITY_BOUNDS,
} from './bounds.js';
import type { SystemKind } from './findings.js';
import { COMPUTATION_VERSION } from './version.js';
import {
  DEFAULT_EXOTHERM_MASS_LIMIT,
  DEFAULT_MINIMUM_TOLERANCE_DIVISIONS,
  checkComponentTemperature,
  checkExothermMass,
  checkLotExpiry,
  checkPackFactor,
  checkPigment,
  checkScaleCalibration,
  checkScaleCapacity,
  checkToleranceResolution,
  type BatchWarning,
  type LotExpiry,
} from './warnings.js';

/** ±5 % on the A:B ratio: common practice when the data sheet gives no tolerance. */
export const DEFAULT_RATIO_TOLERANCE_PERCENT = 5;
/** A pack factor above this makes no physical sense for a molded foam. */
export const MAX_PACK_FACTOR = 10;
const ABSOLUTE_ZERO_C = -273.15;

/** A two-component formulation, as the computation needs it. */
export type PigmentDoseBasis = 'ab' | 'polyol' | 'total';
export type PigmentPlacement = 'separate' | 'A' | 'B';
export type ReleaseRequirement = 'component_temperature' | 'mold_temperature' | 'ambient_temperature' | 'humidity' | 'mix_start' | 'pour' | 'demold';
export const RELEASE_REQUIREMENTS: readonly ReleaseRequirement[] = ['component_temperature', 'mold_temperature', 'ambient_temperature', 'humidity', 'mix_start', 'pour', 'demold'];

export interface MaterialSystemParameters {
  /** Flexible, integral skin or other: how off-ratio effects are worded. */
  readonly kind?: SystemKind;
  /** Whether `ratio` is by weight or by volume. */
  readonly ratioBasis: RatioBasis;
  /** A:B, e.g. `{ a: 100, b: 45 }`. */
  readonly ratio: MixRatio;
  readonly specificGravityA: number;
  readonly specificGravityB: number;
  /** Which part is the isocyanate side. */
  readonly isocyanatePart: Part;
  /** Free-rise density at the reference component temperature, kg/m³. */
  readonly freeRiseDensity: number;
  /** °C. */
  readonly freeRiseReferenceTemperature: number;
  /** Change of free-rise density per °C of component temperature, kg/m³ per °C. */
  readonly freeRiseDensitySlope?: number;
  /** ± tolerance on the A:B ratio, percent; 5 when absent. */
  readonly ratioTolerancePercent?: number;
  /**
   * ± tolerance as data sheets often state it: parts by weight of B per the system's A parts
   * (100 : 45 ± 2). Replaces the percent; weight-ratio systems only.
   */
  readonly ratioTolerancePbw?: number;
  /** Component temperature window, °C. */
  readonly componentTemperatureWindow?: { readonly min: number; readonly max: number };
  /** Mold surface temperatures the system is made for, °C. */
  readonly moldTemperatureWindow?: { readonly min: number; readonly max: number };
  /** Shop air temperatures the system is made for, °C. */
  readonly ambientTemperatureWindow?: { readonly min: number; readonly max: number };
  /** Highest relative humidity of the shop air, percent (moisture reacts with isocyanate). */
  readonly maxRelativeHumidity?: number;
  /** ± band on the weighed masses against their targets, percent; the ratio tolerance when absent. */
  readonly massTolerancePercent?: number;
  /** Working time from when A meets B, s. */
  readonly potLife?: number;
  /** s. */
  readonly demoldTime?: number;
  /** s. */
  readonly fullCureTime?: number;
  /** Maximum pigment, percent of the dose basis. */
  readonly maxPigmentPercent?: number;
  /** What a pigment percent is of: A+B (`ab`, when absent), the polyol side, or the total with the pigment. */
  readonly pigmentDoseBasis?: PigmentDoseBasis;
  /** Weighed separately (when absent) or pre-blended in part A or B (that part's target includes it). */
  readonly pigmentPlacement?: PigmentPlacement;
  /** OH number of the pigment paste's carrier, mg KOH/g: counted in the isocyanate index. */
  readonly pigmentCarrierHydroxylNumber?: number;
  /** Cup-test reactivity window (ASTM D7487 terms), s: cream, rise (top of cup), tack-free. */
  readonly creamTimeWindow?: { readonly min: number; readonly max: number };
  readonly riseTimeWindow?: { readonly min: number; readonly max: number };
  readonly tackFreeTimeWindow?: { readonly min: number; readonly max: number };
  /** Free-rise density band at the reference temperature, kg/m³, for judging cup tests. */
  readonly freeRiseDensityBand?: { readonly min: number; readonly max: number };
  /** What must be recorded (and accepted or waived) before a batch is released, besides A, B and pigment. */
  readonly releaseRequires?: readonly ReleaseRequirement[];
  /** %NCO of the isocyanate side. */
  readonly ncoPercent?: number;
  /** OH number of the polyol side as supplied (water not counted), mg KOH/g. */
  readonly hydroxylNumber?: number;
  /** Water in the polyol side, parts per 100 parts of the polyol side. */
  readonly waterPbw?: number;
  /** Highest pack factor the system is made for. */
  readonly packFactorLimit?: number;
  /** Largest single pour (kg) the supplier allows for exotherm; 2 kg (a conservative default) when absent. */
  readonly exothermMassLimit?: number;
  /** The system's own cautions, returned after the standard ones. */
  readonly cautionsText?: string;
}

export interface MoldParameters {
  /** Foam volume of one cavity (inserts already subtracted), m³. */
  readonly volume: number;
  /** Cavities filled from one mix; 1 when absent. */
  readonly cavities?: number;
  readonly defaultPackFactor?: number;
}

/** A free-rise cup test: the foam rises unconstrained, pack factor 1 by definition. */
export interface FreeRiseCupParameters {
  /** Volume the foam should fill, m³. */
  readonly volume: number;
}

export interface ScaleParameters {
  /** Readability d (one division), kg. */
  readonly readability: number;
  /** kg. */
  readonly capacity?: number;
  readonly calibrationDueOn?: string;
}

export interface BatchOptions {
  /** Molded density, kg/m³ (give this or `packFactor`, or neither to use the mold's default). */
  readonly targetDensity?: number;
  readonly packFactor?: number;
  /** Pigment, percent of the system's dose basis (A+B unless it says otherwise); 0 when absent. */
  readonly pigmentPercent?: number;
  /** Extra foam over what the cavity holds, percent of the foam mass. */
  readonly overfillPercent?: number;
  /** Share of the mixed mass left in the container, percent. */
  readonly retentionPercent?: number;
  /** How each allowance grosses up; overfill multiplies and retention divides when absent. */
  readonly allowanceConvention?: AllowanceConvention;
  /** Without a scale the masses are not rounded and the resolution check is skipped. */
  readonly scale?: ScaleParameters;
  readonly lots?: readonly LotExpiry[];
  /** Measured component temperature, °C. */
  readonly componentTemperature?: number;
  /** The date the pour is for, `YYYY-MM-DD`; required with lots or a calibration due date. */
  readonly today?: string;
  /** Scale divisions the ratio band on the smaller part must span; 5 when absent. */
  readonly minimumToleranceDivisions?: number;
}

export interface BatchTargetsInput {
  readonly system: MaterialSystemParameters;
  /** Exactly one of `mold` and `freeRiseCup`. */
  readonly mold?: MoldParameters;
  readonly freeRiseCup?: FreeRiseCupParameters;
  readonly options?: BatchOptions;
  /** The system's QC cup tests, for the expected free-rise density (used from 3 points up). */
  readonly cupTests?: readonly CupTestPoint[];
}

export interface Quantity<U extends string = string> {
  readonly value: number;
  readonly unit: U;
}

export interface MassBand {
  readonly low: Quantity<'kg'>;
  readonly high: Quantity<'kg'>;
}

export interface ComponentTarget {
  readonly part: Part;
  readonly side: Side;
  /** Rounded to the scale's readability when a scale is given. */
  readonly mass: Quantity<'kg'>;
  readonly massUnrounded: Quantity<'kg'>;
  /** For volume dispensing (volume-ratio systems only), m³. */
  readonly volume: Quantity<'m3'> | null;
  /**
   * Mass range that keeps the ratio within tolerance with the other part at its target: A from
   * m_A(1 − t) to m_A(1 + t); B from m_B/(1 + t) to m_B/(1 − t), since e is defined on m_A/m_B.
   */
  readonly toleranceBand: MassBand;
}

export type DensityBasis = 'target_density' | 'pack_factor' | 'mold_default_pack_factor' | 'free_rise_cup';

export interface BatchTargets {
  readonly computationVersion: string;
  readonly subject: 'mold' | 'free_rise_cup';
  /** One cavity (or the cup). */
  readonly cavityVolume: Quantity<'m3'>;
  readonly cavities: number;
  readonly totalVolume: Quantity<'m3'>;
  readonly targetDensity: Quantity<'kg/m3'>;
  /** Against the system's free-rise density at its reference temperature. */
  readonly packFactor: Quantity<'1'>;
  readonly densityBasis: DensityBasis;
  readonly expectedFreeRiseDensity: {
    readonly density: Quantity<'kg/m3'>;
    readonly temperature: Quantity<'degC'>;
    /** False when no component temperature was given, so the reference temperature was used. */
    readonly atComponentTemperature: boolean;
    readonly method: ExpectedDensityMethod;
    /** Why this estimate: the cup tests' line, or why it was not trusted. */
    readonly methodReason: string;
    readonly fitRejected: FitRejection | null;
    readonly fit: FreeRiseFit | null;
  };
  /** Target density ÷ expected free-rise density: the packing the pour will actually get. */
  readonly expectedPackFactor: Quantity<'1'>;
  readonly foamMass: Quantity<'kg'>;
  /** A + B + pigment before rounding: the foam mass grossed up by the allowances. */
  readonly mixedMass: Quantity<'kg'>;
  readonly allowances: {
    readonly overfillPercent: number;
    readonly retentionPercent: number;
    readonly convention: { readonly overfill: AllowanceForm; readonly retention: AllowanceForm };
  };
  readonly ratioBasis: RatioBasis;
  /** A:B by weight, B keeping the system's number of parts. */
  readonly weightRatio: MixRatio;
  readonly volumeRatio: MixRatio;
  readonly ratioTolerancePercent: number;
  readonly components: {
    readonly A: ComponentTarget;
    readonly B: ComponentTarget;
    /**
     * `mass` is what is weighed separately (0 when the pigment is pre-blended in a part, whose
     * target then includes it); `massUnrounded` is the pigment in the batch either way.
     */
    readonly pigment: {
      readonly mass: Quantity<'kg'>;
      readonly massUnrounded: Quantity<'kg'>;
      readonly percentOfAB: number;
      /** The percent as dosed, and of what. */
      readonly dosed: { readonly percent: number; readonly basis: PigmentDoseBasis };
      readonly placement: PigmentPlacement;
    };
  };
  /** Sum of the (rounded) component masses. */
  readonly totalMass: Quantity<'kg'>;
  readonly scaleReadability: Quantity<'kg'> | null;
  /** At the target ratio, with the range the ratio tolerance allows; null without %NCO and OH data. */
  readonly isocyanateIndex: {
    readonly value: number;
    readonly atToleranceLimits: { readonly low: number; readonly high: number };
  } | null;
  readonly timing: {
    readonly potLife: Quantity<'s'> | null;
    readonly demoldTime: Quantity<'s'> | null;
    readonly fullCureTime: Quantity<'s'> | null;
  };
  readonly componentTemperatureWindow: { readonly min: Quantity<'degC'>; readonly max: Quantity<'degC'> } | null;
  readonly warnings: BatchWarning[];
  readonly cautions: Caution[];
}

const kg = (value: number): Quantity<'kg'> => ({ value, unit: 'kg' });
const m3 = (value: number): Quantity<'m3'> => ({ value, unit: 'm3' });
const seconds = (value: number | undefined): Quantity<'s'> | null => (value === undefined ? null : { value, unit: 's' });

function validateSystem(issues: IssueCollector, system: MaterialSystemParameters | undefined): void {
  const at = (...path: (string | number)[]) => joinPointer('/system', ...path);
  if (!system || typeof system !== 'object') {
    issues.add('/system', 'is required', 'required');
    return;
  }
  issues.oneOf(at('ratioBasis'), system.ratioBasis, ['weight', 'volume'] as const);
  let ratioOk = false;
  if (!system.ratio || typeof system.ratio !== 'object') issues.add(at('ratio'), 'is required', 'required');
  else {
    const aOk = issues.number(at('ratio', 'a'), system.ratio.a, { required: true, above: 0 });
    const bOk = issues.number(at('ratio', 'b'), system.ratio.b, { required: true, above: 0 });
    // a ratio is a proportion: 1e308:1 is no mix anyone can weigh (common practice: 1:1 to about 1:20)
    const quotient = aOk && bOk ? Math.max(system.ratio.a / system.ratio.b, system.ratio.b / system.ratio.a) : NaN;
    if (aOk && bOk && !(quotient <= MAX_RATIO_QUOTIENT)) {
      issues.add(at('ratio', system.ratio.a > system.ratio.b ? 'a' : 'b'), `puts one part more than ${MAX_RATIO_QUOTIENT} times the other: no two-part system is mixed so`, 'out_of_range');
    } else ratioOk = aOk && bOk;
  }
  const sg = { min: SPECIFIC_GRAVITY_BOUNDS.min, max: SPECIFIC_GRAVITY_BOUNDS.max };
  const sgAOk = issues.number(at('specificGravityA'), system.specificGravityA, { required: true, ...sg });
  const sgOk = issues.number(at('specificGravityB'), system.specificGravityB, { required: true, ...sg }) && sgAOk;
  issues.oneOf(at('isocyanatePart'), system.isocyanatePart, ['A', 'B'] as const);
  if (system.kind !== undefined) issues.oneOf(at('kind'), system.kind, ['flexible', 'integral-skin', 'other'] as const);
  const densityOk = issues.number(at('freeRiseDensity'), system.freeRiseDensity, { required: true, ...FOAM_DENSITY_BOUNDS, unit: 'kg/m3' });
  const referenceOk = issues.number(at('freeRiseReferenceTemperature'), system.freeRiseReferenceTemperature, { required: true, ...COMPONENT_TEMPERATURE_BOUNDS, unit: '°C' });
  if (issues.number(at('freeRiseDensitySlope'), system.freeRiseDensitySlope) && densityOk && referenceOk) {
    // warmer components rise lighter: a positive or very steep slope is a sign or unit mistake
    const steepest = -MAX_SLOPE_SHARE_PER_C * system.freeRiseDensity;
    if (system.freeRiseDensitySlope! > 0) issues.add(at('freeRiseDensitySlope'), 'must not be positive: warmer components blow more and rise lighter', 'out_of_range');
    else if (system.freeRiseDensitySlope! < steepest) issues.add(at('freeRiseDensitySlope'), `is steeper than ${MAX_SLOPE_SHARE_PER_C * 100} % of the free-rise density per °C (${Number(steepest.toPrecision(3))} kg/m3 per °C)`, 'out_of_range');
  }
  const pbw = system.ratioTolerancePbw;
  issues.number(at('ratioTolerancePercent'), system.ratioTolerancePercent, { above: 0, below: 100, unit: '%' });
  if (pbw !== undefined && issues.number(at('ratioTolerancePbw'), pbw, { above: 0 })) {
    if (system.ratioBasis !== 'weight') issues.add(at('ratioTolerancePbw'), 'parts by weight apply to a weight ratio; give a percent for a volume ratio', 'not_allowed');
    else if (system.ratio && pbw >= system.ratio.b) issues.add(at('ratioTolerancePbw'), `must be less than part B's ${system.ratio.b} parts`, 'out_of_range');
  }
  for (const field of ['componentTemperatureWindow', 'moldTemperatureWindow', 'ambientTemperatureWindow'] as const) {
    const window = system[field];
    if (window === undefined) continue;
    const minOk = issues.number(at(field, 'min'), window?.min, { required: true, min: ABSOLUTE_ZERO_C, unit: '°C' });
    const maxOk = issues.number(at(field, 'max'), window?.max, { required: true, min: ABSOLUTE_ZERO_C, unit: '°C' });
    if (minOk && maxOk && window.min > window.max) {
      issues.add(at(field, 'max'), 'must not be below the window minimum', 'out_of_range');
    }
  }
  for (const field of ['creamTimeWindow', 'riseTimeWindow', 'tackFreeTimeWindow', 'freeRiseDensityBand'] as const) {
    const window = system[field];
    if (window === undefined) continue;
    const rule = field === 'freeRiseDensityBand' ? { required: true, ...FOAM_DENSITY_BOUNDS, unit: 'kg/m3' } : { required: true, min: 0, max: 86_400, unit: 's' };
    const minOk = issues.number(at(field, 'min'), window?.min, rule);
    const maxOk = issues.number(at(field, 'max'), window?.max, rule);
    if (minOk && maxOk && window.min > window.max) issues.add(at(field, 'max'), 'must not be below the minimum', 'out_of_range');
  }
  issues.number(at('maxRelativeHumidity'), system.maxRelativeHumidity, { above: 0, max: 100, unit: '%' });
  issues.number(at('massTolerancePercent'), system.massTolerancePercent, { above: 0, below: 100, unit: '%' });
  for (const field of ['potLife', 'demoldTime', 'fullCureTime'] as const) {
    issues.number(at(field), system[field], { min: 0, unit: 's' });
  }
  issues.number(at('maxPigmentPercent'), system.maxPigmentPercent, { min: 0, max: 100, unit: '%' });
  if (system.pigmentDoseBasis !== undefined) issues.oneOf(at('pigmentDoseBasis'), system.pigmentDoseBasis, ['ab', 'polyol', 'total'] as const);
  if (system.pigmentPlacement !== undefined) issues.oneOf(at('pigmentPlacement'), system.pigmentPlacement, ['separate', 'A', 'B'] as const);
  issues.number(at('pigmentCarrierHydroxylNumber'), system.pigmentCarrierHydroxylNumber, { min: 0, max: HYDROXYL_NUMBER_BOUNDS.max, unit: 'mg KOH/g' });
  const ncoOk = issues.number(at('ncoPercent'), system.ncoPercent, { ...NCO_PERCENT_BOUNDS, unit: '%' });
  const ohOk = issues.number(at('hydroxylNumber'), system.hydroxylNumber, { ...HYDROXYL_NUMBER_BOUNDS, unit: 'mg KOH/g' });
  const waterOk = issues.number(at('waterPbw'), system.waterPbw, { min: 0, max: 20 });
  if (ncoOk && ohOk && (system.waterPbw === undefined || waterOk) && ratioOk && sgOk && (system.pigmentCarrierHydroxylNumber === undefined || Number.isFinite(system.pigmentCarrierHydroxylNumber))) {
    const index = systemIndex(system, 0);
    if (Number.isFinite(index) && (index < INDEX_BOUNDS.min || index > INDEX_BOUNDS.max)) {
      issues.add(at('hydroxylNumber'), `with this %NCO and ratio gives an isocyanate index of ${Number(index.toPrecision(3))}, outside ${INDEX_BOUNDS.min}–${INDEX_BOUNDS.max}: check the %NCO, the OH number and the ratio`, 'out_of_range');
    }
  }
  issues.number(at('packFactorLimit'), system.packFactorLimit, { min: 1, max: MAX_PACK_FACTOR });
  issues.number(at('exothermMassLimit'), system.exothermMassLimit, { above: 0, max: MAX_BATCH_MASS_KG, unit: 'kg' });
  if (system.releaseRequires !== undefined) {
    if (!Array.isArray(system.releaseRequires)) issues.add(at('releaseRequires'), 'must be a list', 'not_a_list');
    else system.releaseRequires.forEach((r, i) => issues.oneOf(at('releaseRequires', i), r, RELEASE_REQUIREMENTS));
  }
  if (system.cautionsText !== undefined && typeof system.cautionsText !== 'string') {
    issues.add(at('cautionsText'), 'must be text', 'not_a_string');
  }
}

function validateSubject(issues: IssueCollector, input: BatchTargetsInput): void {
  const { mold, freeRiseCup } = input;
  if ((mold === undefined) === (freeRiseCup === undefined)) {
    issues.add('/mold', 'give exactly one of a mold or a free-rise cup', 'one_subject_required');
    return;
  }
  if (mold !== undefined) {
    issues.number('/mold/volume', mold?.volume, { required: true, above: 0, max: MAX_CAVITY_VOLUME_M3, unit: 'm3' });
    issues.number('/mold/cavities', mold?.cavities, { integer: true, min: 1, max: MAX_CAVITIES });
    issues.number('/mold/defaultPackFactor', mold?.defaultPackFactor, { above: 0, max: MAX_PACK_FACTOR });
  } else {
    issues.number('/freeRiseCup/volume', freeRiseCup?.volume, { required: true, above: 0, max: MAX_CUP_VOLUME_M3, unit: 'm3' });
  }
}

function validateOptions(issues: IssueCollector, input: BatchTargetsInput): void {
  const options = input.options ?? {};
  const at = (...path: (string | number)[]) => joinPointer('/options', ...path);
  const densityOk = issues.number(at('targetDensity'), options.targetDensity, { ...FOAM_DENSITY_BOUNDS, unit: 'kg/m3' });
  issues.number(at('packFactor'), options.packFactor, { above: 0, max: MAX_PACK_FACTOR });
  if (options.targetDensity !== undefined && options.packFactor !== undefined) {
    issues.add(at('packFactor'), 'give a target density or a pack factor, not both', 'conflicting_targets');
  }
  if (input.freeRiseCup !== undefined) {
    if (options.targetDensity !== undefined) issues.add(at('targetDensity'), 'a free-rise cup has no target density: it rises freely', 'not_for_free_rise');
    if (options.packFactor !== undefined) issues.add(at('packFactor'), 'a free-rise cup has no pack factor: it rises freely', 'not_for_free_rise');
  } else if (input.mold !== undefined && options.targetDensity === undefined && options.packFactor === undefined && input.mold?.defaultPackFactor === undefined) {
    issues.add(at('packFactor'), 'give a target density or a pack factor (or a default pack factor on the mold)', 'required');
  }
  const freeRise = input.system?.freeRiseDensity;
  if (densityOk && typeof freeRise === 'number' && freeRise > 0 && options.targetDensity! / freeRise > MAX_PACK_FACTOR) {
    issues.add(
      at('targetDensity'),
      `implies a pack factor of ${Number((options.targetDensity! / freeRise).toPrecision(4))}, which makes no physical sense (above ${MAX_PACK_FACTOR})`,
      'out_of_range',
    );
  }
  // of the total (pigment included) a share must stay under 100 %; of A+B or the polyol, 100 % is already absurd
  issues.number(at('pigmentPercent'), options.pigmentPercent, { min: 0, below: input.system?.pigmentDoseBasis === 'total' ? 50 : 100, unit: '%' });
  issues.number(at('overfillPercent'), options.overfillPercent, { min: 0, max: 100, unit: '%' });
  issues.number(at('retentionPercent'), options.retentionPercent, { min: 0, below: 100, unit: '%' });
  if (options.allowanceConvention !== undefined) {
    const forms = ['multiplicative', 'delivered'] as const;
    issues.oneOf(at('allowanceConvention', 'overfill'), options.allowanceConvention?.overfill, forms);
    issues.oneOf(at('allowanceConvention', 'retention'), options.allowanceConvention?.retention, forms);
  }
  const scale = options.scale;
  if (scale !== undefined) {
    const readabilityOk = issues.number(at('scale', 'readability'), scale?.readability, { required: true, above: 0, max: 100, unit: 'kg' });
    const capacityOk = issues.number(at('scale', 'capacity'), scale?.capacity, { above: 0, unit: 'kg' });
    if (readabilityOk && capacityOk && scale.capacity! <= scale.readability) {
      issues.add(at('scale', 'capacity'), 'must be larger than the readability', 'out_of_range');
    }
    issues.date(at('scale', 'calibrationDueOn'), scale?.calibrationDueOn);
  }
  const lots = options.lots ?? [];
  if (!Array.isArray(lots)) issues.add(at('lots'), 'must be a list', 'not_a_list');
  else {
    lots.forEach((lot, i) => {
      issues.oneOf(at('lots', i, 'part'), lot?.part, ['A', 'B', 'pigment'] as const);
      issues.date(at('lots', i, 'expiresOn'), lot?.expiresOn, true);
    });
  }
  // the density model is a line through the reference point: used only near it
  const reference = input.system?.freeRiseReferenceTemperature;
  const span = typeof reference === 'number' && Number.isFinite(reference)
    ? { min: Math.max(COMPONENT_TEMPERATURE_BOUNDS.min, reference - DENSITY_MODEL_SPAN_C), max: Math.min(COMPONENT_TEMPERATURE_BOUNDS.max, reference + DENSITY_MODEL_SPAN_C) }
    : COMPONENT_TEMPERATURE_BOUNDS;
  issues.number(at('componentTemperature'), options.componentTemperature, { ...span, unit: '°C (the range of the density model)' });
  const needsToday = (Array.isArray(lots) && lots.length > 0) || scale?.calibrationDueOn !== undefined;
  issues.date(at('today'), options.today, needsToday);
  issues.number(at('minimumToleranceDivisions'), options.minimumToleranceDivisions, { above: 0 });
}

function validateCupTests(issues: IssueCollector, cupTests: readonly CupTestPoint[] | undefined): void {
  if (cupTests === undefined) return;
  if (!Array.isArray(cupTests)) {
    issues.add('/cupTests', 'must be a list', 'not_a_list');
    return;
  }
  cupTests.forEach((cup, i) => {
    issues.number(joinPointer('/cupTests', i, 'temperature'), cup?.temperature, { required: true, ...COMPONENT_TEMPERATURE_BOUNDS, unit: '°C' });
    issues.number(joinPointer('/cupTests', i, 'density'), cup?.density, { required: true, ...FOAM_DENSITY_BOUNDS, unit: 'kg/m3' });
  });
}

/** Every input problem at once, as BatchingInputError; returns normally when the input is sound. */
export function validateBatchTargetsInput(input: BatchTargetsInput): void {
  const issues = new IssueCollector();
  if (!input || typeof input !== 'object') {
    issues.add('', 'must be an object', 'not_an_object');
    issues.throwIfAny();
  }
  validateSystem(issues, input.system);
  validateSubject(issues, input);
  validateOptions(issues, input);
  validateCupTests(issues, input.cupTests);
  issues.throwIfAny();
}

const DOSE_BASIS_WORDS: Readonly<Record<PigmentDoseBasis, string>> = { ab: 'A + B', polyol: 'the polyol side', total: 'the total' };

/**
 * A pigment dose as a percent of A + B. Pastes are dosed on the polyol side or on the total as often
 * as on A + B (common practice): at 100:55 with the polyol as A, 2 % of the polyol is 2 × 100/155 =
 * 1.29 % of A + B; 2 % of the total is 2/98 = 2.04 % of A + B.
 */
export function pigmentPercentOfAB(percent: number, basis: PigmentDoseBasis, weightRatio: MixRatio, isocyanatePart: Part): number {
  if (basis === 'polyol') {
    const polyol = isocyanatePart === 'A' ? weightRatio.b : weightRatio.a;
    return (percent * polyol) / (weightRatio.a + weightRatio.b);
  }
  if (basis === 'total') return (100 * percent) / (100 - percent);
  return percent;
}

/**
 * The isocyanate index at the system's ratio (equivalent-weight method), the pigment paste's carrier
 * counted with the polyol side when its OH number is given (`pigmentPercent` of A + B).
 */
export function systemIndex(system: MaterialSystemParameters, pigmentPercent: number): number {
  const weightRatio = system.ratioBasis === 'volume' ? weightRatioFromVolumeRatio(system.ratio, system.specificGravityA, system.specificGravityB) : system.ratio;
  const isocyanateMass = system.isocyanatePart === 'A' ? weightRatio.a : weightRatio.b;
  const polyolMass = system.isocyanatePart === 'A' ? weightRatio.b : weightRatio.a;
  const pigmentMass = (pigmentPercent / 100) * (weightRatio.a + weightRatio.b);
  const carrier = system.pigmentCarrierHydroxylNumber ?? 0;
  const polyolEquivalentMass = carrier > 0 ? pigmentMass * (carrier / system.hydroxylNumber!) : 0;
  return isocyanateIndex({
    isocyanateMass,
    ncoPercent: system.ncoPercent!,
    // the carrier's OH as extra polyol of the side's OH number: same equivalents
    polyolMass: polyolMass + polyolEquivalentMass,
    hydroxylNumber: system.hydroxylNumber!,
    waterMass: (polyolMass * (system.waterPbw ?? 0)) / 100,
  });
}

function toleranceBands(a: number, b: number, t: number): { A: MassBand; B: MassBand } {
  return {
    A: { low: kg(a * (1 - t)), high: kg(a * (1 + t)) },
    B: { low: kg(b / (1 + t)), high: kg(b / (1 - t)) },
  };
}

/** Everything a pour needs: volumes, densities, masses, ratio, index, warnings and cautions. */
export function computeBatchTargets(input: BatchTargetsInput): BatchTargets {
  validateBatchTargetsInput(input);
  const { system } = input;
  const options = input.options ?? {};
  // a pbw tolerance on B is asymmetric in percent of the ratio; the narrower side (x ÷ (b + x)) is kept
  const tolerancePercent = system.ratioTolerancePbw !== undefined && system.ratioBasis === 'weight'
    ? (system.ratioTolerancePbw / (system.ratio.b + system.ratioTolerancePbw)) * 100
    : (system.ratioTolerancePercent ?? DEFAULT_RATIO_TOLERANCE_PERCENT);
  const t = tolerancePercent / 100;

  const weightRatio =
    system.ratioBasis === 'weight'
      ? { a: system.ratio.a, b: system.ratio.b }
      : weightRatioFromVolumeRatio(system.ratio, system.specificGravityA, system.specificGravityB);
  const volumeRatio =
    system.ratioBasis === 'volume'
      ? { a: system.ratio.a, b: system.ratio.b }
      : volumeRatioFromWeightRatio(system.ratio, system.specificGravityA, system.specificGravityB);

  const subject = input.mold ? 'mold' : 'free_rise_cup';
  const cavityVolume = input.mold ? input.mold.volume : input.freeRiseCup!.volume;
  const cavities = input.mold?.cavities ?? 1;
  const totalVolume = cavityVolume * cavities;

  const atComponentTemperature = options.componentTemperature !== undefined;
  const temperature = options.componentTemperature ?? system.freeRiseReferenceTemperature;
  const expected = expectedFreeRiseDensity(
    { density: system.freeRiseDensity, temperature: system.freeRiseReferenceTemperature, slope: system.freeRiseDensitySlope },
    temperature,
    input.cupTests ?? [],
  );

  if (!(expected.density >= FOAM_DENSITY_BOUNDS.min && expected.density <= FOAM_DENSITY_BOUNDS.max)) {
    throw new BatchingInputError([{
      pointer: atComponentTemperature ? '/options/componentTemperature' : '/system/freeRiseDensitySlope',
      detail: `gives an expected free-rise density of ${Number(expected.density.toPrecision(3))} kg/m3, outside ${FOAM_DENSITY_BOUNDS.min}–${FOAM_DENSITY_BOUNDS.max} kg/m3: the density model does not reach this far`,
      code: 'out_of_range',
    }]);
  }

  let density: number;
  let packFactor: number;
  let densityBasis: DensityBasis;
  if (subject === 'free_rise_cup') {
    density = expected.density;
    packFactor = 1;
    densityBasis = 'free_rise_cup';
  } else if (options.targetDensity !== undefined) {
    density = options.targetDensity;
    packFactor = density / system.freeRiseDensity;
    densityBasis = 'target_density';
  } else {
    packFactor = options.packFactor ?? input.mold!.defaultPackFactor!;
    density = packFactor * system.freeRiseDensity;
    densityBasis = options.packFactor !== undefined ? 'pack_factor' : 'mold_default_pack_factor';
  }
  const expectedPackFactor = subject === 'free_rise_cup' ? 1 : density / expected.density;

  const allowances = { overfillPercent: options.overfillPercent ?? 0, retentionPercent: options.retentionPercent ?? 0 };
  const convention = options.allowanceConvention ?? DEFAULT_ALLOWANCE_CONVENTION;
  const foam = foamMassOf(density, totalVolume);
  const mixed = grossUp(foam, allowances, convention);
  const doseBasis = system.pigmentDoseBasis ?? 'ab';
  const placement = system.pigmentPlacement ?? 'separate';
  const dosed = options.pigmentPercent ?? 0;
  const pigmentPercent = pigmentPercentOfAB(dosed, doseBasis, weightRatio, system.isocyanatePart);
  const split = splitMixedMass(mixed, weightRatio, pigmentPercent);
  // a paste pre-blended in a part is weighed with it: that part's target carries the pigment
  const exact = placement === 'separate' ? split : {
    a: split.a + (placement === 'A' ? split.pigment : 0),
    b: split.b + (placement === 'B' ? split.pigment : 0),
    pigment: 0,
  };
  const readability = options.scale?.readability;
  const shown =
    readability !== undefined ? roundPourMasses(exact, readability) : { ...exact, total: exact.a + exact.b + exact.pigment };
  if (mixed > MAX_BATCH_MASS_KG) {
    throw new BatchingInputError([{ pointer: subject === 'mold' ? '/mold/volume' : '/freeRiseCup/volume', detail: `makes a batch of ${Number(mixed.toPrecision(4))} kg, more than the ${MAX_BATCH_MASS_KG} kg a weighed batch can be`, code: 'out_of_range' }]);
  }
  if (readability !== undefined) {
    // a target that rounds to zero, or spans too few divisions, cannot be weighed on this scale
    const blocked = ([['A', exact.a], ['B', exact.b], ['pigment', exact.pigment]] as const).filter(([, m]) => m > 0 && m / readability < MINIMUM_TARGET_DIVISIONS);
    if (blocked.length) {
      const what = blocked.map(([p, m]) => `${p === 'pigment' ? 'the pigment' : `part ${p}`} (${Number(m.toPrecision(3))} kg, ${Number((m / readability).toPrecision(3))} d)`).join(', ');
      throw new BatchingInputError([{ pointer: '/options/scale/readability', detail: `is too coarse for ${what}: a target must span at least ${MINIMUM_TARGET_DIVISIONS} divisions of its scale (rounding to the scale alone would use up a ±5 % band); use a finer scale or a larger batch`, code: 'below_minimum_load' }]);
    }
  }

  const volumes =
    system.ratioBasis === 'volume' ? componentVolumes(exact, system.specificGravityA, system.specificGravityB) : null;
  const bands = toleranceBands(exact.a, exact.b, t);

  let index: BatchTargets['isocyanateIndex'] = null;
  if (system.ncoPercent !== undefined && system.hydroxylNumber !== undefined) {
    const value = systemIndex(system, pigmentPercent);
    const limits = [indexAfterRatioError(value, -t, system.isocyanatePart), indexAfterRatioError(value, t, system.isocyanatePart)];
    index = { value, atToleranceLimits: { low: Math.min(...limits), high: Math.max(...limits) } };
  }

  const warnings: BatchWarning[] = [];
  if (subject === 'mold') {
    warnings.push(
      ...checkPackFactor(
        atComponentTemperature ? expectedPackFactor : packFactor,
        system.packFactorLimit,
        atComponentTemperature
          ? `the free-rise density expected at ${Number(temperature.toPrecision(4))} °C`
          : 'the free-rise density',
      ),
    );
  }
  if (readability !== undefined) {
    const smaller: Part = exact.a <= exact.b ? 'A' : 'B';
    const band = smaller === 'A' ? bands.A : bands.B;
    const mass = smaller === 'A' ? exact.a : exact.b;
    const halfWidth = Math.min(band.high.value - mass, mass - band.low.value);
    const found = checkToleranceResolution({
      part: smaller,
      bandHalfWidth: halfWidth,
      readability,
      minimumDivisions: options.minimumToleranceDivisions ?? DEFAULT_MINIMUM_TOLERANCE_DIVISIONS,
    });
    if (found) warnings.push(found);
  }
  const pigmentWarning = checkPigment(dosed, system.maxPigmentPercent, DOSE_BASIS_WORDS[doseBasis]);
  if (pigmentWarning) warnings.push(pigmentWarning);
  if (atComponentTemperature && system.componentTemperatureWindow) {
    const found = checkComponentTemperature(temperature, system.componentTemperatureWindow);
    if (found) warnings.push(found);
  }
  const exotherm = checkExothermMass(mixed, system.exothermMassLimit ?? DEFAULT_EXOTHERM_MASS_LIMIT);
  if (exotherm) warnings.push(exotherm);
  if (options.scale?.capacity !== undefined) {
    const found = checkScaleCapacity(shown.total, options.scale.capacity);
    if (found) warnings.push(found);
  }
  if (options.lots && options.lots.length > 0) warnings.push(...checkLotExpiry(options.lots, options.today!));
  if (options.scale?.calibrationDueOn !== undefined) {
    const found = checkScaleCalibration(options.scale.calibrationDueOn, options.today!);
    if (found) warnings.push(found);
  }

  const component = (part: Part): ComponentTarget => ({
    part,
    side: sideOf(part, system.isocyanatePart),
    mass: kg(part === 'A' ? shown.a : shown.b),
    massUnrounded: kg(part === 'A' ? exact.a : exact.b),
    volume: volumes ? m3(part === 'A' ? volumes.a : volumes.b) : null,
    toleranceBand: part === 'A' ? bands.A : bands.B,
  });

  const window = system.componentTemperatureWindow;
  return {
    computationVersion: COMPUTATION_VERSION,
    subject,
    cavityVolume: m3(cavityVolume),
    cavities,
    totalVolume: m3(totalVolume),
    targetDensity: { value: density, unit: 'kg/m3' },
    packFactor: { value: packFactor, unit: '1' },
    densityBasis,
    expectedFreeRiseDensity: {
      density: { value: expected.density, unit: 'kg/m3' },
      temperature: { value: temperature, unit: 'degC' },
      atComponentTemperature,
      method: expected.method,
      methodReason: expected.methodReason,
      fitRejected: expected.fitRejected,
      fit: expected.fit,
    },
    expectedPackFactor: { value: expectedPackFactor, unit: '1' },
    foamMass: kg(foam),
    mixedMass: kg(mixed),
    allowances: { ...allowances, convention: { overfill: convention.overfill, retention: convention.retention } },
    ratioBasis: system.ratioBasis,
    weightRatio,
    volumeRatio,
    ratioTolerancePercent: tolerancePercent,
    components: {
      A: component('A'),
      B: component('B'),
      pigment: {
        mass: kg(shown.pigment),
        massUnrounded: kg(split.pigment),
        percentOfAB: pigmentPercent,
        dosed: { percent: dosed, basis: doseBasis },
        placement,
      },
    },
    totalMass: kg(shown.total),
    scaleReadability: readability !== undefined ? kg(readability) : null,
    isocyanateIndex: index,
    timing: { potLife: seconds(system.potLife), demoldTime: seconds(system.demoldTime), fullCureTime: seconds(system.fullCureTime) },
    componentTemperatureWindow: window
      ? { min: { value: window.min, unit: 'degC' }, max: { value: window.max, unit: 'degC' } }
      : null,
    warnings,
    cautions: cautionsFor(system.cautionsText),
  };
}
