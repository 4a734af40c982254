import { writeBody } from '../dataProvider/writeBodies';
import { secondsForInput } from '../format/quantities';

export type SystemKind = 'flexible' | 'integral-skin' | 'other';

export interface MaterialSystem {
  id: string;
  name: string;
  kind: SystemKind;
  revision: number;
  revisionId: string;
  revisedAt: string;
  ratioBasis: 'weight' | 'volume';
  ratio: { a: number; b: number };
  specificGravityA: number;
  specificGravityB: number;
  isocyanatePart: 'A' | 'B';
  freeRiseDensityKgM3: number;
  freeRiseReferenceTemperatureC: number;
  freeRiseDensitySlopeKgM3PerC: number | null;
  ratioTolerancePercent: number;
  componentTemperatureMinC: number | null;
  componentTemperatureMaxC: number | null;
  moldTemperatureMinC?: number | null;
  moldTemperatureMaxC?: number | null;
  ambientTemperatureMinC?: number | null;
  ambientTemperatureMaxC?: number | null;
  maxRelativeHumidityPercent?: number | null;
  massTolerancePercent?: number | null;
  potLifeS: number | null;
  demoldTimeS: number | null;
  fullCureTimeS: number | null;
  maxPigmentPercent: number | null;
  maxPackFactor: number | null;
  exothermMassLimitKg: number | null;
  ncoPercent: number | null;
  hydroxylNumberMgKohG: number | null;
  waterPbw: number | null;
  cautionsText: string | null;
  ratioTolerancePbw?: number | null;
  pigmentDoseBasis?: 'ab' | 'polyol' | 'total';
  pigmentPlacement?: 'separate' | 'A' | 'B';
  pigmentCarrierHydroxylNumber?: number | null;
  creamTimeMinS?: number | null;
  creamTimeMaxS?: number | null;
  riseTimeMinS?: number | null;
  riseTimeMaxS?: number | null;
  tackFreeTimeMinS?: number | null;
  tackFreeTimeMaxS?: number | null;
  freeRiseDensityMinKgM3?: number | null;
  freeRiseDensityMaxKgM3?: number | null;
  releaseRequires?: string[];
  derived: { weightRatio: { a: number; b: number }; volumeRatio: { a: number; b: number }; isocyanateIndex: number | null };
  documents: { sds: number; tds: number };
  createdAt: string;
  updatedAt: string;
}

export const KIND_CHOICES: { id: SystemKind; name: string }[] = [
  { id: 'flexible', name: 'Flexible foam' },
  { id: 'integral-skin', name: 'Integral skin' },
  { id: 'other', name: 'Other' },
];

export const DOSE_BASIS_CHOICES = [
  { id: 'ab', name: 'A + B' },
  { id: 'polyol', name: 'The polyol side' },
  { id: 'total', name: 'The total, pigment included' },
];

export const PLACEMENT_CHOICES = [
  { id: 'separate', name: 'Weighed on its own' },
  { id: 'A', name: 'Pre-blended in part A' },
  { id: 'B', name: 'Pre-blended in part B' },
];

export const RELEASE_CHOICES = [
  { id: 'component_temperature', name: 'Component temperature' },
  { id: 'mold_temperature', name: 'Mold temperature' },
  { id: 'ambient_temperature', name: 'Shop air temperature' },
  { id: 'humidity', name: 'Relative humidity' },
  { id: 'mix_start', name: 'Mix start' },
  { id: 'pour', name: 'Pour' },
  { id: 'demold', name: 'Demold' },
];

/** A window of the API's SI view as a form's `{ min, max }` quantities; undefined (not sent) when unset. */
function siWindow(min: number | null | undefined, max: number | null | undefined, unit: string) {
  return min === null || min === undefined || max === null || max === undefined ? undefined : { min: { value: min, unit }, max: { value: max, unit } };
}

export const kindLabel = (k: string) => KIND_CHOICES.find((c) => c.id === k)?.name ?? k;

const trim = (n: number) => Number(n.toPrecision(12));

/** "100 : 55 by weight" */
export function ratioLabel(s: Pick<MaterialSystem, 'ratio' | 'ratioBasis'>): string {
  return `${trim(s.ratio.a)} : ${trim(s.ratio.b)} by ${s.ratioBasis}`;
}

/**
 * What the edit form starts from: the API's body for the record (quantities as `{ value, unit }`),
 * with times in the unit a shop would write them (8 min, not 480 s) and no change note yet.
 */
export function systemFormValues(record: MaterialSystem): Record<string, unknown> {
  const body = writeBody('material-systems', 'update', record) as Record<string, unknown>;
  const time = (s: number | null | undefined) => secondsForInput(s ?? null);
  const emptyWindow = { min: { value: null, unit: 'degC' }, max: { value: null, unit: 'degC' } };
  return {
    ...body,
    id: record.id,
    potLife: time(record.potLifeS),
    demoldTime: time(record.demoldTimeS),
    fullCureTime: time(record.fullCureTimeS),
    freeRiseDensitySlope: body.freeRiseDensitySlope ?? { value: null, unit: 'kg/m3/degC' },
    exothermMassLimit: body.exothermMassLimit ?? { value: null, unit: 'kg' },
    componentTemperatureWindow: body.componentTemperatureWindow ?? emptyWindow,
    moldTemperatureWindow: body.moldTemperatureWindow ?? emptyWindow,
    ambientTemperatureWindow: body.ambientTemperatureWindow ?? emptyWindow,
    ratioTolerancePbw: record.ratioTolerancePbw ?? null,
    pigmentDoseBasis: record.pigmentDoseBasis ?? 'ab',
    pigmentPlacement: record.pigmentPlacement ?? 'separate',
    pigmentCarrierHydroxylNumber: record.pigmentCarrierHydroxylNumber ?? null,
    creamTimeWindow: siWindow(record.creamTimeMinS, record.creamTimeMaxS, 's'),
    riseTimeWindow: siWindow(record.riseTimeMinS, record.riseTimeMaxS, 's'),
    tackFreeTimeWindow: siWindow(record.tackFreeTimeMinS, record.tackFreeTimeMaxS, 's'),
    freeRiseDensityBand: siWindow(record.freeRiseDensityMinKgM3, record.freeRiseDensityMaxKgM3, 'kg/m3'),
    releaseRequires: record.releaseRequires ?? [],
    changeNote: '',
  };
}

export const NEW_SYSTEM = {
  kind: 'flexible',
  ratioBasis: 'weight',
  ratio: { a: 100, b: null },
  isocyanatePart: 'B',
  ratioTolerancePercent: 5,
  freeRiseDensity: { value: null, unit: 'kg/m3' },
  freeRiseReferenceTemperature: { value: 22, unit: 'degC' },
  freeRiseDensitySlope: { value: null, unit: 'kg/m3/degC' },
  componentTemperatureWindow: { min: { value: null, unit: 'degC' }, max: { value: null, unit: 'degC' } },
  moldTemperatureWindow: { min: { value: null, unit: 'degC' }, max: { value: null, unit: 'degC' } },
  ambientTemperatureWindow: { min: { value: null, unit: 'degC' }, max: { value: null, unit: 'degC' } },
  potLife: { value: null, unit: 's' },
  demoldTime: { value: null, unit: 'min' },
  fullCureTime: { value: null, unit: 'h' },
  exothermMassLimit: { value: null, unit: 'kg' },
  pigmentDoseBasis: 'ab',
  pigmentPlacement: 'separate',
  releaseRequires: [],
};
