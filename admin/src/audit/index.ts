import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { AuditEntry } from '../views/sdk';

export default {
  list: lazy(() => import('./AuditList')),
  icon: menuIcons['audit-events'],
  recordRepresentation: (e: AuditEntry) => e.action,
  options: { label: 'Audit log' },
};
