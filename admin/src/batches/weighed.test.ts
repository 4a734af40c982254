import { describe, expect, it } from 'vitest';
import { barDomain, positionOn } from './weighed';

describe('bar geometry', () => {
  it('shows the band and an outlier with room around them', () => {
    const d = barDomain(462.3, 511, 486.7, 530);
    expect(d.min).toBeLessThan(462.3);
    expect(d.max).toBeGreaterThan(530);
    expect(positionOn(486.7, 400, 600)).toBeCloseTo(0.4335, 4);
    expect(positionOn(700, 400, 600)).toBe(1);
    expect(positionOn(1, 2, 2)).toBe(0.5);
  });
});
