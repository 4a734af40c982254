import { applyDecorators } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';

/** A JSON Schema in `schemas/`, named without `.schema.json` (e.g. `reading.view`). */
export type SchemaName = string;

type HeaderDoc = Record<string, { description: string; schema?: Record<string, unknown> }>;

export interface RespondsOptions {
  description?: string;
  /** Response headers worth documenting (Location, Retry-After, Idempotent-Replayed ...). */
  headers?: HeaderDoc;
  /** The body is a JSON array of this schema. */
  array?: boolean;
  /** Another media type than application/json (a CSV, a PDF ...): the schema is `{ type: string }`. */
  mediaType?: string;
}

/** `$ref` to a schema of `schemas/`, as the OpenAPI document names its components. */
export function schemaRef(name: SchemaName): { $ref: string } {
  return { $ref: `#/components/schemas/${name}` };
}

/**
 * Documents one success response of an operation with its body schema from `schemas/`: the OpenAPI
 * document, the SDK's generated types, the console's types and the e2e response validation all read
 * it. Use it on every route (204 with `null` as the schema); the contract test fails for a route
 * without a documented 2xx/3xx body.
 */
export function Responds(status: number, schema: SchemaName | null, opts: RespondsOptions = {}) {
  const description = opts.description ?? (status === 201 ? 'Created' : status === 202 ? 'Accepted' : status === 204 ? 'No content' : 'OK');
  if (schema === null) return ApiResponse({ status, description, headers: opts.headers });
  const body = opts.array ? { type: 'array', items: schemaRef(schema) } : schemaRef(schema);
  const mediaType = opts.mediaType ?? 'application/json';
  return applyDecorators(
    ApiResponse({
      status,
      description,
      headers: opts.headers,
      content: { [mediaType]: { schema: mediaType === 'application/json' ? body : { type: 'string' } } },
    } as Parameters<typeof ApiResponse>[0]),
  );
}

/** The headers a replayed POST (Idempotency-Key) answers with. */
export const IDEMPOTENT_REPLAY_HEADER: HeaderDoc = {
  'Idempotent-Replayed': { description: 'true when this is the stored response of an earlier request with the same Idempotency-Key', schema: { type: 'string', enum: ['true'] } },
};

/** A created resource's address. */
export const LOCATION_HEADER: HeaderDoc = {
  Location: { description: 'The address of the created resource', schema: { type: 'string' } },
};

/** When to try again: on 503 (a backing service is down), 429 (throttled) and 409 (an Idempotency-Key still in flight). */
export const RETRY_AFTER_HEADER: HeaderDoc = {
  'Retry-After': { description: 'Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight)', schema: { type: 'string', pattern: '^[0-9]+$' } },
};
