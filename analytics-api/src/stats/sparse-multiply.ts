import type { SparseMatrix } from './sparse-matrix';

/**
 * out = M·x for a SparseMatrix M. O(non-zeros).
 *
 * @param out written over (allocated when omitted)
 */
export function sparseMultiply(matrix: SparseMatrix, x: ArrayLike<number>, out = new Float64Array(matrix.n)): Float64Array {
  const { n, rowStart, column, value } = matrix;
  for (let r = 0; r < n; r++) {
    let sum = 0;
    for (let k = rowStart[r], end = rowStart[r + 1]; k < end; k++) sum += value[k] * x[column[k]];
    out[r] = sum;
  }
  return out;
}
