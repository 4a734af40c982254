import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { Mold } from './moldRules';

export default {
  list: lazy(() => import('./MoldList')),
  create: lazy(() => import('./MoldForm').then((m) => ({ default: m.MoldCreate }))),
  edit: lazy(() => import('./MoldForm').then((m) => ({ default: m.MoldEdit }))),
  icon: menuIcons.molds,
  recordRepresentation: (m: Mold) => (m.code ? `${m.name} (${m.code})` : m.name),
  options: { label: 'Molds' },
};
