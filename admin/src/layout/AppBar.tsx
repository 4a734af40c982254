import ExitToApp from '@mui/icons-material/LogoutOutlined';
import { Box, Divider, ListItem, ListItemIcon, ListItemText, MenuItem, Typography } from '@mui/material';
import { AppBar as RaAppBar, LoadingIndicator, TitlePortal, UserMenu, useGetIdentity, useLogout } from 'react-admin';
import type { PourgateIdentity } from '../authProvider';
import { roleLabel } from '../auth/roles';
import { LogoMark } from './LogoMark';

function WhoAmI() {
  const { identity } = useGetIdentity();
  const me = identity as PourgateIdentity | undefined;
  if (!me) return null;
  return (
    <ListItem sx={{ pt: 0.5, pb: 1, minWidth: 240 }} component="div">
      <ListItemText
        primary={me.fullName}
        secondary={
          <>
            {me.email}
            <br />
            {roleLabel(me.role)} · {me.organization?.name}
          </>
        }
      />
    </ListItem>
  );
}

function SignOutItem() {
  const logout = useLogout();
  return (
    <MenuItem onClick={() => logout(null, undefined, false)} data-testid="sign-out">
      <ListItemIcon>
        <ExitToApp fontSize="small" />
      </ListItemIcon>
      <ListItemText>Sign out</ListItemText>
    </MenuItem>
  );
}

function Organization() {
  const { identity } = useGetIdentity();
  const org = (identity as PourgateIdentity | undefined)?.organization?.name;
  if (!org) return null;
  return (
    <Typography
      variant="body2"
      sx={{ display: { xs: 'none', md: 'block' }, mr: 1.5, px: 1.25, py: 0.25, borderRadius: 1, bgcolor: 'rgba(255,255,255,0.08)', color: '#e9e5da' }}
      data-testid="organization-name"
    >
      {org}
    </Typography>
  );
}

export function AppBar() {
  const { identity } = useGetIdentity();
  const name = (identity as PourgateIdentity | undefined)?.fullName;
  // the button shows the person's name: its accessible name must contain what is seen (WCAG 2.5.3)
  const accountLabel = name ? `${name}: account and sign-out` : 'Account and sign-out';
  return (
    <RaAppBar
      color="inherit"
      alwaysOn
      toolbar={<LoadingIndicator />}
      userMenu={
        <UserMenu label={accountLabel}>
          <WhoAmI />
          <Divider />
          <SignOutItem />
        </UserMenu>
      }
    >
      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mr: 2 }}>
        <LogoMark size={30} />
        <Typography component="span" sx={{ fontWeight: 600, fontSize: '1.05rem', letterSpacing: '0.02em', color: '#f7f5ef' }}>
          Pourgate
        </Typography>
      </Box>
      <Box sx={{ width: '1px', alignSelf: 'stretch', my: 1.25, bgcolor: 'rgba(255,255,255,0.18)', mr: 2, display: { xs: 'none', sm: 'block' } }} />
      <TitlePortal variant="body1" sx={{ color: '#d9d4c6', fontWeight: 400 }} />
      <Organization />
    </RaAppBar>
  );
}
