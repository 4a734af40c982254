import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { Lot } from './lotRules';

export default {
  list: lazy(() => import('./LotList')),
  create: lazy(() => import('./LotForm').then((m) => ({ default: m.LotCreate }))),
  edit: lazy(() => import('./LotForm').then((m) => ({ default: m.LotEdit }))),
  icon: menuIcons.lots,
  recordRepresentation: (l: Lot) => `${l.lotNumber} (${l.part === 'pigment' ? 'pigment' : `part ${l.part}`})`,
  options: { label: 'Lots' },
};
