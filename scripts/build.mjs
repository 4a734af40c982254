#!/usr/bin/env node
// `npm run build`: the workspace packages, the API (api/dist) and the console (admin/dist), then the
// console's files compressed ahead of time (.br and .gz beside each), as the API serves them.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

if (process.argv.includes('--help')) {
  console.log(`usage: npm run build
  Builds packages/batching, packages/permissions, the API (api/dist) and the console (admin/dist),
  then writes brotli and gzip copies of the console's files (served with Accept-Encoding).`);
  process.exit(0);
}
const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const run = (args) => {
  const r = spawnSync('npm', args, { cwd: ROOT, stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
};
run(['run', 'build', '-w', 'packages/batching', '-w', 'packages/permissions']);
run(['run', 'build', '-w', 'api']);
run(['run', 'build', '-w', 'admin']);
const r = spawnSync(process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts/precompress.ts'), path.join(ROOT, 'admin/dist')], { cwd: ROOT, stdio: 'inherit' });
process.exit(r.status ?? 1);
