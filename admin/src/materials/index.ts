import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { MaterialSystem } from './systemRules';

export default {
  list: lazy(() => import('./SystemList')),
  show: lazy(() => import('./SystemShow')),
  create: lazy(() => import('./SystemForm').then((m) => ({ default: m.SystemCreate }))),
  edit: lazy(() => import('./SystemForm').then((m) => ({ default: m.SystemEdit }))),
  icon: menuIcons['material-systems'],
  recordRepresentation: (s: MaterialSystem) => s.name,
  options: { label: 'Material systems' },
};
