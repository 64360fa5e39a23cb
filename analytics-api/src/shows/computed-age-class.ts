import { ageClassOn } from '@shared/domain/age-class';
import type { AgeClass, ClassScheme } from '@shared/domain/terms';

/**
 * The age class an animal belonged in on a show day, by its birth date and its breed's class
 * scheme (ageClassOn); null when the birth date is unknown or later than the show (a data error
 * the result cannot be judged by). Without a breed, the four-class scheme: junior and senior are
 * then certain, only intermediate is not told apart. Cost O(1). Never throws.
 */
export function computedAgeClass(birthDate: string | null, showDate: string, scheme: ClassScheme | null): AgeClass | null {
  if (!birthDate || birthDate > showDate) return null;
  return ageClassOn(birthDate, showDate, scheme ?? 'four-class');
}
