import { describe, expect, it } from 'vitest';
import { fitLms } from './fit-lms';
import { lmsValue } from './lms-value';
import { lmsZ } from './lms-z';
import type { Lms } from './lms';
import { mulberry32, randomNormal } from './random';

/** Full LMS log-likelihood (Cole & Green 1992): Σ −z²/2 + (L − 1)·ln y − L·ln M − ln S. */
function logLikelihood(values: number[], lms: Lms): number {
  return values.reduce((sum, y) => sum - lmsZ(y, lms) ** 2 / 2 + (lms.L - 1) * Math.log(y) - lms.L * Math.log(lms.M) - Math.log(lms.S), 0);
}

function sample(lms: Lms, n: number, seed: number): number[] {
  const rng = mulberry32(seed);
  return Array.from({ length: n }, () => lmsValue(randomNormal(rng), lms));
}

describe('fitLms', () => {
  it('recovers the L, M, S of simulated data', () => {
    const truth = { L: -0.5, M: 2000, S: 0.12 };
    const fit = fitLms(sample(truth, 8000, 1));
    expect(Math.abs(fit.L - truth.L)).toBeLessThan(0.15);
    expect(fit.M / truth.M).toBeCloseTo(1, 2);
    expect(fit.S / truth.S).toBeCloseTo(1, 1);
    expect(fitLms(sample({ L: 1, M: 1500, S: 0.1 }, 8000, 2)).L).toBeCloseTo(1, 0);
    expect(Math.abs(fitLms(sample({ L: 0, M: 1500, S: 0.1 }, 8000, 3)).L)).toBeLessThan(0.2);
  });

  it('is a maximum of the full LMS likelihood, and the sample z-scores have mean 0 and SD 1', () => {
    const values = sample({ L: 0.7, M: 800, S: 0.18 }, 400, 4);
    const fit = fitLms(values);
    const best = logLikelihood(values, fit);
    for (const [dL, fM, fS] of [[0.05, 1, 1], [-0.05, 1, 1], [0, 1.01, 1], [0, 0.99, 1], [0, 1, 1.03], [0, 1, 0.97]]) {
      expect(logLikelihood(values, { L: fit.L + dL, M: fit.M * fM, S: fit.S * fS })).toBeLessThan(best);
    }
    const z = values.map((y) => lmsZ(y, fit));
    const mean = z.reduce((a, b) => a + b, 0) / z.length;
    expect(mean).toBeCloseTo(0, 9);
    expect(z.reduce((a, b) => a + (b - mean) ** 2, 0) / z.length).toBeCloseTo(1, 9);
  });

  it('rejects too few, non-positive or identical values', () => {
    expect(() => fitLms([1, 2])).toThrow('fitLms requires at least 3 values (got 2)');
    expect(() => fitLms([1, 2, -3])).toThrow('fitLms requires positive values');
    expect(() => fitLms([5, 5, 5])).toThrow('fitLms requires values that are not all equal');
  });
});
