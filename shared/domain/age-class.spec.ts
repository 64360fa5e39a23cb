import { describe, expect, it } from 'vitest';
import { ageClassOn, ageInDays } from './age-class';

// Thresholds: junior under 6 months, six-class intermediate 6 to under 8 months
// (common practice, no source). Dates below are counted by hand on a calendar.
describe('ageClassOn', () => {
  it('four-class: junior the day before 6 months, senior on the day', () => {
    expect(ageClassOn('2026-03-15', '2026-09-14', 'four-class')).toBe('junior');
    expect(ageClassOn('2026-03-15', '2026-09-15', 'four-class')).toBe('senior');
    // Eight months makes no difference to a four-class breed.
    expect(ageClassOn('2026-01-01', '2026-08-01', 'four-class')).toBe('senior');
  });

  it('six-class: intermediate from 6 to under 8 months', () => {
    expect(ageClassOn('2026-03-15', '2026-09-14', 'six-class')).toBe('junior');
    expect(ageClassOn('2026-03-15', '2026-09-15', 'six-class')).toBe('intermediate');
    expect(ageClassOn('2026-03-15', '2026-11-14', 'six-class')).toBe('intermediate');
    expect(ageClassOn('2026-03-15', '2026-11-15', 'six-class')).toBe('senior');
  });

  it('handles month ends: born Aug 31 turns 6 months on Feb 28, or Feb 29 in a leap year', () => {
    expect(ageClassOn('2026-08-31', '2027-02-27', 'four-class')).toBe('junior');
    expect(ageClassOn('2026-08-31', '2027-02-28', 'four-class')).toBe('senior');
    expect(ageClassOn('2027-08-31', '2028-02-28', 'four-class')).toBe('junior');
    expect(ageClassOn('2027-08-31', '2028-02-29', 'four-class')).toBe('senior');
    // Born Dec 31: 8 months is Aug 31.
    expect(ageClassOn('2025-12-31', '2026-08-30', 'six-class')).toBe('intermediate');
    expect(ageClassOn('2025-12-31', '2026-08-31', 'six-class')).toBe('senior');
  });

  it('refuses a show day before birth', () => {
    expect(() => ageClassOn('2026-05-01', '2026-04-30', 'four-class')).toThrow(
      'ageClassOn requires onDate on or after birthDate',
    );
  });
});

describe('ageInDays', () => {
  it('counts whole days, including a leap day', () => {
    expect(ageInDays('2026-03-15', '2026-03-15')).toBe(0);
    expect(ageInDays('2026-03-15', '2026-09-15')).toBe(184); // 16+30+31+30+31+31+15
    expect(ageInDays('2024-02-01', '2024-03-01')).toBe(29);
    expect(() => ageInDays('2026-03-15', '2026-03-14')).toThrow('ageInDays requires onDate on or after birthDate');
  });
});
