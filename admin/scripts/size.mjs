#!/usr/bin/env node
// Prints the gzip size of the JavaScript the console's first page loads (the entry script and
// every chunk it imports statically, as index.html and the Vite manifest name them) and fails
// above the budget. Run after `npm run build -w admin`.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import zlib from 'node:zlib';

const BUDGET_KB = Number(process.env.FIRST_PAGE_BUDGET_KB ?? 250);
const dist = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist');
const manifestPath = path.join(dist, '.vite', 'manifest.json');

function fail(msg) {
  console.error(`size: ${msg}`);
  process.exit(1);
}

if (!fs.existsSync(path.join(dist, 'index.html')) || !fs.existsSync(manifestPath)) fail('admin/dist is missing or has no manifest; run `npm run build -w admin` first');

const manifest = JSON.parse(fs.readFileSync(manifestPath, 'utf8'));
const html = fs.readFileSync(path.join(dist, 'index.html'), 'utf8');
const gz = (file) => zlib.gzipSync(fs.readFileSync(path.join(dist, file)), { level: 9 }).length;
const kb = (bytes) => (bytes / 1000).toFixed(1);

/** The chunk files `keys` load before running: themselves and their static imports, recursively. */
function closure(keys) {
  const files = new Set();
  const seen = new Set();
  const walk = (key) => {
    if (seen.has(key)) return;
    seen.add(key);
    const chunk = manifest[key];
    if (!chunk) fail(`manifest has no entry ${key}`);
    files.add(chunk.file);
    for (const k of chunk.imports ?? []) walk(k);
  };
  keys.forEach(walk);
  return files;
}

// what the browser fetches for the first page: index.html's module script and modulepreloads...
const fromHtml = new Set(
  [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*rel="modulepreload"[^>]*\shref)="\.?\/?([^"]+\.js)"/g)].map((m) => m[1]),
);
// ...which must agree with the manifest's static import graph of the entry
const entryKey = Object.keys(manifest).find((k) => manifest[k].isEntry);
if (!entryKey) fail('manifest has no entry chunk');
const firstPage = new Set([...fromHtml, ...closure([entryKey])]);
const missing = [...closure([entryKey])].filter((f) => !fromHtml.has(f));
if (missing.length) console.warn(`size: note: not preloaded by index.html: ${missing.join(', ')}`);

const rows = [...firstPage].map((f) => ({ file: f, gzip: gz(f) })).sort((a, b) => b.gzip - a.gzip);
const total = rows.reduce((s, r) => s + r.gzip, 0);

console.log('First page (sign-in) JavaScript, gzip -9:');
for (const r of rows) console.log(`  ${kb(r.gzip).padStart(8)} kB  ${r.file}`);

// for information: the signed-in overview adds the frame and the dashboard chunks
const lazyKeys = Object.keys(manifest).filter((k) => /src\/layout\/Layout\.tsx$|src\/dashboard\/Dashboard\.tsx$/.test(k));
if (lazyKeys.length) {
  const signedIn = new Set([...firstPage, ...closure(lazyKeys)]);
  const extra = [...signedIn].filter((f) => !firstPage.has(f));
  const extraBytes = extra.reduce((s, f) => s + gz(f), 0);
  console.log(`Signed-in overview adds ${kb(extraBytes)} kB (${extra.length} chunks): ${kb(total + extraBytes)} kB in all.`);
}
const css = Object.values(manifest).flatMap((c) => (c.isEntry ? (c.css ?? []) : []));
if (css.length) console.log(`Entry CSS: ${kb(css.reduce((s, f) => s + gz(f), 0))} kB gzip.`);

console.log(`First page JS: ${kb(total)} kB gzip (budget ${BUDGET_KB} kB).`);
if (total > BUDGET_KB * 1000) fail(`the first page loads ${kb(total)} kB of gzipped JS, over the ${BUDGET_KB} kB budget`);
