import ArrowBack from '@mui/icons-material/ArrowBack';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import TaskAltOutlined from '@mui/icons-material/TaskAltOutlined';
import { Alert, Box, Button, Card, CardContent, Divider, Skeleton, Typography } from '@mui/material';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Confirm, Title, useDataProvider, useGetList, useGetOne, useNotify, useRefresh, useShowController } from 'react-admin';
import { Guarded } from '../common/Guarded';
import { formatDate, formatDateTime } from '../format/dates';
import { releaseBatch } from '../review/commands';
import { useHolds, useUnitSystem } from '../review/hooks';
import { describeReason } from '../review/reasons';
import { readingTitle, readingValue, type Reading } from '../review/labels';
import { formatNumber } from '../format/quantities';
import { monoFont, palette } from '../theme';
import { BatchStateChip } from './BatchList';
import { CautionList, ComponentTable, ProcessFigures, TargetSummary, WarningList, massDecimals } from './TargetFigures';
import { ToleranceBars, type BarRow } from './ToleranceBars';
import type { BatchTransition as Transition, ReleaseCheck, TargetsView } from '../views/sdk';
import { BATCH_STATE, batchTitle, shortRef, type Batch, } from './labels';
import { readableReason } from './timeline';
import { PartAcceptance } from '../parts/PartAcceptance';

export function useBatchTargets(id: string | undefined) {
  // GET /v1/batches/{id}/targets, through the data provider (its getOne appends the last segment)
  return useGetOne<TargetsView & { id: string }>(`batches/${id}`, { id: 'targets' }, { enabled: !!id });
}

/**
 * What was weighed and what the batch still needs before release, as the API decides it
 * (GET /v1/batches/{id}/release-check): the console computes neither.
 */
function useReleaseCheck(id: string | undefined) {
  return useGetOne<ReleaseCheck & { id: string }>(`batches/${id}`, { id: 'release-check' }, { enabled: !!id });
}

/** The missing items, listed before the release button is pressed. */
function MissingBeforeRelease({ check }: { check: ReleaseCheck | undefined }) {
  if (!check || check.ready) return null;
  return (
    <Alert severity="info" sx={{ mb: 2 }} data-testid="release-missing">
      <Typography variant="body2" sx={{ fontWeight: 600 }}>Before this batch can be released:</Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {check.missing.map((m) => (
          <li key={m.item}>{m.message}</li>
        ))}
        {check.openRejections > 0 ? <li>{check.openRejections} rejected reading(s) to waive.</li> : null}
      </Box>
    </Alert>
  );
}

export function useBatchReadings(id: string | undefined) {
  return useGetList<Reading>('readings', { filter: { batchId: id }, pagination: { page: 1, perPage: 500 }, sort: { field: 'receivedAt', order: 'ASC' } }, { enabled: !!id });
}

function Section({ title, children, actions, testId }: { title: string; children: React.ReactNode; actions?: React.ReactNode; testId?: string }) {
  return (
    <Card component="section" aria-label={title} data-testid={testId}>
      <CardContent>
        <Box sx={{ display: 'flex', alignItems: 'center', mb: 1.5, gap: 1 }}>
          <Typography variant="h2" sx={{ fontSize: '1.02rem', flex: 1 }}>
            {title}
          </Typography>
          {actions}
        </Box>
        {children}
      </CardContent>
    </Card>
  );
}

function barRows(t: TargetsView, weighed: ReleaseCheck['weighed'] | undefined): { rows: BarRow[]; error: number | null } {
  const w = { A: weighed?.partA?.massKg, B: weighed?.partB?.massKg, pigment: weighed?.pigment?.massKg };
  const d = massDecimals(t);
  const factor = (q: { value: number; si?: { value: number } }) => (q.si && q.si.value !== 0 ? q.value / q.si.value : 1);
  const { A, B, pigment } = t.components;
  const f = factor(A.mass);
  const toDisplay = (kg: number | undefined) => (kg === undefined ? undefined : kg * f);
  const tol = t.ratioTolerancePercent / 100;
  const rows: BarRow[] = [
    { label: 'Part A', note: A.side ? `${A.side} side` : undefined, unit: A.mass.unit, target: A.mass.value, low: A.toleranceBand?.low.value, high: A.toleranceBand?.high.value, measured: toDisplay(w.A), decimals: d, swatch: palette.partA },
    { label: 'Part B', note: B.side ? `${B.side} side` : undefined, unit: B.mass.unit, target: B.mass.value, low: B.toleranceBand?.low.value, high: B.toleranceBand?.high.value, measured: toDisplay(w.B), decimals: d, swatch: palette.partB },
  ];
  if (pigment.mass.value > 0) {
    rows.push({
      label: 'Pigment',
      note: pigment.percentOfAB !== undefined ? `${formatNumber(pigment.percentOfAB, { decimals: 2, trim: true })} % of A + B` : undefined,
      unit: pigment.mass.unit,
      target: pigment.mass.value,
      low: pigment.mass.value * (1 - tol),
      high: pigment.mass.value * (1 + tol),
      measured: toDisplay(w.pigment),
      decimals: d,
      swatch: '#3a3f44',
    });
  }
  const e = weighed?.ratioErrorPercent;
  return { rows, error: e === null || e === undefined ? null : e / 100 };
}

function Timeline({ items }: { items: Transition[] }) {
  return (
    <Box component="ol" sx={{ listStyle: 'none', m: 0, p: 0 }} data-testid="batch-timeline">
      {items.map((t, i) => {
        const s = BATCH_STATE[t.to];
        const last = i === items.length - 1;
        const tone = s?.tone === 'bad' ? '#b3261e' : s?.tone === 'caution' ? '#c98a16' : s?.tone === 'good' ? '#2f7d4f' : palette.petrol;
        return (
          <Box component="li" key={t.id} sx={{ display: 'grid', gridTemplateColumns: '18px 1fr', columnGap: 1.25 }}>
            <Box sx={{ position: 'relative', display: 'flex', justifyContent: 'center' }}>
              <Box sx={{ width: 12, height: 12, borderRadius: '50%', bgcolor: last ? tone : '#fff', border: `2px solid ${tone}`, mt: '5px', zIndex: 1 }} />
              {!last ? <Box sx={{ position: 'absolute', top: 17, bottom: -5, width: 2, bgcolor: 'divider' }} /> : null}
            </Box>
            <Box sx={{ pb: last ? 0 : 1.75 }}>
              <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, flexWrap: 'wrap' }}>
                <Typography variant="body2" sx={{ fontWeight: 600 }}>
                  {s?.label ?? t.to}
                </Typography>
                <Typography variant="caption" color="text.secondary">
                  {formatDateTime(t.at)}
                </Typography>
              </Box>
              <Typography variant="caption" color="text.secondary" component="div">
                {t.actor ?? (t.actorType === 'system' ? 'Pourgate' : 'someone')}
                {t.reason ? ` · ${readableReason(t.reason)}` : ''}
              </Typography>
            </Box>
          </Box>
        );
      })}
    </Box>
  );
}

function ReviewList({ readings }: { readings: Reading[] }) {
  const unitSystem = useUnitSystem();
  const flagged = readings.filter((r) => r.status === 'rejected');
  if (!flagged.length)
    return (
      <Typography variant="body2" color="text.secondary">
        No reading of this batch was rejected.
      </Typography>
    );
  return (
    <Box component="ul" sx={{ listStyle: 'none', p: 0, m: 0, display: 'grid', gap: 1.25 }} data-testid="batch-reviews">
      {flagged.map((r) => (
        <Box component="li" key={r.id} sx={{ borderLeft: '3px solid', borderColor: r.review?.decision === 'waive' ? 'success.main' : 'error.main', pl: 1.25 }}>
          <Typography variant="body2" sx={{ fontWeight: 600 }}>
            {r.reasons.map((x) => describeReason(x, unitSystem).line).join('; ') || 'Rejected'}
          </Typography>
          <Typography variant="caption" color="text.secondary" component="div">
            {readingTitle(r)} {readingValue(r)} · {formatDateTime(r.receivedAt)}
          </Typography>
          <Typography variant="body2" sx={{ mt: 0.25 }}>
            {r.review ? (
              <>
                <strong>{r.review.decision === 'waive' ? 'Waived' : 'Upheld'}</strong> by {r.review.by ?? 'someone'}, {formatDateTime(r.review.at)}
                {r.review.note ? <Box component="span" sx={{ color: 'text.secondary', fontStyle: 'italic' }}> — “{r.review.note}”</Box> : null}
              </>
            ) : (
              <Box component="span" sx={{ color: 'warning.main', fontWeight: 500 }}>
                Waiting for a decision
              </Box>
            )}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}

function ReleaseButton({ batch, openRejections, ready, onDone }: { batch: Batch; openRejections: number; ready: boolean; onDone: () => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const release = async () => {
    setBusy(true);
    try {
      await releaseBatch(dataProvider, batch.id);
      notify(`${batchTitle(batch)} is released.`, { type: 'success' });
      onDone();
    } catch (error) {
      notify((error as Error).message, { type: 'warning' });
    } finally {
      setBusy(false);
      setConfirming(false);
    }
  };
  return (
    <>
      <Button
        variant="contained"
        color="success"
        startIcon={<TaskAltOutlined />}
        onClick={() => setConfirming(true)}
        disabled={openRejections > 0 || !ready}
        title={openRejections > 0 ? 'Every rejected reading must be waived first' : !ready ? 'Something is still missing: see the list above' : undefined}
        data-testid="release-batch"
      >
        Release batch
      </Button>
      <Confirm
        isOpen={confirming}
        loading={busy}
        title={`Release ${batchTitle(batch)}?`}
        content="The batch is cleared for demold and use. The ERP is told through its webhook."
        confirm="Release"
        onConfirm={release}
        onClose={() => setConfirming(false)}
      />
    </>
  );
}

export default function BatchShowPage() {
  return (
    <Guarded resource="batches" action="show">
      <BatchShow />
    </Guarded>
  );
}

function BatchShow() {
  const { record: batch, isPending, error } = useShowController<Batch>({ resource: 'batches' });
  const { data: targets } = useBatchTargets(batch?.id);
  const { data: readings = [] } = useBatchReadings(batch?.id);
  const { data: transitions = [] } = useGetList<Transition>(`batches/${batch?.id}/transitions`, { pagination: { page: 1, perPage: 200 }, sort: { field: 'at', order: 'ASC' } }, { enabled: !!batch });
  const canReview = useHolds('readings:review');
  const refresh = useRefresh();
  const { data: releaseCheck } = useReleaseCheck(batch?.id);

  if (error) return <Alert severity="error">{(error as Error).message}</Alert>;
  if (isPending || !batch) return <Skeleton variant="rounded" height={320} sx={{ mt: 2 }} />;

  const releasable = canReview && ['weighing', 'mixed', 'curing', 'on_hold'].includes(batch.state);
  const bars = targets ? barRows(targets, releaseCheck?.weighed) : null;

  return (
    <Box sx={{ maxWidth: 1240 }}>
      <Title title={batchTitle(batch)} />
      <Button component={Link} to="/batches" size="small" startIcon={<ArrowBack />} sx={{ mt: 0.5 }}>
        All batches
      </Button>
      <Box sx={{ display: 'flex', alignItems: 'flex-end', gap: 2, mt: 0.5, mb: 2, flexWrap: 'wrap' }}>
        <Box sx={{ flex: 1, minWidth: { xs: '100%', sm: 280 } }}>
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1.25, flexWrap: 'wrap' }}>
            <Typography variant="h1" sx={{ fontSize: '1.5rem' }}>
              {batchTitle(batch)}
            </Typography>
            <BatchStateChip state={batch.state} />
          </Box>
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
            <Box component="span" sx={{ fontFamily: monoFont }}>{shortRef(batch.id)}</Box> · {batch.materialSystemName} rev. {batch.materialSystemRevision} · planned for{' '}
            {formatDate(`${batch.plannedFor}T12:00:00`)} · {batch.workOrderExternalRef ? `work order ${batch.workOrderExternalRef}` : 'ad hoc'}
            {batch.stationCode ? ` · station ${batch.stationCode}` : ''}
          </Typography>
        </Box>
        <Box sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
          {releaseCheck && releaseCheck.openRejections > 0 ? (
            <Button component={Link} to={`/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', reviewed: false, batchId: batch.id }))}`} variant="outlined" startIcon={<FactCheckOutlined />} data-testid="open-rejections">
              {releaseCheck.openRejections} to review
            </Button>
          ) : null}
          <Button component={Link} to={`/batches/${batch.id}/pour-sheet`} variant="outlined" startIcon={<PrintOutlined />} data-testid="open-pour-sheet">
            Pour sheet
          </Button>
          {releasable ? <ReleaseButton batch={batch} openRejections={releaseCheck?.openRejections ?? 0} ready={releaseCheck?.ready ?? false} onDone={refresh} /> : null}
        </Box>
      </Box>
      {releasable ? <MissingBeforeRelease check={releaseCheck} /> : null}

      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1.75fr) minmax(300px, 1fr)' }, gap: 2, alignItems: 'start' }}>
        <Box sx={{ display: 'grid', gap: 2 }}>
          <Section title="Targets against what was weighed" testId="weighed-section">
            {targets && bars ? (
              <>
                <ToleranceBars rows={bars.rows} caption={`pigment judged at ±${formatNumber(targets.ratioTolerancePercent, { decimals: 1, trim: true })} % of its target`} />
                <Divider sx={{ my: 1.5 }} />
                <Box sx={{ display: 'flex', gap: 3, flexWrap: 'wrap' }}>
                  <Box>
                    <Typography variant="caption" color="text.secondary" component="div">
                      A:B ratio error
                    </Typography>
                    <Typography variant="body1" sx={{ fontWeight: 600, color: bars.error !== null && Math.abs(bars.error * 100) > targets.ratioTolerancePercent + 1e-9 ? 'error.main' : 'text.primary' }} data-testid="ratio-error">
                      {bars.error === null ? 'not weighed yet' : `${formatNumber(bars.error * 100, { decimals: 2, signed: true })} %`}
                    </Typography>
                  </Box>
                  <Box>
                    <Typography variant="caption" color="text.secondary" component="div">
                      Tolerance
                    </Typography>
                    <Typography variant="body1">±{formatNumber(targets.ratioTolerancePercent, { decimals: 1, trim: true })} %</Typography>
                  </Box>
                  <Box>
                    <Typography variant="caption" color="text.secondary" component="div">
                      Readings
                    </Typography>
                    <Typography variant="body1">
                      {releaseCheck ? `${releaseCheck.readings.total} (${releaseCheck.readings.rejected} rejected)` : '…'}
                    </Typography>
                  </Box>
                </Box>
              </>
            ) : (
              <Skeleton variant="rounded" height={120} />
            )}
          </Section>
          <PartAcceptance batch={batch} />
          <Section title="Targets">
            {targets ? (
              <Box sx={{ display: 'grid', gap: 2 }}>
                <TargetSummary t={targets} />
                <ComponentTable t={targets} lots={batch.lots} />
                <ProcessFigures t={targets} />
                <WarningList warnings={targets.warnings} />
                <Typography variant="caption" color="text.secondary">
                  Computed {targets.computedAt ? formatDateTime(targets.computedAt) : ''} with version {targets.computationVersion}; stored with the batch, so later changes to the system or the mold do not alter it.
                </Typography>
              </Box>
            ) : (
              <Skeleton variant="rounded" height={200} />
            )}
          </Section>
        </Box>
        <Box sx={{ display: 'grid', gap: 2 }}>
          <Section title="Timeline">
            <Timeline items={transitions} />
          </Section>
          <Section title="Rejections and decisions">
            <ReviewList readings={readings} />
          </Section>
          {targets ? <CautionList cautions={targets.cautions} compact /> : null}
        </Box>
      </Box>
    </Box>
  );
}
