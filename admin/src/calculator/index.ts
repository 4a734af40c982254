import { lazy } from 'react';

export const CalculatorPage = lazy(() => import('./CalculatorPage'));
