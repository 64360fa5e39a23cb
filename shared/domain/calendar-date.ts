/**
 * Calendar dates as ISO strings 'YYYY-MM-DD' (no time, no zone), the form every record uses.
 * Arithmetic goes through a day number (days since 1970-01-01, proleptic Gregorian), so
 * results never depend on the machine's time zone or daylight saving.
 * These few helpers belong together; each is O(1).
 */
export interface CalendarDate {
  readonly year: number;
  readonly month: number; // 1..12
  readonly day: number; // 1..31
}

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MS_PER_DAY = 86_400_000;

/** Days in a month of the proleptic Gregorian calendar (leap: divisible by 4, not by 100 unless by 400). */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/** True when year, month and day name a real calendar day. */
export function isCalendarDate(year: number, month: number, day: number): boolean {
  return (
    Number.isInteger(year) && Number.isInteger(month) && Number.isInteger(day) &&
    year >= 1 && year <= 9999 && month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month)
  );
}

/** Parts of a strict ISO date, or null when the text is not a real 'YYYY-MM-DD' day. */
export function parseIsoDate(text: string): CalendarDate | null {
  const m = ISO_DATE.exec(text);
  if (!m) return null;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  return isCalendarDate(year, month, day) ? { year, month, day } : null;
}

export function formatIsoDate({ year, month, day }: CalendarDate): string {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** @throws `<caller> requires an ISO date 'YYYY-MM-DD' (got "…")` */
export function requireIsoDate(text: string, caller: string): CalendarDate {
  const parts = parseIsoDate(text);
  if (!parts) throw new Error(`${caller} requires an ISO date 'YYYY-MM-DD' (got "${text}")`);
  return parts;
}

function dayNumber({ year, month, day }: CalendarDate): number {
  return Date.UTC(year, month - 1, day) / MS_PER_DAY;
}

function fromDayNumber(n: number): string {
  const d = new Date(n * MS_PER_DAY);
  return formatIsoDate({ year: d.getUTCFullYear(), month: d.getUTCMonth() + 1, day: d.getUTCDate() });
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return dayNumber(requireIsoDate(to, 'daysBetween')) - dayNumber(requireIsoDate(from, 'daysBetween'));
}

export function addDays(date: string, days: number): string {
  if (!Number.isInteger(days)) throw new Error('addDays requires a whole number of days');
  return fromDayNumber(dayNumber(requireIsoDate(date, 'addDays')) + days);
}

/**
 * The same day of the month `months` later; when that month is shorter, its last day
 * (Aug 31 + 6 months = Feb 28, or Feb 29 in a leap year). This is the usual reading of
 * "six months old" for an animal born on a month end.
 */
export function addMonths(date: string, months: number): string {
  if (!Number.isInteger(months)) throw new Error('addMonths requires a whole number of months');
  const { year, month, day } = requireIsoDate(date, 'addMonths');
  const index = year * 12 + (month - 1) + months;
  const y = Math.floor(index / 12);
  const m = (index % 12) + 1;
  return formatIsoDate({ year: y, month: m, day: Math.min(day, daysInMonth(y, m)) });
}
