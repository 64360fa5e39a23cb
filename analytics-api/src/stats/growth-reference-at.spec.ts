import { describe, expect, it } from 'vitest';
import { growthReferenceAt } from './growth-reference-at';
import { handReference } from './growth-reference-fixture';

describe('growthReferenceAt', () => {
  const reference = handReference([
    { lms: { L: 1, M: 100, S: 0.1 }, n: 50 },
    { lms: { L: 0, M: 200, S: 0.2 }, n: 60 },
    { weights: [5, 1, 3] },
    null,
  ]);

  it("interpolates L, M, S linearly between this band's and the neighbour's mean ages", () => {
    // day 7: halfway between the centres 3.5 and 10.5
    expect(growthReferenceAt(reference, 7)).toEqual({ method: 'lms', lms: { L: 0.5, M: 150, S: expect.closeTo(0.15, 14) }, n: 60 });
    expect(growthReferenceAt(reference, 3.5)).toEqual({ method: 'lms', lms: { L: 1, M: 100, S: 0.1 }, n: 50 });
  });

  it("keeps a band's own values at the ends and next to an empirical band", () => {
    expect(growthReferenceAt(reference, 0)).toEqual({ method: 'lms', lms: { L: 1, M: 100, S: 0.1 }, n: 50 });
    expect(growthReferenceAt(reference, 13)).toEqual({ method: 'lms', lms: { L: 0, M: 200, S: 0.2 }, n: 60 });
  });

  it('returns the weights of an empirical band, and null for empty bands and outside ages', () => {
    expect(growthReferenceAt(reference, 15)).toEqual({ method: 'empirical', weights: [1, 3, 5], n: 3 });
    expect(growthReferenceAt(reference, 22)).toBeNull();
    expect(growthReferenceAt(reference, -1)).toBeNull();
    expect(growthReferenceAt(reference, 28)).toBeNull();
  });
});
