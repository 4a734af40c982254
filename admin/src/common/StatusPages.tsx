import ArrowBack from '@mui/icons-material/ArrowBack';
import LockOutlined from '@mui/icons-material/LockOutlined';
import SearchOff from '@mui/icons-material/SearchOffOutlined';
import { Box, Button } from '@mui/material';
import { Link } from 'react-router-dom';
import { Title, useGetIdentity } from 'react-admin';
import { roleLabel } from '../auth/roles';
import type { PourgateIdentity } from '../authProvider';
import { EmptyState } from './EmptyState';

const backHome = (
  <Button component={Link} to="/" startIcon={<ArrowBack />} variant="outlined" size="small">
    Back to the overview
  </Button>
);

/** Shown when a page is outside the person's role (the API would refuse it too). */
export function NoAccessPage() {
  const { identity } = useGetIdentity();
  const role = (identity as PourgateIdentity | undefined)?.role;
  return (
    <Box sx={{ maxWidth: 720, mt: 4 }} data-testid="no-access">
      <Title title="Not available" />
      <EmptyState icon={LockOutlined} title="This page is not part of your role" action={backHome}>
        {role ? `Your role is ${roleLabel(role)}. ` : ''}Ask an IT admin of your organization if your work needs it.
      </EmptyState>
    </Box>
  );
}

export function NotFoundPage() {
  return (
    <Box sx={{ maxWidth: 720, mt: 4 }} data-testid="not-found">
      <Title title="Not found" />
      <EmptyState icon={SearchOff} title="Nothing at this address" action={backHome}>
        The link may be old, or the record belongs to another organization.
      </EmptyState>
    </Box>
  );
}
