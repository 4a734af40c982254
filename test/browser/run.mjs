#!/usr/bin/env node
// Browser suite: drives Debian's Chromium (never a downloaded browser) against a running API that
// serves the built console. BASE_URL names it (default http://127.0.0.1:3000). Screenshots go to
// test-output/screenshots/. One function per flow; FLOWS=a,b runs a subset. The last line printed
// is "N passed, N failed", and the exit code is non-zero when anything failed.
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const BASE_URL = (process.env.BASE_URL ?? 'http://127.0.0.1:3000').replace(/\/+$/, '');
const SHOTS = path.join(ROOT, 'test-output', 'screenshots');
const AXE = path.join(ROOT, 'node_modules', 'axe-core', 'axe.min.js');
const PASSWORD = 'pourgate-demo';
// the local mail catcher `npm start` runs; invitations land there
const MAIL_URL = (process.env.MAIL_URL ?? 'http://127.0.0.1:55080').replace(/\/+$/, '');
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
];

/** Who signs in, and the side-menu entries (data-menu-entry ids) their role must show, in order. */
const PEOPLE = {
  admin: { email: 'admin@demo.test', menu: ['overview', 'users', 'invitations', 'audit-events', 'api-keys', 'docs'] },
  engineer: { email: 'engineer@demo.test', menu: ['overview'] },
  integrator: { email: 'integrator@demo.test', menu: ['overview', 'api-keys', 'docs'] },
  viewer: { email: 'viewer@demo.test', menu: ['overview'] },
};

// ---------------------------------------------------------------- helpers

class Check extends Error {}

function expect(cond, message) {
  if (!cond) throw new Check(message);
}

function expectEqual(actual, wanted, what) {
  const a = JSON.stringify(actual);
  const w = JSON.stringify(wanted);
  if (a !== w) throw new Check(`${what}: expected ${w}, got ${a}`);
}

async function shot(page, name) {
  fs.mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: false });
}

async function signIn(page, who, password = PASSWORD) {
  const person = typeof who === 'string' ? PEOPLE[who] : who;
  await page.goto(`${BASE_URL}/#/login`);
  await page.locator('input[name="email"]').fill(person.email);
  await page.locator('input[name="password"]').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.locator('[data-menu-entry="overview"]').waitFor({ timeout: 15_000 });
  await page.getByRole('heading', { level: 1 }).first().waitFor();
}

async function menuEntries(page) {
  return page.locator('[data-menu-entry]').evaluateAll((els) => els.map((e) => e.getAttribute('data-menu-entry')));
}

/** Runs axe-core in the page; fails on serious or critical violations. */
async function axeScan(page, label) {
  // evaluated through the DevTools protocol: the console's CSP (script-src 'self') would refuse a script tag
  await page.evaluate(fs.readFileSync(AXE, 'utf8'));
  const result = await page.evaluate(async () => {
    const r = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] } });
    return r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) }));
  });
  const bad = result.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  const minor = result.filter((v) => !bad.includes(v));
  if (minor.length) console.log(`    axe (${label}): ${minor.length} minor/moderate: ${minor.map((v) => v.id).join(', ')}`);
  expect(bad.length === 0, `axe found serious problems on ${label}: ${bad.map((v) => `${v.id} (${v.impact}: ${v.help}) at ${v.nodes.join(' | ')}`).join('; ')}`);
}

/** Signs in through the API itself (no browser), for checks that need a token. */
async function apiToken(who) {
  const res = await fetch(`${BASE_URL}/v1/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: PEOPLE[who].email, password: PASSWORD }),
  });
  expect(res.ok, `API sign-in as ${who} answered ${res.status}`);
  return (await res.json()).accessToken;
}

// ---------------------------------------------------------------- flows

/** Each demo person signs in and sees exactly the menu their role allows. */
async function eachPersonSeesTheirMenu({ newPage }) {
  for (const who of Object.keys(PEOPLE)) {
    const page = await newPage();
    await signIn(page, who);
    expectEqual(await menuEntries(page), PEOPLE[who].menu, `menu of ${who}`);
    const docs = page.locator('[data-menu-entry="docs"]');
    if (PEOPLE[who].menu.includes('docs')) expectEqual(await docs.getAttribute('href'), '/docs', `API reference link of ${who}`);
    await page.getByTestId('safety-note').waitFor();
    await shot(page, `overview-${who}`);
    await page.close();
  }
}

/** A viewer who types an admin address lands on a refusal, not on the data. */
async function viewerCannotOpenAdminPages({ newPage }) {
  const page = await newPage();
  await signIn(page, 'viewer');
  let asked = false;
  page.on('request', (r) => {
    if (/\/v1\/(users|api-keys|audit-events)\b/.test(r.url())) asked = true;
  });
  await page.goto(`${BASE_URL}/#/users`);
  await page.getByTestId('no-access').waitFor({ timeout: 10_000 });
  expect(!asked, 'the console asked the API for people on behalf of a viewer');
  await shot(page, 'viewer-access-denied');
}

/** Wrong credentials: a clear message, no way in. */
async function wrongPasswordIsRefused({ newPage, allowConsoleError }) {
  allowConsoleError(/401|Unauthorized/);
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/login`);
  await page.locator('input[name="email"]').fill('nobody@demo.test');
  await page.locator('input[name="password"]').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  const alert = page.getByTestId('sign-in-error');
  await alert.waitFor();
  expect(/do not match/.test(await alert.innerText()), 'the refusal does not say the credentials do not match');
  expect((await page.locator('[data-menu-entry]').count()) === 0, 'a menu is shown after a refused sign-in');
  await shot(page, 'sign-in-refused');
}

/** The admin issues a key, sees the secret once, the secret works, then revokes it and it stops. */
async function adminIssuesAndRevokesKey({ newPage }) {
  const page = await newPage();
  await signIn(page, 'admin');
  await page.locator('[data-menu-entry="api-keys"]').click();
  await page.getByRole('heading', { name: 'API keys', level: 1 }).waitFor();
  const name = `Browser suite scale ${Date.now().toString(36)}`;

  await page.getByTestId('issue-key').click();
  const dialog = page.getByRole('dialog');
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('devices:read').check();
  await shot(page, 'api-key-issue-form');
  await dialog.getByRole('button', { name: 'Issue key' }).click();

  const secretBox = page.getByTestId('api-key-secret');
  await secretBox.waitFor();
  const secret = (await secretBox.innerText()).trim();
  expect(/^pg[di]_(live|test)_[A-Za-z0-9_-]{43}$/.test(secret), `the secret does not look like a key: ${secret.slice(0, 12)}…`);
  expect(await page.getByText('You will not see this secret again').isVisible(), 'no once-only warning next to the secret');
  await shot(page, 'api-key-secret-once');
  expect(await page.getByTestId('secret-done').isDisabled(), '"Done" is enabled before the person confirms storing the secret');
  await page.getByTestId('secret-stored').check();
  await page.getByTestId('secret-done').click();
  await secretBox.waitFor({ state: 'detached' });
  expect(!(await page.content()).includes(secret), 'the secret is still in the page after closing the dialog');

  // the key is listed, with its prefix and never used
  const row = page.getByRole('row', { name: new RegExp(name) });
  await row.waitFor();
  expect(await row.getByText('Never used').isVisible(), 'a fresh key does not show "Never used"');
  expect((await row.innerText()).includes(secret.slice(0, 16)), 'the row does not show the key prefix');

  // the secret authenticates (devices:read was granted)
  const before = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
  expectEqual(before.status, 200, 'GET /v1/devices with the new key');

  // reload: the secret is gone for good
  await page.reload();
  await row.waitFor();
  expect(!(await page.content()).includes(secret), 'the secret came back after a reload');

  await row.getByRole('button', { name: `Revoke ${name}` }).click();
  const confirm = page.getByRole('dialog');
  await confirm.getByText(`Revoke “${name}”?`).waitFor();
  await shot(page, 'api-key-revoke-confirm');
  await confirm.getByRole('button', { name: 'Revoke key' }).click();
  await row.getByText('Revoked').waitFor();
  await shot(page, 'api-key-revoked');

  const after = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
  expectEqual(after.status, 401, 'GET /v1/devices with the revoked key');
}

/** Waits for the invitation mail to `to` in the catcher and returns the token of its link. */
async function invitationToken(to) {
  for (let i = 0; i < 40; i++) {
    const res = await fetch(`${MAIL_URL}/messages`).catch(() => null);
    expect(res?.ok, `the mail catcher at ${MAIL_URL} is not reachable (set MAIL_URL)`);
    const mail = (await res.json()).filter((m) => m.to.some((t) => t.toLowerCase() === to)).pop();
    const m = mail?.text?.match(/#\/accept-invitation\?token=([^\s"<>]+)/);
    if (m) return decodeURIComponent(m[1]);
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Check(`no invitation mail to ${to} arrived`);
}

/** The admin invites a colleague, who accepts from the mail, signs in, and is then disabled. */
async function inviteAcceptAndDisable({ newPage }) {
  const stamp = Date.now().toString(36);
  const email = `suite-${stamp}@demo.test`;
  const name = `Suite Person ${stamp}`;
  const password = `suite-pass-${stamp}`;

  const admin = await newPage();
  await signIn(admin, 'admin');
  await admin.locator('[data-menu-entry="users"]').click();
  await admin.getByTestId('invite-button').click();
  const dialog = admin.getByRole('dialog');
  await dialog.locator('input[name="email"]').fill(email);
  await dialog.getByRole('radio', { name: /Process engineer/ }).check();
  await dialog.getByRole('button', { name: 'Send invitation' }).click();
  await admin.getByText(`Invitation sent to ${email}.`).waitFor({ timeout: 45_000 }); // the POST waits for the SMTP hand-off, slow on a busy 2-core machine
  await admin.locator('[data-menu-entry="invitations"]').click();
  await admin.getByRole('row', { name: new RegExp(email.replace(/\./g, '\\.')) }).getByText('Waiting').waitFor();

  const token = await invitationToken(email);
  const guest = await newPage();
  await guest.goto(`${BASE_URL}/#/accept-invitation?token=${encodeURIComponent(token)}`);
  await guest.locator('input[name="name"]').fill(name);
  await guest.locator('input[name="password"]').fill(password);
  await guest.locator('input[name="confirm"]').fill(password);
  await guest.getByRole('button', { name: 'Create my account' }).click();
  await guest.getByRole('heading', { name: 'Your account is ready' }).waitFor();
  await shot(guest, 'accept-invitation-done');
  await guest.getByRole('link', { name: 'Sign in' }).click();
  expectEqual(await guest.locator('input[name="email"]').inputValue(), email, 'e-mail prefilled after accepting');
  await signIn(guest, { email }, password);
  expectEqual(await menuEntries(guest), PEOPLE.engineer.menu, 'menu of the new engineer');

  // the admin disables the newcomer; signing in is then refused
  await admin.locator('[data-menu-entry="users"]').click();
  const row = admin.getByRole('row', { name: new RegExp(name) });
  await row.getByRole('button', { name: `Disable ${name}` }).click();
  await admin.getByRole('dialog').getByRole('button', { name: 'Disable' }).click();
  await row.getByText('Disabled').waitFor();
  await shot(admin, 'people-disabled');
  const refused = await fetch(`${BASE_URL}/v1/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }) });
  expectEqual(refused.status, 401, 'sign-in of a disabled person');
}

/** Integrators issue device keys only: the kind is preset and integration keys cannot be chosen. */
async function integratorIssuesDeviceKeysOnly({ newPage }) {
  const page = await newPage();
  await signIn(page, 'integrator');
  await page.locator('[data-menu-entry="api-keys"]').click();
  await page.getByTestId('issue-key').waitFor();
  expectEqual(await page.getByTestId('issue-key').innerText(), 'Issue a device key', 'integrator issue button');
  await page.getByTestId('issue-key').click();
  const dialog = page.getByRole('dialog');
  await dialog.getByTestId('kind-fixed').waitFor();
  expectEqual(await dialog.getByRole('radio', { name: /Integration/ }).count(), 0, 'integration choices offered to an integrator');
  await shot(page, 'api-key-integrator-dialog');
  await dialog.getByRole('button', { name: 'Cancel' }).click();
}

/** The admin's people and audit pages load, with filters, and an audit entry expands. */
async function adminReadsPeopleAndAudit({ newPage }) {
  const page = await newPage();
  await signIn(page, 'admin');
  await page.locator('[data-menu-entry="users"]').click();
  await page.getByRole('row', { name: /engineer@demo\.test/ }).waitFor();
  await shot(page, 'people');
  await page.getByTestId('invite-button').click();
  await page.getByRole('dialog').getByText('Invite someone').waitFor();
  await shot(page, 'people-invite');
  await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();

  await page.locator('[data-menu-entry="audit-events"]').click();
  const first = page.locator('tbody tr').first();
  await first.waitFor();
  await page.getByText('auth.signed_in').first().waitFor();
  await first.click();
  await page.getByTestId('audit-details').first().waitFor();
  await shot(page, 'audit-log');
}

/** Accessibility: no serious or critical axe findings on the pages that exist. */
async function pagesPassAxe({ newPage }) {
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/login`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  await axeScan(page, 'sign-in');
  await page.goto(`${BASE_URL}/#/accept-invitation`);
  await page.getByTestId('invitation-missing-token').waitFor();
  await axeScan(page, 'accept-invitation without token');
  await page.goto(`${BASE_URL}/#/accept-invitation?token=not-a-real-token-000`);
  await page.getByRole('button', { name: 'Create my account' }).waitFor();
  await axeScan(page, 'accept-invitation');

  await signIn(page, 'admin');
  await axeScan(page, 'overview');
  for (const [entry, heading] of [
    ['users', 'People'],
    ['invitations', 'Invitations'],
    ['api-keys', 'API keys'],
    ['audit-events', 'Audit log'],
  ]) {
    await page.locator(`[data-menu-entry="${entry}"]`).click();
    await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await page.locator('tbody tr, [data-testid="empty-state"]').first().waitFor();
    await page.waitForLoadState('networkidle');
    await axeScan(page, entry);
  }
  await page.locator('[data-menu-entry="api-keys"]').click();
  await page.getByTestId('issue-key').click();
  await page.getByRole('dialog').getByLabel('Name').waitFor();
  await axeScan(page, 'issue-key dialog');
}

/** A broken invitation link explains itself: no token, or a token the API does not know. */
async function brokenInvitationLinks({ newPage, allowConsoleError }) {
  allowConsoleError(/status of 4\d\d/);
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/accept-invitation`);
  await page.getByTestId('invitation-missing-token').waitFor();
  await shot(page, 'accept-invitation-no-token');
  await page.goto(`${BASE_URL}/#/accept-invitation?token=suite-made-up-token`);
  await page.locator('input[name="name"]').fill('Nobody Known');
  await page.locator('input[name="password"]').fill('long-enough-passphrase');
  await page.locator('input[name="confirm"]').fill('different-passphrase');
  await page.getByRole('button', { name: 'Create my account' }).click();
  await page.getByText('The two passwords differ.').waitFor();
  await page.locator('input[name="confirm"]').fill('long-enough-passphrase');
  await page.getByRole('button', { name: 'Create my account' }).click();
  const alert = page.getByTestId('invitation-spent');
  await alert.waitFor();
  expect((await alert.innerText()).trim().length > 10, 'the refusal of an unknown token says nothing');
  await page.getByRole('link', { name: 'Go to sign-in' }).waitFor();
  await shot(page, 'accept-invitation-refused');
}

/** Rotation: a new secret at once, the old one keeps working through the grace period. */
async function adminRotatesKeyWithGrace({ newPage }) {
  const token = await apiToken('admin');
  const name = `Browser suite logger ${Date.now().toString(36)}`;
  const created = await fetch(`${BASE_URL}/v1/api-keys`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: JSON.stringify({ name, kind: 'device', environment: 'test', scopes: ['devices:read'] }),
  });
  expectEqual(created.status, 201, 'creating a key through the API');
  const oldSecret = (await created.json()).secret;

  const page = await newPage();
  await signIn(page, 'admin');
  await page.locator('[data-menu-entry="api-keys"]').click();
  const oldRow = page.getByRole('row', { name: new RegExp(`${name}[\\s\\S]*${oldSecret.slice(0, 16)}`) });
  await oldRow.getByRole('button', { name: `Rotate ${name}` }).click();
  const dialog = page.getByRole('dialog');
  await dialog.getByRole('radio', { name: '1 hour' }).check();
  await page.waitForTimeout(300); // let the radio animation settle for the screenshot
  await shot(page, 'api-key-rotate');
  await dialog.getByRole('button', { name: 'Rotate key' }).click();
  const secretBox = page.getByTestId('api-key-secret');
  await secretBox.waitFor();
  const newSecret = (await secretBox.innerText()).trim();
  expect(newSecret !== oldSecret, 'rotation showed the old secret');
  await dialog.getByText(/keeps working for 1 hour/).waitFor();
  await shot(page, 'api-key-rotated-secret');
  await page.getByTestId('secret-stored').check();
  await page.getByTestId('secret-done').click();
  await oldRow.getByText('Retiring').waitFor();
  await oldRow.getByText(/Works until/).waitFor();

  for (const [which, secret] of [['old', oldSecret], ['new', newSecret]]) {
    const r = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
    expectEqual(r.status, 200, `GET /v1/devices with the ${which} secret during the grace period`);
  }
  await shot(page, 'api-key-grace');

  // tidy up: revoke both through the console
  for (const row of [oldRow, page.getByRole('row', { name: new RegExp(`${name}[\\s\\S]*${newSecret.slice(0, 16)}`) })]) {
    await row.getByRole('button', { name: `Revoke ${name}` }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Revoke key' }).click();
    await row.getByText('Revoked').waitFor();
  }
}

/** Signing out ends the session: the console goes back to sign-in and stays there. */
async function signOutEndsTheSession({ newPage }) {
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.reload();
  await page.locator('[data-menu-entry="overview"]').waitFor();
  await page.getByRole('button', { name: 'Account' }).click();
  await page.getByRole('menu').getByText('engineer@demo.test').waitFor();
  await shot(page, 'account-menu');
  await page.getByRole('menuitem', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  await page.goto(`${BASE_URL}/#/`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  expectEqual(await page.locator('[data-menu-entry]').count(), 0, 'menu entries after signing out');
}

/** A link into the console opened without a session asks to sign in, then opens that page. */
async function deepLinkReturnsAfterSignIn({ newPage }) {
  const page = await newPage();
  let frameFetched = false;
  page.on('request', (r) => {
    if (/\/assets\/Layout-[^/]+\.js$/.test(r.url())) frameFetched = true;
  });
  await page.goto(`${BASE_URL}/#/audit-events`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  expect(!frameFetched, 'the signed-in frame was fetched before signing in');
  await page.locator('input[name="email"]').fill(PEOPLE.admin.email);
  await page.locator('input[name="password"]').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Audit log', level: 1 }).waitFor();
  expect(new URL(page.url()).hash.startsWith('#/audit-events'), `landed on ${page.url()} instead of the audit log`);
}

const FLOWS = [
  eachPersonSeesTheirMenu,
  viewerCannotOpenAdminPages,
  wrongPasswordIsRefused,
  adminIssuesAndRevokesKey,
  adminRotatesKeyWithGrace,
  integratorIssuesDeviceKeysOnly,
  inviteAcceptAndDisable,
  adminReadsPeopleAndAudit,
  brokenInvitationLinks,
  signOutEndsTheSession,
  deepLinkReturnsAfterSignIn,
  pagesPassAxe,
];

// ---------------------------------------------------------------- runner

async function main() {
  const only = (process.env.FLOWS ?? '').split(',').map((s) => s.trim()).filter(Boolean);
  const flows = only.length ? FLOWS.filter((f) => only.includes(f.name)) : FLOWS;
  if (only.length && flows.length !== only.length) {
    console.error(`unknown flow in FLOWS; known: ${FLOWS.map((f) => f.name).join(', ')}`);
    console.log('0 passed, 1 failed');
    process.exit(1);
  }
  try {
    const h = await fetch(`${BASE_URL}/v1/health`);
    if (!h.ok) throw new Error(`health answered ${h.status}`);
  } catch (e) {
    console.error(`The API at ${BASE_URL} is not reachable (${e.message}). Start it (npm start) or set BASE_URL.`);
    console.log('0 passed, 1 failed');
    process.exit(1);
  }

  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS, headless: true });
  let passed = 0;
  let failed = 0;
  console.log(`Browser suite against ${BASE_URL}`);
  for (const flow of flows) {
    const started = Date.now();
    const context = await browser.newContext({ viewport: { width: 1366, height: 860 }, locale: 'en-GB', timezoneId: 'Europe/Berlin' });
    context.setDefaultTimeout(15_000);
    const consoleErrors = [];
    const allowed = [];
    const newPage = async () => {
      const page = await context.newPage();
      page.on('console', (msg) => {
        if (msg.type() === 'error') consoleErrors.push(msg.text());
      });
      page.on('pageerror', (err) => consoleErrors.push(`uncaught: ${err.message}`));
      return page;
    };
    const allowConsoleError = (re) => allowed.push(re);
    try {
      await flow({ newPage, allowConsoleError, browser, context });
      const unexpected = consoleErrors.filter((m) => !allowed.some((re) => re.test(m)));
      expect(unexpected.length === 0, `console errors: ${unexpected.join(' | ')}`);
      passed += 1;
      console.log(`  ✓ ${flow.name} (${Date.now() - started} ms)`);
    } catch (e) {
      failed += 1;
      console.log(`  ✗ ${flow.name}: ${e instanceof Check ? e.message : e.stack ?? e}`);
      const pages = context.pages();
      if (pages.length) await shot(pages[pages.length - 1], `FAILED-${flow.name}`).catch(() => undefined);
    } finally {
      await context.close();
    }
  }
  await browser.close();
  console.log(`${passed} passed, ${failed} failed`);
  process.exit(failed ? 1 : 0);
}

main().catch((e) => {
  console.error(e);
  console.log('0 passed, 1 failed');
  process.exit(1);
});
