import type { Role } from '@pourgate/permissions';

export type UnitSystem = 'metric' | 'imperial';

/** The signed-in person, as `GET /v1/me` answers. */
export interface Me {
  id: string;
  email: string;
  name: string;
  role: Role;
  unitSystem: UnitSystem;
  organization: { id: string; name: string };
  /** Allowed actions from the role × action matrix; the API stays the enforcer. */
  actions: string[];
}
