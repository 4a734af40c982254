// Shared by the browser specs: who signs in, the fixtures (a console-error guard on every page),
// axe-core injected into the page, and small API helpers for the set-up a flow needs.
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { test as base, expect, type Page } from '@playwright/test';

export { expect };
export type { Page };

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const BASE_URL = process.env.SUITE_BASE_URL ?? 'http://127.0.0.1:3000';
export const MAIL_URL = process.env.SUITE_MAIL_URL ?? 'http://127.0.0.1:55080';
export const SHOTS = path.join(ROOT, 'test-output', 'screenshots');
const AXE = path.join(ROOT, 'node_modules', 'axe-core', 'axe.min.js');
export const PASSWORD = 'pourgate-demo';

/** Who signs in, and the side-menu entries (data-menu-entry ids) their role must show, in order. */
const SHOP_DATA = ['material-systems', 'lots', 'molds', 'work-orders', 'qc-cup-tests'];
export type Role = 'admin' | 'engineer' | 'integrator' | 'viewer';
export const PEOPLE: Record<Role, { email: string; menu: string[] }> = {
  admin: { email: 'admin@demo.test', menu: ['overview', 'profile', 'reading-log', 'live', 'control', 'batches', 'calculator', 'defects', ...SHOP_DATA, 'users', 'invitations', 'audit-events', 'queues', 'api-keys', 'devices', 'webhook-endpoints', 'webhook-deliveries', 'docs'] },
  engineer: { email: 'engineer@demo.test', menu: ['overview', 'profile', 'readings', 'reading-log', 'live', 'control', 'batches', 'calculator', 'defects', 'imports', ...SHOP_DATA, 'devices'] },
  integrator: { email: 'integrator@demo.test', menu: ['overview', 'profile', 'reading-log', 'live', 'control', 'batches', 'calculator', 'defects', 'imports', ...SHOP_DATA, 'api-keys', 'devices', 'webhook-endpoints', 'webhook-deliveries', 'docs'] },
  viewer: { email: 'viewer@demo.test', menu: ['overview', 'profile', 'reading-log', 'live', 'control', 'batches', 'calculator', 'defects', ...SHOP_DATA, 'devices'] },
};
export const ROLES = Object.keys(PEOPLE) as Role[];

/**
 * `newPage()` opens a tab in the test's context; every tab's console errors and uncaught exceptions
 * fail the test unless `allowConsoleError(re)` expects them.
 */
export const test = base.extend<{ newPage: () => Promise<Page>; allowConsoleError: (re: RegExp) => void; consoleGuard: void }>({
  consoleGuard: [
    async ({ context }, use) => {
      const errors: string[] = [];
      const allowed: RegExp[] = [];
      (context as unknown as { __allowed: RegExp[] }).__allowed = allowed;
      context.on('page', (page) => {
        page.on('console', (msg) => {
          if (msg.type() === 'error') errors.push(msg.text());
        });
        page.on('pageerror', (err) => errors.push(`uncaught: ${err.message}`));
      });
      await use();
      const unexpected = errors.filter((m) => !allowed.some((re) => re.test(m)));
      expect(unexpected, 'console errors in the page').toEqual([]);
    },
    { auto: true },
  ],
  newPage: async ({ context }, use) => {
    await use(() => context.newPage());
  },
  allowConsoleError: async ({ context }, use) => {
    await use((re) => (context as unknown as { __allowed: RegExp[] }).__allowed.push(re));
  },
});

/** The page's document inside `page.evaluate` callbacks (this project compiles without the DOM library). */
export type InPage = { document: { querySelector(selector: string): { getAttribute(name: string): string | null } | null } };

/** Throws with `message` when `cond` is false (a check whose message says what went wrong). */
export function check(cond: unknown, message: string): asserts cond {
  if (!cond) throw new Error(message);
}

export async function shot(page: Page, name: string) {
  fs.mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: false });
}

export async function signIn(page: Page, who: Role | { email: string }, password = PASSWORD) {
  const person = typeof who === 'string' ? PEOPLE[who] : who;
  await page.goto(`${BASE_URL}/#/login`);
  await page.locator('input[name="email"]').fill(person.email);
  await page.locator('input[name="password"]').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.locator('[data-menu-entry="overview"]').waitFor({ timeout: 60_000 });
  await page.getByRole('heading', { level: 1 }).first().waitFor();
}

export async function menuEntries(page: Page) {
  return page.locator('[data-menu-entry]').evaluateAll((els) => els.map((e) => e.getAttribute('data-menu-entry')));
}

const axeSource = () => fs.readFileSync(AXE, 'utf8');

/** Runs axe-core in the page: its serious and critical findings, one line each (minor ones are logged). */
export async function axeFindings(page: Page, label = page.url()): Promise<string[]> {
  // evaluated through the DevTools protocol: the console's CSP (script-src 'self') would refuse a script tag
  await page.evaluate(axeSource());
  const result = await page.evaluate(async () => {
    const axe = (globalThis as unknown as { axe: { run: (ctx: unknown, opts: unknown) => Promise<{ violations: Array<{ id: string; impact: string; help: string; nodes: Array<{ target: string[] }> }> }> } }).axe;
    const r = await axe.run((globalThis as unknown as InPage).document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] } });
    return r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) }));
  });
  const bad = result.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  const minor = result.filter((v) => !bad.includes(v));
  if (minor.length) console.log(`    axe (${label}): ${minor.length} minor/moderate: ${minor.map((v) => v.id).join(', ')}`);
  return bad.map((v) => `${v.id} (${v.impact}: ${v.help}) at ${v.nodes.join(' | ')}`);
}

/** Runs axe-core in the page; fails on serious or critical violations. */
export async function axeScan(page: Page, label: string) {
  expect(await axeFindings(page, label), `axe: serious or critical problems on ${label}`).toEqual([]);
}

/** Waits until the page has stopped loading: no requests in flight and the app bar's spinner gone. */
export async function settled(page: Page) {
  await page.waitForLoadState('networkidle');
  await page.locator('header .MuiCircularProgress-root').waitFor({ state: 'detached' });
}

/** Signs in through the API itself (no browser), for checks that need a token. */
export async function apiToken(who: Role): Promise<string> {
  const res = await fetch(`${BASE_URL}/v1/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: PEOPLE[who].email, password: PASSWORD }),
  });
  check(res.ok, `API sign-in as ${who} answered ${res.status}`);
  return ((await res.json()) as { accessToken: string }).accessToken;
}

/** A JSON call to the API with a person's token. */
export async function apiCall(token: string, method: string, route: string, body?: unknown): Promise<{ status: number; json: any }> {
  const res = await fetch(`${BASE_URL}/v1${route}`, {
    method,
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  let json = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    // not JSON: json stays null
  }
  return { status: res.status, json };
}

export const listQuery = (filter: object, range = [0, 99]) => `filter=${encodeURIComponent(JSON.stringify(filter))}&range=${encodeURIComponent(JSON.stringify(range))}`;

export async function until<T>(what: string, probe: () => Promise<T> | T, timeoutMs = 20_000): Promise<NonNullable<T>> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const got = await probe();
    if (got) return got as NonNullable<T>;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

/** Waits for the invitation mail to `to` in the catcher and returns the token of its link. */
export async function invitationToken(to: string) {
  for (let i = 0; i < 40; i++) {
    const res = await fetch(`${MAIL_URL}/messages`).catch(() => null);
    check(res?.ok, `the mail catcher at ${MAIL_URL} is not reachable (set MAIL_URL)`);
    const mail = ((await res.json()) as Array<{ to: string[]; text?: string }>).filter((m) => m.to.some((t) => t.toLowerCase() === to)).pop();
    const m = mail?.text?.match(/#\/accept-invitation\?token=([^\s"<>]+)/);
    if (m) return decodeURIComponent(m[1]);
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no invitation mail to ${to} arrived`);
}

/** A stand-in receiver on loopback: answers 200 with a short JSON body and keeps what it got. */
export async function startTestReceiver() {
  const received: Array<{ headers: http.IncomingHttpHeaders; body: string }> = [];
  const server = http.createServer((req, res) => {
    let body = '';
    req.on('data', (c) => (body += c));
    req.on('end', () => {
      received.push({ headers: req.headers, body });
      res.writeHead(200, { 'Content-Type': 'application/json' });
      res.end(JSON.stringify({ received: true, by: 'suite receiver' }));
    });
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  return {
    url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/hooks/pourgate`,
    received,
    close: () => new Promise((r) => server.close(r)),
  };
}

export async function judgedReading(token: string, id: string) {
  for (let i = 0; i < 80; i++) {
    const r = await apiCall(token, 'GET', `/readings/${id}`);
    if (r.json?.status && r.json.status !== 'pending') return r.json;
    await new Promise((res) => setTimeout(res, 150));
  }
  throw new Error(`reading ${id} was never judged`);
}

/** A scale of its own for a flow (station `station`), registered by the admin. */
export async function suiteScale(stamp: string, station = 'S9') {
  const admin = await apiToken('admin');
  const device = await apiCall(admin, 'POST', '/devices', {
    kind: 'scale', serial: `SUITE-${stamp}`, name: `Suite scale ${stamp}`, stationCode: station,
    readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2099-12-31',
  });
  expect(device.status, 'registering the suite scale').toBe(201);
  return device.json;
}

/** A planned batch of the demo seat cushion (Demo Flex 28) weighed on `deviceId`. */
export async function plannedSeatCushion(eng: string, deviceId: string) {
  const systems = await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`);
  const molds = await apiCall(eng, 'GET', `/molds?${listQuery({})}`);
  const system = systems.json.find((s: { name: string }) => s.name === 'Demo Flex 28');
  const mold = molds.json.find((m: { name: string }) => m.name === 'Seat cushion');
  check(system && mold, 'the demo seed has no Demo Flex 28 or no Seat cushion');
  const b = await apiCall(eng, 'POST', '/batches', { materialSystemId: system.id, moldId: mold.id, options: { packFactor: 1.8, pigmentPercent: 2, scaleDeviceId: deviceId } });
  expect(b.status, 'planning a batch').toBe(201);
  return { system, mold, batch: b.json };
}

/**
 * A scale of its own and two planned batches of the demo seat cushion, each with part A on target and
 * part B 12 % off (one light, one heavy), so each batch has one rejected reading waiting for review.
 */
export async function shopFloorScenario() {
  const eng = await apiToken('engineer');
  const stamp = Date.now().toString(36);
  const device = await suiteScale(stamp);
  const batches = [];
  const rejected = [];
  let system;
  let mold;
  for (const factor of [0.88, 1.12]) {
    const planned = await plannedSeatCushion(eng, device.id);
    ({ system, mold } = planned);
    const b = planned.batch;
    const post = async (subject: string, grams: number) => {
      const r = await apiCall(eng, 'POST', '/readings', {
        batchId: b.id, deviceId: device.id, clientReadingId: `suite-${stamp}-${batches.length}-${subject}`,
        quantity: 'mass', subject, value: Math.round(grams * 10) / 10, unit: 'g', stable: true,
      });
      expect(r.status, `posting ${subject}`).toBe(202);
      return judgedReading(eng, r.json.id);
    };
    await post('part_a', b.summary.massAKg * 1000);
    // a batch is released only when complete: the pigment its targets name is weighed too
    if (b.summary.pigmentMassKg > 0) await post('pigment', b.summary.pigmentMassKg * 1000);
    const partB = await post('part_b', b.summary.massBKg * 1000 * factor);
    expect(partB.status, `verdict of part B at ${factor} × its target`).toBe('rejected');
    batches.push(b);
    rejected.push(partB);
  }
  return { eng, system, mold, device, batches, rejected };
}

export async function batchState(token: string, id: string) {
  return (await apiCall(token, 'GET', `/batches/${id}`)).json?.state;
}

export const queueFor = (batchId: string) => `${BASE_URL}/#/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', batchId }))}`;
