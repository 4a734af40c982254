import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

function findRoot(start: string): string {
  let dir = start;
  for (;;) {
    if (fs.existsSync(path.join(dir, 'schemas')) && fs.existsSync(path.join(dir, 'api'))) return dir;
    const up = path.dirname(dir);
    if (up === dir) throw new Error(`cannot find the project root above ${start}`);
    dir = up;
  }
}

/** The repository root, found from this file whether it runs from src/ (tests) or dist/. */
export const PROJECT_ROOT = findRoot(path.dirname(fileURLToPath(import.meta.url)));
export const SCHEMAS_DIR = path.join(PROJECT_ROOT, 'schemas');
