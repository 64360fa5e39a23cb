import { describe, expect, it } from 'vitest';
import { type Breed, DEFAULT_EVALUATION_TRAITS } from '../domain/breed';
import { plausibleWeightRange } from './plausible-weight-range';

// The rule is our own plausibility guard (common practice, no source): 30 % of a minimum
// curve (0 → junior minimum at 120 d → senior minimum at 240 d) and 130 % of the senior maximum.
const breed: Breed = {
  key: 'test-compact', name: 'Test Compact', classScheme: 'four-class', varieties: [],
  weightLimits: {
    buck: { junior: { minGrams: 1200, idealGrams: null, maxGrams: 2500 }, intermediate: null, senior: { minGrams: 2000, idealGrams: 2700, maxGrams: 3000 } },
    doe: { junior: { minGrams: 1300, idealGrams: null, maxGrams: 2600 }, intermediate: null, senior: { minGrams: 2200, idealGrams: 2800, maxGrams: 3100 } },
  },
  evaluationTemplate: { traits: [...DEFAULT_EVALUATION_TRAITS] },
};

describe('plausibleWeightRange', () => {
  it('follows the minimum curve by hand', () => {
    expect(plausibleWeightRange(breed, 'buck', 0)).toEqual({ minGrams: 0, maxGrams: 3900 }); // 1.3 × 3000
    expect(plausibleWeightRange(breed, 'buck', 60)).toEqual({ minGrams: 180, maxGrams: 3900 }); // 0.3 × 1200 × 60/120
    expect(plausibleWeightRange(breed, 'buck', 180).minGrams).toBe(480); // 0.3 × (1200 + 0.5 × 800)
    expect(plausibleWeightRange(breed, 'buck', 400).minGrams).toBe(600); // 0.3 × 2000
  });

  it('takes the wider of both sexes when the sex is unknown', () => {
    expect(plausibleWeightRange(breed, null, 400)).toEqual({ minGrams: 600, maxGrams: 4030 }); // 1.3 × 3100
  });

  it('runs straight to the senior minimum when no junior minimum is known, and gives nulls without limits', () => {
    const noJunior = structuredClone(breed);
    noJunior.weightLimits.buck.junior.minGrams = null;
    expect(plausibleWeightRange(noJunior, 'buck', 120).minGrams).toBe(300); // 0.3 × 2000 × 120/240
    const none = structuredClone(noJunior);
    none.weightLimits.buck.senior = { minGrams: null, idealGrams: null, maxGrams: null };
    expect(plausibleWeightRange(none, 'buck', 120)).toEqual({ minGrams: null, maxGrams: null });
    expect(() => plausibleWeightRange(breed, 'buck', -1)).toThrow('plausibleWeightRange requires a non-negative age in days');
  });
});
