export const WEBHOOK_QUEUE = 'webhook-deliveries';
export const WEBHOOK_BACKOFF = 'standard-webhooks';

/** One Bull job per event × endpoint: the id is made of both, so it is queued once. */
export const deliveryJobId = (endpointId: string, eventId: string) => `${endpointId}:${eventId}`;

/** Thrown by the processor to make Bull schedule the next attempt; carries Retry-After. */
export class DeliveryFailed extends Error {
  constructor(message: string, readonly delayMs: number) {
    super(message);
  }
}
