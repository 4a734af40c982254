import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

const COMPRESSIBLE = /\.(js|mjs|css|html|svg|json|txt|map|webmanifest)$/;

/**
 * Writes `<file>.br` and `<file>.gz` beside each compressible file of a built console, once (a file
 * already compressed and not older than its source is left alone). Compressing at build or boot
 * costs once what compressing per request would cost on every first visit. Each file is written
 * under a temporary name and renamed, so processes starting side by side never serve half a file.
 * Returns how many files were written.
 */
export function precompressDir(dir: string, opts: { minBytes?: number } = {}): number {
  const minBytes = opts.minBytes ?? 1024;
  let written = 0;
  const walk = (d: string): void => {
    for (const entry of fs.readdirSync(d, { withFileTypes: true })) {
      const file = path.join(d, entry.name);
      if (entry.isDirectory()) {
        walk(file);
        continue;
      }
      if (!COMPRESSIBLE.test(entry.name)) continue;
      const stat = fs.statSync(file);
      if (stat.size < minBytes) continue;
      let source: Buffer | undefined;
      for (const [ext, compress] of [
        ['.br', (b: Buffer) => zlib.brotliCompressSync(b, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: b.length } })],
        ['.gz', (b: Buffer) => zlib.gzipSync(b, { level: 9 })],
      ] as const) {
        const target = file + ext;
        if (fs.existsSync(target) && fs.statSync(target).mtimeMs >= stat.mtimeMs) continue;
        source ??= fs.readFileSync(file);
        const tmp = `${target}.${process.pid}.tmp`;
        fs.writeFileSync(tmp, compress(source));
        fs.renameSync(tmp, target);
        written++;
      }
    }
  };
  walk(dir);
  return written;
}
