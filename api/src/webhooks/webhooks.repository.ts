import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.module.js';

export interface EndpointRow {
  id: string;
  organization_id: string;
  url: string;
  description: string;
  event_types: string[];
  enabled: boolean;
  disabled_reason: string | null;
  secret_enc: string;
  /** Version of the key that sealed secret_enc (null: sealed before keys were versioned). */
  secret_key_version: string | null;
  previous_secret_enc: string | null;
  previous_secret_key_version: string | null;
  previous_secret_until: Date | null;
  created_by: string | null;
  created_at: Date;
  updated_at: Date;
}

export interface DeliveryRow {
  id: string;
  organization_id: string;
  endpoint_id: string;
  event_id: string;
  event_type: string;
  status: 'pending' | 'delivering' | 'succeeded' | 'retrying' | 'dead' | 'cancelled';
  attempts: number;
  next_attempt_at: Date | null;
  last_status_code: number | null;
  last_error: string | null;
  last_duration_ms: number | null;
  delivered_at: Date | null;
  replays: number;
  created_at: Date;
  updated_at: Date;
}

export function endpointView(r: EndpointRow) {
  return {
    id: r.id,
    url: r.url,
    description: r.description,
    eventTypes: r.event_types,
    enabled: r.enabled,
    disabledReason: r.disabled_reason,
    secretRotating: Boolean(r.previous_secret_until && r.previous_secret_until > new Date()),
    previousSecretUntil: r.previous_secret_until,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

export function deliveryView(r: DeliveryRow) {
  return {
    id: r.id,
    endpointId: r.endpoint_id,
    eventId: r.event_id,
    eventType: r.event_type,
    status: r.status,
    attempts: r.attempts,
    nextAttemptAt: r.next_attempt_at,
    lastStatusCode: r.last_status_code,
    lastError: r.last_error,
    lastDurationMs: r.last_duration_ms,
    deliveredAt: r.delivered_at,
    replays: r.replays,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

@Injectable()
export class WebhooksRepository {
  constructor(@Inject(KNEX) readonly db: Knex) {}

  endpoint(orgId: string, id: string): Promise<EndpointRow | undefined> {
    return this.db<EndpointRow>('webhook_endpoints').where({ id, organization_id: orgId }).first();
  }

  delivery(id: string): Promise<DeliveryRow | undefined> {
    return this.db<DeliveryRow>('webhook_deliveries').where({ id }).first();
  }
}
