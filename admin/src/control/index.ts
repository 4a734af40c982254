import { lazy } from 'react';

/** The control-chart page (its own chunk: the charts are not on the first page). */
export const ControlPage = lazy(() => import('./ControlPage'));
