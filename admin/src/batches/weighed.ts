/** Geometry of the tolerance bars: where a value sits, and the span a bar shows. */

/** Where a value sits on a bar from `min` to `max`, as a fraction 0…1 (clamped). */
export function positionOn(value: number, min: number, max: number): number {
  if (!(max > min)) return 0.5;
  return Math.min(1, Math.max(0, (value - min) / (max - min)));
}

/** The span a tolerance bar shows: the band and the measured value, with some room either side. */
export function barDomain(low: number, high: number, target: number, measured?: number): { min: number; max: number } {
  const values = [low, high, target, ...(measured === undefined ? [] : [measured])];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = Math.max((high - low) * 0.6, Math.abs(target) * 0.02, 1e-9);
  return { min: lo - pad, max: hi + pad };
}
