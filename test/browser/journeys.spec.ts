// Issue-19 journeys on the API side, seen in the console: an import with a malformed id ends with
// its bad-row list, and a webhook test send is in the delivery log.
import { test, expect, signIn, shot, apiToken, apiCall, listQuery, startTestReceiver } from './support.js';

test('an import with a malformed batch_id ends, listing the row by its line', async ({ newPage }) => {
  const admin = await apiToken('admin');
  const eng = await apiToken('engineer');
  const stamp = Date.now().toString(36);
  const device = await apiCall(admin, 'POST', '/devices', { kind: 'thermometer', serial: `SUITE-TM-${stamp}`, name: `Suite probe ${stamp}`, stationCode: 'S9' });
  expect(device.status, 'registering the suite probe').toBe(201);
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const planned = await apiCall(eng, 'POST', '/batches', { materialSystemId: systems.find((x: { name: string }) => x.name === 'Demo Flex 28').id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(planned.status, 'planning a batch').toBe(201);
  const header = 'batch_id,device_id,client_reading_id,quantity,subject,value,unit';
  const csv = [header, `${planned.json.id},${device.json.id},suite-${stamp}-ok,temperature,part_a,21.5,degC`, `B-0042,${device.json.id},suite-${stamp}-bad,temperature,part_a,21.5,degC`].join('\n') + '\n';
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="imports"]').click();
  await page.getByRole('heading', { name: 'Logger imports', level: 1 }).waitFor();
  await page.getByTestId('import-file').setInputFiles({ name: `malformed-${stamp}.csv`, mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await page.getByTestId('import-percent').getByText('100 %').waitFor({ timeout: 60_000 });
  const bad = page.getByTestId('bad-rows');
  await bad.waitFor();
  await expect(bad.locator('tbody tr')).toHaveCount(1);
  await expect(bad.locator('tbody tr').first()).toContainText('3');
  await expect(bad.locator('tbody tr').first()).toContainText('batch_id');
  await expect(page.getByTestId('import-accepted')).toHaveText('1');
  await shot(page, 'imports-malformed-id');
});

test('a webhook test send appears in the delivery log', async ({ newPage }) => {
  const receiver = await startTestReceiver();
  const token = await apiToken('integrator');
  const ep = await apiCall(token, 'POST', '/webhook-endpoints', { url: receiver.url, description: 'Suite test-send receiver' });
  expect(ep.status, 'adding the endpoint').toBe(201);
  try {
    const page = await newPage();
    await signIn(page, 'integrator');
    await page.locator('[data-menu-entry="webhook-endpoints"]').click();
    const row = page.locator('tbody tr', { has: page.getByText(receiver.url, { exact: true }) });
    await row.getByTestId('send-test').click();
    await page.getByRole('dialog').getByTestId('test-verdict').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Close' }).click();
    await page.locator('[data-menu-entry="webhook-deliveries"]').click();
    await page.getByRole('heading', { name: 'Delivery log', level: 1 }).waitFor();
    const logRow = page.locator('tbody tr', { has: page.getByText(receiver.url, { exact: true }) }).filter({ hasText: 'webhook.test' });
    await expect(logRow).toHaveCount(1, { timeout: 20_000 });
    await expect(logRow.getByTestId('delivery-code')).toHaveText('200');
    await shot(page, 'webhook-test-in-log');
  } finally {
    await apiCall(token, 'DELETE', `/webhook-endpoints/${ep.json.id}`);
    await receiver.close();
  }
});
