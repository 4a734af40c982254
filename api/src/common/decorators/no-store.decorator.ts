import { applyDecorators, Header, SetMetadata } from '@nestjs/common';

export const NO_STORE = 'pourgate:no-store';

/**
 * For responses that carry a token or a secret (sign-in, refresh, a new API key or webhook secret):
 * no browser, proxy or CDN may keep a copy of them, and the Idempotency-Key store keeps the response
 * only sealed (see IdempotencyInterceptor).
 */
export const NoStore = () => applyDecorators(Header('Cache-Control', 'no-store'), SetMetadata(NO_STORE, true));
