import type { NotifyDrift, NotifyRejections, ProfileUpdate } from '../views/sdk';

export const UNIT_CHOICES = [
  { id: 'metric', name: 'Metric (g, kg, mm, L, kg/m³, °C)' },
  { id: 'imperial', name: 'US customary (lb, oz, in, in³, lb/ft³, °F)' },
];

export const NOTIFY_CHOICES: { id: NotifyRejections; name: string }[] = [
  { id: 'each', name: 'A mail for each rejected reading' },
  { id: 'digest', name: 'One summary a day' },
  { id: 'off', name: 'No mail (I check the review queue)' },
];

export const DRIFT_CHOICES: { id: NotifyDrift; name: string }[] = [
  { id: 'each', name: 'A mail for each drift signal of a control chart' },
  { id: 'off', name: 'No mail (I check the control charts)' },
];

/** Only what changed, as `PATCH /v1/me` takes it; null when nothing did. */
export function preferencesPatch(
  current: { fullName?: string; unitSystem?: string; notifyRejections?: string; notifyDrift?: string },
  values: { name?: unknown; unitSystem?: unknown; notifyRejections?: unknown; notifyDrift?: unknown },
): ProfileUpdate | null {
  const patch: ProfileUpdate = {};
  const name = typeof values.name === 'string' ? values.name.trim() : '';
  if (name && name !== current.fullName) patch.name = name;
  if ((values.unitSystem === 'metric' || values.unitSystem === 'imperial') && values.unitSystem !== current.unitSystem) patch.unitSystem = values.unitSystem;
  if (current.notifyRejections !== undefined && typeof values.notifyRejections === 'string' && values.notifyRejections !== current.notifyRejections) {
    patch.notifyRejections = values.notifyRejections as NotifyRejections;
  }
  if (current.notifyDrift !== undefined && (values.notifyDrift === 'each' || values.notifyDrift === 'off') && values.notifyDrift !== current.notifyDrift) patch.notifyDrift = values.notifyDrift;
  return Object.keys(patch).length ? patch : null;
}

/** The password change, or the field errors to show before asking the API. */
export function passwordPatch(values: { currentPassword?: unknown; newPassword?: unknown; confirmPassword?: unknown }): ProfileUpdate | { errors: Record<string, string> } {
  const next = String(values.newPassword ?? '');
  if (next.length < 10) return { errors: { newPassword: 'Use at least 10 characters.' } };
  if (next !== String(values.confirmPassword ?? '')) return { errors: { confirmPassword: 'The two new passwords differ.' } };
  return { currentPassword: String(values.currentPassword ?? ''), newPassword: next };
}
