import { forReader, type UnitSystem } from '@pourgate/batching';
import { MAX_CLOCK_SKEW_S } from './readings.constants.js';
import type { ReadingRow } from './readings.repository.js';

const UNIT_SI: Record<ReadingRow['quantity'], string> = { mass: 'kg', temperature: 'degC', humidity: '%', milestone: 's' };

/** A reading as the API shows it; the reasons' sentences in the reader's unit system. */
export function readingView(r: ReadingRow, units: UnitSystem = 'metric') {
  return {
    id: r.id,
    batchId: r.batch_id,
    deviceId: r.device_id,
    clientReadingId: r.client_reading_id,
    quantity: r.quantity,
    subject: r.subject,
    valueSi: r.value_si,
    unitSi: UNIT_SI[r.quantity],
    given: { value: r.value_given, unit: r.unit_given },
    stable: r.stable,
    deviceTime: r.device_time,
    receivedAt: r.received_at,
    clockSkewSeconds: r.skew_seconds,
    clockSkewFlagged: r.skew_seconds !== null && Math.abs(r.skew_seconds) > MAX_CLOCK_SKEW_S,
    status: r.status,
    reasons: forReader(r.reasons, units),
    judgedAt: r.judged_at,
    review: r.review_decision ? { decision: r.review_decision, note: r.review_note, by: r.reviewed_by_label, at: r.reviewed_at } : null,
    statusUrl: `/v1/readings/${r.id}`,
  };
}
