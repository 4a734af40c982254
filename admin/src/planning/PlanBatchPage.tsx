import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import {
  Alert,
  Box,
  Button,
  Card,
  CardContent,
  Divider,
  FormControl,
  FormHelperText,
  InputAdornment,
  InputLabel,
  LinearProgress,
  Link as MuiLink,
  MenuItem,
  Select,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Title, useGetList, useGetOne, useNotify } from 'react-admin';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { CanAccessPage } from '../calculator/CanAccessPage';
import { PageHeader } from '../common/PageHeader';
import { SafetyNote } from '../common/SafetyNote';
import { problemOf } from '../dataProvider/problem';
import { localToday } from '../devices/deviceRules';
import { CautionList, ComponentTable, SdsLine, TargetSummary, WarningList } from '../batches/TargetFigures';
import { batchTitle, shortRef } from '../batches/labels';
import { formatDate } from '../format/dates';
import { formatNumber } from '../format/quantities';
import { useHolds, useUnitSystem } from '../review/hooks';
import { monoFont } from '../theme';
import type { Batch, Device, Lot, MaterialSystem, Mold, TargetsView, WorkOrder } from '../views/sdk';
import { buildPlan, fieldOfPointer, initialPlan, LOT_FIELD, lotRefusals, MAX_BATCHES_AT_ONCE, planFromSearch, previewOf, type LotPart, type PlanForm } from './planRequest';
import { newAttemptKey, planningApi } from './planningApi';

type Errors = Partial<Record<keyof PlanForm, string>>;

const VOLUME_UNITS = [
  { id: 'mL', name: 'mL' },
  { id: 'L', name: 'L' },
  { id: 'in3', name: 'in³' },
  { id: 'gal', name: 'US gal' },
];
const DENSITY_UNITS = [
  { id: 'kg/m3', name: 'kg/m³' },
  { id: 'g/cm3', name: 'g/cm³' },
  { id: 'lb/ft3', name: 'lb/ft³' },
];
const TEMPERATURE_UNITS = [
  { id: 'degC', name: '°C' },
  { id: 'degF', name: '°F' },
];
const toggleSx = {
  '& .MuiToggleButton-root': { color: 'text.secondary', fontWeight: 500, textTransform: 'none', py: 0.5 },
  '& .MuiToggleButton-root.Mui-selected': { color: 'primary.dark', bgcolor: '#e3efef' },
} as const;

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box component="fieldset" sx={{ border: 'none', p: 0, m: 0, display: 'grid', gap: 1.5, minWidth: 0 }}>
      <Typography component="legend" variant="overline" color="text.secondary" sx={{ mb: 0.5, p: 0 }}>
        {title}
      </Typography>
      {children}
    </Box>
  );
}

function UnitSelect({ value, onChange, units, label }: { value: string; onChange: (v: string) => void; units: { id: string; name: string }[]; label: string }) {
  return (
    <Select
      variant="standard"
      disableUnderline
      value={value}
      onChange={(e) => onChange(e.target.value)}
      inputProps={{ 'aria-label': label }}
      sx={{ fontSize: '0.85rem', '& .MuiSelect-select': { py: 0, pr: '20px !important' } }}
    >
      {units.map((u) => (
        <MenuItem key={u.id} value={u.id}>
          {u.name}
        </MenuItem>
      ))}
    </Select>
  );
}

export default function PlanBatchRoute() {
  // a new link (another work order, the calculator's figures) starts a new form
  const { search } = useLocation();
  return (
    <CanAccessPage action="shop:write">
      <PlanBatch key={search} />
    </CanAccessPage>
  );
}

const PART_LABEL: Record<LotPart, string> = { A: 'Part A lot', B: 'Part B lot', pigment: 'Pigment lot' };

function PlanBatch() {
  const units = useUnitSystem();
  const location = useLocation();
  const navigate = useNavigate();
  const notify = useNotify();
  const today = useMemo(() => localToday(), []);
  const [form, setForm] = useState<PlanForm>(() => planFromSearch(location.search, initialPlan(units, today)));
  const [errors, setErrors] = useState<Errors>({});
  const [otherErrors, setOtherErrors] = useState<string[]>([]);
  const [preview, setPreview] = useState<TargetsView | null>(null);
  const [previewBusy, setPreviewBusy] = useState(false);
  const [progress, setProgress] = useState<{ done: number; of: number } | null>(null);
  const [planned, setPlanned] = useState<Batch[]>([]);
  const [plannedWith, setPlannedWith] = useState<string | null>(null);
  const sequence = useRef(0);

  const { data: order } = useGetOne<WorkOrder>('work-orders', { id: form.workOrderId }, { enabled: !!form.workOrderId });
  const { data: orders = [] } = useGetList<WorkOrder>('work-orders', { pagination: { page: 1, perPage: 100 }, sort: { field: 'dueOn', order: 'ASC' }, filter: {} });
  const { data: systems = [] } = useGetList<MaterialSystem>('material-systems', { pagination: { page: 1, perPage: 100 }, sort: { field: 'name', order: 'ASC' } });
  const { data: molds = [] } = useGetList<Mold>('molds', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' } });
  const { data: devices = [] } = useGetList<Device>('devices', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' }, filter: {} });
  const scales = devices.filter((d) => d.kind === 'scale' && !d.retired);
  const stations = [...new Set(devices.map((d) => d.stationCode).filter((c): c is string => !!c))].sort();

  // a work order names its system and mold: the form shows them and the API takes them
  const systemId = form.systemId || order?.materialSystemId || '';
  const moldId = form.moldId || order?.moldId || '';
  const system = systems.find((s) => s.id === systemId);
  const mold = molds.find((m) => m.id === moldId);

  const lotQuery = (part: LotPart) => ({
    pagination: { page: 1, perPage: 100 },
    sort: { field: 'expiresOn', order: 'ASC' as const },
    filter: part === 'pigment' ? { part } : { part, materialSystemId: systemId },
  });
  const { data: lotsA = [] } = useGetList<Lot>('lots', lotQuery('A'), { enabled: !!systemId });
  const { data: lotsB = [] } = useGetList<Lot>('lots', lotQuery('B'), { enabled: !!systemId });
  const { data: allPigments = [] } = useGetList<Lot>('lots', lotQuery('pigment'));
  const lotsPigment = allPigments.filter((l) => !l.materialSystemId || l.materialSystemId === systemId);
  const lotsOf: Record<LotPart, Lot[]> = { A: lotsA, B: lotsB, pigment: lotsPigment };

  // defaults: the first system and mold, and for A and B the lot expiring first that is good on the day (first expired, first out: common practice)
  useEffect(() => {
    if (!form.workOrderId && !form.systemId && systems.length) setForm((f) => ({ ...f, systemId: systems[0]!.id }));
  }, [systems, form.systemId, form.workOrderId]);
  useEffect(() => {
    if (!form.workOrderId && form.subject === 'mold' && !form.moldId && molds.length) setForm((f) => ({ ...f, moldId: molds[0]!.id }));
  }, [molds, form.moldId, form.workOrderId, form.subject]);
  useEffect(() => {
    for (const part of ['A', 'B'] as const) {
      const key = LOT_FIELD[part];
      const list = lotsOf[part];
      if (form[key] || !list.length) continue;
      const good = list.find((l) => lotRefusals(l, form.plannedFor).length === 0);
      if (good) setForm((f) => (f[key] ? f : { ...f, [key]: good.id }));
    }
  }, [lotsA, lotsB]);

  const refused = (['A', 'B', 'pigment'] as const).flatMap((p) => {
    const l = lotsOf[p].find((x) => x.id === form[LOT_FIELD[p]]);
    const why = l ? lotRefusals(l, form.plannedFor) : [];
    return why.length ? [{ part: p, lot: l!, why }] : [];
  });
  const refusedLots = refused.length > 0;
  const canOverride = useHolds('lots:override');
  // the override's reason travels only while a chosen lot needs it
  const request = useMemo(() => buildPlan(refusedLots ? form : { ...form, lotOverrideReason: '' }), [form, refusedLots]);
  const previewBody = useMemo(() => previewOf(request.body, order ? { materialSystemId: order.materialSystemId, moldId: order.moldId } : undefined), [request.body, order]);
  const previewKey = previewBody ? JSON.stringify(previewBody) : null;
  const bodyKey = request.body ? JSON.stringify(request.body) : null;
  // one key per plan as it stands: pressing again after a lost answer plans nothing twice
  const attempt = useMemo(() => newAttemptKey(), [bodyKey, request.count]);

  useEffect(() => {
    if (!previewKey) {
      setPreview(null);
      return;
    }
    const mine = ++sequence.current;
    setPreviewBusy(true);
    const timer = setTimeout(async () => {
      try {
        const r = await planningApi.preview(JSON.parse(previewKey), units);
        if (mine === sequence.current) setPreview(r);
      } catch (error) {
        if (mine !== sequence.current) return;
        setPreview(null);
        showProblem(error);
      } finally {
        if (mine === sequence.current) setPreviewBusy(false);
      }
    }, 300);
    return () => clearTimeout(timer);
  }, [previewKey, units]);

  function showProblem(error: unknown) {
    const problem = problemOf(error);
    const fields: Errors = {};
    const other: string[] = [];
    for (const e of problem?.fieldErrors ?? []) {
      const key = fieldOfPointer(e.pointer);
      if (key) fields[key] = fields[key] ? `${fields[key]}; ${e.detail}` : e.detail;
      else other.push(e.detail);
    }
    // the problem's own sentence first: it says what was refused; the fields say where
    other.unshift((typeof problem?.detail === 'string' && problem.detail) || (error as Error)?.message || 'The batch could not be planned.');
    setErrors(fields);
    setOtherErrors([...new Set(other)]);
  }

  const set = (key: keyof PlanForm) => (value: string) => {
    setForm((f) => ({ ...f, [key]: value }));
    setErrors((e) => ({ ...e, [key]: undefined }));
    setOtherErrors([]);
  };

  async function submit() {
    if (!request.body) return;
    setErrors({});
    setOtherErrors([]);
    const done: Batch[] = [];
    setProgress({ done: 0, of: request.count });
    try {
      for (let i = 0; i < request.count; i++) {
        done.push(await planningApi.plan(request.body, `${attempt}:${i}`));
        setProgress({ done: i + 1, of: request.count });
      }
      notify(request.count === 1 ? 'Batch planned.' : `${request.count} batches planned.`, { type: 'success' });
      if (request.count === 1) navigate(`/batches/${encodeURIComponent(done[0]!.id)}/show`);
      else {
        setPlanned(done);
        setPlannedWith(attempt);
      }
    } catch (error) {
      setPlanned(done);
      showProblem(error);
    } finally {
      setProgress(null);
    }
  }

  const text = (key: keyof PlanForm, label: string, opts: { unit?: ReactNode; placeholder?: string; helper?: string; type?: string; multiline?: boolean } = {}) => (
    <TextField
      label={label}
      value={form[key]}
      type={opts.type}
      multiline={opts.multiline}
      minRows={opts.multiline ? 2 : undefined}
      onChange={(e) => set(key)(e.target.value)}
      error={request.invalid.includes(key) || !!errors[key]}
      helperText={request.invalid.includes(key) ? (key === 'count' ? `A whole number from 1 to ${MAX_BATCHES_AT_ONCE}` : 'Enter a number') : (errors[key] ?? opts.helper)}
      placeholder={opts.placeholder}
      fullWidth
      slotProps={{
        htmlInput: { inputMode: opts.type ? undefined : 'decimal', 'data-testid': `plan-${key}` },
        input: opts.unit ? { endAdornment: <InputAdornment position="end">{opts.unit}</InputAdornment> } : undefined,
        inputLabel: { shrink: true },
      }}
    />
  );

  const lotField = (part: LotPart) => {
    const key = LOT_FIELD[part];
    const list = lotsOf[part];
    const chosen = list.find((l) => l.id === form[key]);
    const refusals = chosen ? lotRefusals(chosen, form.plannedFor) : [];
    const error = errors[key] ?? (refusals.length ? `Refused for a new batch: ${refusals.join('; ')}` : undefined);
    return (
      <FormControl fullWidth error={!!error} key={part}>
        <InputLabel id={`plan-${key}-label`} shrink>
          {PART_LABEL[part]}
        </InputLabel>
        <Select
          labelId={`plan-${key}-label`}
          label={PART_LABEL[part]}
          notched
          displayEmpty
          value={list.some((l) => l.id === form[key]) ? form[key] : ''}
          onChange={(e) => set(key)(e.target.value)}
          data-testid={`plan-${key}`}
        >
          <MenuItem value="">
            <em>{part === 'pigment' ? 'No pigment lot' : 'Not recorded yet'}</em>
          </MenuItem>
          {list.map((l) => {
            const why = lotRefusals(l, form.plannedFor);
            return (
              <MenuItem key={l.id} value={l.id}>
                <Box sx={{ display: 'flex', gap: 1, alignItems: 'baseline', width: '100%' }}>
                  <span style={{ fontFamily: monoFont }}>{l.lotNumber}</span>
                  <Typography variant="caption" color={why.length ? 'error' : 'text.secondary'} sx={{ ml: 'auto' }}>
                    {why.length ? (l.recall ? 'recalled' : l.hold ? 'on hold' : 'expired') : `good to ${formatDate(`${l.usableUntil}T12:00:00`)}`}
                  </Typography>
                </Box>
              </MenuItem>
            );
          })}
        </Select>
        <FormHelperText data-testid={`plan-${key}-help`}>
          {error
            ? refusals.length && !errors[key]
              ? 'Refused for a new batch: see below'
              : error
            : chosen
              ? `Usable until ${formatDate(`${chosen.usableUntil}T12:00:00`)}${chosen.usableUntil < chosen.expiresOn ? ' (opened)' : ''}`
              : part === 'pigment'
                ? 'Optional'
                : 'Can be recorded at the scale instead'}
        </FormHelperText>
      </FormControl>
    );
  };

  const busy = progress !== null;
  const overridden = refusedLots && canOverride && form.lotOverrideReason.trim().length >= 3;
  // the same plan again would only replay the answers (same keys): it waits for a change
  const alreadyPlanned = plannedWith === attempt;
  const canPlan = !!request.body && !busy && !alreadyPlanned && (!refusedLots || overridden);

  return (
    <Box sx={{ maxWidth: 1280 }}>
      <Title title="Plan a batch" />
      <PageHeader
        title="Plan a batch"
        lead="A batch is one mix for one mold (or a free-rise cup). Its targets are computed by the API when it is planned and stored with every input; the scales then weigh against them."
        actions={
          <Button component={Link} to="/calculator" size="small" variant="outlined">
            Try figures in the calculator
          </Button>
        }
      />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: 'minmax(0, 1fr)', lg: '420px minmax(0, 1fr)' }, gap: 2, alignItems: 'start' }}>
        <Card
          component="form"
          aria-label="Batch to plan"
          onSubmit={(e) => {
            e.preventDefault();
            void submit();
          }}
        >
          <CardContent sx={{ display: 'grid', gap: 2.5 }}>
            <Group title="What to make">
              <FormControl fullWidth error={!!errors.workOrderId}>
                <InputLabel id="plan-order-label" shrink>
                  Work order
                </InputLabel>
                <Select
                  labelId="plan-order-label"
                  label="Work order"
                  notched
                  displayEmpty
                  value={orders.some((o) => o.id === form.workOrderId) || order ? form.workOrderId : ''}
                  onChange={(e) =>
                    setForm((f) => ({
                      ...f,
                      workOrderId: e.target.value,
                      systemId: e.target.value ? '' : f.systemId,
                      moldId: e.target.value ? '' : f.moldId,
                      revision: '',
                      lotA: '',
                      lotB: '',
                      lotPigment: '',
                    }))
                  }
                  data-testid="plan-workOrderId"
                >
                  <MenuItem value="">
                    <em>None: an ad hoc batch</em>
                  </MenuItem>
                  {order && !orders.some((o) => o.id === order.id) ? <MenuItem value={order.id}>{order.externalRef}</MenuItem> : null}
                  {orders
                    .filter((o) => o.state === 'open' || o.state === 'in_progress' || o.id === form.workOrderId)
                    .map((o) => (
                      <MenuItem key={o.id} value={o.id}>
                        <span style={{ fontFamily: monoFont }}>{o.externalRef}</span>
                        <Typography component="span" variant="caption" color="text.secondary" sx={{ ml: 1 }}>
                          {o.quantity} parts{o.moldName ? ` · ${o.moldName}` : ''}
                        </Typography>
                      </MenuItem>
                    ))}
                </Select>
                <FormHelperText>
                  {errors.workOrderId ??
                    (order ? `${order.quantity} parts${order.partNumber ? ` of ${order.partNumber}` : ''}; its system and mold are used` : 'Batches planned for an order count towards it')}
                </FormHelperText>
              </FormControl>

              <FormControl fullWidth error={!!errors.systemId} disabled={!!order?.materialSystemId}>
                <InputLabel id="plan-system-label">Material system</InputLabel>
                <Select
                  labelId="plan-system-label"
                  label="Material system"
                  value={systems.some((s) => s.id === systemId) ? systemId : ''}
                  onChange={(e) => setForm((f) => ({ ...f, systemId: e.target.value, revision: '', lotA: '', lotB: '', lotPigment: '' }))}
                  data-testid="plan-systemId"
                >
                  {systems.map((s) => (
                    <MenuItem key={s.id} value={s.id}>
                      {s.name}
                    </MenuItem>
                  ))}
                </Select>
                {errors.systemId ? <FormHelperText>{errors.systemId}</FormHelperText> : null}
              </FormControl>
              <FormControl fullWidth error={!!errors.revision}>
                <InputLabel id="plan-revision-label" shrink>
                  System revision
                </InputLabel>
                <Select labelId="plan-revision-label" label="System revision" notched displayEmpty value={form.revision} onChange={(e) => set('revision')(e.target.value)} data-testid="plan-revision">
                  <MenuItem value="">Current{system ? ` (rev. ${system.revision})` : ''}</MenuItem>
                  {system
                    ? Array.from({ length: Math.max(0, system.revision - 1) }, (_, i) => system.revision - 1 - i).map((r) => (
                        <MenuItem key={r} value={String(r)}>
                          rev. {r}
                        </MenuItem>
                      ))
                    : null}
                </Select>
                <FormHelperText>{errors.revision ?? 'An older revision only to repeat a pour exactly as it was'}</FormHelperText>
              </FormControl>

              <ToggleButtonGroup sx={toggleSx} size="small" exclusive fullWidth value={form.subject} onChange={(_, v) => v && set('subject')(v)} aria-label="What to fill" disabled={!!order?.moldId}>
                <ToggleButton value="mold">A mold</ToggleButton>
                <ToggleButton value="cup">Free-rise cup</ToggleButton>
              </ToggleButtonGroup>
              {form.subject === 'mold' ? (
                <FormControl fullWidth error={!!errors.moldId} disabled={!!order?.moldId}>
                  <InputLabel id="plan-mold-label">Mold</InputLabel>
                  <Select labelId="plan-mold-label" label="Mold" value={molds.some((m) => m.id === moldId) ? moldId : ''} onChange={(e) => set('moldId')(e.target.value)} data-testid="plan-moldId">
                    {molds.map((m) => (
                      <MenuItem key={m.id} value={m.id}>
                        {m.name}
                        {m.code ? ` (${m.code})` : ''}
                      </MenuItem>
                    ))}
                  </Select>
                  <FormHelperText>
                    {errors.moldId ??
                      (mold
                        ? `${mold.cavities} ${mold.cavities === 1 ? 'cavity' : 'cavities'}${mold.defaultPackFactor ? ` · default pack factor ${formatNumber(mold.defaultPackFactor, { decimals: 2 })}` : ''}`
                        : ' ')}
                  </FormHelperText>
                </FormControl>
              ) : (
                text('cupVolume', 'Cup volume', { unit: <UnitSelect value={form.cupVolumeUnit} onChange={set('cupVolumeUnit')} units={VOLUME_UNITS} label="Volume unit" /> })
              )}
            </Group>

            <Group title="Lots">
              {lotField('A')}
              {lotField('B')}
              {lotField('pigment')}
              {refusedLots ? (
                <Alert severity="warning" data-testid="plan-lot-bar" sx={{ '& .MuiAlert-message': { width: '100%' } }}>
                  <Typography variant="body2" sx={{ fontWeight: 600 }}>
                    {refused.length === 1 ? 'This lot is refused for new batches' : 'These lots are refused for new batches'}
                  </Typography>
                  <Box component="ul" sx={{ m: 0, mb: 1, pl: 2.5 }}>
                    {refused.map((r) => (
                      <li key={r.part}>
                        <span style={{ fontFamily: monoFont }}>{r.lot.lotNumber}</span>: {r.why.join('; ')}
                      </li>
                    ))}
                  </Box>
                  {canOverride ? (
                    <TextField
                      label="Reason to use it anyway"
                      value={form.lotOverrideReason}
                      onChange={(e) => set('lotOverrideReason')(e.target.value)}
                      error={!!errors.lotOverrideReason}
                      helperText={errors.lotOverrideReason ?? 'An engineer’s override: recorded on the batch and in the audit log with your name.'}
                      fullWidth
                      multiline
                      minRows={2}
                      size="small"
                      sx={{ bgcolor: 'background.paper' }}
                      slotProps={{ htmlInput: { 'data-testid': 'plan-lotOverrideReason', maxLength: 1000 }, inputLabel: { shrink: true } }}
                    />
                  ) : (
                    <Typography variant="body2">Choose another lot: only an engineer or an admin may let such a lot in, with a reason.</Typography>
                  )}
                </Alert>
              ) : null}
            </Group>

            <Group title="When and where">
              <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
                {text('plannedFor', 'Planned for', { type: 'date', helper: 'Lot expiry and calibration are judged for this day' })}
                <TextField
                  label="Station"
                  value={form.stationCode}
                  onChange={(e) => set('stationCode')(e.target.value)}
                  error={!!errors.stationCode}
                  helperText={errors.stationCode ?? (form.scaleDeviceId ? 'Empty: the scale’s station' : 'A station code')}
                  slotProps={{ htmlInput: { list: 'plan-stations', 'data-testid': 'plan-stationCode', autoComplete: 'off' }, inputLabel: { shrink: true } }}
                />
                <datalist id="plan-stations">
                  {stations.map((s) => (
                    <option key={s} value={s} />
                  ))}
                </datalist>
              </Box>
              <FormControl fullWidth error={!!errors.scaleDeviceId}>
                <InputLabel id="plan-scale-label" shrink>
                  Scale
                </InputLabel>
                <Select
                  labelId="plan-scale-label"
                  label="Scale"
                  notched
                  displayEmpty
                  value={scales.some((d) => d.id === form.scaleDeviceId) ? form.scaleDeviceId : ''}
                  onChange={(e) => set('scaleDeviceId')(e.target.value)}
                  data-testid="plan-scaleDeviceId"
                >
                  <MenuItem value="">
                    <em>No scale: masses not rounded</em>
                  </MenuItem>
                  {scales.map((d) => (
                    <MenuItem key={d.id} value={d.id}>
                      {d.name} · {d.serial}
                      {d.stationCode ? ` · ${d.stationCode}` : ''}
                    </MenuItem>
                  ))}
                </Select>
                {errors.scaleDeviceId ? <FormHelperText>{errors.scaleDeviceId}</FormHelperText> : null}
              </FormControl>
            </Group>

            <Group title="Density and allowances">
              <ToggleButtonGroup sx={toggleSx} size="small" exclusive fullWidth value={form.densityMode} onChange={(_, v) => v && set('densityMode')(v)} aria-label="How the density is set">
                <ToggleButton value="default">Mold default</ToggleButton>
                <ToggleButton value="pack">Pack factor</ToggleButton>
                <ToggleButton value="density">Density</ToggleButton>
              </ToggleButtonGroup>
              {form.densityMode === 'pack' ? text('packFactor', 'Pack factor', { helper: 'Molded density ÷ free-rise density' }) : null}
              {form.densityMode === 'density'
                ? text('targetDensity', 'Target molded density', { unit: <UnitSelect value={form.densityUnit} onChange={set('densityUnit')} units={DENSITY_UNITS} label="Density unit" /> })
                : null}
              <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', gap: 1 }}>
                {text('pigmentPercent', 'Pigment', { unit: '%', placeholder: '0', helper: 'of A + B' })}
                {text('overfillPercent', 'Overfill', { unit: '%', placeholder: '0' })}
                {text('retentionPercent', 'Left in cup', { unit: '%', placeholder: '0' })}
              </Box>
              {text('componentTemperature', 'Component temperature', {
                placeholder: 'as measured',
                unit: <UnitSelect value={form.temperatureUnit} onChange={set('temperatureUnit')} units={TEMPERATURE_UNITS} label="Temperature unit" />,
              })}
            </Group>

            <Group title="Notes and count">
              {text('notes', 'Notes', { type: 'text', multiline: true })}
              {text('count', 'Batches to plan', { helper: order ? 'Identical batches, one per mix' : 'One mix each', type: 'number' })}
            </Group>
          </CardContent>
        </Card>

        <Box sx={{ display: 'grid', gap: 2, minWidth: 0 }}>
          <Card>
            <Box sx={{ height: 4 }}>{previewBusy || busy ? <LinearProgress aria-label={busy ? 'Planning' : 'Computing'} /> : null}</Box>
            <CardContent sx={{ display: 'grid', gap: 2 }} data-testid="plan-preview" data-state={previewBusy ? 'busy' : preview ? 'ready' : 'empty'}>
              {otherErrors.length ? (
                <Alert severity="error" data-testid="plan-problem">
                  {otherErrors.map((e) => (
                    <div key={e}>{e}</div>
                  ))}
                </Alert>
              ) : null}
              {!request.body && request.missing.length ? (
                <Typography variant="body2" color="text.secondary">
                  To plan, give {request.missing.join(', ')}.
                </Typography>
              ) : null}
              {preview ? (
                <Box sx={{ display: 'grid', gap: 2, opacity: previewBusy ? 0.6 : 1, transition: 'opacity 120ms' }}>
                  <TargetSummary t={preview} />
                  <Divider />
                  <ComponentTable t={preview} />
                  <WarningList warnings={preview.warnings} />
                </Box>
              ) : null}
              <Divider />
              <Box sx={{ display: 'flex', gap: 1.5, alignItems: 'center', flexWrap: 'wrap' }}>
                <Button variant="contained" startIcon={<EventAvailableOutlined />} disabled={!canPlan} onClick={() => void submit()} data-testid="plan-submit">
                  {request.count === 1 ? 'Plan the batch' : `Plan ${request.count} batches`}
                </Button>
                <Typography variant="body2" color="text.secondary">
                  {busy
                    ? `Planning ${progress!.done + 1} of ${progress!.of}…`
                    : refusedLots && !overridden
                      ? canOverride
                        ? 'A lot chosen is refused: give a reason to override, or choose another.'
                        : 'A lot chosen is refused for new batches: choose another.'
                      : order
                        ? `For ${order.externalRef}, on ${formatDate(`${form.plannedFor || today}T12:00:00`)}`
                        : `Ad hoc, on ${formatDate(`${form.plannedFor || today}T12:00:00`)}`}
                </Typography>
              </Box>
              {planned.length ? <PlannedList batches={planned} /> : null}
            </CardContent>
          </Card>
          {preview ? (
            <>
              <CautionList cautions={preview.cautions} />
              <SdsLine t={preview} />
            </>
          ) : (
            <SafetyNote />
          )}
        </Box>
      </Box>
    </Box>
  );
}

function PlannedList({ batches }: { batches: Batch[] }) {
  return (
    <Alert severity="success" data-testid="plan-done">
      <Typography variant="body2" sx={{ fontWeight: 600 }}>
        {batches.length === 1 ? 'One batch planned' : `${batches.length} batches planned`}
        {batches[0]?.workOrderExternalRef ? ` for ${batches[0].workOrderExternalRef}` : ''}
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {batches.map((b) => (
          <li key={b.id}>
            <MuiLink component={Link} to={`/batches/${encodeURIComponent(b.id)}/show`}>
              {batchTitle(b)} <span style={{ fontFamily: monoFont }}>{shortRef(b.id)}</span>
            </MuiLink>
          </li>
        ))}
      </Box>
    </Alert>
  );
}
