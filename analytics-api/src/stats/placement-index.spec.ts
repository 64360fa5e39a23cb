import { describe, expect, it } from 'vitest';
import { placementIndex } from './placement-index';
import { mulberry32 } from './random';
import { wilsonInterval } from './wilson-interval';

describe('placementIndex', () => {
  it('computes observed / expected by hand: placings 1 of 3, 2 of 10, 5 of 6 with k = 3', () => {
    // chance of top 3: 3/3, 3/10, 3/6 → E = 1.8; observed 2 → index 1.1111
    const result = placementIndex([
      { placing: 1, entries: 3 },
      { placing: 2, entries: 10 },
      { placing: 5, entries: 6 },
    ]);
    expect(result.observed).toBe(2);
    expect(result.expected).toBeCloseTo(1.8, 14);
    expect(result.index).toBeCloseTo(2 / 1.8, 14);
    expect(result.lower).toBeLessThan(result.index);
    expect(result.upper).toBeGreaterThan(result.index);
    expect(result.warnings[0]).toMatch(/only 3 results/);
  });

  it('reduces to the Wilson interval / p with equal classes: 81 wins in 263 classes of 4 (Newcombe 1998 Table II)', () => {
    const results = Array.from({ length: 263 }, (_, i) => ({ placing: i < 81 ? 1 : 2, entries: 4 }));
    const result = placementIndex(results, 1);
    expect(result.index).toBeCloseTo(81 / 263 / 0.25, 12);
    expect(result.lower).toBeCloseTo(0.25528852 / 0.25, 5);
    expect(result.upper).toBeCloseTo(0.36620958 / 0.25, 5);
    const wilson = wilsonInterval(0, 20);
    const none = placementIndex(Array.from({ length: 20 }, () => ({ placing: 2, entries: 4 })), 1);
    expect(none.lower).toBe(0);
    expect(none.upper).toBeCloseTo(wilson.upper / 0.25, 12);
  });

  it('covers the chance value 1 in about 95% of simulated seasons of random placings', () => {
    const rng = mulberry32(13);
    let covered = 0;
    const seasons = 2000;
    for (let s = 0; s < seasons; s++) {
      const results = Array.from({ length: 40 }, () => {
        const entries = 2 + Math.floor(rng() * 14);
        return { placing: 1 + Math.floor(rng() * entries), entries };
      });
      const { lower, upper } = placementIndex(results);
      if (lower <= 1 && 1 <= upper) covered++;
    }
    expect(covered / seasons).toBeGreaterThan(0.93);
    expect(covered / seasons).toBeLessThan(0.97);
  });

  it('rejects no results and impossible placings', () => {
    expect(() => placementIndex([])).toThrow('placementIndex requires at least 1 result');
    expect(() => placementIndex([{ placing: 4, entries: 3 }])).toThrow('placementIndex requires placings in 1..entries (got 4 of 3)');
  });
});
