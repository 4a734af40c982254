import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { User } from '../views/sdk';

export default {
  list: lazy(() => import('./UserList')),
  icon: menuIcons.users,
  recordRepresentation: (u: User) => u.name,
  options: { label: 'People' },
};
