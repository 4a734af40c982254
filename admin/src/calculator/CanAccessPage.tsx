import type { Action } from '@pourgate/permissions';
import type { ReactNode } from 'react';
import { Loading, usePermissions } from 'react-admin';
import { knownActions } from '../auth/access';
import { NoAccessPage } from '../common/StatusPages';

/** A custom page (no resource behind it) shown only to people whose role holds `action`. */
export function CanAccessPage({ action, children }: { action: Action; children: ReactNode }) {
  const { permissions, isPending } = usePermissions<string[]>();
  if (isPending) return <Loading />;
  return knownActions(permissions).has(action) ? <>{children}</> : <NoAccessPage />;
}
