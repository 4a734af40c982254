import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { AuditEvent } from '../types';

export default {
  list: lazy(() => import('./AuditList')),
  icon: menuIcons['audit-events'],
  recordRepresentation: (e: AuditEvent) => e.action,
  options: { label: 'Audit log' },
};
