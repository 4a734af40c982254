import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ImportPanel } from './ImportPanel';
import { pollImport, progressOf, type ImportJob } from './upload';

function job(over: Partial<ImportJob>): ImportJob {
  return {
    id: 'imp-1', fileName: 'logger-7.csv', sha256: 'ab', sizeBytes: 20, status: 'running', total: 4, processed: 0, percent: 0, accepted: 0, duplicates: 0, rejectedRows: 0, badRows: [],
    error: null, uploadedBy: null, createdAt: '2026-12-02T08:00:00Z', startedAt: null, finishedAt: null, statusUrl: '/v1/imports/imp-1', ...over,
  };
}

const csv = () => new File(['batchId,deviceId\n'], 'logger-7.csv', { type: 'text/csv' });

describe('progressOf', () => {
  it('uses the percent the API sends, clamped, and 100 once done', () => {
    expect(progressOf(job({ percent: 50 }))).toBe(50);
    expect(progressOf(job({ percent: 140 }))).toBe(100);
    expect(progressOf(job({ percent: NaN, processed: 1, total: 4 }))).toBe(25);
    expect(progressOf(job({ status: 'done', percent: 99 }))).toBe(100);
  });
});

describe('pollImport', () => {
  it('polls until the import is done and hands over every answer', async () => {
    const answers = [job({ processed: 2, percent: 50 }), job({ status: 'done', processed: 4, percent: 100 })];
    const seen: number[] = [];
    const last = await pollImport(async () => answers.shift()!, (j) => seen.push(j.percent), { sleep: async () => undefined });
    expect(seen).toEqual([50, 100]);
    expect(last?.status).toBe('done');
  });

  it('stops when aborted and gives up after repeated failures', async () => {
    const ctl = new AbortController();
    ctl.abort();
    expect(await pollImport(async () => job({}), () => undefined, { signal: ctl.signal })).toBeNull();
    await expect(pollImport(async () => Promise.reject(new Error('down')), () => undefined, { sleep: async () => undefined, maxFailures: 2 })).rejects.toThrow('down');
  });
});

describe('ImportPanel', () => {
  it('uploads the file, shows progress up to 100 % and lists the bad rows', async () => {
    const upload = vi.fn(async () => ({ job: job({ processed: 0, percent: 0 }), replayed: false }));
    const polls = [
      job({ processed: 2, percent: 50, accepted: 2 }),
      job({ status: 'done', processed: 4, percent: 100, accepted: 2, duplicates: 1, rejectedRows: 1, badRows: [{ line: 4, errors: [{ field: 'unit', detail: 'is not a unit of mass' }] }] }),
    ];
    const fetchJob = vi.fn(async () => polls.shift()!);
    render(<ImportPanel upload={upload} fetchJob={fetchJob} intervalMs={1} />);
    fireEvent.change(screen.getByTestId('import-file'), { target: { files: [csv()] } });
    await waitFor(() => expect(screen.getByTestId('import-percent')).toHaveTextContent('100 %'));
    expect(upload).toHaveBeenCalledWith(expect.objectContaining({ name: 'logger-7.csv' }));
    expect(fetchJob).toHaveBeenCalledWith('imp-1');
    expect(screen.getByRole('progressbar', { name: 'Import progress' })).toHaveAttribute('aria-valuenow', '100');
    expect(screen.getByText('Finished')).toBeInTheDocument();
    expect(screen.getByTestId('import-accepted')).toHaveTextContent('2');
    expect(screen.getByTestId('import-duplicates')).toHaveTextContent('1');
    expect(screen.getByTestId('import-bad')).toHaveTextContent('1');
    const bad = screen.getByTestId('bad-rows');
    expect(bad).toHaveTextContent('4');
    expect(bad).toHaveTextContent('unit');
    expect(bad).toHaveTextContent('is not a unit of mass');
  });

  it('says so when the same file was imported before, without polling a finished import', async () => {
    const upload = vi.fn(async () => ({ job: job({ status: 'done', processed: 4, percent: 100, accepted: 4 }), replayed: true }));
    const fetchJob = vi.fn();
    render(<ImportPanel upload={upload} fetchJob={fetchJob} />);
    fireEvent.change(screen.getByTestId('import-file'), { target: { files: [csv()] } });
    await screen.findByTestId('import-replayed');
    expect(fetchJob).not.toHaveBeenCalled();
    expect(screen.getByTestId('import-percent')).toHaveTextContent('100 %');
  });

  it('refuses a file that is not a CSV before sending anything', async () => {
    const upload = vi.fn();
    render(<ImportPanel upload={upload} fetchJob={vi.fn()} />);
    fireEvent.change(screen.getByTestId('import-file'), { target: { files: [new File(['x'], 'photo.png', { type: 'image/png' })] } });
    await screen.findByTestId('import-error');
    expect(upload).not.toHaveBeenCalled();
  });

  it('shows the API’s refusal', async () => {
    const upload = vi.fn(async () => Promise.reject(new Error('The file has no header row.')));
    render(<ImportPanel upload={upload} fetchJob={vi.fn()} />);
    fireEvent.change(screen.getByTestId('import-file'), { target: { files: [csv()] } });
    expect(await screen.findByTestId('import-error')).toHaveTextContent('The file has no header row.');
  });
});
