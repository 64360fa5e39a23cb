import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { CsvSplitter, MAX_RECORD_CHARS } from './csv-splitter';

/** Feeds the text in pieces of the given sizes (cycled) and collects every record. */
function splitInPieces(text: string, delimiter: string, sizes: number[]): string[][] {
  const splitter = new CsvSplitter(delimiter);
  const out: string[][] = [];
  for (let at = 0, k = 0; at < text.length; k++) {
    const size = sizes[k % sizes.length]!;
    out.push(...splitter.push(text.slice(at, at + size)));
    at += size;
  }
  out.push(...splitter.end());
  return out;
}

/** A small deterministic generator (the LCG of Numerical Recipes), so failures repeat. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

const ALPHABET = ['a', 'B', '7', ' ', ',', ';', '\t', '"', '\n', '\r\n', 'é', '€', 'x y'];

/** A well-formed CSV text (fields with a delimiter, quote or line break are quoted, quotes doubled). */
function randomCsv(rnd: () => number, delimiter: string, lineBreak: string): string {
  const rows: string[] = [];
  const width = 1 + Math.floor(rnd() * 5);
  for (let r = 0; r < 40; r++) {
    const cells: string[] = [];
    for (let c = 0; c < width; c++) {
      let cell = '';
      for (let k = Math.floor(rnd() * 6); k > 0; k--) cell += ALPHABET[Math.floor(rnd() * ALPHABET.length)];
      cells.push(/[",;\t\r\n]/.test(cell) || (cell === '' && rnd() < 0.2) ? `"${cell.replace(/"/g, '""')}"` : cell);
    }
    rows.push(cells.join(delimiter));
  }
  return rows.join(lineBreak) + (rnd() < 0.5 ? lineBreak : '');
}

describe('CsvSplitter', () => {
  it('agrees with Papa Parse on 600 random well-formed files, fed in pieces of every size from 1 character up', () => {
    const rnd = lcg(20260412);
    for (let file = 0; file < 600; file++) {
      const delimiter = [',', ';', '\t'][file % 3]!;
      const lineBreak = file % 2 ? '\r\n' : '\n';
      const text = randomCsv(rnd, delimiter, lineBreak);
      const reference = Papa.parse<string[]>(text, { delimiter, newline: lineBreak, skipEmptyLines: true }).data;
      const sizes = [1 + (file % 7), 1 + Math.floor(rnd() * 64), 3];
      const ours = splitInPieces(text, delimiter, sizes).filter((cells) => cells.length > 1 || cells[0] !== '');
      expect(ours, `file ${file}: ${JSON.stringify(text)}`).toEqual(reference);
    }
  });

  it('reads quoted delimiters, doubled quotes, line breaks inside quotes, CRLF and a last line without a break', () => {
    const text = 'ear,notes,sire\r\nA1,"calm; ""good"" doe\r\nsecond line",B2\r\nA2,5\'2" tall,\r\nA3,"",B4';
    expect(splitInPieces(text, ',', [5])).toEqual([
      ['ear', 'notes', 'sire'],
      ['A1', 'calm; "good" doe\r\nsecond line', 'B2'],
      ['A2', '5\'2" tall', ''],
      ['A3', '', 'B4'],
    ]);
  });

  it('ends lines at a lone carriage return, as old spreadsheet exports write them', () => {
    expect(splitInPieces('a,b\rc,d\r"e\rf",g\r', ',', [2])).toEqual([['a', 'b'], ['c', 'd'], ['e\rf', 'g']]);
  });

  it('refuses a quote that is never closed instead of holding the rest of the file', () => {
    const splitter = new CsvSplitter(',');
    splitter.push('ear,notes\nA1,"starts here\n');
    expect(() => splitter.push('x'.repeat(MAX_RECORD_CHARS))).toThrow('A quoted field is never closed');
  });
});
