import { describe, expect, it } from 'vitest';
import { describeReason, humaniseCode, reasonsLine, reasonTitle, type Reason } from './reasons';

// the shapes the readings judge writes (api/src/readings/judging.ts)
const isoHeavy: Reason = {
  code: 'RATIO_ISOCYANATE_HEAVY',
  message: 'The A:B ratio is off by -7.88 %, outside ±5 %: the isocyanate side (part B) is heavy. Excess isocyanate side tends to make the foam harder and more brittle.',
  measured: -7.8787878788,
  limit: -5,
  unit: '%',
};
const cold: Reason = { code: 'TEMPERATURE_BELOW_WINDOW', message: '16.2 °C is below the window of 18–27 °C.', measured: 16.2, limit: 18, unit: 'degC' };
const warm: Reason = { code: 'TEMPERATURE_ABOVE_WINDOW', message: '29 °C is above the window.', measured: 29, limit: 27, unit: 'degC' };
const heavy: Reason = { code: 'OVER_CAPACITY', message: '6.2 kg is over the scale’s capacity of 6 kg.', measured: 6.2, limit: 6, unit: 'kg' };
const calibration: Reason = { code: 'CALIBRATION_OVERDUE', message: 'The device was due for calibration on 2026-01-31.', measured: null, limit: null, unit: null };

describe('describeReason', () => {
  it('reads a ratio error as a signed percent against a ± band', () => {
    const v = describeReason(isoHeavy);
    expect(v.title).toBe('A:B ratio off: isocyanate side heavy');
    expect(v.measured).toBe('−7.88 %');
    expect(v.limit).toBe('limit ±5 %');
    expect(v.line).toBe('A:B ratio off: isocyanate side heavy: −7.88 %, limit ±5 %');
    expect(v.sentence).toContain('harder');
  });

  it('names the polyol side with a + error', () => {
    const v = describeReason({ ...isoHeavy, code: 'RATIO_POLYOL_HEAVY', measured: 6.25, limit: 5 });
    expect(v.title).toBe('A:B ratio off: polyol side heavy');
    expect(v.measured).toBe('+6.25 %');
  });

  it('reads temperatures against a floor or a ceiling, in the person’s units', () => {
    expect(describeReason(cold).line).toBe('Component too cold: 16.2 °C, at least 18.0 °C');
    expect(describeReason(warm).limit).toBe('at most 27.0 °C');
    expect(describeReason(cold, 'imperial').measured).toBe('61.2 °F');
    expect(describeReason(cold, 'imperial').limit).toBe('at least 64.4 °F');
  });

  it('reads masses in grams, kilograms or pounds', () => {
    expect(describeReason(heavy).line).toBe('Over the scale’s capacity: 6.200 kg, at most 6.000 kg');
    expect(describeReason({ ...heavy, measured: 0.5 }).measured).toBe('500.0 g');
    expect(describeReason(heavy, 'imperial').measured).toBe('13.669 lb');
  });

  it('keeps reasons without numbers to their title', () => {
    const v = describeReason(calibration);
    expect(v.measured).toBeNull();
    expect(v.limit).toBeNull();
    expect(v.line).toBe('Scale past its calibration date');
  });

  it('turns a code it does not know into words instead of failing', () => {
    expect(humaniseCode('MIX_TIME_TOO_LONG')).toBe('Mix time too long');
    expect(reasonTitle('MIX_TIME_TOO_LONG')).toBe('Mix time too long');
    expect(describeReason({ code: 'MIX_TIME_TOO_LONG' as Reason['code'], message: 'x', measured: 12, limit: 8, unit: 's' }).line).toBe('Mix time too long: 12 s, limit 8 s');
  });
});

describe('reasonsLine', () => {
  it('joins several reasons and says so when there are none', () => {
    expect(reasonsLine([cold, calibration])).toBe('Component too cold: 16.2 °C, at least 18.0 °C; Scale past its calibration date');
    expect(reasonsLine([])).toBe('No reason given');
    expect(reasonsLine(null)).toBe('No reason given');
  });
});
