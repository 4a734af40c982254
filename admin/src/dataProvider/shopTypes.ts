/** Shapes of the shop-data and integration answers the console reads beyond plain CRUD. */

export interface MaterialSystemRevision {
  id: string;
  materialSystemId: string;
  revision: number;
  changeNote: string | null;
  createdBy: string | null;
  createdAt: string;
  [parameter: string]: unknown;
}

export interface MaterialSystemDocument {
  id: string;
  materialSystemId: string;
  kind: 'SDS' | 'TDS';
  title: string | null;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  href: string;
  uploadedBy: string | null;
  createdAt: string;
}

export interface WebhookEndpoint {
  id: string;
  url: string;
  description: string;
  eventTypes: string[];
  enabled: boolean;
  disabledReason: string | null;
  secretRotating: boolean;
  previousSecretUntil: string | null;
  createdAt: string;
  updatedAt: string;
}

/** Only the create and rotate answers carry the signing secret, and only once. */
export interface WebhookEndpointWithSecret extends WebhookEndpoint {
  secret: string;
}

/** What `POST /v1/webhook-endpoints/{id}/test` reports of the receiver's answer. */
export interface EndpointTestResult {
  statusCode: number | null;
  durationMs: number;
  retryAfter?: string;
  error?: string;
  ssrf?: boolean;
  responseSnippet?: string;
  eventId: string;
  verdict: 'delivered' | 'failed';
}

export type DeliveryStatus = 'pending' | 'delivering' | 'succeeded' | 'retrying' | 'dead' | 'cancelled';

export interface WebhookDelivery {
  id: string;
  endpointId: string;
  eventId: string;
  eventType: string;
  status: DeliveryStatus;
  attempts: number;
  nextAttemptAt: string | null;
  lastStatusCode: number | null;
  lastError: string | null;
  lastDurationMs: number | null;
  deliveredAt: string | null;
  replays: number;
  createdAt: string;
  updatedAt: string;
}

export interface DeliveryAttempt {
  attempt: number;
  startedAt: string;
  durationMs: number | null;
  statusCode: number | null;
  error: string | null;
  responseSnippet: string | null;
}

export interface DeliveryDetail extends WebhookDelivery {
  attemptLog: DeliveryAttempt[];
}

export type NotifyRejections = 'each' | 'digest' | 'off';

/** `GET /v1/me`: the person, their organization, their allowed actions. */
export interface Profile {
  id: string;
  email: string;
  name: string;
  role: 'admin' | 'engineer' | 'integrator' | 'viewer';
  unitSystem: 'metric' | 'imperial';
  /** Present once the API offers the setting. */
  notifyRejections?: NotifyRejections;
  organization: { id: string; name: string; unitSystem?: 'metric' | 'imperial' };
  actions: string[];
}

export interface ProfileUpdate {
  name?: string;
  unitSystem?: 'metric' | 'imperial';
  notifyRejections?: NotifyRejections;
  currentPassword?: string;
  newPassword?: string;
}
