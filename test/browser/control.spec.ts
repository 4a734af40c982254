// Control charts as the engineer lives in them: the demo's drifting bench with its signals, one
// acknowledged with a note; a new X̄–R chart defined in the console and drawn from the API's subgroups.
import { test, expect, signIn, shot, apiToken, apiCall, listQuery, plannedSeatCushion, suiteScale } from './support.js';

test('the engineer works a drift signal and defines an X̄–R chart; a viewer only looks', async ({ newPage }) => {
  const stamp = Date.now().toString(36);
  const page = await newPage();
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'engineer');
  await page.goto('/#/control');
  await page.getByRole('heading', { name: 'Control charts', level: 1 }).waitFor();
  await expect(page.getByTestId('limits-kind')).toContainText('frozen baseline');
  await page.getByTestId('control-chart').waitFor();

  // acknowledge the first open signal of the demo's drifting bench
  const open = page.getByTestId('ack-open').first();
  await open.click();
  await page.getByTestId('ack-note').fill('Scale on bench 2 re-zeroed; part A weighs true again.');
  await page.getByTestId('ack-submit').click();
  await expect(page.getByTestId('signal-row').filter({ hasText: 'Scale on bench 2 re-zeroed' })).toBeVisible();
  await shot(page, 'control-1440');

  // a thermometer and three batches whose part A is read three times each, posted as the probe would
  const admin = await apiToken('admin');
  const eng = await apiToken('engineer');
  const probe = await apiCall(admin, 'POST', '/devices', { kind: 'thermometer', serial: `SUITE-T-${stamp}`, name: `Drum probe ${stamp}`, stationCode: 'S9' });
  expect(probe.status, 'registering the probe').toBe(201);
  const scale = await suiteScale(`XR-${stamp}`);
  let clock = Date.now() - 600_000;
  for (const temps of [[21.8, 22.1, 22.0], [22.3, 22.0, 22.2], [21.9, 22.4, 22.1]]) {
    const { batch } = await plannedSeatCushion(eng, scale.id);
    const readings = temps.map((v, i) => ({ batchId: batch.id, deviceId: probe.json.id, clientReadingId: `xr-${stamp}-${batch.id}-${i}`, quantity: 'temperature', subject: 'part_a', value: v, unit: 'degC', deviceTime: new Date((clock += 1000)).toISOString() }));
    expect((await apiCall(eng, 'POST', '/readings/bulk', { readings })).status, 'posting temperatures').toBe(202);
  }

  await page.getByTestId('new-chart').click();
  const dialog = page.getByRole('dialog', { name: 'New control chart' });
  await dialog.getByTestId('nc-system').click();
  await page.getByRole('option', { name: 'Demo Flex 28' }).click();
  await dialog.getByTestId('nc-metric').click();
  await page.getByRole('option', { name: /^Part A temperature/ }).click();
  await dialog.getByRole('radio', { name: /X̄–R/ }).check();
  await dialog.getByLabel('Name (optional)').fill(`Drum A by batch ${stamp}`);
  await dialog.getByTestId('nc-create').click();
  await expect(dialog).toBeHidden();
  // the subgroups come from the API once the judging job has charted the temperatures
  await expect(async () => {
    await page.reload();
    await page.getByTestId('subgroup-charts').waitFor({ timeout: 5_000 });
  }).toPass({ timeout: 60_000 });
  await expect(page.getByTestId('limits-kind')).toHaveText('trial limits');
  const charts = await apiCall(eng, 'GET', `/control/charts?${listQuery({ metric: 'component_temperature_a_c' })}`);
  const mine = charts.json.find((c: { name: string }) => c.name === `Drum A by batch ${stamp}`);
  expect(mine?.kind).toBe('xbar_r');
  await shot(page, 'control-xbar-r-1440');
  await page.setViewportSize({ width: 390, height: 844 });
  await shot(page, 'control-xbar-r-390');

  const viewer = await newPage();
  await signIn(viewer, 'viewer');
  await viewer.goto('/#/control');
  await viewer.getByTestId('control-chart').or(viewer.getByTestId('subgroup-charts')).first().waitFor();
  await expect(viewer.getByTestId('new-chart')).toHaveCount(0);
  await expect(viewer.getByTestId('ack-open')).toHaveCount(0);
});
