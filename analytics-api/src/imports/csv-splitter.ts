import { AppError } from '../http/app-error';

/** The longest record accepted: no field of any import kind comes near it; an unclosed quote does. */
export const MAX_RECORD_CHARS = 1 << 20;

const QUOTE = 34;
const LF = 10;
const CR = 13;

/**
 * Splits decoded CSV text, fed in pieces of any size, into records of cells (RFC 4180: a field
 * that starts with a double quote runs to the closing quote, may hold delimiters and line
 * breaks, and writes a quote as two; LF or CRLF ends a record). A quote inside an unquoted
 * field is an ordinary character, as in spreadsheets' own exports. Lines without quotes are cut
 * with the engine's native split, which is where nearly all rows of a large file go.
 * O(text length); holds at most one unfinished record between pieces.
 * Throws AppError 'unclosed-quote' when a record grows past MAX_RECORD_CHARS.
 */
export class CsvSplitter {
  private pending = '';
  private readonly delimiterCode: number;

  constructor(private readonly delimiter: string) {
    if (delimiter.length !== 1) throw new Error(`CsvSplitter requires a one-character delimiter (got "${delimiter}")`);
    this.delimiterCode = delimiter.charCodeAt(0);
  }

  /** The records the piece completes; an unfinished last record waits for the next piece. */
  push(piece: string): string[][] {
    return this.split(this.pending + piece, false);
  }

  /** The last record, when the text did not end with a line break. */
  end(): string[][] {
    return this.split(this.pending, true);
  }

  private split(text: string, final: boolean): string[][] {
    const records: string[][] = [];
    const n = text.length;
    let at = 0;
    let nextQuote = text.indexOf('"');
    let nextCr = text.indexOf('\r');
    while (at < n) {
      if (nextQuote !== -1 && nextQuote < at) nextQuote = text.indexOf('"', at);
      if (nextCr !== -1 && nextCr < at) nextCr = text.indexOf('\r', at);
      let lf = text.indexOf('\n', at);
      if (lf === -1) lf = n;
      // The line ends at LF, or at a CR that stands alone (old spreadsheet exports).
      const lineEnd = nextCr !== -1 && nextCr < lf ? nextCr : lf;
      if (nextQuote === -1 || nextQuote > lineEnd) {
        // No quote before the line ends: the fast path.
        if (lineEnd === n || (lineEnd === n - 1 && lineEnd === nextCr)) {
          if (!final) break; // the line, or its CRLF, may go on in the next piece
        }
        records.push(text.slice(at, lineEnd).split(this.delimiter));
        at = lineEnd === nextCr && text.charCodeAt(lineEnd + 1) === LF ? lineEnd + 2 : lineEnd + 1;
        continue;
      }
      const quoted = this.quotedRecord(text, at, final);
      if (!quoted) break;
      records.push(quoted.cells);
      at = quoted.next;
    }
    this.pending = at < n ? text.slice(at) : '';
    if (this.pending.length > MAX_RECORD_CHARS) {
      throw new AppError('unclosed-quote', 'A quoted field is never closed (a " opens a field and no " ends it): check the quotes in the file', 400);
    }
    return records;
  }

  /** Reads one record holding quotes, cell by cell; null when the text ends inside it (more to come). */
  private quotedRecord(text: string, start: number, final: boolean): { cells: string[]; next: number } | null {
    const n = text.length;
    const cells: string[] = [];
    let i = start;
    for (;;) {
      let cell = '';
      if (text.charCodeAt(i) === QUOTE) {
        i++;
        for (;;) {
          const close = text.indexOf('"', i);
          if (close === -1) {
            if (!final) return null;
            cell += text.slice(i);
            i = n;
            break;
          }
          cell += text.slice(i, close);
          if (text.charCodeAt(close + 1) === QUOTE) {
            cell += '"';
            i = close + 2;
            continue;
          }
          i = close + 1;
          break;
        }
      }
      // An unquoted field, or what follows a closing quote, runs to the next delimiter or line
      // break. Reaching the end of the piece means waiting for more: a closing quote there may
      // be the first of a doubled one.
      let j = i;
      while (j < n) {
        const c = text.charCodeAt(j);
        if (c === this.delimiterCode || c === LF || c === CR) break;
        j++;
      }
      if (j === n && !final) return null;
      cell += text.slice(i, j);
      cells.push(cell);
      if (j === n) return { cells, next: n };
      const c = text.charCodeAt(j);
      if (c === this.delimiterCode) {
        i = j + 1;
        continue;
      }
      if (c === CR) {
        if (j + 1 === n && !final) return null; // a CRLF may be cut between pieces
        return { cells, next: text.charCodeAt(j + 1) === LF ? j + 2 : j + 1 };
      }
      return { cells, next: j + 1 };
    }
  }
}
