import { Box, Typography } from '@mui/material';
import { ChartsReferenceLine } from '@mui/x-charts/ChartsReferenceLine';
import { LineChart } from '@mui/x-charts/LineChart';
import { useNavigate } from 'react-router-dom';
import { palette } from '../theme';
import type { ControlChartData, Subgroup } from './controlApi';

const fmt = (v: number | null | undefined, d = 3) => (v === null || v === undefined ? '—' : v.toLocaleString(undefined, { maximumFractionDigits: d }));
const LIMIT = '#b3261e';

/** Its own limits per subgroup (they narrow as a subgroup grows) drawn as steps beside the means. */
function limitSeries(subgroups: Subgroup[], key: 'ucl' | 'lcl' | 'rUcl' | 'rLcl', label: string) {
  return { data: subgroups.map((g) => g[key]), label, color: LIMIT, curve: 'step' as const, showMark: false, valueFormatter: (v: number | null) => fmt(v) };
}

/**
 * An X̄–R chart: the means of each batch's values against their limits, and the ranges against theirs.
 * Every figure comes from the API; a marked subgroup raised a signal and opens its batch.
 */
export function SubgroupCharts({ data }: { data: ControlChartData }) {
  const navigate = useNavigate();
  const subgroups = data.subgroups ?? [];
  const unit = data.chart.unit;
  const signalled = new Set(subgroups.flatMap((g, i) => (g.signals.length ? [i] : [])));
  const x = [
    {
      data: subgroups.map((_, i) => i + 1),
      scaleType: 'point' as const,
      label: 'batch, oldest first',
      valueFormatter: (i: number, ctx: { location: string }) => (ctx.location === 'tick' ? String(i) : `${new Date(subgroups[i - 1]?.at ?? 0).toLocaleString()} · ${subgroups[i - 1]?.n ?? ''} values`),
    },
  ];
  const open = (i: number | undefined) => {
    const g = subgroups[i ?? -1];
    if (g) navigate(`/batches/${g.batchId}/show`);
  };
  const markSx = { '& .MuiMarkElement-root': { stroke: LIMIT, fill: LIMIT, cursor: 'pointer', scale: '1.6' } };
  return (
    <Box role="img" aria-label={`${data.chart.name}: ${subgroups.length} subgroups, ${signalled.size} with a signal; ${data.limitsKind} limits`} data-testid="subgroup-charts">
      <Typography variant="subtitle2">Subgroup means ({unit})</Typography>
      <LineChart
        height={260}
        margin={{ left: 8, right: 72, top: 16, bottom: 8 }}
        xAxis={x}
        yAxis={[{ valueFormatter: (v: number) => `${fmt(v, 2)} ${unit}`, width: 72 }]}
        series={[
          {
            data: subgroups.map((g) => g.mean),
            label: 'mean',
            color: palette.petrol,
            curve: 'linear',
            showMark: ({ index }: { index: number }) => signalled.has(index),
            valueFormatter: (v: number | null, { dataIndex }: { dataIndex: number }) =>
              `${fmt(v)} ${unit}${subgroups[dataIndex]?.signals.length ? ` · signal ${subgroups[dataIndex]!.signals.map((s) => s.rule).join(', ')}` : ''}`,
          },
          limitSeries(subgroups, 'ucl', 'UCL'),
          limitSeries(subgroups, 'lcl', 'LCL'),
        ]}
        onMarkClick={(_e, item) => open(item.dataIndex)}
        hideLegend
        sx={markSx}
      >
        {data.limits ? (
          <ChartsReferenceLine y={data.limits.centre} label={`x̿ ${fmt(data.limits.centre, 2)}`} labelAlign="end" lineStyle={{ stroke: palette.ink }} labelStyle={{ fontSize: 11 }} />
        ) : null}
      </LineChart>
      <Typography variant="subtitle2">Subgroup ranges ({unit})</Typography>
      <LineChart
        height={180}
        margin={{ left: 8, right: 72, top: 16, bottom: 8 }}
        xAxis={x}
        yAxis={[{ min: 0, valueFormatter: (v: number) => `${fmt(v, 2)} ${unit}`, width: 72 }]}
        series={[
          { data: subgroups.map((g) => g.range), label: 'range', color: palette.petrol, curve: 'linear', showMark: false, valueFormatter: (v: number | null) => `${fmt(v)} ${unit}` },
          limitSeries(subgroups, 'rUcl', 'range UCL'),
          { data: subgroups.map((g) => g.rCentre), label: 'R̄', color: palette.ink, curve: 'step', showMark: false, valueFormatter: (v: number | null) => fmt(v) },
        ]}
        hideLegend
      />
      <Typography variant="caption" color="text.secondary">
        Red steps: each subgroup’s control limits (x̿ ± 3σ/√n; the range chart’s D4 limit), narrower for a batch with more values · a red mark raised a signal; select it to open its batch.
      </Typography>
    </Box>
  );
}
