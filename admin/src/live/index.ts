import { lazy } from 'react';

/** The live station view (#/live), loaded when first opened. */
export const LivePage = lazy(() => import('./LivePage'));
