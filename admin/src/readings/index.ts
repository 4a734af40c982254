import { lazy } from 'react';

export const ReadingListPage = lazy(() => import('./ReadingList'));
