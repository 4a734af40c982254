import { lazy } from 'react';

/** Lazy, so the first page's bundle carries none of the trace screens. */
export const LotTracePage = lazy(() => import('./LotTracePage'));
export const RecallReportPage = lazy(() => import('./RecallReportPage'));
