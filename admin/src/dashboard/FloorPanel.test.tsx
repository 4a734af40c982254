import { render, screen, waitFor } from '@testing-library/react';
import { CoreAdminContext } from 'react-admin';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { Overview } from '../views/sdk';
import FloorPanel from './FloorPanel';

beforeAll(() => {
  // the charts measure their box; jsdom has no layout
  globalThis.ResizeObserver ??= class {
    observe() {}
    unobserve() {}
    disconnect() {}
  } as unknown as typeof ResizeObserver;
});

const overview: Overview = {
  generatedAt: '2026-12-02T10:00:00Z',
  timeZone: 'Europe/Lisbon',
  today: '2026-12-02',
  days: 2,
  poursToday: 7,
  plannedToday: 9,
  readingsToday: 41,
  openRejections: 13,
  judged: 120,
  rejected: 18,
  rejectionRatePercent: 15,
  rejectionRateByDay: [
    { day: '2026-12-01', judged: 80, rejected: 10, ratePercent: 12.5 },
    { day: '2026-12-02', judged: 40, rejected: 8, ratePercent: 20 },
  ],
  ratioError: {
    materialSystemId: '00000000-0000-4000-8000-000000000001',
    systems: [{ id: '00000000-0000-4000-8000-000000000001', name: 'Flex 28' }],
    points: [
      { batchId: 'aaaaaaaa-0000-4000-8000-000000000001', plannedFor: '2026-12-01', errorPercent: 1.2, tolerancePercent: 5, lastReadingAt: '2026-12-01T09:00:00Z' },
      { batchId: 'aaaaaaaa-0000-4000-8000-000000000002', plannedFor: '2026-12-02', errorPercent: -6.1, tolerancePercent: 5, lastReadingAt: '2026-12-02T09:00:00Z' },
    ],
    outside: 1,
  },
};

describe('FloorPanel', () => {
  it('shows the figures the API counted, computing none of them', async () => {
    const getOverview = vi.fn(async (_query: { days: number; timeZone?: string }) => ({ data: overview }));
    render(
      <CoreAdminContext dataProvider={{ getOverview } as never}>
        <FloorPanel />
      </CoreAdminContext>,
    );
    await waitFor(() => expect(screen.getByTestId('stat-waiting')).toHaveTextContent('13'));
    expect(screen.getByTestId('stat-pours-today')).toHaveTextContent('7');
    expect(screen.getByTestId('stat-rejected-today')).toHaveTextContent('20 %');
    expect(screen.getByTestId('stat-rate')).toHaveTextContent('15.0 %');
    expect(screen.getByText(/8 of 40 judged readings · 41 readings today/)).toBeInTheDocument();
    expect(screen.getByTestId('chart-control-caption')).toHaveTextContent('2 batches · 1 outside the band');
    const query = getOverview.mock.calls[0]![0];
    expect(query.days).toBe(14);
  });

  it('says so when the figures cannot be loaded', async () => {
    const getOverview = vi.fn(async () => Promise.reject(new Error('down')));
    render(
      <CoreAdminContext dataProvider={{ getOverview } as never}>
        <FloorPanel />
      </CoreAdminContext>,
    );
    expect(await screen.findByTestId('floor-panel-error')).toHaveTextContent('could not be loaded');
  });
});
