import { toCsv } from '@shared/csv/to-csv';
import { sortRows } from '../panels/sort-rows';
import { parent, placementReport } from './sire-dam-fixtures';
import { PARENT_SORT, indexText, scoreText, shareText, sireDamCsvColumns } from './sire-dam-table';

describe('sire & dam table', () => {
  it('says each figure with its interval or standard error', () => {
    const p = parent(1, 'BF053', 1, 24, 22);
    expect(shareText(p.topK)).toBe('92 % (77–100 %)');
    expect(indexText(p)).toBe('1.30 (1.10–1.50)');
    expect(scoreText(p)).toBe('0.70 ± 0.05');
    expect(indexText({ ...p, placementIndex: null })).toBe('—');
    // Seen in the demo: 15 of 15 placed, index 15/11.9 = 1.26 with the interval collapsed to 1.117–1.117.
    expect(indexText({ ...p, placementIndex: { index: 1.2605, lower: 1.117, upper: 1.117, observed: 15, expected: 11.9 } })).toBe('1.26 (no interval)');
  });

  it('sorts by entries and by index, keeping the report’s rank for ties', () => {
    const rows = [parent(1, 'A', 1, 24, 22), parent(2, 'B', 2, 40, 30), parent(3, 'C', 3, 24, 10, { placementIndex: null })];
    expect(sortRows(rows, { active: 'entries', direction: 'desc' }, PARENT_SORT).map((p) => p.parent.earId)).toEqual(['B', 'A', 'C']);
    expect(sortRows(rows, { active: 'index', direction: 'asc' }, PARENT_SORT).map((p) => p.parent.earId)).toEqual(['A', 'B', 'C']);
  });

  it('exports the numbers of every parent, dams named as dams', () => {
    const report = placementReport([parent(1, 'BF078', 1, 42, 30)], { parentKind: 'dam' });
    const [header, row] = toCsv(report.parents, sireDamCsvColumns(report)).split('\r\n');
    expect(header!.startsWith('Rank,Dam ear ID,Name,Breed,Variety,Outside parent,Offspring results,Offspring shown,Placed top 3,Top-3 share')).toBe(true);
    expect(row!.startsWith('1,BF078,,Mini Rex,Castor,no,42,14,30,0.7143')).toBe(true);
  });
});
