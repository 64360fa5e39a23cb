/**
 * Diagonal of the inverse of a dense symmetric positive-definite matrix, by Cholesky
 * factorisation C = L·L′ (Golub & Van Loan 2013, §4.2) and the triangular inverse
 * X = L⁻¹, diag(C⁻¹)_j = Σ_i X_ij². O(m³/3) time, O(m²) memory — for small systems only.
 *
 * @param matrix row-major m × m (left unchanged)
 * @returns the diagonal of C⁻¹, or null when C is not positive definite (to rounding)
 */
export function symmetricInverseDiagonal(matrix: Float64Array, m: number): Float64Array | null {
  if (matrix.length !== m * m) throw new Error(`symmetricInverseDiagonal requires an m × m matrix (m = ${m}, length ${matrix.length})`);
  const L = new Float64Array(matrix);
  let largest = 0;
  for (let j = 0; j < m; j++) largest = Math.max(largest, Math.abs(L[j * m + j]));
  const tiny = largest * m * Number.EPSILON;
  for (let j = 0; j < m; j++) {
    const rowJ = j * m;
    let pivot = L[rowJ + j];
    for (let k = 0; k < j; k++) pivot -= L[rowJ + k] * L[rowJ + k];
    if (!(pivot > tiny)) return null;
    const root = Math.sqrt(pivot);
    L[rowJ + j] = root;
    for (let i = j + 1; i < m; i++) {
      const rowI = i * m;
      let sum = L[rowI + j];
      for (let k = 0; k < j; k++) sum -= L[rowI + k] * L[rowJ + k];
      L[rowI + j] = sum / root;
    }
  }
  // Rows of X = L⁻¹ from L·X = I, and the column sums of squares of X as they appear.
  const X = new Float64Array(m * m);
  const diagonal = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const rowI = i * m;
    for (let k = 0; k < i; k++) {
      const lik = L[rowI + k];
      if (lik === 0) continue;
      const rowK = k * m;
      for (let j = 0; j <= k; j++) X[rowI + j] -= lik * X[rowK + j];
    }
    X[rowI + i] += 1;
    const inverseRoot = 1 / L[rowI + i];
    for (let j = 0; j <= i; j++) {
      const x = X[rowI + j] * inverseRoot;
      X[rowI + j] = x;
      diagonal[j] += x * x;
    }
  }
  return diagonal;
}
