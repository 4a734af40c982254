import { Alert, Box, Button, Card, CardContent, FormControl, InputLabel, MenuItem, Select, Skeleton, Typography } from '@mui/material';
import { BarChart } from '@mui/x-charts/BarChart';
import { ChartsReferenceLine } from '@mui/x-charts/ChartsReferenceLine';
import { LineChart } from '@mui/x-charts/LineChart';
import { useCallback, useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { useDataProvider } from 'react-admin';
import type { Overview } from '../views/sdk';
import { shortRef } from '../batches/labels';
import type { PourgateDataProvider } from '../dataProvider';
import { formatDateTime, formatDayShort } from '../format/dates';
import { formatNumber, formatPercent } from '../format/quantities';
import { palette } from '../theme';

/** How many days the rejection rate covers (the API counts them, in the shop's calendar days). */
const DAYS = 14;
/** The figures are re-read this often while the overview is open. */
const REFRESH_MS = 60_000;

function Stat({ label, value, hint, testId, to }: { label: string; value: string; hint?: string; testId: string; to?: string }) {
  const body = (
    <CardContent>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Typography sx={{ fontSize: '1.9rem', fontWeight: 600, lineHeight: 1.25, fontVariantNumeric: 'tabular-nums' }} data-testid={testId}>
        {value}
      </Typography>
      {hint ? (
        <Typography variant="caption" color="text.secondary">
          {hint}
        </Typography>
      ) : null}
    </CardContent>
  );
  return (
    <Card sx={to ? { '&:hover': { borderColor: 'primary.main' } } : undefined}>
      {to ? (
        <Box component={Link} to={to} sx={{ color: 'inherit', textDecoration: 'none', display: 'block' }}>
          {body}
        </Box>
      ) : (
        body
      )}
    </Card>
  );
}

const shortDay = (day: string) => formatDayShort(day);

/** The person's time zone, so "today" is the shop's day and not UTC's. */
function localTimeZone(): string | undefined {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || undefined;
  } catch {
    return undefined;
  }
}

/** `GET /v1/overview`, re-read every minute; the previous figures stay on screen while it reloads. */
export function useOverview(materialSystemId: string) {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const [data, setData] = useState<Overview | undefined>();
  const [error, setError] = useState<unknown>();
  const [tick, setTick] = useState(0);
  const reload = useCallback(() => setTick((t) => t + 1), []);
  useEffect(() => {
    let live = true;
    dataProvider
      .getOverview({ days: DAYS, timeZone: localTimeZone(), materialSystemId: materialSystemId || undefined })
      .then(({ data: d }) => {
        if (!live) return;
        setData(d);
        setError(undefined);
      })
      .catch((e: unknown) => {
        if (live) setError(e);
      });
    const t = setTimeout(() => setTick((n) => n + 1), REFRESH_MS);
    return () => {
      live = false;
      clearTimeout(t);
    };
  }, [dataProvider, materialSystemId, tick]);
  return { data, error, reload };
}

const pct = (v: number | null | undefined, decimals = 0) => (v === null || v === undefined ? '—' : formatPercent(v, { decimals }));

/** Pours today, open rejections, the rejection rate per day and a control chart of ratio error per batch: all counted by the API. */
export default function FloorPanel() {
  const [chosen, setChosen] = useState('');
  const { data, error, reload } = useOverview(chosen);

  if (error && !data) {
    return (
      <Alert severity="warning" action={<Button onClick={reload}>Try again</Button>} data-testid="floor-panel-error">
        The shop-floor figures could not be loaded.
      </Alert>
    );
  }

  const rates = data?.rejectionRateByDay ?? [];
  const today = rates[rates.length - 1];
  const ratio = data?.ratioError;
  const points = ratio?.points ?? [];
  const systemId = ratio?.materialSystemId ?? '';
  const system = ratio?.systems.find((x) => x.id === systemId);
  const tolerances = [...new Set(points.map((p) => p.tolerancePercent))];
  const tol = tolerances.length === 1 ? tolerances[0] : undefined;
  const yMax = Math.max(1, ...points.map((p) => p.tolerancePercent * 1.8), ...points.map((p) => Math.abs(p.errorPercent) * 1.15));
  const tolText = (v: number) => formatNumber(v, { decimals: 1, trim: true });

  return (
    <Box component="section" aria-label="Shop floor" sx={{ display: 'grid', gap: 2 }} data-testid="floor-panel">
      <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(4, minmax(0, 1fr))' } }}>
        <Stat label="Pours today" value={data ? formatNumber(data.poursToday, { decimals: 0 }) : '…'} hint={data ? `batches weighed since midnight · ${data.plannedToday} planned for today` : undefined} testId="stat-pours-today" to="/batches" />
        <Stat
          label="Rejected today"
          value={data ? pct(today?.ratePercent) : '…'}
          hint={data && today ? `${today.rejected} of ${today.judged} judged readings · ${data.readingsToday} readings today` : undefined}
          testId="stat-rejected-today"
        />
        <Stat label="Waiting for a decision" value={data ? formatNumber(data.openRejections, { decimals: 0 }) : '…'} hint="rejected readings not yet waived or upheld" testId="stat-waiting" to="/readings" />
        <Stat label={`Last ${data?.days ?? DAYS} days`} value={data ? pct(data.rejectionRatePercent, 1) : '…'} hint={data ? `${data.rejected} of ${data.judged} judged readings rejected` : undefined} testId="stat-rate" />
      </Box>

      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1fr) minmax(0, 1.25fr)' } }}>
        <Card>
          <CardContent>
            <Typography variant="h2" sx={{ fontSize: '1.02rem' }}>
              Rejection rate
            </Typography>
            <Typography variant="caption" color="text.secondary">
              Share of judged readings rejected, per day
            </Typography>
            {!data ? (
              <Skeleton variant="rounded" height={240} sx={{ mt: 1 }} />
            ) : (
              <Box
                data-testid="chart-rejection-rate"
                role="img"
                aria-label={`Rejection rate per day over the last ${data.days} days: ${
                  rates
                    .filter((r) => r.ratePercent !== null)
                    .map((r) => `${shortDay(r.day)} ${pct(r.ratePercent)}`)
                    .join(', ') || 'no readings judged'
                }`}
              >
                <BarChart
                  height={250}
                  margin={{ left: 0, right: 8, top: 16, bottom: 0 }}
                  xAxis={[{ data: rates.map((r) => shortDay(r.day)), scaleType: 'band', tickLabelStyle: { fontSize: 10 } }]}
                  yAxis={[{ min: 0, max: 100, valueFormatter: (v: number) => `${v} %`, width: 44 }]}
                  series={[{ data: rates.map((r) => r.ratePercent), label: 'rejected', color: palette.copper, valueFormatter: (v) => (v === null ? 'nothing judged' : pct(v, 1)) }]}
                  hideLegend
                  grid={{ horizontal: true }}
                />
              </Box>
            )}
          </CardContent>
        </Card>

        <Card>
          <CardContent>
            <Box sx={{ display: 'flex', alignItems: 'flex-start', gap: 2, flexWrap: 'wrap' }}>
              <Box sx={{ flex: 1, minWidth: 200 }}>
                <Typography variant="h2" sx={{ fontSize: '1.02rem' }}>
                  Ratio error per batch
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  Individual values of the A:B ratio error{tol !== undefined ? `, with the ±${tolText(tol)} % tolerance` : ', with each batch’s tolerance'}
                </Typography>
              </Box>
              <FormControl size="small" sx={{ minWidth: 200 }}>
                <InputLabel id="control-system">Material system</InputLabel>
                <Select labelId="control-system" label="Material system" value={ratio?.systems.some((x) => x.id === systemId) ? systemId : ''} onChange={(e) => setChosen(e.target.value)} data-testid="control-system">
                  {!ratio || ratio.systems.length === 0 ? <MenuItem value="">No weighed batches yet</MenuItem> : null}
                  {ratio?.systems.map((x) => (
                    <MenuItem key={x.id} value={x.id}>
                      {x.name}
                    </MenuItem>
                  ))}
                </Select>
              </FormControl>
            </Box>
            {!data ? (
              <Skeleton variant="rounded" height={240} sx={{ mt: 1 }} />
            ) : points.length === 0 ? (
              <Box sx={{ height: 250, display: 'grid', placeItems: 'center', textAlign: 'center', color: 'text.secondary' }}>
                <Typography variant="body2">No batch has both parts weighed in the last {data.days} days.</Typography>
              </Box>
            ) : (
              <Box data-testid="chart-control" role="img" aria-label={`Ratio error of ${points.length} batches of ${system?.name ?? 'this system'}; ${ratio?.outside ?? 0} outside their tolerance`}>
                <LineChart
                  height={250}
                  margin={{ left: 0, right: 56, top: 16, bottom: 0 }}
                  xAxis={[
                    {
                      data: points.map((_, i) => i + 1),
                      scaleType: 'point',
                      valueFormatter: (i: number, ctx: { location: string }) => (ctx.location === 'tick' ? String(i) : `batch ${shortRef(points[i - 1]?.batchId)} · ${formatDateTime(points[i - 1]?.lastReadingAt)}`),
                      tickLabelStyle: { fontSize: 10 },
                      label: 'batch, oldest first',
                    },
                  ]}
                  yAxis={[{ min: -yMax, max: yMax, valueFormatter: (v: number) => `${tolText(v)} %`, width: 52 }]}
                  series={[
                    { data: points.map((p) => p.errorPercent), label: 'ratio error', color: palette.petrol, showMark: true, curve: 'linear', valueFormatter: (v) => (v === null ? '' : formatPercent(v, { decimals: 2, signed: true })) },
                    // tolerances differ between batches: each batch's own band, drawn as steps
                    ...(tol === undefined
                      ? [
                          { data: points.map((p) => p.tolerancePercent), label: 'upper tolerance', color: '#b3261e', showMark: false, curve: 'stepAfter' as const },
                          { data: points.map((p) => -p.tolerancePercent), label: 'lower tolerance', color: '#b3261e', showMark: false, curve: 'stepAfter' as const },
                        ]
                      : []),
                  ]}
                  hideLegend
                  grid={{ horizontal: true }}
                >
                  {tol !== undefined ? <ChartsReferenceLine y={tol} label={`+${tolText(tol)} %`} labelAlign="end" lineStyle={{ stroke: '#b3261e', strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: '#8c1d17' }} /> : null}
                  {tol !== undefined ? <ChartsReferenceLine y={-tol} label={`−${tolText(tol)} %`} labelAlign="end" lineStyle={{ stroke: '#b3261e', strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: '#8c1d17' }} /> : null}
                  <ChartsReferenceLine y={0} lineStyle={{ stroke: palette.textSoft, strokeWidth: 1 }} />
                </LineChart>
                <Typography variant="caption" color="text.secondary" data-testid="chart-control-caption">
                  {points.length} batches · {ratio?.outside ?? 0} outside the band
                </Typography>
              </Box>
            )}
          </CardContent>
        </Card>
      </Box>
      {data ? (
        <Typography variant="caption" color="text.secondary">
          Counted by Pourgate over every reading; days in {data.timeZone}; as of {formatDateTime(data.generatedAt)}.
        </Typography>
      ) : null}
    </Box>
  );
}
