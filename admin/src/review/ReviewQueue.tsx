import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import GavelOutlined from '@mui/icons-material/GavelOutlined';
import KeyboardOutlined from '@mui/icons-material/KeyboardOutlined';
import OpenInNewOutlined from '@mui/icons-material/ArrowForward';
import ArrowBack from '@mui/icons-material/ArrowBack';
import FilterListOutlined from '@mui/icons-material/FilterListOutlined';
import {
  Alert,
  Box,
  Button,
  Card,
  CardContent,
  Dialog,
  Divider,
  IconButton,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  Typography,
  useMediaQuery,
  type Theme,
} from '@mui/material';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import {
  DateInput,
  List,
  NullableBooleanInput,
  Pagination,
  SelectInput,
  useDataProvider,
  useGetList,
  useGetMany,
  useListContext,
  useNotify,
  useRefresh,
} from 'react-admin';
import type { UnitSystem } from '../auth/me';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import { dayEndIso, dayStartIso, formatDateTime, isoToDay } from '../format/dates';
import { BATCH_STATE, batchTitle, shortRef, type Batch } from '../batches/labels';
import { monoFont } from '../theme';
import { releaseBatch } from './commands';
import { useHolds, useUnitSystem } from './hooks';
import { describeReason, REASON_FILTER_CODES, reasonTitle } from './reasons';
import { ReviewDialog, type Decision } from './ReviewDialog';
import { READING_STATUS, readingTitle, readingValue, type Reading } from './labels';
import type { Device } from '../views/sdk';
import { formatSi } from '../format/quantities';

/** The keys of the queue; the same list is printed on the page. */
export const QUEUE_KEYS: readonly { keys: string[]; does: string }[] = [
  { keys: ['j', '↓'], does: 'next reading' },
  { keys: ['k', '↑'], does: 'previous reading' },
  { keys: ['w'], does: 'waive (with a note)' },
  { keys: ['u'], does: 'uphold' },
  { keys: ['b'], does: 'open the batch' },
];

function BatchFilter(props: { source: string; label: string; alwaysOn?: boolean }) {
  const { data } = useGetList<Batch>('batches', { pagination: { page: 1, perPage: 100 }, sort: { field: 'createdAt', order: 'DESC' } });
  const choices = useMemo(() => (data ?? []).map((b) => ({ id: b.id, name: `${batchTitle(b)} · ${shortRef(b.id)}` })), [data]);
  return <SelectInput {...props} choices={choices} emptyText="Any batch" />;
}

function DeviceFilter(props: { source: string; label: string; alwaysOn?: boolean }) {
  const { data } = useGetList<Device>('devices', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' } });
  const choices = useMemo(() => (data ?? []).map((d) => ({ id: d.id, name: d.stationCode ? `${d.name} · ${d.stationCode}` : d.name })), [data]);
  return <SelectInput {...props} choices={choices} emptyText="Any device" />;
}

const filters = [
  <SelectInput
    key="status"
    source="status"
    label="Verdict"
    alwaysOn
    emptyText="Any verdict"
    choices={(['rejected', 'accepted', 'unused', 'pending'] as const).map((s) => ({ id: s, name: READING_STATUS[s].label }))}
  />,
  <SelectInput key="reasonCode" source="reasonCode" label="Reason" alwaysOn emptyText="Any reason" choices={REASON_FILTER_CODES.map((c) => ({ id: c, name: reasonTitle(c) }))} />,
  <BatchFilter key="batchId" source="batchId" label="Batch" alwaysOn />,
  <DeviceFilter key="deviceId" source="deviceId" label="Device" alwaysOn />,
  <DateInput key="from" source="receivedAfter" label="From" alwaysOn parse={dayStartIso} format={isoToDay} />,
  <DateInput key="to" source="receivedBefore" label="To" alwaysOn parse={dayEndIso} format={isoToDay} />,
  <NullableBooleanInput key="reviewed" source="reviewed" label="Decision" alwaysOn nullLabel="Any" falseLabel="Waiting for a decision" trueLabel="Decided" />,
];

/** What the queue shows unless told otherwise: rejections nobody has decided yet. */
export const QUEUE_DEFAULT_FILTER = { status: 'rejected', reviewed: false } as const;

/** Keyboard hints mean nothing on a touch screen with no keyboard (a phone, a tablet on the bench). */
export const hiddenOnTouch = { '@media (hover: none) and (pointer: coarse)': { display: 'none' } } as const;

/** Below this width the queue is one column: a row's detail opens over the list instead of beside it. */
const useOneColumn = () => useMediaQuery((t: Theme) => t.breakpoints.down('lg'));
/** A phone: the filters fold away behind a button, rows become a tappable list. */
const usePhone = () => useMediaQuery((t: Theme) => t.breakpoints.down('sm'));

function typingIn(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  const tag = target.tagName;
  if (tag === 'INPUT' || tag === 'TEXTAREA' || tag === 'SELECT') return true;
  // an open popup (a filter's choices, the account menu) or a dialog keeps its own keys; the side menu does not
  return !!target.closest('[role="listbox"], [role="dialog"], .MuiPopover-root');
}

export function KeyHints() {
  return (
    <Box component="aside" aria-label="Keyboard shortcuts" data-testid="queue-keys" sx={{ display: 'flex', alignItems: 'center', flexWrap: 'wrap', gap: 1.5, color: 'text.secondary', fontSize: '0.8rem', ...hiddenOnTouch }}>
      <KeyboardOutlined sx={{ fontSize: 18 }} aria-hidden />
      {QUEUE_KEYS.map((k) => (
        <Box key={k.does} component="span" sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.5 }}>
          {k.keys.map((key) => (
            <Box
              key={key}
              component="kbd"
              sx={{ fontFamily: monoFont, fontSize: '0.75rem', px: 0.6, py: 0.1, border: '1px solid', borderColor: 'divider', borderBottomWidth: 2, borderRadius: 0.75, bgcolor: '#fff', color: 'text.primary' }}
            >
              {key}
            </Box>
          ))}
          <span>{k.does}</span>
        </Box>
      ))}
    </Box>
  );
}

function ReasonCell({ reading, unitSystem }: { reading: Reading; unitSystem: UnitSystem }) {
  if (!reading.reasons.length) return <Typography variant="body2" color="text.secondary">{reading.status === 'accepted' ? 'Within tolerance' : '—'}</Typography>;
  const first = describeReason(reading.reasons[0]!, unitSystem);
  return (
    <Box sx={{ minWidth: 180 }}>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {first.title}
        {reading.reasons.length > 1 ? (
          <Box component="span" sx={{ color: 'text.secondary', fontWeight: 400 }}>
            {' '}
            +{reading.reasons.length - 1}
          </Box>
        ) : null}
      </Typography>
      {first.measured || first.limit ? (
        <Typography variant="caption" color="text.secondary" component="div">
          {first.measured ? <strong style={{ color: '#8c1d17', fontWeight: 600 }}>{first.measured}</strong> : null}
          {first.measured && first.limit ? ', ' : ''}
          {first.limit}
        </Typography>
      ) : null}
    </Box>
  );
}

function DecisionCell({ reading }: { reading: Reading }) {
  if (reading.review) {
    return reading.review.decision === 'waive' ? <StatusChip tone="good" label="Waived" title={reading.review.note ?? undefined} /> : <StatusChip tone="bad" label="Upheld" title={reading.review.note ?? undefined} />;
  }
  if (reading.status === 'rejected') return <StatusChip tone="caution" label="Open" title="Waiting for a decision" />;
  return <StatusChip tone={READING_STATUS[reading.status].tone} label={READING_STATUS[reading.status].label} />;
}

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <Box sx={{ display: 'contents' }}>
      <Typography component="dt" variant="caption" color="text.secondary" sx={{ pt: '2px' }}>
        {label}
      </Typography>
      <Typography component="dd" variant="body2" sx={{ m: 0 }}>
        {children}
      </Typography>
    </Box>
  );
}

function ReadingPanel({
  reading,
  batch,
  device,
  unitSystem,
  canReview,
  onDecide,
  onReleased,
}: {
  reading: Reading;
  batch?: Batch;
  device?: Device;
  unitSystem: UnitSystem;
  canReview: boolean;
  onDecide: (d: Decision) => void;
  onReleased: () => void;
}) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const [releasing, setReleasing] = useState(false);
  const open = reading.status === 'rejected' && !reading.review;
  const release = async () => {
    if (!batch) return;
    setReleasing(true);
    try {
      await releaseBatch(dataProvider, batch.id);
      notify(`Batch ${shortRef(batch.id)} is released.`, { type: 'success' });
      onReleased();
    } catch (error) {
      notify((error as Error).message, { type: 'warning' });
    } finally {
      setReleasing(false);
    }
  };
  const state = batch ? BATCH_STATE[batch.state] : undefined;
  return (
    <Card component="section" aria-label="Selected reading" data-testid="reading-panel">
      <CardContent sx={{ display: 'grid', gap: 1.75 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1 }}>
          <Typography variant="h2" sx={{ fontSize: '1.05rem', flex: 1 }}>
            {readingTitle(reading)}
          </Typography>
          <DecisionCell reading={reading} />
        </Box>

        {reading.reasons.length ? (
          <Stack spacing={1.25} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Reasons">
            {reading.reasons.map((r, i) => {
              const v = describeReason(r, unitSystem);
              return (
                <Box component="li" key={`${r.code}-${i}`} sx={{ borderLeft: '3px solid', borderColor: reading.status === 'rejected' ? 'error.main' : 'divider', pl: 1.25 }}>
                  <Typography variant="body2" sx={{ fontWeight: 600 }}>
                    {v.title}
                  </Typography>
                  {v.measured || v.limit ? (
                    <Box sx={{ display: 'flex', gap: 2, mt: 0.5 }}>
                      {v.measured ? (
                        <Box>
                          <Typography variant="caption" color="text.secondary" component="div">
                            measured
                          </Typography>
                          <Typography variant="body1" sx={{ fontWeight: 600, fontVariantNumeric: 'tabular-nums' }}>
                            {v.measured}
                          </Typography>
                        </Box>
                      ) : null}
                      {v.limit ? (
                        <Box>
                          <Typography variant="caption" color="text.secondary" component="div">
                            limit
                          </Typography>
                          <Typography variant="body1" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                            {v.limit.replace(/^limit /, '')}
                          </Typography>
                        </Box>
                      ) : null}
                    </Box>
                  ) : null}
                  <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 0.5 }}>
                    {v.sentence}
                  </Typography>
                </Box>
              );
            })}
          </Stack>
        ) : null}

        <Divider />
        <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: '92px 1fr', columnGap: 1.5, rowGap: 0.6, m: 0 }}>
          <Fact label="Value">
            {readingValue(reading)}
            {(reading.unitSi === 'kg' || reading.unitSi === 'degC') && formatSi(reading.valueSi, reading.unitSi, unitSystem).replace(/\.0+ /, ' ') !== readingValue(reading).replace(/\.0+ /, ' ') ? (
              <Box component="span" sx={{ color: 'text.secondary' }}>
                {' '}
                ({formatSi(reading.valueSi, reading.unitSi, unitSystem)})
              </Box>
            ) : null}
            {reading.quantity === 'mass' && !reading.stable ? (
              <Box component="span" sx={{ color: 'text.secondary' }}>
                , not settled
              </Box>
            ) : null}
          </Fact>
          <Fact label="Batch">
            {batch ? (
              <>
                <Link to={`/batches/${batch.id}/show`}>{batchTitle(batch)}</Link>{' '}
                <Box component="span" sx={{ fontFamily: monoFont, fontSize: '0.78rem', color: 'text.secondary' }}>
                  {shortRef(batch.id)}
                </Box>
              </>
            ) : (
              <Box component="span" sx={{ fontFamily: monoFont }}>{shortRef(reading.batchId)}</Box>
            )}
          </Fact>
          {batch ? (
            <Fact label="Batch state">
              {state ? <StatusChip tone={state.tone} label={state.label} title={state.blurb} /> : batch.state}
            </Fact>
          ) : null}
          {batch?.lots.length ? <Fact label="Lots">{batch.lots.map((l) => `${l.part === 'pigment' ? 'Pigment' : l.part} ${l.lotNumber}`).join(' · ')}</Fact> : null}
          <Fact label="Device">{device ? `${device.name} · ${device.serial}${device.stationCode ? ` · station ${device.stationCode}` : ''}` : '—'}</Fact>
          <Fact label="Received">{formatDateTime(reading.receivedAt)}</Fact>
          {reading.deviceTime ? (
            <Fact label="Device clock">
              {formatDateTime(reading.deviceTime)}
              {reading.clockSkewFlagged ? (
                <Box component="span" sx={{ color: 'warning.main' }}>
                  {' '}
                  (off by {Math.round(Math.abs(reading.clockSkewSeconds ?? 0))} s)
                </Box>
              ) : null}
            </Fact>
          ) : null}
          {reading.review ? (
            <Fact label={reading.review.decision === 'waive' ? 'Waived' : 'Upheld'}>
              {reading.review.by ?? 'someone'}, {formatDateTime(reading.review.at)}
              {reading.review.note ? (
                <Box component="span" sx={{ display: 'block', fontStyle: 'italic', color: 'text.secondary' }}>
                  “{reading.review.note}”
                </Box>
              ) : null}
            </Fact>
          ) : null}
        </Box>

        {canReview && open ? (
          <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
            <Button variant="contained" startIcon={<CheckCircleOutline />} onClick={() => onDecide('waive')} data-testid="waive-button">
              Waive… <Box component="kbd" sx={kbdOnButton}>w</Box>
            </Button>
            <Button variant="outlined" color="warning" startIcon={<GavelOutlined />} onClick={() => onDecide('uphold')} data-testid="uphold-button">
              Uphold… <Box component="kbd" sx={kbdOnButton}>u</Box>
            </Button>
          </Box>
        ) : null}
        {canReview && batch && reading.review?.decision === 'waive' && (batch.state === 'on_hold' || batch.state === 'weighing') ? (
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap', bgcolor: '#eef5f1', borderRadius: 1, p: 1.25 }}>
            <Typography variant="body2" sx={{ flex: 1, minWidth: 180 }}>
              If every rejection of this batch is waived, it can be released now.
            </Typography>
            <Button size="small" variant="contained" color="success" onClick={release} disabled={releasing} data-testid="release-from-panel">
              Release batch
            </Button>
          </Box>
        ) : null}
        {batch ? (
          <Button component={Link} to={`/batches/${batch.id}/show`} size="small" endIcon={<OpenInNewOutlined />} sx={{ justifySelf: 'start' }}>
            Open the batch
          </Button>
        ) : null}
      </CardContent>
    </Card>
  );
}

const kbdOnButton = { fontFamily: monoFont, fontSize: '0.7rem', ml: 0.75, px: 0.5, border: '1px solid currentColor', borderRadius: 0.5, opacity: 0.7, lineHeight: 1.4, ...hiddenOnTouch } as const;

/** The decision just taken: the reading has left the queue, and its batch may be releasable now. */
function JustDecided({ reading, batch, scrapped, canReview, onReleased }: { reading: Reading; batch?: Batch; scrapped: boolean; canReview: boolean; onReleased: () => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const [busy, setBusy] = useState(false);
  const [released, setReleased] = useState(false);
  const waived = reading.review?.decision === 'waive';
  const name = batch ? `${batchTitle(batch)} (${shortRef(batch.id)})` : 'The batch';
  const release = async () => {
    if (!batch) return;
    setBusy(true);
    try {
      await releaseBatch(dataProvider, batch.id);
      notify(`Batch ${shortRef(batch.id)} is released.`, { type: 'success' });
      setReleased(true);
      onReleased();
    } catch (error) {
      notify((error as Error).message, { type: 'warning' });
    } finally {
      setBusy(false);
    }
  };
  const releasable = canReview && waived && !released && batch && (batch.state === 'on_hold' || batch.state === 'weighing');
  return (
    <Alert
      severity={waived ? 'success' : 'info'}
      data-testid="just-decided"
      sx={{ mb: 1.5, alignItems: 'center', '& .MuiAlert-message': { flex: 1, minWidth: 0, overflowWrap: 'anywhere' } }}
      action={
        releasable ? (
          <Button size="small" variant="contained" color="success" onClick={release} disabled={busy} data-testid="release-from-queue">
            Release batch
          </Button>
        ) : undefined
      }
    >
      <strong>{waived ? 'Waived' : 'Upheld'}</strong>: {readingTitle(reading)} of {name}
      {released ? ', released.' : waived ? '. The batch can be released once every rejection is waived.' : scrapped ? '; the batch is scrapped.' : '; the batch stays on hold.'}
    </Alert>
  );
}

/** A reading as one tappable block (phones): reason, what was measured, the batch, when. */
function PhoneRow({ reading, batch, device, unitSystem, selected, onOpen }: { reading: Reading; batch?: Batch; device?: Device; unitSystem: UnitSystem; selected: boolean; onOpen: () => void }) {
  return (
    <Box component="li" sx={{ borderBottom: '1px solid', borderColor: 'divider', '&:last-of-type': { borderBottom: 'none' } }}>
      <Box
        component="button"
        type="button"
        onClick={onOpen}
        data-testid="queue-row"
        data-reading-id={reading.id}
        aria-current={selected ? 'true' : undefined}
        sx={{
          all: 'unset',
          boxSizing: 'border-box',
          display: 'grid',
          gridTemplateColumns: 'minmax(0, 1fr) auto',
          columnGap: 1,
          rowGap: 0.5,
          width: '100%',
          minHeight: 64,
          px: 1.5,
          py: 1.25,
          cursor: 'pointer',
          bgcolor: selected ? '#e7f0f0' : undefined,
          boxShadow: selected ? (t) => `inset 3px 0 0 ${t.palette.primary.main}` : undefined,
          '&:focus-visible': { outline: '2px solid', outlineColor: 'primary.main', outlineOffset: -2 },
        }}
      >
        <Box sx={{ minWidth: 0, overflowWrap: 'anywhere' }}>
          <ReasonCell reading={reading} unitSystem={unitSystem} />
        </Box>
        <Box sx={{ justifySelf: 'end' }}>
          <DecisionCell reading={reading} />
        </Box>
        <Typography variant="caption" color="text.secondary" component="div" sx={{ minWidth: 0, overflowWrap: 'anywhere' }}>
          {readingTitle(reading)}{' '}
          <Box component="span" sx={{ color: 'text.primary', fontVariantNumeric: 'tabular-nums' }}>
            {readingValue(reading)}
          </Box>
          {' · '}
          {batch ? batchTitle(batch) : shortRef(reading.batchId)}
          {device ? ` · ${device.name}` : ''}
        </Typography>
        <Typography variant="caption" color="text.secondary" component="div" sx={{ justifySelf: 'end', whiteSpace: 'nowrap' }}>
          <RelativeTime value={reading.receivedAt} />
        </Typography>
      </Box>
    </Box>
  );
}

/** The list's filters on a phone: folded behind one button so the readings fill the first screen. */
function PhoneFilterToggle({ open, onToggle }: { open: boolean; onToggle: () => void }) {
  const { filterValues } = useListContext<Reading>();
  const active = Object.keys(filterValues ?? {}).length;
  return (
    <Button
      variant={open ? 'contained' : 'outlined'}
      size="small"
      startIcon={<FilterListOutlined />}
      onClick={onToggle}
      aria-expanded={open}
      data-testid="queue-filters-toggle"
      sx={{ mb: 1 }}
    >
      {open ? 'Hide filters' : `Filters${active ? ` (${active})` : ''}`}
    </Button>
  );
}

function QueueBody({ phone, filtersOpen, onToggleFilters }: { phone: boolean; filtersOpen: boolean; onToggleFilters: () => void }) {
  const { data, isPending, filterValues } = useListContext<Reading>();
  const unitSystem = useUnitSystem();
  const canReview = useHolds('readings:review');
  const refresh = useRefresh();
  const notify = useNotify();
  const oneColumn = useOneColumn();
  const rows = useMemo(() => data ?? [], [data]);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [detailOpen, setDetailOpen] = useState(false);
  const [dialog, setDialog] = useState<{ reading: Reading; decision: Decision } | null>(null);
  const [decided, setDecided] = useState<{ reading: Reading; scrapped: boolean } | null>(null);
  const tableRef = useRef<HTMLTableSectionElement>(null);

  const batchIds = useMemo(() => [...new Set(rows.map((r) => r.batchId).concat(decided ? [decided.reading.batchId] : []))], [rows, decided]);
  const deviceIds = useMemo(() => [...new Set(rows.map((r) => r.deviceId))], [rows]);
  const { data: batches } = useGetMany<Batch>('batches', { ids: batchIds }, { enabled: batchIds.length > 0 });
  const { data: devices } = useGetMany<Device>('devices', { ids: deviceIds }, { enabled: deviceIds.length > 0 });
  const batchById = useMemo(() => new Map((batches ?? []).map((b) => [b.id, b])), [batches]);
  const deviceById = useMemo(() => new Map((devices ?? []).map((d) => [d.id, d])), [devices]);

  // keep a selection: the first reading still waiting for a decision, else the first row
  const index = rows.findIndex((r) => r.id === selectedId);
  useEffect(() => {
    if (rows.length && index < 0) setSelectedId((rows.find((r) => r.status === 'rejected' && !r.review) ?? rows[0])!.id);
  }, [rows, index]);
  const selected = index >= 0 ? rows[index] : undefined;
  // one column: the detail is a full-screen sheet, opened by tapping a row (or Enter)
  const showDetail = !oneColumn || detailOpen;

  const move = useCallback(
    (step: number) => {
      if (!rows.length) return;
      const next = Math.min(rows.length - 1, Math.max(0, (index < 0 ? 0 : index) + step));
      setSelectedId(rows[next]!.id);
      tableRef.current?.querySelector<HTMLElement>(`[data-reading-id="${rows[next]!.id}"]`)?.scrollIntoView({ block: 'nearest' });
    },
    [rows, index],
  );

  const decide = useCallback(
    (decision: Decision) => {
      if (!selected || !canReview || selected.status !== 'rejected' || selected.review) return;
      setDialog({ reading: selected, decision });
    },
    [selected, canReview],
  );

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (dialog || e.altKey || e.ctrlKey || e.metaKey || typingIn(e.target)) return;
      const key = e.key;
      if (key === 'j' || key === 'ArrowDown') move(1);
      else if (key === 'k' || key === 'ArrowUp') move(-1);
      else if (key === 'w') decide('waive');
      else if (key === 'u') decide('uphold');
      else if (key === 'b' && selected) window.location.hash = `#/batches/${selected.batchId}/show`;
      else if (key === 'Enter' && oneColumn && selected && !(e.target instanceof HTMLButtonElement || e.target instanceof HTMLAnchorElement)) setDetailOpen(true);
      else return;
      e.preventDefault();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [dialog, move, decide, selected, oneColumn]);

  const open = (id: string) => {
    setSelectedId(id);
    setDetailOpen(true);
  };

  const closeDialog = (outcome: { reading: Reading; scrapped: boolean } | null) => {
    setDialog(null);
    if (!outcome) return;
    const result = outcome.reading;
    const batch = batchById.get(result.batchId);
    const name = batch ? `${batchTitle(batch)} (${shortRef(batch.id)})` : 'The batch';
    notify(
      result.review?.decision === 'waive'
        ? `Waived. ${name} can be released once every rejection is waived.`
        : outcome.scrapped
          ? `Upheld. ${name} is scrapped.`
          : `Upheld. ${name} stays on hold.`,
      { type: 'success' },
    );
    // the decided reading leaves the queue; go on to the next one that waits for a decision
    setDecided(outcome);
    setDetailOpen(false);
    const after = rows.slice(index + 1).find((r) => r.status === 'rejected' && !r.review && r.id !== result.id);
    if (after) setSelectedId(after.id);
    refresh();
  };

  const decidedNote = decided ? (
    <JustDecided key={decided.reading.id} reading={decided.reading} scrapped={decided.scrapped} batch={batchById.get(decided.reading.batchId)} canReview={canReview} onReleased={refresh} />
  ) : null;
  const filterToggle = phone ? <PhoneFilterToggle open={filtersOpen} onToggle={onToggleFilters} /> : null;

  if (!isPending && rows.length === 0) {
    const { status, reviewed, ...others } = (filterValues ?? {}) as Record<string, unknown>;
    const onlyOpen = status === 'rejected' && reviewed === false && Object.keys(others).length === 0;
    return (
      <Box sx={{ pt: 1 }}>
        {filterToggle}
        {decidedNote}
        <Box sx={{ p: 5, textAlign: 'center' }} data-testid="queue-empty">
          <FactCheckOutlined sx={{ fontSize: 40, color: 'primary.main' }} aria-hidden />
          <Typography variant="h2" sx={{ fontSize: '1.1rem', mt: 1 }}>
            {onlyOpen ? 'Nothing is waiting for a decision' : 'No readings match these filters'}
          </Typography>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
            {onlyOpen ? 'Rejected readings from the scales and loggers appear here as soon as they are judged.' : 'Widen the dates or clear a filter.'}
          </Typography>
        </Box>
      </Box>
    );
  }

  const panel = selected ? (
    <ReadingPanel
      key={selected.id}
      reading={selected}
      batch={batchById.get(selected.batchId)}
      device={deviceById.get(selected.deviceId)}
      unitSystem={unitSystem}
      canReview={canReview}
      onDecide={decide}
      onReleased={refresh}
    />
  ) : null;

  return (
    <Box sx={{ pt: phone ? 0.5 : 1.5, bgcolor: 'background.default' }}>
      {filterToggle}
      {decidedNote}
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1fr) 330px' }, gap: 2, alignItems: 'start' }}>
        <Box sx={{ bgcolor: 'background.paper', border: '1px solid', borderColor: 'divider', borderRadius: 1.5, overflow: 'hidden', minWidth: 0 }}>
          {phone ? (
            <Box component="ul" aria-label="Readings waiting for a decision" sx={{ listStyle: 'none', m: 0, p: 0 }}>
              {rows.map((r) => (
                <PhoneRow key={r.id} reading={r} batch={batchById.get(r.batchId)} device={deviceById.get(r.deviceId)} unitSystem={unitSystem} selected={r.id === selected?.id} onOpen={() => open(r.id)} />
              ))}
            </Box>
          ) : (
            <Box sx={{ overflowX: 'auto' }} tabIndex={0} role="region" aria-label="Readings waiting for a decision, scrolls sideways">
              <Table size="small" aria-label="Readings" sx={{ '& th, & td': { px: 1.25 } }}>
                <TableHead>
                  <TableRow>
                    <TableCell>Reason</TableCell>
                    <TableCell>Reading</TableCell>
                    <TableCell>Batch</TableCell>
                    <TableCell>Received</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody ref={tableRef}>
                  {rows.map((r) => {
                    const batch = batchById.get(r.batchId);
                    const device = deviceById.get(r.deviceId);
                    const isSelected = r.id === selected?.id;
                    return (
                      <TableRow
                        key={r.id}
                        hover
                        selected={isSelected}
                        aria-selected={isSelected}
                        data-reading-id={r.id}
                        data-testid="queue-row"
                        onClick={() => (oneColumn ? open(r.id) : setSelectedId(r.id))}
                        sx={{
                          cursor: 'pointer',
                          verticalAlign: 'top',
                          boxShadow: isSelected ? (t) => `inset 3px 0 0 ${t.palette.primary.main}` : undefined,
                          '&.Mui-selected': { bgcolor: '#e7f0f0' },
                          '&.Mui-selected:hover': { bgcolor: '#dde9ea' },
                          '& td': { py: 1 },
                        }}
                      >
                        <TableCell sx={{ maxWidth: 320, overflowWrap: 'anywhere' }}>
                          <ReasonCell reading={r} unitSystem={unitSystem} />
                        </TableCell>
                        <TableCell sx={{ maxWidth: 260, overflowWrap: 'anywhere' }}>
                          <Typography variant="body2">{readingTitle(r)}</Typography>
                          <Typography variant="caption" color="text.secondary" component="div">
                            <Box component="span" sx={{ color: 'text.primary', fontVariantNumeric: 'tabular-nums' }}>{readingValue(r)}</Box>
                            {device ? ` · ${device.name}${device.stationCode ? ` · ${device.stationCode}` : ''}` : ''}
                          </Typography>
                        </TableCell>
                        <TableCell>
                          <Typography variant="body2">{batch ? batchTitle(batch) : '…'}</Typography>
                          <Typography variant="caption" sx={{ fontFamily: monoFont, color: 'text.secondary', whiteSpace: 'nowrap' }}>
                            {shortRef(r.batchId)}
                            {batch ? ` · ${BATCH_STATE[batch.state]?.label ?? batch.state}` : ''}
                          </Typography>
                        </TableCell>
                        <TableCell sx={{ whiteSpace: 'nowrap' }}>
                          <Typography variant="body2" component="div">
                            <RelativeTime value={r.receivedAt} />
                          </Typography>
                          <Box sx={{ mt: 0.5 }}>
                            <DecisionCell reading={r} />
                          </Box>
                        </TableCell>
                      </TableRow>
                    );
                  })}
                </TableBody>
              </Table>
            </Box>
          )}
          <Pagination rowsPerPageOptions={phone ? [] : [10, 25, 50, 100]} />
        </Box>
        {showDetail && !oneColumn ? panel : null}
      </Box>
      {oneColumn ? (
        <Dialog fullScreen={phone} fullWidth maxWidth="sm" open={detailOpen && !!selected} onClose={() => setDetailOpen(false)} aria-label="Selected reading" data-testid="reading-sheet">
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, px: 1, py: 0.5, borderBottom: '1px solid', borderColor: 'divider', position: 'sticky', top: 0, bgcolor: 'background.paper', zIndex: 1 }}>
            <IconButton onClick={() => setDetailOpen(false)} aria-label="Back to the queue" data-testid="reading-sheet-back" size="large">
              <ArrowBack />
            </IconButton>
            <Typography variant="subtitle1" component="p" sx={{ fontWeight: 600 }}>
              Reading {index + 1} of {rows.length}
            </Typography>
          </Box>
          <Box sx={{ p: phone ? 1 : 2, '& > .MuiCard-root': { boxShadow: 'none', border: 'none' } }}>{panel}</Box>
        </Dialog>
      ) : null}
      {dialog ? (
        <ReviewDialog
          reading={dialog.reading}
          decision={dialog.decision}
          unitSystem={unitSystem}
          batchLabel={(() => {
            const b = batchById.get(dialog.reading.batchId);
            return b ? `${batchTitle(b)} · ${shortRef(b.id)}` : shortRef(dialog.reading.batchId);
          })()}
          onClose={closeDialog}
        />
      ) : null}
    </Box>
  );
}

export default function ReviewQueuePage() {
  const phone = usePhone();
  const [filtersOpen, setFiltersOpen] = useState(false);
  return (
    <Guarded resource="readings">
      <PageHeader
        title="Review queue"
        lead={
          phone
            ? 'Rejected readings waiting for a decision: tap one to waive or uphold it.'
            : 'Readings the judge rejected, with what was measured against which limit. Waive one with a note when the deviation does not matter for the part; uphold it to keep the batch on hold, or to scrap it.'
        }
        actions={<KeyHints />}
      />
      <List
        resource="readings"
        title="Review queue"
        filters={filters}
        filterDefaultValues={QUEUE_DEFAULT_FILTER}
        actions={false}
        sort={{ field: 'receivedAt', order: 'DESC' }}
        perPage={25}
        storeKey="readings.queue"
        pagination={false}
        disableSyncWithLocation={false}
        sx={{
          '& .RaList-content': { border: 'none', bgcolor: 'transparent' },
          // on a phone the filters are folded away until asked for (the toggle above the list)
          ...(phone && !filtersOpen ? { '& .RaList-actions': { display: 'none' } } : {}),
        }}
      >
        <QueueBody phone={phone} filtersOpen={filtersOpen} onToggleFilters={() => setFiltersOpen((o) => !o)} />
      </List>
    </Guarded>
  );
}
