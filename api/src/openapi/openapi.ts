import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { EVENT_TYPES } from '../events/event-types.js';
import { IDEMPOTENCY_TTL_HOURS } from '../common/idempotency/idempotency.interceptor.js';
import { schemaRegistry } from '../common/schemas/schema-registry.js';
import { IDEMPOTENT_REPLAY_HEADER, RETRY_AFTER_HEADER } from '../common/schemas/responds.decorator.js';

export const API_KEY_HEADER = 'X-Api-Key';

/**
 * The OpenAPI 3.1 document: routes from the controllers' decorators, shapes from `schemas/`
 * (the same JSON Schema files the validation pipe uses), and problem+json on every error.
 */
export function buildOpenApiDocument(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setOpenAPIVersion('3.1.0')
    .setTitle('Pourgate API')
    .setDescription(
      'Batch targets, reading judgement and signed events for two-part polyurethane foam casting. ' +
        'All quantities are stored in SI; every field names its unit. Errors are RFC 9457 problem details ' +
        '(application/problem+json). Lists speak the ra-data-simple-rest protocol (sort, range, filter; Content-Range).',
    )
    .setVersion('1')
    .addBearerAuth({ type: 'http', scheme: 'bearer', bearerFormat: 'JWT', description: 'A person: access token from POST /v1/auth/sign-in' }, 'person')
    .addApiKey({ type: 'apiKey', in: 'header', name: API_KEY_HEADER, description: 'A machine: an API key from /v1/api-keys' }, 'apiKey')
    .build();
  const doc = SwaggerModule.createDocument(app, config, { operationIdFactory: (controller, method) => `${controller.replace(/Controller$/, '')}_${method}` });
  doc.components ??= {};
  doc.components.schemas = { ...(doc.components.schemas ?? {}), ...schemaRegistry().openApiComponents() } as NonNullable<OpenAPIObject['components']>['schemas'];
  addProblemResponses(doc);
  addIdempotencyKeyHeader(doc);
  addWebhooks(doc);
  return doc;
}

/**
 * OpenAPI 3.1's `webhooks`: one entry per event type, the envelope with `type` fixed and `data`
 * from schemas/event.<type>.schema.json, signed as the Standard Webhooks specification says.
 */
function addWebhooks(doc: OpenAPIObject): void {
  const hooks: Record<string, unknown> = {};
  for (const [type, summary] of Object.entries(EVENT_TYPES)) {
    hooks[type] = {
      post: {
        summary,
        description: 'Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.',
        requestBody: {
          required: true,
          content: { 'application/json': { schema: { allOf: [{ $ref: '#/components/schemas/event' }, { type: 'object', properties: { type: { const: type }, data: { $ref: `#/components/schemas/event.${type}` } } }] } } },
        },
        responses: { '2XX': { description: 'Received' }, '410': { description: 'Gone: Pourgate disables the endpoint' } },
      },
    };
  }
  (doc as { webhooks?: unknown }).webhooks = hooks;
}

/** Every authenticated POST takes an Idempotency-Key, except those idempotent by their own means. */
function addIdempotencyKeyHeader(doc: OpenAPIObject): void {
  for (const item of Object.values(doc.paths)) {
    const op = item.post as (typeof item.post & Record<string, unknown>) | undefined;
    if (!op || op['x-pourgate-public'] || op['x-pourgate-idempotency']) continue;
    op.parameters = [
      ...(op.parameters ?? []),
      {
        name: 'Idempotency-Key',
        in: 'header',
        required: false,
        schema: { type: 'string', minLength: 1, maxLength: 255 },
        description: `A unique key per request (a UUID). Within ${IDEMPOTENCY_TTL_HOURS} h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key.`,
      },
    ];
    // a replayed response is the stored one, with this header added
    for (const [code, resp] of Object.entries(op.responses ?? {})) {
      if (!/^2\d\d$/.test(code) || !resp || typeof resp !== 'object') continue;
      const r = resp as { headers?: Record<string, unknown> };
      r.headers = { ...(r.headers ?? {}), ...IDEMPOTENT_REPLAY_HEADER };
    }
  }
}

/** Every operation can fail with problem+json; say so once, here, instead of on every route. */
function addProblemResponses(doc: OpenAPIObject): void {
  const problem = { 'application/problem+json': { schema: { $ref: '#/components/schemas/problem' } } };
  for (const item of Object.values(doc.paths)) {
    for (const op of Object.values(item) as Array<{ responses?: Record<string, unknown> } | undefined>) {
      if (!op || typeof op !== 'object' || !('responses' in op)) continue;
      op.responses ??= {};
      op.responses['default'] ??= { description: 'An error, as RFC 9457 problem details', headers: RETRY_AFTER_HEADER, content: problem };
      for (const [code, resp] of Object.entries(op.responses)) {
        if (/^[45]\d\d$/.test(code) && resp && typeof resp === 'object' && !('content' in resp)) {
          (resp as Record<string, unknown>).content = problem;
        }
        // any error may carry Retry-After (429, and 503 while PostgreSQL or Redis is away)
        if (/^[45]\d\d$/.test(code) && resp && typeof resp === 'object') {
          const r = resp as { headers?: Record<string, unknown> };
          r.headers = { ...RETRY_AFTER_HEADER, ...(r.headers ?? {}) };
        }
      }
    }
  }
}
