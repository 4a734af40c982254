// The browser suite: @playwright/test on Debian's Chromium (never a downloaded browser) against the
// real API serving the built console (`npm run build -w admin` first). Playwright's webServer starts
// the API and a mail catcher on the test database named by DATABASE_URL / REDIS_URL (scripts/test.mjs
// passes them); BASE_URL instead points the suite at an API already running (then MAIL_URL names its
// mail catcher) and nothing is started. Screenshots: test-output/screenshots/; traces of failed
// tests: test-output/browser/ (`npx playwright show-trace <zip>`).
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from '@playwright/test';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const port = Number(process.env.TEST_BROWSER_PORT ?? 3291);
const smtpPort = Number(process.env.TEST_SMTP_PORT ?? 55093);
const mailPort = Number(process.env.TEST_MAIL_PORT ?? 55094);
const external = process.env.BASE_URL;
const baseURL = (external ?? `http://127.0.0.1:${port}`).replace(/\/+$/, '');
// read by the specs (support.ts): where the API and the mail catcher answer
process.env.SUITE_BASE_URL = baseURL;
process.env.SUITE_MAIL_URL = (process.env.MAIL_URL ?? (external ? 'http://127.0.0.1:55080' : `http://127.0.0.1:${mailPort}`)).replace(/\/+$/, '');

export default defineConfig({
  testDir: '.',
  testMatch: '*.spec.ts',
  outputDir: path.join(ROOT, 'test-output', 'browser'),
  // one worker: the machine has two cores, and the API and PostgreSQL need them more than a second browser
  workers: 1,
  fullyParallel: false,
  retries: 0,
  timeout: 240_000,
  expect: { timeout: 15_000 },
  reporter: [['list']],
  use: {
    baseURL,
    viewport: { width: 1366, height: 860 },
    locale: 'en-GB',
    timezoneId: 'Europe/Berlin',
    actionTimeout: 15_000,
    navigationTimeout: 30_000,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic', '--disable-dev-shm-usage'],
    },
  },
  webServer: external
    ? undefined
    : [
        {
          command: `node --import tsx fakes/src/smtp-catcher.ts --smtp-port ${smtpPort} --http-port ${mailPort}`,
          cwd: ROOT,
          url: `http://127.0.0.1:${mailPort}/messages`,
          reuseExistingServer: false,
          timeout: 60_000,
          stdout: 'ignore',
          gracefulShutdown: { signal: 'SIGTERM', timeout: 5_000 },
        },
        {
          command: 'node --import @swc-node/register/esm-register api/src/main.ts',
          cwd: ROOT,
          url: `http://127.0.0.1:${port}/v1/health`,
          reuseExistingServer: false,
          timeout: 180_000,
          stdout: 'ignore',
          stderr: 'pipe',
          // a clean shutdown before the database servers stop under it
          gracefulShutdown: { signal: 'SIGTERM', timeout: 15_000 },
          env: {
            NODE_ENV: 'test',
            SWC_NODE_PROJECT: path.join(ROOT, 'api/tsconfig.json'),
            PORT: String(port),
            PUBLIC_URL: `http://127.0.0.1:${port}`,
            SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
            LOG_LEVEL: 'warn',
            QUEUE_PREFIX: `browser-suite-${port}`,
            CORS_ORIGINS: `http://127.0.0.1:${port}`,
            // the suite's webhook receivers listen on loopback
            WEBHOOK_ALLOWED_HOSTS: '127.0.0.1,localhost',
            SIGNIN_IP_LIMIT_PER_MINUTE: process.env.SIGNIN_IP_LIMIT_PER_MINUTE ?? '100000',
            SIGNIN_MAX_FAILURES: process.env.SIGNIN_MAX_FAILURES ?? '1000',
          },
        },
      ],
});
