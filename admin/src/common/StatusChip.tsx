import { Chip } from '@mui/material';

export type Tone = 'good' | 'caution' | 'bad' | 'quiet' | 'info';

const TONES: Record<Tone, { bg: string; fg: string; border: string }> = {
  good: { bg: '#e6f2ea', fg: '#1f5e3a', border: '#b9dcc6' },
  caution: { bg: '#fdf1d8', fg: '#7a4d00', border: '#efd39a' },
  bad: { bg: '#fbe7e5', fg: '#8c1d17', border: '#f0bfbb' },
  quiet: { bg: '#efeee9', fg: '#4d5555', border: '#dcdad2' },
  info: { bg: '#e4f0f4', fg: '#17536b', border: '#bcd8e3' },
};

/** A small state label with a tone of our palette; the text carries the meaning, not the colour. */
export function StatusChip({ label, tone, title }: { label: string; tone: Tone; title?: string }) {
  const t = TONES[tone];
  return (
    <Chip
      size="small"
      label={label}
      title={title}
      sx={{ bgcolor: t.bg, color: t.fg, border: `1px solid ${t.border}`, borderRadius: '4px', fontWeight: 500 }}
    />
  );
}
