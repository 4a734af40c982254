import type { components } from '@pourgate/sdk/src/schema';
import { API_BASE, http } from '../providers';

type Schemas = components['schemas'];
export type ControlChart = Schemas['control-chart.view'];
export type ControlChartData = Schemas['control-chart-data.view'];
export type ControlSignal = Schemas['control-signal.view'];
export type ChartPoint = ControlChartData['points'][number];
export type Subgroup = NonNullable<ControlChartData['subgroups']>[number];
export type ControlCatalogue = Schemas['control-catalogue.view'];
export type NewChart = Schemas['control-chart.create'];
type MaterialSystem = Schemas['material-system.view'];

const q = (v: unknown) => encodeURIComponent(JSON.stringify(v));

/** The API's control routes; every figure is the server's (the console draws, it does not compute). */
export const controlApi = {
  async catalogue(): Promise<ControlCatalogue> {
    return (await http.fetchJson(`${API_BASE}/control/catalogue`)).json as ControlCatalogue;
  },
  async systems(): Promise<Pick<MaterialSystem, 'id' | 'name'>[]> {
    return (await http.fetchJson(`${API_BASE}/material-systems?range=${q([0, 199])}&sort=${q(['name', 'ASC'])}`)).json as MaterialSystem[];
  },
  async createChart(body: NewChart): Promise<ControlChart> {
    return (await http.fetchJson(`${API_BASE}/control/charts`, { method: 'POST', body: JSON.stringify(body) })).json as ControlChart;
  },
  async charts(): Promise<ControlChart[]> {
    return (await http.fetchJson(`${API_BASE}/control/charts?range=${q([0, 99])}&sort=${q(['name', 'ASC'])}`)).json as ControlChart[];
  },
  async data(chartId: string, limit = 500): Promise<ControlChartData> {
    return (await http.fetchJson(`${API_BASE}/control/charts/${encodeURIComponent(chartId)}/data?limit=${limit}`)).json as ControlChartData;
  },
  async freeze(chartId: string, firstN: number): Promise<ControlChart> {
    return (await http.fetchJson(`${API_BASE}/control/charts/${encodeURIComponent(chartId)}/baseline`, { method: 'POST', body: JSON.stringify({ firstN }) })).json as ControlChart;
  },
  async signals(filter: Record<string, unknown>): Promise<ControlSignal[]> {
    return (await http.fetchJson(`${API_BASE}/control/signals?range=${q([0, 99])}&filter=${q(filter)}`)).json as ControlSignal[];
  },
  async acknowledge(signalId: string, note: string): Promise<ControlSignal> {
    return (await http.fetchJson(`${API_BASE}/control/signals/${encodeURIComponent(signalId)}/acknowledge`, { method: 'POST', body: JSON.stringify({ note }) })).json as ControlSignal;
  },
  async csv(chartId: string): Promise<Blob> {
    const { blob } = await http.fetchJson(`${API_BASE}/control/charts/${encodeURIComponent(chartId)}/data.csv`, { asBlob: true, headers: { Accept: 'text/csv' } });
    return blob ?? new Blob([]);
  },
};

/** Where a point's reading is in the console: the readings list narrowed to it. */
export function readingHref(readingId: string | null | undefined): string | null {
  return readingId ? `/readings?filter=${q({ id: [readingId] })}` : null;
}
