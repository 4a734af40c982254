// The live station view: a reading posted by the scale appears at once, then its verdict and reasons.
import { test, expect, signIn, shot, apiToken, apiCall, suiteScale, plannedSeatCushion } from './support.js';

test('the live view shows a posted reading, then its verdict', async ({ newPage }) => {
  const stamp = Date.now().toString(36);
  const eng = await apiToken('engineer');
  const device = await suiteScale(`LIVE-${stamp}`, 'S7');
  const { batch } = await plannedSeatCushion(eng, device.id);
  const page = await newPage();
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'engineer');
  await page.goto('/#/live');
  await page.getByRole('heading', { name: 'Live station view', level: 1 }).waitFor();
  await page.getByTestId('live-watch').click();
  await page.getByRole('option', { name: device.name }).click();
  await page.locator('[data-testid="live-state"][data-state="open"]').waitFor({ timeout: 30_000 });

  // part B 12 % heavy: rejected, with the ratio named among the reasons
  const posted = await apiCall(eng, 'POST', '/readings', { batchId: batch.id, deviceId: device.id, clientReadingId: `live-${stamp}-b`, quantity: 'mass', subject: 'part_b', value: Math.round(batch.summary.massBKg * 1000 * 1.12 * 10) / 10, unit: 'g', stable: true });
  expect(posted.status, 'posting a reading').toBe(202);
  const row = page.locator(`[data-testid="live-row"][data-reading-id="${posted.json.id}"]`);
  await row.waitFor({ timeout: 30_000 });
  await page.locator(`[data-testid="live-row"][data-reading-id="${posted.json.id}"][data-status="rejected"]`).waitFor({ timeout: 30_000 });
  await expect(row.getByText('Rejected')).toBeVisible();
  await expect(row.getByTestId('live-reasons')).not.toBeEmpty();
  await shot(page, 'live-view-1440');
  await page.setViewportSize({ width: 390, height: 844 });
  await shot(page, 'live-view-390');
});
