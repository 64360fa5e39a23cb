import { additiveRelationship } from './additive-relationship';
import type { Pedigree } from './pedigree';

/**
 * Expected inbreeding coefficient of the offspring of a planned mating: F = a_sd / 2,
 * half the additive relationship of the parents (Falconer & Mackay 1996, ch. 5).
 * O(A log A) with A the ancestors of the pair (see additiveRelationship).
 *
 * @throws as additiveRelationship
 */
export function expectedMatingInbreeding(pedigree: Pedigree, F: ArrayLike<number>, sire: number, dam: number): number {
  return additiveRelationship(pedigree, F, sire, dam) / 2;
}
