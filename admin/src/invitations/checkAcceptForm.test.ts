import { describe, expect, it } from 'vitest';
import { checkAcceptForm, MIN_PASSWORD_LENGTH } from './AcceptInvitationPage';

describe('checkAcceptForm', () => {
  it('accepts a name and two matching passwords of the minimum length', () => {
    const pw = 'x'.repeat(MIN_PASSWORD_LENGTH);
    expect(checkAcceptForm({ name: 'Rosa Ferreira', password: pw, confirm: pw })).toEqual({});
  });

  it('asks for a name, a long enough password and the same password twice', () => {
    expect(checkAcceptForm({ name: '   ', password: 'short', confirm: 'other' })).toEqual({
      name: 'Enter the name your colleagues know you by.',
      password: `Use at least ${MIN_PASSWORD_LENGTH} characters.`,
      confirm: 'The two passwords differ.',
    });
  });
});
