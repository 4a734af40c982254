import { describe, expect, it } from 'vitest';
import { passwordPatch, preferencesPatch } from './profileRules';

describe('preferencesPatch', () => {
  const me = { fullName: 'Tomas Okafor', unitSystem: 'metric', notifyRejections: 'each' };
  it('sends only what changed', () => {
    expect(preferencesPatch(me, { name: 'Tomas Okafor', unitSystem: 'imperial', notifyRejections: 'each' })).toEqual({ unitSystem: 'imperial' });
    expect(preferencesPatch(me, { name: ' Tomás Okafor ', unitSystem: 'metric', notifyRejections: 'digest' })).toEqual({ name: 'Tomás Okafor', notifyRejections: 'digest' });
  });
  it('sends nothing when nothing changed, and never an empty name', () => {
    expect(preferencesPatch(me, { name: 'Tomas Okafor', unitSystem: 'metric', notifyRejections: 'each' })).toBeNull();
    expect(preferencesPatch(me, { name: '   ', unitSystem: 'metric', notifyRejections: 'each' })).toBeNull();
  });
  it('leaves the notification setting alone when the API does not offer it', () => {
    expect(preferencesPatch({ fullName: 'A', unitSystem: 'metric' }, { name: 'A', unitSystem: 'metric', notifyRejections: 'off' })).toBeNull();
  });
});

describe('passwordPatch', () => {
  it('checks length and the repeat before asking the API', () => {
    expect(passwordPatch({ currentPassword: 'x', newPassword: 'short', confirmPassword: 'short' })).toEqual({ errors: { newPassword: 'Use at least 10 characters.' } });
    expect(passwordPatch({ currentPassword: 'x', newPassword: 'long enough 1', confirmPassword: 'long enough 2' })).toEqual({ errors: { confirmPassword: 'The two new passwords differ.' } });
    expect(passwordPatch({ currentPassword: 'old-one', newPassword: 'long enough 1', confirmPassword: 'long enough 1' })).toEqual({ currentPassword: 'old-one', newPassword: 'long enough 1' });
  });
  it('sends the drift mail choice only when it changed', () => {
    const current = { fullName: 'A', unitSystem: 'metric', notifyRejections: 'each', notifyDrift: 'each' };
    expect(preferencesPatch(current, { name: 'A', unitSystem: 'metric', notifyRejections: 'each', notifyDrift: 'off' })).toEqual({ notifyDrift: 'off' });
    expect(preferencesPatch(current, { name: 'A', unitSystem: 'metric', notifyRejections: 'each', notifyDrift: 'each' })).toBeNull();
    expect(preferencesPatch(current, { name: 'A', unitSystem: 'metric', notifyRejections: 'each', notifyDrift: 'weekly' })).toBeNull();
  });
});
