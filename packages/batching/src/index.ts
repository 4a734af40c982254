/**
 * The computation of Pourgate and the judging decision: pure functions, no Nest, no database, no I/O.
 * (kg, m³, kg/m³, °C, s); see each module for its conventions.
 */
export * from './cautions.js';
export * from './density.js';
export * from './errors.js';
export * from './isocyanate-index.js';
export * from './mass.js';
export * from './mold-volume.js';
export * from './ratio.js';
export * from './targets.js';
export * from './units.js';
export * from './version.js';
export * from './warnings.js';
export { isoDateToDayNumber } from './validation.js';
export * from './judging.js';
export * from './inputs/field-errors.js';
export { ABSOLUTE_ZERO_C, QuantityReader, opt, type QuantityRule } from './inputs/quantities.js';
export * from './inputs/dates.js';
export * from './inputs/system-parameters.js';
export * from './inputs/mold-geometry.js';
export * from './spc/index.js';
export * from './findings.js';
export * from './bounds.js';
export * from './cup-test.js';
export * from './release.js';
export * from './parts.js';
