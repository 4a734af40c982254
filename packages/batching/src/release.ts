/**
 * Complete before release: what a batch must have recorded — weighed or measured, and accepted or
 * waived — before an engineer may release it. Part A and part B always; the pigment when its
 * separately weighed target is above zero; milestones and temperatures when the system asks.
 */
import type { ReleaseRequirement } from './targets.js';

export type ReleaseItem = 'part_a' | 'part_b' | 'pigment' | ReleaseRequirement;

/** The latest judged reading of one item, as the batch's readings show it. */
export interface ItemRecord {
  readonly status: 'accepted' | 'rejected';
  readonly reviewDecision: 'waive' | 'uphold' | null;
}

export interface MissingItem {
  readonly item: ReleaseItem;
  readonly problem: 'not_recorded' | 'rejected' | 'pending';
  readonly message: string;
}

export interface ReleaseCheck {
  readonly ready: boolean;
  readonly required: ReleaseItem[];
  readonly missing: MissingItem[];
  /** Rejected readings of the batch neither waived (upheld ones included). */
  readonly openRejections: number;
}

const NAMES: Readonly<Record<ReleaseItem, string>> = {
  part_a: 'Part A',
  part_b: 'Part B',
  pigment: 'The pigment',
  component_temperature: 'The component temperature',
  mold_temperature: 'The mold temperature',
  ambient_temperature: 'The shop air temperature',
  humidity: 'The relative humidity',
  mix_start: 'The mix start',
  pour: 'The pour',
  demold: 'The demold',
};

/** What the batch's targets and its system ask for. */
export function requiredForRelease(pigmentWeighedKg: number, releaseRequires: readonly ReleaseRequirement[] = []): ReleaseItem[] {
  return ['part_a', 'part_b', ...(pigmentWeighedKg > 0 ? (['pigment'] as const) : []), ...releaseRequires];
}

/**
 * `latest` holds each item's latest judged reading (unstable ones set aside); `pending` the items
 * with a reading not judged yet.
 */
export function checkRelease(required: readonly ReleaseItem[], latest: ReadonlyMap<ReleaseItem, ItemRecord>, pending: ReadonlySet<ReleaseItem>, openRejections: number): ReleaseCheck {
  const missing: MissingItem[] = [];
  for (const item of required) {
    const r = latest.get(item);
    if (r && (r.status === 'accepted' || r.reviewDecision === 'waive')) continue;
    if (!r && pending.has(item)) missing.push({ item, problem: 'pending', message: `${NAMES[item]} is recorded but not judged yet.` });
    else if (!r) missing.push({ item, problem: 'not_recorded', message: `${NAMES[item]} has not been recorded.` });
    else missing.push({ item, problem: 'rejected', message: `${NAMES[item]} was rejected and the rejection was not waived.` });
  }
  return { ready: missing.length === 0 && openRejections === 0, required: [...required], missing, openRejections };
}
