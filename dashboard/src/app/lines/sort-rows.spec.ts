import { sortRows } from './sort-rows';

const rows = [
  { name: 'Slate', n: 18 },
  { name: 'ember', n: null },
  { name: 'Ash 10', n: 92 },
  { name: 'Ash 9', n: 18 },
];
const keys = { name: (r: (typeof rows)[number]) => r.name, n: (r: (typeof rows)[number]) => r.n };

describe('sortRows', () => {
  it('orders numbers by value with ties in their own order, empty cells last both ways', () => {
    expect(sortRows(rows, { active: 'n', direction: 'asc' }, keys).map((r) => r.name)).toEqual(['Slate', 'Ash 9', 'Ash 10', 'ember']);
    expect(sortRows(rows, { active: 'n', direction: 'desc' }, keys).map((r) => r.name)).toEqual(['Ash 10', 'Slate', 'Ash 9', 'ember']);
  });

  it('orders text ignoring case with numbers inside read as numbers', () => {
    expect(sortRows(rows, { active: 'name', direction: 'asc' }, keys).map((r) => r.name)).toEqual(['Ash 9', 'Ash 10', 'ember', 'Slate']);
  });

  it('keeps the rows as they came without a direction or for an unknown column, and copies them', () => {
    expect(sortRows(rows, { active: 'n', direction: '' }, keys)).toEqual(rows);
    const same = sortRows(rows, { active: 'colour', direction: 'asc' }, keys);
    expect(same).toEqual(rows);
    expect(same).not.toBe(rows);
  });
});
