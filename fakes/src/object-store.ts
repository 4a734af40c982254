// A stand-in for S3-compatible object storage, enough for Pourgate's documents: path-style
// PUT / GET / HEAD / DELETE of objects (buckets appear on first write). Objects are kept in a
// folder, `<dir>/<bucket>/<key>`, so tests can look at what was stored. Requests are not
// authenticated: this is for loopback development and tests only.
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { createHash } from 'node:crypto';

export interface ObjectStore {
  url: string;
  dir: string;
  keys(bucket: string): string[];
  close(): Promise<void>;
}

export async function startObjectStore(opts: { dir: string; port?: number; host?: string }): Promise<ObjectStore> {
  const host = opts.host ?? '127.0.0.1';
  fs.mkdirSync(opts.dir, { recursive: true });
  const fileOf = (bucket: string, key: string) => {
    const p = path.resolve(opts.dir, bucket, key);
    if (!p.startsWith(path.resolve(opts.dir) + path.sep)) throw new Error('key escapes the store');
    return p;
  };
  const server = http.createServer((req, res) => {
    const u = new URL(req.url ?? '/', 'http://x');
    const [, bucket, ...rest] = decodeURIComponent(u.pathname).split('/');
    const key = rest.join('/');
    const xmlError = (status: number, code: string) => {
      res.writeHead(status, { 'content-type': 'application/xml' }).end(`<?xml version="1.0" encoding="UTF-8"?><Error><Code>${code}</Code><Message>${code}</Message></Error>`);
    };
    if (!bucket) return xmlError(400, 'InvalidBucketName');
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      try {
        if (!key) {
          if (req.method === 'PUT' || req.method === 'HEAD') {
            fs.mkdirSync(path.join(opts.dir, bucket), { recursive: true });
            return res.writeHead(200).end();
          }
          return xmlError(400, 'NotImplemented');
        }
        const file = fileOf(bucket, key);
        if (req.method === 'PUT') {
          const body = Buffer.concat(chunks);
          fs.mkdirSync(path.dirname(file), { recursive: true });
          fs.writeFileSync(file, body);
          return res.writeHead(200, { etag: `"${createHash('md5').update(body).digest('hex')}"` }).end();
        }
        if (req.method === 'GET' || req.method === 'HEAD') {
          if (!fs.existsSync(file)) return xmlError(404, 'NoSuchKey');
          const body = fs.readFileSync(file);
          res.writeHead(200, { 'content-type': 'application/octet-stream', 'content-length': String(body.length), etag: `"${createHash('md5').update(body).digest('hex')}"` });
          return res.end(req.method === 'GET' ? body : undefined);
        }
        if (req.method === 'DELETE') {
          fs.rmSync(file, { force: true });
          return res.writeHead(204).end();
        }
        return xmlError(405, 'MethodNotAllowed');
      } catch {
        return xmlError(400, 'InvalidRequest');
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(opts.port ?? 0, host, () => resolve()));
  const port = (server.address() as AddressInfo).port;
  return {
    url: `http://${host}:${port}`,
    dir: opts.dir,
    keys(bucket) {
      const root = path.join(opts.dir, bucket);
      if (!fs.existsSync(root)) return [];
      return fs.readdirSync(root, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).map((e) => path.relative(root, path.join(e.parentPath, e.name))).sort();
    },
    close: () => new Promise<void>((resolve) => { server.closeAllConnections(); server.close(() => resolve()); }),
  };
}

const isMain = import.meta.url === `file://${process.argv[1]}`;
if (isMain) {
  const args = process.argv.slice(2);
  if (args.includes('--help')) {
    console.log(`object-store: a local S3-compatible stand-in (path-style PUT/GET/HEAD/DELETE)

  --port N   port on 127.0.0.1 (default 55095)
  --dir D    folder for the objects (default .data/objects)`);
    process.exit(0);
  }
  const val = (flag: string, dflt: string) => {
    const i = args.indexOf(flag);
    return i >= 0 ? args[i + 1] : dflt;
  };
  const s = await startObjectStore({ port: Number(val('--port', '55095')), dir: val('--dir', path.resolve('.data/objects')) });
  console.log(`[object-store] S3 endpoint ${s.url}, objects in ${s.dir}`);
  const stop = () => void s.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
