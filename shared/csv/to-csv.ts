import Papa from 'papaparse';

export interface CsvColumn<T> {
  header: string;
  value: (row: T) => string | number | boolean | null | undefined;
}

/**
 * A table as CSV (RFC 4180 quoting, CRLF line ends, header row first) through papaparse's
 * `unparse` with `escapeFormulae`: a text cell beginning with = + - @ (or tab / carriage return)
 * is prefixed with a single quote, so a spreadsheet opening the file shows it as text instead of
 * running it as a formula (OWASP, "CSV Injection"). Numbers are written as numbers.
 * Null and undefined become empty cells. Cost O(rows × columns). Never throws for plain values.
 */
export function toCsv<T>(rows: readonly T[], columns: readonly CsvColumn<T>[]): string {
  return Papa.unparse(
    { fields: columns.map((c) => c.header), data: rows.map((r) => columns.map((c) => c.value(r) ?? '')) },
    { escapeFormulae: true, newline: '\r\n' },
  );
}
