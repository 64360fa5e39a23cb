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

const LINES_PER_WRITE = 512;

/**
 * Lines for a LOAD DATA file, handed to the stream a few hundred at a time as one string: one
 * write and one encoding per batch instead of per line, and each line's string still dies
 * young. `drained()` hands over the rest and waits while the stream is behind.
 */
export class TsvLines {
  private batch: string[] = [];
  private behind = false;

  constructor(private readonly out: NodeJS.WritableStream) {}

  add(line: string): void {
    this.batch.push(line);
    if (this.batch.length === LINES_PER_WRITE) this.spill();
  }

  async drained(): Promise<void> {
    this.spill();
    if (this.behind) await new Promise<void>((resolve) => this.out.once('drain', () => resolve()));
    this.behind = false;
  }

  private spill(): void {
    if (this.batch.length === 0) return;
    this.behind = !this.out.write(this.batch.join('')) || this.behind;
    this.batch = [];
  }
}
