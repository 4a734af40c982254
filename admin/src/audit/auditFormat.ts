import type { ActorType } from '../views/sdk';

export const ACTOR_LABEL: Readonly<Record<ActorType, string>> = {
  user: 'Person',
  api_key: 'API key',
  system: 'Pourgate',
  anonymous: 'Not signed in',
};

export type DetailRow = { key: string; value: string };

/**
 * Flattens an event's details for the expanded row: nested objects become dotted keys, arrays
 * are listed inline, and values print as JSON would so that strings and numbers stay distinct.
 */
export function detailRows(details: unknown, prefix = '', depth = 0): DetailRow[] {
  if (details === null || details === undefined) return [];
  if (typeof details !== 'object' || Array.isArray(details)) return prefix ? [{ key: prefix, value: render(details) }] : [];
  const rows: DetailRow[] = [];
  for (const [k, v] of Object.entries(details as Record<string, unknown>)) {
    const key = prefix ? `${prefix}.${k}` : k;
    if (v && typeof v === 'object' && !Array.isArray(v) && depth < 3) rows.push(...detailRows(v, key, depth + 1));
    else rows.push({ key, value: render(v) });
  }
  return rows;
}

function render(v: unknown): string {
  if (typeof v === 'string') return v;
  if (v === undefined) return '—';
  return JSON.stringify(v);
}

/** What each recorded action means, in plain words (the codes are the API's, stable for filters). */
export const ACTION_LABEL: Readonly<Record<string, string>> = {
  'auth.signed_in': 'Signed in',
  'auth.signed_out': 'Signed out',
  'auth.sign_in_failed': 'Sign-in refused',
  'auth.sign_in_throttled': 'Sign-ins paused after repeated failures',
  'auth.refresh_reused': 'Old session token reused (all sessions ended)',
  'user.role_changed': 'Role changed',
  'user.disabled': 'Account disabled',
  'user.enabled': 'Account enabled',
  'user.renamed': 'Name changed',
  'user.password_changed': 'Password changed',
  'user.profile_changed': 'Profile changed',
  'invitation.sent': 'Invitation sent',
  'invitation.accepted': 'Invitation accepted',
  'invitation.revoked': 'Invitation withdrawn',
  'api_key.created': 'API key issued',
  'api_key.rotated': 'API key rotated',
  'api_key.revoked': 'API key revoked',
  'device.registered': 'Device registered',
  'device.changed': 'Device changed',
  'material_system.created': 'Material system added',
  'material_system.changed': 'Material system changed',
  'material_system.revised': 'Material system revised',
  'document.uploaded': 'Document uploaded',
  'lot.received': 'Lot received',
  'lot.changed': 'Lot changed',
  'lot.hold_released': 'Lot hold released',
  'mold.created': 'Mold added',
  'mold.changed': 'Mold changed',
  'work_order.posted': 'Work order received',
  'work_order.changed': 'Work order changed',
  'qc_cup_test.recorded': 'Cup test recorded',
  'batch.planned': 'Batch planned',
  'batch.released': 'Batch released',
  'batch.on_hold': 'Batch put on hold',
  'batch.scrapped': 'Batch scrapped',
  'reading.waived': 'Rejected reading waived',
  'reading.upheld': 'Rejection upheld',
  'import.uploaded': 'Logger file imported',
  'webhook_endpoint.created': 'Webhook added',
  'webhook_endpoint.changed': 'Webhook changed',
  'webhook_endpoint.deleted': 'Webhook removed',
  'webhook_endpoint.secret_rotated': 'Webhook secret rotated',
  'webhook_delivery.replayed': 'Webhook delivery replayed',
  'control_chart.created': 'Control chart started',
  'control_chart.changed': 'Control chart changed',
  'control_chart.baseline_frozen': 'Control limits fixed',
  'control_signal.acknowledged': 'Out-of-control signal acknowledged',
};

/** "API key revoked"; an action this console does not know yet reads from its code ("Thing done"). */
export function actionLabel(code: string): string {
  const known = ACTION_LABEL[code];
  if (known) return known;
  const words = code.replace(/[._]/g, ' ').trim();
  return words ? words[0]!.toUpperCase() + words.slice(1) : code;
}

/** The choices of the action filter, sorted by their words. */
export const ACTION_CHOICES: { id: string; name: string }[] = Object.entries(ACTION_LABEL)
  .map(([id, name]) => ({ id, name }))
  .sort((a, b) => a.name.localeCompare(b.name));

/** Where a target of each type is listed in the console, to show its name instead of its id. */
export const TARGET_RESOURCE: Readonly<Record<string, string>> = {
  user: 'users',
  api_key: 'api-keys',
  device: 'devices',
  invitation: 'invitations',
  batch: 'batches',
  lot: 'lots',
  mold: 'molds',
  material_system: 'material-systems',
  webhook_endpoint: 'webhook-endpoints',
  work_order: 'work-orders',
};

export const TARGET_LABEL: Readonly<Record<string, string>> = {
  user: 'Person',
  api_key: 'API key',
  device: 'Device',
  invitation: 'Invitation',
  batch: 'Batch',
  lot: 'Lot',
  mold: 'Mold',
  material_system: 'Material system',
  webhook_endpoint: 'Webhook',
  work_order: 'Work order',
  reading: 'Reading',
  document: 'Document',
  reading_import: 'Logger import',
  qc_cup_test: 'Cup test',
  control_chart: 'Control chart',
  control_signal: 'Control signal',
  webhook_delivery: 'Webhook delivery',
};
