import type { Tone } from '../common/StatusChip';
import type { Device } from '../views/sdk';

export type DeviceKind = Device['kind'];

export type { Device };

export const KIND_CHOICES: readonly { id: DeviceKind; name: string }[] = [
  { id: 'scale', name: 'Bench scale' },
  { id: 'thermometer', name: 'Thermometer' },
  { id: 'hygrometer', name: 'Hygrometer' },
  { id: 'logger', name: 'Temperature logger' },
  { id: 'gateway', name: 'Gateway' },
];

export const kindLabel = (k: string) => KIND_CHOICES.find((c) => c.id === k)?.name ?? k;

const DAY = 86_400_000;

/** Days from `today` (YYYY-MM-DD, local) to a due date; negative when past. */
export function daysUntil(due: string, today: string): number {
  return Math.round((Date.parse(`${due}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / DAY);
}

export function localToday(now = Date.now()): string {
  const d = new Date(now);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/**
 * How a calibration due date reads: past due is a problem (readings from the scale are judged
 * against it), within 30 days a reminder, otherwise quiet.
 */
export function calibrationView(device: Pick<Device, 'calibrationDue' | 'calibrationOverdue' | 'retired'>, today: string): { label: string; tone: Tone; overdue: boolean } | null {
  if (!device.calibrationDue) return null;
  const days = daysUntil(device.calibrationDue, today);
  if (device.calibrationOverdue || days < 0) return { label: `Overdue ${-days} d`, tone: 'bad', overdue: true };
  if (days === 0) return { label: 'Due today', tone: 'caution', overdue: false };
  if (days <= 30) return { label: `Due in ${days} d`, tone: 'caution', overdue: false };
  return { label: 'In date', tone: 'good', overdue: false };
}
