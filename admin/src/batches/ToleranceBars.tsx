import { Box, Typography } from '@mui/material';
import { palette } from '../theme';
import { formatNumber, formatQuantity } from '../format/quantities';
import { barDomain, positionOn } from './weighed';

export interface BarRow {
  label: string;
  /** What the part is ("polyol side", "isocyanate side", "3 % of A + B"). */
  note?: string;
  unit: string;
  target: number;
  low?: number;
  high?: number;
  measured?: number;
  decimals?: number;
  /** The colour of the part in the logo mark (A amber, B teal). */
  swatch: string;
}

const H = 34;
const Y = 13;

/** One part: the band in a soft fill, the target as a tick, what was weighed as a marker. */
function Bar({ row }: { row: BarRow }) {
  const low = row.low ?? row.target;
  const high = row.high ?? row.target;
  const { min, max } = barDomain(low, high, row.target, row.measured);
  const pc = (v: number) => `${positionOn(v, min, max) * 100}%`;
  const inside = row.measured === undefined || (row.measured >= low - 1e-12 && row.measured <= high + 1e-12);
  const f = (v: number) => formatQuantity(v, row.unit, { decimals: row.decimals });
  const description =
    `${row.label}: target ${f(row.target)}` +
    (row.low !== undefined && row.high !== undefined ? `, band ${f(low)} to ${f(high)}` : '') +
    (row.measured !== undefined ? `, weighed ${f(row.measured)}${inside ? ', inside the band' : ', outside the band'}` : ', not weighed yet');
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: '120px minmax(0, 1fr) 150px', alignItems: 'center', gap: 1.5, py: 0.75 }} data-testid={`bar-${row.label}`}>
      <Box sx={{ display: 'flex', gap: 1, alignItems: 'center' }}>
        <Box sx={{ width: 10, height: 10, borderRadius: '2px', bgcolor: row.swatch, flex: 'none' }} aria-hidden />
        <Box>
          <Typography variant="body2" sx={{ fontWeight: 600, lineHeight: 1.2 }}>
            {row.label}
          </Typography>
          {row.note ? (
            <Typography variant="caption" color="text.secondary">
              {row.note}
            </Typography>
          ) : null}
        </Box>
      </Box>
      {/* positions in percent of the width: the bar stretches with the page and the text stays undistorted */}
      <svg width="100%" height={H} role="img" aria-label={description} style={{ overflow: 'visible', display: 'block' }}>
        <line x1="0%" x2="100%" y1={Y} y2={Y} stroke={palette.line} strokeWidth={2} />
        {row.low !== undefined && row.high !== undefined ? (
          <rect x={pc(low)} y={Y - 8} width={`${Math.max(0.4, (positionOn(high, min, max) - positionOn(low, min, max)) * 100)}%`} height={16} rx={3} fill="#dcebe5" stroke="#9cc7b5" />
        ) : null}
        <line x1={pc(row.target)} x2={pc(row.target)} y1={Y - 11} y2={Y + 11} stroke={palette.ink} strokeWidth={2} />
        {row.measured !== undefined ? <circle cx={pc(row.measured)} cy={Y} r={6.5} fill={inside ? '#2f7d4f' : '#b3261e'} stroke="#fff" strokeWidth={2} /> : null}
        {row.low !== undefined && row.high !== undefined ? (
          <>
            <text x={pc(low)} y={H} fontSize={10} textAnchor="end" fill={palette.textSoft}>
              {formatNumber(low, { decimals: row.decimals ?? 1 })}
            </text>
            <text x={pc(high)} y={H} fontSize={10} textAnchor="start" fill={palette.textSoft}>
              {formatNumber(high, { decimals: row.decimals ?? 1 })}
            </text>
          </>
        ) : null}
      </svg>
      <Box sx={{ textAlign: 'right', fontVariantNumeric: 'tabular-nums' }}>
        <Typography variant="body2" sx={{ fontWeight: 600 }}>
          {row.measured !== undefined ? f(row.measured) : '—'}
        </Typography>
        <Typography variant="caption" color="text.secondary">
          target {f(row.target)}
        </Typography>
      </Box>
    </Box>
  );
}

/** Targets against what was weighed: A, B and pigment, each against its tolerance band. */
export function ToleranceBars({ rows, caption }: { rows: BarRow[]; caption?: string }) {
  return (
    <Box>
      {rows.map((r) => (
        <Bar key={r.label} row={r} />
      ))}
      <Box sx={{ display: 'flex', gap: 2.5, flexWrap: 'wrap', mt: 1, color: 'text.secondary', fontSize: '0.75rem' }} aria-hidden>
        <Legend>
          <svg width="18" height="10">
            <rect x="0" y="1" width="18" height="8" rx="2" fill="#dcebe5" stroke="#9cc7b5" />
          </svg>
          tolerance band
        </Legend>
        <Legend>
          <svg width="6" height="14">
            <line x1="3" x2="3" y1="0" y2="14" stroke={palette.ink} strokeWidth="2" />
          </svg>
          target
        </Legend>
        <Legend>
          <svg width="12" height="12">
            <circle cx="6" cy="6" r="5" fill="#2f7d4f" />
          </svg>
          weighed, inside
        </Legend>
        <Legend>
          <svg width="12" height="12">
            <circle cx="6" cy="6" r="5" fill="#b3261e" />
          </svg>
          weighed, outside
        </Legend>
        {caption ? <span>{caption}</span> : null}
      </Box>
    </Box>
  );
}

function Legend({ children }: { children: React.ReactNode }) {
  return (
    <Box component="span" sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.75 }}>
      {children}
    </Box>
  );
}

