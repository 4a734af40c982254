import { API_BASE, http } from '../providers';
import type {
  BatchDisposition,
  BatchDispositionRecord,
  BatchGenealogy,
  BatchPlanProposal,
  Consumption,
  DefectCause,
  LotGenealogy,
  Pareto,
  ParetoQuery,
  Part,
  PartRecord,
  RecallReport,
  Specimen,
  SpecimenRecord,
} from '../views/sdk';
import { newAttemptKey } from './planningApi';

const id = (v: string) => encodeURIComponent(v);
const q = (v: unknown) => encodeURIComponent(JSON.stringify(v));
const getJson = async <T>(path: string): Promise<T> => (await http.fetchJson(`${API_BASE}${path}`)).json as T;
/** Every POST carries an Idempotency-Key: a retried press records nothing twice. */
const postJson = async <T>(path: string, body: unknown, key = newAttemptKey()): Promise<T> =>
  (await http.fetchJson(`${API_BASE}${path}`, { method: 'POST', body: JSON.stringify(body), headers: { 'Idempotency-Key': key } })).json as T;

/**
 * From plan to part: the work order's batch plan and consumption, a batch's parts and disposition,
 * a lot's genealogy and recall, the defect Pareto. Every count, yield and share is the API's.
 */
export const productionApi = {
  batchPlan: (workOrderId: string) => getJson<BatchPlanProposal>(`/work-orders/${id(workOrderId)}/batch-plan`),
  consumption: (workOrderId: string) => getJson<Consumption>(`/work-orders/${id(workOrderId)}/consumption`),
  consumptionCsv: (workOrderId: string) => csv(`/work-orders/${id(workOrderId)}/consumption.csv`),
  complete: (workOrderId: string, note: string | null) => postJson<Consumption>(`/work-orders/${id(workOrderId)}/complete`, note ? { note } : {}),

  recordPart: (batchId: string, body: PartRecord, key?: string) => postJson<Part>(`/batches/${id(batchId)}/parts`, body, key),
  recordSpecimen: (partId: string, body: SpecimenRecord, key?: string) => postJson<Specimen>(`/parts/${id(partId)}/specimens`, body, key),
  dispose: (batchId: string, body: BatchDispositionRecord, key?: string) => postJson<BatchDisposition>(`/batches/${id(batchId)}/disposition`, body, key),
  batchGenealogy: (batchId: string) => getJson<BatchGenealogy>(`/batches/${id(batchId)}/genealogy`),
  defectCauses: () => getJson<DefectCause[]>(`/defect-causes?range=${q([0, 199])}`),

  lotGenealogy: (lotId: string) => getJson<LotGenealogy>(`/lots/${id(lotId)}/genealogy`),
  recallReport: (lotId: string) => getJson<RecallReport>(`/lots/${id(lotId)}/recall`),
  recallCsv: (lotId: string) => csv(`/lots/${id(lotId)}/recall.csv`),
  recall: (lotId: string, reason: string) => postJson<RecallReport>(`/lots/${id(lotId)}/recall`, { reason }),

  pareto: (query: ParetoQuery) => {
    const qs = new URLSearchParams();
    for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== null && v !== '') qs.set(k, String(v));
    return getJson<Pareto>(`/defects/pareto${qs.size ? `?${qs}` : ''}`);
  },
};

async function csv(path: string): Promise<Blob> {
  const { blob } = await http.fetchJson(`${API_BASE}${path}`, { asBlob: true, headers: { Accept: 'text/csv' } });
  return blob ?? new Blob([]);
}

/** Saves a file the API produced (a CSV) under `name`. */
export function saveBlob(blob: Blob, name: string) {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
