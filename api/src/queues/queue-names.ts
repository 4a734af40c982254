import { IMPORT_QUEUE } from '../imports/imports.constants.js';
import { JUDGE_QUEUE } from '../readings/readings.constants.js';
import { SCHEDULE_QUEUE } from '../schedule/schedules.js';
import { WEBHOOK_QUEUE } from '../webhooks/webhooks.constants.js';

/** Every Bull queue of the service, for the dashboard. */
export const ALL_QUEUES = ['heartbeat', JUDGE_QUEUE, IMPORT_QUEUE, WEBHOOK_QUEUE, SCHEDULE_QUEUE] as const;
