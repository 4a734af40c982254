// Accessibility: axe-core (injected) finds no serious or critical problem on the console's pages.
import { test, type Page, BASE_URL, signIn, settled, apiToken, apiCall, listQuery, axeScan } from './support.js';

/** Accessibility: no serious or critical axe findings on the pages that exist. */
test('pages pass axe', async ({ newPage, allowConsoleError }) => {
  test.slow(); // some twenty pages, each scanned in full
  // the made-up invitation token below is refused by the API (410), which the browser logs
  allowConsoleError(/status of 4\d\d/);
  const page = await newPage();
  await page.goto(`${BASE_URL}/#/login`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  await axeScan(page, 'sign-in');
  await page.goto(`${BASE_URL}/#/accept-invitation`);
  await page.getByTestId('invitation-missing-token').waitFor();
  await axeScan(page, 'accept-invitation without token');
  await page.goto(`${BASE_URL}/#/accept-invitation?token=not-a-real-token-000`);
  await page.getByTestId('invitation-spent').waitFor();
  await axeScan(page, 'accept-invitation refused');

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
});


/** The shop-data and integration pages, for the accessibility scan. */
async function scanShopAndIntegrationPages(newPage: () => Promise<Page>) {
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

