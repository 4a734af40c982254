/** Statistical process control: limits, run rules and capability. Pure functions. */
export * from './constants.js';
export * from './limits.js';
export * from './rules.js';
export * from './capability.js';
