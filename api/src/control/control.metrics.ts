import { RUN_RULE_IDS, type RunRuleId, WESTERN_ELECTRIC_RULES } from '@pourgate/batching';

/**
 * What a chart can watch; each value is in the unit its name ends with. `subgroups`: a batch gives
 * several values (readings, parts), so the metric can also be charted as X̄–R with a batch per subgroup.
 */
export const CONTROL_METRICS = {
  ratio_error_percent: { label: 'A:B ratio error', unit: '%', per: 'batch', subgroups: false },
  shot_mass_error_percent: { label: 'Shot mass error against target', unit: '%', per: 'batch', subgroups: false },
  component_temperature_a_c: { label: 'Part A temperature', unit: '°C', per: 'reading', subgroups: true },
  component_temperature_b_c: { label: 'Part B temperature', unit: '°C', per: 'reading', subgroups: true },
  free_rise_density_kg_m3: { label: 'Cup-test free-rise density', unit: 'kg/m³', per: 'cup test', subgroups: false },
  part_density_kg_m3: { label: 'Molded part density', unit: 'kg/m³', per: 'part', subgroups: true },
} as const;

export const CHART_KINDS = ['individuals', 'xbar_r'] as const;
export type ChartKind = (typeof CHART_KINDS)[number];

export type ControlMetric = keyof typeof CONTROL_METRICS;
export const CONTROL_METRIC_NAMES = Object.keys(CONTROL_METRICS) as ControlMetric[];

export const DEFAULT_RULES: RunRuleId[] = WESTERN_ELECTRIC_RULES;
export const ALL_RULES = RUN_RULE_IDS;

/**
 * Fewest points a frozen baseline may hold: 20 (common practice: 20–25 points before limits are
 * trusted) or the longest pattern one of the chart's rules looks for, whichever is more.
 */
export const MIN_BASELINE_POINTS = 20;

/** Points a chart answers at most in one request (the newest, in order). */
export const MAX_CHART_POINTS = 5000;
export const DEFAULT_CHART_POINTS = 500;
