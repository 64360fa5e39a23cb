import type { Breed } from '../domain/breed';
import { SEXES, type Sex } from '../domain/terms';

export interface PlausibleWeightRange {
  minGrams: number | null;
  maxGrams: number | null;
}

/** Ages (days) at which the minimum curve reaches the junior and the senior minimum. */
export const JUNIOR_MINIMUM_AGE_DAYS = 120;
export const SENIOR_MINIMUM_AGE_DAYS = 240;
export const LOW_FRACTION = 0.3;
export const HIGH_FRACTION = 1.3;

/**
 * The range outside which a weighing is probably a typing or unit mistake (to warn, never to
 * refuse). Common practice, no source; a plausibility guard of our own:
 * - minimum curve m(age): 0 g at birth, rising linearly to the junior minimum at 120 days
 *   (about when juniors start to show) and on to the senior minimum at 240 days (8 months),
 *   flat after; when the junior minimum is missing the curve runs straight to the senior one.
 *   Low bound = 30 % of m(age).
 * - high bound = 130 % of the senior maximum (whatever the age).
 * With no sex given, the lower of the two sexes' minimums and the higher maximum are used;
 * a missing limit gives a null bound. Cost O(1). Throws
 * `plausibleWeightRange requires a non-negative age in days`.
 */
export function plausibleWeightRange(breed: Breed, sex: Sex | null, ageDays: number): PlausibleWeightRange {
  if (!Number.isFinite(ageDays) || ageDays < 0) throw new Error('plausibleWeightRange requires a non-negative age in days');
  const sexes = sex ? [sex] : SEXES;
  const pick = (values: (number | null)[], f: (...v: number[]) => number) => {
    const known = values.filter((v): v is number => v !== null);
    return known.length > 0 ? f(...known) : null;
  };
  const seniorMin = pick(sexes.map((s) => breed.weightLimits[s].senior.minGrams), Math.min);
  const juniorMin = pick(sexes.map((s) => breed.weightLimits[s].junior.minGrams), Math.min);
  const seniorMax = pick(sexes.map((s) => breed.weightLimits[s].senior.maxGrams), Math.max);

  let curve: number | null = null;
  if (seniorMin !== null) {
    if (ageDays >= SENIOR_MINIMUM_AGE_DAYS) curve = seniorMin;
    else if (juniorMin === null) curve = (seniorMin * ageDays) / SENIOR_MINIMUM_AGE_DAYS;
    else if (ageDays <= JUNIOR_MINIMUM_AGE_DAYS) curve = (juniorMin * ageDays) / JUNIOR_MINIMUM_AGE_DAYS;
    else {
      const t = (ageDays - JUNIOR_MINIMUM_AGE_DAYS) / (SENIOR_MINIMUM_AGE_DAYS - JUNIOR_MINIMUM_AGE_DAYS);
      curve = juniorMin + t * (seniorMin - juniorMin);
    }
  } else if (juniorMin !== null) {
    curve = (juniorMin * Math.min(ageDays, JUNIOR_MINIMUM_AGE_DAYS)) / JUNIOR_MINIMUM_AGE_DAYS;
  }
  return {
    minGrams: curve === null ? null : Math.round(LOW_FRACTION * curve),
    maxGrams: seniorMax === null ? null : Math.round(HIGH_FRACTION * seniorMax),
  };
}
