import ScienceOutlined from '@mui/icons-material/ScienceOutlined';
import { Box, Typography } from '@mui/material';
import type { ReactNode } from 'react';

/**
 * The caution on pages about the chemicals themselves (systems, lots): short, and pointing at the
 * supplier's SDS, which governs handling; Pourgate's data never replaces it.
 */
export function SdsCaution({ children }: { children?: ReactNode }) {
  return (
    <Box
      role="note"
      aria-label="Handling caution"
      data-testid="sds-caution"
      sx={{ display: 'flex', gap: 1.25, px: 1.5, py: 1.1, border: '1px solid #e5cf9e', borderLeft: '4px solid #c98a16', borderRadius: 1, bgcolor: '#fcf6e8', color: '#4a3a12', mb: 2 }}
    >
      <ScienceOutlined sx={{ color: '#9a6200', mt: '1px', fontSize: 20 }} aria-hidden />
      <Box>
        <Typography variant="body2" component="p">
          <strong>Isocyanates are respiratory and skin sensitisers.</strong> Handle parts A and B with ventilation,
          chemical-resistant gloves and eye protection; large masses of mixed foam can overheat. The supplier&apos;s
          SDS, local codes and licensed practice govern storage, handling and disposal.
        </Typography>
        {children ? (
          <Typography variant="body2" component="div" sx={{ mt: 0.5 }}>
            {children}
          </Typography>
        ) : null}
      </Box>
    </Box>
  );
}
