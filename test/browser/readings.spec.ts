// Readings as the console shows them: the integrator's readings list (issue 19, item 9), absurd
// values kept in their columns (item 5), small imperial masses in ounces (item 7).
import { test, expect, check, type Page, BASE_URL, signIn, shot, apiToken, apiCall, judgedReading, suiteScale, plannedSeatCushion, listQuery } from './support.js';

async function fitsWidth(page: Page, what: string) {
  // polled: after a resize the layout settles over a few frames (the phone layout replaces the table)
  const overflow = () =>
    page.evaluate(() => {
      const d = (globalThis as unknown as { document: { documentElement: { scrollWidth: number; clientWidth: number } } }).document.documentElement;
      return d.scrollWidth - d.clientWidth;
    });
  await expect.poll(overflow, { message: `${what}: pixels the page reaches past the screen's right edge`, timeout: 5_000 }).toBeLessThanOrEqual(0);
}

test('the integrator finds a new scale’s readings and verdicts', async ({ newPage }) => {
  const stamp = Date.now().toString(36);
  const eng = await apiToken('engineer');
  const device = await suiteScale(`RL-${stamp}`, 'S6');
  const { batch } = await plannedSeatCushion(eng, device.id);
  const posted = await apiCall(eng, 'POST', '/readings', { batchId: batch.id, deviceId: device.id, clientReadingId: `rl-${stamp}-b`, quantity: 'mass', subject: 'part_b', value: Math.round(batch.summary.massBKg * 1000 * 1.12 * 10) / 10, unit: 'g', stable: true });
  expect(posted.status, 'posting a reading').toBe(202);
  expect((await judgedReading(eng, posted.json.id)).status, 'verdict of part B 12 % heavy').toBe('rejected');

  const page = await newPage();
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'integrator');
  await page.locator('[data-menu-entry="reading-log"]').click();
  await page.getByRole('heading', { name: 'Readings', level: 1 }).waitFor();
  await page.locator('tbody tr').first().waitFor();
  // the device filter lists the shop's devices (by name: the API sorts devices by name, not by id)
  await page.getByLabel('Device').click();
  await page.getByRole('option', { name: new RegExp(device.name) }).click();
  const rows = page.locator('tbody tr');
  await expect(rows).toHaveCount(1);
  await expect(rows.first()).toContainText('Part B mass');
  await expect(rows.first()).toContainText('Rejected');
  await expect(rows.first()).toContainText(/mass high|A:B ratio/);
  await fitsWidth(page, 'readings list at 1440 px');
  await shot(page, 'reading-log-integrator-1440');
});

test('an absurd value stays in its column', async ({ newPage }) => {
  const page = await newPage();
  await page.setViewportSize({ width: 1440, height: 900 });
  // the API refuses such values now; the console must still draw one that is already stored
  const absurd = Number('9'.repeat(300));
  await page.route(/\/v1\/readings\?/, async (route) => {
    const res = await route.fetch();
    const rows = (await res.json()) as Array<{ quantity: string; valueSi: number; given: { value: number } }>;
    for (const r of rows) {
      if (r.quantity !== 'mass') continue;
      r.valueSi = absurd;
      r.given.value = absurd;
    }
    await route.fulfill({ response: res, json: rows });
  });
  await signIn(page, 'engineer');
  for (const [route, heading] of [['/readings', 'Review queue'], ['/reading-log', 'Readings']]) {
    await page.goto(`${BASE_URL}/#${route}?filter=${encodeURIComponent(JSON.stringify({ quantity: 'mass' }))}`);
    await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
    const first = page.locator('[data-testid="queue-row"], tbody tr').first();
    await first.waitFor();
    const text = await first.innerText();
    check(/× 10³⁰⁰/.test(text), `${route}: the absurd mass is not written in powers of ten: ${text.slice(0, 200)}`);
    check(!/\d{12}/.test(text) && !/e\+\d/.test(text), `${route}: a long run of digits or a JavaScript exponent is shown: ${text.slice(0, 200)}`);
    for (const width of [1440, 390]) {
      await page.setViewportSize({ width, height: width === 390 ? 844 : 900 });
      await fitsWidth(page, `${route} at ${width} px with an absurd value`);
    }
    await page.setViewportSize({ width: 1440, height: 900 });
  }
  await shot(page, 'absurd-value-1440');
});

test('small imperial masses read in ounces', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const molds = (await apiCall(eng, 'GET', `/molds?${listQuery({})}`)).json;
  const body = { system: { id: systems.find((s: { name: string }) => s.name === 'Demo Flex 28').id }, mold: { id: molds.find((m: { name: string }) => m.name === 'Seat cushion').id }, options: { packFactor: 1.8, pigmentPercent: 2 } };
  const api = await apiCall(eng, 'POST', '/targets/preview?units=imperial', body);
  expect(api.status, 'imperial preview').toBe(200);
  const pigment = api.json.components.pigment.mass;
  check(pigment.unit === 'lb' && pigment.value < 1, `the demo pigment is not under a pound: ${JSON.stringify(pigment)}`);
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="calculator"]').click();
  await page.getByTestId('calc-system').click();
  await page.getByRole('option', { name: /Demo Flex 28/ }).click();
  await page.getByTestId('calc-mold').click();
  await page.getByRole('option', { name: /Seat cushion/ }).click();
  await page.getByTestId('calc-density-pack').click();
  await page.getByTestId('calc-packFactor').fill('1.8');
  await page.getByTestId('calc-pigmentPercent').fill('2');
  await page.getByTestId('units-imperial').click();
  const shown = page.getByTestId('mass-pigment');
  await expect(shown).toHaveAttribute('data-value', String(pigment.value));
  // 16 oz to the pound (common practice); 0.0xx lb is not what a bench scale shows
  const text = (await shown.innerText()).replace(/,/g, '');
  check(/\boz\b/.test(text) && !/\blb\b/.test(text), `the pigment reads "${text}", not in ounces`);
  const oz = Number(/([\d.]+)\s*oz/.exec(text)?.[1]);
  expect(Math.abs(oz - pigment.value * 16), `ounces shown (${oz}) against ${pigment.value} lb × 16`).toBeLessThan(0.06);
});
