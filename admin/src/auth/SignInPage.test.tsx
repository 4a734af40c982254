import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { AdminContext, HttpError, type AuthProvider } from 'react-admin';
import { describe, expect, it, vi } from 'vitest';
import { SignInPage } from './SignInPage';

function renderWith(login: AuthProvider['login']) {
  const authProvider: AuthProvider = {
    login,
    logout: async () => undefined,
    checkAuth: async () => Promise.reject({ message: false }),
    checkError: async () => undefined,
    getPermissions: async () => [],
  };
  render(
    <AdminContext authProvider={authProvider}>
      <SignInPage />
    </AdminContext>,
  );
}

function submit(email: string, password: string) {
  fireEvent.change(screen.getByLabelText(/E-mail/), { target: { value: email } });
  fireEvent.change(screen.getByLabelText(/^Password/), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('<SignInPage>', () => {
  it('sends the e-mail and password to the auth provider', async () => {
    const login = vi.fn(async () => undefined);
    renderWith(login);
    submit('admin@demo.test', 'pourgate-demo');
    await waitFor(() => expect(login).toHaveBeenCalledWith({ email: 'admin@demo.test', password: 'pourgate-demo' }));
  });

  it('says plainly when the credentials do not match', async () => {
    renderWith(async () => Promise.reject(new HttpError('Unauthorized', 401, { fieldErrors: [] })));
    submit('admin@demo.test', 'wrong');
    expect(await screen.findByTestId('sign-in-error')).toHaveTextContent('That e-mail and password do not match an active account.');
  });

  it('counts down the wait the API asked for when throttled, and blocks the button meanwhile', async () => {
    renderWith(async () => Promise.reject(new HttpError('Too many failed sign-ins', 429, { fieldErrors: [], retryAfter: 42 })));
    submit('admin@demo.test', 'wrong');
    const alert = await screen.findByTestId('sign-in-error');
    expect(alert).toHaveTextContent(/Too many sign-in attempts from here\. Try again in 4[12] s\./);
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeDisabled();
  });
});
