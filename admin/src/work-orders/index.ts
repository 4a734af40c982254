import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { WorkOrder } from './WorkOrderPages';

export default {
  list: lazy(() => import('./WorkOrderPages').then((m) => ({ default: m.WorkOrderList }))),
  show: lazy(() => import('../planning/WorkOrderShow')),
  create: lazy(() => import('./WorkOrderPages').then((m) => ({ default: m.WorkOrderCreate }))),
  edit: lazy(() => import('./WorkOrderPages').then((m) => ({ default: m.WorkOrderEdit }))),
  icon: menuIcons['work-orders'],
  recordRepresentation: (w: WorkOrder) => w.externalRef,
  options: { label: 'Work orders' },
};
