import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { ApiKey } from '../views/sdk';

export default {
  list: lazy(() => import('./ApiKeyList')),
  icon: menuIcons['api-keys'],
  recordRepresentation: (k: ApiKey) => k.name,
  options: { label: 'API keys' },
};
