import { lazy } from 'react';

/** Lazy, so the first page's bundle carries none of it. */
export const DefectsPage = lazy(() => import('./DefectsPage'));
