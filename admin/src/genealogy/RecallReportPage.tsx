import ArrowBackOutlined from '@mui/icons-material/ArrowBackOutlined';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import { Alert, Box, Button, GlobalStyles, Skeleton, Typography } from '@mui/material';
import { Title } from 'react-admin';
import { Link, useParams } from 'react-router-dom';
import { Guarded } from '../common/Guarded';
import { formatDate, formatDateTime } from '../format/dates';
import { formatNumber } from '../format/quantities';
import { productionApi, saveBlob } from '../planning/productionApi';
import { problemText, useApi } from '../planning/useApi';
import type { RecallReport } from '../views/sdk';
import { DISPOSITION, partName } from './labels';

/**
 * Print: only the report, black on white, without the console's frame. No page size is set, so the
 * printer's paper (A4 or Letter) applies; the margins fit both.
 */
const printStyles = (
  <GlobalStyles
    styles={{
      '@media print': {
        '@page': { margin: '12mm' },
        'html, body, #root': { background: '#fff !important' },
        'header.MuiAppBar-root, .RaSidebar-root, .MuiDrawer-root, .no-print, .RaNotification-root': { display: 'none !important' },
        '.RaLayout-appFrame': { marginTop: '0 !important' },
        '.RaLayout-content': { padding: '0 !important', background: '#fff !important' },
        '.recall-report': { boxShadow: 'none !important', border: 'none !important', maxWidth: 'none !important', padding: '0 !important', margin: '0 !important' },
        '.recall-report *': { color: '#000 !important', printColorAdjust: 'exact', WebkitPrintColorAdjust: 'exact' },
        '.recall-report tr': { breakInside: 'avoid' },
        '.recall-report thead': { display: 'table-header-group' },
      },
    }}
  />
);

export default function RecallReportRoute() {
  return (
    <Guarded resource="lots" action="show">
      <RecallReportPage />
    </Guarded>
  );
}

const th = {
  textAlign: 'left',
  borderBottom: '1.5px solid #333',
  padding: '4px 6px',
  fontSize: '0.72rem',
  textTransform: 'uppercase',
  letterSpacing: '0.04em',
  color: '#444',
  whiteSpace: 'nowrap',
} as const;
const td = { borderBottom: '1px solid #d6d6d2', padding: '4px 6px', fontSize: '0.82rem', verticalAlign: 'top' } as const;
const num = { ...td, textAlign: 'right', fontVariantNumeric: 'tabular-nums' } as const;

function RecallReportPage() {
  const { id = '' } = useParams();
  const report = useApi(`recall:${id}`, () => productionApi.recallReport(id));
  if (report.error) return <Alert severity="error">{problemText(report.error)}</Alert>;
  const r: RecallReport | undefined = report.data;
  if (!r) return <Skeleton variant="rounded" height={300} sx={{ maxWidth: 980 }} />;

  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)' }}>
      <Title title={`Recall report ${r.lotNumber}`} />
      {printStyles}
      <Box className="no-print" sx={{ display: 'flex', gap: 1, alignItems: 'center', mt: 0.5, mb: 1.5, maxWidth: 980, flexWrap: 'wrap' }}>
        <Button component={Link} to={`/lots/${encodeURIComponent(r.lotId)}/trace`} size="small" startIcon={<ArrowBackOutlined />}>
          Lot {r.lotNumber}
        </Button>
        <Box sx={{ flex: 1 }} />
        <Typography variant="caption" color="text.secondary">
          Prints on A4 or Letter.
        </Typography>
        <Button
          size="small"
          variant="outlined"
          startIcon={<DownloadOutlined />}
          onClick={async () => saveBlob(await productionApi.recallCsv(r.lotId), `recall-${r.lotNumber}.csv`)}
          data-testid="recall-csv"
        >
          CSV
        </Button>
        <Button size="small" variant="contained" startIcon={<PrintOutlined />} onClick={() => window.print()} data-testid="print-recall">
          Print
        </Button>
      </Box>
      <Box className="recall-report" data-testid="recall-report" sx={{ maxWidth: 980, bgcolor: '#fff', border: '1px solid #dcdad2', borderRadius: 1, p: { xs: 2, sm: 3 } }}>
        <Box sx={{ display: 'flex', justifyContent: 'space-between', gap: 2, flexWrap: 'wrap', borderBottom: '2px solid #222', pb: 1, mb: 1.5 }}>
          <Box>
            <Typography variant="overline" sx={{ color: '#555', lineHeight: 1.4 }}>
              Recall report
            </Typography>
            <Typography variant="h1" sx={{ fontSize: '1.45rem' }}>
              {partName(r.part)} lot <span style={{ fontFamily: 'inherit', letterSpacing: '0.02em' }}>{r.lotNumber}</span>
            </Typography>
          </Box>
          <Box sx={{ textAlign: 'right' }}>
            <Typography variant="body2">Generated {formatDateTime(r.generatedAt)}</Typography>
            <Typography variant="body2" data-testid="recall-status">
              {r.recall ? `Recalled ${formatDateTime(r.recall.at)}${r.recall.by ? ` by ${r.recall.by}` : ''}` : 'Not recalled: for information'}
            </Typography>
          </Box>
        </Box>
        {r.recall?.reason ? (
          <Typography variant="body2" sx={{ mb: 1.5 }}>
            <strong>Reason:</strong> {r.recall.reason}
          </Typography>
        ) : null}
        <Box sx={{ display: 'flex', gap: 4, mb: 1.5, flexWrap: 'wrap' }} data-testid="recall-totals">
          <Typography variant="body2">
            <strong>{formatNumber(r.totals.batches, { decimals: 0 })}</strong> batches
          </Typography>
          <Typography variant="body2">
            <strong>{formatNumber(r.totals.workOrders, { decimals: 0 })}</strong> work orders
          </Typography>
          <Typography variant="body2">
            <strong>{formatNumber(r.totals.parts, { decimals: 0 })}</strong> parts
          </Typography>
        </Box>
        <Box sx={{ overflowX: 'auto' }}>
          <Box component="table" sx={{ width: '100%', borderCollapse: 'collapse' }} aria-label="Batches made with this lot">
            <thead>
              <tr>
                <Box component="th" sx={th}>
                  Batch
                </Box>
                <Box component="th" sx={th}>
                  Planned
                </Box>
                <Box component="th" sx={th}>
                  Work order
                </Box>
                <Box component="th" sx={th}>
                  Part no.
                </Box>
                <Box component="th" sx={th}>
                  Mold
                </Box>
                <Box component="th" sx={th}>
                  Station
                </Box>
                <Box component="th" sx={th}>
                  State
                </Box>
                <Box component="th" sx={{ ...th, textAlign: 'right' }}>
                  Parts
                </Box>
                <Box component="th" sx={th}>
                  Disposition
                </Box>
                <Box component="th" sx={{ ...th, textAlign: 'right' }}>
                  Good / rework / scrap / open
                </Box>
              </tr>
            </thead>
            <tbody>
              {r.rows.map((row) => (
                <tr key={row.batchId}>
                  <Box component="td" sx={{ ...td, fontFamily: 'monospace', whiteSpace: 'nowrap' }}>
                    {row.batchId.slice(0, 8)}
                  </Box>
                  <Box component="td" sx={{ ...td, whiteSpace: 'nowrap' }}>
                    {formatDate(`${row.plannedFor}T12:00:00`)}
                  </Box>
                  <Box component="td" sx={{ ...td, whiteSpace: 'nowrap' }}>
                    {row.workOrderExternalRef ?? 'ad hoc'}
                  </Box>
                  <Box component="td" sx={td}>
                    {row.partNumber ?? '—'}
                  </Box>
                  <Box component="td" sx={td}>
                    {row.moldName ?? '—'}
                  </Box>
                  <Box component="td" sx={td}>
                    {row.stationCode ?? '—'}
                  </Box>
                  <Box component="td" sx={td}>
                    {row.state.replace('_', ' ')}
                  </Box>
                  <Box component="td" sx={num}>
                    {formatNumber(row.partCount, { decimals: 0 })}
                  </Box>
                  <Box component="td" sx={td}>
                    {row.disposition ? DISPOSITION[row.disposition].label : 'not decided'}
                  </Box>
                  <Box component="td" sx={{ ...num, whiteSpace: 'nowrap' }}>
                    {row.parts.accepted} / {row.parts.rework} / {row.parts.scrap} / {row.parts.undecided}
                  </Box>
                </tr>
              ))}
              {r.rows.length === 0 ? (
                <tr>
                  <Box component="td" colSpan={10} sx={{ ...td, color: '#555' }}>
                    This lot went into no batch.
                  </Box>
                </tr>
              ) : null}
            </tbody>
          </Box>
        </Box>
        <Typography variant="caption" component="p" sx={{ mt: 2, color: '#555' }}>
          Every batch recorded with this lot, as Pourgate holds it at the time above; counts are Pourgate&apos;s. Printed {formatDateTime(Date.now())}.
        </Typography>
      </Box>
    </Box>
  );
}
