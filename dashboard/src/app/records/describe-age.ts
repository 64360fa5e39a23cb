import { addMonths, daysBetween } from '@shared/domain/calendar-date';

/**
 * An age as breeders say it: days for the first two weeks, weeks until 16 weeks (the age of
 * weaning and first weighings), whole calendar months until two years, then years and months.
 * A month is counted as in the age classes (shared/domain/age-class): "6 months" from the same
 * day of the month six months on, or that month's last day when it is shorter.
 * Cost O(months of age) for the month count. Empty text for no birth date or one after `today`.
 */
export function describeAge(birthDate: string | null, today: string): string {
  if (!birthDate || birthDate > today) return '';
  const days = daysBetween(birthDate, today);
  if (days < 14) return plural(days, 'day');
  if (days < 16 * 7) return plural(Math.floor(days / 7), 'week');
  let months = 0;
  while (addMonths(birthDate, months + 1) <= today) months++;
  if (months < 24) return plural(months, 'month');
  const years = Math.floor(months / 12);
  const rest = months % 12;
  return rest === 0 ? plural(years, 'year') : `${plural(years, 'year')} ${plural(rest, 'month')}`;
}

function plural(n: number, unit: string): string {
  return `${n} ${unit}${n === 1 ? '' : 's'}`;
}

/** Today as 'YYYY-MM-DD' in the breeder's own time zone (the day they see on the calendar). */
export function localToday(now: Date = new Date()): string {
  const p = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())}`;
}
