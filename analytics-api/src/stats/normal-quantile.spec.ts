import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { normalQuantile } from './normal-quantile';

/**
 * An independent, precise Φ for the round trip: the power series
 * Φ(z) = ½ + φ-series Σ (−1)ⁿ z^(2n+1)/(2ⁿ n! (2n+1)) / √(2π) for |z| ≤ 3, and the continued
 * fraction of the Mills ratio Φ(−x) = φ(x)/(x + 1/(x + 2/(x + 3/(x + …)))) for x > 3
 * (Abramowitz & Stegun 1964, 26.2.10 and 26.2.14).
 */
function preciseCdf(z: number): number {
  if (Math.abs(z) <= 3) {
    let term = z;
    let sum = z;
    for (let n = 1; n < 200; n++) {
      term *= (-z * z) / (2 * n);
      sum += term / (2 * n + 1);
    }
    return 0.5 + sum / Math.sqrt(2 * Math.PI);
  }
  const x = Math.abs(z);
  let fraction = x;
  for (let k = 300; k >= 1; k--) fraction = x + k / fraction;
  const tail = Math.exp(-0.5 * x * x) / Math.sqrt(2 * Math.PI) / fraction;
  return z < 0 ? tail : 1 - tail;
}

describe('normalQuantile (Wichura 1988, AS 241)', () => {
  it('returns the reference quantiles of the project REFERENCES to 1e-8', () => {
    const cases: [number, number][] = [
      [0.03, -1.880793608],
      [0.1, -1.281551566],
      [0.25, -0.67448975],
      [0.5, 0],
      [0.75, 0.67448975],
      [0.9, 1.281551566],
      [0.97, 1.880793608],
    ];
    for (const [p, z] of cases) expect(Math.abs(normalQuantile(p) - z)).toBeLessThan(1e-8);
    expect(normalQuantile(0.975)).toBeCloseTo(1.959963984540054, 14);
  });

  it('inverts a precise Φ to relative error 1e-12 from p = 1e-15 to 1 − 1e-15', () => {
    for (let e = -15; e <= -0.31; e += 0.23) {
      const p = 10 ** e;
      expect(Math.abs(preciseCdf(normalQuantile(p)) - p) / p).toBeLessThan(1e-12);
      // 1 − p is exact enough in floating point only for p ≥ 1e-8
      if (p >= 1e-8) expect(normalQuantile(1 - p)).toBeCloseTo(-normalQuantile(p), 6);
    }
  });

  it('agrees with jStat.normal.inv to 1e-8 in the body of the distribution', () => {
    for (let p = 0.001; p < 1; p += 0.0371) expect(Math.abs(normalQuantile(p) - jStat.normal.inv(p, 0, 1))).toBeLessThan(1e-8);
  });

  it('gives infinities at 0 and 1 and rejects p outside [0, 1]', () => {
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(() => normalQuantile(1.5)).toThrow('normalQuantile requires p in [0, 1] (got 1.5)');
    expect(() => normalQuantile(Number.NaN)).toThrow(/requires p in \[0, 1\]/);
  });
});
