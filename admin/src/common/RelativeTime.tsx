import { Box, Tooltip } from '@mui/material';
import { formatDateTime, formatRelative } from '../format/dates';
import { useNow } from './useNow';

/** "5 minutes ago" with the exact time on hover; `empty` when there is no time. */
export function RelativeTime({ value, empty = '—', prefix = '' }: { value: string | null | undefined; empty?: string; prefix?: string }) {
  const now = useNow();
  if (!value)
    return (
      <Box component="span" sx={{ color: 'text.secondary', whiteSpace: 'nowrap' }}>
        {empty}
      </Box>
    );
  return (
    <Tooltip title={formatDateTime(value)} placement="top" disableInteractive>
      <time dateTime={value} style={{ whiteSpace: 'nowrap' }}>
        {prefix}
        {formatRelative(value, now)}
      </time>
    </Tooltip>
  );
}
