import { describe, expect, it } from '@jest/globals';
import { STANDARD_CAUTIONS, cautionsFor } from './cautions.js';

describe('cautions', () => {
  it('covers sensitisation, protective equipment, exotherm and the governing documents', () => {
    const text = STANDARD_CAUTIONS.map((c) => c.text).join(' ');
    expect(text).toMatch(/respiratory and skin sensitisers/);
    expect(text).toMatch(/ventilation/);
    expect(text).toMatch(/gloves/);
    expect(text).toMatch(/eye protection/);
    expect(text).toMatch(/overheat/);
    expect(text).toMatch(/SDS/);
    expect(text).toMatch(/local codes and licensed practice/);
    expect(text).toMatch(/does not replace them/);
  });

  it('appends the system\'s own cautions text, trimmed, and nothing when it is blank', () => {
    expect(cautionsFor('  Keep part A dry. ').at(-1)).toEqual({ code: 'SUPPLIER_CAUTIONS', text: 'Keep part A dry.' });
    expect(cautionsFor('   ')).toEqual([...STANDARD_CAUTIONS]);
    expect(cautionsFor()).toHaveLength(STANDARD_CAUTIONS.length);
  });

  it('cannot be altered by a caller', () => {
    const list = cautionsFor();
    list.pop();
    expect(cautionsFor()).toHaveLength(4);
    expect(Object.isFrozen(STANDARD_CAUTIONS[0])).toBe(true);
  });
});
