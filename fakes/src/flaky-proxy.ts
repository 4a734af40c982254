// A flaky stretch of network between a client and Pourgate, for proving that retries are safe:
// it can pass a request on and then cut the connection before the answer gets back (the worst
// case: the server acted, the client never heard), or answer 503 itself. Loopback only.
import http from 'node:http';
import type { AddressInfo } from 'node:net';

export interface SeenRequest {
  method: string;
  url: string;
  headers: http.IncomingHttpHeaders;
  body: string;
  answered: string;
}

/**
 * A proxy in front of the API that misbehaves on the first requests it sees: `drop` forwards the
 * request (the API acts on it) and then cuts the connection before the answer gets back; `503`
 * answers Service Unavailable without forwarding. Later requests pass through.
 */
export async function startFlakyProxy(target: string, faults: Array<'drop' | '503'>, port = 0) {
  const seen: SeenRequest[] = [];
  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', async () => {
      const body = Buffer.concat(chunks).toString('utf8');
      const fault = faults.shift();
      const entry: SeenRequest = { method: req.method ?? '', url: req.url ?? '', headers: req.headers, body, answered: fault ?? 'forwarded' };
      seen.push(entry);
      if (fault === '503') {
        res.writeHead(503, { 'content-type': 'application/problem+json' }).end(JSON.stringify({ type: 'about:blank', title: 'Service Unavailable', status: 503 }));
        return;
      }
      const headers = Object.fromEntries(Object.entries(req.headers).filter(([k]) => !['host', 'connection', 'content-length'].includes(k)).map(([k, v]) => [k, String(v)]));
      const upstream = await fetch(target + req.url, { method: req.method, headers, body: req.method === 'GET' || req.method === 'HEAD' ? undefined : body });
      const text = await upstream.text();
      if (fault === 'drop') {
        req.socket.destroy();
        return;
      }
      res.writeHead(upstream.status, Object.fromEntries([...upstream.headers.entries()].filter(([k]) => !['content-length', 'content-encoding', 'transfer-encoding', 'connection', 'keep-alive'].includes(k)))).end(text);
    });
  });
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', () => resolve()));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    seen,
    close: () => new Promise<void>((resolve) => (server.closeAllConnections(), server.close(() => resolve()))),
  };
}

if ((await import('./cli.js')).isMain(import.meta.url)) {
  const { default: yargs } = await import('yargs');
  const { hideBin } = await import('yargs/helpers');
  const argv = await yargs(hideBin(process.argv))
    .usage('flaky-proxy: a loopback proxy in front of Pourgate that cuts or refuses the first requests')
    .usage('Usage: flaky-proxy.ts --target http://127.0.0.1:3000 --faults drop,503')
    .wrap(100)
    .version(false)
    .option('target', { type: 'string', default: 'http://127.0.0.1:3000', describe: 'Where requests are passed on' })
    .option('port', { type: 'number', default: 3319, describe: 'Port on 127.0.0.1' })
    .option('faults', { type: 'string', default: 'drop,503', describe: 'What the first requests get, in order: drop (passed on, answer cut) or 503' })
    .strict()
    .help()
    .parseAsync();
  const p = await startFlakyProxy(argv.target, argv.faults.split(',').filter(Boolean) as Array<'drop' | '503'>, argv.port);
  console.log(`[flaky-proxy] ${p.url} -> ${argv.target}`);
  process.on('SIGINT', () => void p.close().then(() => process.exit(0)));
}
