import { awardsText, classLabel, ordinal, placingText } from './result-words';

describe('result words', () => {
  it('writes English ordinals, teens included', () => {
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111].map(ordinal)).toEqual([
      '1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '101st', '111th',
    ]);
    expect(placingText(1, 7)).toBe('1st of 7');
  });

  it('names a class and spells out awards by the trade’s terms', () => {
    expect(classLabel({ breed: 'Mini Rex', variety: 'Black', sex: 'buck', ageClass: 'junior' })).toBe('Mini Rex · Black · Junior buck');
    expect(classLabel({ breed: 'Californian', variety: null, sex: 'doe', ageClass: 'intermediate' })).toBe('Californian · Intermediate doe');
    expect(awardsText(['BOV', 'BOSB'])).toBe('BOV (Best of variety), BOSB (Best opposite sex of breed)');
    expect(awardsText([])).toBe('');
  });
});
