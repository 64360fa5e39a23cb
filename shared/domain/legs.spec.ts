import { describe, expect, it } from 'vitest';
import type { Award } from './awards';
import type { CompetitionSizes } from './competition-sizes';
import { DEFAULT_LEG_RULE, grandChampionStatus, type LegResultInput, legsEarned } from './legs';

// The rule under test is the default of common practice (no source): a leg for 1st in class,
// BOV/BOSV, BOB/BOSB or BIS in a competition of ≥ 5 animals from ≥ 3 exhibitors; GC after 3 legs,
// ≥ 2 judges, ≥ 1 leg as intermediate or senior. Each expected outcome is worked by hand below.
const sizes = (v: [number, number], b: [number, number] = v, s: [number, number] = b): CompetitionSizes => ({
  variety: { entries: v[0], exhibitors: v[1] },
  breed: { entries: b[0], exhibitors: b[1] },
  show: { entries: s[0], exhibitors: s[1] },
});

function result(p: Partial<LegResultInput> & Pick<LegResultInput, 'showId' | 'showDate'>): LegResultInput {
  return {
    judge: 'Judge A',
    ageClass: 'senior',
    placing: 1,
    entriesInClass: 5,
    exhibitorsInClass: 3,
    awards: [] as Award[],
    competitionSizes: sizes([5, 3]),
    ...p,
  };
}

describe('legsEarned', () => {
  it('first in a class of 5 from 3 exhibitors is a leg; 4 entries or 2 exhibitors is not', () => {
    expect(legsEarned([result({ showId: 's1', showDate: '2026-03-01' })])).toHaveLength(1);
    expect(legsEarned([result({ showId: 's1', showDate: '2026-03-01', entriesInClass: 4 })])).toHaveLength(0);
    expect(legsEarned([result({ showId: 's1', showDate: '2026-03-01', exhibitorsInClass: 2 })])).toHaveLength(0);
    expect(legsEarned([result({ showId: 's1', showDate: '2026-03-01', placing: 2 })])).toHaveLength(0);
  });

  it('a small class won still earns a leg through BOV in a large enough variety', () => {
    const legs = legsEarned([
      result({ showId: 's1', showDate: '2026-03-01', entriesInClass: 2, exhibitorsInClass: 2, awards: ['BOV'], competitionSizes: sizes([6, 3]) }),
    ]);
    expect(legs).toEqual([
      { showId: 's1', showDate: '2026-03-01', judge: 'Judge A', ageClass: 'senior', basis: 'BOV', entries: 6, exhibitors: 3 },
    ]);
  });

  it('BOSV in too small a variety earns nothing, BOB in a large breed does', () => {
    const r = result({ showId: 's1', showDate: '2026-03-01', entriesInClass: 2, exhibitorsInClass: 1, awards: ['BOSV'], competitionSizes: sizes([3, 2], [12, 5]) });
    expect(legsEarned([r])).toHaveLength(0);
    expect(legsEarned([{ ...r, awards: ['BOV', 'BOB'] }])[0]?.basis).toBe('BOB');
  });

  it('one leg per show, named after the highest qualifying win', () => {
    const legs = legsEarned([
      result({ showId: 's1', showDate: '2026-03-01', awards: ['BOV', 'BOB', 'BIS'], competitionSizes: sizes([8, 4], [20, 6], [150, 30]) }),
    ]);
    expect(legs).toHaveLength(1);
    expect(legs[0]?.basis).toBe('BIS');
    expect(legs[0]?.entries).toBe(150);
  });

  it('respects a club rule that counts only first in class of 8 or more', () => {
    const rule = { ...DEFAULT_LEG_RULE, minEntries: 8, legAwards: [] };
    const r = result({ showId: 's1', showDate: '2026-03-01', entriesInClass: 7, awards: ['BOB'], competitionSizes: sizes([9, 4]) });
    expect(legsEarned([r], rule)).toHaveLength(0);
    expect(legsEarned([{ ...r, entriesInClass: 8 }], rule)).toHaveLength(1);
    expect(() => legsEarned([r], { ...rule, legsRequired: 0 })).toThrow('legsEarned requires a valid leg rule');
  });
});

describe('grandChampionStatus', () => {
  it('3 legs under 2 judges, one as senior: grand champion on the third leg', () => {
    const s = grandChampionStatus([
      result({ showId: 's1', showDate: '2026-02-01', ageClass: 'junior', judge: 'Judge A' }),
      result({ showId: 's2', showDate: '2026-03-01', ageClass: 'junior', judge: 'judge a ' }),
      result({ showId: 's3', showDate: '2026-05-01', ageClass: 'senior', judge: 'Judge B' }),
      result({ showId: 's4', showDate: '2026-06-01', ageClass: 'senior', judge: 'Judge C' }),
    ]);
    expect(s.isGrandChampion).toBe(true);
    expect(s.completedOn).toBe('2026-05-01');
    expect(s.legs).toHaveLength(4);
    expect(s.missing).toEqual([]);
  });

  it('3 legs all under one judge and all as junior: not yet, and says why', () => {
    const s = grandChampionStatus([
      result({ showId: 's1', showDate: '2026-02-01', ageClass: 'junior' }),
      result({ showId: 's2', showDate: '2026-03-01', ageClass: 'junior' }),
      result({ showId: 's3', showDate: '2026-04-01', ageClass: 'junior' }),
    ]);
    expect(s.isGrandChampion).toBe(false);
    expect(s.missing).toEqual([
      'needs legs under at least 2 different judges (has 1)',
      'needs a leg won as intermediate or senior',
    ]);
  });

  it('two wins at one show count once: 2 legs from 3 results', () => {
    const s = grandChampionStatus([
      result({ showId: 's1', showDate: '2026-02-01', judge: 'Judge A' }),
      result({ showId: 's1', showDate: '2026-02-01', judge: 'Judge A', awards: ['BOV'], competitionSizes: sizes([9, 4]) }),
      result({ showId: 's2', showDate: '2026-03-01', judge: 'Judge B' }),
    ]);
    expect(s.legs).toHaveLength(2);
    expect(s.missing[0]).toBe('needs 1 more leg (has 2 of 3)');
  });

  it('legs under another ear ID do not add up with the current one', () => {
    const s = grandChampionStatus([
      result({ showId: 's1', showDate: '2026-02-01', judge: 'Judge A', earId: 'K12', sex: 'doe', breed: 'Test Compact' }),
      result({ showId: 's2', showDate: '2026-03-01', judge: 'Judge B', earId: 'K21', sex: 'doe', breed: 'Test Compact' }),
      result({ showId: 's3', showDate: '2026-04-01', judge: 'Judge B', earId: 'k21', sex: 'doe', breed: 'Test Compact' }),
    ]);
    expect(s.isGrandChampion).toBe(false);
    expect(s.legs.map((l) => l.showId)).toEqual(['s2', 's3']);
    expect(s.missing).toContain('1 leg was won under a different ear ID, sex or breed and cannot count');
  });
});
