import { describe, expect, expectTypeOf, it } from 'vitest';
import type { z } from 'zod';
import { type Breed, breedSchema, DEFAULT_EVALUATION_TRAITS, limitsFor } from './breed';

const limits = (min: number | null, ideal: number | null, max: number | null) => ({
  minGrams: min,
  idealGrams: ideal,
  maxGrams: max,
});

// Test values are invented; they only exercise the schema's rules.
const fourClass: Breed = {
  key: 'test-compact',
  name: 'Test Compact',
  classScheme: 'four-class',
  varieties: ['Black', 'Blue'],
  weightLimits: {
    buck: { junior: limits(null, null, 2500), intermediate: null, senior: limits(2500, 2722, 2948) },
    doe: { junior: limits(null, null, 2600), intermediate: null, senior: limits(2600, 2835, 3062) },
  },
  evaluationTemplate: { traits: [...DEFAULT_EVALUATION_TRAITS] },
};

describe('breed catalogue schema', () => {
  it('types and schema describe the same shape', () => {
    expectTypeOf<z.infer<typeof breedSchema>>().toExtend<Breed>();
    expectTypeOf<Breed>().toExtend<z.infer<typeof breedSchema>>();
  });

  it('accepts a well-formed four-class breed', () => {
    expect(breedSchema.safeParse(fourClass).success).toBe(true);
    expect(limitsFor(fourClass, 'doe', 'senior')?.maxGrams).toBe(3062);
    expect(limitsFor(fourClass, 'doe', 'intermediate')).toBeNull();
  });

  it('default traits are the seven of the design and add up to 100 points', () => {
    expect(DEFAULT_EVALUATION_TRAITS.map((t) => t.key)).toEqual([
      'body_type', 'balance', 'head', 'ears_crown', 'bone', 'fur', 'condition',
    ]);
    expect(DEFAULT_EVALUATION_TRAITS.reduce((s, t) => s + t.points, 0)).toBe(100);
  });

  it('refuses limits out of order', () => {
    const bad = structuredClone(fourClass);
    bad.weightLimits.buck.senior = limits(3000, 2722, 2948);
    const r = breedSchema.safeParse(bad);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toBe('weight limits must run minimum ≤ ideal ≤ maximum');
  });

  it('refuses an intermediate class on a four-class breed and its absence on a six-class one', () => {
    const withIntermediate = structuredClone(fourClass);
    withIntermediate.weightLimits.buck.intermediate = limits(null, null, 3000);
    expect(breedSchema.safeParse(withIntermediate).error?.issues[0]?.message).toBe(
      'a four-class breed has no intermediate class',
    );
    const six = { ...structuredClone(fourClass), classScheme: 'six-class' as const };
    expect(breedSchema.safeParse(six).success).toBe(false);
  });

  it('refuses duplicate trait keys, duplicate varieties and non-integer grams', () => {
    const dupTraits = structuredClone(fourClass);
    dupTraits.evaluationTemplate.traits.push({ key: 'fur', label: 'Fur again', points: 5 });
    expect(breedSchema.safeParse(dupTraits).success).toBe(false);
    const dupVarieties = { ...structuredClone(fourClass), varieties: ['Black', 'black'] };
    expect(breedSchema.safeParse(dupVarieties).success).toBe(false);
    const fractional = structuredClone(fourClass);
    fractional.weightLimits.doe.senior = limits(2600.5, null, null);
    expect(breedSchema.safeParse(fractional).success).toBe(false);
  });
});
