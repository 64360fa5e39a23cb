import { describe, expect, it } from 'vitest';
import { addDays, addMonths, daysBetween, daysInMonth, parseIsoDate } from './calendar-date';

// Expected values are calendar facts checked by hand (Gregorian leap rule: 2024 and 2000 leap,
// 1900 and 2026 not).
describe('calendar dates', () => {
  it('knows month lengths and leap years', () => {
    expect(daysInMonth(2024, 2)).toBe(29);
    expect(daysInMonth(2026, 2)).toBe(28);
    expect(daysInMonth(1900, 2)).toBe(28);
    expect(daysInMonth(2000, 2)).toBe(29);
    expect(daysInMonth(2026, 4)).toBe(30);
  });

  it('parses only real ISO dates', () => {
    expect(parseIsoDate('2026-02-28')).toEqual({ year: 2026, month: 2, day: 28 });
    expect(parseIsoDate('2026-02-29')).toBeNull();
    expect(parseIsoDate('2026-2-3')).toBeNull();
    expect(parseIsoDate('2026-13-01')).toBeNull();
  });

  it('counts days across month and year ends', () => {
    expect(daysBetween('2026-01-01', '2026-12-01')).toBe(334);
    expect(daysBetween('2023-12-31', '2024-03-01')).toBe(61); // Jan 31 + Feb 29 + 1
    expect(daysBetween('2026-03-10', '2026-03-01')).toBe(-9);
    expect(addDays('2026-02-27', 2)).toBe('2026-03-01');
    expect(addDays('2024-02-27', 2)).toBe('2024-02-29');
  });

  it('adds months, clamping to the last day of a shorter month', () => {
    expect(addMonths('2026-08-31', 6)).toBe('2027-02-28');
    expect(addMonths('2027-08-31', 6)).toBe('2028-02-29');
    expect(addMonths('2026-01-31', 1)).toBe('2026-02-28');
    expect(addMonths('2026-05-15', 8)).toBe('2027-01-15');
    expect(addMonths('2026-03-31', -1)).toBe('2026-02-28');
  });

  it('names the caller when a date is malformed', () => {
    expect(() => daysBetween('2026/01/01', '2026-01-02')).toThrow(
      `daysBetween requires an ISO date 'YYYY-MM-DD' (got "2026/01/01")`,
    );
  });
});
