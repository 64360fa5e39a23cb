import { describe, expect, it } from 'vitest';
import { placementScore } from './placement-score';

// (n − p)/(n − 1), worked by hand.
describe('placementScore', () => {
  it('is 1 for a win, 0 for last place and ½ in the middle', () => {
    expect(placementScore(1, 10)).toBe(1);
    expect(placementScore(10, 10)).toBe(0);
    expect(placementScore(3, 5)).toBe(0.5);
    expect(placementScore(2, 4)).toBeCloseTo(2 / 3, 15);
  });

  it('is null for a class of one (no comparison)', () => {
    expect(placementScore(1, 1)).toBeNull();
  });

  it('rejects a placing outside the class', () => {
    expect(() => placementScore(6, 5)).toThrow('placementScore requires placings in 1..entries (got 6 of 5)');
    expect(() => placementScore(1, 0)).toThrow('placementScore requires placings in 1..entries (got 1 of 0)');
  });
});
