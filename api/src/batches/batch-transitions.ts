import type { Knex } from 'knex';
import type { EventsService } from '../events/events.service.js';
import { type BatchState, canMove, STATE_EVENTS } from './batch-states.js';

export interface TransitionActor {
  actorType: 'user' | 'api_key' | 'system';
  actorId: string | null;
  actorLabel: string | null;
}

export const SYSTEM_ACTOR: TransitionActor = { actorType: 'system', actorId: null, actorLabel: 'reading judge' };

/**
 * Moves a batch to `to` inside the caller's transaction when the move is legal: the row (locked),
 * a transition row, batch.state_changed and the state's own event. Returns whether it moved.
 */
export async function moveBatch(trx: Knex.Transaction, events: EventsService, orgId: string, batchId: string, to: BatchState, actor: TransitionActor, reason: string): Promise<boolean> {
  const batch = await trx('batches').where({ id: batchId, organization_id: orgId }).forUpdate().first('state');
  if (!batch || batch.state === to || !canMove(batch.state, to)) return false;
  await trx('batches').where({ id: batchId }).update({ state: to });
  await trx('batch_state_transitions').insert({ organization_id: orgId, batch_id: batchId, from_state: batch.state, to_state: to, actor_type: actor.actorType, actor_id: actor.actorId, actor_label: actor.actorLabel, reason });
  const data = { batchId, from: batch.state, to, reason };
  await events.emit(trx, { organizationId: orgId, type: 'batch.state_changed', subjectType: 'batch', subjectId: batchId, data });
  const own = STATE_EVENTS[to];
  if (own) await events.emit(trx, { organizationId: orgId, type: own, subjectType: 'batch', subjectId: batchId, data });
  return true;
}
