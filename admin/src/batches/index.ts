import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import { batchTitle, type Batch } from './labels';

export default {
  list: lazy(() => import('./BatchList')),
  show: lazy(() => import('./BatchShow')),
  icon: menuIcons.batches,
  recordRepresentation: (b: Batch) => batchTitle(b),
  options: { label: 'Batches' },
};

export const PourSheetPage = lazy(() => import('./PourSheet'));
