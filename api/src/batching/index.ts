/**
 * The computation of Pourgate: pure functions, no Nest, no database, no I/O. Everything in SI
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
