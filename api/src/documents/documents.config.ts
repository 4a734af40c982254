import { Ajv } from 'ajv';
import path from 'node:path';
import { PROJECT_ROOT } from '../config/paths.js';
import type { S3Settings } from './s3-document-store.js';

/** Settings of the documents feature, validated when the module starts (a bad value stops the boot). */
export interface DocumentsConfig {
  /** Folder of the filesystem store. */
  dir: string;
  /** Largest PDF accepted, bytes. */
  maxBytes: number;
  /** S3-compatible object storage; when S3_ENDPOINT is set it is used instead of the folder. */
  s3: S3Settings | null;
}

const schema = {
  type: 'object',
  properties: {
    DOCUMENTS_DIR: { type: 'string', minLength: 1 },
    DOCUMENT_MAX_BYTES: { type: 'integer', minimum: 1024, maximum: 104857600, default: 20971520 },
    S3_ENDPOINT: { type: 'string', pattern: '^https?://' },
    S3_BUCKET: { type: 'string', minLength: 3, default: 'pourgate-documents' },
    S3_REGION: { type: 'string', default: 'us-east-1' },
    // unset: the AWS SDK's default credential chain (environment, shared files, instance role ...)
    S3_ACCESS_KEY_ID: { type: 'string', minLength: 1 },
    S3_SECRET_ACCESS_KEY: { type: 'string', minLength: 1 },
    S3_FORCE_PATH_STYLE: { type: 'boolean', default: true },
  },
} as const;
const check = new Ajv({ coerceTypes: true, useDefaults: true, allErrors: true }).compile(schema);

export const DOCUMENTS_CONFIG = Symbol('DOCUMENTS_CONFIG');

/** The keys `npm start` gives the local object-store stand-in; refused in production. */
export const DEVELOPMENT_KEYS = { S3_ACCESS_KEY_ID: 'pourgate-local', S3_SECRET_ACCESS_KEY: 'pourgate-local-secret' } as const;

export function documentsConfig(env: Record<string, string | undefined> = process.env): DocumentsConfig {
  const picked: Record<string, unknown> = {};
  for (const k of Object.keys(schema.properties)) if (env[k] !== undefined && env[k] !== '') picked[k] = env[k];
  if (!check(picked)) {
    const lines = (check.errors ?? []).map((e) => `  ${e.instancePath.replace(/^\//, '')}: ${e.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  if ((picked.S3_ACCESS_KEY_ID === undefined) !== (picked.S3_SECRET_ACCESS_KEY === undefined)) {
    throw new Error(`Invalid configuration:\n  ${picked.S3_ACCESS_KEY_ID === undefined ? 'S3_ACCESS_KEY_ID' : 'S3_SECRET_ACCESS_KEY'}: set both S3 keys, or neither (the SDK's default credential chain)`);
  }
  if (env.NODE_ENV === 'production') {
    for (const [name, dev] of Object.entries(DEVELOPMENT_KEYS)) {
      if (picked[name] === dev) throw new Error(`Invalid configuration:\n  ${name}: is the local stand-in's development key; production takes its own keys or the SDK's default credential chain`);
    }
  }
  const dir = (picked.DOCUMENTS_DIR as string | undefined) ?? path.join(PROJECT_ROOT, '.data', 'documents');
  const s3 = picked.S3_ENDPOINT
    ? {
        endpoint: picked.S3_ENDPOINT as string,
        bucket: picked.S3_BUCKET as string,
        region: picked.S3_REGION as string,
        credentials: picked.S3_ACCESS_KEY_ID ? { accessKeyId: picked.S3_ACCESS_KEY_ID as string, secretAccessKey: picked.S3_SECRET_ACCESS_KEY as string } : null,
        forcePathStyle: picked.S3_FORCE_PATH_STYLE as boolean,
      }
    : null;
  return { dir: path.resolve(dir), maxBytes: picked.DOCUMENT_MAX_BYTES as number, s3 };
}
