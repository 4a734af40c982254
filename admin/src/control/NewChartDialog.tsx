import {
  Alert,
  Button,
  Checkbox,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControl,
  FormControlLabel,
  FormGroup,
  FormHelperText,
  FormLabel,
  InputLabel,
  MenuItem,
  Radio,
  RadioGroup,
  Select,
  TextField,
} from '@mui/material';
import { useEffect, useState } from 'react';
import { type ControlCatalogue, type ControlChart, type NewChart, controlApi } from './controlApi';

type Kind = NonNullable<NewChart['kind']>;
type Rule = NonNullable<NewChart['rules']>[number];

const KIND_WORDS: Record<Kind, string> = {
  individuals: 'Individuals and moving range (one value per point)',
  xbar_r: 'Means and ranges, a batch’s values as one subgroup (X̄–R)',
};

/** Define a chart: a metric of a material system, drawn as individuals or X̄–R, with the rules it watches. */
export function NewChartDialog({ open, onClose, onCreated }: { open: boolean; onClose: () => void; onCreated: (c: ControlChart) => void }) {
  const [catalogue, setCatalogue] = useState<ControlCatalogue | null>(null);
  const [systems, setSystems] = useState<{ id: string; name: string }[]>([]);
  const [systemId, setSystemId] = useState('');
  const [metric, setMetric] = useState<NewChart['metric'] | ''>('');
  const [kind, setKind] = useState<Kind>('individuals');
  const [rules, setRules] = useState<Rule[]>([]);
  const [name, setName] = useState('');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (!open) return;
    setError(null);
    Promise.all([controlApi.catalogue(), controlApi.systems()]).then(
      ([c, s]) => {
        setCatalogue(c);
        setSystems(s);
        setRules(c.defaultRules);
        setSystemId((cur) => cur || s[0]?.id || '');
      },
      (e: Error) => setError(e.message),
    );
  }, [open]);
  const kinds = catalogue?.metrics.find((m) => m.metric === metric)?.kinds ?? ['individuals'];
  useEffect(() => {
    if (!kinds.includes(kind)) setKind('individuals');
  }, [kinds, kind]);
  const toggle = (r: Rule) => setRules((cur) => (cur.includes(r) ? cur.filter((x) => x !== r) : [...cur, r]));
  const submit = async () => {
    if (!metric) return;
    try {
      onCreated(await controlApi.createChart({ materialSystemId: systemId, metric, kind, rules, ...(name.trim() ? { name: name.trim() } : {}) }));
    } catch (e) {
      setError((e as Error).message || 'The chart could not be defined.');
    }
  };
  return (
    <Dialog open={open} onClose={onClose} aria-labelledby="new-chart-title" fullWidth maxWidth="sm">
      <DialogTitle id="new-chart-title">New control chart</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 2, pt: '8px !important' }}>
        <FormControl size="small">
          <InputLabel id="nc-system">Material system</InputLabel>
          <Select labelId="nc-system" label="Material system" value={systemId} onChange={(e) => setSystemId(String(e.target.value))} data-testid="nc-system">
            {systems.map((s) => (
              <MenuItem key={s.id} value={s.id}>
                {s.name}
              </MenuItem>
            ))}
          </Select>
        </FormControl>
        <FormControl size="small">
          <InputLabel id="nc-metric">What to watch</InputLabel>
          <Select labelId="nc-metric" label="What to watch" value={metric} onChange={(e) => setMetric(e.target.value as NewChart['metric'])} data-testid="nc-metric">
            {(catalogue?.metrics ?? []).map((m) => (
              <MenuItem key={m.metric} value={m.metric}>
                {m.label} ({m.unit}, one per {m.per})
              </MenuItem>
            ))}
          </Select>
        </FormControl>
        <FormControl>
          <FormLabel id="nc-kind">Chart</FormLabel>
          <RadioGroup aria-labelledby="nc-kind" value={kind} onChange={(e) => setKind(e.target.value as Kind)}>
            {(['individuals', 'xbar_r'] as const).map((k) => (
              <FormControlLabel key={k} value={k} control={<Radio />} label={KIND_WORDS[k]} disabled={!kinds.includes(k)} />
            ))}
          </RadioGroup>
          {metric && !kinds.includes('xbar_r') ? <FormHelperText>A batch gives this value once, so it has no subgroups.</FormHelperText> : null}
        </FormControl>
        <FormControl component="fieldset">
          <FormLabel component="legend">Run rules</FormLabel>
          <FormGroup>
            {(catalogue?.rules ?? []).map((r) => (
              <FormControlLabel key={r.rule} control={<Checkbox size="small" checked={rules.includes(r.rule)} onChange={() => toggle(r.rule)} />} label={`${r.rule} · ${r.description}`} />
            ))}
          </FormGroup>
          <FormHelperText>
            Western Electric Statistical Quality Control Handbook (1956), rules 1–4; Nelson, Journal of Quality Technology (1984), tests 1–8. Signals are raised once a baseline is frozen.
          </FormHelperText>
        </FormControl>
        <TextField size="small" label="Name (optional)" value={name} onChange={(e) => setName(e.target.value)} inputProps={{ maxLength: 120 }} />
        {error ? <Alert severity="error">{error}</Alert> : null}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button variant="contained" onClick={submit} disabled={!systemId || !metric || rules.length === 0} data-testid="nc-create">
          Define chart
        </Button>
      </DialogActions>
    </Dialog>
  );
}
