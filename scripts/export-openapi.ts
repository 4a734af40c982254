// `npm run sdk:generate`: writes the API's OpenAPI document to sdk/openapi.json and the SDK's types
// to sdk/src/schema.d.ts, without a running server or database. Nest's preview mode scans modules
// and controllers but instantiates no provider, so nothing connects to PostgreSQL or Redis.
// Runs under @swc-node/register in plain Node (not tsx, not Jest): Swagger reads the decorator
// metadata swc emits, and @nestjs/terminus documents the health routes only where it can load
// @nestjs/swagger, which Jest's module system cannot. `--stdout` prints both files as JSON instead
// of writing them; `--check` exits 1 when the committed files are stale.
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { FastifyAdapter, type NestFastifyApplication } from '@nestjs/platform-fastify';
import fs from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { schemaTypes } from '../sdk/scripts/schema-types.js';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const OPENAPI_FILE = path.join(ROOT, 'sdk', 'openapi.json');
export const TYPES_FILE = path.join(ROOT, 'sdk', 'src', 'schema.d.ts');

/** The document exactly as `GET /v1/openapi.json` serves it. */
export async function buildDocument(): Promise<Record<string, unknown>> {
  // the configuration schema requires these; preview mode never connects to them
  const saved = { DATABASE_URL: process.env.DATABASE_URL, REDIS_URL: process.env.REDIS_URL };
  process.env.DATABASE_URL ||= 'postgres://preview@127.0.0.1:1/preview';
  process.env.REDIS_URL ||= 'redis://127.0.0.1:1';
  try {
    // the API imports the workspace packages by name, from their dist/ at run time
    const { ensureWorkspacePackages } = await import('./lib/services.mjs');
    ensureWorkspacePackages();
    const { AppModule } = await import('../api/src/app.module.js');
    const { buildOpenApiDocument } = await import('../api/src/openapi/openapi.js');
    const app = await NestFactory.create<NestFastifyApplication>(AppModule.forRoot(), new FastifyAdapter(), { preview: true, abortOnError: false, logger: false });
    try {
      app.setGlobalPrefix('v1'); // as createApp does
      return JSON.parse(JSON.stringify(buildOpenApiDocument(app)));
    } finally {
      await app.close();
    }
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
}

/** Both generated files' contents, for writing or for comparing with what is committed. */
export async function generate(): Promise<{ openapi: string; types: string }> {
  const doc = await buildDocument();
  return { openapi: JSON.stringify(doc, null, 2) + '\n', types: await schemaTypes(doc) };
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url) && process.argv.includes('--help')) {
  console.log('usage: npm run sdk:generate [-- --check | --stdout]   (writes sdk/openapi.json and sdk/src/schema.d.ts; --check: exit 1 when stale)');
} else if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const out = await generate();
  if (process.argv.includes('--stdout')) {
    // for the drift test: both files as one JSON object, nothing written
    process.stdout.write(JSON.stringify(out));
  } else if (process.argv.includes('--check')) {
    const same = (await fs.readFile(OPENAPI_FILE, 'utf8').catch(() => '')) === out.openapi && (await fs.readFile(TYPES_FILE, 'utf8').catch(() => '')) === out.types;
    if (!same) {
      console.error('sdk/openapi.json or sdk/src/schema.d.ts is out of date: run `npm run sdk:generate`');
      process.exitCode = 1;
    }
  } else {
    await fs.writeFile(OPENAPI_FILE, out.openapi);
    await fs.writeFile(TYPES_FILE, out.types);
    const paths = Object.keys((JSON.parse(out.openapi) as { paths: object }).paths).length;
    console.log(`wrote ${path.relative(ROOT, OPENAPI_FILE)} (${paths} paths) and ${path.relative(ROOT, TYPES_FILE)}`);
  }
}
