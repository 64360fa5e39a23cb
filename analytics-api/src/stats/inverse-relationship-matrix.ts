import { mendelianSamplingVariance } from './mendelian-sampling-variance';
import { checkPedigree, type Pedigree } from './pedigree';
import { sparseFromTriplets, type SparseMatrix } from './sparse-matrix';

/**
 * The inverse of the additive relationship matrix, A⁻¹ = (T⁻¹)′D⁻¹T⁻¹, by Henderson's rules
 * with inbreeding (Quaas 1976, Biometrics 32:949; Mrode 2014, §2.3): each animal i with
 * b_i = 1/d_i (see mendelianSamplingVariance) adds b_i·q·q′ where q = e_i − ½e_sire − ½e_dam
 * (unknown parents dropped): b_i to (i,i), −b_i/2 to (i,parent) and (parent,i), b_i/4 to
 * every (parent,parent′) pair. O(n) time and memory, about 7 non-zeros per animal.
 *
 * @param F inbreeding coefficients (inbreedingCoefficients), length n
 * @returns A⁻¹ with both triangles stored
 * @throws when the pedigree is malformed or F has the wrong length
 */
export function inverseRelationshipMatrix(pedigree: Pedigree, F: ArrayLike<number>): SparseMatrix {
  const n = checkPedigree(pedigree, 'inverseRelationshipMatrix');
  if (F.length !== n) throw new Error(`inverseRelationshipMatrix requires F of length ${n} (got ${F.length})`);
  const capacity = 9 * n;
  const rows = new Int32Array(capacity);
  const columns = new Int32Array(capacity);
  const values = new Float64Array(capacity);
  let count = 0;
  const index = [0, 0, 0];
  const coefficient = [0, 0, 0];
  for (let i = 0; i < n; i++) {
    const s = pedigree.sire[i];
    const d = pedigree.dam[i];
    const b = 1 / mendelianSamplingVariance(s, d, F);
    let m = 0;
    index[m] = i;
    coefficient[m++] = 1;
    if (s >= 0) {
      index[m] = s;
      coefficient[m++] = -0.5;
    }
    if (d >= 0 && d === s) coefficient[1] -= 0.5; // the same parent twice (selfing)
    else if (d >= 0) {
      index[m] = d;
      coefficient[m++] = -0.5;
    }
    for (let x = 0; x < m; x++) {
      for (let y = 0; y < m; y++) {
        rows[count] = index[x];
        columns[count] = index[y];
        values[count++] = b * coefficient[x] * coefficient[y];
      }
    }
  }
  return sparseFromTriplets(n, rows, columns, values, count);
}
