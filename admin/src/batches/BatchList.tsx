import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import WarningAmberRounded from '@mui/icons-material/WarningAmberRounded';
import { Box, Tooltip, Typography } from '@mui/material';
import { useMemo } from 'react';
import { DataTable, DateInput, List, SelectInput, TopToolbar, useGetList } from 'react-admin';
import { PlanBatchButton } from '../planning/PlanButtons';
import { EmptyState } from '../common/EmptyState';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { formatDate } from '../format/dates';
import { useUnitSystem } from '../review/hooks';
import { formatSi } from '../format/quantities';
import { monoFont } from '../theme';
import { BATCH_STATE, batchTitle, shortRef, type Batch, type BatchState } from './labels';

function SystemFilter(props: { source: string; label: string; alwaysOn?: boolean }) {
  const { data } = useGetList<{ id: string; name: string }>('material-systems', { pagination: { page: 1, perPage: 100 }, sort: { field: 'name', order: 'ASC' } });
  const choices = useMemo(() => (data ?? []).map((s) => ({ id: s.id, name: s.name })), [data]);
  return <SelectInput {...props} choices={choices} emptyText="Any system" />;
}

function MoldFilter(props: { source: string; label: string; alwaysOn?: boolean }) {
  const { data } = useGetList<{ id: string; name: string; code: string | null }>('molds', { pagination: { page: 1, perPage: 200 }, sort: { field: 'name', order: 'ASC' } });
  const choices = useMemo(() => (data ?? []).map((m) => ({ id: m.id, name: m.code ? `${m.name} (${m.code})` : m.name })), [data]);
  return <SelectInput {...props} choices={choices} emptyText="Any mold" />;
}

const filters = [
  <SelectInput
    key="state"
    source="state"
    label="State"
    alwaysOn
    emptyText="Any state"
    choices={(Object.keys(BATCH_STATE) as BatchState[]).map((s) => ({ id: s, name: BATCH_STATE[s].label }))}
  />,
  <SystemFilter key="system" source="materialSystemId" label="Material system" alwaysOn />,
  <MoldFilter key="mold" source="moldId" label="Mold" alwaysOn />,
  <DateInput key="from" source="plannedAfter" label="Planned from" alwaysOn />,
  <DateInput key="to" source="plannedBefore" label="Planned to" alwaysOn />,
];

export function BatchStateChip({ state }: { state: string }) {
  const s = BATCH_STATE[state as BatchState];
  return s ? <StatusChip tone={s.tone} label={s.label} title={s.blurb} /> : <StatusChip tone="quiet" label={state} />;
}

function NoBatches() {
  return (
    <EmptyState icon={Inventory2Outlined} title="No batches yet">
      A batch is one mix for one mold or cup. The ERP plans them from work orders, or an engineer plans one with its targets; the
      scales and loggers then post what was weighed.
    </EmptyState>
  );
}

export default function BatchListPage() {
  return (
    <Guarded resource="batches">
      <BatchList />
    </Guarded>
  );
}

function BatchList() {
  const unitSystem = useUnitSystem();
  return (
    <>
      <PageHeader title="Batches" lead="Every mix: its targets, what the scales weighed, and where it stands. Open one for its timeline, its reviews and the pour sheet." />
      <List resource="batches" title="Batches" filters={filters} actions={<TopToolbar><PlanBatchButton /></TopToolbar>} empty={<NoBatches />} sort={{ field: 'createdAt', order: 'DESC' }} perPage={25} storeKey="batches.list">
        <DataTable bulkActionButtons={false} rowClick="show">
          <DataTable.Col
            source="createdAt"
            label="Batch"
            render={(b: Batch) => (
              <Box>
                <Typography variant="body2" sx={{ fontWeight: 500 }}>
                  {batchTitle(b)}
                </Typography>
                <Typography variant="caption" sx={{ fontFamily: monoFont, color: 'text.secondary' }}>
                  {shortRef(b.id)} · rev. {b.materialSystemRevision}
                </Typography>
              </Box>
            )}
          />
          <DataTable.Col source="state" label="State" render={(b: Batch) => <BatchStateChip state={b.state} />} />
          <DataTable.Col
            label="Work order"
            disableSort
            render={(b: Batch) => <span style={{ fontFamily: monoFont, fontSize: '0.8rem' }}>{b.workOrderExternalRef ?? 'ad hoc'}</span>}
          />
          <DataTable.Col source="plannedFor" label="Planned for" render={(b: Batch) => <span style={{ whiteSpace: 'nowrap' }}>{formatDate(`${b.plannedFor}T12:00:00`)}</span>} />
          <DataTable.Col
            source="totalMassKg"
            label="Mixed shot"
            align="right"
            render={(b: Batch) => <span style={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>{formatSi(b.summary.totalMassKg, 'kg', unitSystem)}</span>}
          />
          <DataTable.Col
            label="Parts A : B"
            disableSort
            align="right"
            render={(b: Batch) => (
              <span style={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
                {formatSi(b.summary.massAKg, 'kg', unitSystem)} : {formatSi(b.summary.massBKg, 'kg', unitSystem)}
              </span>
            )}
          />
          <DataTable.Col
            label="Warnings"
            disableSort
            render={(b: Batch) =>
              b.summary.warnings.length ? (
                <Tooltip title={b.summary.warnings.join(', ')}>
                  <Box component="span" sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.5, color: 'warning.main' }}>
                    <WarningAmberRounded sx={{ fontSize: 17 }} aria-hidden />
                    {b.summary.warnings.length}
                  </Box>
                </Tooltip>
              ) : (
                <Typography variant="body2" color="text.secondary">
                  none
                </Typography>
              )
            }
          />
        </DataTable>
      </List>
    </>
  );
}
