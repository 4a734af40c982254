// The first page before sign-in stays small, and after sign-in the main area shows progress from
// the first moment instead of a blank second (issue 19, item 12).
import { test, expect, check, BASE_URL, PEOPLE, PASSWORD, shot } from './support.js';

test('a small first page, and progress at once after sign-in', async ({ newPage }) => {
  const page = await newPage();
  await page.setViewportSize({ width: 1440, height: 900 });
  const scripts: string[] = [];
  page.on('request', (r) => {
    if (r.resourceType() === 'script') scripts.push(r.url());
  });
  await page.goto(`${BASE_URL}/#/login`);
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
  await page.waitForLoadState('networkidle');
  // what the sign-in page's scripts weigh on the wire and once unpacked
  const sizes = await page.evaluate(() =>
    (globalThis as unknown as { performance: { getEntriesByType(t: string): Array<{ name: string; initiatorType: string; encodedBodySize: number; decodedBodySize: number }> } }).performance
      .getEntriesByType('resource')
      .filter((e) => e.initiatorType === 'script' || /\.js(\?|$)/.test(e.name))
      .map((e) => ({ name: e.name, wire: e.encodedBodySize, raw: e.decodedBodySize })),
  );
  const biggest = Math.max(...sizes.map((s) => s.raw));
  console.log(`    sign-in page: ${sizes.length} scripts, ${(sizes.reduce((a, s) => a + s.wire, 0) / 1000).toFixed(1)} kB on the wire, largest ${(biggest / 1000).toFixed(1)} kB unpacked`);
  check(!scripts.some((u) => /\/assets\/Layout-[^/]+\.js$/.test(u)), 'the signed-in frame is fetched before sign-in');
  expect(biggest, 'the largest script of the sign-in page, unpacked (bytes)').toBeLessThan(500_000);

  // slow the signed-in frame's code and the overview's figures, as on a busy network
  await page.route(/\/assets\/(Layout|Dashboard|FloorPanel)-[^/]+\.js$/, async (route) => {
    await new Promise((r) => setTimeout(r, 1500));
    await route.continue();
  });
  await page.locator('input[name="email"]').fill(PEOPLE.engineer.email);
  await page.locator('input[name="password"]').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // once signed in, within a fraction of a second a progress bar says the page is coming (not a
  // blank main area; the sign-in button's own spinner does not count)
  await page.waitForURL((u) => !u.hash.startsWith('#/login'), { timeout: 30_000 });
  await expect(page.locator('[role="progressbar"]:not(button [role="progressbar"])').first()).toBeVisible({ timeout: 500 });
  await shot(page, 'after-sign-in-loading');
  await page.getByRole('heading', { name: /Welcome back/, level: 1 }).waitFor({ timeout: 30_000 });
  await page.getByTestId('floor-panel').waitFor({ timeout: 30_000 });
});
