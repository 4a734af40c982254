import { Box, Typography } from '@mui/material';
import type { ReactNode } from 'react';

/** The heading above each page's content: what this page is for, in one line. */
export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <Box sx={{ display: 'flex', alignItems: 'flex-end', gap: 2, mt: 1, mb: 2, flexWrap: 'wrap' }}>
      <Box sx={{ flex: 1, minWidth: 260 }}>
        <Typography variant="h1" component="h1" sx={{ fontSize: '1.5rem' }}>
          {title}
        </Typography>
        {lead ? (
          <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5, maxWidth: 760 }}>
            {lead}
          </Typography>
        ) : null}
      </Box>
      {actions}
    </Box>
  );
}
