import { API_BASE, http } from '../providers';
import type { Batch, BatchPlanBody, TargetsPreviewBody, TargetsView } from '../views/sdk';

/**
 * The planning calls: the same `POST /v1/batches` the ERP uses, with an Idempotency-Key so a
 * double press or a retry after a lost answer plans the batch once, and the targets preview.
 */
export const planningApi = {
  async plan(body: BatchPlanBody, idempotencyKey: string): Promise<Batch> {
    const { json } = await http.fetchJson(`${API_BASE}/batches`, { method: 'POST', body: JSON.stringify(body), headers: { 'Idempotency-Key': idempotencyKey } });
    return json as Batch;
  },
  async preview(body: TargetsPreviewBody, units: 'metric' | 'imperial'): Promise<TargetsView> {
    const { json } = await http.fetchJson(`${API_BASE}/targets/preview?units=${units}`, { method: 'POST', body: JSON.stringify(body) });
    return json as TargetsView;
  },
};

/** A fresh key for one planning attempt (a retry of the same plan reuses it). */
export function newAttemptKey(): string {
  return globalThis.crypto?.randomUUID?.() ?? `plan-${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
}
