import { Box, Card, CardContent, FormControl, InputLabel, MenuItem, Select, Skeleton, Typography } from '@mui/material';
import { BarChart } from '@mui/x-charts/BarChart';
import { ChartsReferenceLine } from '@mui/x-charts/ChartsReferenceLine';
import { LineChart } from '@mui/x-charts/LineChart';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { useGetList } from 'react-admin';
import type { Batch } from '../batches/types';
import { shortRef } from '../batches/types';
import { useNow } from '../common/useNow';
import { formatDate } from '../format/dates';
import type { Reading } from '../review/types';
import { formatNumber } from '../format/quantities';
import { palette } from '../theme';
import { outside, poursToday, ratioErrorsBySystem, rejectionByDay } from './floorStats';

/** How far back the overview reads, and how many rows at most (one API page each). */
const DAYS = 14;
const LIMIT = 500;

interface SystemRow {
  id: string;
  name: string;
  ratioTolerancePercent: number | null;
}

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

const shortDay = (day: string) => formatDate(`${day}T12:00:00`).replace(/ \d{4}$/, '');

/** Pours today, the rejection rate over two weeks, and a control chart of ratio error per system. */
export default function FloorPanel() {
  const now = useNow(60_000);
  // the window moves by whole hours, so the list query keeps its cache key between clock ticks
  const hour = Math.floor(now / 3_600_000);
  const since = useMemo(() => new Date((hour - DAYS * 24) * 3_600_000).toISOString(), [hour]);
  const { data: readings, isPending: readingsPending, total: readingsTotal } = useGetList<Reading>('readings', {
    filter: { receivedAfter: since },
    pagination: { page: 1, perPage: LIMIT },
    sort: { field: 'receivedAt', order: 'DESC' },
  });
  const { data: batches = [], isPending: batchesPending } = useGetList<Batch>('batches', { pagination: { page: 1, perPage: LIMIT }, sort: { field: 'createdAt', order: 'DESC' } });
  const { data: systems = [] } = useGetList<SystemRow>('material-systems', { pagination: { page: 1, perPage: 100 }, sort: { field: 'name', order: 'ASC' } });

  const rows = useMemo(() => readings ?? [], [readings]);
  const pours = useMemo(() => poursToday(rows, now), [rows, now]);
  const waiting = useMemo(() => rows.filter((r) => r.status === 'rejected' && !r.review).length, [rows]);
  const rates = useMemo(() => rejectionByDay(rows, DAYS, now), [rows, now]);
  const series = useMemo(() => ratioErrorsBySystem(batches, rows), [batches, rows]);
  const withData = systems.filter((s) => series.has(s.id));
  const [chosen, setChosen] = useState<string>('');
  const systemId = chosen && series.has(chosen) ? chosen : (withData[0]?.id ?? '');
  const system = systems.find((s) => s.id === systemId);
  const points = series.get(systemId) ?? [];
  const tol = system?.ratioTolerancePercent ?? 5;
  const judgedToday = rates[rates.length - 1];
  const judged = rates.reduce((s, r) => s + r.judged, 0);
  const rejected = rates.reduce((s, r) => s + r.rejected, 0);
  const plannedToday = batches.filter((b) => b.plannedFor === new Date(now).toISOString().slice(0, 10)).length;
  const pending = readingsPending || batchesPending;
  const yMax = Math.max(tol * 1.8, ...points.map((p) => Math.abs(p.errorPercent) * 1.15));

  return (
    <Box component="section" aria-label="Shop floor" sx={{ display: 'grid', gap: 2 }} data-testid="floor-panel">
      <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr 1fr', md: 'repeat(4, minmax(0, 1fr))' } }}>
        <Stat label="Pours today" value={pending ? '…' : String(pours)} hint={`batches weighed since midnight · ${plannedToday} planned for today`} testId="stat-pours-today" to="/batches" />
        <Stat
          label="Rejected today"
          value={pending || !judgedToday ? '…' : judgedToday.rate === null ? '—' : `${formatNumber(judgedToday.rate, { decimals: 0 })} %`}
          hint={judgedToday ? `${judgedToday.rejected} of ${judgedToday.judged} judged readings` : undefined}
          testId="stat-rejected-today"
        />
        <Stat label="Waiting for a decision" value={pending ? '…' : String(waiting)} hint={`rejected in the last ${DAYS} days, not yet waived or upheld`} testId="stat-waiting" to="/readings" />
        <Stat label={`Last ${DAYS} days`} value={judged ? `${formatNumber((rejected / judged) * 100, { decimals: 1 })} %` : '—'} hint={`${rejected} of ${judged} judged readings rejected`} testId="stat-rate" />
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
            {pending ? (
              <Skeleton variant="rounded" height={240} sx={{ mt: 1 }} />
            ) : (
              <Box data-testid="chart-rejection-rate" role="img" aria-label={`Rejection rate per day over the last ${DAYS} days: ${rates.filter((r) => r.rate !== null).map((r) => `${shortDay(r.day)} ${formatNumber(r.rate!, { decimals: 0 })} %`).join(', ') || 'no readings judged'}`}>
                <BarChart
                  height={250}
                  margin={{ left: 0, right: 8, top: 16, bottom: 0 }}
                  xAxis={[{ data: rates.map((r) => shortDay(r.day)), scaleType: 'band', tickLabelStyle: { fontSize: 10 } }]}
                  yAxis={[{ min: 0, max: 100, valueFormatter: (v: number) => `${v} %`, width: 44 }]}
                  series={[{ data: rates.map((r) => (r.rate === null ? null : Math.round(r.rate * 10) / 10)), label: 'rejected', color: palette.copper, valueFormatter: (v) => (v === null ? 'nothing judged' : `${v} %`) }]}
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
                  Individual values of the A:B ratio error, with the ±{formatNumber(tol, { decimals: 1, trim: true })} % tolerance
                </Typography>
              </Box>
              <FormControl size="small" sx={{ minWidth: 200 }}>
                <InputLabel id="control-system">Material system</InputLabel>
                <Select labelId="control-system" label="Material system" value={systemId} onChange={(e) => setChosen(e.target.value)} data-testid="control-system">
                  {withData.length === 0 ? <MenuItem value="">No weighed batches yet</MenuItem> : null}
                  {withData.map((s) => (
                    <MenuItem key={s.id} value={s.id}>
                      {s.name}
                    </MenuItem>
                  ))}
                </Select>
              </FormControl>
            </Box>
            {pending ? (
              <Skeleton variant="rounded" height={240} sx={{ mt: 1 }} />
            ) : points.length === 0 ? (
              <Box sx={{ height: 250, display: 'grid', placeItems: 'center', textAlign: 'center', color: 'text.secondary' }}>
                <Typography variant="body2">No batch has both parts weighed in the last {DAYS} days.</Typography>
              </Box>
            ) : (
              <Box data-testid="chart-control" role="img" aria-label={`Ratio error of ${points.length} batches of ${system?.name ?? 'this system'}; ${outside(points, tol)} outside ±${tol} %`}>
                <LineChart
                  height={250}
                  margin={{ left: 0, right: 56, top: 16, bottom: 0 }}
                  xAxis={[{ data: points.map((_, i) => i + 1), scaleType: 'point', valueFormatter: (i: number, ctx: { location: string }) => (ctx.location === 'tick' ? String(i) : `batch ${shortRef(points[i - 1]?.batchId)} · ${formatDate(points[i - 1]?.at)}`), tickLabelStyle: { fontSize: 10 }, label: 'batch, oldest first' }]}
                  yAxis={[
                    {
                      min: -yMax,
                      max: yMax,
                      valueFormatter: (v: number) => `${formatNumber(v, { decimals: 1, trim: true })} %`,
                      width: 52,
                      // points outside the band turn red, so they stand out without reading the axis
                      colorMap: { type: 'piecewise', thresholds: [-tol - 1e-9, tol + 1e-9], colors: ['#b3261e', palette.petrol, '#b3261e'] },
                    },
                  ]}
                  series={[{ data: points.map((p) => Math.round(p.errorPercent * 100) / 100), label: 'ratio error', color: palette.petrol, showMark: true, curve: 'linear', valueFormatter: (v) => (v === null ? '' : `${formatNumber(v, { decimals: 2, signed: true })} %`) }]}
                  hideLegend
                  grid={{ horizontal: true }}
                >
                  <ChartsReferenceLine y={tol} label={`+${tol} %`} labelAlign="end" lineStyle={{ stroke: '#b3261e', strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: '#8c1d17' }} />
                  <ChartsReferenceLine y={-tol} label={`−${tol} %`} labelAlign="end" lineStyle={{ stroke: '#b3261e', strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: '#8c1d17' }} />
                  <ChartsReferenceLine y={0} lineStyle={{ stroke: palette.textSoft, strokeWidth: 1 }} />
                </LineChart>
                <Typography variant="caption" color="text.secondary">
                  {points.length} batches · {outside(points, tol)} outside the band
                </Typography>
              </Box>
            )}
          </CardContent>
        </Card>
      </Box>
      <Typography variant="caption" color="text.secondary">
        Computed in the console from the latest {LIMIT} readings of the last {DAYS} days
        {readingsTotal !== undefined && readingsTotal > LIMIT ? ` (of ${readingsTotal})` : ''} and the latest {LIMIT} batches.
      </Typography>
    </Box>
  );
}
