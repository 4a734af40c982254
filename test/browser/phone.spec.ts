// The console on a phone held in one hand (390 × 844, touch): the review queue, a batch and the
// readings list (issue 19, item 4 and the readings list's width).
import { test, expect, check, type Page, BASE_URL, PEOPLE, PASSWORD, type Role, shot, shopFloorScenario, batchState, apiToken, apiCall, listQuery } from './support.js';

const PHONE = { width: 390, height: 844 };
test.use({ viewport: PHONE, hasTouch: true, isMobile: true });

/** Signs in at phone size: the side menu is folded away, so the overview's heading says we are in. */
async function signInOnPhone(page: Page, who: Role) {
  await page.goto(`${BASE_URL}/#/login`);
  await page.locator('input[name="email"]').fill(PEOPLE[who].email);
  await page.locator('input[name="password"]').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).tap();
  await page.getByRole('heading', { name: /Welcome back/, level: 1 }).waitFor({ timeout: 60_000 });
}

/** Nothing wider than the screen: the page itself never scrolls sideways. */
async function fitsWidth(page: Page, what: string) {
  // polled: after a resize the layout settles over a few frames (the phone layout replaces the table)
  const overflow = () =>
    page.evaluate(() => {
      const d = (globalThis as unknown as { document: { documentElement: { scrollWidth: number; clientWidth: number } } }).document.documentElement;
      return d.scrollWidth - d.clientWidth;
    });
  await expect.poll(overflow, { message: `${what}: pixels the page reaches past the screen's right edge`, timeout: 5_000 }).toBeLessThanOrEqual(0);
}

async function inFirstScreen(page: Page, selector: string, what: string) {
  const box = await page.locator(selector).first().boundingBox();
  check(box, `${what} is not drawn`);
  expect(box.y + Math.min(box.height, 48), `${what} starts ${Math.round(box.y)} px down a ${PHONE.height} px screen`).toBeLessThanOrEqual(PHONE.height);
  expect(box.x + box.width, `${what} ends ${Math.round(box.x + box.width)} px across a ${PHONE.width} px screen`).toBeLessThanOrEqual(PHONE.width + 1);
}

test('the review queue works one-handed on a phone', async ({ newPage }) => {
  const s = await shopFloorScenario();
  const page = await newPage();
  const touch = await page.evaluate(() => (globalThis as unknown as { matchMedia(q: string): { matches: boolean } }).matchMedia('(hover: none) and (pointer: coarse)').matches);
  expect(touch, 'the phone emulation reports a touch screen').toBe(true);
  await signInOnPhone(page, 'engineer');
  await page.goto(`${BASE_URL}/#/readings`);
  await page.getByRole('heading', { name: 'Review queue', level: 1 }).waitFor();
  const mine = page.locator(`[data-testid="queue-row"][data-reading-id="${s.rejected[0].id}"]`);
  await mine.waitFor();

  // the readings, not the filters, fill the first screen; keyboard hints are not drawn for a thumb
  await expect(page.locator('.RaList-actions')).toBeHidden();
  await inFirstScreen(page, '[data-testid="queue-row"]', 'the first reading of the queue');
  await expect(page.getByTestId('queue-keys')).toBeHidden();
  await fitsWidth(page, 'review queue');
  await shot(page, 'phone-review-queue-390');
  await page.getByTestId('queue-filters-toggle').tap();
  await expect(page.locator('.RaList-actions')).toBeVisible();
  await shot(page, 'phone-review-queue-filters-390');
  await page.getByTestId('queue-filters-toggle').tap();
  await expect(page.locator('.RaList-actions')).toBeHidden();

  // tapping a row brings its detail into view, with the decisions in reach
  await mine.tap();
  const sheet = page.getByTestId('reading-sheet');
  await sheet.getByTestId('reading-panel').waitFor();
  await inFirstScreen(page, '[data-testid="reading-sheet"] [data-testid="reading-panel"]', 'the tapped reading');
  await sheet.getByTestId('waive-button').scrollIntoViewIfNeeded();
  await expect(sheet.getByTestId('waive-button')).toBeInViewport();
  await expect(sheet.locator('kbd').first()).toBeHidden();
  await shot(page, 'phone-review-detail-390');

  // a decision: the reading leaves the queue, and its batch can be released from there
  await sheet.getByTestId('waive-button').tap();
  const dialog = page.getByRole('dialog', { name: /Waive this rejection/ });
  await dialog.getByTestId('review-note').fill('Cup test within spec; checked on the phone (browser suite).');
  await shot(page, 'phone-review-waive-390');
  await dialog.getByTestId('review-confirm').tap();
  await dialog.waitFor({ state: 'detached' });
  await expect(sheet).toBeHidden();
  await expect(mine).toHaveCount(0);
  await page.getByTestId('just-decided').getByText('Waived').waitFor();
  await shot(page, 'phone-review-decided-390');
  await page.getByTestId('release-from-queue').tap();
  for (let i = 0; i < 40 && (await batchState(s.eng, s.batches[0].id)) !== 'released'; i++) await page.waitForTimeout(150);
  expect(await batchState(s.eng, s.batches[0].id), 'the batch released from the phone').toBe('released');

  // the same queue on a desktop screen, for the record
  await page.setViewportSize({ width: 1440, height: 900 });
  await page.getByTestId('reading-panel').waitFor();
  await shot(page, 'review-queue-1440');
});

test('a batch and the readings list fit a phone', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const seeded = (await apiCall(eng, 'GET', `/batches?${listQuery({})}`)).json.find((b: { notes: string }) => b.notes === 'Demo batch: first seat cushion of the order');
  check(seeded, 'the demo seed has no seat cushion batch');
  const page = await newPage();
  await signInOnPhone(page, 'engineer');
  await page.goto(`${BASE_URL}/#/batches/${seeded.id}/show`);
  await page.getByTestId('weighed-section').waitFor();
  await page.getByTestId('bar-Part A').waitFor();
  await page.waitForLoadState('networkidle');
  await fitsWidth(page, 'batch page');
  await inFirstScreen(page, '[data-testid="open-pour-sheet"]', 'the pour sheet button');
  await shot(page, 'phone-batch-390');
  await page.getByTestId('weighed-section').scrollIntoViewIfNeeded();
  await shot(page, 'phone-batch-weighed-390');

  await page.goto(`${BASE_URL}/#/reading-log`);
  await page.locator('tbody tr').first().waitFor();
  await page.waitForLoadState('networkidle');
  await fitsWidth(page, 'readings list');
  // the table scrolls inside its own region, which ends at the screen's edge
  const region = await page.locator('[role="region"][aria-label^="Readings table"]').boundingBox();
  check(region, 'the readings table region is not drawn');
  expect(region.x + region.width, 'right edge of the readings table region').toBeLessThanOrEqual(PHONE.width);
  await shot(page, 'phone-reading-log-390');

  // the same two pages on a desktop screen, for the record
  await page.setViewportSize({ width: 1440, height: 900 });
  await page.locator('tbody tr').first().waitFor();
  await shot(page, 'reading-log-1440');
  await page.goto(`${BASE_URL}/#/batches/${seeded.id}/show`);
  await page.getByTestId('bar-Part A').waitFor();
  await shot(page, 'batch-1440');
});
