import { inverse, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { mulberry32 } from './random';
import { symmetricInverseDiagonal } from './symmetric-inverse-diagonal';

describe('symmetricInverseDiagonal', () => {
  it('matches the diagonal of ml-matrix inverse on random positive-definite matrices', () => {
    const rng = mulberry32(4);
    for (const m of [1, 2, 7, 40]) {
      const B = Matrix.rand(m, m, { random: rng });
      const C = B.mmul(B.transpose()).add(Matrix.eye(m, m).mul(0.1));
      const diagonal = symmetricInverseDiagonal(Float64Array.from(C.to1DArray()), m)!;
      const reference = inverse(C);
      for (let i = 0; i < m; i++) expect(diagonal[i]).toBeCloseTo(reference.get(i, i), 8);
    }
  });

  it('returns null for a singular matrix', () => {
    expect(symmetricInverseDiagonal(Float64Array.from([1, 1, 1, 1]), 2)).toBeNull();
  });
});
