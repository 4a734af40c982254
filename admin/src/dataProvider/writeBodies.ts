/**
 * What the console may send when it writes a record. react-admin hands `create` and `update` the
 * whole record as the form holds it (ids, timestamps, joined names, SI read-outs), but the API's
 * request schemas are strict (`additionalProperties: false`). Each resource here turns a record —
 * as read from the API, as edited in a form, or a mix of both — into the body its schema allows,
 * and the list of allowed fields comes from the schema files themselves, so a field the API adds
 * or drops is followed without touching this file.
 */
import deviceCreate from '../../../schemas/device.create.schema.json';
import deviceUpdate from '../../../schemas/device.update.schema.json';
import lotCreate from '../../../schemas/lot.create.schema.json';
import systemCreate from '../../../schemas/material-system.create.schema.json';
import systemParameters from '../../../schemas/material-system.parameters.schema.json';
import moldCreate from '../../../schemas/mold.create.schema.json';
import moldGeometry from '../../../schemas/mold.geometry.schema.json';
import cupTestCreate from '../../../schemas/qc-cup-test.create.schema.json';
import endpointCreate from '../../../schemas/webhook-endpoint.create.schema.json';
import endpointUpdate from '../../../schemas/webhook-endpoint.update.schema.json';
import workOrderCreate from '../../../schemas/work-order.create.schema.json';
import workOrderUpdate from '../../../schemas/work-order.update.schema.json';

interface SchemaNode {
  $id?: string;
  $ref?: string;
  properties?: Record<string, unknown>;
  allOf?: SchemaNode[];
}

const REGISTRY: Record<string, SchemaNode> = Object.fromEntries(
  [systemParameters, moldGeometry].map((s) => [(s as SchemaNode).$id!, s as SchemaNode]),
);

/** Top-level property names a schema allows, following `allOf` and `$ref` to the schemas it builds on. */
export function schemaFields(schema: SchemaNode): Set<string> {
  const out = new Set<string>();
  const walk = (node: SchemaNode | undefined) => {
    if (!node) return;
    if (node.$ref) walk(REGISTRY[node.$ref]);
    for (const k of Object.keys(node.properties ?? {})) out.add(k);
    for (const part of node.allOf ?? []) walk(part);
  };
  walk(schema);
  return out;
}

export type WriteOperation = 'create' | 'update';

type Data = Record<string, unknown>;

export interface Quantity {
  value: number;
  unit: string;
}

const isObject = (v: unknown): v is Data => !!v && typeof v === 'object' && !Array.isArray(v);

function isBlank(v: unknown): boolean {
  return v === undefined || v === null || (typeof v === 'string' && v.trim() === '');
}

/** A number from a form input ('' and null mean "not given"); anything else is passed on for the API to judge. */
function num(v: unknown): unknown {
  if (isBlank(v)) return null;
  if (typeof v === 'string' && v.trim() !== '' && Number.isFinite(Number(v))) return Number(v);
  return v;
}

/**
 * A `{ value, unit }` from the form, or else from the SI read-out of the record. An emptied value
 * is `null` (the field is cleared); `undefined` means neither was there and the field is left out.
 */
function quantity(form: unknown, si: unknown, siUnit: string): Quantity | null | undefined {
  if (isObject(form) && ('value' in form || 'unit' in form)) {
    if (isBlank(form.value)) return null;
    return { value: num(form.value) as number, unit: String(form.unit ?? siUnit) };
  }
  if (form === null) return null;
  if (si === undefined) return undefined;
  if (si === null) return null;
  return { value: si as number, unit: siUnit };
}

/** A min/max window of quantities; empty on both ends is no window at all. */
function window(form: unknown, siMin: unknown, siMax: unknown, siUnit: string): { min: Quantity | null; max: Quantity | null } | null | undefined {
  if (isObject(form)) {
    const min = quantity(form.min, undefined, siUnit) ?? null;
    const max = quantity(form.max, undefined, siUnit) ?? null;
    if (min === null && max === null) return null;
    // one end missing: sent as it is, so the API names the missing end
    return { min, max };
  }
  if (form === null) return null;
  if (siMin === undefined && siMax === undefined) return undefined;
  if (siMin === null || siMax === null || siMin === undefined || siMax === undefined) return null;
  return { min: { value: siMin as number, unit: siUnit }, max: { value: siMax as number, unit: siUnit } };
}

function text(v: unknown): string | null | undefined {
  if (v === undefined) return undefined;
  if (v === null) return null;
  const s = String(v).trim();
  return s === '' ? null : s;
}

/** Keeps only the allowed fields, and drops the ones that are undefined (not given). */
export function pick(body: Data, allowed: Set<string>): Data {
  const out: Data = {};
  for (const [k, v] of Object.entries(body)) if (allowed.has(k) && v !== undefined) out[k] = v;
  return out;
}

// ---------------------------------------------------------------------------------------------
// per resource

function materialSystemBody(d: Data): Data {
  const ratio = isObject(d.ratio) ? { a: num(d.ratio.a), b: num(d.ratio.b) } : d.ratio;
  return {
    ...d,
    name: text(d.name) ?? undefined,
    ratio,
    specificGravityA: num(d.specificGravityA),
    specificGravityB: num(d.specificGravityB),
    freeRiseDensity: quantity(d.freeRiseDensity, d.freeRiseDensityKgM3, 'kg/m3') ?? undefined,
    freeRiseReferenceTemperature: quantity(d.freeRiseReferenceTemperature, d.freeRiseReferenceTemperatureC, 'degC') ?? undefined,
    freeRiseDensitySlope: quantity(d.freeRiseDensitySlope, d.freeRiseDensitySlopeKgM3PerC, 'kg/m3/degC'),
    ratioTolerancePercent: d.ratioTolerancePercent === undefined ? undefined : (num(d.ratioTolerancePercent) ?? undefined),
    componentTemperatureWindow: window(d.componentTemperatureWindow, d.componentTemperatureMinC, d.componentTemperatureMaxC, 'degC'),
    moldTemperatureWindow: window(d.moldTemperatureWindow, d.moldTemperatureMinC, d.moldTemperatureMaxC, 'degC'),
    ambientTemperatureWindow: window(d.ambientTemperatureWindow, d.ambientTemperatureMinC, d.ambientTemperatureMaxC, 'degC'),
    maxRelativeHumidity: num(d.maxRelativeHumidity !== undefined ? d.maxRelativeHumidity : d.maxRelativeHumidityPercent),
    massTolerancePercent: d.massTolerancePercent === undefined ? undefined : num(d.massTolerancePercent),
    potLife: quantity(d.potLife, d.potLifeS, 's'),
    demoldTime: quantity(d.demoldTime, d.demoldTimeS, 's'),
    fullCureTime: quantity(d.fullCureTime, d.fullCureTimeS, 's'),
    exothermMassLimit: quantity(d.exothermMassLimit, d.exothermMassLimitKg, 'kg'),
    maxPigmentPercent: d.maxPigmentPercent === undefined ? undefined : num(d.maxPigmentPercent),
    maxPackFactor: d.maxPackFactor === undefined ? undefined : num(d.maxPackFactor),
    ncoPercent: d.ncoPercent === undefined ? undefined : num(d.ncoPercent),
    hydroxylNumber: num(d.hydroxylNumber !== undefined ? d.hydroxylNumber : d.hydroxylNumberMgKohG),
    waterPbw: d.waterPbw === undefined ? undefined : num(d.waterPbw),
    cautionsText: text(d.cautionsText),
    changeNote: text(d.changeNote),
  };
}

function lotBody(d: Data): Data {
  return {
    part: d.part,
    // a pigment may serve several systems: an emptied picker is "none", not an empty id
    materialSystemId: isBlank(d.materialSystemId) ? null : d.materialSystemId,
    lotNumber: text(d.lotNumber) ?? undefined,
    receivedOn: d.receivedOn ?? undefined,
    expiresOn: d.expiresOn ?? undefined,
    openedOn: isBlank(d.openedOn) ? null : d.openedOn,
    shelfLifeDaysAfterOpening: d.shelfLifeDaysAfterOpening === undefined ? undefined : num(d.shelfLifeDaysAfterOpening),
    notes: text(d.notes),
  };
}

const MEASUREMENT_FIELDS: Record<string, readonly string[]> = {
  box: ['length', 'width', 'height'],
  cylinder: ['diameter', 'height'],
  water_fill: ['waterMass', 'waterTemperature'],
  entered: ['volume'],
};

/**
 * A cavity or insert with only the measurements its kind uses: the form keeps every input of a
 * kind the person tried before switching, and the API refuses fields a kind does not take.
 */
export function measurementBody(m: unknown): unknown {
  if (!isObject(m) || typeof m.kind !== 'string' || !MEASUREMENT_FIELDS[m.kind]) return m;
  const out: Data = { kind: m.kind };
  for (const f of MEASUREMENT_FIELDS[m.kind]!) {
    const q = quantity(m[f], undefined, '');
    if (q) out[f] = q;
  }
  return out;
}

function moldBody(d: Data): Data {
  return {
    name: text(d.name) ?? undefined,
    code: text(d.code),
    cavity: measurementBody(d.cavity),
    inserts: Array.isArray(d.inserts) ? d.inserts.map(measurementBody) : undefined,
    cavities: isBlank(d.cavities) ? undefined : num(d.cavities),
    defaultPackFactor: d.defaultPackFactor === undefined ? undefined : num(d.defaultPackFactor),
    notes: text(d.notes),
  };
}

function workOrderBody(d: Data, op: WriteOperation): Data {
  return {
    // the reference is the ERP's key: it cannot change, so an update leaves it out
    externalRef: op === 'create' ? (text(d.externalRef) ?? undefined) : undefined,
    partNumber: text(d.partNumber),
    moldId: isBlank(d.moldId) ? null : d.moldId,
    materialSystemId: isBlank(d.materialSystemId) ? null : d.materialSystemId,
    quantity: isBlank(d.quantity) ? undefined : num(d.quantity),
    dueOn: isBlank(d.dueOn) ? null : d.dueOn,
    notes: text(d.notes),
    state: d.state ?? undefined,
  };
}

/** A date-time input's value (a Date, or a string a Date can read) as an ISO instant. */
function instant(v: unknown): unknown {
  const t = v instanceof Date ? v : new Date(String(v));
  return Number.isNaN(t.getTime()) ? v : t.toISOString();
}

function cupTestBody(d: Data): Data {
  return {
    materialSystemId: d.materialSystemId,
    lotAId: isBlank(d.lotAId) ? null : d.lotAId,
    lotBId: isBlank(d.lotBId) ? null : d.lotBId,
    componentTemperatureA: quantity(d.componentTemperatureA, d.componentTemperatureAC, 'degC') ?? undefined,
    componentTemperatureB: quantity(d.componentTemperatureB, d.componentTemperatureBC, 'degC') ?? undefined,
    creamTime: quantity(d.creamTime, d.creamTimeS, 's'),
    topOfCupTime: quantity(d.topOfCupTime, d.topOfCupTimeS, 's'),
    tackFreeTime: quantity(d.tackFreeTime, d.tackFreeTimeS, 's'),
    freeRiseDensity: quantity(d.freeRiseDensity, d.freeRiseDensityKgM3, 'kg/m3') ?? undefined,
    testedAt: isBlank(d.testedAt) ? undefined : instant(d.testedAt),
    notes: text(d.notes),
  };
}

function deviceBody(d: Data, op: WriteOperation): Data {
  const scale = (d.kind ?? 'scale') === 'scale';
  return {
    kind: op === 'create' ? d.kind : undefined,
    serial: text(d.serial) ?? undefined,
    name: text(d.name) ?? undefined,
    stationCode: d.stationCode === undefined ? undefined : (text(d.stationCode) ?? null),
    // readability and capacity describe scales; other kinds send none
    readability: scale ? quantity(d.readability, d.readabilityKg, 'kg') : op === 'create' ? undefined : null,
    capacity: scale ? quantity(d.capacity, d.capacityKg, 'kg') : op === 'create' ? undefined : null,
    calibrationDue: d.calibrationDue === undefined ? undefined : isBlank(d.calibrationDue) ? null : d.calibrationDue,
    retired: typeof d.retired === 'boolean' ? d.retired : undefined,
  };
}

function endpointBody(d: Data): Data {
  return {
    url: text(d.url) ?? undefined,
    description: d.description === undefined ? undefined : (text(d.description) ?? ''),
    eventTypes: Array.isArray(d.eventTypes) ? [...new Set(d.eventTypes)] : undefined,
    enabled: typeof d.enabled === 'boolean' ? d.enabled : undefined,
  };
}

interface ResourceWrite {
  fields: Record<WriteOperation, Set<string>>;
  body(data: Data, op: WriteOperation): Data;
}

const both = (s: SchemaNode) => ({ create: schemaFields(s), update: schemaFields(s) });

export const RESOURCE_WRITES: Readonly<Record<string, ResourceWrite>> = {
  'material-systems': { fields: both(systemCreate), body: materialSystemBody },
  lots: { fields: both(lotCreate), body: lotBody },
  molds: { fields: both(moldCreate), body: moldBody },
  'work-orders': { fields: { create: schemaFields(workOrderCreate), update: schemaFields(workOrderUpdate) }, body: workOrderBody },
  'qc-cup-tests': { fields: both(cupTestCreate), body: cupTestBody },
  devices: { fields: { create: schemaFields(deviceCreate), update: schemaFields(deviceUpdate) }, body: deviceBody },
  'webhook-endpoints': { fields: { create: schemaFields(endpointCreate), update: schemaFields(endpointUpdate) }, body: endpointBody },
};

/**
 * The request body for writing `data` to `resource`: the resource's own shaping, then only the
 * fields its schema allows. Resources without a rule are sent as they are.
 */
export function writeBody(resource: string, op: WriteOperation, data: unknown): unknown {
  const rule = RESOURCE_WRITES[resource];
  if (!rule || !isObject(data)) return data;
  return pick(rule.body(data, op), rule.fields[op]);
}
