import EditOutlined from '@mui/icons-material/EditOutlined';
import ReportOutlined from '@mui/icons-material/ReportOutlined';
import {
  Alert,
  Box,
  Button,
  Card,
  CardContent,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Skeleton,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import { useState } from 'react';
import { Title, useCanAccess, useNotify } from 'react-admin';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { BatchStateChip } from '../batches/BatchList';
import { shortRef } from '../batches/labels';
import { formatDate } from '../format/dates';
import { formatNumber } from '../format/quantities';
import { productionApi } from '../planning/productionApi';
import { problemText, useApi } from '../planning/useApi';
import { useHolds } from '../review/hooks';
import { monoFont } from '../theme';
import type { Lot, LotGenealogy } from '../views/sdk';
import { ConsoleLink, DispositionChip, PartCounts, partName } from './labels';

export default function LotTraceRoute() {
  return (
    <Guarded resource="lots" action="show">
      <LotTrace />
    </Guarded>
  );
}

export function LotStateChips({ lot }: { lot: Lot }) {
  return (
    <Box sx={{ display: 'flex', gap: 0.75, flexWrap: 'wrap' }}>
      {lot.recall ? <StatusChip tone="bad" label="Recalled" title={lot.recall.reason ?? undefined} /> : null}
      {lot.hold ? <StatusChip tone="bad" label="On hold" title="Its latest cup test failed" /> : null}
      {lot.expired ? <StatusChip tone="caution" label="Expired" /> : null}
      {!lot.recall && !lot.hold && !lot.expired ? <StatusChip tone="good" label="Usable" /> : null}
    </Box>
  );
}

function LotTrace() {
  const { id = '' } = useParams();
  const [version, setVersion] = useState(0);
  const trace = useApi(`lot-trace:${id}:${version}`, () => productionApi.lotGenealogy(id));
  const { canAccess: canEdit } = useCanAccess({ resource: 'lots', action: 'edit' });
  const canRecall = useHolds('lots:recall');
  const [recalling, setRecalling] = useState(false);

  if (trace.error) return <Alert severity="error">{problemText(trace.error)}</Alert>;
  const g: LotGenealogy | undefined = trace.data;
  if (!g) return <Skeleton variant="rounded" height={260} sx={{ maxWidth: 1200 }} />;
  const lot = g.lot;

  return (
    <Box sx={{ maxWidth: 1200, display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: 2 }}>
      <Title title={`Lot ${lot.lotNumber}`} />
      <PageHeader
        title={`Lot ${lot.lotNumber}`}
        lead={
          <>
            {partName(lot.part)} · {lot.materialSystemName ?? 'any system'} · received {formatDate(`${lot.receivedOn}T12:00:00`)}
            {lot.openedOn ? ` · opened ${formatDate(`${lot.openedOn}T12:00:00`)}` : ' · sealed'} · usable until {formatDate(`${lot.usableUntil}T12:00:00`)}
            {lot.shelfLifeDaysAfterOpening ? ` (${lot.shelfLifeDaysAfterOpening} days after opening)` : ''}
          </>
        }
        actions={
          <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap', alignItems: 'center' }}>
            <LotStateChips lot={lot} />
            {canEdit ? (
              <Button component={Link} to={`/lots/${encodeURIComponent(lot.id)}`} size="small" variant="outlined" startIcon={<EditOutlined />}>
                Edit
              </Button>
            ) : null}
            <Button component={Link} to={`/lots/${encodeURIComponent(lot.id)}/recall`} size="small" variant="contained" data-testid="open-recall-report">
              Recall report
            </Button>
            {canRecall && !lot.recall ? (
              <Button size="small" color="error" variant="outlined" startIcon={<ReportOutlined />} onClick={() => setRecalling(true)} data-testid="recall-lot">
                Recall this lot
              </Button>
            ) : null}
          </Box>
        }
      />
      {lot.recall ? (
        <Alert severity="error">
          Recalled {formatDate(lot.recall.at)}
          {lot.recall.by ? ` by ${lot.recall.by}` : ''}
          {lot.recall.reason ? `: ${lot.recall.reason}` : ''}. It goes into no new batch without an engineer&apos;s override.
        </Alert>
      ) : null}

      <Card>
        <CardContent sx={{ display: 'grid', gap: 1.5 }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
            Parts made with this lot
          </Typography>
          <PartCounts parts={g.parts} />
        </CardContent>
      </Card>

      <Card>
        <CardContent sx={{ display: 'grid', gap: 1 }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
            Work orders
          </Typography>
          {g.workOrders.length ? (
            <Box sx={{ overflowX: 'auto' }}>
              <Table size="small" aria-label="Work orders this lot went into">
                <TableHead>
                  <TableRow>
                    <TableCell>Order</TableCell>
                    <TableCell>Part number</TableCell>
                    <TableCell>State</TableCell>
                    <TableCell align="right">Batches with this lot</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {g.workOrders.map((w) => (
                    <TableRow key={w.id}>
                      <TableCell sx={{ fontFamily: monoFont }}>
                        <ConsoleLink mono to={`/work-orders/${encodeURIComponent(w.id)}/show`}>{w.externalRef}</ConsoleLink>
                      </TableCell>
                      <TableCell>{w.partNumber ?? '—'}</TableCell>
                      <TableCell>{w.state.replace('_', ' ')}</TableCell>
                      <TableCell align="right">{formatNumber(w.batches, { decimals: 0 })}</TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </Box>
          ) : (
            <Typography variant="body2" color="text.secondary">
              No work order has used this lot.
            </Typography>
          )}
        </CardContent>
      </Card>

      <Card>
        <CardContent sx={{ display: 'grid', gap: 1 }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
            Batches
          </Typography>
          {g.batches.length ? (
            <Box sx={{ overflowX: 'auto' }}>
              <Table size="small" aria-label="Batches this lot went into" data-testid="lot-batches">
                <TableHead>
                  <TableRow>
                    <TableCell>Batch</TableCell>
                    <TableCell>Planned for</TableCell>
                    <TableCell>Work order</TableCell>
                    <TableCell>Station</TableCell>
                    <TableCell>State</TableCell>
                    <TableCell>Disposition</TableCell>
                    <TableCell>Parts</TableCell>
                    <TableCell>With lots</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {g.batches.map((b) => (
                    <TableRow key={b.batchId}>
                      <TableCell sx={{ whiteSpace: 'nowrap' }}>
                        <ConsoleLink to={`/batches/${encodeURIComponent(b.batchId)}/show`}>{b.moldName ?? 'Batch'}</ConsoleLink>{' '}
                        <span style={{ fontFamily: monoFont, fontSize: '0.8rem', color: '#5c6466' }}>{shortRef(b.batchId)}</span>
                      </TableCell>
                      <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDate(`${b.plannedFor}T12:00:00`)}</TableCell>
                      <TableCell sx={{ fontFamily: monoFont }}>
                        {b.workOrderId ? <ConsoleLink mono to={`/work-orders/${encodeURIComponent(b.workOrderId)}/show`}>{b.workOrderExternalRef}</ConsoleLink> : 'ad hoc'}
                      </TableCell>
                      <TableCell sx={{ fontFamily: monoFont }}>{b.stationCode ?? '—'}</TableCell>
                      <TableCell>
                        <BatchStateChip state={b.state} />
                      </TableCell>
                      <TableCell>
                        <DispositionChip decision={b.disposition} />
                      </TableCell>
                      <TableCell sx={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}>
                        {b.parts.accepted} good · {b.parts.rework} rework · {b.parts.scrap} scrap{b.parts.undecided ? ` · ${b.parts.undecided} open` : ''}
                      </TableCell>
                      <TableCell sx={{ whiteSpace: 'nowrap' }}>
                        {b.lots
                          .filter((l) => l.id !== lot.id)
                          .map((l, i) => (
                            <span key={l.id}>
                              {i ? ', ' : ''}
                              {partName(l.part)}{' '}
                              <Link to={`/lots/${encodeURIComponent(l.id)}/trace`} style={{ fontFamily: monoFont }}>
                                {l.lotNumber}
                              </Link>
                            </span>
                          ))}
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </Box>
          ) : (
            <Typography variant="body2" color="text.secondary">
              No batch has used this lot yet.
            </Typography>
          )}
        </CardContent>
      </Card>
      {recalling ? <RecallDialog lot={lot} onClose={() => setRecalling(false)} onDone={() => setVersion((v) => v + 1)} /> : null}
    </Box>
  );
}

function RecallDialog({ lot, onClose, onDone }: { lot: Lot; onClose: () => void; onDone: () => void }) {
  const [reason, setReason] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const notify = useNotify();
  const navigate = useNavigate();
  const submit = async () => {
    setBusy(true);
    setError(null);
    try {
      await productionApi.recall(lot.id, reason.trim());
      notify(`Lot ${lot.lotNumber} recalled; the ERP is told what it went into.`, { type: 'success' });
      onDone();
      onClose();
      navigate(`/lots/${encodeURIComponent(lot.id)}/recall`);
    } catch (e) {
      setError(problemText(e));
    } finally {
      setBusy(false);
    }
  };
  return (
    <Dialog open onClose={onClose} maxWidth="sm" fullWidth>
      <DialogTitle>Recall lot {lot.lotNumber}</DialogTitle>
      <DialogContent sx={{ display: 'grid', gap: 1.5 }}>
        <Typography variant="body2">
          A recalled lot goes into no new batch without an engineer&apos;s override, and the ERP hears of it (lot.recalled) with every batch and work order it went into.
        </Typography>
        {error ? <Alert severity="error">{error}</Alert> : null}
        <TextField
          label="Reason"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          multiline
          minRows={2}
          required
          autoFocus
          slotProps={{ htmlInput: { maxLength: 1000, 'data-testid': 'recall-reason' } }}
        />
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Cancel</Button>
        <Button color="error" variant="contained" disabled={busy || reason.trim().length < 3} onClick={() => void submit()} data-testid="recall-confirm">
          Recall the lot
        </Button>
      </DialogActions>
    </Dialog>
  );
}
