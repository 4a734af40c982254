import { actionsOf, ROLES } from '@pourgate/permissions';
import { describe, expect, it } from 'vitest';
import { MENU, menuFor, menuLabels } from './menuModel';

describe('menuFor', () => {
  it('gives the IT admin people, invitations, the audit log, API keys and the API reference', () => {
    expect(menuLabels(actionsOf('admin'))).toEqual(['Overview', 'People', 'Invitations', 'Audit log', 'API keys', 'API reference']);
    expect(menuFor(actionsOf('admin')).map((s) => s.id)).toEqual(['home', 'access', 'integration']);
  });

  it('gives the integrator API keys and the API reference, but nothing about people', () => {
    expect(menuLabels(actionsOf('integrator'))).toEqual(['Overview', 'API keys', 'API reference']);
    expect(menuFor(actionsOf('integrator')).map((s) => s.id)).toEqual(['home', 'integration']);
  });

  it('gives engineers and viewers only the overview for now, dropping empty sections', () => {
    expect(menuFor(actionsOf('engineer'))).toEqual([MENU[0]]);
    expect(menuLabels(actionsOf('viewer'))).toEqual(['Overview']);
  });

  it('follows the actions the API sent, not the role name', () => {
    // an admin whose organization withheld audit access still sees the rest of their menu
    const actions = actionsOf('admin').filter((a) => a !== 'audit:read');
    expect(menuLabels(actions)).toEqual(['Overview', 'People', 'Invitations', 'API keys', 'API reference']);
  });

  it('ignores unknown or malformed actions and survives a missing list', () => {
    expect(menuLabels(['profile:read', 'launch:rockets', 42, null])).toEqual(['Overview']);
    expect(menuFor(undefined)).toEqual([]);
    expect(menuFor(null)).toEqual([]);
  });

  it('names only actions that exist in the matrix', () => {
    const everything = ROLES.flatMap((r) => actionsOf(r));
    for (const link of MENU.flatMap((s) => s.links)) expect(everything).toContain(link.requires);
  });
});
