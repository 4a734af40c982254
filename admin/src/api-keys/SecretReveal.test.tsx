import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { ApiKeyWithSecret } from '../views/sdk';
import { SecretReveal } from './SecretReveal';

const key: ApiKeyWithSecret = {
  id: 'k1',
  name: 'Bench scale 2',
  kind: 'device',
  environment: 'test',
  scopes: ['readings:write'],
  deviceId: null,
  prefix: 'pgd_test_9f3a',
  state: 'active',
  createdAt: '2025-06-02T08:00:00Z',
  createdBy: { id: 'u1', name: 'Ada Admin' },
  lastUsedAt: null,
  lastUsedIp: null,
  expiresAt: null,
  revokedAt: null,
  rotatedFrom: null,
  graceUntil: null,
  secret: 'pgd_test_9f3a.s3cr3t-value-only-once',
};

describe('SecretReveal', () => {
  it('shows the secret with a clear once-only warning', () => {
    render(<SecretReveal apiKey={key} onDone={() => undefined} />);
    expect(screen.getByTestId('api-key-secret')).toHaveTextContent('pgd_test_9f3a.s3cr3t-value-only-once');
    expect(screen.getByText('You will not see this secret again')).toBeInTheDocument();
  });

  it('copies the secret to the clipboard', async () => {
    const writeText = vi.fn(async () => undefined);
    Object.defineProperty(navigator, 'clipboard', { value: { writeText }, configurable: true });
    render(<SecretReveal apiKey={key} onDone={() => undefined} />);
    fireEvent.click(screen.getByTestId('copy-secret'));
    await waitFor(() => expect(screen.getByTestId('copy-secret')).toHaveTextContent('Copied'));
    expect(writeText).toHaveBeenCalledWith('pgd_test_9f3a.s3cr3t-value-only-once');
  });

  it('selects the secret when the clipboard is refused', async () => {
    Object.defineProperty(navigator, 'clipboard', { value: { writeText: vi.fn(async () => Promise.reject(new Error('denied'))) }, configurable: true });
    render(<SecretReveal apiKey={key} onDone={() => undefined} />);
    fireEvent.click(screen.getByTestId('copy-secret'));
    await screen.findByText(/press Ctrl-C/);
    expect(window.getSelection()?.toString()).toBe('pgd_test_9f3a.s3cr3t-value-only-once');
  });

  it('lets the person leave only after confirming they stored it', () => {
    const onDone = vi.fn();
    render(<SecretReveal apiKey={key} onDone={onDone} />);
    const done = screen.getByTestId('secret-done');
    expect(done).toBeDisabled();
    fireEvent.click(screen.getByLabelText('I have stored the secret somewhere safe'));
    expect(done).toBeEnabled();
    fireEvent.click(done);
    expect(onDone).toHaveBeenCalledTimes(1);
  });
});
