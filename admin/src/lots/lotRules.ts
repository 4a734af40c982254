import type { Tone } from '../common/StatusChip';
import { daysUntil } from '../devices/deviceRules';
import type { Lot } from '../views/sdk';

export type { Lot };

/** How many days ahead a lot counts as expiring soon. */
export const EXPIRING_SOON_DAYS = 30;

export const PART_CHOICES = [
  { id: 'A', name: 'Part A' },
  { id: 'B', name: 'Part B' },
  { id: 'pigment', name: 'Pigment' },
];

export const partLabel = (p: string) => PART_CHOICES.find((c) => c.id === p)?.name ?? p;

/** Expired lots are refused in targets; lots near their date are worth using first. */
export function expiryView(lot: Pick<Lot, 'expiresOn' | 'expired'>, today: string): { label: string; tone: Tone; state: 'expired' | 'soon' | 'ok' } {
  const days = daysUntil(lot.expiresOn, today);
  if (lot.expired || days < 0) return { label: days < 0 ? `Expired ${-days} d ago` : 'Expired', tone: 'bad', state: 'expired' };
  if (days === 0) return { label: 'Last day today', tone: 'caution', state: 'soon' };
  if (days <= EXPIRING_SOON_DAYS) return { label: `Expires in ${days} d`, tone: 'caution', state: 'soon' };
  return { label: `${days} d left`, tone: 'quiet', state: 'ok' };
}

/** YYYY-MM-DD `days` after `today`. */
export function addDays(today: string, days: number): string {
  return new Date(Date.parse(`${today}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}
