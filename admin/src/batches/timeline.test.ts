import { describe, expect, it } from 'vitest';
import { readableReason } from './timeline';

describe('readableReason', () => {
  it('shortens ids and puts reason codes into words', () => {
    expect(readableReason('reading 65c13b1b-2240-4a51-9c64-78c961ad5cff rejected: TEMPERATURE_BELOW_WINDOW, RATIO_POLYOL_HEAVY')).toBe(
      'reading 65C13B1B rejected: Component too cold, A:B ratio off: polyol side heavy',
    );
  });
  it('leaves plain sentences alone', () => {
    expect(readableReason('released by an engineer')).toBe('released by an engineer');
    expect(readableReason('planned for a work order')).toBe('planned for a work order');
  });
});
