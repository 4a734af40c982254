// Accessibility per role: every console page a role can open (its menu's pages, the detail pages
// they lead to, the forms its role may fill) has no serious or critical axe-core finding. One
// signed-in tab per role; every finding of every page is collected, then the test fails listing all.
import { test, expect, type Page, BASE_URL, PEOPLE, ROLES, type Role, signIn, settled, apiToken, apiCall, listQuery, axeFindings } from './support.js';

/** Where a page is ready to be scanned, beyond its level-1 heading. */
const READY: Record<string, string> = {
  '/': '[data-testid="floor-panel"]',
  '/readings': '[data-testid="queue-row"], [data-testid="queue-empty"]',
  '/calculator': '[data-testid="calc-result"]',
  '/imports': '[data-testid="import-file"]',
  '/profile': 'form',
  '/live': '[data-testid="live-watch"]',
  '/control': '[data-testid="control-page"]',
};
/** Pages that hold a stream open (Server-Sent Events): never network-idle, ready when drawn. */
const STREAMING = new Set(['/live']);
const LISTS = 'tbody tr, [data-testid="empty-state"], .RaList-noResults, form';
/** Menu entries that are not console pages: the queue dashboard and the API reference. */
const NOT_CONSOLE = new Set(['queues', 'docs']);

/** The routes behind a role's menu entries, then detail pages and forms. */
async function pagesFor(role: Role, token: string): Promise<string[]> {
  const routes = PEOPLE[role].menu.filter((id) => !NOT_CONSOLE.has(id)).map((id) => (id === 'overview' ? '/' : `/${id}`));
  const batch = (await apiCall(token, 'GET', `/batches?${listQuery({}, [0, 0])}`)).json[0];
  const system = (await apiCall(token, 'GET', `/material-systems?${listQuery({}, [0, 0])}`)).json[0];
  routes.push(`/batches/${batch.id}/show`, `/batches/${batch.id}/pour-sheet`, `/material-systems/${system.id}/show`);
  if (role === 'engineer') routes.push('/material-systems/create', '/molds/create', '/lots/create', '/qc-cup-tests/create', '/work-orders/create');
  if (role === 'admin' || role === 'integrator') routes.push('/devices/create');
  return routes;
}

async function open(page: Page, route: string) {
  await page.goto(`${BASE_URL}/#${route}`);
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  await page.locator(READY[route] ?? (/\/(show|pour-sheet)$/.test(route) ? 'main' : LISTS)).first().waitFor({ state: 'attached' });
  if (STREAMING.has(route)) await page.locator('header .MuiCircularProgress-root').waitFor({ state: 'detached' });
  else await settled(page);
}

for (const role of ROLES) {
  test(`every page ${role} can open passes axe`, async ({ newPage }) => {
    test.slow(); // some twenty pages, each scanned in full
    const token = await apiToken(role);
    const page = await newPage();
    await signIn(page, role);
    const problems: string[] = [];
    const routes = await pagesFor(role, token);
    for (const route of routes) {
      await test.step(route, async () => {
        await open(page, route);
        for (const f of await axeFindings(page, `${route} as ${role}`)) problems.push(`${route}: ${f}`);
      });
    }
    expect(problems, `serious or critical axe findings on the ${routes.length} pages ${role} can open`).toEqual([]);
  });
}
