import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { Invitation } from '../views/sdk';

export default {
  list: lazy(() => import('./InvitationList')),
  icon: menuIcons.invitations,
  recordRepresentation: (i: Invitation) => i.email,
  options: { label: 'Invitations' },
};
