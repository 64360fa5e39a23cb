import { describeAge, localToday } from './describe-age';

describe('describeAge', () => {
  it('counts days, then weeks, then calendar months, then years', () => {
    expect(describeAge('2026-11-30', '2026-11-30')).toBe('0 days');
    expect(describeAge('2026-11-29', '2026-11-30')).toBe('1 day');
    expect(describeAge('2026-11-01', '2026-11-30')).toBe('4 weeks');
    expect(describeAge('2026-08-01', '2026-11-20')).toBe('15 weeks');
    expect(describeAge('2026-05-15', '2026-11-30')).toBe('6 months');
    expect(describeAge('2024-11-30', '2026-11-30')).toBe('2 years');
    expect(describeAge('2023-09-10', '2026-11-30')).toBe('3 years 2 months');
  });

  // Calendar arithmetic as in the age classes: Aug 31 + 6 months = Feb 28 (non-leap 2027).
  it('counts a month-end birthday the way the age classes do', () => {
    expect(describeAge('2026-08-31', '2027-02-27')).toBe('5 months');
    expect(describeAge('2026-08-31', '2027-02-28')).toBe('6 months');
  });

  it('says nothing without a birth date or for a date still to come', () => {
    expect(describeAge(null, '2026-11-30')).toBe('');
    expect(describeAge('2026-12-01', '2026-11-30')).toBe('');
  });

  it('takes today from the local calendar', () => {
    expect(localToday(new Date(2026, 0, 5, 23, 30))).toBe('2026-01-05');
  });
});
