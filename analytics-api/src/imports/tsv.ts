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

const PIECE_BYTES = 1 << 20;

/**
 * Lines for a LOAD DATA file, encoded straight into 1 MiB buffers that go to the stream when
 * full: each line's string dies young, where a chunk's worth of concatenated lines would live
 * long enough to burden the garbage collector. `drained()` waits while the stream is behind.
 */
export class TsvLines {
  private piece = Buffer.allocUnsafe(PIECE_BYTES);
  private used = 0;
  private behind = false;

  constructor(private readonly out: NodeJS.WritableStream) {}

  add(line: string): void {
    if (this.used + line.length * 3 > PIECE_BYTES) this.spill();
    if (line.length * 3 > PIECE_BYTES) this.behind = !this.out.write(line) || this.behind;
    else this.used += this.piece.write(line, this.used);
  }

  /** Hands over what is buffered and resolves once the stream has room again. */
  async drained(): Promise<void> {
    this.spill();
    if (this.behind) await new Promise<void>((resolve) => this.out.once('drain', () => resolve()));
    this.behind = false;
  }

  private spill(): void {
    if (this.used === 0) return;
    this.behind = !this.out.write(this.piece.subarray(0, this.used)) || this.behind;
    this.piece = Buffer.allocUnsafe(PIECE_BYTES);
    this.used = 0;
  }
}
