import { Ajv } from 'ajv';
import path from 'node:path';
import { PROJECT_ROOT } from '../config/paths.js';

/** Settings of the documents feature, validated when the module starts (a bad value stops the boot). */
export interface DocumentsConfig {
  /** Folder of the filesystem store. */
  dir: string;
  /** Largest PDF accepted, bytes. */
  maxBytes: number;
}

const schema = {
  type: 'object',
  properties: {
    DOCUMENTS_DIR: { type: 'string', minLength: 1 },
    DOCUMENT_MAX_BYTES: { type: 'integer', minimum: 1024, maximum: 104857600, default: 20971520 },
  },
} as const;
const check = new Ajv({ coerceTypes: true, useDefaults: true, allErrors: true }).compile(schema);

export const DOCUMENTS_CONFIG = Symbol('DOCUMENTS_CONFIG');

export function documentsConfig(env: Record<string, string | undefined> = process.env): DocumentsConfig {
  const picked: Record<string, unknown> = {};
  for (const k of Object.keys(schema.properties)) if (env[k] !== undefined && env[k] !== '') picked[k] = env[k];
  if (!check(picked)) {
    const lines = (check.errors ?? []).map((e) => `  ${e.instancePath.replace(/^\//, '')}: ${e.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const dir = (picked.DOCUMENTS_DIR as string | undefined) ?? path.join(PROJECT_ROOT, '.data', 'documents');
  return { dir: path.resolve(dir), maxBytes: picked.DOCUMENT_MAX_BYTES as number };
}
