/**
 * Who may do what: the one role × action matrix. The API's guards read it, the console builds
 * its menu from it, the README's table is generated from it, and the route matrix test checks
 * every route of the OpenAPI document against it. Plain data, no framework imports.
 */
export const ROLES = ['admin', 'engineer', 'integrator', 'viewer'] as const;
export type Role = (typeof ROLES)[number];

export interface ActionRule {
  /** People whose role allows the action. */
  roles: readonly Role[];
  /** When set, an API key holding this scope may also perform the action. */
  scope?: ApiKeyScope;
  description: string;
}

export const API_KEY_SCOPES = ['readings:write', 'targets:read', 'work-orders:write', 'events:read', 'devices:read', 'shop:read'] as const;
export type ApiKeyScope = (typeof API_KEY_SCOPES)[number];

/** What a device key (a scale, a logger) may ever hold: post readings, read targets and devices. */
export const DEVICE_KEY_SCOPES = ['readings:write', 'targets:read', 'devices:read'] as const satisfies readonly ApiKeyScope[];

/**
 * The scopes each role may put on a key it issues. A key never holds more than its issuer may
 * grant: admins set up the organization's integrations (an ERP key posts work orders), integrators
 * set up devices and so grant the device scopes only; the other roles issue no keys.
 */
export const KEY_SCOPE_GRANTS = {
  admin: API_KEY_SCOPES,
  integrator: DEVICE_KEY_SCOPES,
  engineer: [],
  viewer: [],
} as const satisfies Record<Role, readonly ApiKeyScope[]>;

/** The scopes of a requested key that its issuer may not grant, or that its kind may not hold. */
export function refusedScopes(issuer: Role, kind: 'device' | 'integration', scopes: readonly string[]): string[] {
  const grantable = KEY_SCOPE_GRANTS[issuer] as readonly string[];
  const forKind = (kind === 'device' ? DEVICE_KEY_SCOPES : API_KEY_SCOPES) as readonly string[];
  return [...new Set(scopes)].filter((s) => !grantable.includes(s) || !forKind.includes(s));
}

const everyone = ROLES;

export const ACTIONS = {
  'profile:read': { roles: everyone, description: 'See and edit one’s own profile and preferences' },
  'people:read': { roles: ['admin'], description: 'List people and invitations' },
  'people:manage': { roles: ['admin'], description: 'Invite people, change roles, disable accounts' },
  'api-keys:read': { roles: ['admin', 'integrator'], description: 'List API keys' },
  'api-keys:manage': { roles: ['admin', 'integrator'], description: 'Create, rotate and revoke API keys (integrators: device keys only)' },
  'audit:read': { roles: ['admin'], description: 'Read the audit log' },
  'queues:read': { roles: ['admin'], description: 'Open the queue dashboard (waiting, active, delayed and failed jobs; read-only)' },
  'devices:read': { roles: everyone, scope: 'devices:read', description: 'List devices and stations' },
  'devices:manage': { roles: ['admin', 'integrator'], description: 'Register and change devices' },
  'webhooks:read': { roles: ['admin', 'integrator'], description: 'List webhook endpoints and deliveries' },
  'webhooks:manage': { roles: ['admin', 'integrator'], description: 'Add, change, test and replay webhook endpoints' },
  'shop:read': { roles: everyone, scope: 'shop:read', description: 'Read material systems, lots, molds, work orders, batches, QC cup tests' },
  'shop:write': { roles: ['engineer'], description: 'Change material systems, lots, molds, batches, QC cup tests' },
  'work-orders:write': { roles: ['engineer'], scope: 'work-orders:write', description: 'Post and change work orders (the ERP does this with a key)' },
  'lots:override': { roles: ['engineer', 'admin'], description: 'Let an expired, held or recalled lot into a new batch, with a reason (audited)' },
  'lots:recall': { roles: ['engineer'], description: 'Recall a lot: it goes into no new batch; the ERP is told what it went into' },
  'parts:write': { roles: ['engineer'], scope: 'readings:write', description: 'Record demolded parts (mass, or a scale with a key) and test specimens' },
  'parts:dispose': { roles: ['engineer'], description: 'Decide a batch’s disposition (accepted, rework, scrap) with defect causes; complete work orders' },
  'defect-causes:manage': { roles: ['engineer', 'admin'], description: 'Edit the organization’s list of defect causes' },
  'targets:read': { roles: everyone, scope: 'targets:read', description: 'Compute and read batch targets' },
  'readings:read': { roles: everyone, scope: 'readings:write', description: 'List readings and verdicts (a device key: only its own device’s readings; an integration key: the organization’s)' },
  'readings:write': { roles: ['engineer'], scope: 'readings:write', description: 'Post readings (scales and loggers do this with a key)' },
  'readings:review': { roles: ['engineer'], description: 'Waive or uphold rejected readings' },
  'imports:write': { roles: ['engineer', 'integrator'], scope: 'readings:write', description: 'Upload logger CSV files' },
  'overview:read': { roles: everyone, description: 'See the shop-floor overview: pours, open rejections, rejection rate, ratio error per batch' },
  'control:read': { roles: everyone, description: 'See control charts, their limits, capability and run-rule signals' },
  'control:manage': { roles: ['engineer'], description: 'Define control charts, freeze baselines, acknowledge signals' },
  'events:read': { roles: ['admin', 'engineer', 'integrator'], scope: 'events:read', description: 'Poll the event feed' },
} as const satisfies Record<string, ActionRule>;

export type Action = keyof typeof ACTIONS;

export function roleAllows(role: Role, action: Action): boolean {
  return (ACTIONS[action].roles as readonly Role[]).includes(role);
}

export function scopeFor(action: Action): ApiKeyScope | undefined {
  return (ACTIONS[action] as ActionRule).scope;
}

/** The actions a role may perform (the console's menu is built from this). */
export function actionsOf(role: Role): Action[] {
  return (Object.keys(ACTIONS) as Action[]).filter((a) => roleAllows(role, a));
}

/** A markdown table of the matrix, for the README (`npm run docs:roles` prints it). */
export function matrixMarkdown(): string {
  const head = `| action | ${ROLES.join(' | ')} | API key scope | what it covers |`;
  const sep = `| --- | ${ROLES.map(() => ':-:').join(' | ')} | --- | --- |`;
  const rows = (Object.entries(ACTIONS) as [Action, ActionRule][]).map(
    ([a, r]) => `| \`${a}\` | ${ROLES.map((role) => (r.roles.includes(role) ? '✔' : '')).join(' | ')} | ${r.scope ? `\`${r.scope}\`` : '—'} | ${r.description} |`,
  );
  const keys = [
    '',
    `| API key scope | device keys | issued by | opens |`,
    `| --- | :-: | --- | --- |`,
    ...API_KEY_SCOPES.map((scope) => {
      const issuers = ROLES.filter((role) => (KEY_SCOPE_GRANTS[role] as readonly string[]).includes(scope));
      const opens = (Object.entries(ACTIONS) as [Action, ActionRule][]).filter(([, r]) => r.scope === scope).map(([a]) => `\`${a}\``);
      return `| \`${scope}\` | ${(DEVICE_KEY_SCOPES as readonly string[]).includes(scope) ? '✔' : ''} | ${issuers.join(', ')} | ${opens.join(', ')} |`;
    }),
  ];
  return [head, sep, ...rows, ...keys].join('\n');
}
