import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import GavelOutlined from '@mui/icons-material/GavelOutlined';
import KeyboardOutlined from '@mui/icons-material/KeyboardOutlined';
import OpenInNewOutlined from '@mui/icons-material/ArrowForward';
import { Box, Button, Card, CardContent, Divider, Stack, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import {
  DateInput,
  List,
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
];

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
    <Box component="aside" aria-label="Keyboard shortcuts" data-testid="queue-keys" sx={{ display: 'flex', alignItems: 'center', flexWrap: 'wrap', gap: 1.5, color: 'text.secondary', fontSize: '0.8rem' }}>
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
            <Button size="small" variant="contained" color="success" onClick={release} disabled={releasing} data-testid="release-from-queue">
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

const kbdOnButton = { fontFamily: monoFont, fontSize: '0.7rem', ml: 0.75, px: 0.5, border: '1px solid currentColor', borderRadius: 0.5, opacity: 0.7, lineHeight: 1.4 } as const;

function QueueBody() {
  const { data, isPending, filterValues } = useListContext<Reading>();
  const unitSystem = useUnitSystem();
  const canReview = useHolds('readings:review');
  const refresh = useRefresh();
  const notify = useNotify();
  const rows = useMemo(() => data ?? [], [data]);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [dialog, setDialog] = useState<{ reading: Reading; decision: Decision } | null>(null);
  const tableRef = useRef<HTMLTableSectionElement>(null);

  const batchIds = useMemo(() => [...new Set(rows.map((r) => r.batchId))], [rows]);
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
      else return;
      e.preventDefault();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [dialog, move, decide, selected]);

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
    // go on to the next reading that waits for a decision
    const after = rows.slice(index + 1).find((r) => r.status === 'rejected' && !r.review && r.id !== result.id);
    if (after) setSelectedId(after.id);
    refresh();
  };

  if (!isPending && rows.length === 0) {
    const onlyRejected = filterValues?.status === 'rejected' && Object.keys(filterValues).length === 1;
    return (
      <Box sx={{ p: 5, textAlign: 'center' }} data-testid="queue-empty">
        <FactCheckOutlined sx={{ fontSize: 40, color: 'primary.main' }} aria-hidden />
        <Typography variant="h2" sx={{ fontSize: '1.1rem', mt: 1 }}>
          {onlyRejected ? 'Nothing is waiting for a decision' : 'No readings match these filters'}
        </Typography>
        <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
          {onlyRejected ? 'Rejected readings from the scales and loggers appear here as soon as they are judged.' : 'Widen the dates or clear a filter.'}
        </Typography>
      </Box>
    );
  }

  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1fr) 330px' }, gap: 2, alignItems: 'start', pt: 1.5, bgcolor: 'background.default' }}>
      <Box sx={{ bgcolor: 'background.paper', border: '1px solid', borderColor: 'divider', borderRadius: 1.5, overflow: 'hidden' }}>
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
                  onClick={() => setSelectedId(r.id)}
                  sx={{
                    cursor: 'pointer',
                    verticalAlign: 'top',
                    boxShadow: isSelected ? (t) => `inset 3px 0 0 ${t.palette.primary.main}` : undefined,
                    '&.Mui-selected': { bgcolor: '#e7f0f0' },
                    '&.Mui-selected:hover': { bgcolor: '#dde9ea' },
                    '& td': { py: 1 },
                  }}
                >
                  <TableCell>
                    <ReasonCell reading={r} unitSystem={unitSystem} />
                  </TableCell>
                  <TableCell>
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
        <Pagination rowsPerPageOptions={[10, 25, 50, 100]} />
      </Box>
      {selected ? (
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
  return (
    <Guarded resource="readings">
      <PageHeader
        title="Review queue"
        lead="Readings the judge rejected, with what was measured against which limit. Waive one with a note when the deviation does not matter for the part; uphold it to keep the batch on hold, or to scrap it."
        actions={<KeyHints />}
      />
      <List
        resource="readings"
        title="Review queue"
        filters={filters}
        filterDefaultValues={{ status: 'rejected' }}
        actions={false}
        sort={{ field: 'receivedAt', order: 'DESC' }}
        perPage={25}
        storeKey="readings.queue"
        pagination={false}
        disableSyncWithLocation={false}
        sx={{ '& .RaList-content': { border: 'none', bgcolor: 'transparent' } }}
      >
        <QueueBody />
      </List>
    </Guarded>
  );
}
