import ArrowBack from '@mui/icons-material/ArrowBack';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import { Alert, Box, Button, GlobalStyles, Skeleton, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { Link, useParams } from 'react-router-dom';
import { Title, useGetIdentity, useGetOne } from 'react-admin';
import type { PourgateIdentity } from '../authProvider';
import { Guarded } from '../common/Guarded';
import { LogoMark } from '../layout/LogoMark';
import { formatDate, formatDateTime } from '../format/dates';
import { formatDisplay, formatNumber, formatQuantity } from '../format/quantities';
import { monoFont } from '../theme';
import { useBatchTargets } from './BatchShow';
import { CautionList, massDecimals, ratioText, SdsLine } from './TargetFigures';
import type { ComponentTarget } from '../views/sdk';
import { batchTitle, shortRef, type Batch } from './labels';

/**
 * Print: only the sheet, on white, without the console's frame, on one page of A4 (210 × 297 mm) or
 * US Letter (216 × 279 mm): no fixed paper size, margins and type sized for the smaller of the two.
 */
const printStyles = (
  <GlobalStyles
    styles={{
      '@media print': {
        '@page': { size: 'auto', margin: '10mm' },
        'html, body, #root': { background: '#fff !important' },
        'header.MuiAppBar-root, .RaSidebar-root, .MuiDrawer-root, .no-print, .RaNotification-root, .MuiSnackbar-root, [data-testid="data-progress"]': { display: 'none !important' },
        // the frame's full-height boxes would push an empty second page
        '.RaLayout-root, .RaLayout-appFrame, .RaLayout-contentWithSidebar, .RaLayout-content, #root': { minHeight: '0 !important', height: 'auto !important', margin: '0 !important', padding: '0 !important' },
        '.RaLayout-appFrame': { marginTop: '0 !important' },
        '.pour-sheet': { boxShadow: 'none !important', border: 'none !important', maxWidth: 'none !important', padding: '0 !important', fontSize: '10pt' },
        '.pour-sheet *': { printColorAdjust: 'exact', WebkitPrintColorAdjust: 'exact' },
        '.pour-sheet .MuiTypography-body2, .pour-sheet .MuiTableCell-root': { fontSize: '9.5pt', lineHeight: 1.3 },
        '.pour-sheet .MuiTypography-caption': { fontSize: '8pt', lineHeight: 1.3 },
        '.pour-sheet .MuiTableCell-root': { paddingTop: '3px', paddingBottom: '3px' },
        '.pour-sheet h1': { fontSize: '16pt !important' },
        '.pour-sheet .sheet-gap': { marginBottom: '8px !important' },
        '.pour-sheet .signature-line': { height: '28px !important' },
        '.pour-sheet table, .pour-sheet .keep, .pour-sheet .sheet-footer': { breakInside: 'avoid' },
      },
    }}
  />
);

const blank = { borderBottom: '1px solid #7a7f80', minWidth: 90, display: 'inline-block', height: '1.3em' } as const;

function Field({ label, value, wide }: { label: string; value?: React.ReactNode; wide?: boolean }) {
  return (
    <Box sx={{ gridColumn: wide ? 'span 2' : undefined }}>
      <Typography variant="caption" sx={{ color: '#555', textTransform: 'uppercase', letterSpacing: '0.06em', fontSize: '0.66rem', display: 'block' }}>
        {label}
      </Typography>
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {value ?? '—'}
      </Typography>
    </Box>
  );
}

function Signature({ label }: { label: string }) {
  return (
    <Box sx={{ display: 'grid', gap: 0.5 }}>
      <Box className="signature-line" sx={{ borderBottom: '1px solid #222', height: 40 }} />
      <Typography variant="caption" sx={{ color: '#444' }}>
        {label} — name, signature, date and time
      </Typography>
    </Box>
  );
}

export default function PourSheetPage() {
  return (
    <Guarded resource="batches" action="show">
      <PourSheet />
    </Guarded>
  );
}

function PourSheet() {
  const { id } = useParams<{ id: string }>();
  const { data: batch, error } = useGetOne<Batch>('batches', { id: id ?? '' }, { enabled: !!id });
  const { data: t } = useBatchTargets(id);
  const { identity } = useGetIdentity();
  const org = (identity as PourgateIdentity | undefined)?.organization?.name;

  if (error) return <Alert severity="error">{(error as Error).message}</Alert>;
  if (!batch || !t) return <Skeleton variant="rounded" height={480} sx={{ mt: 2, maxWidth: 900 }} />;

  const md = massDecimals(t);
  // the judge weighs pigment against its target with the system's mass tolerance (the ratio tolerance unless set)
  const tol = t.ratioTolerancePercent / 100;
  const lot = (part: string) => batch.lots.find((l) => l.part === part)?.lotNumber ?? '';
  const components: { key: string; label: string; c: ComponentTarget }[] = [
    { key: 'A', label: 'Part A', c: t.components.A },
    { key: 'B', label: 'Part B', c: t.components.B },
    ...(t.components.pigment.mass.value > 0 ? [{ key: 'pigment', label: 'Pigment', c: t.components.pigment }] : []),
  ];
  const anyVolume = components.some((x) => x.c.volume);

  return (
    <Box>
      {printStyles}
      <Title title={`Pour sheet · ${batchTitle(batch)}`} />
      <Box className="no-print" sx={{ display: 'flex', gap: 1, alignItems: 'center', mt: 0.5, mb: 1.5, maxWidth: 900 }}>
        <Button component={Link} to={`/batches/${batch.id}/show`} size="small" startIcon={<ArrowBack />}>
          Back to the batch
        </Button>
        <Box sx={{ flex: 1 }} />
        <Typography variant="caption" color="text.secondary">
          Prints on one A4 or Letter page.
        </Typography>
        <Button variant="contained" startIcon={<PrintOutlined />} onClick={() => window.print()} data-testid="print-sheet">
          Print
        </Button>
      </Box>

      <Box
        className="pour-sheet"
        component="article"
        aria-label="Pour sheet"
        data-testid="pour-sheet"
        sx={{ maxWidth: 900, bgcolor: '#fff', border: '1px solid', borderColor: 'divider', borderRadius: 1, p: { xs: 2, sm: 4 }, color: '#111' }}
      >
        <Box sx={{ display: 'flex', alignItems: 'flex-start', gap: 2, borderBottom: '2px solid #111', pb: 1.5, mb: 2 }}>
          <Box sx={{ flex: 1 }}>
            <Typography variant="overline" sx={{ color: '#444', lineHeight: 1.2 }}>
              Pour sheet{org ? ` · ${org}` : ''}
            </Typography>
            <Typography variant="h1" sx={{ fontSize: '1.55rem', fontWeight: 600 }}>
              {batchTitle(batch)}
            </Typography>
          </Box>
          <Box sx={{ textAlign: 'right' }}>
            <Typography sx={{ fontFamily: monoFont, fontSize: '1.15rem', fontWeight: 700, letterSpacing: '0.04em' }} data-testid="sheet-ref">
              {shortRef(batch.id)}
            </Typography>
            <Typography variant="caption" sx={{ color: '#444' }}>
              planned for {formatDate(`${batch.plannedFor}T12:00:00`)}
            </Typography>
          </Box>
          <Box sx={{ width: 36, height: 36, flex: 'none' }} aria-hidden>
            <LogoMark size={36} framed />
          </Box>
        </Box>

        <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(4, minmax(0, 1fr))', gap: 1.5, mb: 2.5 }} className="keep sheet-gap">
          <Field label="Material system" value={`${batch.materialSystemName} (rev. ${batch.materialSystemRevision})`} wide />
          <Field label={batch.subject === 'free_rise_cup' ? 'Free-rise cup' : 'Mold'} value={batch.subject === 'free_rise_cup' ? formatDisplay(t.cavityVolume) : `${batch.moldName ?? '—'}${t.cavities && t.cavities > 1 ? ` · ${t.cavities} cavities` : ''}`} wide />
          <Field label="Work order" value={batch.workOrderExternalRef ?? 'ad hoc'} />
          <Field label="Station" value={batch.stationCode ?? '—'} />
          <Field label={`Mix ratio by ${t.ratioBasis}`} value={`${ratioText(t.ratioBasis === 'volume' ? t.volumeRatio : t.weightRatio)} (±${formatNumber(t.ratioTolerancePercent, { decimals: 1, trim: true })} %)`} />
          <Field label="Target density" value={`${formatDisplay(t.targetDensity)} · pack ${formatNumber(t.packFactor.value, { decimals: 2 })}`} />
        </Box>

        <Typography variant="h2" sx={{ fontSize: '0.95rem', fontWeight: 600, mb: 0.75 }}>
          Weigh
        </Typography>
        <Table size="small" sx={{ mb: 1, '& td, & th': { borderColor: '#bbb' } }} aria-label="What to weigh">
          <TableHead>
            <TableRow>
              <TableCell>Component</TableCell>
              <TableCell>Lot</TableCell>
              <TableCell align="right">Target</TableCell>
              <TableCell align="right">Accept between</TableCell>
              {anyVolume ? <TableCell align="right">Volume</TableCell> : null}
              <TableCell sx={{ width: 120 }}>Weighed</TableCell>
              <TableCell sx={{ width: 70 }}>Initials</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {components.map(({ key, label, c }) => (
              <TableRow key={key} data-testid={`sheet-${key}`}>
                <TableCell sx={{ fontWeight: 600 }}>
                  {label}
                  {c.side ? (
                    <Box component="span" sx={{ display: 'block', fontWeight: 400, fontSize: '0.72rem', color: '#555' }}>
                      {c.side} side
                    </Box>
                  ) : null}
                </TableCell>
                <TableCell sx={{ fontFamily: monoFont, fontSize: '0.8rem' }}>{lot(key) || <Box component="span" sx={blank} />}</TableCell>
                <TableCell align="right" sx={{ fontWeight: 700, fontSize: '1.05rem', fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
                  {formatDisplay(c.mass, md === undefined ? {} : { decimals: md })}
                </TableCell>
                <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
                  {c.toleranceBand
                    ? `${formatDisplay(c.toleranceBand.low, md === undefined ? {} : { decimals: md })} – ${formatDisplay(c.toleranceBand.high, md === undefined ? {} : { decimals: md })}`
                    : key === 'pigment'
                      ? `${formatQuantity(c.mass.value * (1 - tol), c.mass.unit, md === undefined ? {} : { decimals: md })} – ${formatQuantity(c.mass.value * (1 + tol), c.mass.unit, md === undefined ? {} : { decimals: md })}`
                      : '—'}
                </TableCell>
                {anyVolume ? <TableCell align="right">{c.volume ? formatDisplay(c.volume) : '—'}</TableCell> : null}
                <TableCell />
                <TableCell />
              </TableRow>
            ))}
            <TableRow>
              <TableCell sx={{ fontWeight: 600 }}>Mixed shot</TableCell>
              <TableCell />
              <TableCell align="right" sx={{ fontWeight: 700, fontSize: '1.05rem', fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }} data-testid="sheet-total">
                {formatDisplay(t.totalMass, md === undefined ? {} : { decimals: md })}
              </TableCell>
              <TableCell align="right" sx={{ color: '#555', fontSize: '0.75rem' }}>
                foam in the cavity {formatDisplay(t.foamMass, md === undefined ? {} : { decimals: md })}
              </TableCell>
              {anyVolume ? <TableCell /> : null}
              <TableCell />
              <TableCell />
            </TableRow>
          </TableBody>
        </Table>
        <Typography variant="caption" className="sheet-gap" sx={{ color: '#555', display: 'block', mb: 2.5 }}>
          Masses are net, rounded to the scale’s readability{t.scaleReadability ? ` (${formatDisplay(t.scaleReadability, { decimals: (md ?? 2) + 1 })})` : ''}. The A and B bands are the ±
          {formatNumber(t.ratioTolerancePercent, { decimals: 1, trim: true })} % ratio tolerance with the other part on target.
        </Typography>

        <Box className="keep sheet-gap" sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, minmax(0, 1fr))', gap: 2, mb: 2.5 }}>
          <Box sx={{ border: '1px solid #bbb', borderRadius: 1, p: 1.25 }}>
            <Typography variant="caption" sx={{ color: '#555', display: 'block' }}>
              Components between
            </Typography>
            <Typography variant="body2" sx={{ fontWeight: 600 }}>
              {t.componentTemperatureWindow ? `${formatDisplay(t.componentTemperatureWindow.min)} and ${formatDisplay(t.componentTemperatureWindow.max)}` : 'see the TDS'}
            </Typography>
            <Typography variant="caption" sx={{ color: '#555', display: 'block', mt: 1 }}>
              Measured: A <Box component="span" sx={{ ...blank, minWidth: 48 }} /> B <Box component="span" sx={{ ...blank, minWidth: 48 }} />
            </Typography>
          </Box>
          <Box sx={{ border: '1px solid #bbb', borderRadius: 1, p: 1.25 }}>
            <Typography variant="caption" sx={{ color: '#555', display: 'block' }}>
              Pot life from when A meets B
            </Typography>
            <Typography variant="body2" sx={{ fontWeight: 600 }}>
              {formatDisplay(t.timing?.potLife)}
            </Typography>
            <Typography variant="caption" sx={{ color: '#555', display: 'block', mt: 1 }}>
              Mix start <Box component="span" sx={{ ...blank, minWidth: 48 }} /> Poured <Box component="span" sx={{ ...blank, minWidth: 48 }} />
            </Typography>
          </Box>
          <Box sx={{ border: '1px solid #bbb', borderRadius: 1, p: 1.25 }}>
            <Typography variant="caption" sx={{ color: '#555', display: 'block' }}>
              Demold no earlier than
            </Typography>
            <Typography variant="body2" sx={{ fontWeight: 600 }}>
              {formatDisplay(t.timing?.demoldTime)} after pouring
            </Typography>
            <Typography variant="caption" sx={{ color: '#555', display: 'block', mt: 1 }}>
              Demolded at <Box component="span" sx={{ ...blank, minWidth: 70 }} />
            </Typography>
          </Box>
        </Box>

        {t.warnings.length ? (
          <Box className="keep sheet-gap" sx={{ border: '2px solid #b3261e', borderRadius: 1, p: 1.25, mb: 2 }} data-testid="sheet-warnings">
            <Typography variant="body2" sx={{ fontWeight: 700, color: '#8c1d17' }}>
              Check with the engineer before pouring
            </Typography>
            <Box component="ul" sx={{ m: 0, pl: 2.25 }}>
              {t.warnings.map((w) => (
                <Typography key={w.code} component="li" variant="body2">
                  {w.message}
                </Typography>
              ))}
            </Box>
          </Box>
        ) : null}

        <Box className="keep sheet-gap" sx={{ mb: 3 }}>
          <CautionList cautions={t.cautions} compact />
          <Box sx={{ mt: 0.75 }}>
            <SdsLine t={t} />
          </Box>
          <Typography variant="caption" sx={{ display: 'block', mt: 0.25, color: '#444' }}>
            This sheet supports the SDS, local codes and licensed practice; it does not replace them.
          </Typography>
        </Box>

        <Box className="keep" sx={{ display: 'grid', gridTemplateColumns: 'repeat(3, minmax(0, 1fr))', gap: 3, mb: 2 }} data-testid="signatures">
          <Signature label="Weighed by" />
          <Signature label="Poured by" />
          <Signature label="Checked by (engineer)" />
        </Box>
        <Box className="sheet-footer" data-testid="sheet-footer" sx={{ mt: 2, pt: 1, borderTop: '1px solid #ccc', display: 'flex', justifyContent: 'space-between', gap: 2, color: '#666', fontSize: '0.7rem' }}>
          <span>
            Batch {batch.id} · targets version {t.computationVersion}
          </span>
          <span>Printed {formatDateTime(Date.now())}</span>
        </Box>
      </Box>
    </Box>
  );
}
