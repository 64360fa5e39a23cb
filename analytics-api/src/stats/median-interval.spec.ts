import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { medianInterval } from './median-interval';
import { mulberry32 } from './random';

const oneTo = (n: number) => Array.from({ length: n }, (_, i) => i + 1);

describe('medianInterval', () => {
  it('bounds the median by ranks 2 and 9 of 10 (97.85 %) and 6 and 15 of 20 (95.86 %) (Conover 1999 §3.2; scipy.stats.binom.cdf)', () => {
    const ten = medianInterval([9, 1, 8, 2, 7, 3, 6, 4, 5, 10])!;
    expect(ten).toMatchObject({ lower: 2, upper: 9, lowerRank: 2, upperRank: 9, n: 10 });
    expect(ten.coverage).toBeCloseTo(0.978515625, 12);
    const twenty = medianInterval(oneTo(20).map((x) => x * 10))!;
    expect(twenty).toMatchObject({ lower: 60, upper: 150, lowerRank: 6, upperRank: 15 });
    expect(twenty.coverage).toBeCloseTo(0.9586105346679688, 12);
  });

  it('takes the widest interval the ranks allow for a small sample, none below 6 values at 95 %', () => {
    expect(medianInterval(oneTo(6))).toMatchObject({ lower: 1, upper: 6, coverage: 1 - 2 / 64 });
    expect(medianInterval(oneTo(5))).toBeNull();
    expect(medianInterval([])).toBeNull();
    expect(medianInterval(oneTo(5), 0.9)).toMatchObject({ lower: 1, upper: 5, coverage: 1 - 2 / 32 });
  });

  it('agrees with the binomial tail of jStat for large samples, without underflow', () => {
    for (const n of [100, 1000, 5000]) {
      const { lowerRank: r, coverage } = medianInterval(oneTo(n))!;
      // r is the largest rank with P(B ≤ r − 1) ≤ 2.5 %: one rank further passes it.
      expect(jStat.binomial.cdf(r - 1, n, 0.5)).toBeLessThanOrEqual(0.025);
      expect(jStat.binomial.cdf(r, n, 0.5)).toBeGreaterThan(0.025);
      expect(coverage).toBeCloseTo(1 - 2 * jStat.binomial.cdf(r - 1, n, 0.5), 9);
    }
  });

  it('covers the true median of a skewed distribution at least as often as it says', () => {
    const rng = mulberry32(5);
    let covered = 0;
    const trials = 2000;
    for (let t = 0; t < trials; t++) {
      // exponential with median ln 2
      const sample = Array.from({ length: 15 }, () => -Math.log(1 - rng()));
      const ci = medianInterval(sample)!;
      if (ci.lower <= Math.LN2 && Math.LN2 <= ci.upper) covered++;
    }
    // ranks 4 and 12 of 15: exact coverage 96.48 %
    expect(covered / trials).toBeGreaterThan(0.95);
  });

  it('rejects a level outside (0, 1) and non-finite values', () => {
    expect(() => medianInterval([1, 2], 1)).toThrow('medianInterval requires a level in (0, 1) (got 1)');
    expect(() => medianInterval([1, Number.NaN])).toThrow('medianInterval requires finite values');
  });
});
