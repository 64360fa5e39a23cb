import { checkSeasonForm, describeFormula, formulaSummary, seasonFormFrom, type SeasonFormValue } from './season-form';

const filled = (over: Partial<SeasonFormValue> = {}): SeasonFormValue => ({
  ...seasonFormFrom({ seasonStart: '2026-01-01', seasonEnd: '2026-11-30' }, null),
  ...over,
});

describe('seasonFormFrom', () => {
  it('shows the common show-rule base 6/4/3/2/1 when the club keeps the default', () => {
    const f = seasonFormFrom({ seasonStart: null, seasonEnd: null }, null);
    expect(f).toMatchObject({ seasonStart: '', seasonEnd: '', kind: 'default', places: [6, 4, 3, 2, 1] });
    expect(Object.values(f.bonuses).every((b) => b === null)).toBe(true);
  });

  it('fills a flat table with its bonuses', () => {
    const f = seasonFormFrom({ seasonStart: '2026-01-01', seasonEnd: '2026-12-31' }, { kind: 'flat', table: [10, 7, 5], bonuses: { BOB: 15 } });
    expect(f.kind).toBe('flat');
    expect(f.places).toEqual([10, 7, 5]);
    expect(f.bonuses.BOB).toBe(15);
  });
});

describe('checkSeasonForm', () => {
  it('sends the default as a null formula', () => {
    expect(checkSeasonForm(filled())).toEqual({ request: { seasonStart: '2026-01-01', seasonEnd: '2026-11-30', pointsFormula: null }, errors: {} });
  });

  it('sends a multiplied base with only the bonuses given', () => {
    const check = checkSeasonForm(filled({ kind: 'multiplied', places: [5, 3, 1], bonuses: { BOV: 2, BOSV: null, BOB: 4, BOSB: null, BIS: null } }));
    expect(check.request?.pointsFormula).toEqual({ kind: 'multiplied', base: [5, 3, 1], bonuses: { BOV: 2, BOB: 4 } });
  });

  it('files each message under its field: an empty place, a negative bonus, an end before the start', () => {
    const check = checkSeasonForm(filled({
      seasonEnd: '2025-12-31', kind: 'flat', places: [10, null, 5], bonuses: { BOV: -1, BOSV: null, BOB: null, BOSB: null, BIS: null },
    }));
    expect(check.request).toBeNull();
    expect(check.errors).toEqual({
      'places.1': 'Give the points for 2nd place',
      'bonuses.BOV': 'Points are 0 or more',
      seasonEnd: 'The season ends on or after its start',
    });
  });

  it('asks for real dates and at least one place', () => {
    const check = checkSeasonForm(filled({ seasonStart: '2026-02-30', kind: 'multiplied', places: [] }));
    expect(check.errors['seasonStart']).toBe('Give a date as YYYY-MM-DD');
    expect(check.errors['places']).toBe('Give points for at least 1st place');
  });
});

describe('describeFormula', () => {
  it('says each place and bonus in words', () => {
    expect(describeFormula({ kind: 'multiplied', base: [6, 4, 3, 2, 1], bonuses: { BIS: 25 } })).toEqual([
      '1st: 6 × animals in the class', '2nd: 4 × animals in the class', '3rd: 3 × animals in the class',
      '4th: 2 × animals in the class', '5th: 1 × animals in the class', 'Best in show: + 25',
    ]);
    expect(describeFormula({ kind: 'flat', table: [10, 7] })).toEqual(['1st: 10 points', '2nd: 7 points']);
  });
});

describe('formulaSummary', () => {
  it('says a formula in one phrase', () => {
    expect(formulaSummary({ kind: 'multiplied', base: [6, 4, 3, 2, 1] })).toBe('6/4/3/2/1 × animals in the class');
    expect(formulaSummary({ kind: 'flat', table: [10, 7, 5], bonuses: { BOB: 15, BIS: 25 } })).toBe('flat 10/7/5 points, + 15 for best of breed, + 25 for best in show');
  });
});
