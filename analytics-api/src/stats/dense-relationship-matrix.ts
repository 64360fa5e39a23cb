import { checkPedigree, type Pedigree } from './pedigree';

/**
 * The full additive relationship matrix A by the tabular method (Emik & Terrill 1949;
 * Mrode 2014, §2.1): a_ii = 1 + ½a_{sire,dam}, a_ij = ½(a_{j,sire(i)} + a_{j,dam(i)}) for
 * j < i, unknown parents contributing 0. O(n²) time and memory — for small pedigrees (a herd's
 * relationship table) and as an independent check of the fast methods.
 *
 * @returns rows of A
 * @throws when the pedigree is malformed (see checkPedigree)
 */
export function denseRelationshipMatrix(pedigree: Pedigree): Float64Array[] {
  const n = checkPedigree(pedigree, 'denseRelationshipMatrix');
  const A = Array.from({ length: n }, () => new Float64Array(n));
  for (let i = 0; i < n; i++) {
    const s = pedigree.sire[i];
    const d = pedigree.dam[i];
    for (let j = 0; j < i; j++) {
      const a = 0.5 * ((s >= 0 ? A[j][s] : 0) + (d >= 0 ? A[j][d] : 0));
      A[i][j] = a;
      A[j][i] = a;
    }
    A[i][i] = 1 + (s >= 0 && d >= 0 ? 0.5 * A[s][d] : 0);
  }
  return A;
}
