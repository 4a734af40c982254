/**
 * The planning form as a `POST /v1/batches` body (schemas/batch.create.schema.json), the preview
 * body the form shows before planning (`POST /v1/targets/preview`, same options), and the links
 * that carry a pour into the form: from the calculator (its inputs) and from a work order. Empty
 * fields are left out so the API's defaults apply; the API does every computation and every check.
 */
import { numberFields, readOptions, type CalculatorForm } from '../calculator/previewRequest';
import type { BatchOptions, BatchPlanBody, Lot, TargetsPreviewBody } from '../views/sdk';

export type PlanSubject = 'mold' | 'cup';
export type DensityMode = CalculatorForm['densityMode'];
export type LotPart = Lot['part'];

export interface PlanForm {
  workOrderId: string;
  systemId: string;
  /** '' is the system's current revision. */
  revision: string;
  subject: PlanSubject;
  moldId: string;
  cupVolume: string;
  cupVolumeUnit: string;
  densityMode: DensityMode;
  packFactor: string;
  targetDensity: string;
  densityUnit: string;
  pigmentPercent: string;
  overfillPercent: string;
  retentionPercent: string;
  componentTemperature: string;
  temperatureUnit: string;
  scaleDeviceId: string;
  lotA: string;
  lotB: string;
  lotPigment: string;
  stationCode: string;
  plannedFor: string;
  notes: string;
  /** How many identical batches to plan (a work order's proposal), 1 otherwise. */
  count: string;
  /** Why an expired, held or recalled lot goes in anyway (an engineer's override, audited); '' for none. */
  lotOverrideReason: string;
}

export function initialPlan(system: 'metric' | 'imperial', today: string): PlanForm {
  const imperial = system === 'imperial';
  return {
    workOrderId: '',
    systemId: '',
    revision: '',
    subject: 'mold',
    moldId: '',
    cupVolume: '',
    cupVolumeUnit: imperial ? 'in3' : 'L',
    densityMode: 'default',
    packFactor: '',
    targetDensity: '',
    densityUnit: imperial ? 'lb/ft3' : 'kg/m3',
    pigmentPercent: '',
    overfillPercent: '',
    retentionPercent: '',
    componentTemperature: '',
    temperatureUnit: imperial ? 'degF' : 'degC',
    scaleDeviceId: '',
    lotA: '',
    lotB: '',
    lotPigment: '',
    stationCode: '',
    plannedFor: today,
    notes: '',
    count: '1',
    lotOverrideReason: '',
  };
}

/** The form fields a link may carry (`/batches/plan?…`): every field of the form, by its own name. */
const LINKABLE: readonly (keyof PlanForm)[] = [
  'workOrderId',
  'systemId',
  'revision',
  'subject',
  'moldId',
  'cupVolume',
  'cupVolumeUnit',
  'densityMode',
  'packFactor',
  'targetDensity',
  'densityUnit',
  'pigmentPercent',
  'overfillPercent',
  'retentionPercent',
  'componentTemperature',
  'temperatureUnit',
  'scaleDeviceId',
  'lotA',
  'lotB',
  'lotPigment',
  'stationCode',
  'plannedFor',
  'count',
];
const SUBJECTS: readonly PlanSubject[] = ['mold', 'cup'];
const DENSITY_MODES: readonly DensityMode[] = ['default', 'pack', 'density'];

/** The form a link opens: the defaults, then whatever the link names (unknown choices are ignored). */
export function planFromSearch(search: string | URLSearchParams, base: PlanForm): PlanForm {
  const params = typeof search === 'string' ? new URLSearchParams(search.startsWith('?') ? search.slice(1) : search) : search;
  const out: PlanForm = { ...base };
  for (const key of LINKABLE) {
    const v = params.get(key);
    if (v === null) continue;
    if (key === 'subject' && !SUBJECTS.includes(v as PlanSubject)) continue;
    if (key === 'densityMode' && !DENSITY_MODES.includes(v as DensityMode)) continue;
    (out as unknown as Record<string, string>)[key] = v;
  }
  return out;
}

/** The link the calculator's "Plan a batch" opens: the inputs it computed with. Null for typed-in dimensions (planning needs a stored mold). */
export function planLinkFromCalculator(f: CalculatorForm): string | null {
  if (f.subject === 'dimensions') return null;
  const p = new URLSearchParams();
  const put = (key: keyof PlanForm, value: string) => {
    if (value.trim() !== '') p.set(key, value.trim());
  };
  put('systemId', f.systemId);
  put('subject', f.subject === 'cup' ? 'cup' : 'mold');
  if (f.subject === 'mold') put('moldId', f.moldId);
  else {
    put('cupVolume', f.cupVolume);
    put('cupVolumeUnit', f.cupVolumeUnit);
  }
  put('densityMode', f.densityMode);
  if (f.densityMode === 'pack') put('packFactor', f.packFactor);
  if (f.densityMode === 'density') {
    put('targetDensity', f.targetDensity);
    put('densityUnit', f.densityUnit);
  }
  put('pigmentPercent', f.pigmentPercent);
  put('overfillPercent', f.overfillPercent);
  put('retentionPercent', f.retentionPercent);
  if (f.componentTemperature.trim()) {
    put('componentTemperature', f.componentTemperature);
    put('temperatureUnit', f.temperatureUnit);
  }
  put('scaleDeviceId', f.scaleDeviceId);
  return `/batches/plan?${p}`;
}

/** The link a work order's "Plan N batches" opens: the order, and how many batches to plan. */
export function planLinkForWorkOrder(workOrderId: string, count: number): string {
  const p = new URLSearchParams({ workOrderId, count: String(Math.max(1, count)) });
  return `/batches/plan?${p}`;
}

export interface PlanRequest {
  body: BatchPlanBody | null;
  /** How many batches the form plans. */
  count: number;
  invalid: (keyof PlanForm)[];
  missing: string[];
}

/** The largest number of batches one press plans: a work order larger than this is planned in steps. */
export const MAX_BATCHES_AT_ONCE = 50;

export function buildPlan(f: PlanForm): PlanRequest {
  const invalid: (keyof PlanForm)[] = [];
  const missing: string[] = [];
  const fields = numberFields(f, invalid);
  const { num, quantity } = fields;

  const body: BatchPlanBody = {};
  if (f.workOrderId) body.workOrderId = f.workOrderId;
  if (f.systemId) body.materialSystemId = f.systemId;
  else if (!f.workOrderId) missing.push('a material system');
  if (f.revision) {
    const r = num('revision');
    if (r !== undefined) body.materialSystemRevision = r;
  }
  if (f.subject === 'mold') {
    if (f.moldId) body.moldId = f.moldId;
    else if (!f.workOrderId) missing.push('a mold');
  } else {
    const v = quantity('cupVolume', f.cupVolumeUnit);
    if (v) body.freeRiseCup = { volume: v };
    else if (!invalid.includes('cupVolume')) missing.push('the cup volume');
  }

  const options: BatchOptions = readOptions(f, fields, invalid, missing);
  const lots: NonNullable<BatchOptions['lots']> = {};
  if (f.lotA) lots.A = f.lotA;
  if (f.lotB) lots.B = f.lotB;
  if (f.lotPigment) lots.pigment = f.lotPigment;
  if (Object.keys(lots).length) options.lots = lots;
  if (f.plannedFor) options.plannedFor = f.plannedFor;
  if (Object.keys(options).length) body.options = options;
  if (f.stationCode.trim()) body.stationCode = f.stationCode.trim();
  if (f.notes.trim()) body.notes = f.notes.trim();
  if (f.lotOverrideReason.trim()) body.lotOverride = { reason: f.lotOverrideReason.trim() };

  let count = 1;
  const c = num('count');
  if (c !== undefined) {
    if (!Number.isInteger(c) || c < 1 || c > MAX_BATCHES_AT_ONCE) invalid.push('count');
    else count = c;
  }
  return { body: missing.length || invalid.length ? null : body, count, invalid, missing };
}

/**
 * The targets preview for a plan: the same system, mold or cup and options, so the figures shown
 * before planning are the ones the batch will store. Null while the system or the mold is unknown
 * (a work order names them only once it is loaded).
 */
export function previewOf(body: BatchPlanBody | null, fromOrder?: { materialSystemId: string | null; moldId: string | null }): TargetsPreviewBody | null {
  if (!body) return null;
  const systemId = body.materialSystemId ?? fromOrder?.materialSystemId ?? null;
  if (!systemId) return null;
  const preview: TargetsPreviewBody = { system: body.materialSystemRevision ? { id: systemId, revision: body.materialSystemRevision } : { id: systemId } };
  if (body.freeRiseCup) preview.freeRiseCup = body.freeRiseCup;
  else {
    const moldId = body.moldId ?? fromOrder?.moldId ?? null;
    if (!moldId) return null;
    preview.mold = { id: moldId };
  }
  if (body.options) preview.options = body.options;
  return preview;
}

/** Which form field a pointer of the API's problem names (null: shown above the form). */
export function fieldOfPointer(pointer: string): keyof PlanForm | null {
  const table: [RegExp, keyof PlanForm][] = [
    [/^\/workOrderId/, 'workOrderId'],
    [/^\/(materialSystemId|system\/id|system$)/, 'systemId'],
    [/^\/(materialSystemRevision|system\/revision)/, 'revision'],
    [/^\/(moldId|mold)/, 'moldId'],
    [/^\/freeRiseCup/, 'cupVolume'],
    [/^\/stationCode/, 'stationCode'],
    [/^\/notes/, 'notes'],
    [/^\/lotOverride/, 'lotOverrideReason'],
    [/^\/options\/packFactor/, 'packFactor'],
    [/^\/options\/targetDensity/, 'targetDensity'],
    [/^\/options\/pigmentPercent/, 'pigmentPercent'],
    [/^\/options\/overfillPercent/, 'overfillPercent'],
    [/^\/options\/retentionPercent/, 'retentionPercent'],
    [/^\/options\/componentTemperature/, 'componentTemperature'],
    [/^\/options\/scale/, 'scaleDeviceId'],
    [/^\/options\/lots\/A/, 'lotA'],
    [/^\/options\/lots\/B/, 'lotB'],
    [/^\/options\/lots\/pigment/, 'lotPigment'],
    [/^\/options\/plannedFor/, 'plannedFor'],
  ];
  return table.find(([re]) => re.test(pointer))?.[1] ?? null;
}

export const LOT_FIELD: Readonly<Record<LotPart, 'lotA' | 'lotB' | 'lotPigment'>> = { A: 'lotA', B: 'lotB', pigment: 'lotPigment' };

/**
 * Why the API will refuse a lot for a new batch on `plannedFor`, in words, as the lot's own view
 * states it (its recall, its hold, its usable-until day: the expiry, or the opening day plus the
 * shelf life after opening); empty when nothing stands in the way. The API decides; this only says
 * it before the person presses the button.
 */
export function lotRefusals(lot: Pick<Lot, 'lotNumber' | 'usableUntil' | 'expiresOn' | 'openedOn' | 'expired' | 'hold' | 'recall'>, plannedFor: string): string[] {
  const out: string[] = [];
  if (lot.recall) out.push(`recalled on ${lot.recall.at.slice(0, 10)}${lot.recall.reason ? ` (${lot.recall.reason})` : ''}`);
  if (lot.hold) out.push(`on hold since ${lot.hold.since.slice(0, 10)}: its latest cup test failed`);
  if (lot.expired || (plannedFor && lot.usableUntil < plannedFor)) {
    const why = lot.usableUntil < lot.expiresOn ? `usable until ${lot.usableUntil} after opening on ${lot.openedOn ?? '?'}` : `expired on ${lot.usableUntil}`;
    out.push(`${why}${plannedFor && !lot.expired ? ', before the planned day' : ''}`);
  }
  return out;
}
