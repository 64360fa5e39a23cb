import { describe, expect, it } from 'vitest';
import { mulberry32, randomNormal } from './random';

describe('mulberry32', () => {
  it('repeats its sequence for a seed and differs between seeds', () => {
    const a = mulberry32(42);
    const b = mulberry32(42);
    const c = mulberry32(43);
    const first = Array.from({ length: 5 }, a);
    expect(Array.from({ length: 5 }, b)).toEqual(first);
    expect(Array.from({ length: 5 }, c)).not.toEqual(first);
  });

  it('is uniform on [0, 1): chi-square over 10 bins below the 0.1% critical value 27.88 (df 9)', () => {
    const rng = mulberry32(7);
    const bins = new Array(10).fill(0);
    const draws = 100_000;
    let outside = 0;
    for (let i = 0; i < draws; i++) {
      const u = rng();
      if (!(u >= 0 && u < 1)) outside++;
      bins[Math.floor(u * 10)]++;
    }
    expect(outside).toBe(0);
    const expected = draws / 10;
    const chiSquare = bins.reduce((sum, observed) => sum + (observed - expected) ** 2 / expected, 0);
    expect(chiSquare).toBeLessThan(27.88);
  });
});

describe('randomNormal', () => {
  it('has mean 0, variance 1 and 97.5% of draws below 1.959964', () => {
    const rng = mulberry32(11);
    const n = 100_000;
    let sum = 0;
    let squares = 0;
    let below = 0;
    for (let i = 0; i < n; i++) {
      const z = randomNormal(rng);
      sum += z;
      squares += z * z;
      if (z < 1.959964) below++;
    }
    expect(Math.abs(sum / n)).toBeLessThan(0.015);
    expect(Math.abs(squares / n - 1)).toBeLessThan(0.02);
    expect(Math.abs(below / n - 0.975)).toBeLessThan(0.002);
  });
});
