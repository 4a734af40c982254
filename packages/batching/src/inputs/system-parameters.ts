/**
 * A material system as the API takes it (shop units), as the database stores it (SI columns named
 * with their unit), and as the computation needs it (MaterialSystemParameters). The computation's
 * own input checks decide what makes physical sense, so a system that can be stored can be computed.
 */
import { computeBatchTargets, validateBatchTargetsInput, DEFAULT_RATIO_TOLERANCE_PERCENT, type MaterialSystemParameters, type PigmentDoseBasis, type PigmentPlacement, type ReleaseRequirement } from '../targets.js';
import type { SystemKind } from '../findings.js';
import { BatchingInputError } from '../errors.js';
import type { FieldError } from './field-errors.js';
import { QuantityReader, opt, type Quantity } from './quantities.js';
import { translate } from './field-errors.js';
import { forceToNewtons } from '../parts.js';

export interface MaterialSystemInput {
  name?: string;
  kind?: 'flexible' | 'integral-skin' | 'other';
  ratioBasis: 'weight' | 'volume';
  ratio: { a: number; b: number };
  specificGravityA: number;
  specificGravityB: number;
  isocyanatePart: 'A' | 'B';
  freeRiseDensity: Quantity;
  freeRiseReferenceTemperature: Quantity;
  freeRiseDensitySlope?: Quantity | null;
  ratioTolerancePercent?: number;
  componentTemperatureWindow?: { min: Quantity; max: Quantity } | null;
  moldTemperatureWindow?: { min: Quantity; max: Quantity } | null;
  ambientTemperatureWindow?: { min: Quantity; max: Quantity } | null;
  maxRelativeHumidity?: number | null;
  massTolerancePercent?: number | null;
  potLife?: Quantity | null;
  demoldTime?: Quantity | null;
  fullCureTime?: Quantity | null;
  maxPigmentPercent?: number | null;
  maxPackFactor?: number | null;
  exothermMassLimit?: Quantity | null;
  ncoPercent?: number | null;
  hydroxylNumber?: number | null;
  waterPbw?: number | null;
  cautionsText?: string | null;
  changeNote?: string | null;
  ratioTolerancePbw?: number | null;
  pigmentDoseBasis?: PigmentDoseBasis;
  pigmentPlacement?: PigmentPlacement;
  pigmentCarrierHydroxylNumber?: number | null;
  creamTimeWindow?: { min: Quantity; max: Quantity } | null;
  riseTimeWindow?: { min: Quantity; max: Quantity } | null;
  tackFreeTimeWindow?: { min: Quantity; max: Quantity } | null;
  freeRiseDensityBand?: { min: Quantity; max: Quantity } | null;
  releaseRequires?: ReleaseRequirement[];
  partDensityTolerancePercent?: number | null;
  coreDensityBand?: { min: Quantity; max: Quantity } | null;
  indentationForceBand?: { min: { value: number; unit: 'N' | 'lbf' }; max: { value: number; unit: 'N' | 'lbf' } } | null;
  durometerBand?: { scale: 'A' | 'OO' | 'D'; min: number; max: number } | null;
}

/** The parameter columns of material_system_revisions (everything a revision pins down). */
export interface RevisionColumns {
  ratio_basis: 'weight' | 'volume';
  ratio_a: number;
  ratio_b: number;
  specific_gravity_a: number;
  specific_gravity_b: number;
  isocyanate_part: 'A' | 'B';
  free_rise_density_kg_m3: number;
  free_rise_reference_temperature_c: number;
  free_rise_density_slope_kg_m3_per_c: number | null;
  ratio_tolerance_percent: number;
  component_temperature_min_c: number | null;
  component_temperature_max_c: number | null;
  pot_life_s: number | null;
  demold_time_s: number | null;
  full_cure_time_s: number | null;
  max_pigment_percent: number | null;
  max_pack_factor: number | null;
  exotherm_mass_limit_kg: number | null;
  nco_percent: number | null;
  hydroxyl_number_mg_koh_g: number | null;
  water_pbw: number | null;
  cautions_text: string | null;
  mold_temperature_min_c: number | null;
  mold_temperature_max_c: number | null;
  ambient_temperature_min_c: number | null;
  ambient_temperature_max_c: number | null;
  max_relative_humidity_percent: number | null;
  mass_tolerance_percent: number | null;
  ratio_tolerance_pbw: number | null;
  pigment_dose_basis: PigmentDoseBasis;
  pigment_placement: PigmentPlacement;
  pigment_carrier_oh_number: number | null;
  cream_time_min_s: number | null;
  cream_time_max_s: number | null;
  rise_time_min_s: number | null;
  rise_time_max_s: number | null;
  tack_free_time_min_s: number | null;
  tack_free_time_max_s: number | null;
  free_rise_density_min_kg_m3: number | null;
  free_rise_density_max_kg_m3: number | null;
  /** Comma-separated ReleaseRequirement values (text, so revisions compare with ===); '' for none. */
  release_requires: string;
  part_density_tolerance_percent?: number | null;
  core_density_min_kg_m3?: number | null;
  core_density_max_kg_m3?: number | null;
  indentation_force_min_n?: number | null;
  indentation_force_max_n?: number | null;
  durometer_scale?: 'A' | 'OO' | 'D' | null;
  durometer_min?: number | null;
  durometer_max?: number | null;
}

export const REVISION_COLUMNS: readonly (keyof RevisionColumns)[] = [
  'ratio_basis', 'ratio_a', 'ratio_b', 'specific_gravity_a', 'specific_gravity_b', 'isocyanate_part',
  'free_rise_density_kg_m3', 'free_rise_reference_temperature_c', 'free_rise_density_slope_kg_m3_per_c',
  'ratio_tolerance_percent', 'component_temperature_min_c', 'component_temperature_max_c', 'pot_life_s',
  'demold_time_s', 'full_cure_time_s', 'max_pigment_percent', 'max_pack_factor', 'exotherm_mass_limit_kg',
  'nco_percent', 'hydroxyl_number_mg_koh_g', 'water_pbw', 'cautions_text',
  'mold_temperature_min_c', 'mold_temperature_max_c', 'ambient_temperature_min_c', 'ambient_temperature_max_c',
  'max_relative_humidity_percent', 'mass_tolerance_percent',
  'ratio_tolerance_pbw', 'pigment_dose_basis', 'pigment_placement', 'pigment_carrier_oh_number',
  'cream_time_min_s', 'cream_time_max_s', 'rise_time_min_s', 'rise_time_max_s', 'tack_free_time_min_s', 'tack_free_time_max_s',
  'free_rise_density_min_kg_m3', 'free_rise_density_max_kg_m3', 'release_requires',
  'part_density_tolerance_percent', 'core_density_min_kg_m3', 'core_density_max_kg_m3', 'indentation_force_min_n', 'indentation_force_max_n',
  'durometer_scale', 'durometer_min', 'durometer_max',
];
const WINDOWS = new Set(['componentTemperatureWindow', 'moldTemperatureWindow', 'ambientTemperatureWindow', 'creamTimeWindow', 'riseTimeWindow', 'tackFreeTimeWindow', 'freeRiseDensityBand']);

/** API fields given as `{ value, unit }`: a pointer at one of them names its value. */
const QUANTITY_FIELDS = new Set(['freeRiseDensity', 'freeRiseReferenceTemperature', 'freeRiseDensitySlope', 'potLife', 'demoldTime', 'fullCureTime', 'exothermMassLimit']);
const API_NAME: Record<string, string> = { packFactorLimit: 'maxPackFactor', hydroxylNumber: 'hydroxylNumber' };

/**
 * A pointer of the computation (`/system/packFactorLimit`, `/system/componentTemperatureWindow/min`)
 * as a pointer into the request body under `base` (`/maxPackFactor`, `/componentTemperatureWindow/min/value`).
 */
export function systemPointer(pointer: string, base = ''): string {
  const parts = pointer.split('/').slice(2); // '', 'system', field, ...
  if (parts.length === 0) return base || '/';
  const field = API_NAME[parts[0]!] ?? parts[0]!;
  const rest = parts.slice(1);
  const isQuantity = QUANTITY_FIELDS.has(field) || (WINDOWS.has(field) && rest.length === 1);
  return [base, field, ...rest].join('/') + (isQuantity ? '/value' : '');
}

/** Request body → SI revision columns; every unit or sign problem is collected with its pointer. */
export function readSystemInput(body: MaterialSystemInput, base = ''): { cols: RevisionColumns; errors: FieldError[] } {
  const q = new QuantityReader();
  const at = (p: string) => `${base}/${p}`;
  const window = body.componentTemperatureWindow ?? null;
  const mold = body.moldTemperatureWindow ?? null;
  const air = body.ambientTemperatureWindow ?? null;
  const win = (field: 'creamTimeWindow' | 'riseTimeWindow' | 'tackFreeTimeWindow', edge: 'min' | 'max') => {
    const w = body[field];
    return w ? (q.read('time', w[edge], at(`${field}/${edge}`), { nonNegative: true }) ?? null) : null;
  };
  const band = body.freeRiseDensityBand ?? null;
  const core = body.coreDensityBand ?? null;
  const ifd = body.indentationForceBand ?? null;
  const cols: RevisionColumns = {
    ratio_basis: body.ratioBasis,
    ratio_a: body.ratio?.a,
    ratio_b: body.ratio?.b,
    specific_gravity_a: body.specificGravityA,
    specific_gravity_b: body.specificGravityB,
    isocyanate_part: body.isocyanatePart,
    free_rise_density_kg_m3: q.read('density', body.freeRiseDensity, at('freeRiseDensity'), { positive: true }) as number,
    free_rise_reference_temperature_c: q.read('temperature', body.freeRiseReferenceTemperature, at('freeRiseReferenceTemperature')) as number,
    free_rise_density_slope_kg_m3_per_c: q.readDensityPerTemperature(body.freeRiseDensitySlope, at('freeRiseDensitySlope')) ?? null,
    ratio_tolerance_percent: body.ratioTolerancePercent ?? DEFAULT_RATIO_TOLERANCE_PERCENT,
    component_temperature_min_c: window ? (q.read('temperature', window.min, at('componentTemperatureWindow/min')) ?? null) : null,
    component_temperature_max_c: window ? (q.read('temperature', window.max, at('componentTemperatureWindow/max')) ?? null) : null,
    pot_life_s: q.read('time', body.potLife, at('potLife'), { nonNegative: true }) ?? null,
    demold_time_s: q.read('time', body.demoldTime, at('demoldTime'), { nonNegative: true }) ?? null,
    full_cure_time_s: q.read('time', body.fullCureTime, at('fullCureTime'), { nonNegative: true }) ?? null,
    max_pigment_percent: body.maxPigmentPercent ?? null,
    max_pack_factor: body.maxPackFactor ?? null,
    exotherm_mass_limit_kg: q.read('mass', body.exothermMassLimit, at('exothermMassLimit'), { positive: true }) ?? null,
    nco_percent: body.ncoPercent ?? null,
    hydroxyl_number_mg_koh_g: body.hydroxylNumber ?? null,
    water_pbw: body.waterPbw ?? null,
    cautions_text: body.cautionsText?.trim() ? body.cautionsText.trim() : null,
    mold_temperature_min_c: mold ? (q.read('temperature', mold.min, at('moldTemperatureWindow/min')) ?? null) : null,
    mold_temperature_max_c: mold ? (q.read('temperature', mold.max, at('moldTemperatureWindow/max')) ?? null) : null,
    ambient_temperature_min_c: air ? (q.read('temperature', air.min, at('ambientTemperatureWindow/min')) ?? null) : null,
    ambient_temperature_max_c: air ? (q.read('temperature', air.max, at('ambientTemperatureWindow/max')) ?? null) : null,
    max_relative_humidity_percent: body.maxRelativeHumidity ?? null,
    mass_tolerance_percent: body.massTolerancePercent ?? null,
    ratio_tolerance_pbw: body.ratioTolerancePbw ?? null,
    pigment_dose_basis: body.pigmentDoseBasis ?? 'ab',
    pigment_placement: body.pigmentPlacement ?? 'separate',
    pigment_carrier_oh_number: body.pigmentCarrierHydroxylNumber ?? null,
    cream_time_min_s: win('creamTimeWindow', 'min'),
    cream_time_max_s: win('creamTimeWindow', 'max'),
    rise_time_min_s: win('riseTimeWindow', 'min'),
    rise_time_max_s: win('riseTimeWindow', 'max'),
    tack_free_time_min_s: win('tackFreeTimeWindow', 'min'),
    tack_free_time_max_s: win('tackFreeTimeWindow', 'max'),
    free_rise_density_min_kg_m3: band ? (q.read('density', band.min, at('freeRiseDensityBand/min'), { positive: true }) ?? null) : null,
    free_rise_density_max_kg_m3: band ? (q.read('density', band.max, at('freeRiseDensityBand/max'), { positive: true }) ?? null) : null,
    release_requires: [...new Set(body.releaseRequires ?? [])].join(','),
    part_density_tolerance_percent: body.partDensityTolerancePercent ?? null,
    core_density_min_kg_m3: core ? (q.read('density', core.min, at('coreDensityBand/min'), { positive: true }) ?? null) : null,
    core_density_max_kg_m3: core ? (q.read('density', core.max, at('coreDensityBand/max'), { positive: true }) ?? null) : null,
    indentation_force_min_n: ifd ? forceToNewtons(ifd.min.value, ifd.min.unit) : null,
    indentation_force_max_n: ifd ? forceToNewtons(ifd.max.value, ifd.max.unit) : null,
    durometer_scale: body.durometerBand?.scale ?? null,
    durometer_min: body.durometerBand?.min ?? null,
    durometer_max: body.durometerBand?.max ?? null,
  };
  const errors = [...q.errors];
  const edges: [string, number | null | undefined, number | null | undefined][] = [
    ['coreDensityBand', cols.core_density_min_kg_m3, cols.core_density_max_kg_m3],
    ['indentationForceBand', cols.indentation_force_min_n, cols.indentation_force_max_n],
    ['durometerBand', cols.durometer_min, cols.durometer_max],
  ];
  for (const [field, min, max] of edges) {
    if (typeof min === 'number' && typeof max === 'number' && min > max) errors.push({ pointer: at(`${field}/min`), detail: 'must not be above the maximum', code: 'range' });
  }
  if (errors.length === 0) {
    try {
      validateBatchTargetsInput({ system: parametersOf(cols, body.kind), freeRiseCup: { volume: 0.001 } });
    } catch (e) {
      if (!(e instanceof BatchingInputError)) throw e;
      errors.push(...translate(e, (p) => (p.startsWith('/system') ? systemPointer(p, base) : p)));
    }
  }
  return { cols, errors };
}

/** SI revision columns → the computation's parameters (`kind` from the system, when known). */
export function parametersOf(r: RevisionColumns, kind?: SystemKind | string): MaterialSystemParameters {
  const window = windowOf(r.component_temperature_min_c, r.component_temperature_max_c);
  const requires = (r.release_requires ?? '').split(',').filter(Boolean) as ReleaseRequirement[];
  return {
    ...(kind === 'flexible' || kind === 'integral-skin' || kind === 'other' ? { kind } : {}),
    ratioBasis: r.ratio_basis,
    ratio: { a: r.ratio_a, b: r.ratio_b },
    specificGravityA: r.specific_gravity_a,
    specificGravityB: r.specific_gravity_b,
    isocyanatePart: r.isocyanate_part,
    freeRiseDensity: r.free_rise_density_kg_m3,
    freeRiseReferenceTemperature: r.free_rise_reference_temperature_c,
    freeRiseDensitySlope: opt(r.free_rise_density_slope_kg_m3_per_c),
    ratioTolerancePercent: r.ratio_tolerance_percent,
    componentTemperatureWindow: window,
    moldTemperatureWindow: windowOf(r.mold_temperature_min_c ?? null, r.mold_temperature_max_c ?? null),
    ambientTemperatureWindow: windowOf(r.ambient_temperature_min_c ?? null, r.ambient_temperature_max_c ?? null),
    maxRelativeHumidity: opt(r.max_relative_humidity_percent ?? null),
    massTolerancePercent: opt(r.mass_tolerance_percent ?? null),
    potLife: opt(r.pot_life_s),
    demoldTime: opt(r.demold_time_s),
    fullCureTime: opt(r.full_cure_time_s),
    maxPigmentPercent: opt(r.max_pigment_percent),
    ncoPercent: opt(r.nco_percent),
    hydroxylNumber: opt(r.hydroxyl_number_mg_koh_g),
    waterPbw: opt(r.water_pbw),
    packFactorLimit: opt(r.max_pack_factor),
    exothermMassLimit: opt(r.exotherm_mass_limit_kg),
    cautionsText: opt(r.cautions_text),
    ratioTolerancePbw: opt(r.ratio_tolerance_pbw ?? null),
    pigmentDoseBasis: r.pigment_dose_basis ?? 'ab',
    pigmentPlacement: r.pigment_placement ?? 'separate',
    pigmentCarrierHydroxylNumber: opt(r.pigment_carrier_oh_number ?? null),
    creamTimeWindow: windowOf(r.cream_time_min_s ?? null, r.cream_time_max_s ?? null),
    riseTimeWindow: windowOf(r.rise_time_min_s ?? null, r.rise_time_max_s ?? null),
    tackFreeTimeWindow: windowOf(r.tack_free_time_min_s ?? null, r.tack_free_time_max_s ?? null),
    freeRiseDensityBand: windowOf(r.free_rise_density_min_kg_m3 ?? null, r.free_rise_density_max_kg_m3 ?? null),
    ...(requires.length ? { releaseRequires: requires } : {}),
  };
}

/** The finished part's spec of a revision: the density band and the specimens' bands (SI; nulls where the system states none). */
export function partSpecOf(r: Partial<RevisionColumns>) {
  return {
    densityTolerancePercent: r.part_density_tolerance_percent ?? null,
    coreDensityMinKgM3: r.core_density_min_kg_m3 ?? null,
    coreDensityMaxKgM3: r.core_density_max_kg_m3 ?? null,
    indentationForceMinN: r.indentation_force_min_n ?? null,
    indentationForceMaxN: r.indentation_force_max_n ?? null,
    durometerScale: r.durometer_scale ?? null,
    durometerMin: r.durometer_min ?? null,
    durometerMax: r.durometer_max ?? null,
  };
}

function windowOf(min: number | null, max: number | null): { min: number; max: number } | undefined {
  return min !== null && max !== null && min !== undefined && max !== undefined ? { min, max } : undefined;
}

/** True when two revisions pin down the same parameters (a PUT that changes none writes no revision). */
export function sameParameters(a: RevisionColumns, b: RevisionColumns): boolean {
  return REVISION_COLUMNS.every((k) => (a[k] ?? null) === (b[k] ?? null));
}

/** The parameters as the API shows them: SI, each field named with its unit. */
export function parametersView(r: RevisionColumns) {
  let derived: { weightRatio: unknown; volumeRatio: unknown; isocyanateIndex: { value: number } | null } = { weightRatio: null, volumeRatio: null, isocyanateIndex: null };
  try {
    derived = computeBatchTargets({ system: parametersOf(r), freeRiseCup: { volume: 0.001 } });
  } catch (e) {
    // a revision stored before the physical bounds were checked still shows; batches refuse it with a 422
    if (!(e instanceof BatchingInputError)) throw e;
  }
  return {
    ratioBasis: r.ratio_basis,
    ratio: { a: r.ratio_a, b: r.ratio_b },
    specificGravityA: r.specific_gravity_a,
    specificGravityB: r.specific_gravity_b,
    isocyanatePart: r.isocyanate_part,
    freeRiseDensityKgM3: r.free_rise_density_kg_m3,
    freeRiseReferenceTemperatureC: r.free_rise_reference_temperature_c,
    freeRiseDensitySlopeKgM3PerC: r.free_rise_density_slope_kg_m3_per_c,
    ratioTolerancePercent: r.ratio_tolerance_percent,
    componentTemperatureMinC: r.component_temperature_min_c,
    componentTemperatureMaxC: r.component_temperature_max_c,
    moldTemperatureMinC: r.mold_temperature_min_c ?? null,
    moldTemperatureMaxC: r.mold_temperature_max_c ?? null,
    ambientTemperatureMinC: r.ambient_temperature_min_c ?? null,
    ambientTemperatureMaxC: r.ambient_temperature_max_c ?? null,
    maxRelativeHumidityPercent: r.max_relative_humidity_percent ?? null,
    massTolerancePercent: r.mass_tolerance_percent ?? null,
    ratioTolerancePbw: r.ratio_tolerance_pbw ?? null,
    pigmentDoseBasis: r.pigment_dose_basis ?? 'ab',
    pigmentPlacement: r.pigment_placement ?? 'separate',
    pigmentCarrierHydroxylNumber: r.pigment_carrier_oh_number ?? null,
    creamTimeMinS: r.cream_time_min_s ?? null,
    creamTimeMaxS: r.cream_time_max_s ?? null,
    riseTimeMinS: r.rise_time_min_s ?? null,
    riseTimeMaxS: r.rise_time_max_s ?? null,
    tackFreeTimeMinS: r.tack_free_time_min_s ?? null,
    tackFreeTimeMaxS: r.tack_free_time_max_s ?? null,
    freeRiseDensityMinKgM3: r.free_rise_density_min_kg_m3 ?? null,
    freeRiseDensityMaxKgM3: r.free_rise_density_max_kg_m3 ?? null,
    releaseRequires: (r.release_requires ?? '').split(',').filter(Boolean),
    partSpec: partSpecOf(r),
    potLifeS: r.pot_life_s,
    demoldTimeS: r.demold_time_s,
    fullCureTimeS: r.full_cure_time_s,
    maxPigmentPercent: r.max_pigment_percent,
    maxPackFactor: r.max_pack_factor,
    exothermMassLimitKg: r.exotherm_mass_limit_kg,
    ncoPercent: r.nco_percent,
    hydroxylNumberMgKohG: r.hydroxyl_number_mg_koh_g,
    waterPbw: r.water_pbw,
    cautionsText: r.cautions_text,
    /** Worked out from the parameters by the computation. */
    derived: {
      weightRatio: derived.weightRatio,
      volumeRatio: derived.volumeRatio,
      isocyanateIndex: derived.isocyanateIndex?.value ?? null,
    },
  };
}
