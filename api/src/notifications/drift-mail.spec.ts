import { describe, expect, it } from '@jest/globals';
import { controlLink, driftMail } from './drift-mail.js';

const facts = {
  signalId: 's-1',
  chartId: 'c-1',
  chartName: 'Station 2 ratio error',
  metric: 'ratio_error_percent',
  rule: 'WE2',
  ruleDescription: 'Two of three points in a row beyond 2σ, on the same side',
  batchId: 'b-1',
  value: 2.34567,
  centre: 0.1234,
  ucl: 2.9876,
  lcl: -2.7412,
};

describe('drift e-mail', () => {
  it('names the chart and the rule, gives the value against the limits in the metric unit, and links the control page', () => {
    const m = driftMail(facts, 'http://127.0.0.1:3000/');
    expect(m.subject).toBe('Drift on Station 2 ratio error: WE2 — Two of three points in a row beyond 2σ, on the same side');
    expect(m.text).toContain('Value: 2.35 % (centre line 0.123 %, control limits -2.74 to 2.99 %)');
    expect(m.text).toContain('Batch: b-1');
    expect(m.text).toContain(controlLink('http://127.0.0.1:3000', 'c-1'));
    expect(controlLink('http://x/', 'c-1')).toBe('http://x/#/control?chart=c-1');
    expect(m.text).toMatch(/SDS/);
  });

  it('leaves out the batch line for a cup-test point, which has none', () => {
    const m = driftMail({ ...facts, metric: 'free_rise_density_kg_m3', batchId: null, value: 52.04, centre: 50, ucl: 53, lcl: 47 }, 'http://x');
    expect(m.text).not.toContain('Batch:');
    expect(m.text).toContain('52 kg/m³');
  });
});
