// Test material systems, importable outside Jest too (the fault suite runs under tsx).
import { randomUUID } from 'node:crypto';

/** A flexible, weight-ratio system in metric units. Invented numbers (test data). */
export function flexSystem(overrides: Record<string, unknown> = {}) {
  return {
    name: `Demo Flex ${randomUUID().slice(0, 6)}`,
    kind: 'flexible',
    ratioBasis: 'weight',
    ratio: { a: 100, b: 45 },
    specificGravityA: 1.05,
    specificGravityB: 1.22,
    isocyanatePart: 'B',
    freeRiseDensity: { value: 40, unit: 'kg/m3' },
    freeRiseReferenceTemperature: { value: 22, unit: 'degC' },
    componentTemperatureWindow: { min: { value: 18, unit: 'degC' }, max: { value: 27, unit: 'degC' } },
    potLife: { value: 90, unit: 's' },
    demoldTime: { value: 12, unit: 'min' },
    fullCureTime: { value: 24, unit: 'h' },
    maxPigmentPercent: 5,
    maxPackFactor: 4,
    ...overrides,
  };
}
