import { describe, expect, it } from 'vitest';
import { EarId } from '../contracts/animals';
import { EAR_ID_MAX_LENGTH } from '../domain/terms';
import type { ImportContext } from './import-records';
import { validateRow } from './validate-row';

// Grams follow the 1959 definitions (1 lb = 453.59237 g); gestation 29–35 days is common
// practice, no source. Every expected value is worked by hand.
const ctx: ImportContext = { dateOrder: 'iso', unitSetting: 'lb-oz', today: '2026-12-01' };

describe('validateRow: animals', () => {
  it('reads a full row and normalises ear IDs and sex aliases', () => {
    const r = validateRow('animals', {
      ear_id: ' br 12 ', name: 'Thistle', sex: 'F', breed: 'Test Compact', variety: 'Black', born: '2026-03-04',
      sire_ear_id: 'br7', dam_ear_id: 'BR9', status: 'Active', grand_champion: 'no', weight: '5-12', outside: '',
    }, ctx);
    expect(r.errors).toEqual([]);
    expect(r.value).toMatchObject({
      earId: 'BR 12', sex: 'doe', sireEarId: 'BR7', damEarId: 'BR9', status: 'active', grandChampion: false,
      weightGrams: 2608, outside: false, line: null,
    });
  });

  it('accepts B/D, M/F and male/female', () => {
    for (const [cell, sex] of [['B', 'buck'], ['m', 'buck'], ['Male', 'buck'], ['d', 'doe'], ['female', 'doe']]) {
      expect(validateRow('animals', { ear_id: 'A1', sex: cell, breed: 'X' }, ctx).value?.sex).toBe(sex);
    }
  });

  it('reports missing required fields, unknown sex, future birth and self-parentage', () => {
    const r = validateRow('animals', { ear_id: 'A1', sex: 'x', born: '2027-01-03', sire_ear_id: 'a1' }, ctx);
    expect(r.value).toBeUndefined();
    expect(r.errors).toEqual([
      { field: 'sex', message: 'Sex "x" is not understood: use buck, doe (also b, m, male, d, f, female, bucks, does)' },
      { field: 'breed', message: 'Breed is missing' },
      { field: 'sire_ear_id', message: 'the sire cannot be the animal itself (A1)' },
      { field: 'born', message: 'date 2027-01-03 is in the future' },
    ]);
  });

  it('takes ear IDs up to the same length as the animal form, and no longer', () => {
    const longest = 'A'.repeat(EAR_ID_MAX_LENGTH);
    expect(validateRow('animals', { ear_id: longest, sex: 'doe', breed: 'X' }, ctx).value?.earId).toBe(longest);
    expect(EarId.safeParse(longest).success).toBe(true);
    const tooLong = validateRow('animals', { ear_id: `${longest}B`, sex: 'doe', breed: 'X' }, ctx);
    expect(tooLong.errors).toEqual([{ field: 'ear_id', message: `Ear ID (tattoo) is longer than ${EAR_ID_MAX_LENGTH} characters` }]);
    expect(EarId.safeParse(`${longest}B`).success).toBe(false);
  });

  it('a bare number as weight is not understood', () => {
    const r = validateRow('animals', { ear_id: 'A1', sex: 'doe', breed: 'X', weight: '5.2' }, ctx);
    expect(r.errors[0]?.message).toBe(
      'weight is not understood: "5.2" has no unit. Write the unit: "5 lb 12 oz", "5-12", "2.6 kg" or "2600 g"',
    );
  });
});

describe('validateRow: weights', () => {
  it('accepts weight with unit or weight_g in grams, in mdy dates when asked', () => {
    expect(validateRow('weights', { ear_id: 'A1', weighed_on: '3/4/2026', weight: '2.6 kg' }, { ...ctx, dateOrder: 'mdy' }).value)
      .toEqual({ earId: 'A1', weighedOn: '2026-03-04', grams: 2600, notes: null });
    expect(validateRow('weights', { ear_id: 'A1', weighed_on: '2026-03-04', weight_g: '1450' }, ctx).value?.grams).toBe(1450);
  });

  it('needs one of the two and refuses disagreement', () => {
    expect(validateRow('weights', { ear_id: 'A1', weighed_on: '2026-03-04' }, ctx).errors[0]?.field).toBe('weight');
    // 5 lb 12 oz = 2608 g is not 2400 g.
    expect(validateRow('weights', { ear_id: 'A1', weighed_on: '2026-03-04', weight: '5 lb 12 oz', weight_g: '2400' }, ctx).errors[0]?.message)
      .toBe('weight 5 lb 12 oz (2608 g) and weight_g 2400 g disagree');
    expect(validateRow('weights', { ear_id: 'A1', weighed_on: '2026-03-04', weight_g: '2.5' }, ctx).errors).toHaveLength(1);
  });

  it('the shorthand 5-12 is refused under the kg setting', () => {
    const r = validateRow('weights', { ear_id: 'A1', weighed_on: '2026-03-04', weight: '5-12' }, { ...ctx, unitSetting: 'kg' });
    expect(r.value).toBeUndefined();
  });
});

describe('validateRow: litters', () => {
  const litter = { litter_code: 'L1', sire_ear_id: 'B1', dam_ear_id: 'D1', bred_on: '2026-03-01' };

  it('31 days is normal; 37 days is a warning, not an error', () => {
    const ok = validateRow('litters', { ...litter, kindled_on: '2026-04-01', born_alive: '5', born_dead: '1', weaned: '4', weight_21d: '4 lb 2 oz' }, ctx);
    expect(ok.errors).toEqual([]);
    expect(ok.warnings).toEqual([]);
    expect(ok.value).toMatchObject({ bornAlive: 5, bornDead: 1, weaned: 4, weight21dGrams: 1871 }); // 4.125 lb = 1871.07 g
    const late = validateRow('litters', { ...litter, kindled_on: '2026-04-07' }, ctx);
    expect(late.value).toBeDefined();
    expect(late.warnings).toEqual([
      { field: 'kindled_on', message: 'kindled 37 days after breeding; 29–35 days is usual — check both dates' },
    ]);
    // 28 days (2026-03-29) is a warning, 29 (2026-03-30) is not.
    expect(validateRow('litters', { ...litter, kindled_on: '2026-03-29' }, ctx).warnings).toHaveLength(1);
    expect(validateRow('litters', { ...litter, kindled_on: '2026-03-30' }, ctx).warnings).toHaveLength(0);
  });

  it('refuses negative counts, weaned above born alive and kindling before breeding', () => {
    const r = validateRow('litters', { ...litter, kindled_on: '2026-02-20', born_alive: '3', born_dead: '-1', weaned: '4' }, ctx);
    expect(r.errors.map((e) => e.message)).toEqual([
      'Born dead cannot be negative',
      'kindled on 2026-02-20, before the bred date 2026-03-01',
      'weaned 4 is more than the 3 born alive',
    ]);
  });
});

describe('validateRow: evaluations', () => {
  it('reads scores per trait of the default template', () => {
    const r = validateRow('evaluations', { ear_id: 'a1', evaluated_on: '2026-06-01', body_type: '28', fur: '15.5', condition: '' }, ctx);
    expect(r.value).toEqual({ earId: 'A1', evaluatedOn: '2026-06-01', evaluator: null, scores: { body_type: 28, fur: 15.5 }, notes: null });
  });

  it('a score above the trait points is an error; so is a row with no score', () => {
    expect(validateRow('evaluations', { ear_id: 'A1', evaluated_on: '2026-06-01', bone: '6' }, ctx).errors).toEqual([
      { field: 'bone', message: "Bone (0–5): score 6 is more than the trait's 5 points" },
    ]);
    expect(validateRow('evaluations', { ear_id: 'A1', evaluated_on: '2026-06-01' }, ctx).errors[0]?.message).toBe(
      'no trait is scored: give at least one score',
    );
  });

  it('refuses a score for a trait the animal’s breed template does not have, naming the traits it does', () => {
    const traits = [{ key: 'fur', label: 'Fur', points: 40 }, { key: 'body_type', label: 'Body type', points: 60 }];
    const mappedTraits = [...traits, { key: 'markings', label: 'Markings', points: 25 }];
    const row = { ear_id: 'A1', evaluated_on: '2026-06-01', fur: '35', markings: '12' };
    expect(validateRow('evaluations', row, { ...ctx, traits, mappedTraits }).errors).toEqual([
      { field: 'markings', message: "Markings is not a trait of this animal's breed template (it scores fur, body type): leave the cell empty" },
    ]);
    expect(validateRow('evaluations', { ...row, markings: ' ' }, { ...ctx, traits, mappedTraits }).value?.scores).toEqual({ fur: 35 });
  });

  it('uses a breed’s own template when given', () => {
    const traits = [{ key: 'fur', label: 'Fur', points: 40 }];
    expect(validateRow('evaluations', { ear_id: 'A1', evaluated_on: '2026-06-01', fur: '35' }, { ...ctx, traits }).value?.scores).toEqual({ fur: 35 });
  });
});

describe('validateRow: results', () => {
  const result = {
    show_name: 'Test Spring Show', show_date: '2026-04-11', judge: 'Judge A', exhibitor: 'Test Rabbitry', breed: 'Test Compact',
    variety: 'Black', sex: 'D', age_class: 'S', entries_in_class: '5', exhibitors_in_class: '3', placing: '1', awards: 'bov|BOB, BIS',
  };

  it('reads class aliases and award lists', () => {
    const r = validateRow('results', result, ctx);
    expect(r.errors).toEqual([]);
    expect(r.value).toMatchObject({ sex: 'doe', ageClass: 'senior', placing: 1, entriesInClass: 5, awards: ['BOV', 'BOB', 'BIS'], earId: null });
  });

  it('placing above entries and exhibitors above entries are errors', () => {
    const r = validateRow('results', { ...result, placing: '7', exhibitors_in_class: '6', awards: '' }, ctx);
    expect(r.errors.map((e) => e.message)).toEqual([
      'placing 7 is greater than the 5 entries in the class',
      '6 exhibitors is more than the 5 entries in the class',
    ]);
  });

  it('refuses unknown awards, BOV with BOSV, awards on a non-winner and future shows', () => {
    expect(validateRow('results', { ...result, awards: 'BOV BEST' }, ctx).errors[0]?.message).toBe(
      'award "BEST" is not understood: use BOV, BOSV, BOB, BOSB, BIS',
    );
    expect(validateRow('results', { ...result, awards: 'BOV BOSV' }, ctx).errors[0]?.message).toBe('one animal cannot be both BOV and BOSV');
    expect(validateRow('results', { ...result, placing: '2' }, ctx).errors[0]?.field).toBe('awards');
    expect(validateRow('results', { ...result, show_date: '2027-01-03' }, ctx).errors[0]?.message).toBe('date 2027-01-03 is in the future');
    expect(validateRow('results', { ...result, entries_in_class: '0' }, ctx).errors[0]?.message).toBe('Entries in class must be at least 1');
  });
});
