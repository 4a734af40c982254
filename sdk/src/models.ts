// Shapes of responses the OpenAPI document does not describe yet (it declares request bodies and
// errors for these routes, not their 2xx bodies). Kept to the fields the SDK and its users rely on.
import type { components } from './schema.js';

export type ReadingInput = Omit<components['schemas']['reading.create'], 'clientReadingId'> & {
  /** Your own id for the reading, unique per device: a replay of it is harmless. Generated when omitted. */
  clientReadingId?: string;
};

export type ReadingStatus = 'pending' | 'accepted' | 'rejected' | 'unused';

export interface VerdictReason {
  code: string;
  message: string;
  measured: number | null;
  limit: number | null;
  unit: string | null;
}

/** What POST /v1/readings answers: 202 for a new reading, 200 with replayed: true for a repeat. */
export interface ReadingAck {
  id: string;
  status: ReadingStatus;
  statusUrl: string;
  replayed: boolean;
}

export interface Reading {
  id: string;
  batchId: string;
  deviceId: string;
  clientReadingId: string;
  quantity: 'mass' | 'temperature' | 'humidity';
  subject: string;
  valueSi: number;
  unitSi: string;
  given: { value: number; unit: string };
  stable: boolean;
  deviceTime: string | null;
  receivedAt: string;
  status: ReadingStatus;
  reasons: VerdictReason[] | null;
  judgedAt: string | null;
  review: { decision: 'waive' | 'uphold'; note: string | null; by: string | null; at: string } | null;
  [extra: string]: unknown;
}

/** A figure as the API gives it: in the caller's unit system, with its SI value beside it. */
export interface Figure {
  value: number;
  unit: string;
  si: { value: number; unit: string };
}

/** GET /v1/batches/{id}/targets, the fields a scale or an ERP needs. */
export interface BatchTargets {
  batchId: string;
  state: string;
  components: Record<'A' | 'B' | 'pigment', { mass: Figure | null; toleranceBand?: { low: Figure; high: Figure } | null; [k: string]: unknown }>;
  totalMass: Figure;
  scaleReadability: Figure | null;
  componentTemperatureWindow: { min: Figure; max: Figure } | null;
  ratioTolerancePercent: number;
  warnings: { code: string; message?: string }[];
  cautions: { code: string; text: string }[];
  [extra: string]: unknown;
}

export type EventType = components['schemas']['event']['type'];

type Schemas = components['schemas'];

/** The data of an event of type T, from the event.<type> schema of the OpenAPI document. */
export type EventData<T extends EventType> = `event.${T}` extends keyof Schemas ? Schemas[`event.${T}`] : Record<string, unknown>;

interface EventOf<T extends EventType> {
  id: string;
  type: T;
  occurredAt: string;
  subject: { type: string; id: string };
  data: EventData<T>;
}

/** An event: the body of every webhook and each item of the event feed; `type` narrows `data`. */
export type PourgateEvent<T extends EventType = EventType> = { [K in T]: EventOf<K> }[T];
