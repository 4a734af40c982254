import { Box, Typography } from '@mui/material';
import type { ReactNode } from 'react';

/** Label/value pairs in a compact grid, for show pages. */
export function DetailGrid({ items, columns = 3 }: { items: readonly { label: string; value: ReactNode; testId?: string }[]; columns?: number }) {
  return (
    <Box component="dl" sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: `repeat(${columns}, minmax(0, 1fr))` }, columnGap: 3, rowGap: 1.5, m: 0 }}>
      {items.map((it) => (
        <Box key={it.label} sx={{ minWidth: 0 }}>
          <Typography component="dt" variant="caption" color="text.secondary" sx={{ display: 'block', textTransform: 'uppercase', letterSpacing: '0.05em', fontWeight: 500 }}>
            {it.label}
          </Typography>
          <Typography component="dd" variant="body2" sx={{ m: 0, mt: 0.25 }} data-testid={it.testId}>
            {it.value ?? '—'}
          </Typography>
        </Box>
      ))}
    </Box>
  );
}

/** A titled card section of a show page. */
export function Section({ title, children, action, testId }: { title: string; children: ReactNode; action?: ReactNode; testId?: string }) {
  return (
    <Box component="section" aria-label={title} data-testid={testId} sx={{ border: '1px solid', borderColor: 'divider', borderRadius: 1.5, bgcolor: 'background.paper', p: 2, mb: 2 }}>
      <Box sx={{ display: 'flex', alignItems: 'center', mb: 1.5, gap: 1 }}>
        <Typography variant="h2" sx={{ fontSize: '1rem', fontWeight: 600, flex: 1 }}>
          {title}
        </Typography>
        {action}
      </Box>
      {children}
    </Box>
  );
}
