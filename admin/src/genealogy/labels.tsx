import { Box, Link as MuiLink, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { monoFont } from '../theme';
import { StatusChip, type Tone } from '../common/StatusChip';
import { formatNumber } from '../format/quantities';
import type { BatchDisposition } from '../views/sdk';

type Decision = BatchDisposition['decision'];
type Counts = BatchDisposition['parts'];

export const DISPOSITION: Readonly<Record<Decision, { label: string; tone: Tone }>> = {
  accepted: { label: 'Accepted', tone: 'good' },
  rework: { label: 'Rework', tone: 'caution' },
  scrap: { label: 'Scrap', tone: 'bad' },
};

export function partName(part: string): string {
  return part === 'pigment' ? 'Pigment' : `Part ${part}`;
}

export function DispositionChip({ decision }: { decision: Decision | null | undefined }) {
  if (!decision) return <StatusChip tone="quiet" label="Not decided" />;
  const d = DISPOSITION[decision];
  return <StatusChip tone={d.tone} label={d.label} />;
}

/** Good, rework, scrap and undecided parts as the API counted them. */
export function PartCounts({ parts }: { parts: Counts }) {
  const cells: [string, number][] = [
    ['Accepted', parts.accepted],
    ['Rework', parts.rework],
    ['Scrap', parts.scrap],
    ['Not decided', parts.undecided],
  ];
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(4, minmax(0, 1fr))', gap: 2, maxWidth: 560 }}>
      {cells.map(([label, n]) => (
        <Box key={label}>
          <Typography variant="caption" color="text.secondary" component="div">
            {label}
          </Typography>
          <Typography sx={{ fontWeight: 600, fontSize: '1.15rem', fontVariantNumeric: 'tabular-nums' }}>{formatNumber(n, { decimals: 0 })}</Typography>
        </Box>
      ))}
    </Box>
  );
}

/** A console link in the theme's link style (react-router's own is unstyled). */
export function ConsoleLink({ to, children, mono = false }: { to: string; children: ReactNode; mono?: boolean }) {
  return (
    <MuiLink component={Link} to={to} sx={{ whiteSpace: 'nowrap', ...(mono ? { fontFamily: monoFont } : {}) }}>
      {children}
    </MuiLink>
  );
}
