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
const SHOP_DATA = ['material-systems', 'lots', 'molds', 'work-orders', 'qc-cup-tests'];
const PEOPLE = {
  admin: { email: 'admin@demo.test', menu: ['overview', 'profile', 'batches', 'calculator', ...SHOP_DATA, 'users', 'invitations', 'audit-events', 'api-keys', 'devices', 'webhook-endpoints', 'webhook-deliveries', 'docs'] },
  engineer: { email: 'engineer@demo.test', menu: ['overview', 'profile', 'readings', 'batches', 'calculator', 'imports', ...SHOP_DATA, 'devices'] },
  integrator: { email: 'integrator@demo.test', menu: ['overview', 'profile', 'batches', 'calculator', 'imports', ...SHOP_DATA, 'api-keys', 'devices', 'webhook-endpoints', 'webhook-deliveries', 'docs'] },
  viewer: { email: 'viewer@demo.test', menu: ['overview', 'profile', 'batches', 'calculator', ...SHOP_DATA, 'devices'] },
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

/** Waits until the page has stopped loading: no requests in flight and the app bar's spinner gone. */
async function settled(page) {
  await page.waitForLoadState('networkidle');
  await page.locator('header .MuiCircularProgress-root').waitFor({ state: 'detached' });
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
    // every role reads the shop floor: let its figures and charts arrive before the picture
    await page.getByTestId('floor-panel').waitFor();
    await settled(page);
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
  await page.getByTestId('floor-panel').waitFor();
  await settled(page);
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

  // the engineer's shop-floor pages (a fresh tab: its own session)
  const eng = await newPage();
  await signIn(eng, 'engineer');
  await eng.getByTestId('floor-panel').waitFor();
  await settled(eng);
  await axeScan(eng, 'overview (engineer)');
  for (const [entry, heading, ready] of [
    ['readings', 'Review queue', '[data-testid="queue-row"], [data-testid="queue-empty"]'],
    ['batches', 'Batches', 'tbody tr, [data-testid="empty-state"]'],
    ['calculator', 'Targets calculator', '[data-testid="calc-result"][data-state="ready"]'],
    ['imports', 'Logger imports', '[data-testid="import-file"]'],
  ]) {
    await eng.locator(`[data-menu-entry="${entry}"]`).click();
    await eng.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await eng.locator(ready).first().waitFor({ state: 'attached' });
    await settled(eng);
    await axeScan(eng, entry);
  }
  const engToken = await apiToken('engineer');
  const someBatch = (await apiCall(engToken, 'GET', `/batches?${listQuery({}, [0, 0])}`)).json[0];
  await eng.goto(`${BASE_URL}/#/batches/${someBatch.id}/show`);
  await eng.getByTestId('weighed-section').waitFor();
  await settled(eng);
  await axeScan(eng, 'batch detail');
  await eng.getByTestId('open-pour-sheet').click();
  await eng.getByTestId('pour-sheet').waitFor();
  await axeScan(eng, 'pour sheet');

  await scanShopAndIntegrationPages(newPage);
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

// ---------------------------------------------------------------- shop floor (review, batches, calculator, imports)

/** A JSON call to the API with a person's token. */
async function apiCall(token, method, route, body) {
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
    json = null;
  }
  return { status: res.status, json };
}

const listQuery = (filter, range = [0, 99]) => `filter=${encodeURIComponent(JSON.stringify(filter))}&range=${encodeURIComponent(JSON.stringify(range))}`;

async function judgedReading(token, id) {
  for (let i = 0; i < 80; i++) {
    const r = await apiCall(token, 'GET', `/readings/${id}`);
    if (r.json?.status && r.json.status !== 'pending') return r.json;
    await new Promise((res) => setTimeout(res, 150));
  }
  throw new Check(`reading ${id} was never judged`);
}

/**
 * A scale of its own and two planned batches of the demo seat cushion, each with part A on target and
 * part B 12 % off (one light, one heavy), so each batch has one rejected reading waiting for review.
 */
async function shopFloorScenario() {
  const admin = await apiToken('admin');
  const eng = await apiToken('engineer');
  const stamp = Date.now().toString(36);
  const device = await apiCall(admin, 'POST', '/devices', {
    kind: 'scale', serial: `SUITE-${stamp}`, name: `Suite scale ${stamp}`, stationCode: 'S9',
    readability: { value: 0.1, unit: 'g' }, capacity: { value: 6, unit: 'kg' }, calibrationDue: '2099-12-31',
  });
  expectEqual(device.status, 201, 'registering the suite scale');
  const systems = await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`);
  const molds = await apiCall(eng, 'GET', `/molds?${listQuery({})}`);
  const system = systems.json.find((s) => s.name === 'Demo Flex 28');
  const mold = molds.json.find((m) => m.name === 'Seat cushion');
  expect(system && mold, 'the demo seed has no Demo Flex 28 or no Seat cushion');
  const batches = [];
  const rejected = [];
  for (const factor of [0.88, 1.12]) {
    const b = await apiCall(eng, 'POST', '/batches', { materialSystemId: system.id, moldId: mold.id, options: { packFactor: 1.8, pigmentPercent: 2, scaleDeviceId: device.json.id } });
    expectEqual(b.status, 201, 'planning a batch');
    const post = async (subject, grams) => {
      const r = await apiCall(eng, 'POST', '/readings', {
        batchId: b.json.id, deviceId: device.json.id, clientReadingId: `suite-${stamp}-${batches.length}-${subject}`,
        quantity: 'mass', subject, value: Math.round(grams * 10) / 10, unit: 'g', stable: true,
      });
      expectEqual(r.status, 202, `posting ${subject}`);
      return judgedReading(eng, r.json.id);
    };
    await post('part_a', b.json.summary.massAKg * 1000);
    const partB = await post('part_b', b.json.summary.massBKg * 1000 * factor);
    expectEqual(partB.status, 'rejected', `verdict of part B at ${factor} × its target`);
    batches.push(b.json);
    rejected.push(partB);
  }
  return { eng, system, mold, device: device.json, batches, rejected };
}

async function batchState(token, id) {
  return (await apiCall(token, 'GET', `/batches/${id}`)).json?.state;
}

const queueFor = (batchId) => `${BASE_URL}/#/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', batchId }))}`;

/** The engineer works the queue with the keyboard: waives one rejection and releases, upholds another and scraps. */
async function engineerWorksTheReviewQueue({ newPage }) {
  const s = await shopFloorScenario();
  const [toWaive, toScrap] = s.batches;
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="readings"]').click();
  await page.getByRole('heading', { name: 'Review queue', level: 1 }).waitFor();
  await page.getByTestId('queue-keys').waitFor();
  await page.getByTestId('queue-row').first().waitFor();
  await page.getByTestId('reading-panel').waitFor();
  // j and k move the selection
  if ((await page.getByTestId('queue-row').count()) > 1) {
    const selected = () => page.locator('[data-testid="queue-row"][aria-selected="true"]').getAttribute('data-reading-id');
    const first = await selected();
    await page.keyboard.press('j');
    await page.waitForFunction((id) => document.querySelector('[data-testid="queue-row"][aria-selected="true"]')?.getAttribute('data-reading-id') !== id, first);
    await page.keyboard.press('k');
    await page.waitForFunction((id) => document.querySelector('[data-testid="queue-row"][aria-selected="true"]')?.getAttribute('data-reading-id') === id, first);
  }
  await shot(page, 'review-queue');

  // waive: the note is required, then the batch can be released from the queue
  await page.goto(queueFor(toWaive.id));
  const row = page.locator(`[data-reading-id="${s.rejected[0].id}"]`);
  await row.waitFor();
  await row.click();
  await page.getByTestId('reading-panel').getByText('A:B ratio off').first().waitFor();
  await page.keyboard.press('w');
  const dialog = page.getByRole('dialog');
  await dialog.getByText('Waive this rejection').waitFor();
  await dialog.getByTestId('review-confirm').click();
  await dialog.getByText(/Say why this deviation is acceptable/).waitFor();
  await dialog.getByTestId('review-note').fill('Cup test within spec; parts checked by QA (browser suite).');
  await shot(page, 'review-waive-dialog');
  await page.keyboard.press('Control+Enter');
  await dialog.waitFor({ state: 'detached' });
  await row.getByText('Waived').waitFor();
  expectEqual(await batchState(s.eng, toWaive.id), 'on_hold', 'state of the waived batch before release');
  await page.getByTestId('release-from-queue').click();
  for (let i = 0; i < 40 && (await batchState(s.eng, toWaive.id)) !== 'released'; i++) await page.waitForTimeout(150);
  expectEqual(await batchState(s.eng, toWaive.id), 'released', 'state of the waived batch after release');

  // uphold and scrap
  await page.goto(queueFor(toScrap.id));
  const row2 = page.locator(`[data-reading-id="${s.rejected[1].id}"]`);
  await row2.waitFor();
  await row2.click();
  await page.keyboard.press('u');
  await dialog.getByText('Uphold this rejection').waitFor();
  await dialog.getByTestId('review-note').fill('Isocyanate side 12 % heavy: parts too hard (browser suite).');
  await dialog.getByTestId('review-scrap').check();
  await shot(page, 'review-uphold-dialog');
  await dialog.getByRole('button', { name: 'Uphold and scrap' }).click();
  await dialog.waitFor({ state: 'detached' });
  await row2.getByText('Upheld').waitFor();
  expectEqual(await batchState(s.eng, toScrap.id), 'scrapped', 'state of the batch whose rejection was upheld with scrap');

  // the batch pages tell the same story
  await page.goto(`${BASE_URL}/#/batches/${toWaive.id}/show`);
  const timeline = page.getByTestId('batch-timeline');
  await timeline.getByText('Released', { exact: true }).waitFor();
  for (const state of ['Planned', 'Weighing', 'On hold']) await timeline.getByText(state, { exact: true }).waitFor();
  await page.getByTestId('batch-reviews').getByText(/Waived/).waitFor();
  await page.getByTestId('bar-Part A').waitFor();
  await shot(page, 'batch-released');
  await page.goto(`${BASE_URL}/#/batches/${toScrap.id}/show`);
  await page.getByTestId('batch-timeline').getByText('Scrapped', { exact: true }).waitFor();
  await shot(page, 'batch-scrapped');
}

/** The batch list, a batch's detail and its printable pour sheet. */
async function batchesAndPourSheet({ newPage }) {
  const eng = await apiToken('engineer');
  const seeded = (await apiCall(eng, 'GET', `/batches?${listQuery({})}`)).json.find((b) => b.notes === 'Demo batch: first seat cushion of the order');
  expect(seeded, 'the demo seed has no seat cushion batch');
  const targets = (await apiCall(eng, 'GET', `/batches/${seeded.id}/targets`)).json;
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="batches"]').click();
  await page.getByRole('heading', { name: 'Batches', level: 1 }).waitFor();
  await page.locator('tbody tr').first().waitFor();
  await shot(page, 'batches');
  await page.goto(`${BASE_URL}/#/batches/${seeded.id}/show`);
  await page.getByTestId('weighed-section').waitFor();
  expectEqual(await page.getByTestId('mass-A').getAttribute('data-value'), String(targets.components.A.mass.value), 'part A target on the batch page');
  await shot(page, 'batch-planned');
  await page.getByTestId('open-pour-sheet').click();
  const sheet = page.getByTestId('pour-sheet');
  await sheet.waitFor();
  await sheet.getByTestId('cautions').waitFor();
  await sheet.getByTestId('signatures').waitFor();
  expect((await sheet.innerText()).includes('DF28-A-0117'), 'the pour sheet does not name the part A lot');
  expect(/SDS/.test(await sheet.innerText()), 'the pour sheet does not point to the SDS');
  await shot(page, 'pour-sheet');
  await page.emulateMedia({ media: 'print' });
  expect(!(await page.locator('header.MuiAppBar-root').isVisible()), 'the app bar is printed on the pour sheet');
  expect(!(await page.getByTestId('print-sheet').isVisible()), 'the print button is printed on the pour sheet');
  await page.screenshot({ path: path.join(SHOTS, 'pour-sheet-print.png'), fullPage: true });
  await page.emulateMedia({ media: 'screen' });
}

/** The calculator shows exactly the figures POST /v1/targets/preview answers, in metric and imperial. */
async function calculatorMatchesTheApi({ newPage }) {
  const eng = await apiToken('engineer');
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const molds = (await apiCall(eng, 'GET', `/molds?${listQuery({})}`)).json;
  const system = systems.find((s) => s.name === 'Demo Flex 28');
  const mold = molds.find((m) => m.name === 'Seat cushion');
  const body = { system: { id: system.id }, mold: { id: mold.id }, options: { packFactor: 1.8, pigmentPercent: 2 } };

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="calculator"]').click();
  await page.getByRole('heading', { name: 'Targets calculator', level: 1 }).waitFor();
  await page.getByTestId('calc-system').click();
  await page.getByRole('option', { name: /Demo Flex 28/ }).click();
  await page.getByTestId('calc-mold').click();
  await page.getByRole('option', { name: /Seat cushion/ }).click();
  await page.getByTestId('calc-density-pack').click();
  await page.getByTestId('calc-packFactor').fill('1.8');
  await page.getByTestId('calc-pigmentPercent').fill('2');

  for (const units of ['metric', 'imperial']) {
    if (units === 'imperial') await page.getByTestId('units-imperial').click();
    const api = await apiCall(eng, 'POST', `/targets/preview?units=${units}`, body);
    expectEqual(api.status, 200, `POST /v1/targets/preview?units=${units}`);
    const wanted = {
      'mass-A': api.json.components.A.mass,
      'mass-B': api.json.components.B.mass,
      'mass-pigment': api.json.components.pigment.mass,
      'fig-total-mass': api.json.totalMass,
      'fig-target-density': api.json.targetDensity,
    };
    const read = () =>
      page.evaluate((ids) => Object.fromEntries(ids.map((id) => {
        const el = document.querySelector(`[data-testid="${id}"]`);
        return [id, el ? { value: Number(el.getAttribute('data-value')), unit: el.getAttribute('data-unit') } : null];
      })), Object.keys(wanted));
    let shown = null;
    for (let i = 0; i < 60; i++) {
      shown = await read();
      if (Object.entries(wanted).every(([id, q]) => shown[id]?.value === q.value && shown[id]?.unit === q.unit)) break;
      await page.waitForTimeout(200);
    }
    for (const [id, q] of Object.entries(wanted)) expectEqual(shown[id], { value: q.value, unit: q.unit }, `${id} in ${units}`);
    // what a person reads is that number, rounded
    const text = await page.getByTestId('mass-A').innerText();
    const decimals = units === 'metric' ? 1 : 3;
    expect(text.replace(/,/g, '').includes(wanted['mass-A'].value.toFixed(decimals)), `part A shows "${text}", not ${wanted['mass-A'].value.toFixed(decimals)}`);
    await page.getByTestId('cautions').waitFor();
    await shot(page, `calculator-${units}`);
  }
}

/** A logger CSV goes up, the progress bar reaches 100 %, the bad rows are listed, and a re-upload is recognised. */
async function csvImportReachesTheEnd({ newPage }) {
  const admin = await apiToken('admin');
  const eng = await apiToken('engineer');
  const stamp = Date.now().toString(36);
  const device = await apiCall(admin, 'POST', '/devices', { kind: 'thermometer', serial: `SUITE-T-${stamp}`, name: `Suite logger ${stamp}`, stationCode: 'S9' });
  expectEqual(device.status, 201, 'registering the suite logger');
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const planned = await apiCall(eng, 'POST', '/batches', { materialSystemId: systems.find((x) => x.name === 'Demo Flex 28').id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expectEqual(planned.status, 201, 'planning a batch for the imported readings');
  const batch = planned.json;
  const header = 'batch_id,device_id,client_reading_id,quantity,subject,value,unit,stable,device_time';
  const rows = [];
  for (let i = 0; i < 40; i++) rows.push([batch.id, device.json.id, `suite-${stamp}-${i}`, 'temperature', 'part_a', (21 + (i % 5) * 0.3).toFixed(1), 'degC', 'true', new Date(Date.now() - (40 - i) * 60_000).toISOString()].join(','));
  rows.splice(12, 0, [batch.id, device.json.id, `suite-${stamp}-bad-1`, 'temperature', 'part_a', 'warm', 'degC', 'true', ''].join(','));
  rows.splice(25, 0, [batch.id, device.json.id, `suite-${stamp}-bad-2`, 'temperature', 'part_b', '22.0', 'furlong', 'true', ''].join(','));
  const file = { name: `logger-${stamp}.csv`, mimeType: 'text/csv', buffer: Buffer.from([header, ...rows].join('\n') + '\n') };

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="imports"]').click();
  await page.getByRole('heading', { name: 'Logger imports', level: 1 }).waitFor();
  await shot(page, 'imports');
  await page.getByTestId('import-file').setInputFiles(file);
  await page.getByTestId('import-progress').waitFor();
  await page.getByTestId('import-percent').getByText('100 %').waitFor({ timeout: 60_000 });
  await page.getByTestId('import-progress').getByText('Finished').waitFor();
  const bad = page.getByTestId('bad-rows');
  await bad.waitFor();
  expectEqual(await bad.locator('tbody tr').count(), 2, 'bad rows listed');
  expectEqual(await page.getByTestId('import-accepted').innerText(), '40', 'readings accepted from the file');
  await page.waitForTimeout(600); // the bar's last step animates
  await shot(page, 'imports-done');
  await page.getByTestId('import-file').setInputFiles(file);
  await page.getByTestId('import-replayed').waitFor();
}

// ---------------------------------------------------------------- shop data and integration (devices, webhooks, profile)

/** A stand-in receiver on loopback: answers 200 with a short JSON body and keeps what it got. */
async function startTestReceiver() {
  const http = await import('node:http');
  const received = [];
  const server = http.createServer((req, res) => {
    let body = '';
    req.on('data', (c) => (body += c));
    req.on('end', () => {
      received.push({ headers: req.headers, body });
      res.writeHead(200, { 'Content-Type': 'application/json' });
      res.end(JSON.stringify({ received: true, by: 'suite receiver' }));
    });
  });
  await new Promise((r) => server.listen(0, '127.0.0.1', r));
  return { url: `http://127.0.0.1:${server.address().port}/hooks/pourgate`, received, close: () => new Promise((r) => server.close(r)) };
}

async function until(what, check, timeoutMs = 20_000) {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const got = await check();
    if (got) return got;
    if (Date.now() > end) throw new Check(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

/**
 * The integrator adds an endpoint pointing at a local receiver, sees its signing secret once,
 * sends a test and reads the receiver's answer, then finds a real event's delivery in the log and
 * replays it (same webhook-id).
 */
async function integratorWiresWebhooks({ newPage }) {
  const receiver = await startTestReceiver();
  try {
    const page = await newPage();
    await signIn(page, 'integrator');
    await page.locator('[data-menu-entry="webhook-endpoints"]').click();
    await page.getByRole('heading', { name: 'Webhooks', level: 1 }).waitFor();
    await page.getByTestId('add-endpoint').first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Receiver URL').fill(receiver.url);
    await dialog.getByLabel('Description').fill('Suite receiver (ERP stand-in)');
    await dialog.getByRole('button', { name: 'Add endpoint' }).click();
    const secret = (await dialog.getByTestId('api-key-secret').innerText()).trim();
    expect(secret.startsWith('whsec_'), `the signing secret does not look like whsec_…: ${secret.slice(0, 8)}`);
    await dialog.getByText('You will not see this secret again').waitFor();
    await shot(page, 'webhook-secret-once');
    await dialog.getByTestId('secret-stored').check();
    await dialog.getByTestId('secret-done').click();
    await dialog.waitFor({ state: 'detached' });

    const row = page.locator('tbody tr', { has: page.getByText(receiver.url, { exact: true }) });
    await row.waitFor();
    expect(!(await page.locator('body').innerText()).includes(secret), 'the signing secret is still on the page after Done');
    await row.getByTestId('send-test').click();
    const testDialog = page.getByRole('dialog');
    await testDialog.getByTestId('test-verdict').waitFor();
    expectEqual((await testDialog.getByTestId('test-verdict').innerText()).trim(), 'Receiver answered 200', 'verdict of the test send');
    expect((await testDialog.getByTestId('test-snippet').innerText()).includes('suite receiver'), 'the receiver’s answer is not shown');
    const test = receiver.received.find((r) => r.body.includes('"webhook.test"'));
    expect(test && /^v1,/.test(String(test.headers['webhook-signature'])), 'the receiver got no signed webhook.test');
    await shot(page, 'webhook-test-answer');
    await testDialog.getByRole('button', { name: 'Close' }).click();

    // a real event: the engineer posts a work order; the relay delivers work_order.created
    const eng = await apiToken('engineer');
    const ref = `WO-SUITE-${Date.now().toString(36)}`;
    const posted = await apiCall(eng, 'POST', '/work-orders', { externalRef: ref, quantity: 4, notes: 'browser suite' });
    expectEqual(posted.status, 201, 'posting a work order');
    const delivered = await until('the work_order.created delivery', () => receiver.received.find((r) => r.body.includes(ref)));
    const webhookId = delivered.headers['webhook-id'];

    await page.locator('[data-menu-entry="webhook-deliveries"]').click();
    await page.getByRole('heading', { name: 'Delivery log', level: 1 }).waitFor();
    // this run's endpoint only: earlier runs may have left endpoints of their own
    const logRow = page.locator('tbody tr', { has: page.getByText(receiver.url, { exact: true }) }).filter({ hasText: 'work_order.created' }).first();
    await until('a delivered row in the log', async () => {
      if ((await logRow.count()) && (await logRow.getByText('Delivered').count())) return true;
      await page.getByRole('button', { name: 'Refresh' }).first().click().catch(() => undefined);
      return false;
    });
    expectEqual((await logRow.getByTestId('delivery-code').innerText()).trim(), '200', 'response code in the delivery log');
    await shot(page, 'webhook-delivery-log');
    await logRow.getByTestId('delivery-attempts').click();
    await page.getByTestId('attempts').getByText('200').first().waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Close' }).click();
    await logRow.getByTestId('replay-delivery').click();
    await page.getByText(/Queued again with the same webhook-id/).waitFor();
    await until('the replayed delivery', () => receiver.received.filter((r) => r.headers['webhook-id'] === webhookId).length >= 2);
  } finally {
    await receiver.close();
    // leave no endpoint behind that points at a receiver which is gone
    const token = await apiToken('integrator').catch(() => null);
    if (token) {
      const mine = await apiCall(token, 'GET', `/webhook-endpoints?${listQuery({ q: receiver.url })}`);
      for (const e of mine.json ?? []) if (e.url === receiver.url) await apiCall(token, 'DELETE', `/webhook-endpoints/${e.id}`);
    }
  }
}

/** The integrator registers a scale whose calibration is past due and sees it flagged. */
async function integratorRegistersOverdueScale({ newPage }) {
  const page = await newPage();
  await signIn(page, 'integrator');
  await page.locator('[data-menu-entry="devices"]').click();
  await page.getByRole('heading', { name: 'Devices', level: 1 }).waitFor();
  await page.getByTestId('register-device').first().click();
  const serial = `SUITE-SC-${Date.now().toString(36)}`;
  await page.getByLabel('Serial number').fill(serial);
  await page.getByLabel('Name', { exact: false }).first().fill('Suite bench scale');
  await page.getByLabel('Station').fill('S4');
  await page.getByRole('spinbutton', { name: /Readability/ }).fill('0.1');
  await page.getByRole('spinbutton', { name: /Capacity/ }).fill('6');
  await page.getByLabel('Calibration due').fill('2026-01-15');
  await page.getByRole('button', { name: 'Register device' }).click();
  const row = page.locator('tbody tr', { has: page.getByText(serial) });
  await row.waitFor();
  await row.getByTestId('calibration-overdue').waitFor();
  expect((await row.innerText()).includes('d = 0.1 g'), 'the readability is not shown in grams');
  await shot(page, 'devices');
}

/**
 * The engineer records a lot that expires soon (highlighted), is told on the field itself when a
 * lot number is already recorded (problem+json pointer), and adds a mold with the volume helper.
 */
async function engineerRecordsLotAndMold({ newPage, allowConsoleError }) {
  allowConsoleError(/409|Conflict/);
  const page = await newPage();
  await signIn(page, 'engineer');
  const today = new Date();
  const iso = (d) => d.toISOString().slice(0, 10);
  const pickSystem = async (name) => {
    await page.getByRole('combobox', { name: /Material system/ }).fill(name);
    await page.getByRole('option', { name }).click();
  };

  await page.locator('[data-menu-entry="lots"]').click();
  await page.getByRole('heading', { name: 'Lots', level: 1 }).waitFor();
  await page.getByTestId('new-lot').first().click();
  await pickSystem('Demo Flex 28');
  await page.getByLabel('Lot number').fill('DF28-A-0117');
  await page.getByLabel('Use by').fill(iso(new Date(today.getTime() + 10 * 86_400_000)));
  await page.getByRole('button', { name: 'Save lot' }).click();
  // the API answers 409 with a pointer at /lotNumber: the message sits under that input
  await page.getByText('already recorded for this part').waitFor();
  const lot = `DF28-A-S${Date.now().toString(36).slice(-5).toUpperCase()}`;
  await page.getByLabel('Lot number').fill(lot);
  await page.getByRole('button', { name: 'Save lot' }).click();
  const row = page.locator('tbody tr', { has: page.getByText(lot) });
  await row.waitFor();
  expectEqual(await row.locator('[data-expiry]').getAttribute('data-expiry'), 'soon', 'expiry state of a lot due in 10 days');
  await page.getByTestId('expiring-soon').click();
  await page.locator('[data-testid="expiring-soon"][aria-pressed="true"]').waitFor();
  await until('only lots expiring soon', async () => (await page.locator('[data-expiry="ok"]').count()) === 0 && (await row.count()) === 1);
  await shot(page, 'lots-expiring-soon');

  await page.locator('[data-menu-entry="molds"]').click();
  await page.getByRole('heading', { name: 'Molds', level: 1 }).waitFor();
  await page.getByTestId('new-mold').first().click();
  const name = `Suite pad ${Date.now().toString(36)}`;
  await page.getByLabel('Name').first().fill(name);
  await page.getByRole('spinbutton', { name: /^Length/ }).fill('300');
  await page.getByRole('spinbutton', { name: /^Width/ }).fill('200');
  await page.getByRole('spinbutton', { name: /^Height/ }).fill('50');
  // 300 × 200 × 50 mm = 3 L
  await page.getByTestId('total-volume').getByText('3 L').waitFor();
  await page.getByLabel('Water fill').check();
  await page.getByRole('spinbutton', { name: /Water mass/ }).fill('2.5');
  await page.getByRole('spinbutton', { name: /Water temperature/ }).fill('20');
  // 2.5 kg ÷ 998.204 kg/m³ (water at 20 °C) = 2.50450 L, shown to 4 digits
  await page.getByTestId('total-volume').getByText('2.504 L').waitFor();
  await page.getByRole('spinbutton', { name: /Cavities/ }).fill('2');
  await page.getByTestId('total-volume').getByText('5.009 L').waitFor();
  await shot(page, 'mold-volume-helper');
  await page.getByRole('button', { name: 'Save mold' }).click();
  const moldRow = page.locator('tbody tr', { has: page.getByText(name) });
  await moldRow.waitFor();
  expect((await moldRow.innerText()).includes('Water fill 2.5 kg at 20 °C'), 'the mold list does not say how it was measured');
  await shot(page, 'molds');

  await page.locator('[data-menu-entry="material-systems"]').click();
  await page.locator('tbody tr', { has: page.getByText('Demo Flex 28') }).click();
  await page.getByTestId('revisions').waitFor();
  await page.getByTestId('sds-caution').waitFor();
  // the supplier's SDS, attached here, is one click away for everyone who reads the system
  await page.locator('input[type="file"][aria-label="PDF to upload"]').setInputFiles({ name: 'demo-flex-28-sds.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4\n% invented demo SDS\n%%EOF\n') });
  const sds = page.getByTestId('document-link').filter({ hasText: 'SDS' }).first();
  await sds.waitFor();
  const [download] = await Promise.all([page.waitForEvent('download'), sds.click()]);
  expect(download.suggestedFilename().endsWith('.pdf'), `the SDS downloads as ${download.suggestedFilename()}`);
  await shot(page, 'material-system');
}

/** The engineer records a cup test in shop units; it lands in the list in SI-backed figures. */
async function engineerRecordsCupTest({ newPage }) {
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="qc-cup-tests"]').click();
  await page.getByRole('heading', { name: 'Cup tests', level: 1 }).waitFor();
  await page.getByRole('link', { name: 'Record a cup test' }).first().click();
  await page.getByRole('heading', { name: 'Record a cup test', level: 1 }).waitFor();
  await page.getByRole('combobox', { name: /Material system/ }).fill('Demo Flex 28');
  await page.getByRole('option', { name: 'Demo Flex 28' }).click();
  await page.getByRole('spinbutton', { name: /Part A temperature/ }).fill('22');
  await page.getByRole('spinbutton', { name: /Part B temperature/ }).fill('22.5');
  await page.getByRole('spinbutton', { name: /Cream time/ }).fill('12');
  await page.getByRole('spinbutton', { name: /Top-of-cup time/ }).fill('75');
  await page.getByRole('spinbutton', { name: /Tack-free time/ }).fill('141');
  await page.getByRole('spinbutton', { name: /Free-rise density/ }).fill('28.3');
  await shot(page, 'cup-test-form');
  await page.getByRole('button', { name: 'Save cup test' }).click();
  await page.getByText('Cup test of Demo Flex 28 recorded.').waitFor();
  const row = page.locator('tbody tr', { has: page.getByText('2 min 21 s') }).first();
  await row.waitFor();
  expect((await row.innerText()).includes('28.3 kg/m³'), 'the new cup test is not listed with its density');
  await shot(page, 'cup-tests');
}

/** Everyone keeps their own profile: the engineer switches rejection mail to a daily digest. */
async function engineerSetsNotifications({ newPage }) {
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="profile"]').click();
  await page.getByRole('heading', { name: 'Your profile', level: 1 }).waitFor();
  expectEqual((await page.getByTestId('profile-email').innerText()).trim(), 'engineer@demo.test', 'e-mail on the profile');
  await page.getByLabel('One summary a day').check();
  await page.getByRole('button', { name: 'Save preferences' }).click();
  await page.getByText('Profile saved.').waitFor();
  const eng = await apiToken('engineer');
  const me = await apiCall(eng, 'GET', '/me');
  expectEqual(me.json.notifyRejections, 'digest', 'notifyRejections after saving');
  await shot(page, 'profile');
  await apiCall(eng, 'PATCH', '/me', { notifyRejections: 'each' });
}

/** The shop-data and integration pages, for the accessibility scan. */
async function scanShopAndIntegrationPages(newPage) {
  const eng = await newPage();
  await signIn(eng, 'engineer');
  for (const [entry, heading] of [
    ['material-systems', 'Material systems'],
    ['lots', 'Lots'],
    ['molds', 'Molds'],
    ['work-orders', 'Work orders'],
    ['qc-cup-tests', 'Cup tests'],
    ['profile', 'Your profile'],
  ]) {
    await eng.locator(`[data-menu-entry="${entry}"]`).click();
    await eng.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await eng.locator('tbody tr, [data-testid="empty-state"], form').first().waitFor();
    await eng.waitForLoadState('networkidle');
    await axeScan(eng, entry);
  }
  for (const [route, label] of [['/molds/create', 'new mold'], ['/lots/create', 'new lot'], ['/qc-cup-tests/create', 'new cup test']]) {
    await eng.goto(`${BASE_URL}/#${route}`);
    await eng.locator('form').first().waitFor();
    await eng.waitForLoadState('networkidle');
    await axeScan(eng, label);
  }
  const int = await newPage();
  await signIn(int, 'integrator');
  for (const [entry, heading] of [
    ['devices', 'Devices'],
    ['webhook-endpoints', 'Webhooks'],
    ['webhook-deliveries', 'Delivery log'],
  ]) {
    await int.locator(`[data-menu-entry="${entry}"]`).click();
    await int.getByRole('heading', { name: heading, level: 1 }).waitFor();
    await int.locator('tbody tr, [data-testid="empty-state"]').first().waitFor();
    await int.waitForLoadState('networkidle');
    await axeScan(int, entry);
  }
  await int.locator('[data-menu-entry="webhook-endpoints"]').click();
  await int.getByTestId('add-endpoint').first().click();
  await int.getByRole('dialog').getByLabel('Receiver URL').waitFor();
  await axeScan(int, 'add-endpoint dialog');
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
  integratorRegistersOverdueScale,
  integratorWiresWebhooks,
  engineerRecordsLotAndMold,
  engineerSetsNotifications,
  engineerRecordsCupTest,
  engineerWorksTheReviewQueue,
  batchesAndPourSheet,
  calculatorMatchesTheApi,
  csvImportReachesTheEnd,
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
