import { sortRows } from './sort-rows';

const rows = [
  { name: 'Slate', n: 18 as number | null | undefined },
  { name: 'ember', n: null },
  { name: 'BF10', n: 92 },
  { name: 'BF9', n: 18 },
  { name: 'Ash', n: undefined },
];
type Row = (typeof rows)[number];
const keys = { name: (r: Row) => r.name, n: (r: Row) => r.n };
const names = (list: Row[]) => list.map((r) => r.name);

describe('sortRows', () => {
  it('orders numbers by value with ties in their own order, empty cells last both ways', () => {
    expect(names(sortRows(rows, { active: 'n', direction: 'asc' }, keys))).toEqual(['Slate', 'BF9', 'BF10', 'ember', 'Ash']);
    expect(names(sortRows(rows, { active: 'n', direction: 'desc' }, keys))).toEqual(['BF10', 'Slate', 'BF9', 'ember', 'Ash']);
  });

  it('orders text ignoring case, with numbers inside read as numbers (BF9 before BF10)', () => {
    expect(names(sortRows(rows, { active: 'name', direction: 'asc' }, keys))).toEqual(['Ash', 'BF9', 'BF10', 'ember', 'Slate']);
  });

  it('keeps the rows as they came without a direction or for an unknown column, and copies them', () => {
    expect(sortRows(rows, { active: 'n', direction: '' }, keys)).toEqual(rows);
    const same = sortRows(rows, { active: 'colour', direction: 'asc' }, keys);
    expect(same).toEqual(rows);
    expect(same).not.toBe(rows);
  });
});
