import { describe, expect, it } from 'vitest';
import { Random } from './random';

describe('Random (demo draws)', () => {
  it('repeats its sequence for a seed', () => {
    const a = new Random(7);
    const b = new Random(7);
    const draws = (r: Random) => [r.uniform(), r.int(1, 6), r.normal(), r.poisson(3), r.pick(['x', 'y', 'z'])];
    expect(draws(a)).toEqual(draws(b));
  });

  it('draws Poisson counts with mean and variance λ, and whole numbers within bounds', () => {
    const r = new Random(11);
    const n = 20_000;
    const xs = Array.from({ length: n }, () => r.poisson(4.2));
    const mean = xs.reduce((s, x) => s + x, 0) / n;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1);
    // Standard error of the mean √(4.2/20000) ≈ 0.0145: allow 4 of them.
    expect(Math.abs(mean - 4.2)).toBeLessThan(0.06);
    expect(Math.abs(variance - 4.2)).toBeLessThan(0.25);
    const ints = Array.from({ length: 1000 }, () => r.int(3, 5));
    expect(new Set(ints)).toEqual(new Set([3, 4, 5]));
  });

  it('weights picks by their weights and shuffles without losing items', () => {
    const r = new Random(3);
    const counts = [0, 0];
    for (let i = 0; i < 10_000; i++) counts[r.weighted([1, 3])]!++;
    expect(counts[1]! / 10_000).toBeGreaterThan(0.72);
    expect(counts[1]! / 10_000).toBeLessThan(0.78);
    expect(r.shuffle([1, 2, 3, 4, 5]).sort()).toEqual([1, 2, 3, 4, 5]);
    expect(() => r.pick([])).toThrow('Random.pick requires a non-empty list');
  });
});
