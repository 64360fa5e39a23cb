import { describe, expect, it } from 'vitest';
import { denseRelationshipMatrix } from './dense-relationship-matrix';

// Falconer & Mackay (1996) ch. 5: relationships of full sibs ½, half sibs ¼, parent–offspring ½.
describe('denseRelationshipMatrix', () => {
  it('gives the textbook relationships of sibs and parent–offspring', () => {
    // 0, 1, 2 founders; 3 and 4 full sibs (0 × 1); 5 half sib of 3 (0 × 2)
    const A = denseRelationshipMatrix({ sire: [-1, -1, -1, 0, 0, 0], dam: [-1, -1, -1, 1, 1, 2] });
    expect(A[3][4]).toBe(0.5);
    expect(A[3][5]).toBe(0.25);
    expect(A[0][3]).toBe(0.5);
    expect(A[1][2]).toBe(0);
    expect(A[3][3]).toBe(1);
  });

  it('gives 1 + F on the diagonal: offspring of full sibs F = ¼', () => {
    const A = denseRelationshipMatrix({ sire: [-1, -1, 0, 0, 2], dam: [-1, -1, 1, 1, 3] });
    expect(A[4][4]).toBe(1.25);
  });
});
