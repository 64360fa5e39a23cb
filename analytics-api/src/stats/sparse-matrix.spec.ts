import { describe, expect, it } from 'vitest';
import { sparseFromTriplets } from './sparse-matrix';
import { sparseMultiply } from './sparse-multiply';

describe('sparseFromTriplets and sparseMultiply', () => {
  it('sums duplicates, sorts columns and multiplies like the dense matrix', () => {
    // dense [[1, 0, 2], [0, 0, 0], [3, 4, 5]] written with duplicates and out of order
    const rows = Int32Array.from([2, 0, 2, 0, 2, 2, 0]);
    const columns = Int32Array.from([2, 2, 0, 0, 1, 2, 2]);
    const values = Float64Array.from([2, 1.5, 3, 1, 4, 3, 0.5]);
    const m = sparseFromTriplets(3, rows, columns, values, 7);
    expect(Array.from(m.rowStart)).toEqual([0, 2, 2, 5]);
    expect(Array.from(m.column)).toEqual([0, 2, 0, 1, 2]);
    expect(Array.from(m.value)).toEqual([1, 2, 3, 4, 5]);
    expect(Array.from(sparseMultiply(m, [1, 10, 100]))).toEqual([201, 0, 543]);
  });
});
