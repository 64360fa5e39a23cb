import { addMonths, daysBetween, requireIsoDate } from './calendar-date';
import type { AgeClass, ClassScheme } from './terms';

/** Junior: under 6 months on the day (both schemes). Common practice, no source. */
export const JUNIOR_UNTIL_MONTHS = 6;
/** Six-class breeds: intermediate from 6 to under 8 months, senior from 8. Common practice, no source. */
export const INTERMEDIATE_UNTIL_MONTHS = 8;

/**
 * The age class an animal shows in on a given day.
 * four-class: junior while onDate < birthDate + 6 months, else senior;
 * six-class: junior below 6 months, intermediate from 6 to under 8 months, senior from 8.
 * "+ n months" is the same day of the month n months on, or that month's last day when it is
 * shorter: a kit born Aug 31 turns 6 months on Feb 28 (Feb 29 in a leap year).
 * Thresholds are common practice, no source; check the rules of the show.
 * Cost O(1). Throws `ageClassOn requires onDate on or after birthDate` and on malformed dates.
 */
export function ageClassOn(birthDate: string, onDate: string, scheme: ClassScheme): AgeClass {
  requireIsoDate(onDate, 'ageClassOn');
  if (onDate < birthDate) throw new Error('ageClassOn requires onDate on or after birthDate');
  if (onDate < addMonths(birthDate, JUNIOR_UNTIL_MONTHS)) return 'junior';
  if (scheme === 'six-class' && onDate < addMonths(birthDate, INTERMEDIATE_UNTIL_MONTHS)) return 'intermediate';
  return 'senior';
}

/**
 * Age in whole days on a day (0 on the birth date). Cost O(1).
 * Throws `ageInDays requires onDate on or after birthDate` and on malformed dates.
 */
export function ageInDays(birthDate: string, onDate: string): number {
  const days = daysBetween(birthDate, onDate);
  if (days < 0) throw new Error('ageInDays requires onDate on or after birthDate');
  return days;
}
