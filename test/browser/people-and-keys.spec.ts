// API keys, people, invitations and the audit log (admin and integrator).
import { test, expect, check, BASE_URL, PEOPLE, signIn, menuEntries, shot, apiToken, invitationToken } from './support.js';

/** The admin issues a key, sees the secret once, the secret works, then revokes it and it stops. */
test('admin issues and revokes key', async ({ newPage }) => {
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
  check(/^pg[di]_(live|test)_[A-Za-z0-9_-]{43}$/.test(secret), `the secret does not look like a key: ${secret.slice(0, 12)}…`);
  check(await page.getByText('You will not see this secret again').isVisible(), 'no once-only warning next to the secret');
  await shot(page, 'api-key-secret-once');
  check(await page.getByTestId('secret-done').isDisabled(), '"Done" is enabled before the person confirms storing the secret');
  await page.getByTestId('secret-stored').check();
  await page.getByTestId('secret-done').click();
  await secretBox.waitFor({ state: 'detached' });
  check(!(await page.content()).includes(secret), 'the secret is still in the page after closing the dialog');

  // the key is listed, with its prefix and never used
  const row = page.getByRole('row', { name: new RegExp(name) });
  await row.waitFor();
  check(await row.getByText('Never used').isVisible(), 'a fresh key does not show "Never used"');
  check((await row.innerText()).includes(secret.slice(0, 16)), 'the row does not show the key prefix');

  // the secret authenticates (devices:read was granted)
  const before = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
  expect(before.status, 'GET /v1/devices with the new key').toEqual(200);

  // reload: the secret is gone for good
  await page.reload();
  await row.waitFor();
  check(!(await page.content()).includes(secret), 'the secret came back after a reload');

  await row.getByRole('button', { name: `Revoke ${name}` }).click();
  const confirm = page.getByRole('dialog');
  await confirm.getByText(`Revoke “${name}”?`).waitFor();
  await shot(page, 'api-key-revoke-confirm');
  await confirm.getByRole('button', { name: 'Revoke key' }).click();
  // revoked keys leave the list; "Show revoked keys" brings them back, marked
  await row.waitFor({ state: 'detached' });
  await page.getByTestId('show-revoked').check();
  await row.getByText('Revoked', { exact: true }).first().waitFor();
  await shot(page, 'api-key-revoked');

  const after = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
  expect(after.status, 'GET /v1/devices with the revoked key').toEqual(401);
});

/** Rotation: a new secret at once, the old one keeps working through the grace period. */
test('admin rotates key with grace', async ({ newPage }) => {
  const token = await apiToken('admin');
  const name = `Browser suite logger ${Date.now().toString(36)}`;
  const created = await fetch(`${BASE_URL}/v1/api-keys`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
    body: JSON.stringify({ name, kind: 'device', environment: 'test', scopes: ['devices:read'] }),
  });
  expect(created.status, 'creating a key through the API').toEqual(201);
  const oldSecret = ((await created.json()) as { secret: string }).secret;

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
  check(newSecret !== oldSecret, 'rotation showed the old secret');
  await dialog.getByText(/keeps working for 1 hour/).waitFor();
  await shot(page, 'api-key-rotated-secret');
  await page.getByTestId('secret-stored').check();
  await page.getByTestId('secret-done').click();
  // one row for the key: the new secret's prefix, and the old one named as still accepted until the grace ends
  const keyRow = page.getByRole('row', { name: new RegExp(`${name}[\\s\\S]*${newSecret.slice(0, 16)}`) });
  await keyRow.getByTestId('grace-secret').waitFor();
  check((await keyRow.getByTestId('grace-secret').innerText()).includes(oldSecret.slice(0, 16)), 'the row does not name the old secret in its grace period');
  check(/still accepted until/.test(await keyRow.getByTestId('grace-secret').innerText()), 'the grace period has no end shown');
  check((await page.getByRole('row', { name: new RegExp(name) }).count()) === 1, 'a rotated key shows as more than one row');

  for (const [which, secret] of [['old', oldSecret], ['new', newSecret]]) {
    const r = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
    expect(r.status, `GET /v1/devices with the ${which} secret during the grace period`).toEqual(200);
  }
  await shot(page, 'api-key-grace');

  // revoking ends every secret of the key at once, the old one in its grace period too
  await keyRow.getByRole('button', { name: `Revoke ${name}` }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Revoke key' }).click();
  await keyRow.waitFor({ state: 'detached' });
  for (const [which, secret] of [['old', oldSecret], ['new', newSecret]]) {
    const r = await fetch(`${BASE_URL}/v1/devices`, { headers: { 'X-Api-Key': secret } });
    expect(r.status, `GET /v1/devices with the ${which} secret after the revoke`).toEqual(401);
  }
});

/** Integrators issue device keys only: the kind is preset and integration keys cannot be chosen. */
test('integrator issues device keys only', async ({ newPage }) => {
  const page = await newPage();
  await signIn(page, 'integrator');
  await page.locator('[data-menu-entry="api-keys"]').click();
  await page.getByTestId('issue-key').waitFor();
  expect(await page.getByTestId('issue-key').innerText(), 'integrator issue button').toEqual('Issue a device key');
  await page.getByTestId('issue-key').click();
  const dialog = page.getByRole('dialog');
  await dialog.getByTestId('kind-fixed').waitFor();
  expect(await dialog.getByRole('radio', { name: /Integration/ }).count(), 'integration choices offered to an integrator').toEqual(0);
  await shot(page, 'api-key-integrator-dialog');
  await dialog.getByRole('button', { name: 'Cancel' }).click();
});

/** The admin invites a colleague, who accepts from the mail, signs in, and is then disabled. */
test('invite accept and disable', async ({ newPage }) => {
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
  // the page says which shop, which role and which address before anything is typed
  const preview = guest.getByTestId('invitation-preview');
  await preview.waitFor();
  const offer = await preview.innerText();
  check(offer.includes(email), 'the invitation does not name the address');
  check(/engineer/i.test(offer), `the invitation does not name the role: ${offer}`);
  await shot(guest, 'accept-invitation-preview');
  await guest.locator('input[name="name"]').fill(name);
  await guest.locator('input[name="password"]').fill(password);
  await guest.locator('input[name="confirm"]').fill(`${password}-typo`);
  await guest.getByRole('button', { name: 'Create my account' }).click();
  await guest.getByText('The two passwords differ.').waitFor();
  await guest.locator('input[name="confirm"]').fill(password);
  await guest.getByRole('button', { name: 'Create my account' }).click();
  // accepting ends signed in, on the overview: no second sign-in
  await guest.getByTestId('floor-panel').waitFor();
  expect(await menuEntries(guest), 'menu of the new engineer').toEqual(PEOPLE.engineer.menu);
  await shot(guest, 'accept-invitation-signed-in');

  // the admin disables the newcomer; signing in is then refused
  await admin.locator('[data-menu-entry="users"]').click();
  const row = admin.getByRole('row', { name: new RegExp(name) });
  await row.getByRole('button', { name: `Disable ${name}` }).click();
  await admin.getByRole('dialog').getByRole('button', { name: 'Disable' }).click();
  await row.getByText('Disabled').waitFor();
  await shot(admin, 'people-disabled');
  const refused = await fetch(`${BASE_URL}/v1/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }) });
  expect(refused.status, 'sign-in of a disabled person').toEqual(401);
});

/** The admin's people and audit pages load, with filters, and an audit entry expands. */
test('admin reads people and audit', async ({ newPage }) => {
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
  // actions read in plain words; the raw code is kept for the details
  const signedIn = page.getByRole('row', { name: /Signed in/ }).first();
  await signedIn.waitFor();
  check(!(await page.locator('tbody').innerText()).includes('auth.signed_in'), 'the audit list shows raw action codes');
  await signedIn.getByRole('button', { name: /^Details of Signed in/ }).click();
  const details = page.getByRole('dialog').getByTestId('audit-details');
  await details.waitFor();
  check((await details.innerText()).includes('auth.signed_in'), 'the details do not give the action code');
  await shot(page, 'audit-log');
});

/** A broken invitation link explains itself: no token, or a token the API does not know. */
test('broken invitation links', async ({ newPage, allowConsoleError }) => {
  allowConsoleError(/status of 4\d\d/);
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/accept-invitation`);
  await page.getByTestId('invitation-missing-token').waitFor();
  await shot(page, 'accept-invitation-no-token');
  // a token the API does not know is refused as soon as the link opens, before any typing
  await page.goto(`${BASE_URL}/#/accept-invitation?token=suite-made-up-token`);
  const alert = page.getByTestId('invitation-spent');
  await alert.waitFor();
  check((await alert.innerText()).trim().length > 10, 'the refusal of an unknown token says nothing');
  await page.getByRole('link', { name: 'Go to sign-in' }).waitFor();
  await shot(page, 'accept-invitation-refused');
});

