import { describe, expect, it } from 'vitest';
import { placementIndex } from './placement-index';
import { mulberry32 } from './random';
import { wilsonInterval } from './wilson-interval';

describe('placementIndex', () => {
  it('computes observed / expected by hand: placings 1 of 3, 2 of 10, 5 of 6 with k = 3', () => {
    // The class of 3 places everyone and is left out; chance of top 3: 3/10, 3/6 → E = 0.8; observed 1 → index 1.25
    const result = placementIndex([
      { placing: 1, entries: 3 },
      { placing: 2, entries: 10 },
      { placing: 5, entries: 6 },
    ])!;
    expect(result.observed).toBe(1);
    expect(result.expected).toBeCloseTo(0.8, 14);
    expect(result.index).toBeCloseTo(1.25, 14);
    expect(result).toMatchObject({ n: 2, certain: 1, ceiling: 2 });
    expect(result.lower).toBeLessThan(result.index);
    expect(result.upper).toBeGreaterThan(result.index);
    expect(result.warnings[0]).toMatch(/only 2 results in classes of more than 3/);
  });

  it('reduces to the Wilson interval / p with equal classes: 81 wins in 263 classes of 4 (Newcombe 1998 Table II)', () => {
    const results = Array.from({ length: 263 }, (_, i) => ({ placing: i < 81 ? 1 : 2, entries: 4 }));
    const result = placementIndex(results, 1)!;
    expect(result.index).toBeCloseTo(81 / 263 / 0.25, 12);
    expect(result.lower).toBeCloseTo(0.25528852 / 0.25, 5);
    expect(result.upper).toBeCloseTo(0.36620958 / 0.25, 5);
    const wilson = wilsonInterval(0, 20);
    const none = placementIndex(Array.from({ length: 20 }, () => ({ placing: 2, entries: 4 })), 1)!;
    expect(none.lower).toBe(0);
    expect(none.upper).toBeCloseTo(wilson.upper / 0.25, 12);
  });

  it('reaches its ceiling 1/p when every result of equal classes placed: 20 of 20 (Newcombe 1998 Table II, 0/20 mirrored)', () => {
    // Wilson's interval is symmetric in x ↔ n − x: 20/20 → 1 − 0.16112516 … 1; p = 3/4 with k = 3 of 4 entries.
    const all = placementIndex(Array.from({ length: 20 }, (_, i) => ({ placing: 1 + (i % 3), entries: 4 })))!;
    expect(all.ceiling).toBeCloseTo(4 / 3, 14);
    expect(all.index).toBeCloseTo(4 / 3, 14);
    expect(all.lower).toBeCloseTo((1 - 0.16112516) / 0.75, 6);
    expect(all.upper).toBeCloseTo(4 / 3, 14);
  });

  it('keeps a real interval when nearly every result of unequal classes placed (SciPy 1.17 brentq on the score equation)', () => {
    // 10 of 10 placed in classes of 4 (p = 0.75), 6 of 6 in classes of 12 (p = 0.25), 2 classes of 3.
    // Before the cap this gave no real roots and an "interval" of 1.444–1.444 beside an index of 1.636.
    // Outside computation: θmax = 4/3, O′ = min(16, θmax·9) = 12, and with z = scipy.stats.norm.ppf(0.975),
    // scipy.optimize.brentq on (O′ − 9θ)² − z²·Σ θpᵢ(1 − θpᵢ) gives the lower root 0.9473573104.
    const results = [
      ...Array.from({ length: 10 }, () => ({ placing: 1, entries: 4 })),
      ...Array.from({ length: 6 }, () => ({ placing: 3, entries: 12 })),
      { placing: 3, entries: 3 }, { placing: 1, entries: 3 },
    ];
    const r = placementIndex(results)!;
    expect(r).toMatchObject({ observed: 16, n: 16, certain: 2 });
    expect(r.expected).toBeCloseTo(9, 14);
    expect(r.index).toBeCloseTo(4 / 3, 14);
    expect(r.lower).toBeCloseTo(0.9473573104, 9);
    expect(r.upper).toBeCloseTo(4 / 3, 14);
    expect(r.warnings.some((w) => w.includes('held at 1.33'))).toBe(true);
  });

  it('holds its estimate and covers θ in about 95% of simulated seasons near the ceiling', () => {
    const rng = mulberry32(29);
    const sizes = [4, 5, 6, 8, 12, 15];
    let covered = 0;
    const seasons = 2000;
    for (let s = 0; s < seasons; s++) {
      const classes = Array.from({ length: 30 }, () => sizes[Math.floor(rng() * sizes.length)]!);
      const theta = 0.95 * Math.min(...classes) / 3;
      const results = classes.map((entries) => ({ placing: rng() < (theta * 3) / entries ? 1 : entries, entries }));
      const r = placementIndex(results)!;
      expect(r.lower).toBeLessThanOrEqual(r.index + 1e-12);
      expect(r.index).toBeLessThanOrEqual(r.upper + 1e-12);
      expect(r.upper).toBeLessThanOrEqual(r.ceiling);
      if (r.lower <= theta && theta <= r.upper) covered++;
    }
    expect(covered / seasons).toBeGreaterThan(0.93);
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
      const { lower, upper } = placementIndex(results)!;
      if (lower <= 1 && 1 <= upper) covered++;
    }
    // A little above 95 % with about 34 counted results: in 1 season of 20 the placings pass the
    // ceiling, and counting them as at the ceiling widens the lower side (conservative).
    expect(covered / seasons).toBeGreaterThan(0.93);
    expect(covered / seasons).toBeLessThan(0.98);
  });

  it('gives no index when every class placed everyone, and rejects no results and impossible placings', () => {
    expect(placementIndex([{ placing: 2, entries: 3 }, { placing: 1, entries: 1 }])).toBeNull();
    expect(() => placementIndex([])).toThrow('placementIndex requires at least 1 result');
    expect(() => placementIndex([{ placing: 4, entries: 3 }])).toThrow('placementIndex requires placings in 1..entries (got 4 of 3)');
  });
});
