import { lazy } from 'react';

export const ImportsPage = lazy(() => import('./ImportsPage'));
