import { Webhook, WebhookVerificationError } from 'standardwebhooks';
import type { PourgateEvent } from './models.js';

export { WebhookVerificationError };

/** Request headers as Node's http module, fetch's Headers, or a plain object give them. */
export type IncomingHeaders = Headers | Record<string, string | string[] | undefined>;

function lowerCased(headers: IncomingHeaders): Record<string, string> {
  const out: Record<string, string> = {};
  const entries = headers instanceof Headers ? [...headers.entries()] : Object.entries(headers);
  for (const [k, v] of entries) if (v !== undefined) out[k.toLowerCase()] = Array.isArray(v) ? v.join(', ') : v;
  return out;
}

/**
 * Verifies a Pourgate webhook (Standard Webhooks: webhook-id, webhook-timestamp, webhook-signature)
 * with the reference library and returns the event. Pass the body exactly as received: re-serialised
 * JSON has other bytes and fails. Throws WebhookVerificationError on a bad signature, a timestamp
 * outside five minutes, missing headers, or a body whose id is not the webhook-id.
 */
export function verifyWebhook(headers: IncomingHeaders, rawBody: string | Buffer | Uint8Array, secret: string): PourgateEvent {
  const h = lowerCased(headers);
  const payload = typeof rawBody === 'string' ? rawBody : Buffer.from(rawBody);
  const event = new Webhook(secret).verify(payload, h) as PourgateEvent;
  if (!event || typeof event !== 'object' || typeof event.type !== 'string' || event.id !== h['webhook-id']) {
    throw new WebhookVerificationError('The payload is not a Pourgate event for this webhook-id');
  }
  return event;
}
