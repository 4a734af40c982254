import CalculateOutlined from '@mui/icons-material/CalculateOutlined';
import {
  Alert,
  Box,
  Card,
  CardContent,
  Divider,
  FormControl,
  InputAdornment,
  InputLabel,
  LinearProgress,
  MenuItem,
  Select,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Title, useDataProvider, useGetList } from 'react-admin';
import type { UnitSystem } from '../auth/me';
import { CanAccessPage } from './CanAccessPage';
import { EmptyState } from '../common/EmptyState';
import { PageHeader } from '../common/PageHeader';
import { SafetyNote } from '../common/SafetyNote';
import { problemOf } from '../dataProvider/problem';
import { CautionList, ComponentTable, ProcessFigures, SdsLine, TargetSummary, WarningList } from '../batches/TargetFigures';
import type { Device, TargetsView } from '../views/sdk';
import { postCommand } from '../review/commands';
import { useUnitSystem } from '../review/hooks';
import { formatNumber } from '../format/quantities';
import { PlanFromCalculatorButton } from '../planning/PlanButtons';
import { buildPreview, fieldOfPointer, initialForm, type CalculatorForm } from './previewRequest';

interface SystemRow {
  id: string;
  name: string;
  revision: number;
  ratioBasis: 'weight' | 'volume';
  ratio: { a: number; b: number };
}
interface MoldRow {
  id: string;
  name: string;
  code: string | null;
  cavities: number;
  cavityVolumeM3: number;
  defaultPackFactor: number | null;
}

const LENGTH_UNITS = ['mm', 'cm', 'm', 'in', 'ft'];
const VOLUME_UNITS = ['mL', 'L', 'cm3', 'in3', 'ft3', 'gal'];
const DENSITY_UNITS = ['kg/m3', 'g/cm3', 'lb/ft3'];
const TEMPERATURE_UNITS = [
  { id: 'degC', name: '°C' },
  { id: 'degF', name: '°F' },
];
/** Toggle buttons with text dark enough to read (the default unselected grey is too faint on white). */
const toggleSx = {
  '& .MuiToggleButton-root': { color: 'text.secondary', fontWeight: 500, textTransform: 'none', py: 0.5 },
  '& .MuiToggleButton-root.Mui-selected': { color: 'primary.dark', bgcolor: '#e3efef' },
} as const;

const UNIT_NAME: Record<string, string> = { cm3: 'cm³', in3: 'in³', ft3: 'ft³', gal: 'US gal', 'kg/m3': 'kg/m³', 'g/cm3': 'g/cm³', 'lb/ft3': 'lb/ft³' };

function UnitSelect({ value, onChange, units, label }: { value: string; onChange: (v: string) => void; units: (string | { id: string; name: string })[]; label: string }) {
  return (
    <Select
      variant="standard"
      disableUnderline
      value={value}
      onChange={(e) => onChange(e.target.value)}
      inputProps={{ 'aria-label': label }}
      sx={{ fontSize: '0.85rem', '& .MuiSelect-select': { py: 0, pr: '20px !important' } }}
    >
      {units.map((u) => {
        const id = typeof u === 'string' ? u : u.id;
        const name = typeof u === 'string' ? (UNIT_NAME[u] ?? u) : u.name;
        return (
          <MenuItem key={id} value={id}>
            {name}
          </MenuItem>
        );
      })}
    </Select>
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Box component="fieldset" sx={{ border: 'none', p: 0, m: 0, display: 'grid', gap: 1.5 }}>
      <Typography component="legend" variant="overline" color="text.secondary" sx={{ mb: 0.5, p: 0 }}>
        {title}
      </Typography>
      {children}
    </Box>
  );
}

export default function CalculatorRoute() {
  return (
    <CanAccessPage action="targets:read">
      <Calculator />
    </CanAccessPage>
  );
}

function Calculator() {
  const personUnits = useUnitSystem();
  const dataProvider = useDataProvider();
  const [units, setUnits] = useState<UnitSystem>(personUnits);
  const [form, setForm] = useState<CalculatorForm>(() => initialForm(personUnits));
  const [result, setResult] = useState<TargetsView | null>(null);
  const [busy, setBusy] = useState(false);
  const [fieldErrors, setFieldErrors] = useState<Partial<Record<keyof CalculatorForm, string>>>({});
  const [otherErrors, setOtherErrors] = useState<string[]>([]);
  const sequence = useRef(0);

  const { data: systems = [] } = useGetList<SystemRow>('material-systems', { pagination: { page: 1, perPage: 100 }, sort: { field: 'name', order: 'ASC' } });
  const { data: molds = [] } = useGetList<MoldRow>('molds', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' } });
  const { data: devices = [] } = useGetList<Device>('devices', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' }, filter: {} });
  const scales = devices.filter((d) => d.kind === 'scale' && !d.retired);

  // the first system and mold are a sensible start on an empty form
  useEffect(() => {
    if (!form.systemId && systems.length) setForm((f) => ({ ...f, systemId: systems[0]!.id }));
  }, [systems, form.systemId]);
  useEffect(() => {
    if (!form.moldId && molds.length) setForm((f) => ({ ...f, moldId: molds[0]!.id }));
  }, [molds, form.moldId]);

  const request = useMemo(() => buildPreview(form), [form]);
  const bodyKey = request.body ? JSON.stringify(request.body) : null;

  useEffect(() => {
    if (!bodyKey) return;
    const mine = ++sequence.current;
    setBusy(true);
    const timer = setTimeout(async () => {
      try {
        const r = await postCommand<TargetsView>(dataProvider, `targets/preview?units=${units}`, JSON.parse(bodyKey));
        if (mine !== sequence.current) return;
        setResult(r);
        setFieldErrors({});
        setOtherErrors([]);
      } catch (error) {
        if (mine !== sequence.current) return;
        const problem = problemOf(error);
        const fields: Partial<Record<keyof CalculatorForm, string>> = {};
        const other: string[] = [];
        for (const e of problem?.fieldErrors ?? []) {
          const key = fieldOfPointer(e.pointer);
          if (key) fields[key] = fields[key] ? `${fields[key]}; ${e.detail}` : e.detail;
          else other.push(`${e.pointer}: ${e.detail}`);
        }
        if (!problem?.fieldErrors?.length) other.push((error as Error)?.message || 'The targets could not be computed.');
        setFieldErrors(fields);
        setOtherErrors(other);
        setResult(null);
      } finally {
        if (mine === sequence.current) setBusy(false);
      }
    }, 300);
    return () => clearTimeout(timer);
  }, [bodyKey, units, dataProvider]);

  const set = (key: keyof CalculatorForm) => (value: string) => setForm((f) => ({ ...f, [key]: value }));
  const text = (key: keyof CalculatorForm, label: string, opts: { unit?: ReactNode; placeholder?: string; helper?: string } = {}) => (
    <TextField
      label={label}
      value={form[key]}
      onChange={(e) => set(key)(e.target.value)}
      error={request.invalid.includes(key) || !!fieldErrors[key]}
      helperText={request.invalid.includes(key) ? 'Enter a number' : (fieldErrors[key] ?? opts.helper)}
      placeholder={opts.placeholder}
      fullWidth
      slotProps={{
        htmlInput: { inputMode: 'decimal', 'data-testid': `calc-${key}` },
        input: opts.unit ? { endAdornment: <InputAdornment position="end">{opts.unit}</InputAdornment> } : undefined,
        inputLabel: { shrink: true },
      }}
    />
  );
  const selectedSystem = systems.find((s) => s.id === form.systemId);
  const selectedMold = molds.find((m) => m.id === form.moldId);

  return (
    <Box sx={{ maxWidth: 1280 }}>
      <Title title="Targets calculator" />
      <PageHeader
        title="Targets calculator"
        lead="Try a pour before planning it: pick a material system and a mold, or type a cavity's dimensions, and every figure is computed by the API as you type. Nothing is stored."
        actions={
          <ToggleButtonGroup sx={toggleSx} size="small" exclusive value={units} onChange={(_, v) => v && setUnits(v)} aria-label="Units of the results">
            <ToggleButton value="metric" data-testid="units-metric">
              Metric
            </ToggleButton>
            <ToggleButton value="imperial" data-testid="units-imperial">
              Imperial
            </ToggleButton>
          </ToggleButtonGroup>
        }
      />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: '380px minmax(0, 1fr)' }, gap: 2, alignItems: 'start' }}>
        <Card component="form" aria-label="Pour to compute" onSubmit={(e) => e.preventDefault()}>
          <CardContent sx={{ display: 'grid', gap: 2.5 }}>
            <Group title="Material system">
              <FormControl fullWidth error={!!fieldErrors.systemId}>
                <InputLabel id="calc-system-label">System</InputLabel>
                <Select labelId="calc-system-label" label="System" value={form.systemId} onChange={(e) => set('systemId')(e.target.value)} data-testid="calc-system">
                  {systems.map((s) => (
                    <MenuItem key={s.id} value={s.id}>
                      {s.name} · rev. {s.revision}
                    </MenuItem>
                  ))}
                </Select>
              </FormControl>
              {selectedSystem ? (
                <Typography variant="caption" color="text.secondary" sx={{ mt: -1 }}>
                  {formatNumber(selectedSystem.ratio.a, { decimals: 1, trim: true })} : {formatNumber(selectedSystem.ratio.b, { decimals: 1, trim: true })} by {selectedSystem.ratioBasis}
                </Typography>
              ) : null}
            </Group>

            <Group title="What to fill">
              <ToggleButtonGroup sx={toggleSx} size="small" exclusive fullWidth value={form.subject} onChange={(_, v) => v && set('subject')(v)} aria-label="What to fill">
                <ToggleButton value="mold">A mold</ToggleButton>
                <ToggleButton value="dimensions" data-testid="calc-subject-dimensions">
                  Dimensions
                </ToggleButton>
                <ToggleButton value="cup">Free-rise cup</ToggleButton>
              </ToggleButtonGroup>
              {form.subject === 'mold' ? (
                <>
                  <FormControl fullWidth error={!!fieldErrors.moldId}>
                    <InputLabel id="calc-mold-label">Mold</InputLabel>
                    <Select labelId="calc-mold-label" label="Mold" value={form.moldId} onChange={(e) => set('moldId')(e.target.value)} data-testid="calc-mold">
                      {molds.map((m) => (
                        <MenuItem key={m.id} value={m.id}>
                          {m.name}
                          {m.code ? ` (${m.code})` : ''}
                        </MenuItem>
                      ))}
                    </Select>
                  </FormControl>
                  {selectedMold ? (
                    <Typography variant="caption" color="text.secondary" sx={{ mt: -1 }}>
                      {selectedMold.cavities} {selectedMold.cavities === 1 ? 'cavity' : 'cavities'}
                      {selectedMold.defaultPackFactor ? ` · default pack factor ${formatNumber(selectedMold.defaultPackFactor, { decimals: 2 })}` : ' · no default pack factor'}
                    </Typography>
                  ) : null}
                </>
              ) : null}
              {form.subject === 'dimensions' ? (
                <>
                  <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
                    <ToggleButtonGroup sx={toggleSx} size="small" exclusive value={form.shape} onChange={(_, v) => v && set('shape')(v)} aria-label="Cavity shape">
                      <ToggleButton value="box">Box</ToggleButton>
                      <ToggleButton value="cylinder">Cylinder</ToggleButton>
                    </ToggleButtonGroup>
                    <Box sx={{ flex: 1 }} />
                    <Typography variant="caption" color="text.secondary">
                      inside, in
                    </Typography>
                    <UnitSelect value={form.lengthUnit} onChange={set('lengthUnit')} units={LENGTH_UNITS} label="Length unit" />
                  </Box>
                  <Box sx={{ display: 'grid', gridTemplateColumns: form.shape === 'box' ? '1fr 1fr 1fr' : '1fr 1fr', gap: 1 }}>
                    {form.shape === 'box' ? (
                      <>
                        {text('length', 'Length')}
                        {text('width', 'Width')}
                      </>
                    ) : (
                      text('diameter', 'Diameter')
                    )}
                    {text('height', 'Height')}
                  </Box>
                  {text('cavities', 'Cavities filled from one mix')}
                </>
              ) : null}
              {form.subject === 'cup'
                ? text('cupVolume', 'Cup volume', { unit: <UnitSelect value={form.cupVolumeUnit} onChange={set('cupVolumeUnit')} units={VOLUME_UNITS} label="Volume unit" /> })
                : null}
            </Group>

            <Group title="Density">
              <ToggleButtonGroup sx={toggleSx} size="small" exclusive fullWidth value={form.densityMode} onChange={(_, v) => v && set('densityMode')(v)} aria-label="How the density is set">
                <ToggleButton value="default">Mold default</ToggleButton>
                <ToggleButton value="pack" data-testid="calc-density-pack">
                  Pack factor
                </ToggleButton>
                <ToggleButton value="density">Density</ToggleButton>
              </ToggleButtonGroup>
              {form.densityMode === 'pack' ? text('packFactor', 'Pack factor', { helper: 'Molded density ÷ free-rise density' }) : null}
              {form.densityMode === 'density'
                ? text('targetDensity', 'Target molded density', { unit: <UnitSelect value={form.densityUnit} onChange={set('densityUnit')} units={DENSITY_UNITS} label="Density unit" /> })
                : null}
            </Group>

            <Group title="Allowances and conditions">
              <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', gap: 1 }}>
                {text('pigmentPercent', 'Pigment', { unit: '%', placeholder: '0', helper: 'of A + B' })}
                {text('overfillPercent', 'Overfill', { unit: '%', placeholder: '0' })}
                {text('retentionPercent', 'Left in cup', { unit: '%', placeholder: '0' })}
              </Box>
              {text('componentTemperature', 'Component temperature', {
                placeholder: 'as measured, for the expected density',
                unit: <UnitSelect value={form.temperatureUnit} onChange={set('temperatureUnit')} units={TEMPERATURE_UNITS} label="Temperature unit" />,
              })}
              <FormControl fullWidth error={!!fieldErrors.scaleDeviceId}>
                <InputLabel id="calc-scale-label" shrink>
                  Scale
                </InputLabel>
                <Select labelId="calc-scale-label" label="Scale" notched displayEmpty value={form.scaleDeviceId} onChange={(e) => set('scaleDeviceId')(e.target.value)}>
                  <MenuItem value="">
                    <em>No scale: masses not rounded</em>
                  </MenuItem>
                  {scales.map((d) => (
                    <MenuItem key={d.id} value={d.id}>
                      {d.name} · {d.serial}
                    </MenuItem>
                  ))}
                </Select>
              </FormControl>
            </Group>
          </CardContent>
        </Card>

        <Box sx={{ display: 'grid', gap: 2 }} aria-live="polite">
          <Card>
            <Box sx={{ height: 4 }}>{busy ? <LinearProgress aria-label="Computing" /> : null}</Box>
            <CardContent sx={{ display: 'grid', gap: 2.25 }} data-testid="calc-result" data-state={busy ? 'busy' : result ? 'ready' : 'empty'}>
              {otherErrors.length ? (
                <Alert severity="error">
                  {otherErrors.map((e) => (
                    <div key={e}>{e}</div>
                  ))}
                </Alert>
              ) : null}
              {!request.body && request.missing.length ? (
                <Typography variant="body2" color="text.secondary">
                  To compute, give {request.missing.join(', ')}.
                </Typography>
              ) : null}
              {result ? (
                <Box sx={{ display: 'grid', gap: 2.25, opacity: busy ? 0.6 : 1, transition: 'opacity 120ms' }}>
                  <TargetSummary t={result} />
                  <Divider />
                  <ComponentTable t={result} />
                  <Divider />
                  <ProcessFigures t={result} />
                  <WarningList warnings={result.warnings} />
                  <Typography variant="caption" color="text.secondary">
                    {result.sources && 'name' in result.sources.system ? `${result.sources.system.name} rev. ${result.sources.system.revision}` : 'Inline system'}
                    {result.sources?.cupTests ? ` · free-rise density fitted to ${result.sources.cupTests} cup tests` : ''} · computation {result.computationVersion} ·{' '}
                    {result.unitSystem === 'imperial' ? 'imperial' : 'metric'} units
                  </Typography>
                  <PlanFromCalculatorButton form={form} />
                </Box>
              ) : !otherErrors.length && request.body ? null : !request.body ? null : (
                <EmptyState icon={CalculateOutlined} title="Nothing computed yet" />
              )}
            </CardContent>
          </Card>
          {result ? (
            <>
              <CautionList cautions={result.cautions} />
              <SdsLine t={result} />
            </>
          ) : (
            <SafetyNote />
          )}
        </Box>
      </Box>
    </Box>
  );
}
