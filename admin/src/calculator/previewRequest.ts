/**
 * The calculator's form as a `POST /v1/targets/preview` body (schemas/targets.preview.schema.json):
 * a stored system by id; a stored mold by id, a box or cylinder typed in, or a free-rise cup; and
 * the options. Empty fields are left out so the API's defaults apply; the API does every computation.
 */
import type { UnitSystem } from '../auth/me';

export type SubjectKind = 'mold' | 'dimensions' | 'cup';
export type Shape = 'box' | 'cylinder';
export type DensityMode = 'default' | 'pack' | 'density';

export interface CalculatorForm {
  systemId: string;
  subject: SubjectKind;
  moldId: string;
  shape: Shape;
  length: string;
  width: string;
  height: string;
  diameter: string;
  lengthUnit: string;
  cavities: string;
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
}

export function initialForm(system: UnitSystem): CalculatorForm {
  const imperial = system === 'imperial';
  return {
    systemId: '',
    subject: 'mold',
    moldId: '',
    shape: 'box',
    length: '',
    width: '',
    height: '',
    diameter: '',
    lengthUnit: imperial ? 'in' : 'mm',
    cavities: '1',
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
  };
}

/** A typed number, or undefined for an empty field; NaN for text that is not a number. */
export function parseNumber(text: string): number | undefined {
  const t = text.trim().replace(',', '.');
  if (t === '') return undefined;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : NaN;
}

/**
 * Reads a form's number fields: `num` gives the number typed (undefined for an empty field) and puts
 * a field holding text that is not a number in `invalid`; `quantity` gives `{ value, unit }`.
 */
export function numberFields<K extends string>(f: { [key in K]: string }, invalid: K[]) {
  const num = (key: K): number | undefined => {
    const n = parseNumber(f[key]);
    if (n !== undefined && Number.isNaN(n)) {
      invalid.push(key);
      return undefined;
    }
    return n;
  };
  const quantity = (key: K, unit: string): { value: number; unit: string } | undefined => {
    const v = num(key);
    return v === undefined ? undefined : { value: v, unit };
  };
  return { num, quantity };
}

export interface PreviewRequest {
  body: Record<string, unknown> | null;
  /** Form fields that hold text that is not a number. */
  invalid: (keyof CalculatorForm)[];
  /** What is still needed before anything can be computed, in words. */
  missing: string[];
}

/** The option fields the calculator and the plan form share. */
export type OptionFields = Pick<CalculatorForm, 'densityMode' | 'packFactor' | 'targetDensity' | 'densityUnit' | 'pigmentPercent' | 'overfillPercent' | 'retentionPercent' | 'componentTemperature' | 'temperatureUnit' | 'scaleDeviceId'>;
type OptionKey = Exclude<keyof OptionFields, 'densityMode'>;

/**
 * The shared options as the API takes them (`options` of a preview or a batch): a number field that
 * does not parse is left to `invalid` by `num`; a chosen density basis without its figure is `missing`.
 */
export function readOptions(
  f: OptionFields,
  { num, quantity }: Pick<ReturnType<typeof numberFields<OptionKey>>, 'num' | 'quantity'>,
  invalid: readonly string[],
  missing: string[],
): { packFactor?: number; targetDensity?: { value: number; unit: string }; pigmentPercent?: number; overfillPercent?: number; retentionPercent?: number; componentTemperature?: { value: number; unit: string }; scaleDeviceId?: string } {
  const options: ReturnType<typeof readOptions> = {};
  if (f.densityMode === 'pack') {
    const p = num('packFactor');
    if (p !== undefined) options.packFactor = p;
    else if (!invalid.includes('packFactor')) missing.push('the pack factor');
  } else if (f.densityMode === 'density') {
    const d = quantity('targetDensity', f.densityUnit);
    if (d) options.targetDensity = d;
    else if (!invalid.includes('targetDensity')) missing.push('the target density');
  }
  for (const key of ['pigmentPercent', 'overfillPercent', 'retentionPercent'] as const) {
    const v = num(key);
    if (v !== undefined) options[key] = v;
  }
  const temp = quantity('componentTemperature', f.temperatureUnit);
  if (temp) options.componentTemperature = temp;
  if (f.scaleDeviceId) options.scaleDeviceId = f.scaleDeviceId;
  return options;
}

export function buildPreview(f: CalculatorForm): PreviewRequest {
  const invalid: (keyof CalculatorForm)[] = [];
  const missing: string[] = [];
  const fields = numberFields(f, invalid);
  const { num, quantity } = fields;

  if (!f.systemId) missing.push('a material system');
  const body: Record<string, unknown> = { system: { id: f.systemId } };

  if (f.subject === 'mold') {
    if (!f.moldId) missing.push('a mold');
    body.mold = { id: f.moldId };
  } else if (f.subject === 'dimensions') {
    const cavity: Record<string, unknown> = { kind: f.shape };
    const dims: (keyof CalculatorForm)[] = f.shape === 'box' ? ['length', 'width', 'height'] : ['diameter', 'height'];
    for (const d of dims) {
      const q = quantity(d, f.lengthUnit);
      if (q) cavity[d] = q;
      else if (!invalid.includes(d)) missing.push(`the ${d}`);
    }
    const mold: Record<string, unknown> = { cavity };
    const cavities = num('cavities');
    if (cavities !== undefined) mold.cavities = cavities;
    body.mold = mold;
  } else {
    const v = quantity('cupVolume', f.cupVolumeUnit);
    if (!v && !invalid.includes('cupVolume')) missing.push('the cup volume');
    body.freeRiseCup = { volume: v ?? { value: 0, unit: f.cupVolumeUnit } };
  }

  const options = readOptions(f, fields, invalid, missing);
  if (Object.keys(options).length) body.options = options;

  return { body: missing.length || invalid.length ? null : body, invalid, missing };
}

/** Which form field a pointer of the API's 422 answer names (null: show it above the results). */
export function fieldOfPointer(pointer: string): keyof CalculatorForm | null {
  const table: [RegExp, keyof CalculatorForm][] = [
    [/^\/system/, 'systemId'],
    [/^\/mold\/id/, 'moldId'],
    [/^\/mold\/cavity\/length/, 'length'],
    [/^\/mold\/cavity\/width/, 'width'],
    [/^\/mold\/cavity\/height/, 'height'],
    [/^\/mold\/cavity\/diameter/, 'diameter'],
    [/^\/mold\/cavities/, 'cavities'],
    [/^\/freeRiseCup/, 'cupVolume'],
    [/^\/options\/packFactor/, 'packFactor'],
    [/^\/options\/targetDensity/, 'targetDensity'],
    [/^\/options\/pigmentPercent/, 'pigmentPercent'],
    [/^\/options\/overfillPercent/, 'overfillPercent'],
    [/^\/options\/retentionPercent/, 'retentionPercent'],
    [/^\/options\/componentTemperature/, 'componentTemperature'],
    [/^\/options\/scale/, 'scaleDeviceId'],
  ];
  return table.find(([re]) => re.test(pointer))?.[1] ?? null;
}
