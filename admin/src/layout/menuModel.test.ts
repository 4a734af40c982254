import { actionsOf, ROLES } from '@pourgate/permissions';
import { describe, expect, it } from 'vitest';
import { MENU, menuFor, menuLabels } from './menuModel';

describe('menuFor', () => {
  const section = (actions: readonly unknown[], id: string) => menuFor(actions).find((s) => s.id === id)?.links.map((l) => l.label) ?? null;

  it('gives the IT admin people, invitations, the audit log, and the integration pages', () => {
    const admin = actionsOf('admin');
    expect(section(admin, 'access')).toEqual(['People', 'Invitations', 'Audit log', 'Job queues']);
    expect(section(admin, 'integration')).toEqual(['API keys', 'Devices', 'Webhooks', 'Delivery log', 'API reference']);
    expect(menuFor(admin).map((s) => s.id)).toContain('home');
  });

  it('gives the integrator devices, webhooks and the delivery log beside API keys, but nothing about people', () => {
    const integrator = actionsOf('integrator');
    expect(section(integrator, 'integration')).toEqual(['API keys', 'Devices', 'Webhooks', 'Delivery log', 'API reference']);
    expect(section(integrator, 'access')).toBeNull();
  });

  it('gives the engineer the shop data and the devices, but no keys or webhooks', () => {
    const engineer = actionsOf('engineer');
    expect(section(engineer, 'shop')).toEqual(['Material systems', 'Lots', 'Molds', 'Work orders', 'Cup tests']);
    expect(section(engineer, 'integration')).toEqual(['Devices']);
    expect(section(engineer, 'access')).toBeNull();
  });

  it('lets everyone reach their own profile, and viewers read the shop data', () => {
    for (const role of ROLES) expect(section(actionsOf(role), 'home')).toEqual(['Overview', 'Your profile']);
    expect(section(actionsOf('viewer'), 'shop')).toEqual(['Material systems', 'Lots', 'Molds', 'Work orders', 'Cup tests']);
    expect(section(actionsOf('viewer'), 'integration')).toEqual(['Devices']);
  });

  it('follows the actions the API sent, not the role name', () => {
    // an admin whose organization withheld audit access still sees the rest of their menu
    const actions = actionsOf('admin').filter((a) => a !== 'audit:read');
    expect(section(actions, 'access')).toEqual(['People', 'Invitations', 'Job queues']);
    expect(menuLabels(actions)).not.toContain('Audit log');
  });

  it('ignores unknown or malformed actions and survives a missing list', () => {
    expect(menuLabels(['profile:read', 'launch:rockets', 42, null])).toEqual(['Overview', 'Your profile']);
    expect(menuFor(undefined)).toEqual([]);
    expect(menuFor(null)).toEqual([]);
  });

  it('names only actions that exist in the matrix', () => {
    const everything = ROLES.flatMap((r) => actionsOf(r));
    for (const link of MENU.flatMap((s) => s.links)) expect(everything).toContain(link.requires);
  });
});

describe('the shop floor section', () => {
  const floor = (role: (typeof ROLES)[number]) => menuFor(actionsOf(role)).find((s) => s.id === 'floor')?.links.map((l) => l.id) ?? [];

  it('gives the engineer the review queue, the readings, batches, the calculator, scrap and defects and logger imports', () => {
    expect(floor('engineer')).toEqual(['readings', 'reading-log', 'live', 'control', 'batches', 'calculator', 'defects', 'imports']);
  });

  it('keeps the review queue to those who may waive or uphold', () => {
    expect(floor('viewer')).toEqual(['reading-log', 'live', 'control', 'batches', 'calculator', 'defects']);
    expect(floor('admin')).toEqual(['reading-log', 'live', 'control', 'batches', 'calculator', 'defects']);
    // the integrator checks a new scale or logger connection in the readings list
    expect(floor('integrator')).toEqual(['reading-log', 'live', 'control', 'batches', 'calculator', 'defects', 'imports']);
  });
});
