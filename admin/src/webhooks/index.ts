import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { WebhookDelivery, WebhookEndpoint } from '../views/sdk';

export const webhookEndpoints = {
  list: lazy(() => import('./EndpointList')),
  icon: menuIcons['webhook-endpoints'],
  recordRepresentation: (e: WebhookEndpoint) => e.url,
  options: { label: 'Webhooks' },
};

export const webhookDeliveries = {
  list: lazy(() => import('./DeliveryList')),
  icon: menuIcons['webhook-deliveries'],
  recordRepresentation: (d: WebhookDelivery) => `${d.eventType} ${d.eventId.slice(0, 8)}`,
  options: { label: 'Delivery log' },
};
