import AddOutlined from '@mui/icons-material/AddOutlined';
import {
  Alert,
  Box,
  Button,
  Card,
  CardContent,
  Checkbox,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControl,
  FormControlLabel,
  InputLabel,
  ListItemText,
  MenuItem,
  Radio,
  RadioGroup,
  Select,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { useMemo, useState } from 'react';
import { useNotify } from 'react-admin';
import { StatusChip } from '../common/StatusChip';
import { ConsoleLink, DISPOSITION, DispositionChip, partName } from '../genealogy/labels';
import { formatNumber, formatSi, unitChoices } from '../format/quantities';
import { productionApi } from '../planning/productionApi';
import { problemText, useApi } from '../planning/useApi';
import { newAttemptKey } from '../planning/planningApi';
import { useHolds, useUnitSystem } from '../review/hooks';
import type { Batch, BatchDispositionRecord, Part, SpecimenRecord } from '../views/sdk';

const VERDICT: Record<Part['densityVerdict'], { label: string; tone: 'good' | 'bad' }> = {
  within: { label: 'Within', tone: 'good' },
  below: { label: 'Below', tone: 'bad' },
  above: { label: 'Above', tone: 'bad' },
};
const TESTS: Record<SpecimenRecord['test'], string> = {
  core_density: 'Core density (ASTM D3574 Test A / ISO 845)',
  indentation_force: 'Indentation force at 25 % (ASTM D3574 Test B1)',
  durometer: 'Durometer hardness (ASTM D2240)',
};

/**
 * Finished-part acceptance for a batch: each demolded part's mass and the molded density the API
 * judged against the target band, optional specimens, and the batch's disposition with defect causes.
 */
export function PartAcceptance({ batch }: { batch: Batch }) {
  const [version, setVersion] = useState(0);
  // the batch's genealogy carries its parts, its disposition (null until decided) and its lots in one answer
  const trace = useApi(`batch-trace:${batch.id}:${version}`, () => productionApi.batchGenealogy(batch.id));
  const canRecord = useHolds('parts:write');
  const canDispose = useHolds('parts:dispose');
  const units = useUnitSystem();
  const [specimenFor, setSpecimenFor] = useState<Part | null>(null);
  const reload = () => setVersion((v) => v + 1);
  const list = trace.data?.parts ?? [];
  const decided = trace.data?.disposition ?? null;
  const lots = trace.data?.lots ?? [];

  return (
    <Card component="section" aria-label="Finished parts" data-testid="part-acceptance">
      <CardContent sx={{ display: 'grid', gap: 1.5 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
          <Typography variant="h2" sx={{ fontSize: '1.05rem', flex: 1 }}>
            Finished parts
          </Typography>
          {decided ? <DispositionChip decision={decided.decision} /> : null}
        </Box>
        {trace.error ? <Alert severity="error">{problemText(trace.error)}</Alert> : null}
        {lots.length ? (
          <Typography variant="body2" color="text.secondary" data-testid="batch-lots">
            Made with{' '}
            {lots.map((l, i) => (
              <span key={l.id}>
                {i ? ', ' : ''}
                {partName(l.part)}{' '}
                <ConsoleLink mono to={`/lots/${encodeURIComponent(l.id)}/trace`}>
                  {l.lotNumber}
                </ConsoleLink>
              </span>
            ))}
          </Typography>
        ) : null}
        {list.length ? (
          <Box sx={{ overflowX: 'auto' }}>
            <Table size="small" aria-label="Demolded parts">
              <TableHead>
                <TableRow>
                  <TableCell>Cavity</TableCell>
                  <TableCell>Serial</TableCell>
                  <TableCell align="right">Mass</TableCell>
                  <TableCell align="right">Molded density</TableCell>
                  <TableCell align="right">Target ± tolerance</TableCell>
                  <TableCell>Density</TableCell>
                  <TableCell>Specimens</TableCell>
                  <TableCell>Disposition</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {list.map((p) => (
                  <TableRow key={p.id} data-testid="part-row">
                    <TableCell>{p.cavity}</TableCell>
                    <TableCell>{p.serial ?? '—'}</TableCell>
                    <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                      {formatSi(p.massKg, 'kg', units)}
                      <Typography component="span" variant="caption" color="text.secondary">
                        {' '}
                        {p.massSource === 'scale' ? 'scale' : 'entered'}
                      </Typography>
                    </TableCell>
                    <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                      {formatSi(p.moldedDensityKgM3, 'kg/m3', units)} ({formatNumber(p.deviationPercent, { decimals: 1, signed: true })} %)
                    </TableCell>
                    <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                      {formatSi(p.targetDensityKgM3, 'kg/m3', units)} ± {formatNumber(p.tolerancePercent, { decimals: 1, trim: true })} %
                    </TableCell>
                    <TableCell>
                      <StatusChip label={VERDICT[p.densityVerdict].label} tone={VERDICT[p.densityVerdict].tone} />
                    </TableCell>
                    <TableCell sx={{ whiteSpace: 'nowrap' }}>
                      {p.specimens.length ? `${p.specimens.length} tested` : '—'}
                      {canRecord ? (
                        <Button size="small" onClick={() => setSpecimenFor(p)} sx={{ ml: 0.5 }}>
                          Add
                        </Button>
                      ) : null}
                    </TableCell>
                    <TableCell>{p.disposition ? DISPOSITION[p.disposition].label : '—'}</TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </Box>
        ) : (
          <Typography variant="body2" color="text.secondary">
            No part recorded yet: weigh each demolded part; its molded density is judged against the batch&apos;s target.
          </Typography>
        )}
        {canRecord && !decided ? <RecordPart batch={batch} onDone={reload} /> : null}
        {decided ? (
          <Typography variant="body2" data-testid="disposition">
            <strong>{DISPOSITION[decided.decision].label}</strong>
            {decided.defectCauses.length ? ` · ${decided.defectCauses.join(', ')}` : ''}
            {decided.note ? ` · ${decided.note}` : ''} · {decided.parts.accepted} accepted, {decided.parts.rework} rework, {decided.parts.scrap} scrap
            {decided.decidedBy ? ` · decided by ${decided.decidedBy}` : ''}
          </Typography>
        ) : canDispose && list.length ? (
          <DisposeForm batch={batch} onDone={reload} />
        ) : null}
        {specimenFor ? <SpecimenDialog part={specimenFor} onClose={() => setSpecimenFor(null)} onDone={reload} /> : null}
      </CardContent>
    </Card>
  );
}

function RecordPart({ batch, onDone }: { batch: Batch; onDone: () => void }) {
  const units = useUnitSystem();
  const [cavity, setCavity] = useState('1');
  const [serial, setSerial] = useState('');
  const [mass, setMass] = useState('');
  const [unit, setUnit] = useState(units === 'imperial' ? 'lb' : 'kg');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const key = useMemo(() => newAttemptKey(), [cavity, serial, mass, unit]);
  const submit = async () => {
    setBusy(true);
    setError(null);
    try {
      await productionApi.recordPart(batch.id, { cavity: Number(cavity), serial: serial.trim() || null, mass: { value: Number(mass.replace(',', '.')), unit }, source: 'entered' }, key);
      setMass('');
      setSerial('');
      onDone();
    } catch (e) {
      setError(problemText(e));
    } finally {
      setBusy(false);
    }
  };
  return (
    <Box
      component="form"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
      sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', sm: '90px 1fr 1fr 100px auto' }, gap: 1, alignItems: 'start' }}
      aria-label="Record a part"
    >
      <TextField size="small" label="Cavity" value={cavity} onChange={(e) => setCavity(e.target.value)} slotProps={{ htmlInput: { inputMode: 'numeric', 'data-testid': 'part-cavity' } }} />
      <TextField size="small" label="Serial" value={serial} onChange={(e) => setSerial(e.target.value)} placeholder="optional" />
      <TextField
        size="small"
        label="Part mass"
        value={mass}
        onChange={(e) => setMass(e.target.value)}
        error={!!error}
        slotProps={{ htmlInput: { inputMode: 'decimal', 'data-testid': 'part-mass' } }}
      />
      <Select size="small" value={unit} onChange={(e) => setUnit(e.target.value)} inputProps={{ 'aria-label': 'Mass unit' }}>
        {unitChoices('mass').map((u) => (
          <MenuItem key={u.id} value={u.id}>
            {u.name}
          </MenuItem>
        ))}
      </Select>
      <Button type="submit" variant="outlined" startIcon={<AddOutlined />} disabled={busy || !mass.trim()} data-testid="part-record">
        Record part
      </Button>
      {error ? (
        <Alert severity="error" sx={{ gridColumn: '1 / -1' }}>
          {error}
        </Alert>
      ) : null}
    </Box>
  );
}

function DisposeForm({ batch, onDone }: { batch: Batch; onDone: () => void }) {
  const causes = useApi('defect-causes', () => productionApi.defectCauses());
  const notify = useNotify();
  const [decision, setDecision] = useState<BatchDispositionRecord['decision']>('accepted');
  const [chosen, setChosen] = useState<string[]>([]);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const active = (causes.data ?? []).filter((c) => c.active);
  const submit = async () => {
    setBusy(true);
    setError(null);
    try {
      await productionApi.dispose(batch.id, { decision, defectCauses: decision === 'accepted' ? [] : chosen, note: note.trim() || null });
      notify('Disposition recorded.', { type: 'success' });
      onDone();
    } catch (e) {
      setError(problemText(e));
    } finally {
      setBusy(false);
    }
  };
  return (
    <Box sx={{ display: 'grid', gap: 1, borderTop: '1px solid', borderColor: 'divider', pt: 1.5 }}>
      <Typography variant="subtitle2">Decide the batch</Typography>
      <RadioGroup row value={decision} onChange={(e) => setDecision(e.target.value as typeof decision)} aria-label="Disposition">
        {(['accepted', 'rework', 'scrap'] as const).map((d) => (
          <FormControlLabel key={d} value={d} control={<Radio size="small" />} label={DISPOSITION[d].label} />
        ))}
      </RadioGroup>
      {decision !== 'accepted' ? (
        <FormControl size="small" fullWidth>
          <InputLabel id="defect-causes-label">Defect causes</InputLabel>
          <Select
            labelId="defect-causes-label"
            label="Defect causes"
            multiple
            value={chosen}
            onChange={(e) => setChosen(typeof e.target.value === 'string' ? e.target.value.split(',') : e.target.value)}
            renderValue={(v) => v.map((code) => active.find((c) => c.code === code)?.name ?? code).join(', ')}
            data-testid="defect-causes"
          >
            {active.map((c) => (
              <MenuItem key={c.code} value={c.code}>
                <Checkbox size="small" checked={chosen.includes(c.code)} />
                <ListItemText primary={c.name} secondary={c.description} />
              </MenuItem>
            ))}
          </Select>
        </FormControl>
      ) : null}
      <TextField size="small" label="Note" value={note} onChange={(e) => setNote(e.target.value)} multiline />
      {error ? <Alert severity="error">{error}</Alert> : null}
      <Box>
        <Button variant="contained" onClick={() => void submit()} disabled={busy || (decision !== 'accepted' && chosen.length === 0)} data-testid="dispose">
          Record the disposition
        </Button>
      </Box>
    </Box>
  );
}

function SpecimenDialog({ part, onClose, onDone }: { part: Part; onClose: () => void; onDone: () => void }) {
  const units = useUnitSystem();
  const len = units === 'imperial' ? 'in' : 'mm';
  const [test, setTest] = useState<SpecimenRecord['test']>('core_density');
  const [f, setF] = useState({
    mass: '',
    massUnit: units === 'imperial' ? 'oz' : 'g',
    length: '',
    width: '',
    thickness: '',
    force: '',
    forceUnit: units === 'imperial' ? 'lbf' : 'N',
    scale: 'A',
    value: '',
  });
  const [error, setError] = useState<string | null>(null);
  const n = (s: string) => Number(s.replace(',', '.'));
  const body = (): SpecimenRecord => {
    if (test === 'core_density')
      return {
        test,
        mass: { value: n(f.mass), unit: f.massUnit },
        dimensions: { length: { value: n(f.length), unit: len }, width: { value: n(f.width), unit: len }, thickness: { value: n(f.thickness), unit: len } },
      };
    if (test === 'indentation_force') return { test, force: { value: n(f.force), unit: f.forceUnit as 'N' | 'lbf' } };
    return { test, durometer: { scale: f.scale as 'A' | 'OO' | 'D', value: n(f.value) } };
  };
  const submit = async () => {
    setError(null);
    try {
      await productionApi.recordSpecimen(part.id, body());
      onDone();
      onClose();
    } catch (e) {
      setError(problemText(e));
    }
  };
  const field = (k: keyof typeof f, label: string) => (
    <TextField size="small" label={label} value={f[k]} onChange={(e) => setF({ ...f, [k]: e.target.value })} slotProps={{ htmlInput: { inputMode: 'decimal' } }} />
  );
  return (
    <Dialog open onClose={onClose} maxWidth="sm" fullWidth>
      <DialogTitle>Specimen of part {part.serial ?? `cavity ${part.cavity}`}</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 1.5, pt: '8px !important' }}>
        <Select size="small" value={test} onChange={(e) => setTest(e.target.value as typeof test)} inputProps={{ 'aria-label': 'Test' }}>
          {(Object.keys(TESTS) as (keyof typeof TESTS)[]).map((t) => (
            <MenuItem key={t} value={t}>
              {TESTS[t]}
            </MenuItem>
          ))}
        </Select>
        {test === 'core_density' ? (
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
            {field('mass', `Mass (${f.massUnit})`)}
            <Select size="small" value={f.massUnit} onChange={(e) => setF({ ...f, massUnit: e.target.value })} inputProps={{ 'aria-label': 'Mass unit' }}>
              {unitChoices('mass').map((u) => (
                <MenuItem key={u.id} value={u.id}>
                  {u.name}
                </MenuItem>
              ))}
            </Select>
            {field('length', `Length (${len})`)}
            {field('width', `Width (${len})`)}
            {field('thickness', `Thickness (${len})`)}
          </Box>
        ) : null}
        {test === 'indentation_force' ? (
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
            {field('force', 'Force at 25 % deflection')}
            <Select size="small" value={f.forceUnit} onChange={(e) => setF({ ...f, forceUnit: e.target.value })} inputProps={{ 'aria-label': 'Force unit' }}>
              <MenuItem value="N">N</MenuItem>
              <MenuItem value="lbf">lbf</MenuItem>
            </Select>
          </Box>
        ) : null}
        {test === 'durometer' ? (
          <Box sx={{ display: 'grid', gridTemplateColumns: '1fr 1fr', gap: 1 }}>
            <Select size="small" value={f.scale} onChange={(e) => setF({ ...f, scale: e.target.value })} inputProps={{ 'aria-label': 'Durometer scale' }}>
              {['A', 'OO', 'D'].map((s) => (
                <MenuItem key={s} value={s}>
                  Shore {s}
                </MenuItem>
              ))}
            </Select>
            {field('value', 'Reading (0–100)')}
          </Box>
        ) : null}
        {error ? <Alert severity="error">{error}</Alert> : null}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={() => void submit()}>
          Record specimen
        </Button>
      </DialogActions>
    </Dialog>
  );
}
