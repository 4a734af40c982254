import { Box, Typography } from '@mui/material';
import type { ReactNode } from 'react';
import { LogoMark } from '../layout/LogoMark';
import { palette } from '../theme';

/** Open foam cells, drawn: the quiet pattern behind the sign-in panel. */
function CellPattern() {
  const cells: [number, number, number][] = [
    [40, 60, 26], [96, 38, 14], [128, 92, 30], [70, 128, 18], [188, 44, 20], [214, 118, 34], [160, 168, 16],
    [36, 196, 30], [104, 214, 22], [250, 200, 18], [292, 70, 26], [312, 150, 14], [278, 262, 32], [180, 250, 26],
    [60, 290, 16], [128, 300, 30], [226, 318, 18], [330, 320, 22], [20, 370, 28], [96, 384, 18], [300, 400, 26],
    [190, 390, 34], [250, 470, 22], [52, 460, 30], [140, 470, 16], [330, 490, 16], [100, 540, 28], [210, 540, 20],
  ];
  return (
    <svg viewBox="0 0 360 600" preserveAspectRatio="xMidYMid slice" aria-hidden focusable="false" style={{ position: 'absolute', inset: 0, width: '100%', height: '100%' }}>
      {cells.map(([x, y, r], i) => (
        <circle key={i} cx={x} cy={y} r={r} fill="none" stroke={i % 5 === 0 ? palette.partA : palette.partB} strokeOpacity={i % 5 === 0 ? 0.35 : 0.16} strokeWidth={1.4} />
      ))}
    </svg>
  );
}

/** The frame of the pages one sees before signing in: sign-in and accepting an invitation. */
export function AuthShell({ children, heading, lead }: { children: ReactNode; heading: string; lead?: ReactNode }) {
  return (
    <Box component="main" sx={{ minHeight: '100vh', display: 'grid', gridTemplateColumns: { xs: '1fr', md: 'minmax(320px, 0.9fr) 1.1fr' }, bgcolor: palette.paper }}>
      <Box
        sx={{
          position: 'relative',
          overflow: 'hidden',
          bgcolor: palette.ink,
          color: '#f4f1e8',
          display: 'flex',
          flexDirection: 'column',
          justifyContent: 'space-between',
          p: { xs: 3, md: 5 },
          minHeight: { xs: 180, md: 'auto' },
          borderRight: { md: `4px solid ${palette.partA}` },
          borderBottom: { xs: `4px solid ${palette.partA}`, md: 'none' },
        }}
      >
        <CellPattern />
        <Box sx={{ position: 'relative', display: 'flex', alignItems: 'center', gap: 1.5 }}>
          <LogoMark size={44} />
          <Typography component="span" sx={{ fontSize: '1.6rem', fontWeight: 600, letterSpacing: '0.02em' }}>
            Pourgate
          </Typography>
        </Box>
        <Box sx={{ position: 'relative', maxWidth: 420, display: { xs: 'none', md: 'block' } }}>
          <Typography sx={{ fontSize: '1.45rem', fontWeight: 400, lineHeight: 1.35, mb: 1.5 }}>
            Right mass, right ratio, every pour.
          </Typography>
          <Typography sx={{ color: '#cfcabd', fontSize: '0.95rem', lineHeight: 1.6 }}>
            Batch targets for two-part foam, verdicts on every reading from your scales and loggers, and signed
            events for your ERP.
          </Typography>
        </Box>
        <Typography sx={{ position: 'relative', color: '#9f9a8c', fontSize: '0.78rem', display: { xs: 'none', md: 'block' } }}>
          Console for people. Machines use API keys — see the API reference at /docs.
        </Typography>
      </Box>
      <Box sx={{ display: 'flex', alignItems: 'center', justifyContent: 'center', p: { xs: 3, md: 6 } }}>
        <Box sx={{ width: '100%', maxWidth: 400 }}>
          <Typography variant="h1" component="h1" sx={{ fontSize: '1.55rem', mb: 0.75 }}>
            {heading}
          </Typography>
          {lead ? (
            <Typography variant="body2" color="text.secondary" sx={{ mb: 3 }}>
              {lead}
            </Typography>
          ) : null}
          {children}
        </Box>
      </Box>
    </Box>
  );
}
