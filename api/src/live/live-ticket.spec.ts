import { describe, expect, it } from '@jest/globals';
import { signTicket, verifyTicket } from './live-ticket.js';

describe('live-stream tickets', () => {
  const secret = 'a-test-secret-of-at-least-32-characters';
  const claims = { o: 'org-1', p: 'user-1', pk: 'user' as const, s: 'station-1', exp: 2_000_000_000 };

  it('round-trips its claims', () => {
    expect(verifyTicket(signTicket(claims, secret), secret, 1_900_000_000_000)).toEqual(claims);
  });

  it('refuses an expired ticket, another key and a changed body', () => {
    const t = signTicket(claims, secret);
    expect(verifyTicket(t, secret, 2_000_000_000_000)).toBeNull();
    expect(verifyTicket(t, `${secret}-other`, 1_900_000_000_000)).toBeNull();
    const forged = signTicket({ ...claims, o: 'org-2' }, secret).split('.')[0] + '.' + t.split('.')[1];
    expect(verifyTicket(forged, secret, 1_900_000_000_000)).toBeNull();
    expect(verifyTicket('not-a-ticket', secret)).toBeNull();
  });
});
