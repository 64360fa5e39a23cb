/**
 * One field of a line for MariaDB's LOAD DATA (FIELDS TERMINATED BY '\t' ESCAPED BY '\\'):
 * null becomes \N; backslash, tab, newline and carriage return are escaped. O(length).
 */
export function tsvField(value: string | number | null): string {
  if (value === null) return '\\N';
  if (typeof value === 'number') return String(value);
  return /[\\\t\n\r]/.test(value) ? value.replace(/[\\\t\n\r]/g, (c) => ESCAPES[c]) : value;
}

const ESCAPES: Record<string, string> = { '\\': '\\\\', '\t': '\\t', '\n': '\\n', '\r': '\\r' };
