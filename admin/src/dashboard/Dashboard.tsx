import ArrowForward from '@mui/icons-material/ArrowForward';
import CheckCircleOutline from '@mui/icons-material/CheckCircleOutline';
import { Box, Button, Card, CardContent, Chip, List, ListItem, ListItemIcon, ListItemText, Skeleton, Typography } from '@mui/material';
import { ACTIONS } from '@pourgate/permissions';
import { lazy, Suspense } from 'react';
import { Link } from 'react-router-dom';
import { Title, useGetIdentity, usePermissions } from 'react-admin';
import { knownActions } from '../auth/access';
import { roleLabel, ROLE_INFO } from '../auth/roles';
import type { PourgateIdentity } from '../authProvider';
import { SafetyNote } from '../common/SafetyNote';
import { menuIcons } from '../layout/icons';
import { menuFor } from '../layout/menuModel';

const SHORTCUTS: Record<string, { text: string; cta: string }> = {
  users: { text: 'See who has access, change roles, disable accounts.', cta: 'Manage people' },
  invitations: { text: 'Invite a colleague by e-mail with the role they need.', cta: 'See invitations' },
  'audit-events': { text: 'Who signed in, issued a key or changed a role, and when.', cta: 'Read the log' },
  'api-keys': { text: 'Issue scoped keys for machines, see when each was last used, rotate and revoke them.', cta: 'Manage keys' },
  docs: { text: 'The OpenAPI reference: every route, schema and error, with examples.', cta: 'Open the reference' },
  readings: { text: 'Rejected readings with what was measured against which limit: waive with a note, or uphold.', cta: 'Open the queue' },
  'reading-log': { text: 'Every reading the scales and loggers sent, with its verdict; filter by device to check a connection.', cta: 'See readings' },
  batches: { text: 'Every mix with its targets, what was weighed, its timeline and a printable pour sheet.', cta: 'See batches' },
  calculator: { text: 'Masses of A, B and pigment for any system and mold, with warnings and cautions.', cta: 'Compute targets' },
  imports: { text: 'Send a CSV a logger kept offline and follow it row by row.', cta: 'Import a file' },
  profile: { text: 'Your name, password and the units you read figures in.', cta: 'Open your profile' },
  'material-systems': { text: 'Formulations with their ratio, densities, windows and times; every change is a revision.', cta: 'See systems' },
  lots: { text: 'Component lots and their expiry; expired lots raise a warning on targets.', cta: 'See lots' },
  molds: { text: 'Cavities, inserts and default pack factors, with a volume helper.', cta: 'See molds' },
  'work-orders': { text: 'What the ERP asked for: part, mold, system and quantity.', cta: 'See work orders' },
  'qc-cup-tests': { text: 'Cream, top-of-cup and tack-free times and free-rise density per lot.', cta: 'See cup tests' },
  devices: { text: 'Bench scales and loggers, their stations, readability and calibration dates.', cta: 'See devices' },
  'webhook-endpoints': { text: 'Where Pourgate sends signed events, with a test send and secret rotation.', cta: 'See webhooks' },
  'webhook-deliveries': { text: 'Every delivery attempt and its answer; replay a dead one.', cta: 'See deliveries' },
};

// the charts (and their library) load only for people who see the shop floor
const FloorPanel = lazy(() => import('./FloorPanel'));

export default function Dashboard() {
  const { identity } = useGetIdentity();
  const { permissions } = usePermissions<string[]>();
  const me = identity as PourgateIdentity | undefined;
  const firstName = me?.fullName?.split(' ')[0];
  const shortcuts = menuFor(permissions)
    .flatMap((s) => s.links)
    .filter((l) => l.id !== 'overview');
  const held = [...knownActions(permissions)];
  const role = me?.role ? ROLE_INFO[me.role] : undefined;

  return (
    <Box sx={{ maxWidth: 1280 }}>
      <Title title="Overview" />
      <Box sx={{ mt: 1, mb: 2.5 }}>
        <Typography variant="h1" component="h1" sx={{ fontSize: '1.6rem' }}>
          {firstName ? `Welcome back, ${firstName}` : 'Welcome back'}
        </Typography>
        <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mt: 0.75, flexWrap: 'wrap' }}>
          {me?.organization?.name ? (
            <Typography variant="body2" color="text.secondary">
              {me.organization.name}
            </Typography>
          ) : null}
          {me?.role ? <Chip size="small" label={roleLabel(me.role)} color="primary" variant="outlined" /> : null}
          {role ? (
            <Typography variant="body2" color="text.secondary">
              {role.blurb}
            </Typography>
          ) : null}
        </Box>
      </Box>

      {held.includes('overview:read') ? (
        <Box sx={{ mb: 2.5 }}>
          <Suspense fallback={<Skeleton variant="rounded" height={420} />}>
            <FloorPanel />
          </Suspense>
        </Box>
      ) : null}

      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: '1.35fr 1fr' }, alignItems: 'start' }}>
        <Box sx={{ display: 'grid', gap: 2 }}>
          {shortcuts.length > 0 ? (
            <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' } }}>
              {shortcuts.map((s) => {
                const Icon = menuIcons[s.id];
                const linkProps = s.external
                  ? { component: 'a' as const, href: s.to, target: '_blank', rel: 'noopener' }
                  : { component: Link, to: s.to };
                return (
                  <Card key={s.id} sx={{ display: 'flex', flexDirection: 'column' }}>
                    <CardContent sx={{ flex: 1, pb: 1 }}>
                      <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mb: 0.75, color: 'primary.main' }}>
                        {Icon ? <Icon /> : null}
                        <Typography variant="h2" sx={{ fontSize: '1.02rem', color: 'text.primary' }}>
                          {s.label}
                        </Typography>
                      </Box>
                      <Typography variant="body2" color="text.secondary">
                        {SHORTCUTS[s.id]?.text ?? ''}
                      </Typography>
                    </CardContent>
                    <Box sx={{ px: 1, pb: 1 }}>
                      <Button size="small" endIcon={<ArrowForward />} {...linkProps}>
                        {SHORTCUTS[s.id]?.cta ?? 'Open'}
                      </Button>
                    </Box>
                  </Card>
                );
              })}
            </Box>
          ) : (
            <Card>
              <CardContent>
                <Typography variant="h2" sx={{ fontSize: '1.02rem', mb: 0.75 }}>
                  Shop floor pages are on their way
                </Typography>
                <Typography variant="body2" color="text.secondary">
                  Material systems, molds, work orders, batch targets and the review queue of rejected readings
                  will appear in this console. Until then the API serves them to your scales, loggers and ERP.
                </Typography>
              </CardContent>
            </Card>
          )}
          <SafetyNote />
        </Box>

        <Card>
          <CardContent>
            <Typography variant="h2" sx={{ fontSize: '1.02rem' }}>
              What your role allows
            </Typography>
            <Typography variant="body2" color="text.secondary" sx={{ mt: 0.25 }}>
              The API checks every request against the same list.
            </Typography>
            <List dense disablePadding sx={{ mt: 1 }} aria-label="Allowed actions">
              {held.map((a) => (
                <ListItem key={a} disableGutters sx={{ alignItems: 'flex-start', py: 0.25 }}>
                  <ListItemIcon sx={{ minWidth: 28, mt: 0.6 }}>
                    <CheckCircleOutline sx={{ fontSize: 17, color: 'success.main' }} />
                  </ListItemIcon>
                  <ListItemText primary={ACTIONS[a].description} slotProps={{ primary: { variant: 'body2' } }} />
                </ListItem>
              ))}
            </List>
          </CardContent>
        </Card>
      </Box>
    </Box>
  );
}
