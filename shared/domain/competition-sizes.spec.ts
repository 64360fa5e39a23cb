import { describe, expect, it } from 'vitest';
import { type ClassResultLine, competitionSizes } from './competition-sizes';

const line = (
  breed: string, variety: string | null, sex: 'buck' | 'doe', ageClass: 'junior' | 'senior',
  entries: number, exhibitors: number,
): ClassResultLine => ({ breed, variety, sex, ageClass, entriesInClass: entries, exhibitorsInClass: exhibitors });

// Hand-computed: Black has classes of 4 (2 exhibitors) and 3 (3 exhibitors) → 7 entries,
// ≥ 3 exhibitors; the breed adds Blue's class of 2 → 9 entries; the show adds another breed's 6.
describe('competitionSizes', () => {
  it('sums entries per variety, breed and show and takes the largest exhibitor count', () => {
    const lines = [
      line('Test Compact', 'Black', 'buck', 'senior', 4, 2),
      line('Test Compact', 'Black', 'buck', 'senior', 4, 2), // second line of the same class
      line('test compact ', 'black', 'doe', 'junior', 3, 3),
      line('Test Compact', 'Blue', 'doe', 'senior', 2, 1),
      line('Test Giant', null, 'doe', 'senior', 6, 4),
    ];
    const sizes = competitionSizes(lines);
    expect(sizes[0]).toEqual({
      variety: { entries: 7, exhibitors: 3 },
      breed: { entries: 9, exhibitors: 3 },
      show: { entries: 15, exhibitors: 4 },
    });
    expect(sizes[2]).toEqual(sizes[0]);
    expect(sizes[3]!.variety).toEqual({ entries: 2, exhibitors: 1 });
    expect(sizes[4]!.variety).toEqual({ entries: 6, exhibitors: 4 });
    expect(sizes[4]!.breed).toEqual({ entries: 6, exhibitors: 4 });
  });

  it('refuses negative or fractional class sizes', () => {
    expect(() => competitionSizes([line('A', null, 'doe', 'senior', -1, 1)])).toThrow(
      'competitionSizes requires whole, non-negative class sizes',
    );
  });
});
