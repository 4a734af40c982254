import { ROLES, type Role } from '@pourgate/permissions';

export interface RoleInfo {
  id: Role;
  label: string;
  blurb: string;
}

/** How roles read in the console; the matrix itself lives in the API's permissions file. */
export const ROLE_INFO: Readonly<Record<Role, RoleInfo>> = {
  admin: { id: 'admin', label: 'IT admin', blurb: 'People and roles, API keys, webhooks, the audit log' },
  engineer: { id: 'engineer', label: 'Process engineer', blurb: 'Material systems, lots, molds, work orders, the review queue' },
  integrator: { id: 'integrator', label: 'Integrator', blurb: 'Devices, device keys, webhooks, the API reference' },
  viewer: { id: 'viewer', label: 'Viewer', blurb: 'Reads the shop: systems, batches, readings and verdicts' },
};

export const roleChoices = ROLES.map((r) => ({ id: r, name: ROLE_INFO[r].label }));

export function roleLabel(role: string | null | undefined): string {
  return role && role in ROLE_INFO ? ROLE_INFO[role as Role].label : (role ?? '—');
}
