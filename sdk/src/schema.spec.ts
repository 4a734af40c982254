import { describe, expect, it } from '@jest/globals';
import { execFile } from 'node:child_process';
import fs from 'node:fs/promises';
import path from 'node:path';
import { promisify } from 'node:util';
import { OPENAPI_FILE, ROOT, TYPES_FILE } from '../../scripts/export-openapi.js';

// The SDK's types must be those of the API as it is now. The document is regenerated in a plain
// Node process (as `npm run sdk:generate` does: the same metadata and optional packages as the
// server), printed rather than written, and compared with the committed files.
describe('generated SDK files', () => {
  it('sdk/openapi.json and sdk/src/schema.d.ts match the API (else run: npm run sdk:generate)', async () => {
    const { stdout } = await promisify(execFile)(process.execPath, ['--import', '@swc-node/register/esm-register', path.join(ROOT, 'scripts/export-openapi.ts'), '--stdout'], {
      cwd: ROOT,
      env: { ...process.env, NODE_OPTIONS: '', SWC_NODE_PROJECT: path.join(ROOT, 'api/tsconfig.json') },
      maxBuffer: 64 * 1024 * 1024,
    });
    const fresh = JSON.parse(stdout) as { openapi: string; types: string };
    const [openapi, types] = await Promise.all([fs.readFile(OPENAPI_FILE, 'utf8'), fs.readFile(TYPES_FILE, 'utf8')]);
    const hint = 'The committed SDK files differ from what the API generates now: run `npm run sdk:generate` and commit sdk/openapi.json and sdk/src/schema.d.ts.';
    if (openapi !== fresh.openapi || types !== fresh.types) throw new Error(hint);
    expect(JSON.parse(openapi).paths['/v1/readings'].post.operationId).toBe('Readings_create');
    expect(types).toContain('"/v1/readings": {');
  }, 180_000);
});
