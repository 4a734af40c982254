/**
 * Version of the computation, stored with every snapshot of batch targets so a stored result says
 * which rules produced it. Bump it (year.month.n) whenever a formula, default or rounding changes.
 */
export const COMPUTATION_VERSION = '2026.12.1';
