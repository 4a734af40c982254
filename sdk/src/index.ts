// @pourgate/sdk: a typed client for the Pourgate API (types generated from its OpenAPI document),
// with retries that never duplicate a reading, problem-details errors, paging, and webhook checks.
export { Pourgate, EventFeed, parseContentRange, type PourgateOptions, type PaginateOptions, type EventFeedOptions, type ListPath, type ListItem } from './client.js';
export { PourgateProblem, PourgateNetworkError, parseRetryAfter, type FieldError, type ProblemBody } from './errors.js';
export { createTransport, backoffDelay, API_KEY_HEADER, IDEMPOTENCY_HEADER, type RetryOptions, type TransportOptions } from './transport.js';
export { verifyWebhook, WebhookVerificationError, type IncomingHeaders } from './webhooks.js';
export type * from './models.js';
export type { paths, components, operations } from './schema.js';
