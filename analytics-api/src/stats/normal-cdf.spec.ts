import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { normalCdf } from './normal-cdf';

// Standard normal quantiles listed in the project's REFERENCES (3rd … 97th percentiles).
const quantiles: [number, number][] = [
  [0.03, -1.880793608],
  [0.1, -1.281551566],
  [0.25, -0.67448975],
  [0.75, 0.67448975],
  [0.9, 1.281551566],
  [0.97, 1.880793608],
];

describe('normalCdf', () => {
  it('returns the probabilities of the reference quantiles to 2e-7', () => {
    for (const [p, z] of quantiles) expect(Math.abs(normalCdf(z) - p)).toBeLessThan(2e-7);
    expect(Math.abs(normalCdf(0) - 0.5)).toBeLessThan(2e-7);
  });

  it('agrees with jStat.normal.cdf to 2e-7 over −6..6', () => {
    for (let z = -6; z <= 6; z += 0.25) expect(Math.abs(normalCdf(z) - jStat.normal.cdf(z, 0, 1))).toBeLessThan(2e-7);
  });
});
