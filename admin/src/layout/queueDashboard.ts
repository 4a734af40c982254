import { http } from '../providers';

/**
 * The queue dashboard is a server page, so the console first asks the API for a short-lived pass
 * (an HttpOnly cookie for /queues only), then opens the page in a new tab. The tab is
 * opened during the click (pop-up blockers allow that) and pointed at the page once the pass is set.
 */
export async function openQueueDashboard(passUrl: string): Promise<void> {
  const tab = window.open('about:blank', '_blank');
  try {
    const { json } = await http.fetchJson(passUrl, { method: 'POST', body: '{}' });
    const url = (json as { url: string }).url;
    if (tab) {
      tab.opener = null;
      tab.location.href = url;
    } else window.location.assign(url);
  } catch (e) {
    tab?.close();
    throw e;
  }
}
