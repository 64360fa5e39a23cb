import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { toCsv } from './to-csv';

interface Row { id: string; note: string | null; grams: number | null }
const columns = [
  { header: 'Ear ID', value: (r: Row) => r.id },
  { header: 'Note', value: (r: Row) => r.note },
  { header: 'Grams', value: (r: Row) => r.grams },
];

describe('toCsv', () => {
  // Formula-leading characters per OWASP "CSV Injection": = + - @ (and tab, carriage return).
  it('escapes cells that a spreadsheet would run as formulas', () => {
    const csv = toCsv([{ id: '=SUM(A1)', note: '@cmd', grams: 1 }, { id: '+1', note: '-2+3', grams: 2 }], columns);
    const lines = csv.split('\r\n');
    expect(lines[1]).toBe(`"'=SUM(A1)","'@cmd",1`);
    expect(lines[2]).toBe(`"'+1","'-2+3",2`);
  });

  it('quotes delimiters, quotes and newlines (RFC 4180) and leaves empty cells for null', () => {
    const csv = toCsv([{ id: 'FH 1', note: 'calm, "good"\nmother', grams: null }], columns);
    expect(csv).toBe('Ear ID,Note,Grams\r\nFH 1,"calm, ""good""\nmother",');
    // Reading it back gives the same cells.
    expect(Papa.parse(csv).data).toEqual([['Ear ID', 'Note', 'Grams'], ['FH 1', 'calm, "good"\nmother', '']]);
  });

  it('writes numbers as numbers (a negative number is not escaped as a formula)', () => {
    expect(toCsv([{ id: 'A', note: null, grams: -5 }], columns).split('\r\n')[1]).toBe('A,,-5');
  });
});
