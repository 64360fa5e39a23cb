import { ancestorShares } from './ancestor-shares';
import { mendelianSamplingVariance } from './mendelian-sampling-variance';
import { checkAnimals, type Pedigree } from './pedigree';

/**
 * Additive genetic relationship a_ij between two animals (twice the coancestry; 1 + F_i
 * when i = j), from A = T·D·T′: a_ij = Σ_k T_ik T_jk d_k over the common ancestors k
 * (including i or j themselves), with T the ancestor shares (see ancestorShares) and d_k the
 * Mendelian sampling variances. Source: Meuwissen & Luo (1992) Genet. Sel. Evol. 24:305;
 * Mrode (2014) §2.2. O(A log A) with A the ancestors of i and j — fast for one pair in a
 * pedigree of millions.
 *
 * @param F inbreeding coefficients of the whole pedigree (inbreedingCoefficients)
 * @throws when i or j is not an animal of the pedigree, or F has the wrong length
 */
export function additiveRelationship(pedigree: Pedigree, F: ArrayLike<number>, i: number, j: number): number {
  checkAnimals(pedigree, F, [i, j], 'additiveRelationship');
  if (i === j) return 1 + F[i];
  const sharesI = ancestorShares(pedigree, i, 'additiveRelationship');
  const sharesJ = ancestorShares(pedigree, j, 'additiveRelationship');
  const [small, large] = sharesI.size <= sharesJ.size ? [sharesI, sharesJ] : [sharesJ, sharesI];
  let a = 0;
  for (const [k, share] of small) {
    const other = large.get(k);
    if (other !== undefined) a += share * other * mendelianSamplingVariance(pedigree.sire[k], pedigree.dam[k], F);
  }
  return a;
}
