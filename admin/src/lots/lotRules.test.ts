import { describe, expect, it } from 'vitest';
import { addDays, expiryView } from './lotRules';

describe('expiryView', () => {
  const today = '2026-12-02';
  it('marks past lots expired, with how long ago', () => {
    expect(expiryView({ expiresOn: '2026-11-12', expired: true }, today)).toEqual({ label: 'Expired 20 d ago', tone: 'bad', state: 'expired' });
  });
  it('highlights lots within 30 days as expiring soon', () => {
    expect(expiryView({ expiresOn: '2026-12-20', expired: false }, today)).toMatchObject({ state: 'soon', tone: 'caution', label: 'Expires in 18 d' });
    expect(expiryView({ expiresOn: '2027-01-01', expired: false }, today).state).toBe('soon');
    expect(expiryView({ expiresOn: '2027-01-02', expired: false }, today).state).toBe('ok');
  });
  it('treats the last day as still usable but urgent', () => {
    expect(expiryView({ expiresOn: today, expired: false }, today)).toMatchObject({ state: 'soon', label: 'Last day today' });
  });
  it('adds days across a year end', () => {
    expect(addDays('2026-12-20', 30)).toBe('2027-01-19');
  });
});
