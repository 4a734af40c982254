import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { AdminContext, type DataProvider } from 'react-admin';
import { describe, expect, it, vi } from 'vitest';
import { ReviewDialog } from './ReviewDialog';
import type { Reading } from './labels';

const reading: Reading = {
  id: 'r-1', batchId: 'b-1', deviceId: 'd-1', clientReadingId: 'c-1', quantity: 'mass', subject: 'part_b', valueSi: 0.2904, unitSi: 'kg',
  given: { value: 290.4, unit: 'g' }, stable: true, deviceTime: null, statusUrl: '/v1/readings/x', receivedAt: '2026-12-02T08:00:00Z', clockSkewSeconds: null, clockSkewFlagged: false,
  status: 'rejected', judgedAt: '2026-12-02T08:00:01Z', review: null,
  reasons: [{ code: 'RATIO_ISOCYANATE_HEAVY', message: 'The isocyanate side (part B) is heavy.', measured: -7.8787878788, limit: -5, unit: '%' }],
};

function setup(decision: 'waive' | 'uphold') {
  const create = vi.fn(async (_resource: string, params: { data: Record<string, unknown> }) => ({ data: { ...reading, id: 'r-1', review: { decision: params.data.decision, note: params.data.note ?? null, by: 'Tomas', at: 'now' } } }));
  const dataProvider = { create } as unknown as DataProvider;
  const onClose = vi.fn();
  render(
    <AdminContext dataProvider={dataProvider}>
      <ReviewDialog reading={reading} decision={decision} batchLabel="Seat cushion · Demo Flex 28" unitSystem="metric" onClose={onClose} />
    </AdminContext>,
  );
  return { create, onClose };
}

describe('ReviewDialog', () => {
  it('says what is being decided, in plain words', () => {
    setup('waive');
    expect(screen.getByText('A:B ratio off: isocyanate side heavy: −7.88 %, limit ±5 %')).toBeInTheDocument();
    expect(screen.getByText(/Part B mass, 290.4 g · Seat cushion/)).toBeInTheDocument();
  });

  it('will not waive without a note, and sends the note when there is one', async () => {
    const { create, onClose } = setup('waive');
    fireEvent.click(screen.getByTestId('review-confirm'));
    expect(await screen.findByText(/Say why this deviation is acceptable/)).toBeInTheDocument();
    expect(create).not.toHaveBeenCalled();
    fireEvent.change(screen.getByTestId('review-note'), { target: { value: '  Cup test within spec  ' } });
    fireEvent.keyDown(screen.getByTestId('review-note'), { key: 'Enter', ctrlKey: true });
    await waitFor(() => expect(create).toHaveBeenCalledTimes(1));
    expect(create).toHaveBeenCalledWith('readings/r-1/review', { data: { decision: 'waive', note: 'Cup test within spec' } });
    await waitFor(() => expect(onClose).toHaveBeenCalledWith(expect.objectContaining({ scrapped: false })));
  });

  it('upholds without a note, and scraps only when asked', async () => {
    const { create, onClose } = setup('uphold');
    fireEvent.click(screen.getByTestId('review-scrap'));
    expect(screen.getByTestId('review-confirm')).toHaveTextContent('Uphold and scrap');
    fireEvent.click(screen.getByTestId('review-confirm'));
    await waitFor(() => expect(create).toHaveBeenCalledWith('readings/r-1/review', { data: { decision: 'uphold', scrap: true } }));
    await waitFor(() => expect(onClose).toHaveBeenCalledWith(expect.objectContaining({ scrapped: true })));
  });
});
