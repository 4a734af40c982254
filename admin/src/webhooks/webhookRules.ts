import type { Tone } from '../common/StatusChip';
import type { DeliveryStatus, EndpointTestResult, WebhookDelivery, WebhookEndpoint } from '../views/sdk';
import endpointSchema from '../../../schemas/webhook-endpoint.create.schema.json';

/** Every event type an endpoint can subscribe to, as the API's schema lists them. */
export const EVENT_TYPES: readonly string[] = endpointSchema.properties.eventTypes.items.enum;

const EVENT_INFO: Readonly<Record<string, string>> = {
  'webhook.test': 'Test events sent from this page',
  'reading.accepted': 'A reading was within every tolerance',
  'reading.rejected': 'A reading was outside a tolerance',
  'reading.waived': 'An engineer accepted a rejected reading, with a note',
  'reading.upheld': 'An engineer confirmed a rejection',
  'batch.created': 'A batch was planned and its targets computed',
  'batch.state_changed': 'A batch moved from one state to another',
  'batch.released': 'A batch was released',
  'batch.on_hold': 'A batch was put on hold for review',
  'batch.scrapped': 'A batch was scrapped',
  'work_order.created': 'A work order arrived',
  'work_order.changed': 'A work order was changed',
};

export const eventInfo = (type: string) => EVENT_INFO[type] ?? '';

export const eventChoices = EVENT_TYPES.map((t) => ({ id: t, name: t }));

export function endpointStateView(e: Pick<WebhookEndpoint, 'enabled' | 'disabledReason'>): { label: string; tone: Tone; note?: string } {
  if (e.enabled) return { label: 'Sending', tone: 'good' };
  if (e.disabledReason && /410|gone/i.test(e.disabledReason)) return { label: 'Stopped by receiver', tone: 'bad', note: e.disabledReason };
  return { label: 'Paused', tone: 'quiet', note: e.disabledReason ?? undefined };
}

const STATUS: Readonly<Record<DeliveryStatus, { label: string; tone: Tone }>> = {
  pending: { label: 'Queued', tone: 'info' },
  delivering: { label: 'Sending', tone: 'info' },
  succeeded: { label: 'Delivered', tone: 'good' },
  retrying: { label: 'Retrying', tone: 'caution' },
  dead: { label: 'Gave up', tone: 'bad' },
  cancelled: { label: 'Cancelled', tone: 'quiet' },
};

export const STATUS_CHOICES = (Object.keys(STATUS) as DeliveryStatus[]).map((id) => ({ id, name: STATUS[id].label }));

export function deliveryStatusView(status: string): { label: string; tone: Tone } {
  return STATUS[status as DeliveryStatus] ?? { label: status, tone: 'quiet' };
}

/** Only finished deliveries can be sent again; the API answers 409 for the others. */
export function canReplay(d: Pick<WebhookDelivery, 'status'>): boolean {
  return d.status === 'succeeded' || d.status === 'dead' || d.status === 'cancelled';
}

/** What the receiver's answer to a test means, in one sentence. */
export function testVerdict(r: EndpointTestResult): { tone: 'success' | 'error' | 'warning'; title: string; detail: string } {
  if (r.verdict === 'delivered') return { tone: 'success', title: `Receiver answered ${r.statusCode}`, detail: `Accepted in ${r.durationMs} ms. Any 2xx counts as delivered.` };
  if (r.ssrf) return { tone: 'error', title: 'Address refused', detail: r.error ?? 'The URL resolves to an address webhooks may not reach.' };
  if (r.statusCode === null) return { tone: 'error', title: 'No answer', detail: r.error ? `${r.error} (after ${r.durationMs} ms)` : `Nothing came back within ${r.durationMs} ms.` };
  if (r.statusCode === 410) return { tone: 'error', title: 'Receiver answered 410 Gone', detail: 'A live delivery answered like this stops the endpoint.' };
  if (r.statusCode >= 300 && r.statusCode < 400) return { tone: 'warning', title: `Receiver answered ${r.statusCode} (a redirect)`, detail: 'Redirects are not followed: point the endpoint at the final URL.' };
  return {
    tone: r.statusCode === 429 || r.statusCode >= 500 ? 'warning' : 'error',
    title: `Receiver answered ${r.statusCode}`,
    detail: r.statusCode === 401 || r.statusCode === 403 ? 'The receiver refused it: check that it verifies with this endpoint’s current secret.' : `Live deliveries retry on this answer. Took ${r.durationMs} ms.`,
  };
}

export const OVERLAP_CHOICES = [
  { id: 0, name: 'No overlap: the old secret stops signing now' },
  { id: 3_600, name: '1 hour' },
  { id: 86_400, name: '1 day' },
  { id: 604_800, name: '7 days (the longest overlap)' },
] as const;
