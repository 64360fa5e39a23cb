/** A table's order, as Material's sort header gives it: a column key and a direction ('' = the rows' own order). */
export interface RowOrder {
  active: string;
  direction: 'asc' | 'desc' | '';
}

/** How to read each sortable column of a row. */
export type SortKeys<T> = Record<string, (row: T) => string | number | null | undefined>;

const isEmpty = (v: string | number | null | undefined) => v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v));

/**
 * The rows in a table's order: numbers by value, text by the locale with numbers inside read as
 * numbers (BF9 before BF10), empty cells (null, undefined, NaN) last in either direction; ties keep
 * the rows' own order (the report's rank; the sort is stable). A cleared sort or a column without a
 * reader gives the rows back as they came, copied. Cost O(n log n). Never throws.
 */
export function sortRows<T>(rows: readonly T[], order: RowOrder, keys: SortKeys<T>): T[] {
  const read = keys[order.active];
  if (!read || order.direction === '') return [...rows];
  const sign = order.direction === 'asc' ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index, value: read(row) }))
    .sort((a, b) => {
      if (isEmpty(a.value) || isEmpty(b.value)) return Number(isEmpty(a.value)) - Number(isEmpty(b.value)) || a.index - b.index;
      const c = typeof a.value === 'number' && typeof b.value === 'number'
        ? a.value - b.value
        : String(a.value).localeCompare(String(b.value), 'en', { numeric: true });
      return c * sign || a.index - b.index;
    })
    .map((x) => x.row);
}
