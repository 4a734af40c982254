import { ACTIONS, type Action } from '@pourgate/permissions';

/** Which matrix action a react-admin page or button needs, per resource. */
const RESOURCE_ACTIONS: Readonly<Record<string, { read: Action; write?: Action }>> = {
  users: { read: 'people:read', write: 'people:manage' },
  invitations: { read: 'people:read', write: 'people:manage' },
  'api-keys': { read: 'api-keys:read', write: 'api-keys:manage' },
  'audit-events': { read: 'audit:read' },
  'material-systems': { read: 'shop:read', write: 'shop:write' },
  lots: { read: 'shop:read', write: 'shop:write' },
  molds: { read: 'shop:read', write: 'shop:write' },
  'work-orders': { read: 'shop:read', write: 'work-orders:write' },
  'qc-cup-tests': { read: 'shop:read', write: 'shop:write' },
  devices: { read: 'devices:read', write: 'devices:manage' },
  'webhook-endpoints': { read: 'webhooks:read', write: 'webhooks:manage' },
  'webhook-deliveries': { read: 'webhooks:read', write: 'webhooks:manage' },
  profile: { read: 'profile:read', write: 'profile:read' },
  readings: { read: 'readings:read', write: 'readings:review' },
  batches: { read: 'shop:read', write: 'shop:write' },
  imports: { read: 'imports:write', write: 'imports:write' },
};

const READ_ACTIONS = new Set(['list', 'show', 'export']);
const WRITE_ACTIONS = new Set(['create', 'edit', 'delete', 'clone']);

export function isAction(value: string): value is Action {
  return Object.prototype.hasOwnProperty.call(ACTIONS, value);
}

/** The known actions in a list the API sent; anything the matrix does not name is dropped. */
export function knownActions(actions: readonly unknown[] | null | undefined): Set<Action> {
  const out = new Set<Action>();
  for (const a of actions ?? []) if (typeof a === 'string' && isAction(a)) out.add(a);
  return out;
}

/**
 * Whether a person holding `actions` may open a page or use a button. This only shapes the
 * console; the API checks every request against the same matrix.
 */
export function canAccess(actions: readonly unknown[] | null | undefined, resource: string, action: string): boolean {
  const rule = RESOURCE_ACTIONS[resource];
  if (!rule) return false;
  const held = knownActions(actions);
  if (READ_ACTIONS.has(action)) return held.has(rule.read);
  if (WRITE_ACTIONS.has(action)) return !!rule.write && held.has(rule.write);
  return false;
}
