import type { Action } from '@pourgate/permissions';
import { useGetIdentity, usePermissions } from 'react-admin';
import type { UnitSystem } from '../auth/me';
import { knownActions } from '../auth/access';
import type { PourgateIdentity } from '../authProvider';

/** The person's unit system (their preference, else their organization's, as /v1/me says). */
export function useUnitSystem(): UnitSystem {
  const { identity } = useGetIdentity();
  return (identity as PourgateIdentity | undefined)?.unitSystem ?? 'metric';
}

/** Whether the person's role holds `action` (the API still checks every request). */
export function useHolds(action: Action): boolean {
  const { permissions } = usePermissions<string[]>();
  return knownActions(permissions).has(action);
}
