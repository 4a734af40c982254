import { describe, expect, it } from 'vitest';
import { initialForm } from '../calculator/previewRequest';
import { buildPlan, fieldOfPointer, initialPlan, lotRefusals, MAX_BATCHES_AT_ONCE, planFromSearch, planLinkForWorkOrder, planLinkFromCalculator, previewOf } from './planRequest';

const SYSTEM = '232486a9-2ab9-48dd-ab20-9feab51559c0';
const MOLD = '6b8a789d-819f-457f-8a39-99e2f2d1298a';
const ORDER = '0d9b3c55-6a1c-4f0e-9a57-5b1d2f0c9e11';
const LOT_A = '3f1e0a2b-1111-4c2d-8e3f-000000000001';
const LOT_B = '3f1e0a2b-1111-4c2d-8e3f-000000000002';
const TODAY = '2031-03-14';

describe('buildPlan', () => {
  it('asks for a system and a mold when no work order names them', () => {
    const r = buildPlan(initialPlan('metric', TODAY));
    expect(r.body).toBeNull();
    expect(r.missing).toEqual(['a material system', 'a mold']);
  });

  it('plans for a work order with nothing else: the API takes its mold and system', () => {
    const r = buildPlan({ ...initialPlan('metric', TODAY), workOrderId: ORDER, count: '3' });
    expect(r.body).toEqual({ workOrderId: ORDER, options: { plannedFor: TODAY } });
    expect(r.count).toBe(3);
  });

  it('sends the lots, the station, the revision and the options given, and leaves out the empty ones', () => {
    const f = {
      ...initialPlan('metric', TODAY),
      systemId: SYSTEM,
      revision: '2',
      moldId: MOLD,
      densityMode: 'pack' as const,
      packFactor: '1,8',
      pigmentPercent: '2',
      lotA: LOT_A,
      lotB: LOT_B,
      stationCode: ' DEMO-B2 ',
      notes: '  ',
    };
    expect(buildPlan(f).body).toEqual({
      materialSystemId: SYSTEM,
      materialSystemRevision: 2,
      moldId: MOLD,
      stationCode: 'DEMO-B2',
      options: { packFactor: 1.8, pigmentPercent: 2, lots: { A: LOT_A, B: LOT_B }, plannedFor: TODAY },
    });
  });

  it('sends a free-rise cup by its volume in the chosen unit', () => {
    const f = { ...initialPlan('imperial', TODAY), systemId: SYSTEM, subject: 'cup' as const, cupVolume: '61' };
    expect(buildPlan(f).body?.freeRiseCup).toEqual({ volume: { value: 61, unit: 'in3' } });
  });

  it('refuses words in number fields and a count that is not a whole number of batches within the limit', () => {
    const base = { ...initialPlan('metric', TODAY), systemId: SYSTEM, moldId: MOLD };
    expect(buildPlan({ ...base, densityMode: 'pack', packFactor: 'lots' }).invalid).toEqual(['packFactor']);
    expect(buildPlan({ ...base, count: '2.5' }).invalid).toEqual(['count']);
    expect(buildPlan({ ...base, count: '0' }).body).toBeNull();
    expect(buildPlan({ ...base, count: String(MAX_BATCHES_AT_ONCE + 1) }).invalid).toEqual(['count']);
    expect(buildPlan({ ...base, count: String(MAX_BATCHES_AT_ONCE) }).count).toBe(MAX_BATCHES_AT_ONCE);
  });
});

describe('links into the planning form', () => {
  it('carries the calculator inputs it computed with, and the form reads them back', () => {
    const calc = {
      ...initialForm('metric'),
      systemId: SYSTEM,
      moldId: MOLD,
      densityMode: 'pack' as const,
      packFactor: '1.8',
      pigmentPercent: '2',
      overfillPercent: '3',
      componentTemperature: '22.5',
      length: '40',
    };
    const link = planLinkFromCalculator(calc)!;
    expect(link.startsWith('/batches/plan?')).toBe(true);
    const form = planFromSearch(link.split('?')[1]!, initialPlan('metric', TODAY));
    expect(form).toMatchObject({
      systemId: SYSTEM,
      moldId: MOLD,
      subject: 'mold',
      densityMode: 'pack',
      packFactor: '1.8',
      pigmentPercent: '2',
      overfillPercent: '3',
      componentTemperature: '22.5',
      temperatureUnit: 'degC',
      plannedFor: TODAY,
    });
    // a typed cavity length is not a stored mold: it does not travel
    expect(link).not.toContain('length');
  });

  it('offers no plan for typed-in dimensions: a batch needs a stored mold', () => {
    expect(planLinkFromCalculator({ ...initialForm('metric'), systemId: SYSTEM, subject: 'dimensions' })).toBeNull();
  });

  it('opens a work order plan with the proposed count, never less than one', () => {
    expect(planFromSearch(planLinkForWorkOrder(ORDER, 30).split('?')[1]!, initialPlan('metric', TODAY))).toMatchObject({ workOrderId: ORDER, count: '30' });
    expect(planLinkForWorkOrder(ORDER, 0)).toContain('count=1');
  });

  it('ignores choices the form does not have', () => {
    const f = planFromSearch('subject=dimensions&densityMode=magic&unknown=1', initialPlan('metric', TODAY));
    expect(f.subject).toBe('mold');
    expect(f.densityMode).toBe('default');
    expect(f).not.toHaveProperty('unknown');
  });
});

describe('previewOf', () => {
  it('previews the same system, mold and options, taking the work order’s where the plan names none', () => {
    const plan = buildPlan({ ...initialPlan('metric', TODAY), workOrderId: ORDER, lotA: LOT_A }).body;
    expect(previewOf(plan)).toBeNull();
    expect(previewOf(plan, { materialSystemId: SYSTEM, moldId: MOLD })).toEqual({ system: { id: SYSTEM }, mold: { id: MOLD }, options: { lots: { A: LOT_A }, plannedFor: TODAY } });
  });

  it('names the revision when the plan does', () => {
    const plan = buildPlan({ ...initialPlan('metric', TODAY), systemId: SYSTEM, revision: '3', moldId: MOLD }).body;
    expect(previewOf(plan)?.system).toEqual({ id: SYSTEM, revision: 3 });
  });
});

describe('fieldOfPointer', () => {
  it('puts the API’s pointers on the fields of the form', () => {
    expect(fieldOfPointer('/options/lots/A')).toBe('lotA');
    expect(fieldOfPointer('/options/lots/pigment')).toBe('lotPigment');
    expect(fieldOfPointer('/stationCode')).toBe('stationCode');
    expect(fieldOfPointer('/materialSystemRevision')).toBe('revision');
    expect(fieldOfPointer('/system/revision')).toBe('revision');
    expect(fieldOfPointer('/mold/id')).toBe('moldId');
    expect(fieldOfPointer('/options/plannedFor')).toBe('plannedFor');
    expect(fieldOfPointer('')).toBeNull();
  });
});

describe('lotRefusals', () => {
  const lot = { lotNumber: 'DF28-A-0117', expiresOn: '2031-03-20', usableUntil: '2031-03-20', openedOn: null, expired: false, hold: null, recall: null };
  it('says nothing of a lot good on the planned day', () => {
    expect(lotRefusals(lot, TODAY)).toEqual([]);
    // a lot is usable on its last day and expired from the next one (common practice: "use by")
    expect(lotRefusals(lot, '2031-03-20')).toEqual([]);
  });
  it('names the recall, the hold and a usable-until day before the planned day', () => {
    expect(lotRefusals(lot, '2031-03-21')).toEqual(['expired on 2031-03-20, before the planned day']);
    expect(lotRefusals({ ...lot, hold: { since: '2031-03-10T08:00:00Z', cupTestId: null } }, TODAY)).toEqual(['on hold since 2031-03-10: its latest cup test failed']);
    expect(lotRefusals({ ...lot, expired: true }, TODAY)).toEqual(['expired on 2031-03-20']);
    expect(lotRefusals({ ...lot, recall: { at: '2031-03-12T09:00:00Z', reason: 'voids in parts', by: 'E. Engineer' } }, TODAY)).toEqual(['recalled on 2031-03-12 (voids in parts)']);
  });
  it('says when the shelf life after opening ends the lot before its expiry', () => {
    const opened = { ...lot, openedOn: '2031-02-01', usableUntil: '2031-03-03' };
    expect(lotRefusals(opened, TODAY)).toEqual(['usable until 2031-03-03 after opening on 2031-02-01, before the planned day']);
  });
});

describe('the lot override', () => {
  it('is sent with its reason only when one is typed', () => {
    const base = { ...initialPlan('metric', TODAY), systemId: SYSTEM, moldId: MOLD };
    expect(buildPlan(base).body).not.toHaveProperty('lotOverride');
    expect(buildPlan({ ...base, lotOverrideReason: '  ' }).body).not.toHaveProperty('lotOverride');
    expect(buildPlan({ ...base, lotOverrideReason: ' Supplier extended the date in writing ' }).body?.lotOverride).toEqual({ reason: 'Supplier extended the date in writing' });
    expect(fieldOfPointer('/lotOverride/reason')).toBe('lotOverrideReason');
  });
});
