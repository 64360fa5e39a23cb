import { describe, expect, it } from 'vitest';
import { competitionRanks } from './competition-ranks';

describe('competitionRanks', () => {
  it('ranks "1224": equal scores share the best rank and the next one skips', () => {
    expect(competitionRanks([10, 20, 20, 5])).toEqual([3, 1, 1, 4]);
    expect(competitionRanks([])).toEqual([]);
  });

  it('treats rounding noise as a tie', () => {
    expect(competitionRanks([0.1 + 0.2, 0.3, 0.1])).toEqual([1, 1, 3]);
  });
});
