import type { Action } from '@pourgate/permissions';
import { knownActions } from '../auth/access';

export interface MenuLink {
  id: string;
  label: string;
  /** A console route (hash router path) or, with `external`, a same-origin URL. */
  to: string;
  requires: Action;
  external?: boolean;
  /** An external page that needs a pass first: POST here, then open `to` (the queue dashboard). */
  pass?: string;
}

export interface MenuSection {
  id: string;
  label: string;
  links: MenuLink[];
}

/**
 * Every entry of the side menu and the action it needs. A person sees a section only when they
 * hold at least one of its entries; later pages (shop floor, webhooks) add entries here.
 */
export const MENU: readonly MenuSection[] = [
  {
    id: 'home',
    label: 'Workspace',
    links: [
      { id: 'overview', label: 'Overview', to: '/', requires: 'profile:read' },
      { id: 'profile', label: 'Your profile', to: '/profile', requires: 'profile:read' },
    ],
  },
  {
    id: 'floor',
    label: 'Shop floor',
    links: [
      { id: 'readings', label: 'Review queue', to: '/readings', requires: 'readings:review' },
      { id: 'reading-log', label: 'Readings', to: '/reading-log', requires: 'readings:read' },
      { id: 'live', label: 'Live station view', to: '/live', requires: 'readings:read' },
      { id: 'control', label: 'Control charts', to: '/control', requires: 'control:read' },
      { id: 'batches', label: 'Batches', to: '/batches', requires: 'shop:read' },
      { id: 'calculator', label: 'Targets calculator', to: '/calculator', requires: 'targets:read' },
      { id: 'defects', label: 'Scrap and defects', to: '/defects', requires: 'shop:read' },
      { id: 'imports', label: 'Logger imports', to: '/imports', requires: 'imports:write' },
    ],
  },
  {
    id: 'shop',
    label: 'Shop data',
    links: [
      { id: 'material-systems', label: 'Material systems', to: '/material-systems', requires: 'shop:read' },
      { id: 'lots', label: 'Lots', to: '/lots', requires: 'shop:read' },
      { id: 'molds', label: 'Molds', to: '/molds', requires: 'shop:read' },
      { id: 'work-orders', label: 'Work orders', to: '/work-orders', requires: 'shop:read' },
      { id: 'qc-cup-tests', label: 'Cup tests', to: '/qc-cup-tests', requires: 'shop:read' },
    ],
  },
  {
    id: 'access',
    label: 'Access',
    links: [
      { id: 'users', label: 'People', to: '/users', requires: 'people:read' },
      { id: 'invitations', label: 'Invitations', to: '/invitations', requires: 'people:read' },
      { id: 'audit-events', label: 'Audit log', to: '/audit-events', requires: 'audit:read' },
      { id: 'queues', label: 'Job queues', to: '/queues/', requires: 'queues:read', external: true, pass: '/v1/admin/queue-sessions' },
    ],
  },
  {
    id: 'integration',
    label: 'Integration',
    links: [
      { id: 'api-keys', label: 'API keys', to: '/api-keys', requires: 'api-keys:read' },
      { id: 'devices', label: 'Devices', to: '/devices', requires: 'devices:read' },
      { id: 'webhook-endpoints', label: 'Webhooks', to: '/webhook-endpoints', requires: 'webhooks:read' },
      { id: 'webhook-deliveries', label: 'Delivery log', to: '/webhook-deliveries', requires: 'webhooks:read' },
      { id: 'docs', label: 'API reference', to: '/docs', requires: 'api-keys:read', external: true },
    ],
  },
];

/** The sections and entries a person holding `actions` sees, in menu order. */
export function menuFor(actions: readonly unknown[] | null | undefined, menu: readonly MenuSection[] = MENU): MenuSection[] {
  const held = knownActions(actions);
  return menu
    .map((section) => ({ ...section, links: section.links.filter((l) => held.has(l.requires)) }))
    .filter((section) => section.links.length > 0);
}

/** Flat list of entry labels, handy for tests and the browser suite's expectations. */
export function menuLabels(actions: readonly unknown[] | null | undefined): string[] {
  return menuFor(actions).flatMap((s) => s.links.map((l) => l.label));
}
