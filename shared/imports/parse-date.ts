import { formatIsoDate, isCalendarDate, parseIsoDate } from '../domain/calendar-date';

export type DateOrder = 'iso' | 'mdy';
export type ParsedDate = { ok: true; date: string } | { ok: false; message: string };

const MDY = /^(\d{1,2})\/(\d{1,2})\/(\d{2}|\d{4})$/;
const ISO_SHAPE = /^\d{4}-\d{1,2}-\d{1,2}$/;

/**
 * Reads a date cell into 'YYYY-MM-DD'. ISO 'YYYY-MM-DD' is always accepted. With order 'mdy',
 * M/D/YYYY and MM/DD/YY are accepted too (two-digit years are 20YY: the records are of living
 * herds). A slashed date under order 'iso' is refused rather than guessed, because 03/04/2026
 * reads as 4 March in one country and 3 April in another.
 * Cost O(length). Never throws; a refusal carries a message a breeder can act on.
 */
export function parseDate(text: string, order: DateOrder): ParsedDate {
  const t = text.trim();
  if (t === '') return { ok: false, message: 'no date given' };
  const iso = parseIsoDate(t);
  if (iso) return { ok: true, date: formatIsoDate(iso) };
  if (ISO_SHAPE.test(t)) return { ok: false, message: `date ${t} does not exist on the calendar (write YYYY-MM-DD, e.g. 2026-03-04)` };

  const m = MDY.exec(t);
  if (!m) return { ok: false, message: `date "${t}" is not understood: write YYYY-MM-DD, e.g. 2026-03-04` };
  if (order !== 'mdy') {
    return {
      ok: false,
      message: `date "${t}" is ambiguous (month/day or day/month?): write YYYY-MM-DD, or choose month/day/year as the file's date order`,
    };
  }
  const month = Number(m[1]);
  const day = Number(m[2]);
  const year = m[3]!.length === 2 ? 2000 + Number(m[3]) : Number(m[3]);
  if (month > 12) return { ok: false, message: `date "${t}" has no month ${month}: this file's dates are read as month/day/year` };
  if (!isCalendarDate(year, month, day)) return { ok: false, message: `date "${t}" does not exist on the calendar` };
  return { ok: true, date: formatIsoDate({ year, month, day }) };
}
