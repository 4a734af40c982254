import { describe, expect, it, vi } from 'vitest';
import lotSchema from '../../../schemas/lot.create.schema.json';
import { createDataProvider } from './index';
import type { HttpClient } from './httpClient';
import { measurementBody, RESOURCE_WRITES, schemaFields, writeBody } from './writeBodies';

/** A material system exactly as GET /v1/material-systems/{id} answers it (SI read-outs, joined extras). */
const systemRecord = {
  id: '983d5372-7a5e-4334-a476-3d5ad9a0f480',
  name: 'Demo Flex 28',
  kind: 'flexible',
  revision: 3,
  revisionId: '9ef92f1b-dc52-421e-81dc-a057280b71ab',
  revisedAt: '2026-12-02T01:29:20.305Z',
  ratioBasis: 'weight',
  ratio: { a: 100, b: 55 },
  specificGravityA: 1.04,
  specificGravityB: 1.22,
  isocyanatePart: 'B',
  freeRiseDensityKgM3: 28,
  freeRiseReferenceTemperatureC: 22,
  freeRiseDensitySlopeKgM3PerC: -0.25,
  ratioTolerancePercent: 5,
  componentTemperatureMinC: 18,
  componentTemperatureMaxC: 27,
  moldTemperatureMinC: null,
  moldTemperatureMaxC: null,
  potLifeS: 75,
  demoldTimeS: 480,
  fullCureTimeS: 86400,
  maxPigmentPercent: 5,
  maxPackFactor: 3.5,
  exothermMassLimitKg: 3,
  ncoPercent: 32.5,
  hydroxylNumberMgKohG: 35,
  waterPbw: 3.2,
  cautionsText: 'Mix for 8 seconds at most.',
  derived: { weightRatio: { a: 100, b: 55 }, volumeRatio: { a: 117.3, b: 55 }, isocyanateIndex: 101.8 },
  documents: { sds: 1, tds: 0 },
  createdAt: '2026-12-02T01:29:20.302Z',
  updatedAt: '2026-12-02T01:29:20.302Z',
};

describe('schemaFields', () => {
  it('reads the top-level properties, following allOf and $ref into the schemas a schema builds on', () => {
    const fields = RESOURCE_WRITES['material-systems']!.fields.update;
    // from material-system.parameters, reached through allOf/$ref
    expect(fields.has('freeRiseDensity')).toBe(true);
    expect(fields.has('changeNote')).toBe(true);
    expect(fields.has('name')).toBe(true);
    // read-outs of the answer are not request fields
    expect(fields.has('freeRiseDensityKgM3')).toBe(false);
    expect(fields.has('revision')).toBe(false);
  });

  it('matches the lot schema one for one', () => {
    expect([...schemaFields(lotSchema)].sort()).toEqual(Object.keys(lotSchema.properties).sort());
  });
});

describe('writeBody', () => {
  it('turns a whole material-system record into a body of allowed fields with {value, unit} quantities', () => {
    const body = writeBody('material-systems', 'update', systemRecord) as Record<string, unknown>;
    const allowed = RESOURCE_WRITES['material-systems']!.fields.update;
    for (const key of Object.keys(body)) expect(allowed.has(key), key).toBe(true);
    expect(body).not.toHaveProperty('id');
    expect(body).not.toHaveProperty('derived');
    expect(body).not.toHaveProperty('documents');
    expect(body.freeRiseDensity).toEqual({ value: 28, unit: 'kg/m3' });
    expect(body.freeRiseReferenceTemperature).toEqual({ value: 22, unit: 'degC' });
    expect(body.freeRiseDensitySlope).toEqual({ value: -0.25, unit: 'kg/m3/degC' });
    expect(body.componentTemperatureWindow).toEqual({ min: { value: 18, unit: 'degC' }, max: { value: 27, unit: 'degC' } });
    expect(body.demoldTime).toEqual({ value: 480, unit: 's' });
    expect(body.exothermMassLimit).toEqual({ value: 3, unit: 'kg' });
    expect(body.hydroxylNumber).toBe(35);
    // a window the record does not have is cleared, not sent half-empty
    expect(body.moldTemperatureWindow).toBeNull();
  });

  it('prefers what the form edited over the SI read-out, and clears emptied quantities', () => {
    const body = writeBody('material-systems', 'update', {
      ...systemRecord,
      freeRiseDensity: { value: '1.9', unit: 'lb/ft3' },
      demoldTime: { value: 9, unit: 'min' },
      potLife: { value: '', unit: 's' },
      componentTemperatureWindow: { min: { value: '', unit: 'degC' }, max: { value: null, unit: 'degC' } },
      changeNote: '  slower catalyst  ',
    }) as Record<string, unknown>;
    expect(body.freeRiseDensity).toEqual({ value: 1.9, unit: 'lb/ft3' });
    expect(body.demoldTime).toEqual({ value: 9, unit: 'min' });
    expect(body.potLife).toBeNull();
    expect(body.componentTemperatureWindow).toBeNull();
    expect(body.changeNote).toBe('slower catalyst');
  });

  it('sends a lot only the lot fields, with an emptied system or opened date as null', () => {
    const body = writeBody('lots', 'update', {
      id: 'l1',
      part: 'pigment',
      materialSystemId: '',
      materialSystemName: 'Demo Flex 28',
      lotNumber: ' PIG-07 ',
      receivedOn: '2026-11-01',
      expiresOn: '2027-11-01',
      openedOn: '',
      expired: false,
      notes: null,
      createdAt: 'x',
      updatedAt: 'y',
    });
    expect(body).toEqual({ part: 'pigment', materialSystemId: null, lotNumber: 'PIG-07', receivedOn: '2026-11-01', expiresOn: '2027-11-01', openedOn: null, notes: null });
  });

  it('sends a lot its shelf life after opening as a number of days, an emptied one as null, and never its computed usable-until day', () => {
    const base = { part: 'A', materialSystemId: 'ms1', lotNumber: 'A-1', receivedOn: '2026-11-01', expiresOn: '2027-11-01', openedOn: '2026-12-01', usableUntil: '2027-01-30', recall: null };
    const typed = writeBody('lots', 'update', { ...base, shelfLifeDaysAfterOpening: '60' }) as Record<string, unknown>;
    expect(typed.shelfLifeDaysAfterOpening).toBe(60);
    expect(typed).not.toHaveProperty('usableUntil');
    expect(typed).not.toHaveProperty('recall');
    expect((writeBody('lots', 'update', { ...base, shelfLifeDaysAfterOpening: '' }) as Record<string, unknown>).shelfLifeDaysAfterOpening).toBeNull();
  });

  it('keeps only the measurements a cavity kind takes, and drops the computed volumes of a mold', () => {
    expect(
      measurementBody({ kind: 'cylinder', diameter: { value: '95', unit: 'mm' }, height: { value: 115, unit: 'mm' }, length: { value: 3, unit: 'mm' }, waterMass: { value: '', unit: 'kg' } }),
    ).toEqual({ kind: 'cylinder', diameter: { value: 95, unit: 'mm' }, height: { value: 115, unit: 'mm' } });
    const body = writeBody('molds', 'update', {
      id: 'm1',
      name: 'Armrest, 2-up',
      code: 'ARM-02',
      cavity: { kind: 'box', length: { value: 280, unit: 'mm' }, width: { value: 70, unit: 'mm' }, height: { value: 60, unit: 'mm' } },
      inserts: [{ kind: 'entered', volume: { value: 0.12, unit: 'L' } }],
      cavities: '2',
      grossCavityVolumeM3: 0.001176,
      cavityVolumeM3: 0.001056,
      totalVolumeM3: 0.002112,
      defaultPackFactor: 3.5,
      notes: '',
    }) as Record<string, unknown>;
    expect(Object.keys(body).sort()).toEqual(['cavities', 'cavity', 'code', 'defaultPackFactor', 'inserts', 'name', 'notes']);
    expect(body.cavities).toBe(2);
    expect(body.notes).toBeNull();
  });

  it('leaves the ERP reference out of a work-order update (it cannot change) but sends it on create', () => {
    const record = { id: 'w1', externalRef: 'WO-1', partNumber: 'P', moldId: null, moldName: 'x', materialSystemId: '', quantity: '12', dueOn: '', notes: null, state: 'in_progress', createdBy: 'demo', createdAt: 'a', updatedAt: 'b' };
    expect(writeBody('work-orders', 'update', record)).toEqual({ partNumber: 'P', moldId: null, materialSystemId: null, quantity: 12, dueOn: null, notes: null, state: 'in_progress' });
    expect(writeBody('work-orders', 'create', record)).toMatchObject({ externalRef: 'WO-1', quantity: 12 });
  });

  it('gives a scale its readability and capacity from the form or from the kg read-out, and never sends kind on update', () => {
    const record = { id: 'd1', kind: 'scale', serial: 'SC-1', name: 'Bench 1', station: { id: 's', code: 'S1', name: 'Station S1' }, stationCode: 'S1', readabilityKg: 0.0001, capacityKg: 6, calibrationDue: '2027-01-01', calibrationOverdue: false, retired: false, createdAt: 'a', updatedAt: 'b' };
    expect(writeBody('devices', 'update', { ...record, readability: { value: 0.1, unit: 'g' } })).toEqual({
      serial: 'SC-1',
      name: 'Bench 1',
      stationCode: 'S1',
      readability: { value: 0.1, unit: 'g' },
      capacity: { value: 6, unit: 'kg' },
      calibrationDue: '2027-01-01',
      retired: false,
    });
    const logger = writeBody('devices', 'create', { kind: 'logger', serial: 'TL-9', name: 'Logger', stationCode: '', readability: { value: 1, unit: 'g' }, calibrationDue: '' });
    expect(logger).toEqual({ kind: 'logger', serial: 'TL-9', name: 'Logger', stationCode: null, calibrationDue: null });
  });

  it('sends a cup test its instant in ISO form and quantities as given', () => {
    const body = writeBody('qc-cup-tests', 'create', {
      materialSystemId: 'ms1',
      lotAId: '',
      componentTemperatureA: { value: '22.5', unit: 'degC' },
      componentTemperatureB: { value: 72, unit: 'degF' },
      creamTime: { value: 12, unit: 's' },
      topOfCupTime: { value: '', unit: 's' },
      freeRiseDensity: { value: 28.1, unit: 'kg/m3' },
      testedAt: '2026-11-30T07:40:00Z',
      extra: 'dropped',
    }) as Record<string, unknown>;
    expect(body.testedAt).toBe('2026-11-30T07:40:00.000Z');
    expect(body.componentTemperatureA).toEqual({ value: 22.5, unit: 'degC' });
    expect(body.topOfCupTime).toBeNull();
    expect(body.lotAId).toBeNull();
    expect(body).not.toHaveProperty('extra');
  });

  it('passes resources without a rule through untouched', () => {
    const data = { name: 'x', anything: 1 };
    expect(writeBody('users', 'update', data)).toBe(data);
  });
});

describe('data provider', () => {
  function fakeHttp() {
    const fetchJson = vi.fn(async (_url: string, init?: { method?: string; body?: string }) => ({
      status: 200,
      headers: new Headers(),
      body: init?.body ?? '',
      json: { id: 'w1', ...(init?.body ? JSON.parse(init.body) : {}) },
    }));
    return { http: { fetchJson, refresh: async () => true } as unknown as HttpClient, fetchJson };
  }

  it('PUTs only the allowed fields when react-admin updates a whole webhook endpoint record', async () => {
    const { http, fetchJson } = fakeHttp();
    const dp = createDataProvider(http, '/v1');
    const record = { id: 'w1', url: 'https://erp.example.test/hooks', description: 'ERP', eventTypes: ['batch.on_hold'], enabled: true, disabledReason: null, secretRotating: false, previousSecretUntil: null, createdAt: 'a', updatedAt: 'b' };
    await dp.update('webhook-endpoints', { id: 'w1', data: { ...record, enabled: false }, previousData: record });
    const [url, init] = fetchJson.mock.calls[0]!;
    expect(url).toBe('/v1/webhook-endpoints/w1');
    expect(init?.method).toBe('PUT');
    expect(JSON.parse(init!.body!)).toEqual({ url: 'https://erp.example.test/hooks', description: 'ERP', eventTypes: ['batch.on_hold'], enabled: false });
  });

  it('POSTs a new lot without the form-only extras', async () => {
    const { http, fetchJson } = fakeHttp();
    const dp = createDataProvider(http, '/v1');
    await dp.create('lots', { data: { part: 'A', materialSystemId: 'ms1', lotNumber: 'A-1', receivedOn: '2026-12-01', expiresOn: '2027-06-01', expiresIn: 180 } });
    const [, init] = fetchJson.mock.calls[0]!;
    expect(init?.method).toBe('POST');
    expect(Object.keys(JSON.parse(init!.body!)).sort()).toEqual(['expiresOn', 'lotNumber', 'materialSystemId', 'openedOn', 'part', 'receivedOn']);
  });
});
