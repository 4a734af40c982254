import { Box, Card, CardContent, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { useMemo } from 'react';
import { Title, useDataProvider, useGetList, useRefresh } from 'react-admin';
import { CanAccessPage } from '../calculator/CanAccessPage';
import { PageHeader } from '../common/PageHeader';
import { RelativeTime } from '../common/RelativeTime';
import { StatusChip } from '../common/StatusChip';
import { storageTokenStore } from '../dataProvider/session';
import { useHolds } from '../review/hooks';
import { monoFont } from '../theme';
import { ImportPanel, IMPORT_STATUS } from './ImportPanel';
import { uploadCsv, type ImportJob } from './upload';

/** The columns of a logger CSV (api/src/imports/imports.constants.ts). */
const COLUMNS: [string, string][] = [
  ['client_reading_id', 'the logger’s own id of the reading (required)'],
  ['batch_id', 'the batch it belongs to (required)'],
  ['quantity', 'mass, temperature, humidity or milestone (required)'],
  ['subject', 'part_a, part_b, pigment, mixed, mold, ambient… (required)'],
  ['device_id', 'the device; empty when a device key uploads'],
  ['device_time', 'when it was measured, ISO 8601'],
  ['value', 'the number'],
  ['unit', 'g, kg, lb, degC, degF, %…'],
  ['stable', 'true or false (scales)'],
];

export default function ImportsRoute() {
  return (
    <CanAccessPage action="imports:write">
      <Imports />
    </CanAccessPage>
  );
}

function RecentImports() {
  const canList = useHolds('readings:read');
  const { data = [] } = useGetList<ImportJob & { id: string }>('imports', { pagination: { page: 1, perPage: 8 }, sort: { field: 'createdAt', order: 'DESC' } }, { enabled: canList });
  if (!data.length) return null;
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" sx={{ fontSize: '1.02rem', mb: 1 }}>
          Recent imports
        </Typography>
        <Table size="small" aria-label="Recent imports" data-testid="recent-imports">
          <TableHead>
            <TableRow>
              <TableCell>File</TableCell>
              <TableCell>State</TableCell>
              <TableCell align="right">Imported</TableCell>
              <TableCell align="right">Bad rows</TableCell>
              <TableCell>Sent</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {data.map((j) => {
              const st = IMPORT_STATUS[j.status] ?? { label: j.status, tone: 'quiet' as const };
              return (
                <TableRow key={j.id}>
                  <TableCell sx={{ wordBreak: 'break-all' }}>
                    <Typography variant="body2">{j.fileName ?? '—'}</Typography>
                    {j.uploadedBy ? (
                      <Typography variant="caption" color="text.secondary">
                        by {j.uploadedBy}
                      </Typography>
                    ) : null}
                  </TableCell>
                  <TableCell>
                    <StatusChip tone={st.tone} label={st.label} />
                  </TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                    {j.accepted} / {j.total}
                  </TableCell>
                  <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                    {j.rejectedRows}
                  </TableCell>
                  <TableCell>
                    <RelativeTime value={j.createdAt} />
                  </TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </CardContent>
    </Card>
  );
}

function Imports() {
  const dataProvider = useDataProvider();
  const refresh = useRefresh();
  const deps = useMemo(
    () => ({
      store: storageTokenStore(window.sessionStorage),
      // any request through the data provider renews the session with the console's own client
      renew: () => dataProvider.getList('imports', { pagination: { page: 1, perPage: 1 }, sort: { field: 'createdAt', order: 'DESC' }, filter: {} }),
    }),
    [dataProvider],
  );
  return (
    <Box sx={{ maxWidth: 1180 }}>
      <Title title="Logger imports" />
      <PageHeader
        title="Logger imports"
        lead="Readings a logger or scale kept offline, sent as one CSV file. Each row becomes a reading and is judged like any other; rows that cannot be read are listed with their line and column."
      />
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'minmax(0, 1.6fr) minmax(280px, 1fr)' }, gap: 2, alignItems: 'start' }}>
        <Box sx={{ display: 'grid', gap: 2 }}>
          <ImportPanel
            upload={(file) => uploadCsv(file, deps)}
            fetchJob={async (id) => (await dataProvider.getOne<ImportJob & { id: string }>('imports', { id })).data}
            onFinished={refresh}
          />
          <RecentImports />
        </Box>
        <Card>
          <CardContent>
            <Typography variant="h2" sx={{ fontSize: '1.02rem', mb: 1 }}>
              What the file holds
            </Typography>
            <Typography variant="body2" color="text.secondary" sx={{ mb: 1.25 }}>
              A header row naming the columns, in any order, then one reading per row, as <Box component="code" sx={{ fontFamily: monoFont, fontSize: '0.8rem' }}>POST /v1/readings</Box> takes them.
            </Typography>
            <Box component="dl" sx={{ m: 0, display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: 1.5, rowGap: 0.5 }}>
              {COLUMNS.map(([name, what]) => (
                <Box key={name} sx={{ display: 'contents' }}>
                  <Box component="dt" sx={{ fontFamily: monoFont, fontSize: '0.76rem', pt: '2px' }}>
                    {name}
                  </Box>
                  <Typography component="dd" variant="body2" color="text.secondary" sx={{ m: 0 }}>
                    {what}
                  </Typography>
                </Box>
              ))}
            </Box>
            <Typography variant="body2" color="text.secondary" sx={{ mt: 1.25 }}>
              A reading already received from the same device with the same id is counted once.
            </Typography>
          </CardContent>
        </Card>
      </Box>
    </Box>
  );
}
