/** The words of a drift-signal e-mail: pure, so its wording is tested without a mail server. */

/** What a drift.detected event carries (its data), as the mail needs it. */
export interface DriftFacts {
  signalId: string;
  chartId: string;
  chartName: string;
  metric: string;
  rule: string;
  ruleDescription: string;
  batchId: string | null;
  value: number;
  centre: number;
  ucl: number;
  lcl: number;
}

const UNITS: Record<string, string> = {
  ratio_error_percent: '%',
  shot_mass_error_percent: '%',
  component_temperature_a_c: '°C',
  component_temperature_b_c: '°C',
  free_rise_density_kg_m3: 'kg/m³',
  part_density_kg_m3: 'kg/m³',
};

/** Three significant digits: what a chart reader compares, not a column of decimals. */
const num = (v: number) => Number(v.toPrecision(3)).toString();

/** The chart on the console's control page, with its signals to acknowledge. */
export function controlLink(publicUrl: string, chartId: string): string {
  return `${publicUrl.replace(/\/$/, '')}/#/control?chart=${encodeURIComponent(chartId)}`;
}

export function driftMail(f: DriftFacts, publicUrl: string): { subject: string; text: string } {
  const u = UNITS[f.metric] ? ` ${UNITS[f.metric]}` : '';
  return {
    subject: `Drift on ${f.chartName}: ${f.rule} — ${f.ruleDescription}`,
    text: [
      `A run rule of the control chart "${f.chartName}" fired: the process is moving, though each pour may still be within tolerance.`,
      '',
      `  Rule: ${f.rule} — ${f.ruleDescription}`,
      `  Value: ${num(f.value)}${u} (centre line ${num(f.centre)}${u}, control limits ${num(f.lcl)} to ${num(f.ucl)}${u})`,
      ...(f.batchId ? [`  Batch: ${f.batchId}`] : []),
      `  Look into it and acknowledge it: ${controlLink(publicUrl, f.chartId)}`,
      `  Signal: ${f.signalId}`,
      '',
      'Before adjusting a dispenser or handling components: wear the protective equipment their SDS names (isocyanates sensitise skin and lungs) and follow your local rules.',
      '',
      'You get one message per drift signal; turn these off on your profile in the console.',
    ].join('\n'),
  };
}
