import fastifyStatic from '@fastify/static';
import type { NestFastifyApplication } from '@nestjs/platform-fastify';
import fs from 'node:fs';
import path from 'node:path';
import type { Logger } from 'pino';
import { precompressDir } from './precompress.js';

/** Names under assets/ carry a content hash (Vite): a changed file is a new URL, so cache for a year. */
export const HASHED_ASSET_CACHE = 'public, max-age=31536000, immutable';
/** index.html names the current hashed files: always revalidated. */
export const ENTRY_CACHE = 'no-cache';

/**
 * Serves the built console (or the placeholder page when it is not built): each file brotli- or
 * gzip-compressed ahead of time, chosen by Accept-Encoding (Vary: Accept-Encoding), hashed assets
 * cached for a year, everything else revalidated on each visit.
 */
export async function serveConsole(app: NestFastifyApplication, consoleDir: string, placeholderDir: string, log: Logger): Promise<string> {
  const built = fs.existsSync(path.join(consoleDir, 'index.html'));
  const root = built ? consoleDir : placeholderDir;
  if (built) {
    try {
      const n = precompressDir(root);
      if (n) log.info({ files: n, root }, 'console assets compressed');
    } catch (e) {
      // a read-only image that was not compressed at build: served as it is
      log.warn({ err: (e as Error).message }, 'console assets could not be compressed; serving them uncompressed');
    }
  }
  const assetsDir = path.join(root, 'assets') + path.sep;
  await app.register(fastifyStatic as never, {
    root,
    prefix: '/',
    wildcard: false,
    decorateReply: false,
    index: ['index.html'],
    preCompressed: true,
    cacheControl: false,
    setHeaders: (reply: { header(k: string, v: string): void }, file: string) => {
      reply.header('cache-control', file.startsWith(assetsDir) ? HASHED_ASSET_CACHE : ENTRY_CACHE);
    },
  });
  return root;
}
