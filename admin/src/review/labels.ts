import { formatAsSent } from '../format/quantities';
import type { Reading, ReadingQuantity, ReadingStatus, ReadingSubject } from '../views/sdk';

export type { Reading };

export const SUBJECT_LABEL: Readonly<Record<ReadingSubject, string>> = {
  part_a: 'Part A',
  part_b: 'Part B',
  pigment: 'Pigment',
  mixed: 'Mixed',
  mold: 'Mold',
  ambient: 'Shop air',
  mix_start: 'Mix start',
  pour: 'Pour',
  demold: 'Demold',
};

export const QUANTITY_LABEL: Readonly<Record<ReadingQuantity, string>> = {
  mass: 'mass',
  temperature: 'temperature',
  humidity: 'humidity',
  milestone: 'time',
};

export const READING_STATUS: Readonly<Record<ReadingStatus, { label: string; tone: 'good' | 'caution' | 'bad' | 'quiet' | 'info' }>> = {
  rejected: { label: 'Rejected', tone: 'bad' },
  accepted: { label: 'Accepted', tone: 'good' },
  unused: { label: 'Not judged', tone: 'quiet' },
  pending: { label: 'Being judged', tone: 'info' },
};

/** "Part B mass", "Mold temperature", "Pour" (a milestone is its own name). */
export function readingTitle(r: Pick<Reading, 'subject' | 'quantity'>): string {
  if (r.quantity === 'milestone') return SUBJECT_LABEL[r.subject] ?? r.subject;
  return `${SUBJECT_LABEL[r.subject] ?? r.subject} ${QUANTITY_LABEL[r.quantity] ?? r.quantity}`;
}

/** What the device sent, as it sent it: "290.4 g"; a milestone carries only its time. */
export function readingValue(r: Pick<Reading, 'quantity' | 'given'>): string {
  if (r.quantity === 'milestone') return 'time mark';
  return formatAsSent(r.given.value, r.given.unit);
}
