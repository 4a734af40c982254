// The shop floor: the review queue, batches and the pour sheet, the calculator, logger imports.
import { test, expect, check, type InPage, BASE_URL, signIn, shot, apiToken, apiCall, listQuery, shopFloorScenario, batchState, queueFor, SHOTS } from './support.js';
import path from 'node:path';

/** The engineer works the queue with the keyboard: waives one rejection and releases, upholds another and scraps. */
test('engineer works the review queue', async ({ newPage }) => {
  const s = await shopFloorScenario();
  const [toWaive, toScrap] = s.batches;
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="readings"]').click();
  await page.getByRole('heading', { name: 'Review queue', level: 1 }).waitFor();
  await page.getByTestId('queue-keys').waitFor();
  await page.getByTestId('queue-row').first().waitFor();
  await page.getByTestId('reading-panel').waitFor();
  // j and k move the selection
  if ((await page.getByTestId('queue-row').count()) > 1) {
    const selected = () => page.locator('[data-testid="queue-row"][aria-selected="true"]').getAttribute('data-reading-id');
    const first = await selected();
    await page.keyboard.press('j');
    await page.waitForFunction((id) => (globalThis as unknown as InPage).document.querySelector('[data-testid="queue-row"][aria-selected="true"]')?.getAttribute('data-reading-id') !== id, first);
    await page.keyboard.press('k');
    await page.waitForFunction((id) => (globalThis as unknown as InPage).document.querySelector('[data-testid="queue-row"][aria-selected="true"]')?.getAttribute('data-reading-id') === id, first);
  }
  await shot(page, 'review-queue');

  // waive: the note is required, then the batch can be released from the queue
  await page.goto(queueFor(toWaive.id));
  const row = page.locator(`[data-reading-id="${s.rejected[0].id}"]`);
  await row.waitFor();
  await row.click();
  await page.getByTestId('reading-panel').getByText('A:B ratio off').first().waitFor();
  await page.keyboard.press('w');
  const dialog = page.getByRole('dialog');
  await dialog.getByText('Waive this rejection').waitFor();
  await dialog.getByTestId('review-confirm').click();
  await dialog.getByText(/Say why this deviation is acceptable/).waitFor();
  await dialog.getByTestId('review-note').fill('Cup test within spec; parts checked by QA (browser suite).');
  await shot(page, 'review-waive-dialog');
  await page.keyboard.press('Control+Enter');
  await dialog.waitFor({ state: 'detached' });
  await row.getByText('Waived').waitFor();
  expect(await batchState(s.eng, toWaive.id), 'state of the waived batch before release').toEqual('on_hold');
  await page.getByTestId('release-from-queue').click();
  for (let i = 0; i < 40 && (await batchState(s.eng, toWaive.id)) !== 'released'; i++) await page.waitForTimeout(150);
  expect(await batchState(s.eng, toWaive.id), 'state of the waived batch after release').toEqual('released');

  // uphold and scrap
  await page.goto(queueFor(toScrap.id));
  const row2 = page.locator(`[data-reading-id="${s.rejected[1].id}"]`);
  await row2.waitFor();
  await row2.click();
  await page.keyboard.press('u');
  await dialog.getByText('Uphold this rejection').waitFor();
  await dialog.getByTestId('review-note').fill('Isocyanate side 12 % heavy: parts too hard (browser suite).');
  await dialog.getByTestId('review-scrap').check();
  await shot(page, 'review-uphold-dialog');
  await dialog.getByRole('button', { name: 'Uphold and scrap' }).click();
  await dialog.waitFor({ state: 'detached' });
  await row2.getByText('Upheld').waitFor();
  expect(await batchState(s.eng, toScrap.id), 'state of the batch whose rejection was upheld with scrap').toEqual('scrapped');

  // the batch pages tell the same story
  await page.goto(`${BASE_URL}/#/batches/${toWaive.id}/show`);
  const timeline = page.getByTestId('batch-timeline');
  await timeline.getByText('Released', { exact: true }).waitFor();
  for (const state of ['Planned', 'Weighing', 'On hold']) await timeline.getByText(state, { exact: true }).waitFor();
  await page.getByTestId('batch-reviews').getByText(/Waived/).waitFor();
  await page.getByTestId('bar-Part A').waitFor();
  await shot(page, 'batch-released');
  await page.goto(`${BASE_URL}/#/batches/${toScrap.id}/show`);
  await page.getByTestId('batch-timeline').getByText('Scrapped', { exact: true }).waitFor();
  await shot(page, 'batch-scrapped');
});

/** The batch list, a batch's detail and its printable pour sheet. */
test('batches and pour sheet', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const seeded = (await apiCall(eng, 'GET', `/batches?${listQuery({})}`)).json.find((b: { notes: string }) => b.notes === 'Demo batch: first seat cushion of the order');
  check(seeded, 'the demo seed has no seat cushion batch');
  const targets = (await apiCall(eng, 'GET', `/batches/${seeded.id}/targets`)).json;
  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="batches"]').click();
  await page.getByRole('heading', { name: 'Batches', level: 1 }).waitFor();
  await page.locator('tbody tr').first().waitFor();
  await shot(page, 'batches');
  await page.goto(`${BASE_URL}/#/batches/${seeded.id}/show`);
  await page.getByTestId('weighed-section').waitFor();
  expect(await page.getByTestId('mass-A').getAttribute('data-value'), 'part A target on the batch page').toEqual(String(targets.components.A.mass.value));
  await shot(page, 'batch-planned');
  await page.getByTestId('open-pour-sheet').click();
  const sheet = page.getByTestId('pour-sheet');
  await sheet.waitFor();
  await sheet.getByTestId('cautions').waitFor();
  await sheet.getByTestId('signatures').waitFor();
  check((await sheet.innerText()).includes('DF28-A-0117'), 'the pour sheet does not name the part A lot');
  check(/SDS/.test(await sheet.innerText()), 'the pour sheet does not point to the SDS');
  await shot(page, 'pour-sheet');
  await page.emulateMedia({ media: 'print' });
  check(!(await page.locator('header.MuiAppBar-root').isVisible()), 'the app bar is printed on the pour sheet');
  check(!(await page.getByTestId('print-sheet').isVisible()), 'the print button is printed on the pour sheet');
  await page.screenshot({ path: path.join(SHOTS, 'pour-sheet-print.png'), fullPage: true });
  await page.emulateMedia({ media: 'screen' });
});

/** The calculator shows exactly the figures POST /v1/targets/preview answers, in metric and imperial. */
test('calculator matches the api', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const molds = (await apiCall(eng, 'GET', `/molds?${listQuery({})}`)).json;
  const system = systems.find((s: { name: string }) => s.name === 'Demo Flex 28');
  const mold = molds.find((m: { name: string }) => m.name === 'Seat cushion');
  const body = { system: { id: system.id }, mold: { id: mold.id }, options: { packFactor: 1.8, pigmentPercent: 2 } };

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="calculator"]').click();
  await page.getByRole('heading', { name: 'Targets calculator', level: 1 }).waitFor();
  await page.getByTestId('calc-system').click();
  await page.getByRole('option', { name: /Demo Flex 28/ }).click();
  await page.getByTestId('calc-mold').click();
  await page.getByRole('option', { name: /Seat cushion/ }).click();
  await page.getByTestId('calc-density-pack').click();
  await page.getByTestId('calc-packFactor').fill('1.8');
  await page.getByTestId('calc-pigmentPercent').fill('2');

  for (const units of ['metric', 'imperial']) {
    if (units === 'imperial') await page.getByTestId('units-imperial').click();
    const api = await apiCall(eng, 'POST', `/targets/preview?units=${units}`, body);
    expect(api.status, `POST /v1/targets/preview?units=${units}`).toEqual(200);
    const wanted = {
      'mass-A': api.json.components.A.mass,
      'mass-B': api.json.components.B.mass,
      'mass-pigment': api.json.components.pigment.mass,
      'fig-total-mass': api.json.totalMass,
      'fig-target-density': api.json.targetDensity,
    };
    const read = () =>
      page.evaluate((ids) => Object.fromEntries(ids.map((id) => {
        const el = (globalThis as unknown as InPage).document.querySelector(`[data-testid="${id}"]`);
        return [id, el ? { value: Number(el.getAttribute('data-value')), unit: el.getAttribute('data-unit') } : null];
      })), Object.keys(wanted));
    let shown: Record<string, { value: number; unit: string | null } | null> = {};
    for (let i = 0; i < 60; i++) {
      shown = await read();
      if (Object.entries(wanted).every(([id, q]) => shown[id]?.value === q.value && shown[id]?.unit === q.unit)) break;
      await page.waitForTimeout(200);
    }
    for (const [id, q] of Object.entries(wanted)) expect(shown[id], `${id} in ${units}`).toEqual({ value: q.value, unit: q.unit });
    // what a person reads is that number, rounded
    const text = await page.getByTestId('mass-A').innerText();
    // under a pound an imperial mass reads in ounces (16 oz = 1 lb), one decimal fewer
    const a = wanted['mass-A'].value;
    const inOunces = units === 'imperial' && Number(a.toFixed(3)) < 1;
    const expected = units === 'metric' ? a.toFixed(1) : inOunces ? `${(a * 16).toFixed(2)} oz` : `${a.toFixed(3)} lb`;
    check(text.replace(/,/g, '').includes(expected), `part A shows "${text}", not ${expected}`);
    await page.getByTestId('cautions').waitFor();
    await shot(page, `calculator-${units}`);
  }
});

/** A logger CSV goes up, the progress bar reaches 100 %, the bad rows are listed, and a re-upload is recognised. */
test('csv import reaches the end', async ({ newPage }) => {
  const admin = await apiToken('admin');
  const eng = await apiToken('engineer');
  const stamp = Date.now().toString(36);
  const device = await apiCall(admin, 'POST', '/devices', { kind: 'thermometer', serial: `SUITE-T-${stamp}`, name: `Suite logger ${stamp}`, stationCode: 'S9' });
  expect(device.status, 'registering the suite logger').toEqual(201);
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const planned = await apiCall(eng, 'POST', '/batches', { materialSystemId: systems.find((x: { name: string }) => x.name === 'Demo Flex 28').id, freeRiseCup: { volume: { value: 1, unit: 'L' } } });
  expect(planned.status, 'planning a batch for the imported readings').toEqual(201);
  const batch = planned.json;
  const header = 'batch_id,device_id,client_reading_id,quantity,subject,value,unit,stable,device_time';
  const rows = [];
  for (let i = 0; i < 40; i++) rows.push([batch.id, device.json.id, `suite-${stamp}-${i}`, 'temperature', 'part_a', (21 + (i % 5) * 0.3).toFixed(1), 'degC', 'true', new Date(Date.now() - (40 - i) * 60_000).toISOString()].join(','));
  rows.splice(12, 0, [batch.id, device.json.id, `suite-${stamp}-bad-1`, 'temperature', 'part_a', 'warm', 'degC', 'true', ''].join(','));
  rows.splice(25, 0, [batch.id, device.json.id, `suite-${stamp}-bad-2`, 'temperature', 'part_b', '22.0', 'furlong', 'true', ''].join(','));
  const file = { name: `logger-${stamp}.csv`, mimeType: 'text/csv', buffer: Buffer.from([header, ...rows].join('\n') + '\n') };

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="imports"]').click();
  await page.getByRole('heading', { name: 'Logger imports', level: 1 }).waitFor();
  await shot(page, 'imports');
  await page.getByTestId('import-file').setInputFiles(file);
  await page.getByTestId('import-progress').waitFor();
  await page.getByTestId('import-percent').getByText('100 %').waitFor({ timeout: 60_000 });
  await page.getByTestId('import-progress').getByText('Finished').waitFor();
  const bad = page.getByTestId('bad-rows');
  await bad.waitFor();
  expect(await bad.locator('tbody tr').count(), 'bad rows listed').toEqual(2);
  expect(await page.getByTestId('import-accepted').innerText(), 'readings accepted from the file').toEqual('40');
  await page.waitForTimeout(600); // the bar's last step animates
  await shot(page, 'imports-done');
  await page.getByTestId('import-file').setInputFiles(file);
  await page.getByTestId('import-replayed').waitFor();
});

