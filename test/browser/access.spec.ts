// Signing in, the menu each role sees, refusals, signing out and deep links.
import { test, expect, check, ROLES, BASE_URL, PEOPLE, PASSWORD, signIn, menuEntries, shot, settled } from './support.js';

/** Each demo person signs in and sees exactly the menu their role allows. */
for (const who of ROLES) {
  test(`${who} sees their menu`, async ({ newPage }) => {
    const page = await newPage();
    await signIn(page, who);
    expect(await menuEntries(page), `menu of ${who}`).toEqual(PEOPLE[who].menu);
    const docs = page.locator('[data-menu-entry="docs"]');
    if (PEOPLE[who].menu.includes('docs')) expect(await docs.getAttribute('href'), `API reference link of ${who}`).toEqual('/docs');
    await page.getByTestId('safety-note').waitFor();
    // every role reads the shop floor: let its figures and charts arrive before the picture
    await page.getByTestId('floor-panel').waitFor();
    await settled(page);
    await shot(page, `overview-${who}`);
  });
}

/** A viewer who types an admin address lands on a refusal, not on the data. */
test('viewer cannot open admin pages', async ({ newPage }) => {
  const page = await newPage();
  await signIn(page, 'viewer');
  let asked = false;
  page.on('request', (r) => {
    if (/\/v1\/(users|api-keys|audit-events)\b/.test(r.url())) asked = true;
  });
  await page.goto(`${BASE_URL}/#/users`);
  await page.getByTestId('no-access').waitFor({ timeout: 10_000 });
  check(!asked, 'the console asked the API for people on behalf of a viewer');
  await shot(page, 'viewer-access-denied');
});

/** Wrong credentials: a clear message, no way in. */
test('wrong password is refused', async ({ newPage, allowConsoleError }) => {
  allowConsoleError(/401|Unauthorized/);
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/login`);
  await page.locator('input[name="email"]').fill('nobody@demo.test');
  await page.locator('input[name="password"]').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  const alert = page.getByTestId('sign-in-error');
  await alert.waitFor();
  check(/do not match/.test(await alert.innerText()), 'the refusal does not say the credentials do not match');
  check((await page.locator('[data-menu-entry]').count()) === 0, 'a menu is shown after a refused sign-in');
  await shot(page, 'sign-in-refused');
});

/** Signing out ends the session: the console goes back to sign-in and stays there. */
test('sign out ends the session', async ({ newPage }) => {
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
  expect(await page.locator('[data-menu-entry]').count(), 'menu entries after signing out').toEqual(0);
});

/** A link into the console opened without a session asks to sign in, then opens that page. */
test('deep link returns after sign in', async ({ newPage }) => {
  const page = await newPage();
  let frameFetched = false;
  page.on('request', (r) => {
    if (/\/assets\/Layout-[^/]+\.js$/.test(r.url())) frameFetched = true;
  });
  await page.goto(`${BASE_URL}/#/audit-events`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  check(!frameFetched, 'the signed-in frame was fetched before signing in');
  await page.locator('input[name="email"]').fill(PEOPLE.admin.email);
  await page.locator('input[name="password"]').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Audit log', level: 1 }).waitFor();
  check(new URL(page.url()).hash.startsWith('#/audit-events'), `landed on ${page.url()} instead of the audit log`);
});

