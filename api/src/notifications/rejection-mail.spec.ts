import { describe, expect, it } from '@jest/globals';
import { digestMail, figures, rejectionMail, reviewLink } from './rejection-mail.js';

const facts = {
  readingId: 'r-1',
  batchId: 'b-1',
  batchLabel: 'B-0001',
  deviceName: 'Bench scale 2',
  quantity: 'mass',
  subject: 'part_b',
  takenAt: '2026-06-01T08:15:02.000Z',
  reasons: [{ code: 'RATIO_ISOCYANATE_HEAVY', message: 'The A:B ratio is off by −5.1 %, outside ±5 %.', measured: -5.1, limit: -5, unit: '%' }],
};

describe('rejection e-mail', () => {
  it('states the reason in plain words with its figures and units', () => {
    expect(figures({ code: 'X', message: '', measured: 17.9, limit: 18, unit: 'degC' })).toBe('measured 17.9 °C against a limit of 18 °C');
    expect(figures({ code: 'X', message: '', measured: null, limit: null, unit: null })).toBe('');
    const m = rejectionMail(facts, 'http://127.0.0.1:3000/');
    expect(m.subject).toBe('Rejected reading on batch B-0001: RATIO_ISOCYANATE_HEAVY');
    expect(m.text).toContain('part B (mass)');
    expect(m.text).toContain('measured -5.1 % against a limit of -5 %');
    expect(m.text).toContain(reviewLink('http://127.0.0.1:3000', 'b-1'));
    expect(reviewLink('http://x/', 'b-1')).toBe('http://x/#/readings?filter=%7B%22status%22%3A%22rejected%22%2C%22batchId%22%3A%22b-1%22%7D');
    expect(m.text).toMatch(/SDS/);
  });
  it('gathers a digest with one block per reading', () => {
    const d = digestMail([facts, { ...facts, readingId: 'r-2', batchLabel: 'B-0002' }], 'http://x');
    expect(d.subject).toBe('2 rejected readings to review');
    expect(d.text.match(/Review: /g)).toHaveLength(2);
  });
});
