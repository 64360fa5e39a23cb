import { csvFileName, downloadCsv } from './csv-download';

describe('downloadCsv', () => {
  it('saves the rows as a CSV file with a BOM, formula cells escaped', async () => {
    let saved: Blob | undefined;
    const create = vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
      saved = blob as Blob;
      return 'blob:test';
    });
    const revoke = vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    const clicked: string[] = [];
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicked.push(this.download);
    });

    downloadCsv('shows.csv', [{ name: '=Winter', n: 3 }], [
      { header: 'Show', value: (r) => r.name },
      { header: 'Results', value: (r) => r.n },
    ]);

    expect(clicked).toEqual(['shows.csv']);
    const bytes = new Uint8Array(await saved!.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    // OWASP "CSV Injection": a cell starting with = is prefixed with a single quote (and then quoted).
    expect(new TextDecoder().decode(bytes.slice(3))).toBe('Show,Results\r\n"\'=Winter",3');
    await new Promise((r) => setTimeout(r, 1));
    expect(revoke).toHaveBeenCalledWith('blob:test');
    expect(document.querySelector('a[download]')).toBeNull();
    [create, revoke, click].forEach((s) => s.mockRestore());
  });
});

describe('csvFileName', () => {
  it('joins words and dates into a plain file name', () => {
    expect(csvFileName('Quillmere Valley Winter Show', '2026-01-17')).toBe('quillmere-valley-winter-show-2026-01-17.csv');
    expect(csvFileName('Brackenfold’s imports', null)).toBe('brackenfold-s-imports.csv');
    expect(csvFileName('—')).toBe('table.csv');
  });
});
