import { betterKind, cleanMapping, fieldLabel, mappingFields, mappingProblems, unusedHeaders } from './column-mapping';

describe('column mapping', () => {
  it('marks required fields and the weight pair of which one is needed', () => {
    const fields = mappingFields('weights');
    expect(fields.map((f) => [f.key, f.required, f.group])).toEqual([
      ['ear_id', true, null],
      ['weighed_on', true, null],
      ['weight', true, 'Weight (with unit) or Weight in grams'],
      ['weight_g', true, 'Weight (with unit) or Weight in grams'],
      ['notes', false, null],
    ]);
    expect(fields[2]!.hint).toBe('One of: Weight (with unit) or Weight in grams.');
  });

  it('drops fields left out of the file', () => {
    expect(cleanMapping({ ear_id: 'Tattoo', notes: '', weight: null })).toEqual({ ear_id: 'Tattoo' });
  });

  it('says what still stops the check', () => {
    expect(mappingProblems('weights', { ear_id: 'Tattoo' })).toEqual([
      'Choose the column for Weighed on',
      'Choose a column for Weight (with unit) or Weight in grams',
    ]);
    expect(mappingProblems('weights', { ear_id: 'Tattoo', weighed_on: 'Date', weight_g: 'Date' })).toEqual([
      'Column “Date” is chosen for Weighed on and Weight in grams',
    ]);
    expect(mappingProblems('weights', { ear_id: 'Tattoo', weighed_on: 'Date', weight: 'Wt' })).toEqual([]);
  });

  it('lists the columns nothing imports and names fields for the problems table', () => {
    expect(unusedHeaders(['Tattoo', 'Date', 'Pen', ''], { ear_id: 'Tattoo', weighed_on: 'Date' })).toEqual(['Pen']);
    expect(fieldLabel('results', 'age_class')).toBe('Age class');
    expect(fieldLabel('results', '')).toBe('whole row');
  });

  it('offers the trait columns of the herd’s breed templates for an evaluations file', () => {
    const traits = [{ key: 'body_type', label: 'Body type', points: 50 }, { key: 'markings', label: 'Markings', points: 25 }];
    expect(mappingFields('evaluations', traits).map((f) => [f.key, f.label, f.group, f.hint])).toEqual([
      ['ear_id', 'Ear ID (tattoo)', null, ''],
      ['evaluated_on', 'Evaluated on', null, ''],
      ['evaluator', 'Evaluator', null, ''],
      ['body_type', 'Body type (0–50)', 'Body type (0–50) or Markings (0–25)', 'At least one score is needed.'],
      ['markings', 'Markings (0–25)', 'Body type (0–50) or Markings (0–25)', 'At least one score is needed.'],
      ['notes', 'Notes', null, ''],
    ]);
    expect(mappingProblems('evaluations', { ear_id: 'Tattoo', evaluated_on: 'Date', markings: 'Marks' }, traits)).toEqual([]);
    expect(mappingProblems('evaluations', { ear_id: 'Tattoo', evaluated_on: 'Date' }, traits)).toEqual([
      'Choose a column for Body type (0–50) or Markings (0–25)',
    ]);
    expect(fieldLabel('evaluations', 'markings', traits)).toBe('Markings (0–25)');
  });

  it('notices a file of another kind than the one chosen', () => {
    const herdKinds = ['animals', 'weights', 'litters', 'evaluations'] as const;
    expect(betterKind(['ear_id', 'weighed_on', 'weight'], 'animals', herdKinds)).toBe('weights');
    expect(betterKind(['Tattoo', 'Sex', 'Breed', 'Born'], 'animals', herdKinds)).toBeNull();
    expect(betterKind(['Pen', 'Feed'], 'animals', herdKinds)).toBeNull();
  });
});
