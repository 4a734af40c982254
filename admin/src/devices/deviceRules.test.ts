import { describe, expect, it } from 'vitest';
import { calibrationView, daysUntil } from './deviceRules';

describe('calibrationView', () => {
  const today = '2026-12-02';
  it('flags a past due date as overdue, with the days past', () => {
    expect(calibrationView({ calibrationDue: '2026-11-20', calibrationOverdue: true, retired: false }, today)).toEqual({ label: 'Overdue 12 d', tone: 'bad', overdue: true });
  });
  it('reminds within 30 days and stays quiet beyond', () => {
    expect(calibrationView({ calibrationDue: '2026-12-02', calibrationOverdue: false, retired: false }, today)?.label).toBe('Due today');
    expect(calibrationView({ calibrationDue: '2026-12-20', calibrationOverdue: false, retired: false }, today)).toMatchObject({ label: 'Due in 18 d', tone: 'caution' });
    expect(calibrationView({ calibrationDue: '2027-06-30', calibrationOverdue: false, retired: false }, today)).toMatchObject({ tone: 'good', overdue: false });
  });
  it('trusts the API when it says overdue although the local day disagrees (time zones)', () => {
    expect(calibrationView({ calibrationDue: '2026-12-02', calibrationOverdue: true, retired: false }, today)?.overdue).toBe(true);
  });
  it('has nothing to say without a date', () => {
    expect(calibrationView({ calibrationDue: null, calibrationOverdue: false, retired: false }, today)).toBeNull();
  });
  it('counts whole days across month ends', () => {
    expect(daysUntil('2027-01-01', '2026-12-31')).toBe(1);
  });
});
