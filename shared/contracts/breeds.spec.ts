import { describe, expect, it } from 'vitest';
import { DEFAULT_EVALUATION_TRAITS } from '../domain/breed';
import { breedKeyOf, CreateBreedRequest } from './breeds';

const limits = { minGrams: null, idealGrams: null, maxGrams: null };
const breed = {
  name: 'Éclair Dwarf Test', classScheme: 'four-class', varieties: ['Black'],
  weightLimits: { buck: { junior: limits, intermediate: null, senior: limits }, doe: { junior: limits, intermediate: null, senior: limits } },
  evaluationTemplate: { traits: [...DEFAULT_EVALUATION_TRAITS] },
};

describe('breed contracts', () => {
  it('derives the key from the name: lower-case words joined by hyphens, accents dropped', () => {
    expect(breedKeyOf('Éclair Dwarf Test')).toBe('eclair-dwarf-test');
    expect(breedKeyOf('  Two  Words! ')).toBe('two-words');
    expect(breedKeyOf('***')).toBe('breed');
  });
  it('a create request always takes its key from the name, then passes the catalogue schema', () => {
    expect(CreateBreedRequest.parse(breed).key).toBe('eclair-dwarf-test');
    expect(CreateBreedRequest.parse({ ...breed, key: 'something-else' }).key).toBe('eclair-dwarf-test');
    expect(CreateBreedRequest.safeParse({ ...breed, classScheme: 'six-class' }).success).toBe(false);
  });
});
