import { actionsOf, type Role } from '@pourgate/permissions';
import { render, screen, within } from '@testing-library/react';
import { AdminContext, type AuthProvider } from 'react-admin';
import { describe, expect, it } from 'vitest';
import { Menu } from './Menu';
import { menuFor } from './menuModel';

const modelIds = (role: Role) => menuFor(actionsOf(role)).flatMap((s) => s.links.map((l) => l.id));

function authFor(role: Role): AuthProvider {
  return {
    login: async () => undefined,
    logout: async () => undefined,
    checkAuth: async () => undefined,
    checkError: async () => undefined,
    getPermissions: async () => actionsOf(role),
  };
}

async function entriesFor(role: Role) {
  render(
    <AdminContext authProvider={authFor(role)}>
      <Menu />
    </AdminContext>,
  );
  const nav = await screen.findByRole('menu', { name: 'Main menu' }).catch(() => screen.findByLabelText('Main menu'));
  await within(nav).findByText('Overview');
  return [...nav.querySelectorAll('[data-menu-entry]')].map((el) => el.getAttribute('data-menu-entry'));
}

describe('<Menu>', () => {
  it('renders the admin entries, the docs link opening in a new tab', async () => {
    const ids = await entriesFor('admin');
    expect(ids).toEqual(modelIds('admin'));
    expect(ids).toEqual(expect.arrayContaining(['overview', 'users', 'invitations', 'audit-events', 'api-keys', 'webhook-endpoints', 'webhook-deliveries', 'docs']));
    const docs = document.querySelector('[data-menu-entry="docs"]')!;
    expect(docs.getAttribute('href')).toBe('/docs');
    expect(docs.getAttribute('target')).toBe('_blank');
  });

  it('renders only the integrator entries', async () => {
    const ids = await entriesFor('integrator');
    expect(ids).toEqual(modelIds('integrator'));
    expect(ids).toEqual(expect.arrayContaining(['api-keys', 'devices', 'webhook-endpoints', 'webhook-deliveries', 'docs']));
    expect(ids).not.toContain('users');
  });

  it('renders only reading pages for a viewer', async () => {
    const ids = await entriesFor('viewer');
    expect(ids).toEqual(modelIds('viewer'));
    expect(ids).toEqual(expect.arrayContaining(['overview', 'profile', 'material-systems', 'devices']));
    for (const admin of ['users', 'api-keys', 'webhook-endpoints', 'audit-events']) expect(ids).not.toContain(admin);
  });
});
