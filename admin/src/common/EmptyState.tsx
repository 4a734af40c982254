import { Box, Typography } from '@mui/material';
import type { ComponentType, ReactNode } from 'react';

/** What an empty list says: what belongs here, and the one action that fills it. */
export function EmptyState({ icon: Icon, title, children, action }: { icon: ComponentType<{ sx?: object }>; title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <Box
      data-testid="empty-state"
      sx={{
        mt: 1,
        px: 4,
        py: 6,
        border: '1px dashed',
        borderColor: 'divider',
        borderRadius: 1.5,
        bgcolor: 'background.paper',
        display: 'flex',
        flexDirection: 'column',
        alignItems: 'center',
        textAlign: 'center',
        gap: 1.25,
      }}
    >
      <Box sx={{ width: 56, height: 56, borderRadius: '50%', bgcolor: '#e6efef', display: 'grid', placeItems: 'center' }}>
        <Icon sx={{ color: 'primary.main', fontSize: 28 }} />
      </Box>
      <Typography variant="h2" sx={{ fontSize: '1.1rem' }}>
        {title}
      </Typography>
      {children ? (
        <Typography variant="body2" color="text.secondary" sx={{ maxWidth: 520 }}>
          {children}
        </Typography>
      ) : null}
      {action ? <Box sx={{ mt: 1 }}>{action}</Box> : null}
    </Box>
  );
}
