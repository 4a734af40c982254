/**
 * Every event type Pourgate emits, as `<subject>.<what happened>` in the past tense. Each has a
 * JSON Schema for its `data` in schemas/event.<type>.schema.json (embedded in the OpenAPI document).
 */
export const EVENT_TYPES = {
  'webhook.test': 'A test event sent from POST /v1/webhook-endpoints/{id}/test',
  'reading.accepted': 'A reading was judged within every tolerance',
  'reading.rejected': 'A reading was judged outside a tolerance; the reasons say which and by how much',
  'reading.waived': 'An engineer accepted a rejected reading anyway, with a note',
  'reading.upheld': 'An engineer confirmed a rejection',
  'batch.created': 'A batch was planned and its targets computed',
  'batch.state_changed': 'A batch moved from one state to another',
  'batch.released': 'A batch was released: every rejection waived or none',
  'batch.on_hold': 'A batch was put on hold pending review',
  'batch.scrapped': 'A batch was scrapped',
  'lot.held': 'A lot was put on hold for new batches: a cup test of it failed the system\'s reactivity window or density band',
  'lot.hold_released': 'An engineer released a held lot, with a note saying why',
  'work_order.created': 'A work order arrived (from the ERP or an engineer)',
  'work_order.changed': 'A work order was changed',
  'work_order.completed': 'A work order was completed: its consumption by lot and its parts, for the ERP to back-flush stock',
  'batch.disposed': 'A batch\'s parts were judged after demold (accepted, rework, scrap) with defect causes',
  'lot.recalled': 'A lot was recalled: it goes into no new batch, and the count of batches and work orders it went into',
  'drift.detected': 'A run rule of a control chart fired: the process is moving before readings leave tolerance',
  'drift.acknowledged': 'An engineer acknowledged a drift signal with a note',
} as const;

export type EventType = keyof typeof EVENT_TYPES;
export const EVENT_TYPE_NAMES = Object.keys(EVENT_TYPES) as EventType[];
