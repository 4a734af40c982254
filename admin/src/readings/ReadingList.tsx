import { Box, Typography } from '@mui/material';
import { DataTable, DateTimeInput, List, ReferenceField, ReferenceInput, SelectInput, TextField, useGetIdentity } from 'react-admin';
import { Link } from 'react-router-dom';
import type { Reading } from '../views/sdk';
import type { PourgateIdentity } from '../authProvider';
import { shortRef } from '../batches/labels';
import { Guarded } from '../common/Guarded';
import { PageHeader } from '../common/PageHeader';
import { StatusChip } from '../common/StatusChip';
import { formatDateTime } from '../format/dates';
import { formatSi } from '../format/quantities';
import { READING_STATUS, readingTitle, SUBJECT_LABEL } from '../review/labels';
import { reasonsLine } from '../review/reasons';

const STATUS_CHOICES = (Object.keys(READING_STATUS) as (keyof typeof READING_STATUS)[]).map((id) => ({ id, name: READING_STATUS[id].label }));
const QUANTITY_CHOICES = [
  { id: 'mass', name: 'Mass' },
  { id: 'temperature', name: 'Temperature' },
  { id: 'humidity', name: 'Humidity' },
  { id: 'milestone', name: 'Time mark' },
];
const SUBJECT_CHOICES = Object.entries(SUBJECT_LABEL).map(([id, name]) => ({ id, name }));

const filters = [
  <SelectInput key="status" source="status" label="Verdict" choices={STATUS_CHOICES} emptyText="Any verdict" alwaysOn />,
  <ReferenceInput key="deviceId" source="deviceId" reference="devices" sort={{ field: 'name', order: 'ASC' }} perPage={200} alwaysOn>
    <SelectInput label="Device" optionText={(d: { name: string; serial: string }) => `${d.name} · ${d.serial}`} emptyText="Any device" />
  </ReferenceInput>,
  <SelectInput key="quantity" source="quantity" label="Quantity" choices={QUANTITY_CHOICES} emptyText="Any" />,
  <SelectInput key="subject" source="subject" label="What" choices={SUBJECT_CHOICES} emptyText="Anything" />,
  <DateTimeInput key="receivedAfter" source="receivedAfter" label="Received after" />,
  <DateTimeInput key="receivedBefore" source="receivedBefore" label="Received before" />,
];

function ValueCell({ r }: { r: Reading }) {
  const { identity } = useGetIdentity();
  const system = (identity as PourgateIdentity | undefined)?.unitSystem ?? 'metric';
  if (r.quantity === 'milestone') return <Typography variant="body2">time mark</Typography>;
  return (
    <Box sx={{ whiteSpace: 'nowrap', maxWidth: 180, overflow: 'hidden', textOverflow: 'ellipsis', fontVariantNumeric: 'tabular-nums' }}>
      {formatSi(r.valueSi, r.unitSi, system)}
      {!r.stable && r.quantity === 'mass' ? (
        <Typography variant="caption" color="text.secondary" component="span">
          {' '}
          · settling
        </Typography>
      ) : null}
    </Box>
  );
}

/**
 * Every reading the API holds for this organization, with its verdict: what an integrator checks
 * after wiring a scale or a logger, and what anyone with readings:read can search.
 */
function ReadingListView() {
  return (
    <>
      <PageHeader title="Readings" lead="Everything the scales and loggers sent, newest first, with the verdict on each. Filter by device to check a new connection." />
      <List resource="readings" title="Readings" filters={filters} sort={{ field: 'receivedAt', order: 'DESC' }} perPage={50} storeKey="readings.log"
        actions={false}
        disableSyncWithLocation
        // a one-column grid: the list is never wider than the screen, however wide its table
        sx={{ display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', '& .RaList-main': { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', minWidth: 0 } }}
      >
        {/* the columns keep a readable width and the region scrolls sideways on a narrow screen */}
        <Box sx={{ overflowX: 'auto', maxWidth: '100%', '& table': { minWidth: 820 } }} tabIndex={0} role="region" aria-label="Readings table, scrolls sideways">
          <DataTable bulkActionButtons={false} rowClick={false}>
            <DataTable.Col source="receivedAt" label="Received" render={(r: Reading) => <span style={{ whiteSpace: 'nowrap' }}>{formatDateTime(r.receivedAt)}</span>} />
            <DataTable.Col label="Reading" disableSort render={(r: Reading) => readingTitle(r)} />
            <DataTable.Col label="Value" disableSort render={(r: Reading) => <ValueCell r={r} />} />
            <DataTable.Col source="status" label="Verdict" render={(r: Reading) => <StatusChip label={READING_STATUS[r.status].label} tone={READING_STATUS[r.status].tone} />} />
            <DataTable.Col
              label="Reasons"
              disableSort
              render={(r: Reading) =>
                r.status === 'rejected' ? (
                  <Typography variant="body2" sx={{ maxWidth: 360 }}>
                    {reasonsLine(r.reasons)}
                    {r.review ? ` · ${r.review.decision === 'waive' ? 'waived' : 'upheld'}` : ''}
                  </Typography>
                ) : (
                  <Typography variant="body2" color="text.secondary">
                    —
                  </Typography>
                )
              }
            />
            <DataTable.Col label="Device" disableSort>
              <ReferenceField source="deviceId" reference="devices" link={false}>
                <TextField source="name" />
              </ReferenceField>
            </DataTable.Col>
            <DataTable.Col
              label="Batch"
              disableSort
              render={(r: Reading) => (
                <Link to={`/batches/${r.batchId}/show`} style={{ fontFamily: 'inherit' }}>
                  {shortRef(r.batchId)}
                </Link>
              )}
            />
          </DataTable>
        </Box>
      </List>
    </>
  );
}

export default function ReadingListPage() {
  return (
    <Guarded resource="readings" action="list">
      <ReadingListView />
    </Guarded>
  );
}
