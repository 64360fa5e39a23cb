import { toCsv, type CsvColumn } from '@shared/csv/to-csv';

/**
 * Saves a table the browser already holds as a CSV file (tables the API cannot export itself).
 * The file starts with a byte-order mark so spreadsheet programs read accented names as UTF-8;
 * cells are escaped against formulas by toCsv. Cost O(rows × columns).
 */
export function downloadCsv<T>(fileName: string, rows: readonly T[], columns: readonly CsvColumn<T>[], doc: Document = document): void {
  const blob = new Blob(['\uFEFF', toCsv(rows, columns)], { type: 'text/csv;charset=utf-8' });
  const url = URL.createObjectURL(blob);
  downloadUrl(fileName, url, doc);
  // Revoked after the click has been handled; revoking at once can cancel the download.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** Saves what a URL (object or data URL) holds as a file, through a temporary link. */
export function downloadUrl(fileName: string, url: string, doc: Document = document): void {
  const link = doc.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  doc.body.append(link);
  link.click();
  link.remove();
}

/** A file name from words and a date: "Quillmere Winter Show" → "quillmere-winter-show-2026-01-17.csv". */
export function csvFileName(...parts: (string | null | undefined)[]): string {
  const stem = parts
    .filter((p): p is string => !!p)
    .join(' ')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return `${stem || 'table'}.csv`;
}
