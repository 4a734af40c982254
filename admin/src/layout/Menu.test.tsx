import { actionsOf, type Role } from '@pourgate/permissions';
import { render, screen, within } from '@testing-library/react';
import { AdminContext, type AuthProvider } from 'react-admin';
import { describe, expect, it } from 'vitest';
import { Menu } from './Menu';

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
    expect(await entriesFor('admin')).toEqual(['overview', 'users', 'invitations', 'audit-events', 'api-keys', 'docs']);
    const docs = document.querySelector('[data-menu-entry="docs"]')!;
    expect(docs.getAttribute('href')).toBe('/docs');
    expect(docs.getAttribute('target')).toBe('_blank');
  });

  it('renders only the integrator entries', async () => {
    expect(await entriesFor('integrator')).toEqual(['overview', 'api-keys', 'docs']);
  });

  it('renders only the overview for a viewer', async () => {
    expect(await entriesFor('viewer')).toEqual(['overview']);
  });
});
