/** The words of a rejected-reading e-mail: pure, so its wording is tested without a mail server. */

export interface NoticeFacts {
  readingId: string;
  batchId: string;
  batchLabel: string;
  deviceName: string | null;
  quantity: string;
  subject: string;
  takenAt: string;
  reasons: { code: string; message: string; measured: number | null; limit: number | null; unit: string | null }[];
}

const UNIT_WORDS: Record<string, string> = { degC: '°C', kg: 'kg', '%': '%', s: 's' };
const SUBJECT_WORDS: Record<string, string> = { part_a: 'part A', part_b: 'part B', pigment: 'pigment', mixed: 'mixed shot', mold: 'mold', ambient: 'shop air', mix_start: 'mix start', pour: 'pour', demold: 'demold' };

/** "measured 5.1 % against a limit of 5 %", or nothing when the reason carries no figures. */
export function figures(r: NoticeFacts['reasons'][number]): string {
  const u = r.unit ? ` ${UNIT_WORDS[r.unit] ?? r.unit}` : '';
  if (r.measured === null && r.limit === null) return '';
  if (r.limit === null) return `measured ${r.measured}${u}`;
  if (r.measured === null) return `limit ${r.limit}${u}`;
  return `measured ${r.measured}${u} against a limit of ${r.limit}${u}`;
}

/** The console's review queue, filtered to the batch's rejected readings. */
export function reviewLink(publicUrl: string, batchId: string): string {
  return `${publicUrl.replace(/\/$/, '')}/#/readings?filter=${encodeURIComponent(JSON.stringify({ status: 'rejected', batchId }))}`;
}

const CAUTION = 'Before handling a held batch: wear the protective equipment its SDS names (isocyanates sensitise skin and lungs), keep a mixed mass that is curing away from people and combustibles (it can get very hot), and follow your local rules.';

function block(n: NoticeFacts, publicUrl: string): string {
  const lines = [
    `Batch ${n.batchLabel} — ${SUBJECT_WORDS[n.subject] ?? n.subject} (${n.quantity}) at ${n.takenAt}${n.deviceName ? `, from ${n.deviceName}` : ''}`,
    ...n.reasons.map((r) => `  • ${r.code}: ${r.message}${figures(r) ? ` (${figures(r)})` : ''}`),
    `  Review: ${reviewLink(publicUrl, n.batchId)}`,
    `  Reading: ${n.readingId}`,
  ];
  return lines.join('\n');
}

export function rejectionMail(n: NoticeFacts, publicUrl: string): { subject: string; text: string } {
  return {
    subject: `Rejected reading on batch ${n.batchLabel}: ${n.reasons.map((r) => r.code).join(', ')}`,
    text: [`A reading was rejected and its batch is on hold until it is reviewed.`, '', block(n, publicUrl), '', CAUTION, '', 'You get one message per rejected reading; choose a digest or none on your profile in the console.'].join('\n'),
  };
}

export function digestMail(items: NoticeFacts[], publicUrl: string): { subject: string; text: string } {
  return {
    subject: `${items.length} rejected reading${items.length === 1 ? '' : 's'} to review`,
    text: [`These readings were rejected since the last digest; their batches are on hold until reviewed.`, '', ...items.map((n) => block(n, publicUrl) + '\n'), CAUTION, '', 'You get these as a digest; choose one message per reading or none on your profile in the console.'].join('\n'),
  };
}
