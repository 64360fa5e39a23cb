import type { ShowDetail } from '@shared/contracts/shows';
import { awardsText, classLabel, placingText, showSummary } from './result-words';

describe('result words', () => {
  it('writes a placing beside the size of its class', () => {
    expect(placingText(1, 7)).toBe('1st of 7');
    expect(placingText(12, 13)).toBe('12th of 13');
  });

  it('names a class and spells out awards by the trade’s terms', () => {
    expect(classLabel({ breed: 'Mini Rex', variety: 'Black', sex: 'buck', ageClass: 'junior' })).toBe('Mini Rex · Black · Junior buck');
    expect(classLabel({ breed: 'Californian', variety: null, sex: 'doe', ageClass: 'intermediate' })).toBe('Californian · Intermediate doe');
    expect(awardsText(['BOV', 'BOSB'])).toBe('BOV (Best of variety), BOSB (Best opposite sex of breed)');
    expect(awardsText([])).toBe('');
  });
});

describe('showSummary', () => {
  const show: ShowDetail = {
    id: 4, name: 'Winter Show', showDate: '2026-01-17', location: null, hostClub: null, judges: ['T. Quill'], sanctionNo: null, results: 52,
    counts: { classes: 14, breeds: 3, exhibitors: 9, matched: 40, ageClassMismatches: 2 },
    judging: [{ judge: 'R. Ambleforth', classes: 9, results: 30 }, { judge: null, classes: 1, results: 1 }],
  };
  it('says what the results hold and who judged how many classes', () => {
    expect(showSummary(show)).toEqual({
      counts: "14 classes of 3 breeds · 52 results from 9 exhibitors, 40 matched to members' herds · 2 age classes to check against the birth date.",
      judging: ['R. Ambleforth: 9 classes (30 results)', 'Judge not recorded: 1 class (1 result)'],
    });
    expect(showSummary({ ...show, results: 0, judging: [] })).toEqual({ counts: 'No results recorded yet.', judging: [] });
  });
});
