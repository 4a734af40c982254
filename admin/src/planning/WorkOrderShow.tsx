import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import { Alert, Box, Button, Card, CardContent, Skeleton, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { Title, useCanAccess, useGetList, useGetOne } from 'react-admin';
import { Link, useParams } from 'react-router-dom';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { BatchStateChip } from '../batches/BatchList';
import { batchTitle, shortRef } from '../batches/labels';
import { formatDate } from '../format/dates';
import { formatNumber, formatPercent, formatSi } from '../format/quantities';
import { useHolds, useUnitSystem } from '../review/hooks';
import { monoFont } from '../theme';
import type { Batch, Consumption, WorkOrder } from '../views/sdk';
import { ConsoleLink } from '../genealogy/labels';
import { planLinkForWorkOrder } from './planRequest';
import { productionApi, saveBlob } from './productionApi';
import { problemText, useApi } from './useApi';

const ORDER_STATE: Record<string, { label: string; tone: 'info' | 'caution' | 'good' | 'quiet' }> = {
  open: { label: 'Open', tone: 'info' },
  in_progress: { label: 'In production', tone: 'caution' },
  done: { label: 'Done', tone: 'good' },
  cancelled: { label: 'Cancelled', tone: 'quiet' },
};
const PART_NAME: Record<string, string> = { A: 'Part A', B: 'Part B', pigment: 'Pigment' };

export default function WorkOrderShowPage() {
  return (
    <Guarded resource="work-orders" action="show">
      <WorkOrderShow />
    </Guarded>
  );
}

function Figure({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <Box>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Typography sx={{ fontWeight: 600, fontSize: '1.15rem', fontVariantNumeric: 'tabular-nums' }} data-testid={testId}>
        {value}
      </Typography>
    </Box>
  );
}

function WorkOrderShow() {
  const { id = '' } = useParams();
  const { data: order, error } = useGetOne<WorkOrder>('work-orders', { id });
  const { canAccess: canEdit } = useCanAccess({ resource: 'work-orders', action: 'edit' });
  const canPlan = useHolds('shop:write');
  const plan = useApi(order ? `plan:${id}:${order.updatedAt}` : null, () => productionApi.batchPlan(id));
  const { data: batches = [], total } = useGetList<Batch>(
    'batches',
    { pagination: { page: 1, perPage: 50 }, sort: { field: 'plannedFor', order: 'ASC' }, filter: { workOrderId: id } },
    { enabled: !!order },
  );

  if (error) return <Alert severity="error">{(error as Error).message}</Alert>;
  if (!order) return <Skeleton variant="rounded" height={240} sx={{ maxWidth: 1100 }} />;
  const state = ORDER_STATE[order.state] ?? { label: order.state, tone: 'quiet' as const };
  const open = order.state === 'open' || order.state === 'in_progress';
  const p = plan.data;

  return (
    <Box sx={{ maxWidth: 1100, display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: 2 }}>
      <Title title={`Work order ${order.externalRef}`} />
      <PageHeader
        title={`Work order ${order.externalRef}`}
        lead={
          <>
            {order.quantity} parts{order.partNumber ? ` of ${order.partNumber}` : ''} · {order.moldName ?? 'no mold yet'} · {order.materialSystemName ?? 'no system yet'}
            {order.dueOn ? ` · due ${formatDate(`${order.dueOn}T12:00:00`)}` : ''}
          </>
        }
        actions={
          <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
            <StatusChip label={state.label} tone={state.tone} />
            {canEdit ? (
              <Button component={Link} to={`/work-orders/${encodeURIComponent(order.id)}`} size="small" variant="outlined" startIcon={<EditOutlined />}>
                Edit
              </Button>
            ) : null}
          </Box>
        }
      />

      <Card data-testid="batch-proposal">
        <CardContent sx={{ display: 'grid', gap: 1.5 }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
            Batches to plan
          </Typography>
          {plan.isPending ? <Skeleton height={60} /> : null}
          {plan.error ? <Alert severity="warning">{problemText(plan.error)}</Alert> : null}
          {p ? (
            <>
              <Box sx={{ display: 'grid', gridTemplateColumns: { xs: 'repeat(2, 1fr)', sm: 'repeat(5, 1fr)' }, gap: 2 }}>
                <Figure label="Parts ordered" value={formatNumber(p.ordered, { decimals: 0 })} />
                <Figure label="Cavities per mix" value={formatNumber(p.cavities, { decimals: 0 })} />
                <Figure label="Batches planned" value={formatNumber(p.batchesPlanned, { decimals: 0 })} />
                <Figure label="Parts still to plan" value={formatNumber(p.partsRemaining, { decimals: 0 })} />
                <Figure label="Batches proposed" value={formatNumber(p.proposedBatches, { decimals: 0 })} testId="proposed-batches" />
              </Box>
              <Typography variant="body2" color="text.secondary">
                One batch fills every cavity of the mold once: {formatNumber(p.partsRemaining, { decimals: 0 })} parts in {formatNumber(p.cavities, { decimals: 0 })}-cavity mixes make{' '}
                {formatNumber(p.proposedBatches, { decimals: 0 })} batches (rounded up). Scrapped batches do not count as planned.
              </Typography>
              {canPlan && open ? (
                <Box>
                  <Button
                    component={Link}
                    to={planLinkForWorkOrder(order.id, p.proposedBatches)}
                    variant="contained"
                    startIcon={<EventAvailableOutlined />}
                    disabled={p.proposedBatches === 0}
                    data-testid="plan-order-batches"
                  >
                    {p.proposedBatches === 0 ? 'Every part is planned' : p.proposedBatches === 1 ? 'Plan 1 batch' : `Plan ${p.proposedBatches} batches`}
                  </Button>
                </Box>
              ) : null}
            </>
          ) : null}
        </CardContent>
      </Card>

      <Card>
        <CardContent sx={{ display: 'grid', gap: 1 }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
            Batches of this order{total ? ` (${total})` : ''}
          </Typography>
          {batches.length ? (
            <Box sx={{ overflowX: 'auto' }}>
              <Table size="small" aria-label="Batches of this order">
                <TableHead>
                  <TableRow>
                    <TableCell>Batch</TableCell>
                    <TableCell>Planned for</TableCell>
                    <TableCell>Station</TableCell>
                    <TableCell>State</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {batches.map((b) => (
                    <TableRow key={b.id} hover>
                      <TableCell>
                        <ConsoleLink to={`/batches/${encodeURIComponent(b.id)}/show`}>{batchTitle(b)}</ConsoleLink>{' '}
                        <span style={{ fontFamily: monoFont, fontSize: '0.8rem', color: '#5c6466' }}>{shortRef(b.id)}</span>
                      </TableCell>
                      <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDate(`${b.plannedFor}T12:00:00`)}</TableCell>
                      <TableCell sx={{ fontFamily: monoFont }}>{b.stationCode ?? '—'}</TableCell>
                      <TableCell>
                        <BatchStateChip state={b.state} />
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </Box>
          ) : (
            <Typography variant="body2" color="text.secondary">
              No batch is planned for this order yet.
            </Typography>
          )}
        </CardContent>
      </Card>

      <ConsumptionCard order={order} hasBatches={batches.length > 0} />
    </Box>
  );
}

function ConsumptionCard({ order, hasBatches }: { order: WorkOrder; hasBatches: boolean }) {
  const units = useUnitSystem();
  const consumption = useApi(hasBatches ? `consumption:${order.id}` : null, () => productionApi.consumption(order.id));
  const c: Consumption | undefined = consumption.data;
  return (
    <Card data-testid="consumption">
      <CardContent sx={{ display: 'grid', gap: 1.5 }}>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
          <Typography variant="h2" sx={{ fontSize: '1.1rem', flex: 1 }}>
            Consumption and yield
          </Typography>
          {c ? (
            <Button
              size="small"
              variant="outlined"
              startIcon={<DownloadOutlined />}
              onClick={async () => saveBlob(await productionApi.consumptionCsv(order.id), `consumption-${order.externalRef}.csv`)}
              data-testid="consumption-csv"
            >
              CSV
            </Button>
          ) : null}
        </Box>
        {!hasBatches ? (
          <Typography variant="body2" color="text.secondary">
            Consumption is counted once the order has batches.
          </Typography>
        ) : consumption.error ? (
          <Alert severity="info">{problemText(consumption.error)}</Alert>
        ) : !c ? (
          <Skeleton height={80} />
        ) : (
          <>
            <Box sx={{ display: 'grid', gridTemplateColumns: { xs: 'repeat(2, 1fr)', sm: 'repeat(6, 1fr)' }, gap: 2 }}>
              <Figure label="Accepted" value={formatNumber(c.parts.accepted, { decimals: 0 })} />
              <Figure label="Rework" value={formatNumber(c.parts.rework, { decimals: 0 })} />
              <Figure label="Scrap" value={formatNumber(c.parts.scrap, { decimals: 0 })} />
              <Figure label="Not decided" value={formatNumber(c.parts.undecided, { decimals: 0 })} />
              <Figure label="Yield" value={c.yield === null ? '—' : formatPercent(c.yield * 100, { decimals: 1 })} testId="consumption-yield" />
              <Figure label="Scrap mass" value={formatSi(c.scrapMassKg, 'kg', units)} />
            </Box>
            <Box sx={{ overflowX: 'auto' }}>
              <Table size="small" aria-label="Material by lot, planned against weighed">
                <TableHead>
                  <TableRow>
                    <TableCell>Material</TableCell>
                    <TableCell>Lot</TableCell>
                    <TableCell align="right">Batches</TableCell>
                    <TableCell align="right">Planned</TableCell>
                    <TableCell align="right">Weighed</TableCell>
                    <TableCell align="right">Difference</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {c.materials.map((m) => (
                    <TableRow key={`${m.part}-${m.lotId ?? 'none'}`}>
                      <TableCell>{PART_NAME[m.part] ?? m.part}</TableCell>
                      <TableCell sx={{ fontFamily: monoFont }}>
                        {m.lotId ? (
                          <ConsoleLink mono to={`/lots/${encodeURIComponent(m.lotId)}/trace`}>
                            {m.lotNumber}
                          </ConsoleLink>
                        ) : (
                          'not recorded'
                        )}
                      </TableCell>
                      <TableCell align="right">{m.batches}</TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                        {formatSi(m.plannedKg, 'kg', units)}
                      </TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                        {formatSi(m.actualKg, 'kg', units)}
                      </TableCell>
                      <TableCell align="right" sx={{ whiteSpace: 'nowrap' }}>
                        {m.varianceKg > 0 ? '+' : ''}
                        {formatSi(m.varianceKg, 'kg', units)}
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </Box>
            <Typography variant="caption" color="text.secondary">
              Yield is accepted ÷ (accepted + rework + scrap), counted by Pourgate; weighed is the latest accepted or waived settled mass of each part in each batch.
            </Typography>
          </>
        )}
      </CardContent>
    </Card>
  );
}
