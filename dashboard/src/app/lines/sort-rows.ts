/** A table's order: a column key and a direction ('' = the rows' own order). */
export interface RowOrder {
  active: string;
  direction: 'asc' | 'desc' | '';
}

/** How to read each sortable column of a row. */
export type SortKeys<T> = Record<string, (row: T) => string | number | null>;

/**
 * The rows in a table's order: numbers by value, text by the locale, empty cells (null, NaN)
 * last in either direction; ties keep the rows' own order (the sort is stable). A column without
 * a reader leaves the order as it is. Cost O(n log n). Never throws.
 */
export function sortRows<T>(rows: readonly T[], order: RowOrder, keys: SortKeys<T>): T[] {
  const read = keys[order.active];
  if (!read || order.direction === '') return [...rows];
  const sign = order.direction === 'asc' ? 1 : -1;
  const empty = (v: string | number | null) => v === null || (typeof v === 'number' && Number.isNaN(v));
  return rows
    .map((row, index) => ({ row, index, value: read(row) }))
    .sort((a, b) => {
      if (empty(a.value) || empty(b.value)) return Number(empty(a.value)) - Number(empty(b.value)) || a.index - b.index;
      const c = typeof a.value === 'number' && typeof b.value === 'number'
        ? a.value - b.value
        : String(a.value).localeCompare(String(b.value), 'en', { numeric: true });
      return c * sign || a.index - b.index;
    })
    .map((x) => x.row);
}
