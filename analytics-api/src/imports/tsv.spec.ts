import { describe, expect, it } from 'vitest';
import { Writable } from 'node:stream';
import { TsvLines, tsvField } from './tsv';

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

describe('TsvLines', () => {
  it('hands every line to the stream unchanged and in order, in batches, and for a line of its own size', async () => {
    const pieces: Buffer[] = [];
    const out = new Writable({ highWaterMark: 1 << 16, write(chunk: Buffer, _enc, done) { pieces.push(chunk); setImmediate(done); } });
    const lines = new TsvLines(out);
    const expected: string[] = [];
    for (let i = 0; i < 40_000; i++) {
      const line = `${i}\tCafé Ökonomie ${'€'.repeat(i % 7)}\t${i % 3 ? 'B' : '\\N'}\n`;
      expected.push(line);
      lines.add(line);
      if (i === 20_000) {
        const long = `${'x'.repeat(600_000)}\n`;
        expected.push(long);
        lines.add(long);
      }
      if (i % 5000 === 0) await lines.drained();
    }
    await lines.drained();
    expect(Buffer.concat(pieces).toString('utf8')).toBe(expected.join(''));
  });
});
