// From plan to part in the console: planning batches from a work order's proposal (and from the
// calculator), the lot override with a reason, and a lot's printable recall report.
import path from 'node:path';
import { test, expect, check, BASE_URL, signIn, shot, settled, apiToken, apiCall, listQuery, SHOTS, type Page } from './support.js';

const byRef = async (token: string, ref: string) => {
  const orders = (await apiCall(token, 'GET', `/work-orders?${listQuery({ externalRef: ref })}`)).json as Array<{ id: string }>;
  check(orders.length === 1, `the demo seed has no work order ${ref}`);
  return orders[0]!.id;
};
const lotByNumber = async (token: string, lotNumber: string) => {
  const lots = (await apiCall(token, 'GET', `/lots?${listQuery({ q: lotNumber })}`)).json as Array<{ id: string; lotNumber: string }>;
  const lot = lots.find((l) => l.lotNumber === lotNumber);
  check(lot, `the demo seed has no lot ${lotNumber}`);
  return lot.id;
};

/** Picks an option of one of the plan form's selects by the text it shows. */
async function choose(page: Page, testId: string, option: RegExp) {
  await page.getByTestId(testId).click();
  await page.getByRole('option', { name: option }).click();
}

test('plan batches from a work order', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const orderId = await byRef(eng, 'WO-DEMO-0002');
  const before = (await apiCall(eng, 'GET', `/work-orders/${orderId}/batch-plan`)).json as { proposedBatches: number; batchesPlanned: number; cavities: number; partsRemaining: number };
  check(before.proposedBatches >= 2, `WO-DEMO-0002 proposes ${before.proposedBatches} batches; the flow needs two or more`);

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="work-orders"]').click();
  await page.getByRole('heading', { name: 'Work orders', level: 1 }).waitFor();
  await page.getByRole('row', { name: /WO-DEMO-0002/ }).click();
  await page.getByRole('heading', { name: 'Work order WO-DEMO-0002', level: 1 }).waitFor();
  // the proposal is the API's: ceil(parts still to plan ÷ cavities)
  await expect(page.getByTestId('proposed-batches')).toHaveText(String(before.proposedBatches));
  await settled(page);
  await shot(page, 'work-order-proposal');

  await page.getByTestId('plan-order-batches').click();
  await page.getByRole('heading', { name: 'Plan a batch', level: 1 }).waitFor();
  await expect(page.getByTestId('plan-count')).toHaveValue(String(before.proposedBatches));
  await expect(page.getByTestId('plan-submit')).toHaveText(`Plan ${before.proposedBatches} batches`);
  // the order names the mold and the system; the form shows them and the preview uses them
  await expect(page.getByTestId('plan-moldId')).toContainText('Armrest, 2-up');
  await page.locator('[data-testid="plan-preview"][data-state="ready"]').waitFor();
  await page.getByText('Isocyanates are respiratory and skin sensitisers', { exact: false }).first().waitFor();
  await shot(page, 'plan-from-work-order');

  // two of them now, at a station
  await page.getByTestId('plan-count').fill('2');
  await page.getByTestId('plan-stationCode').fill('DEMO-B2');
  await expect(page.getByTestId('plan-submit')).toHaveText('Plan 2 batches');
  await page.getByTestId('plan-submit').click();
  const done = page.getByTestId('plan-done');
  await done.waitFor();
  await expect(done.getByRole('listitem')).toHaveCount(2);
  await shot(page, 'plan-done');

  const after = (await apiCall(eng, 'GET', `/work-orders/${orderId}/batch-plan`)).json as typeof before;
  expect(after.batchesPlanned, 'batches planned for the order').toBe(before.batchesPlanned + 2);
  expect(after.partsRemaining, 'parts still to plan').toBe(Math.max(0, before.partsRemaining - 2 * before.cavities));
  const batches = (await apiCall(eng, 'GET', `/batches?${listQuery({ workOrderId: orderId })}&sort=${encodeURIComponent('["createdAt","DESC"]')}`)).json as Array<{
    stationCode: string | null;
    workOrderId: string;
  }>;
  expect(batches.slice(0, 2).map((b) => b.stationCode)).toEqual(['DEMO-B2', 'DEMO-B2']);

  // back on the order, the proposal has moved on by what was planned
  await page.goto(`${BASE_URL}/#/work-orders/${orderId}/show`);
  await expect(page.getByTestId('proposed-batches')).toHaveText(String(after.proposedBatches));
});

test('a refused lot needs an engineer’s reason; the calculator hands its figures on', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const orderId = await byRef(eng, 'WO-DEMO-0001');
  const held = await lotByNumber(eng, 'DF28-B-0131');
  const page = await newPage();
  await signIn(page, 'engineer');

  // the calculator's result leads to the planning form with the same system, mold and options
  await page.locator('[data-menu-entry="calculator"]').click();
  await page.getByRole('heading', { name: 'Targets calculator', level: 1 }).waitFor();
  await page.getByTestId('calc-density-pack').click();
  await page.getByTestId('calc-packFactor').fill('1.8');
  await page.locator('[data-testid="calc-result"][data-state="ready"]').waitFor();
  const mold = (await page.getByTestId('calc-mold').innerText()).split('\n')[0]!.trim();
  await page.getByTestId('calc-plan').click();
  await page.getByRole('heading', { name: 'Plan a batch', level: 1 }).waitFor();
  await expect(page.getByTestId('plan-moldId')).toContainText(mold);
  await expect(page.getByTestId('plan-packFactor')).toHaveValue('1.8');

  // for the seat cushion order, with the part B lot whose cup test failed
  await page.goto(`${BASE_URL}/#/batches/plan?workOrderId=${orderId}`);
  await expect(page.getByTestId('plan-moldId')).toContainText('Seat cushion');
  await choose(page, 'plan-lotB', /DF28-B-0131/);
  const bar = page.getByTestId('plan-lot-bar');
  await expect(bar).toContainText('DF28-B-0131');
  await expect(bar).toContainText('on hold');
  await expect(page.getByTestId('plan-submit')).toBeDisabled();
  await page.getByTestId('plan-lotOverrideReason').fill('Supplier retested the drum: within spec (demo)');
  await expect(page.getByTestId('plan-submit')).toBeEnabled();
  await shot(page, 'plan-lot-override');
  await page.getByTestId('plan-submit').click();
  await page.waitForURL(/#\/batches\/[0-9a-f-]{36}\/show/);
  const batchId = /batches\/([0-9a-f-]{36})\/show/.exec(page.url())![1]!;
  const batch = (await apiCall(eng, 'GET', `/batches/${batchId}`)).json as { lotOverride: { reason: string; lots: Array<{ id: string; code: string }> } | null };
  expect(batch.lotOverride?.reason).toBe('Supplier retested the drum: within spec (demo)');
  expect(batch.lotOverride?.lots).toEqual([expect.objectContaining({ id: held, code: 'lot_on_hold' })]);
});

test('recall a lot and print its report', async ({ newPage }) => {
  const eng = await apiToken('engineer');
  const orderId = await byRef(eng, 'WO-DEMO-0002');
  // a pigment lot of its own, so the demo's lots stay usable for the other flows
  const lotNumber = `PIG-TRACE-${Date.now().toString(36).toUpperCase()}`;
  const today = new Date().toISOString().slice(0, 10);
  const lot = await apiCall(eng, 'POST', '/lots', { part: 'pigment', lotNumber, receivedOn: today, expiresOn: `${Number(today.slice(0, 4)) + 1}${today.slice(4)}` });
  check(lot.status === 201, `creating the lot answered ${lot.status}`);
  for (let i = 0; i < 2; i++) {
    const b = await apiCall(eng, 'POST', '/batches', { workOrderId: orderId, options: { pigmentPercent: 1, lots: { pigment: lot.json.id } } });
    check(b.status === 201, `planning a batch with the lot answered ${b.status}`);
  }

  const page = await newPage();
  await signIn(page, 'engineer');
  await page.locator('[data-menu-entry="lots"]').click();
  await page.getByRole('heading', { name: 'Lots', level: 1 }).waitFor();
  await page.getByPlaceholder('Lot number').fill(lotNumber);
  // the search is debounced: click once the list shows only this lot
  await expect(page.locator('tbody tr')).toHaveCount(1);
  await page.getByRole('row', { name: new RegExp(lotNumber) }).click();
  await page.getByRole('heading', { name: `Lot ${lotNumber}`, level: 1 }).waitFor();
  await expect(page.getByTestId('lot-batches').locator('tbody tr')).toHaveCount(2);
  await shot(page, 'lot-trace');

  await page.getByTestId('recall-lot').click();
  await page.getByTestId('recall-reason').fill('Wrong shade reported by the customer (demo)');
  await page.getByTestId('recall-confirm').click();
  const report = page.getByTestId('recall-report');
  await report.waitFor();
  await expect(page.getByTestId('recall-status')).toContainText('Recalled');
  const api = (await apiCall(eng, 'GET', `/lots/${lot.json.id}/recall`)).json as { totals: { batches: number; workOrders: number; parts: number }; rows: unknown[] };
  expect(api.rows).toHaveLength(2);
  await expect(page.getByTestId('recall-totals')).toHaveText(new RegExp(`${api.totals.batches}\\s*batches\\s*${api.totals.workOrders}\\s*work orders?\\s*${api.totals.parts}\\s*parts`));
  await expect(report).toContainText('WO-DEMO-0002');
  await expect(report).toContainText('Wrong shade reported by the customer (demo)');

  // the CSV is the API's
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('recall-csv').click()]);
  const csv = await (await import('node:fs/promises')).readFile((await download.path())!, 'utf8');
  expect(csv.split(/\r?\n/)[0]).toMatch(/^lot,part,batch,planned_for/);
  expect(csv).toContain(lotNumber);
  await shot(page, 'recall-report');

  // printed: only the report, and on one page of A4 or Letter
  await page.emulateMedia({ media: 'print' });
  check(!(await page.locator('header.MuiAppBar-root').isVisible()), 'the app bar is printed with the recall report');
  check(!(await page.getByTestId('print-recall').isVisible()), 'the print button is printed with the recall report');
  check(await report.isVisible(), 'the recall report itself is not printed');
  await page.screenshot({ path: path.join(SHOTS, 'recall-report-print.png'), fullPage: true });
  for (const format of ['A4', 'Letter'] as const) {
    const pdf = (await page.pdf({ format, printBackground: true })).toString('latin1');
    const pages = pdf.match(/\/Type\s*\/Page[^s]/g)?.length ?? 0;
    expect(pages, `recall report printed on ${format}`).toBe(1);
  }
  await page.emulateMedia({ media: 'screen' });
});
