import { describe, expect, it } from 'vitest';
import { buildShowRecords, type StoredResult } from './build-show-records';

// Default leg rule (shared/domain/legs, common practice from memory): a leg for 1st in class,
// BOV/BOSV, BOB/BOSB or BIS in a competition of ≥ 5 animals from ≥ 3 exhibitors; grand champion
// after 3 legs under ≥ 2 judges, ≥ 1 as intermediate or senior. Outcomes worked by hand.
const base = {
  animalId: 1, showName: 'Show', judge: null, showJudges: ['Judge A'], earId: 'A1', breed: 'Test Compact', variety: 'Black',
  sex: 'buck' as const, ageClass: 'senior' as const, entriesInClass: 2, exhibitorsInClass: 2, placing: 1, awards: [],
};
const cls = (showId: number, variety: string, sex: 'buck' | 'doe', entries: number, exhibitors: number) => ({
  showId, breed: 'Test Compact', variety, sex, ageClass: 'senior' as const, entriesInClass: entries, exhibitorsInClass: exhibitors,
});

describe('buildShowRecords', () => {
  it('a BOV in a variety of 2 + 4 entries from 3 exhibitors is a leg although the class had 2 entries', () => {
    const results: StoredResult[] = [{ ...base, id: 10, showId: 1, showDate: '2026-03-01', awards: ['BOV'] }];
    // Variety Black: buck class 2 entries / 2 exhibitors, doe class 4 / 3 → variety 6 entries, ≥ 3 exhibitors.
    const classes = [cls(1, 'Black', 'buck', 2, 2), cls(1, 'Black', 'doe', 4, 3), cls(1, 'Blue', 'doe', 9, 5)];
    const rec = buildShowRecords(results, classes, [{ id: 1, birthDate: '2025-01-01', classScheme: 'four-class' }]).get(1)!;
    expect(rec.status.legs).toHaveLength(1);
    expect(rec.status.legs[0]).toMatchObject({ basis: 'BOV', entries: 6, exhibitors: 3 });
  });

  it('without the award the same class win earns no leg (class of 2 from 2)', () => {
    const results: StoredResult[] = [{ ...base, id: 10, showId: 1, showDate: '2026-03-01' }];
    const rec = buildShowRecords(results, [cls(1, 'Black', 'buck', 2, 2)], [{ id: 1, birthDate: null, classScheme: null }]).get(1)!;
    expect(rec.status.legs).toHaveLength(0);
    expect(rec.status.missing[0]).toBe('needs 3 more legs (has 0 of 3)');
  });

  it('three legs under two judges, one as senior, make a grand champion; results come newest first', () => {
    const big = { entriesInClass: 6, exhibitorsInClass: 3 };
    const results: StoredResult[] = [
      { ...base, ...big, id: 1, showId: 1, showDate: '2026-01-10', ageClass: 'junior', judge: 'Judge A' },
      { ...base, ...big, id: 2, showId: 2, showDate: '2026-02-10', ageClass: 'junior', judge: 'Judge B' },
      { ...base, ...big, id: 3, showId: 3, showDate: '2026-04-10', ageClass: 'senior', judge: 'Judge A' },
    ];
    const classes = [1, 2, 3].map((s) => cls(s, 'Black', 'buck', 6, 3));
    const rec = buildShowRecords(results, classes, [{ id: 1, birthDate: '2025-09-01', classScheme: 'four-class' }]).get(1)!;
    expect(rec.status.isGrandChampion).toBe(true);
    expect(rec.status.completedOn).toBe('2026-04-10');
    expect(rec.results.map((r) => r.id)).toEqual([3, 2, 1]);
  });

  it('flags a recorded age class that differs from the one the birth date gives', () => {
    // Born 2025-09-01: on 2026-02-10 five months old → junior; on 2026-04-10 seven months → senior (four-class).
    const results: StoredResult[] = [
      { ...base, id: 1, showId: 1, showDate: '2026-02-10', ageClass: 'senior' },
      { ...base, id: 2, showId: 2, showDate: '2026-04-10', ageClass: 'senior' },
    ];
    const rec = buildShowRecords(results, [], [{ id: 1, birthDate: '2025-09-01', classScheme: 'four-class' }]).get(1)!;
    const byId = new Map(rec.results.map((r) => [r.id, r]));
    expect(byId.get(1)).toMatchObject({ computedAgeClass: 'junior', ageClassMismatch: true });
    expect(byId.get(2)).toMatchObject({ computedAgeClass: 'senior', ageClassMismatch: false });
  });

  it('gives an empty record to an animal without results', () => {
    const rec = buildShowRecords([], [], [{ id: 7, birthDate: null, classScheme: null }]).get(7)!;
    expect(rec.results).toEqual([]);
    expect(rec.status.isGrandChampion).toBe(false);
  });
});
