import type { BreedRecord } from '@shared/contracts/breeds';
import { breedFormValue, breedFromForm, templatePoints, traitKeyOf } from './breed-form';

const limits = (min: number | null, ideal: number | null, max: number | null) => ({ minGrams: min, idealGrams: ideal, maxGrams: max, source: 'from memory' });
// An invented small breed (the numbers are only for the test).
const stored: BreedRecord = {
  id: 4, key: 'test-rex', name: 'Test Rex', classScheme: 'four-class', varieties: ['Black', 'Blue'], source: 'from memory', animals: 3,
  weightLimits: {
    buck: { junior: limits(null, null, 1588), intermediate: null, senior: limits(1361, 1814, 2041) },
    doe: { junior: limits(null, null, 1588), intermediate: null, senior: limits(1474, 1928, 2041) },
  },
  evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 60 }, { key: 'fur', label: 'Fur', points: 40 }] },
};

describe('breed form', () => {
  it('shows limits in the admin’s unit and saves them back unchanged', () => {
    const value = breedFormValue(stored, 'lb-oz');
    // 2041 g / 28.349523125 g per oz (NIST Handbook 44) = 72.0 oz = 4 lb 8 oz.
    expect(value.limits.doe.senior).toEqual({ minGrams: '3 lb 4 oz', idealGrams: '4 lb 4 oz', maxGrams: '4 lb 8 oz' });
    const result = breedFromForm(value, 'lb-oz', stored);
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.breed.weightLimits).toEqual(stored.weightLimits);
      expect(result.breed.evaluationTemplate.traits).toEqual(stored.evaluationTemplate.traits);
    }
  });

  it('reads a changed limit with the weight parser', () => {
    const value = breedFormValue(stored, 'kg');
    value.limits.buck.senior.maxGrams = '2.1 kg';
    const result = breedFromForm(value, 'kg', stored);
    expect(result.ok && result.breed.weightLimits.buck.senior.maxGrams).toBe(2100);
  });

  it('keys problems by field: a bad weight, limits out of order, a trait without points', () => {
    const value = breedFormValue(stored, 'lb-oz');
    value.limits.buck.senior.idealGrams = '4.5';
    value.limits.doe.senior.minGrams = '5 lb';
    value.traits.push({ key: '', label: 'Head', points: null });
    const result = breedFromForm(value, 'lb-oz', stored);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors['limits.buck.senior.idealGrams']).toContain('has no unit');
      expect(result.errors['limits.doe.senior.maxGrams']).toBe('Minimum ≤ ideal ≤ maximum');
      expect(result.errors['traits.2.points']).toBe('Whole points, at least 1');
    }
  });

  it('adds intermediate limits only for a six-class breed, as the catalogue requires', () => {
    const value = breedFormValue(stored, 'kg');
    value.classScheme = 'six-class';
    value.limits.buck.intermediate.maxGrams = '3.2 kg';
    const result = breedFromForm(value, 'kg', stored);
    expect(result.ok && result.breed.weightLimits.buck.intermediate).toEqual({ minGrams: null, idealGrams: null, maxGrams: 3200 });
    value.classScheme = 'four-class';
    const four = breedFromForm(value, 'kg', stored);
    expect(four.ok && four.breed.weightLimits.buck.intermediate).toBeNull();
  });

  it('makes trait keys from labels and sums the points', () => {
    expect(traitKeyOf('Ears & crown')).toBe('ears_crown');
    expect(traitKeyOf('3rd trait')).toBe('trait_3rd_trait');
    expect(templatePoints([{ key: 'a', label: 'A', points: 30 }, { key: 'b', label: 'B', points: null }])).toBe(30);
  });
});
