import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { CoreAdminContext } from 'react-admin';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { AcceptInvitationPage } from './AcceptInvitationPage';

describe('AcceptInvitationPage', () => {
  it('says which shop and role, prefills the name, and ends signed in', async () => {
    const session = { accessToken: 'a', accessTokenExpiresAt: '2099-01-01T00:00:00Z', refreshToken: 'r', refreshTokenExpiresAt: '2099-01-01T00:00:00Z', user: { id: 'u', name: 'Ada Brook' } };
    const dataProvider = {
      lookupInvitation: vi.fn(async () => ({ organization: { name: 'Harbour Foams' }, role: 'engineer', email: 'ada@example.test', name: 'Ada Brook', invitedBy: 'Ines Varga', expiresAt: '2099-01-01T00:00:00Z' })),
      acceptInvitation: vi.fn(async () => ({ email: 'ada@example.test', role: 'engineer', session })),
    };
    const authProvider = { login: vi.fn(async () => undefined), logout: vi.fn(async () => undefined), checkAuth: vi.fn(async () => undefined), checkError: vi.fn(async () => undefined), getPermissions: vi.fn(async () => []) };
    render(
      <MemoryRouter initialEntries={['/accept-invitation?token=tok-1']}>
        <CoreAdminContext dataProvider={dataProvider as never} authProvider={authProvider}>
          <AcceptInvitationPage />
        </CoreAdminContext>
      </MemoryRouter>,
    );
    const preview = await screen.findByTestId('invitation-preview');
    expect(preview).toHaveTextContent('Ines Varga invites you to Harbour Foams as');
    expect(preview).toHaveTextContent('ada@example.test');
    expect(dataProvider.lookupInvitation).toHaveBeenCalledWith('tok-1');
    expect(screen.getByLabelText(/Your name/)).toHaveValue('Ada Brook');
    fireEvent.change(screen.getByLabelText(/^Password/), { target: { value: 'a long passphrase' } });
    fireEvent.change(screen.getByLabelText(/Repeat the password/), { target: { value: 'a long passphrase' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create my account' }));
    await waitFor(() => expect(authProvider.login).toHaveBeenCalled());
    expect((authProvider.login.mock.calls[0] as unknown[])[0]).toEqual({ session });
  });
});
