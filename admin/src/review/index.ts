import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import { reasonTitle } from './reasons';
import type { Reading } from './labels';

export default {
  list: lazy(() => import('./ReviewQueue')),
  icon: menuIcons.readings,
  recordRepresentation: (r: Reading) => (r.reasons[0] ? reasonTitle(r.reasons[0].code) : r.id),
  options: { label: 'Review queue' },
};
