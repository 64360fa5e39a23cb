export type SortDirection = 'asc' | 'desc' | '';

/**
 * Rows ordered by one column for a sortable table: numbers numerically, text in natural order
 * (BF9 before BF10), missing values last either way; equal values keep their given order (the
 * report's rank). A cleared sort gives the rows back as they came. O(n log n).
 */
export function sortRows<T>(rows: readonly T[], value: (row: T) => number | string | null | undefined, dir: SortDirection): T[] {
  if (!dir) return [...rows];
  const sign = dir === 'asc' ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index, v: value(row) }))
    .sort((a, b) => {
      const aMissing = a.v === null || a.v === undefined;
      const bMissing = b.v === null || b.v === undefined;
      if (aMissing || bMissing) return aMissing === bMissing ? a.index - b.index : aMissing ? 1 : -1;
      const order = typeof a.v === 'string' ? a.v.localeCompare(String(b.v), 'en', { numeric: true }) : (a.v as number) - (b.v as number);
      return sign * order || a.index - b.index;
    })
    .map((x) => x.row);
}
