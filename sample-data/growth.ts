import type { Breed } from '../shared/domain/breed';
import type { Sex } from '../shared/domain/terms';
import { SIMULATION } from './scenario';

/** Breeds whose senior ideal is 9 lb or more grow on the "large" parameters. */
export function sizeClass(breed: Breed): 'small' | 'large' {
  return breed.classScheme === 'six-class' ? 'large' : 'small';
}

/** The breed's senior ideal (or the midpoint of its limits) as the mature weight A, in grams. */
export function matureWeight(breed: Breed, sex: Sex): number {
  const s = breed.weightLimits[sex].senior;
  const a = s.idealGrams ?? (s.minGrams !== null && s.maxGrams !== null ? (s.minGrams + s.maxGrams) / 2 : s.maxGrams ?? s.minGrams);
  if (a === null) throw new Error(`matureWeight requires senior weight limits for ${breed.name}`);
  return a;
}

/**
 * Mean weight of a breed and sex at an age, by the Gompertz curve
 * W(t) = A · exp(−ln(A/W0) · e^(−k t)) (Gompertz 1825; the usual form for rabbit growth),
 * with A the mature weight, W0 = A × birth fraction and k the daily rate. O(1).
 */
export function meanWeightAt(breed: Breed, sex: Sex, ageDays: number): number {
  const size = sizeClass(breed);
  const a = matureWeight(breed, sex);
  const b = Math.log(1 / SIMULATION.birthWeightFraction[size]);
  return a * Math.exp(-b * Math.exp(-SIMULATION.gompertzRatePerDay[size] * ageDays));
}
