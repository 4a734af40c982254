import { lazy } from 'react';

/** Lazy, so the first page's bundle carries none of the planning screens. */
export const PlanBatchPage = lazy(() => import('./PlanBatchPage'));
