import { describe, expect, it } from 'vitest';
import { tsvField } from './tsv';

// Escapes as the MariaDB manual's LOAD DATA INFILE section lists them (\N for NULL, \\ \t \n \r).
describe('tsvField', () => {
  it('writes NULL as \\N and numbers as digits', () => {
    expect(tsvField(null)).toBe('\\N');
    expect(tsvField(42)).toBe('42');
  });
  it('escapes backslash, tab, newline and carriage return', () => {
    expect(tsvField('a\\b\tc\nd\re')).toBe('a\\\\b\\tc\\nd\\re');
    expect(tsvField('plain, "quoted"; text')).toBe('plain, "quoted"; text');
  });
});
