import WarningAmberRounded from '@mui/icons-material/WarningAmberRounded';
import { Alert, Box, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { monoFont } from '../theme';
import { decimalsForStep, formatDisplay, formatNumber, formatQuantity, type DisplayQuantity } from '../format/quantities';
import type { Caution, ComponentTarget, TargetsView, TargetWarning } from '../views/sdk';

/** Decimals for masses: one scale division when the scale is known. */
export function massDecimals(t: Pick<TargetsView, 'scaleReadability'>): number | undefined {
  return decimalsForStep(t.scaleReadability?.value);
}

export function ratioText(r: { a: number; b: number }): string {
  return `${formatNumber(r.a, { decimals: 1, trim: true })} : ${formatNumber(r.b, { decimals: 1, trim: true })}`;
}

export function Figure({ label, value, hint, testId, strong, raw }: { label: string; value: ReactNode; hint?: ReactNode; testId?: string; strong?: boolean; raw?: { value: number; unit: string } | null }) {
  return (
    <Box sx={{ minWidth: 0 }}>
      <Typography variant="caption" color="text.secondary" component="div" sx={{ lineHeight: 1.3 }}>
        {label}
      </Typography>
      <Typography
        variant="body1"
        data-testid={testId}
        data-value={raw?.value}
        data-unit={raw?.unit}
        sx={{ fontWeight: strong ? 600 : 500, fontSize: strong ? '1.3rem' : '1.02rem', fontVariantNumeric: 'tabular-nums', lineHeight: 1.35 }}
      >
        {value}
      </Typography>
      {hint ? (
        <Typography variant="caption" color="text.secondary" component="div">
          {hint}
        </Typography>
      ) : null}
    </Box>
  );
}

function q(x: DisplayQuantity | null | undefined, decimals?: number) {
  return formatDisplay(x, decimals === undefined ? {} : { decimals });
}

/** The headline figures of a result: what to dispense, for which density and volume. */
export function TargetSummary({ t }: { t: TargetsView }) {
  const md = massDecimals(t);
  const volume = t.cavityVolume ? `${q(t.cavityVolume)}${t.cavities && t.cavities > 1 ? ` × ${t.cavities}` : ''}` : '—';
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', sm: 'repeat(4, minmax(0, 1fr))' }, gap: 2 }}>
      <Figure label="Mixed shot to dispense" value={q(t.totalMass, md)} raw={t.totalMass} strong testId="fig-total-mass" hint={t.allowances ? `foam in the cavity ${q(t.foamMass, md)}` : undefined} />
      <Figure label="Target molded density" value={q(t.targetDensity)} raw={t.targetDensity} testId="fig-target-density" hint={`pack factor ${formatNumber(t.packFactor.value, { decimals: 2 })}`} />
      <Figure label={t.subject === 'free_rise_cup' ? 'Cup volume' : 'Cavity volume'} value={volume} testId="fig-cavity-volume" hint={t.totalVolume && t.cavities && t.cavities > 1 ? `${q(t.totalVolume)} in all` : undefined} />
      <Figure
        label={`Mix ratio by ${t.ratioBasis}`}
        value={ratioText(t.ratioBasis === 'volume' ? t.volumeRatio : t.weightRatio)}
        testId="fig-ratio"
        hint={t.ratioBasis === 'volume' ? `by weight ${ratioText(t.weightRatio)} · ±${formatNumber(t.ratioTolerancePercent, { decimals: 1, trim: true })} %` : `±${formatNumber(t.ratioTolerancePercent, { decimals: 1, trim: true })} % on A:B`}
      />
    </Box>
  );
}

/** Part A, part B and pigment: mass, the band each is judged in, the volume for volume dispensing. */
export function ComponentTable({ t, lots }: { t: TargetsView; lots?: { part: string; lotNumber: string }[] }) {
  const md = massDecimals(t);
  const lotOf = (part: string) => lots?.find((l) => l.part === part)?.lotNumber ?? '—';
  const rows: { key: string; label: string; c: ComponentTarget }[] = [
    { key: 'A', label: 'Part A', c: t.components.A },
    { key: 'B', label: 'Part B', c: t.components.B },
    { key: 'pigment', label: 'Pigment', c: t.components.pigment },
  ];
  const anyVolume = rows.some((r) => r.c.volume);
  return (
    <Table size="small" aria-label="Components">
      <TableHead>
        <TableRow>
          <TableCell>Component</TableCell>
          <TableCell align="right">Target mass</TableCell>
          <TableCell align="right">Accepted band</TableCell>
          {anyVolume ? <TableCell align="right">Volume</TableCell> : null}
          {lots ? <TableCell>Lot</TableCell> : null}
        </TableRow>
      </TableHead>
      <TableBody>
        {rows.map(({ key, label, c }) => (
          <TableRow key={key} data-testid={`component-${key}`}>
            <TableCell>
              <Typography variant="body2" sx={{ fontWeight: 600 }}>
                {label}
              </Typography>
              <Typography variant="caption" color="text.secondary">
                {c.side ? `${c.side} side` : c.percentOfAB !== undefined ? `${formatNumber(c.percentOfAB, { decimals: 2, trim: true })} % of A + B` : ''}
              </Typography>
            </TableCell>
            <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums', fontWeight: 600, fontSize: '0.95rem' }} data-testid={`mass-${key}`} data-value={c.mass.value} data-unit={c.mass.unit}>
              {key === 'pigment' && c.mass.value === 0 ? 'none' : q(c.mass, md)}
            </TableCell>
            <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }}>
              {c.toleranceBand
                ? `${q(c.toleranceBand.low, md)} – ${q(c.toleranceBand.high, md)}`
                : key === 'pigment' && c.mass.value > 0
                  ? // pigment is judged against its target with the mass tolerance (the ratio tolerance unless the system sets one)
                    `${formatQuantity(c.mass.value * (1 - t.ratioTolerancePercent / 100), c.mass.unit, { decimals: md })} – ${formatQuantity(c.mass.value * (1 + t.ratioTolerancePercent / 100), c.mass.unit, { decimals: md })}`
                  : '—'}
            </TableCell>
            {anyVolume ? (
              <TableCell align="right" sx={{ fontVariantNumeric: 'tabular-nums' }}>
                {c.volume ? q(c.volume) : '—'}
              </TableCell>
            ) : null}
            {lots ? <TableCell sx={{ fontFamily: monoFont, fontSize: '0.8rem' }}>{lotOf(key)}</TableCell> : null}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}

/** The rest of the figures: timing, temperatures, index, expected free-rise density. */
export function ProcessFigures({ t }: { t: TargetsView }) {
  const efr = t.expectedFreeRiseDensity;
  const index = t.isocyanateIndex;
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr 1fr', sm: 'repeat(3, minmax(0, 1fr))' }, gap: 2 }}>
      <Figure label="Pot life (from when A meets B)" value={q(t.timing?.potLife)} testId="fig-pot-life" />
      <Figure label="Demold after" value={q(t.timing?.demoldTime)} testId="fig-demold" hint={t.timing?.fullCureTime ? `full cure ${q(t.timing.fullCureTime)}` : undefined} />
      <Figure
        label="Component temperature"
        value={t.componentTemperatureWindow ? `${q(t.componentTemperatureWindow.min)} – ${q(t.componentTemperatureWindow.max)}` : '—'}
        testId="fig-temperature-window"
      />
      <Figure
        label="Expected free-rise density"
        value={efr ? q(efr.density) : '—'}
        testId="fig-free-rise"
        hint={efr ? `at ${q(efr.temperature)}${efr.method === 'cup_test_fit' && efr.fit ? `, fitted to ${efr.fit.count} cup tests` : ''}` : undefined}
      />
      <Figure
        label="Isocyanate index"
        value={index ? formatNumber(index.value, { decimals: 1 }) : '—'}
        testId="fig-index"
        hint={index?.atToleranceLimits ? `${formatNumber(index.atToleranceLimits.low, { decimals: 1 })} – ${formatNumber(index.atToleranceLimits.high, { decimals: 1 })} across the ratio band` : index ? undefined : 'needs %NCO and OH data'}
      />
      <Figure label="Scale readability" value={t.scaleReadability ? q(t.scaleReadability, (decimalsForStep(t.scaleReadability.value) ?? 2) + 1) : 'no scale given'} testId="fig-readability" />
    </Box>
  );
}

export function WarningList({ warnings }: { warnings: TargetWarning[] }) {
  if (!warnings.length) return null;
  return (
    <Box sx={{ display: 'grid', gap: 1 }} data-testid="target-warnings">
      {warnings.map((w) => (
        <Alert key={w.code} severity={w.severity === 'danger' ? 'error' : 'warning'} variant="outlined" sx={{ bgcolor: w.severity === 'danger' ? '#fdf1f0' : '#fffaf0' }}>
          <Box component="span" sx={{ display: 'block' }}>
            {w.message}
          </Box>
          <Box component="code" sx={{ fontFamily: monoFont, fontSize: '0.72rem', opacity: 0.8 }}>
            {w.code}
          </Box>
        </Alert>
      ))}
    </Box>
  );
}

/** Whether the SDS is on file in Pourgate: the sheet to read before handling the components. */
export function SdsLine({ t }: { t: Pick<TargetsView, 'documents'> }) {
  const sheets = t.documents?.safetyDataSheets ?? [];
  return (
    <Typography variant="caption" component="p" sx={{ color: sheets.length ? 'text.secondary' : '#8c1d17', fontWeight: sheets.length ? 400 : 500 }} data-testid="sds-line">
      {sheets.length
        ? `SDS on file: ${sheets.map((d) => d.title || d.fileName || 'safety data sheet').join(', ')}. Read it before handling the components.`
        : 'No SDS is on file in Pourgate for this system: get the supplier’s SDS and read it before handling the components.'}
    </Typography>
  );
}

/** The cautions the API returns with targets, in the caution style of the console. */
export function CautionList({ cautions, compact = false }: { cautions: Caution[]; compact?: boolean }) {
  return (
    <Box
      role="note"
      aria-label="Cautions"
      data-testid="cautions"
      className="pour-cautions"
      sx={{ display: 'flex', gap: 1.5, p: compact ? 1.25 : 2, border: '1px solid #e5cf9e', borderLeft: '4px solid #c98a16', borderRadius: 1, bgcolor: '#fcf6e8', color: '#4a3a12' }}
    >
      <WarningAmberRounded sx={{ color: '#9a6200', mt: '1px' }} aria-hidden />
      <Box>
        <Typography variant="subtitle2" component="p" sx={{ fontWeight: 600, mb: 0.5 }}>
          Before you pour
        </Typography>
        <Box component="ul" sx={{ m: 0, pl: 2.25, display: 'grid', gap: 0.4 }}>
          {cautions.map((c) => (
            <Typography key={c.code} component="li" variant="body2">
              {c.text}
            </Typography>
          ))}
        </Box>
      </Box>
    </Box>
  );
}
