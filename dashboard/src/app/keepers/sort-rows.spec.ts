import { sortRows } from './sort-rows';

describe('sortRows', () => {
  const rows = [
    { id: 'BF10', n: 3 },
    { id: 'BF9', n: null },
    { id: 'BF100', n: 1 },
    { id: 'BF2', n: 3 },
  ];
  it('orders numbers, keeps ties in the given order and puts missing values last both ways', () => {
    expect(sortRows(rows, (r) => r.n, 'asc').map((r) => r.id)).toEqual(['BF100', 'BF10', 'BF2', 'BF9']);
    expect(sortRows(rows, (r) => r.n, 'desc').map((r) => r.id)).toEqual(['BF10', 'BF2', 'BF100', 'BF9']);
  });
  it('orders ear IDs naturally (BF9 before BF10) and gives the rows back when cleared', () => {
    expect(sortRows(rows, (r) => r.id, 'asc').map((r) => r.id)).toEqual(['BF2', 'BF9', 'BF10', 'BF100']);
    expect(sortRows(rows, (r) => r.id, '')).toEqual(rows);
  });
});
