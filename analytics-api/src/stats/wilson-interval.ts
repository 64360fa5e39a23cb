export interface ProportionInterval {
  estimate: number;
  lower: number;
  upper: number;
}

/** z for a two-sided 95% interval, Φ⁻¹(0.975). */
export const Z_95 = 1.959963984540054;

/**
 * Wilson score interval for a binomial proportion (Wilson 1927; Newcombe 1998, method 3,
 * without continuity correction):
 *   (p̂ + z²/2n ± z·√(p̂(1 − p̂)/n + z²/4n²)) / (1 + z²/n),  p̂ = x/n.
 * O(1).
 *
 * @throws when n is not a positive integer or successes is not an integer in 0..n
 */
export function wilsonInterval(successes: number, n: number, z = Z_95): ProportionInterval {
  if (!Number.isInteger(n) || n < 1) throw new Error(`wilsonInterval requires a positive integer n (got ${n})`);
  if (!Number.isInteger(successes) || successes < 0 || successes > n) {
    throw new Error(`wilsonInterval requires successes to be an integer in 0..n (got ${successes} of ${n})`);
  }
  if (!(z > 0)) throw new Error(`wilsonInterval requires z > 0 (got ${z})`);
  const p = successes / n;
  const z2 = z * z;
  const denominator = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denominator;
  const half = (z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n))) / denominator;
  return {
    estimate: p,
    lower: successes === 0 ? 0 : Math.max(0, centre - half),
    upper: successes === n ? 1 : Math.min(1, centre + half),
  };
}
