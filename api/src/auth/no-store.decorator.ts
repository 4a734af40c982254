import { Header } from '@nestjs/common';

/**
 * For responses that carry a token or a secret (sign-in, refresh, a new API key or webhook secret):
 * no browser, proxy or CDN may keep a copy of them.
 */
export const NoStore = () => Header('Cache-Control', 'no-store');
