import { describe, expect, it } from 'vitest';
import type { Breed } from './breed';
import { DEFAULT_EVALUATION_TRAITS } from './breed';
import { type PedigreeNode, registrationReadiness } from './registration';

// Requirements (common practice, no source): ≥ 6 months, latest weight ≥ senior minimum, and
// 14 ancestors (2 + 4 + 8) with ear ID, variety and weight. Cases are built and counted by hand.
const breed: Breed = {
  key: 'test-compact',
  name: 'Test Compact',
  classScheme: 'four-class',
  varieties: ['Black'],
  weightLimits: {
    buck: { junior: { minGrams: null, idealGrams: null, maxGrams: 2500 }, intermediate: null, senior: { minGrams: 2268, idealGrams: 2722, maxGrams: 2948 } },
    doe: { junior: { minGrams: null, idealGrams: null, maxGrams: 2600 }, intermediate: null, senior: { minGrams: 2381, idealGrams: 2835, maxGrams: 3062 } },
  },
  evaluationTemplate: { traits: [...DEFAULT_EVALUATION_TRAITS] },
};

let counter = 0;
function tree(generations: number): PedigreeNode {
  const node: PedigreeNode = { earId: `E${++counter}`, variety: 'Black', weightGrams: 2700 };
  if (generations > 1) {
    node.sire = tree(generations - 1);
    node.dam = tree(generations - 1);
  }
  return node;
}

function complete() {
  return { birthDate: '2026-01-10', sex: 'doe' as const, latestWeightGrams: 2500, sire: tree(3), dam: tree(3) };
}

describe('registrationReadiness', () => {
  it('a complete 14-ancestor pedigree, 6 months and over the minimum: ready', () => {
    counter = 0;
    const c = complete();
    expect(registrationReadiness(c, breed, '2026-07-10')).toEqual({ ready: true, missing: [] });
    expect(counter).toBe(14);
  });

  it('names each gap in words', () => {
    const c = complete();
    c.dam.sire!.weightGrams = null;
    c.sire.dam!.dam!.earId = ' ';
    c.sire.dam!.dam!.variety = null;
    c.dam.dam!.sire = null;
    const r = registrationReadiness(c, breed, '2026-07-09', 'lb-oz');
    expect(r.ready).toBe(false);
    expect(r.missing).toEqual([
      'age: under 6 months (old enough on 2026-07-10)',
      "sire's dam's dam: no ear ID, no variety recorded",
      "dam's sire: no weight recorded",
      "dam's dam's sire: not recorded",
    ]);
  });

  it('folds an unrecorded grandparent’s parents into one line', () => {
    const c = complete();
    c.sire.sire = null;
    c.dam = null as unknown as PedigreeNode;
    const r = registrationReadiness(c, breed, '2026-08-01');
    expect(r.missing).toEqual(["sire's sire: not recorded, nor his parents", 'dam: not recorded, nor her parents']);
  });

  it('checks the senior minimum for the animal’s sex (doe 2381 g = 5 lb 4 oz)', () => {
    const c = { ...complete(), latestWeightGrams: 2300 };
    expect(registrationReadiness(c, breed, '2026-08-01').missing).toEqual([
      'weight: latest 5 lb 1 oz is under the senior minimum of 5 lb 4 oz for a doe',
    ]);
    // The same weight is enough for a buck (minimum 2268 g).
    expect(registrationReadiness({ ...c, sex: 'buck' }, breed, '2026-08-01').ready).toBe(true);
    expect(registrationReadiness({ ...c, latestWeightGrams: null, birthDate: null }, breed, '2026-08-01').missing).toEqual([
      'age: no birth date recorded',
      'weight: no weight recorded',
    ]);
  });
});
