import { describe, expect, it } from 'vitest';
import { MULTIPLIED_BASE, seasonPoints, type SeasonResult } from './season-points';

// Invented exhibitors and results; points worked by hand.
const results: SeasonResult[] = [
  { exhibitor: 'Hollow Oak', breed: 'Dwarf', placing: 1, entries: 8, awards: ['bestOfVariety'] },
  { exhibitor: 'Hollow Oak', breed: 'Lop', placing: 3, entries: 5, awards: [] },
  { exhibitor: 'Bramble Row', breed: 'Dwarf', placing: 2, entries: 8, awards: [] },
  { exhibitor: 'Bramble Row', breed: 'Dwarf', placing: 1, entries: 4, awards: ['bestOfBreed', 'bestInShow'] },
  { exhibitor: 'Cinder Hill', breed: 'Lop', placing: 1, entries: 5, awards: [] },
  { exhibitor: 'Cinder Hill', breed: 'Lop', placing: 7, entries: 9, awards: [] },
];

describe('seasonPoints', () => {
  it('multiplies the common show-rule base 6/4/3/2/1 by the animals in the class, plus bonuses', () => {
    const { byExhibitor, byExhibitorBreed } = seasonPoints(results, { kind: 'multiplied', base: MULTIPLIED_BASE, bonuses: { bestOfVariety: 5, bestOfBreed: 10, bestInShow: 20 } });
    // Hollow Oak: 6·8 + 5 + 3·5 = 68; Bramble Row: 4·8 + 6·4 + 10 + 20 = 86; Cinder Hill: 6·5 + 0 = 30
    expect(byExhibitor.map((s) => [s.exhibitor, s.points, s.rank])).toEqual([
      ['Bramble Row', 86, 1],
      ['Hollow Oak', 68, 2],
      ['Cinder Hill', 30, 3],
    ]);
    expect(byExhibitor[0]).toMatchObject({ results: 2, firsts: 1, awards: 2, breed: null });
    expect(byExhibitorBreed.map((s) => [s.breed, s.exhibitor, s.points, s.rank])).toEqual([
      ['Dwarf', 'Bramble Row', 86, 1],
      ['Dwarf', 'Hollow Oak', 53, 2],
      ['Lop', 'Cinder Hill', 30, 1],
      ['Lop', 'Hollow Oak', 15, 2],
    ]);
  });

  it('uses a flat table and shares ranks on equal points, listed by name', () => {
    const { byExhibitor } = seasonPoints(results, { kind: 'flat', table: [10, 7, 5] });
    // Hollow Oak 10 + 5 = 15, Bramble Row 7 + 10 = 17, Cinder Hill 10 + 0 = 10
    expect(byExhibitor.map((s) => [s.exhibitor, s.points, s.rank])).toEqual([
      ['Bramble Row', 17, 1],
      ['Hollow Oak', 15, 2],
      ['Cinder Hill', 10, 3],
    ]);
    const tied = seasonPoints(
      [
        { exhibitor: 'Zephyr Lane', breed: 'Dwarf', placing: 1, entries: 3, awards: [] },
        { exhibitor: 'Amber Gate', breed: 'Dwarf', placing: 1, entries: 3, awards: [] },
        { exhibitor: 'Moss Bank', breed: 'Dwarf', placing: 3, entries: 3, awards: [] },
      ],
      { kind: 'flat', table: [10, 7, 5] },
    );
    expect(tied.byExhibitor.map((s) => [s.exhibitor, s.rank])).toEqual([
      ['Amber Gate', 1],
      ['Zephyr Lane', 1],
      ['Moss Bank', 3],
    ]);
  });

  it('rejects impossible placings and negative points', () => {
    expect(() => seasonPoints([{ ...results[0], placing: 9 }], { kind: 'multiplied', base: MULTIPLIED_BASE })).toThrow('seasonPoints (Hollow Oak) requires placings in 1..entries (got 9 of 8)');
    expect(() => seasonPoints(results, { kind: 'flat', table: [-1] })).toThrow('seasonPoints requires non-negative finite points');
  });
});
