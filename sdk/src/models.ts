// The API's shapes, by name: every one is a schema of the OpenAPI document (generated into
// schema.d.ts by `npm run sdk:generate`), so these follow the API without being copied by hand.
import type { components } from './schema.js';

type Schemas = components['schemas'];

export type ReadingInput = Omit<Schemas['reading.create'], 'clientReadingId'> & {
  /** Your own id for the reading, unique per device: a replay of it is harmless. Generated when omitted. */
  clientReadingId?: string;
};

export type Reading = Schemas['reading.view'];
export type ReadingStatus = Reading['status'];
export type VerdictReason = Schemas['reading.reason'];
/** What POST /v1/readings answers: 202 with the queued reading, or 200 with the first reading (replayed: true) for a repeat. */
export type ReadingAck = Schemas['reading.queued'] | Schemas['reading.replayed'];
export type BulkReadingsResult = Schemas['reading.bulk-result'];
/** A figure as the API gives it: in the caller's unit system, with its SI value beside it. */
export type Figure = Schemas['displayed-quantity'];
export type Batch = Schemas['batch.view'];
export type BatchTransition = Schemas['batch-transition.view'];
/** GET /v1/batches/{id}/targets: the stored targets, in the caller's units with SI alongside. */
export type BatchTargets = Schemas['batch-targets.view'];
/** POST /v1/targets/preview. */
export type Targets = Schemas['targets.view'];
export type BatchWarning = Schemas['batch-warning'];
export type Caution = Schemas['caution'];
export type WorkOrder = Schemas['work-order.view'];
export type Device = Schemas['device.view'];
export type MaterialSystem = Schemas['material-system.view'];
export type MaterialSystemRevision = Schemas['material-system-revision.view'];
export type SafetyDocument = Schemas['document.view'];
export type Lot = Schemas['lot.view'];
export type Mold = Schemas['mold.view'];
export type CupTest = Schemas['qc-cup-test.view'];
export type FreeRiseFit = Schemas['free-rise-fit.view'];
export type ApiKey = Schemas['api-key.view'];
/** An API key as issued or rotated: the only time its secret is shown. */
export type ApiKeyCreated = Schemas['api-key.created'];
export type User = Schemas['user.view'];
export type Me = Schemas['me'];
export type Session = Schemas['auth.session'];
export type Invitation = Schemas['invitation.view'];
export type WebhookEndpoint = Schemas['webhook-endpoint.view'];
/** A webhook endpoint as created or rotated: the only time its signing secret is shown. */
export type WebhookEndpointCreated = Schemas['webhook-endpoint.created'];
export type WebhookDelivery = Schemas['webhook-delivery.view'];
export type WebhookDeliveryDetail = Schemas['webhook-delivery.detail'];
export type WebhookTestResult = Schemas['webhook-test.result'];
export type Import = Schemas['import.view'];
export type AuditEntry = Schemas['audit-entry.view'];
export type Problem = Schemas['problem'];

export type EventType = components['schemas']['event']['type'];

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
