import WarningAmberRounded from '@mui/icons-material/WarningAmberRounded';
import { Box, Typography } from '@mui/material';

/**
 * The caution every screen with batch targets carries. Short on purpose: it points to the
 * sources that govern the work rather than trying to be them.
 */
export function SafetyNote({ compact = false }: { compact?: boolean }) {
  return (
    <Box
      role="note"
      aria-label="Safety"
      data-testid="safety-note"
      sx={{
        display: 'flex',
        gap: 1.5,
        p: compact ? 1.25 : 2,
        border: '1px solid #e5cf9e',
        borderLeft: '4px solid #c98a16',
        borderRadius: 1,
        bgcolor: '#fcf6e8',
        color: '#4a3a12',
      }}
    >
      <WarningAmberRounded sx={{ color: '#9a6200', mt: '1px' }} aria-hidden />
      <Box>
        <Typography variant="subtitle2" component="p" sx={{ fontWeight: 600, mb: 0.25 }}>
          Isocyanates are respiratory and skin sensitisers
        </Typography>
        <Typography variant="body2" component="p">
          Pour with good ventilation, chemical-resistant gloves and eye protection, and mind the heat of large
          masses of mixed foam. Follow the supplier&apos;s SDS, local codes and licensed practice; Pourgate&apos;s
          targets support that work and do not replace it.
        </Typography>
      </Box>
    </Box>
  );
}
