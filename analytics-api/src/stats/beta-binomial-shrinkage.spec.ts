import { describe, expect, it } from 'vitest';
import { betaBinomialShrinkage } from './beta-binomial-shrinkage';
import { mulberry32 } from './random';

describe('betaBinomialShrinkage', () => {
  it('fits the moment prior of a worked example by hand', () => {
    // 2/10, 5/10, 8/10: p̄ = 0.5, S = 10·(0.09 + 0 + 0.09) = 1.8, m = 3, N = 30, Σn²/N = 10.
    // ρ = (1.8/0.25 − 2)/(30 − 10 − 2) = 5.2/18 = 0.288889; α + β = 1/ρ − 1 = 2.461538,
    // α = β = 1.230769; shrunken 2/10 → (2 + 1.230769)/(10 + 2.461538) = 42/162 = 7/27.
    const result = betaBinomialShrinkage([
      { successes: 2, trials: 10 },
      { successes: 5, trials: 10 },
      { successes: 8, trials: 10 },
    ]);
    expect(result.prior.mean).toBe(0.5);
    expect(result.prior.rho).toBeCloseTo(5.2 / 18, 12);
    expect(result.prior.alpha).toBeCloseTo(16 / 13, 12);
    expect(result.prior.beta).toBeCloseTo(16 / 13, 12);
    expect(result.groups.map((g) => g.shrunken)).toEqual([expect.closeTo(7 / 27, 12), expect.closeTo(0.5, 12), expect.closeTo(20 / 27, 12)]);
  });

  it('shrinks every rate between its raw value and the pooled rate, small groups more', () => {
    const rng = mulberry32(8);
    const groups = Array.from({ length: 60 }, () => {
      const trials = 1 + Math.floor(rng() * 40);
      const p = 0.1 + 0.5 * rng();
      let successes = 0;
      for (let t = 0; t < trials; t++) if (rng() < p) successes++;
      return { successes, trials };
    });
    const result = betaBinomialShrinkage(groups);
    const mean = result.prior.mean;
    result.groups.forEach((g, i) => {
      const raw = g.raw!;
      expect(g.shrunken).toBeGreaterThanOrEqual(Math.min(raw, mean) - 1e-12);
      expect(g.shrunken).toBeLessThanOrEqual(Math.max(raw, mean) + 1e-12);
      result.groups.forEach((other, j) => {
        if (groups[i].trials < groups[j].trials) expect(g.shrinkage).toBeGreaterThan(other.shrinkage);
      });
    });
    expect(result.prior.rho).toBeGreaterThan(0); // the rates do vary: the check is not vacuous
  });

  it('recovers the prior of simulated beta-binomial data: α = 2, β = 6 gives ρ = 1/9', () => {
    const rng = mulberry32(5);
    // beta(2, 6) as the 2nd smallest of 7 uniforms (order statistics)
    const groups = Array.from({ length: 2000 }, () => {
      const u = Array.from({ length: 7 }, rng).sort((a, b) => a - b);
      const p = u[1];
      let successes = 0;
      for (let t = 0; t < 20; t++) if (rng() < p) successes++;
      return { successes, trials: 20 };
    });
    const { prior } = betaBinomialShrinkage(groups);
    expect(prior.mean).toBeCloseTo(0.25, 1);
    expect(prior.rho).toBeGreaterThan(1 / 9 - 0.02);
    expect(prior.rho).toBeLessThan(1 / 9 + 0.02);
  });

  it('gives everyone the pooled rate when groups vary no more than chance', () => {
    const result = betaBinomialShrinkage([
      { successes: 5, trials: 10 },
      { successes: 5, trials: 10 },
      { successes: 0, trials: 0 },
    ]);
    expect(result.prior.rho).toBe(0);
    expect(result.prior.alpha).toBeNull();
    expect(result.groups.map((g) => g.shrunken)).toEqual([0.5, 0.5, 0.5]);
    expect(result.groups[2].raw).toBeNull();
    expect(result.warnings.join(' ')).toMatch(/no variation between groups/);
  });

  it('rejects fewer than 2 groups with trials and impossible counts', () => {
    expect(() => betaBinomialShrinkage([{ successes: 1, trials: 2 }])).toThrow('betaBinomialShrinkage requires at least 2 groups with trials');
    expect(() => betaBinomialShrinkage([{ successes: 3, trials: 2 }, { successes: 0, trials: 1 }])).toThrow(/0 ≤ successes ≤ trials \(got 3 of 2\)/);
  });
});
