import { lazy } from 'react';
import { menuIcons } from '../layout/icons';

export default {
  list: lazy(() => import('./CupTestPages').then((m) => ({ default: m.CupTestList }))),
  create: lazy(() => import('./CupTestPages').then((m) => ({ default: m.CupTestCreate }))),
  icon: menuIcons['qc-cup-tests'],
  options: { label: 'Cup tests' },
};
