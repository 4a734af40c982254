// Shop data and integration: devices, webhooks, lots, molds, cup tests, the profile.
import { test, expect, check, signIn, shot, apiToken, apiCall, listQuery, until, startTestReceiver } from './support.js';

/** The integrator registers a scale whose calibration is past due and sees it flagged. */
test('integrator registers overdue scale', async ({ newPage }) => {
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
  check((await row.innerText()).includes('d = 0.1 g'), 'the readability is not shown in grams');
  await shot(page, 'devices');
});

/**
 * The integrator adds an endpoint pointing at a local receiver, sees its signing secret once,
 * sends a test and reads the receiver's answer, then finds a real event's delivery in the log and
 * replays it (same webhook-id).
 */
test('integrator wires webhooks', async ({ newPage }) => {
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
    check(secret.startsWith('whsec_'), `the signing secret does not look like whsec_…: ${secret.slice(0, 8)}`);
    await dialog.getByText('You will not see this secret again').waitFor();
    await shot(page, 'webhook-secret-once');
    await dialog.getByTestId('secret-stored').check();
    await dialog.getByTestId('secret-done').click();
    await dialog.waitFor({ state: 'detached' });

    const row = page.locator('tbody tr', { has: page.getByText(receiver.url, { exact: true }) });
    await row.waitFor();
    check(!(await page.locator('body').innerText()).includes(secret), 'the signing secret is still on the page after Done');
    await row.getByTestId('send-test').click();
    const testDialog = page.getByRole('dialog');
    await testDialog.getByTestId('test-verdict').waitFor();
    expect((await testDialog.getByTestId('test-verdict').innerText()).trim(), 'verdict of the test send').toEqual('Receiver answered 200');
    check((await testDialog.getByTestId('test-snippet').innerText()).includes('suite receiver'), 'the receiver’s answer is not shown');
    const test = receiver.received.find((r) => r.body.includes('"webhook.test"'));
    check(test && /^v1,/.test(String(test.headers['webhook-signature'])), 'the receiver got no signed webhook.test');
    await shot(page, 'webhook-test-answer');
    await testDialog.getByRole('button', { name: 'Close' }).click();

    // a real event: the engineer posts a work order; the relay delivers work_order.created
    const eng = await apiToken('engineer');
    const ref = `WO-SUITE-${Date.now().toString(36)}`;
    const posted = await apiCall(eng, 'POST', '/work-orders', { externalRef: ref, quantity: 4, notes: 'browser suite' });
    expect(posted.status, 'posting a work order').toEqual(201);
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
    expect((await logRow.getByTestId('delivery-code').innerText()).trim(), 'response code in the delivery log').toEqual('200');
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
});

/**
 * The engineer records a lot that expires soon (highlighted), is told on the field itself when a
 * lot number is already recorded (problem+json pointer), and adds a mold with the volume helper.
 */
test('engineer records lot and mold', async ({ newPage, allowConsoleError }) => {
  allowConsoleError(/409|Conflict/);
  const page = await newPage();
  await signIn(page, 'engineer');
  const today = new Date();
  const iso = (d: Date) => d.toISOString().slice(0, 10);
  const pickSystem = async (name: string) => {
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
  expect(await row.locator('[data-expiry]').getAttribute('data-expiry'), 'expiry state of a lot due in 10 days').toEqual('soon');
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
  check((await moldRow.innerText()).includes('Water fill 2.5 kg at 20 °C'), 'the mold list does not say how it was measured');
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
  check(download.suggestedFilename().endsWith('.pdf'), `the SDS downloads as ${download.suggestedFilename()}`);
  await shot(page, 'material-system');
});

/** Everyone keeps their own profile: the engineer switches rejection mail to a daily digest. */
test('engineer sets notifications', async ({ newPage }) => {
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="profile"]').click();
  await page.getByRole('heading', { name: 'Your profile', level: 1 }).waitFor();
  expect((await page.getByTestId('profile-email').innerText()).trim(), 'e-mail on the profile').toEqual('engineer@demo.test');
  await page.getByLabel('One summary a day').check();
  await page.getByRole('button', { name: 'Save preferences' }).click();
  await page.getByText('Profile saved.').waitFor();
  const eng = await apiToken('engineer');
  const me = await apiCall(eng, 'GET', '/me');
  expect(me.json.notifyRejections, 'notifyRejections after saving').toEqual('digest');
  await shot(page, 'profile');
  await apiCall(eng, 'PATCH', '/me', { notifyRejections: 'each' });
});

/** The engineer records a cup test in shop units; it lands in the list in SI-backed figures. */
test('engineer records cup test', async ({ newPage }) => {
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
  check((await row.innerText()).includes('28.3 kg/m³'), 'the new cup test is not listed with its density');
  await shot(page, 'cup-tests');
});

