// The pour sheet prints on one page, footer included, on A4 and on US Letter (issue 19, item 6).
import { test, expect, check, BASE_URL, signIn, apiToken, apiCall, listQuery, SHOTS, suiteScale } from './support.js';
import fs from 'node:fs';
import path from 'node:path';

/** Pages in a PDF Chromium wrote: one `/Type /Page` object each (`/Type /Pages` is the tree's root). */
const pageCount = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? []).length;

test('the pour sheet prints on one A4 or Letter page', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const seeded = (await apiCall(eng, 'GET', `/batches?${listQuery({})}`)).json.find((b: { notes: string }) => b.notes === 'Demo batch: first seat cushion of the order');
  check(seeded, 'the demo seed has no seat cushion batch');
  // a fuller sheet too: a marginal pack factor adds a warning box, a scale adds its readability
  const systems = (await apiCall(eng, 'GET', `/material-systems?${listQuery({})}`)).json;
  const molds = (await apiCall(eng, 'GET', `/molds?${listQuery({})}`)).json;
  const scale = await suiteScale(Date.now().toString(36), 'S7');
  const fuller = await apiCall(eng, 'POST', '/batches', {
    materialSystemId: systems.find((s: { name: string }) => s.name === 'Demo Flex 28').id,
    moldId: molds.find((m: { name: string }) => m.name === 'Seat cushion').id,
    options: { packFactor: 1.05, pigmentPercent: 2, scaleDeviceId: scale.id },
    notes: 'Suite batch: a pour sheet with warnings',
  });
  expect(fuller.status, 'planning a batch with a marginal pack factor').toBe(201);

  const page = await newPage();
  await signIn(page, 'engineer');
  for (const [batch, name] of [[seeded, 'seeded'], [fuller.json, 'warnings']] as const) {
    await page.goto(`${BASE_URL}/#/batches/${batch.id}/pour-sheet`);
    const sheet = page.getByTestId('pour-sheet');
    await sheet.getByTestId('signatures').waitFor();
    await sheet.getByTestId('sheet-footer').waitFor();
    if (name === 'warnings') await sheet.getByTestId('sheet-warnings').waitFor();
    await page.waitForLoadState('networkidle');
    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format, printBackground: true });
      fs.mkdirSync(SHOTS, { recursive: true });
      fs.writeFileSync(path.join(SHOTS, `pour-sheet-${name}-${format}.pdf`), pdf);
      expect(pageCount(pdf), `pages of the ${name} pour sheet on ${format}`).toBe(1);
    }
  }
});
