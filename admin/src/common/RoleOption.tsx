import { Box, Typography } from '@mui/material';
import type { Role } from '@pourgate/permissions';
import { ROLE_INFO } from '../auth/roles';

/** A role as a radio option: its name and one line on what it is for. */
export function roleOptionText(choice: { id: Role }) {
  const info = ROLE_INFO[choice.id];
  return (
    <Box component="span" sx={{ display: 'block', py: 0.25 }}>
      <Typography component="span" variant="body2" sx={{ display: 'block', fontWeight: 500 }}>
        {info.label}
      </Typography>
      <Typography component="span" variant="caption" color="text.secondary" sx={{ display: 'block', lineHeight: 1.35 }}>
        {info.blurb}
      </Typography>
    </Box>
  );
}
