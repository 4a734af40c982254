// A stand-in for the shop's mail server: accepts SMTP on loopback, keeps every message in memory,
// and lists them over HTTP (GET /messages) so tests and the demo can read what Pourgate sent.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { Recorder } from './recorder.js';

export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

export interface SmtpCatcher {
  smtpUrl: string;
  httpUrl: string | null;
  messages: CaughtMail[];
  /** Resolves with the first message (already caught or still to come) that matches. */
  waitFor(match: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

export async function startSmtpCatcher(opts: { smtpPort?: number; httpPort?: number | null; host?: string } = {}): Promise<SmtpCatcher> {
  const host = opts.host ?? '127.0.0.1';
  const recorder = new Recorder<CaughtMail>('mail');
  const messages = recorder.items;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    disableReverseLookup: true,
    logger: false,
    onData(stream, session, done) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address);
          const mail: CaughtMail = {
            id: messages.length + 1,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date().toISOString(),
          };
          recorder.add(mail);
          done();
        })
        .catch((e: Error) => done(e));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.smtpPort ?? 0, host, () => resolve());
  });
  const smtpPort = (server.server.address() as AddressInfo).port;

  let web: http.Server | null = null;
  if (opts.httpPort !== null && opts.httpPort !== undefined) {
    web = http.createServer((req, res) => {
      if (req.url === '/messages' || req.url === '/messages/') {
        res.writeHead(200, { 'content-type': 'application/json' });
        res.end(JSON.stringify(messages));
      } else if (req.url === '/' ) {
        res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
        const rows = messages.map((m) => `<tr><td>${m.receivedAt}</td><td>${esc(m.to.join(', '))}</td><td>${esc(m.subject)}</td><td><pre>${esc(m.text)}</pre></td></tr>`).join('');
        res.end(`<!doctype html><title>Mail catcher</title><h1>Caught mail (${messages.length})</h1><table border="1" cellpadding="4"><tr><th>received</th><th>to</th><th>subject</th><th>text</th></tr>${rows}</table>`);
      } else {
        res.writeHead(404).end();
      }
    });
    await new Promise<void>((resolve) => web!.listen(opts.httpPort!, host, () => resolve()));
  }

  return {
    smtpUrl: `smtp://${host}:${smtpPort}`,
    httpUrl: web ? `http://${host}:${(web.address() as AddressInfo).port}` : null,
    messages,
    waitFor(match, timeoutMs = 10_000) {
      return recorder.waitFor(match, timeoutMs);
    },
    async close() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      if (web) await new Promise<void>((resolve) => web!.close(() => resolve()));
    },
  };
}

function esc(s: string): string {
  return s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
}

const isMain = import.meta.url === `file://${process.argv[1]}`;
if (isMain) {
  const args = process.argv.slice(2);
  if (args.includes('--help')) {
    console.log(`smtp-catcher: a local SMTP server that keeps messages for reading over HTTP

  --smtp-port N   SMTP port on 127.0.0.1 (default 55025)
  --http-port N   HTTP port for the listing (default 55080): GET / (page), GET /messages (JSON)`);
    process.exit(0);
  }
  const num = (flag: string, dflt: number) => {
    const i = args.indexOf(flag);
    return i >= 0 ? Number(args[i + 1]) : dflt;
  };
  const c = await startSmtpCatcher({ smtpPort: num('--smtp-port', 55025), httpPort: num('--http-port', 55080) });
  console.log(`[smtp-catcher] SMTP ${c.smtpUrl}, messages at ${c.httpUrl}/`);
  const stop = () => void c.close().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
