import { previewCsv, readFileStart } from './csv-preview';

describe('previewCsv', () => {
  it('reads a semicolon file with a byte-order mark as a spreadsheet program saves it', () => {
    const text = '\uFEFFear_id;weighed_on;weight\r\nBF101;2026-11-20;5 lb 12 oz\r\nBF102;2026-11-20;"4 lb; 9 oz"\r\n';
    const preview = previewCsv(text);
    expect(preview).toMatchObject({ delimiter: ';', hadBom: true, looksBinary: false });
    expect(preview.headers).toEqual(['ear_id', 'weighed_on', 'weight']);
    expect(preview.rows).toEqual([['BF101', '2026-11-20', '5 lb 12 oz'], ['BF102', '2026-11-20', '4 lb; 9 oz']]);
  });

  it('shows only the first rows and trims header spaces', () => {
    const lines = ['Ear ID , Sex', ...Array.from({ length: 9 }, (_, i) => `A${i},doe`)].join('\n');
    const preview = previewCsv(lines, 3);
    expect(preview.headers).toEqual(['Ear ID', 'Sex']);
    expect(preview.rows.map((r) => r[0])).toEqual(['A0', 'A1', 'A2']);
    expect(preview.delimiter).toBe(',');
  });

  it('tells a binary file from text', () => {
    expect(previewCsv('PK\u0003\u0004\u0000\u0000binary').looksBinary).toBe(true);
  });

  it('keeps the byte-order mark of a chosen file for the preview to report', async () => {
    const { text } = await readFileStart(new Blob([new Uint8Array([0xef, 0xbb, 0xbf]), 'a;b\n1;2\n']));
    expect(previewCsv(text)).toMatchObject({ hadBom: true, delimiter: ';', headers: ['a', 'b'] });
  });

  it('reads only the start of a large file', async () => {
    const big = new Blob(['a,b\n', '1,2\n'.repeat(40_000)]);
    const { text, truncated } = await readFileStart(big);
    expect(truncated).toBe(true);
    expect(text.length).toBe(64 * 1024);
  });
});
