// Writes brotli (.br) and gzip (.gz) copies beside each compressible file of a built console, as the
// API serves them by Accept-Encoding. Run by `npm run build`, `npm start` and `npm test` after the
// console build; the API does the same at boot for whatever is missing.
//   node --import tsx scripts/precompress.ts [dir]   (default admin/dist)
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { precompressDir } from '../api/src/static/precompress.js';

if (process.argv.includes('--help')) {
  console.log('usage: node --import tsx scripts/precompress.ts [dir]   (default admin/dist)');
} else {
  const dir = path.resolve(process.argv[2] ?? path.join(path.dirname(fileURLToPath(import.meta.url)), '..', 'admin', 'dist'));
  const t0 = Date.now();
  const n = precompressDir(dir);
  console.log(`[pourgate] console files compressed: ${n} written in ${Date.now() - t0} ms (${path.relative(process.cwd(), dir) || dir})`);
}
