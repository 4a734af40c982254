import { Alert, Box, Button, Card, CardContent, Chip, Dialog, DialogActions, DialogContent, DialogTitle, FormControl, InputLabel, MenuItem, Select, Table, TableBody, TableCell, TableHead, TableRow, TextField, Typography } from '@mui/material';
import { ChartsReferenceLine } from '@mui/x-charts/ChartsReferenceLine';
import { LineChart } from '@mui/x-charts/LineChart';
import { useCallback, useEffect, useState } from 'react';
import { usePermissions } from 'react-admin';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { knownActions } from '../auth/access';
import { palette } from '../theme';
import { type ControlChart, type ControlChartData, type ControlSignal, controlApi, readingHref } from './controlApi';
import { NewChartDialog } from './NewChartDialog';
import { SubgroupCharts } from './SubgroupCharts';

const fmt = (v: number | null | undefined, d = 3) => (v === null || v === undefined ? '—' : v.toLocaleString(undefined, { maximumFractionDigits: d }));
const LIMIT = '#b3261e';
const ZONE = '#c9a227';

function AcknowledgeDialog({ signal, onClose, onDone }: { signal: ControlSignal | null; onClose: () => void; onDone: () => void }) {
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setNote('');
    setError(null);
  }, [signal]);
  if (!signal) return null;
  const submit = async () => {
    try {
      await controlApi.acknowledge(signal.id, note);
      onDone();
    } catch (e) {
      setError((e as Error).message || 'The signal could not be acknowledged.');
    }
  };
  return (
    <Dialog open onClose={onClose} aria-labelledby="ack-title" fullWidth maxWidth="sm">
      <DialogTitle id="ack-title">Acknowledge: {signal.ruleDescription}</DialogTitle>
      <DialogContent>
        <Typography variant="body2" sx={{ mb: 2 }}>
          Say what was found or done (a scale re-zeroed, a drum moved to the heater …). The note is kept with the signal and in the audit log.
        </Typography>
        <TextField label="Note" value={note} onChange={(e) => setNote(e.target.value)} multiline minRows={3} fullWidth autoFocus inputProps={{ maxLength: 2000, 'data-testid': 'ack-note' }} />
        {error ? <Alert severity="error" sx={{ mt: 2 }}>{error}</Alert> : null}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" disabled={!note.trim()} onClick={submit} data-testid="ack-submit">
          Acknowledge
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** The chart: points, centre line, control limits, 1σ and 2σ zones, signals marked and clickable. */
function ChartView({ data }: { data: ControlChartData }) {
  const navigate = useNavigate();
  const { points, limits } = data;
  const signalled = new Set(points.flatMap((p, i) => (p.signals.length ? [i] : [])));
  const values = points.map((p) => p.value);
  const span = limits ? [limits.lcl, limits.ucl] : [];
  const lo = Math.min(...values, ...span);
  const hi = Math.max(...values, ...span);
  const pad = (hi - lo) * 0.08 || 1;
  const unit = data.chart.unit;
  return (
    <Box role="img" aria-label={`${data.chart.name}: ${points.length} points, ${signalled.size} with a signal; ${data.limitsKind} limits`} data-testid="control-chart">
      <LineChart
        height={320}
        margin={{ left: 8, right: 72, top: 16, bottom: 8 }}
        xAxis={[{ data: points.map((_, i) => i + 1), scaleType: 'point', valueFormatter: (i: number, ctx: { location: string }) => (ctx.location === 'tick' ? String(i) : new Date(points[i - 1]?.at ?? 0).toLocaleString()), label: 'point, oldest first' }]}
        yAxis={[{ min: lo - pad, max: hi + pad, valueFormatter: (v: number) => `${fmt(v, 2)} ${unit}`, width: 72 }]}
        series={[
          {
            data: values,
            label: data.chart.metricLabel,
            color: palette.petrol,
            curve: 'linear',
            showMark: ({ index }: { index: number }) => signalled.has(index),
            valueFormatter: (v: number | null, { dataIndex }: { dataIndex: number }) => {
              const s = points[dataIndex]?.signals ?? [];
              return `${fmt(v)} ${unit}${s.length ? ` · signal ${s.map((x) => x.rule).join(', ')}` : ''}`;
            },
          },
        ]}
        onMarkClick={(_e, item) => {
          const href = readingHref(points[item.dataIndex ?? -1]?.readingId);
          if (href) navigate(href);
        }}
        hideLegend
        sx={{ '& .MuiMarkElement-root': { stroke: LIMIT, fill: LIMIT, cursor: 'pointer', scale: '1.6' } }}
      >
        {limits ? (
          <>
            <ChartsReferenceLine y={limits.ucl} label={`UCL ${fmt(limits.ucl, 2)}`} labelAlign="end" lineStyle={{ stroke: LIMIT, strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: LIMIT }} />
            <ChartsReferenceLine y={limits.lcl} label={`LCL ${fmt(limits.lcl, 2)}`} labelAlign="end" lineStyle={{ stroke: LIMIT, strokeDasharray: '6 4' }} labelStyle={{ fontSize: 11, fill: LIMIT }} />
            <ChartsReferenceLine y={limits.centre} label={`CL ${fmt(limits.centre, 2)}`} labelAlign="end" lineStyle={{ stroke: palette.ink }} labelStyle={{ fontSize: 11 }} />
            {[...limits.zones.oneSigma, ...limits.zones.twoSigma].map((y, i) => (
              <ChartsReferenceLine key={i} y={y} lineStyle={{ stroke: ZONE, strokeDasharray: '2 4', strokeWidth: 1 }} />
            ))}
          </>
        ) : null}
      </LineChart>
      <Typography variant="caption" color="text.secondary">
        Dashed red: control limits (centre ± 3σ) · dotted: 1σ and 2σ zones · a red mark is a point that raised a signal; select it to open its reading.
      </Typography>
    </Box>
  );
}

function Capability({ data }: { data: ControlChartData }) {
  const c = data.capability;
  if (!c) return null;
  return (
    <Box data-testid="capability">
      <Typography variant="subtitle2">Capability against the system’s tolerance ({fmt(data.specification.lsl)} … {fmt(data.specification.usl)} {data.chart.unit})</Typography>
      <Table size="small" sx={{ maxWidth: 520 }}>
        <TableBody>
          <TableRow><TableCell>Points</TableCell><TableCell>{c.n}</TableCell><TableCell>Mean</TableCell><TableCell>{fmt(c.mean)}</TableCell></TableRow>
          <TableRow><TableCell>Cp</TableCell><TableCell>{fmt(c.cp, 2)}</TableCell><TableCell>Cpk</TableCell><TableCell>{fmt(c.cpk, 2)}</TableCell></TableRow>
          <TableRow><TableCell>Pp</TableCell><TableCell>{fmt(c.pp, 2)}</TableCell><TableCell>Ppk</TableCell><TableCell>{fmt(c.ppk, 2)}</TableCell></TableRow>
        </TableBody>
      </Table>
      {c.warnings.map((w) => <Alert key={w} severity="info" sx={{ mt: 1 }}>{w}</Alert>)}
    </Box>
  );
}

function SignalsTable({ signals, onAcknowledge, canManage }: { signals: ControlSignal[]; onAcknowledge: (s: ControlSignal) => void; canManage: boolean }) {
  if (signals.length === 0) return <Typography variant="body2" color="text.secondary">No signals.</Typography>;
  return (
    <Table size="small" data-testid="signals-table">
      <TableHead>
        <TableRow><TableCell>Raised</TableCell><TableCell>Rule</TableCell><TableCell>Value</TableCell><TableCell>Reading</TableCell><TableCell>State</TableCell></TableRow>
      </TableHead>
      <TableBody>
        {signals.map((s) => {
          const href = readingHref(s.readingId);
          return (
            <TableRow key={s.id} data-testid="signal-row">
              <TableCell>{new Date(s.raisedAt).toLocaleString()}</TableCell>
              <TableCell><strong>{s.rule}</strong> {s.ruleDescription}</TableCell>
              <TableCell>{fmt(s.value)}</TableCell>
              <TableCell>{href ? <Link to={href}>open reading</Link> : '—'}{s.batchId ? <> · <Link to={`/batches/${s.batchId}/show`}>batch</Link></> : null}</TableCell>
              <TableCell>
                {s.acknowledgement ? (
                  <Typography variant="body2" title={s.acknowledgement.note ?? ''}>acknowledged by {s.acknowledgement.by}: {s.acknowledgement.note}</Typography>
                ) : canManage ? (
                  <Button size="small" variant="outlined" onClick={() => onAcknowledge(s)} data-testid="ack-open">Acknowledge</Button>
                ) : (
                  'open'
                )}
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}

/** Control charts: pick a chart, see the process against its limits, and work the signals. */
export default function ControlPage() {
  const [charts, setCharts] = useState<ControlChart[] | null>(null);
  // the chart in view is in the address (#/control?chart=…): a reload or a mailed link keeps it
  const [params, setParams] = useSearchParams();
  const chosen = params.get('chart') ?? '';
  const setChosen = useCallback((id: string) => setParams(id ? { chart: id } : {}, { replace: true }), [setParams]);
  const [data, setData] = useState<ControlChartData | null>(null);
  const [signals, setSignals] = useState<ControlSignal[]>([]);
  const [acking, setAcking] = useState<ControlSignal | null>(null);
  const [defining, setDefining] = useState(false);
  const { permissions } = usePermissions<string[]>();
  const canManage = knownActions(permissions).has('control:manage');
  const [error, setError] = useState<string | null>(null);
  const [tick, setTick] = useState(0);
  const reload = useCallback(() => setTick((t) => t + 1), []);

  const [chartsTick, setChartsTick] = useState(0);
  useEffect(() => {
    controlApi.charts().then((c) => {
      setCharts(c);
      if (!chosen || !c.some((x) => x.id === chosen)) setChosen(c[0]?.id ?? '');
    }, (e: Error) => setError(e.message));
  }, [chartsTick]);
  useEffect(() => {
    if (!chosen) return;
    let live = true;
    Promise.all([controlApi.data(chosen), controlApi.signals({ chartId: chosen })]).then(([d, s]) => {
      if (!live) return;
      setData(d);
      setSignals(s);
      setError(null);
    }, (e: Error) => live && setError(e.message));
    return () => {
      live = false;
    };
  }, [chosen, tick]);

  const downloadCsv = async () => {
    const blob = await controlApi.csv(chosen);
    const a = document.createElement('a');
    a.href = URL.createObjectURL(blob);
    a.download = `control-chart-${chosen}.csv`;
    a.click();
    URL.revokeObjectURL(a.href);
  };
  const freeze = async () => {
    try {
      await controlApi.freeze(chosen, baselineCount);
      reload();
    } catch (e) {
      setError((e as Error).message);
    }
  };

  const subgrouped = data?.chart.kind === 'xbar_r';
  const baselineCount = (subgrouped ? data?.subgroups?.length : data?.points.length) ?? 0;
  const created = (c: ControlChart) => {
    setDefining(false);
    setChosen(c.id);
    setChartsTick((t) => t + 1);
  };

  return (
    <Box component="section" aria-label="Control charts" sx={{ display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: 2, p: 2 }} data-testid="control-page">
      <Typography variant="h5" component="h1">Control charts</Typography>
      {error ? <Alert severity="error">{error}</Alert> : null}
      {canManage ? (
        <Box sx={{ '@media print': { display: 'none' } }}>
          <Button variant="contained" onClick={() => setDefining(true)} data-testid="new-chart">New chart</Button>
        </Box>
      ) : null}
      {charts && charts.length === 0 ? <Alert severity="info">No control chart yet.{canManage ? ' Define one with New chart: a metric of a material system and the run rules to watch.' : ' An engineer defines them.'}</Alert> : null}
      {charts && charts.length > 0 ? (
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', alignItems: 'center', '@media print': { display: 'none' } }}>
          <FormControl size="small" sx={{ width: { xs: '100%', sm: 420 } }}>
            <InputLabel id="chart-pick">Chart</InputLabel>
            <Select labelId="chart-pick" label="Chart" value={chosen} onChange={(e) => setChosen(String(e.target.value))} data-testid="chart-pick">
              {charts.map((c) => <MenuItem key={c.id} value={c.id}>{c.name} · {c.metricLabel}</MenuItem>)}
            </Select>
          </FormControl>
          <Button onClick={downloadCsv} disabled={!chosen} data-testid="csv">Export CSV</Button>
          <Button onClick={() => window.print()} disabled={!data}>Print</Button>
          {data && data.limitsKind === 'trial' && canManage ? <Button onClick={freeze} disabled={baselineCount < 20}>Freeze these {baselineCount} {subgrouped ? 'subgroups' : 'points'} as the baseline</Button> : null}
        </Box>
      ) : null}
      {data ? (
        <Card>
          <CardContent sx={{ display: 'grid', gap: 2 }}>
            <Box sx={{ display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
              <Typography variant="h6" component="h2">{data.chart.name}</Typography>
              <Chip size="small" label={data.limitsKind === 'frozen' ? `frozen baseline · ${data.chart.baseline?.n ?? ''} ${subgrouped ? 'subgroups' : 'points'}` : 'trial limits'} color={data.limitsKind === 'frozen' ? 'primary' : 'warning'} data-testid="limits-kind" />
              <Chip size="small" label={`rules ${data.chart.rules.join(' ')}`} variant="outlined" />
              <Chip size="small" label={subgrouped ? 'X̄–R, a batch per subgroup' : 'individuals'} variant="outlined" />
            </Box>
            {data.warnings.map((w) => <Alert key={w} severity="warning">{w}</Alert>)}
            {subgrouped ? (data.subgroups?.length ? <SubgroupCharts data={data} /> : <Typography color="text.secondary">No subgroup yet: a batch needs 2 to 10 values.</Typography>) : data.points.length ? <ChartView data={data} /> : <Typography color="text.secondary">No points yet.</Typography>}
            <Capability data={data} />
          </CardContent>
        </Card>
      ) : null}
      {chosen ? (
        <Card>
          <CardContent>
            <Typography variant="h6" component="h2" gutterBottom>Signals</Typography>
            <SignalsTable signals={signals} onAcknowledge={setAcking} canManage={canManage} />
          </CardContent>
        </Card>
      ) : null}
      <NewChartDialog open={defining} onClose={() => setDefining(false)} onCreated={created} />
      <AcknowledgeDialog signal={acking} onClose={() => setAcking(null)} onDone={() => { setAcking(null); reload(); }} />
    </Box>
  );
}
