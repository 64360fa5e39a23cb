/**
 * A square sparse matrix in compressed sparse row form (both triangles stored when
 * symmetric): the entries of row r are column[k], value[k] for k in rowStart[r]..rowStart[r+1]−1,
 * columns ascending.
 */
export interface SparseMatrix {
  n: number;
  rowStart: Int32Array;
  column: Int32Array;
  value: Float64Array;
}

/**
 * Builds a SparseMatrix from coordinate triplets (row, column, value), summing duplicates,
 * by two stable counting sorts (by column, then by row). O(t + n) for t triplets.
 *
 * @param count how many triplets of the arrays to use
 */
export function sparseFromTriplets(n: number, rows: Int32Array, columns: Int32Array, values: Float64Array, count: number): SparseMatrix {
  const byColumn = countingOrder(columns, count, n, null);
  const byRow = countingOrder(rows, count, n, byColumn);
  const rowStart = new Int32Array(n + 1);
  const column = new Int32Array(count);
  const value = new Float64Array(count);
  let k = 0;
  let q = 0;
  for (let r = 0; r < n; r++) {
    rowStart[r] = k;
    let last = -1;
    while (q < count && rows[byRow[q]] === r) {
      const t = byRow[q++];
      if (columns[t] === last) {
        value[k - 1] += values[t];
      } else {
        last = columns[t];
        column[k] = last;
        value[k++] = values[t];
      }
    }
  }
  rowStart[n] = k;
  return { n, rowStart, column: column.slice(0, k), value: value.slice(0, k) };
}

/** Stable counting sort of triplet positions (taken in `within` order if given) by key. */
function countingOrder(keys: Int32Array, count: number, n: number, within: Int32Array | null): Int32Array {
  const start = new Int32Array(n + 1);
  for (let t = 0; t < count; t++) start[keys[t] + 1]++;
  for (let r = 0; r < n; r++) start[r + 1] += start[r];
  const order = new Int32Array(count);
  for (let q = 0; q < count; q++) {
    const t = within === null ? q : within[q];
    order[start[keys[t]]++] = t;
  }
  return order;
}
