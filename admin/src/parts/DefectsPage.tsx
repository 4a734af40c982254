import { Alert, Box, Button, Card, CardContent, FormControl, InputLabel, MenuItem, Select, Switch, Table, TableBody, TableCell, TableHead, TableRow, TextField, Typography } from '@mui/material';
import { useState } from 'react';
import { Title } from 'react-admin';
import { CanAccessPage } from '../calculator/CanAccessPage';
import { PageHeader } from '../common/PageHeader';
import { addDaysIso } from '../format/dates';
import { formatNumber, formatPercent } from '../format/quantities';
import { API_BASE, http } from '../providers';
import { productionApi } from '../planning/productionApi';
import { newAttemptKey } from '../planning/planningApi';
import { problemText, useApi } from '../planning/useApi';
import { useHolds } from '../review/hooks';
import type { DefectCause, Pareto, ParetoQuery } from '../views/sdk';

export default function DefectsRoute() {
  return (
    <CanAccessPage action="shop:read">
      <DefectsPage />
    </CanAccessPage>
  );
}

const GROUPS: { id: NonNullable<ParetoQuery['groupBy']>; name: string }[] = [
  { id: 'none', name: 'All together' },
  { id: 'system', name: 'Per material system' },
  { id: 'mold', name: 'Per mold' },
  { id: 'station', name: 'Per station' },
];

function DefectsPage() {
  const [from, setFrom] = useState(addDaysIso(-30).slice(0, 10));
  const [to, setTo] = useState(addDaysIso(0).slice(0, 10));
  const [groupBy, setGroupBy] = useState<NonNullable<ParetoQuery['groupBy']>>('none');
  const query: ParetoQuery = { from, to, groupBy };
  const pareto = useApi(`pareto:${JSON.stringify(query)}`, () => productionApi.pareto(query));
  return (
    <Box sx={{ maxWidth: 1100, display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: 2 }}>
      <Title title="Scrap and defects" />
      <PageHeader
        title="Scrap and defects"
        lead="Which defect causes cost the most parts, largest first with the running share (a Pareto), per system, mold or station over a period. Counted by the API from the dispositions recorded on batches."
      />
      <Card>
        <CardContent sx={{ display: 'grid', gap: 2 }}>
          <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap' }}>
            <TextField size="small" type="date" label="From" value={from} onChange={(e) => setFrom(e.target.value)} slotProps={{ inputLabel: { shrink: true } }} />
            <TextField size="small" type="date" label="To" value={to} onChange={(e) => setTo(e.target.value)} slotProps={{ inputLabel: { shrink: true } }} />
            <FormControl size="small" sx={{ minWidth: 220 }}>
              <InputLabel id="pareto-group">Group</InputLabel>
              <Select labelId="pareto-group" label="Group" value={groupBy} onChange={(e) => setGroupBy(e.target.value as typeof groupBy)}>
                {GROUPS.map((g) => (
                  <MenuItem key={g.id} value={g.id}>
                    {g.name}
                  </MenuItem>
                ))}
              </Select>
            </FormControl>
          </Box>
          {pareto.error ? <Alert severity="error">{problemText(pareto.error)}</Alert> : null}
          {pareto.data ? <ParetoGroups pareto={pareto.data} /> : null}
        </CardContent>
      </Card>
      <DefectCauseList />
    </Box>
  );
}

function ParetoGroups({ pareto }: { pareto: Pareto }) {
  if (!pareto.groups.length || pareto.groups.every((g) => g.defects === 0))
    return (
      <Typography variant="body2" color="text.secondary">
        No defect recorded in this period.
      </Typography>
    );
  return (
    <Box sx={{ display: 'grid', gap: 3 }} data-testid="pareto">
      {pareto.groups.map((g) => (
        <Box key={g.key ?? 'all'} sx={{ display: 'grid', gap: 0.75 }}>
          <Typography variant="subtitle2">
            {g.name ?? (pareto.groupBy === 'none' ? 'All batches' : 'Not recorded')} · {formatNumber(g.defects, { decimals: 0 })} defects
          </Typography>
          {g.bars.map((b) => (
            <Box key={b.code} sx={{ display: 'grid', gridTemplateColumns: { xs: '76px minmax(40px, 1fr) auto', sm: '200px 1fr 140px' }, gap: 1, alignItems: 'center' }}>
              <Typography variant="body2" noWrap title={b.name}>
                {b.name}
              </Typography>
              {/* the bar's length is the API's share; the tick marks its running (cumulative) share */}
              <Box
                sx={{ position: 'relative', height: 18, bgcolor: '#efeee9', borderRadius: 0.5 }}
                role="img"
                aria-label={`${b.name}: ${b.count}, ${formatPercent(b.percent)}; cumulative ${formatPercent(b.cumulativePercent)}`}
              >
                <Box sx={{ position: 'absolute', inset: 0, width: `${b.percent}%`, bgcolor: 'primary.main', borderRadius: 0.5 }} />
                <Box sx={{ position: 'absolute', top: -3, bottom: -3, left: `calc(${b.cumulativePercent}% - 1px)`, width: 2, bgcolor: '#c98a16' }} />
              </Box>
              <Typography variant="body2" sx={{ fontVariantNumeric: 'tabular-nums', textAlign: 'right', whiteSpace: 'nowrap' }}>
                {b.count} · {formatPercent(b.percent, { decimals: 0 })} · Σ {formatPercent(b.cumulativePercent, { decimals: 0 })}
              </Typography>
            </Box>
          ))}
        </Box>
      ))}
      <Typography variant="caption" color="text.secondary">
        Bars: each cause&apos;s share of the group&apos;s defects; amber tick and Σ: the running share, largest causes first.
      </Typography>
    </Box>
  );
}

function DefectCauseList() {
  const canManage = useHolds('defect-causes:manage');
  const [version, setVersion] = useState(0);
  const causes = useApi(`causes:${version}`, () => productionApi.defectCauses());
  const [draft, setDraft] = useState({ code: '', name: '', description: '' });
  const [error, setError] = useState<string | null>(null);
  const send = async (path: string, method: 'POST' | 'PUT', body: unknown) => {
    setError(null);
    try {
      await http.fetchJson(`${API_BASE}${path}`, { method, body: JSON.stringify(body), headers: method === 'POST' ? { 'Idempotency-Key': newAttemptKey() } : undefined });
      setVersion((v) => v + 1);
      return true;
    } catch (e) {
      setError(problemText(e));
      return false;
    }
  };
  const toggle = (c: DefectCause) => send(`/defect-causes/${encodeURIComponent(c.id)}`, 'PUT', { active: !c.active });
  return (
    <Card>
      <CardContent sx={{ display: 'grid', gap: 1.5 }}>
        <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
          Defect causes
        </Typography>
        <Typography variant="body2" color="text.secondary">
          The list a rework or scrap decision picks from. Engineers and admins edit it; a cause no longer offered keeps its past decisions.
        </Typography>
        {error ? <Alert severity="error">{error}</Alert> : null}
        <Box sx={{ overflowX: 'auto' }}>
          <Table size="small" aria-label="Defect causes">
            <TableHead>
              <TableRow>
                <TableCell>Cause</TableCell>
                <TableCell>Code</TableCell>
                <TableCell sx={{ display: { xs: 'none', sm: 'table-cell' } }}>Description</TableCell>
                <TableCell>Offered</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {(causes.data ?? []).map((c) => (
                <TableRow key={c.id}>
                  <TableCell>{c.name}</TableCell>
                  <TableCell sx={{ fontFamily: 'monospace' }}>{c.code}</TableCell>
                  <TableCell sx={{ display: { xs: 'none', sm: 'table-cell' } }}>{c.description ?? '—'}</TableCell>
                  <TableCell>
                    {canManage ? <Switch size="small" checked={c.active} onChange={() => void toggle(c)} slotProps={{ input: { 'aria-label': `Offer ${c.name}` } }} /> : c.active ? 'yes' : 'no'}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </Box>
        {canManage ? (
          <Box
            component="form"
            aria-label="Add a defect cause"
            onSubmit={async (e) => {
              e.preventDefault();
              if (await send('/defect-causes', 'POST', { code: draft.code.trim(), name: draft.name.trim(), description: draft.description.trim() || null }))
                setDraft({ code: '', name: '', description: '' });
            }}
            sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '160px 1fr 1.5fr auto' }, gap: 1, alignItems: 'start' }}
          >
            <TextField size="small" label="Code" value={draft.code} onChange={(e) => setDraft({ ...draft, code: e.target.value })} helperText="a–z, 0–9, _" />
            <TextField size="small" label="Name" value={draft.name} onChange={(e) => setDraft({ ...draft, name: e.target.value })} />
            <TextField size="small" label="Description" value={draft.description} onChange={(e) => setDraft({ ...draft, description: e.target.value })} />
            <Button type="submit" variant="outlined" disabled={!draft.code.trim() || !draft.name.trim()}>
              Add cause
            </Button>
          </Box>
        ) : null}
      </CardContent>
    </Card>
  );
}
