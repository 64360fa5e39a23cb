export interface MedianInterval {
  lower: number;
  upper: number;
  /** 1-based ranks r and s = n − r + 1 of the order statistics that bound the interval */
  lowerRank: number;
  upperRank: number;
  /** exact coverage 1 − 2·P(B ≤ r − 1), B ~ Binomial(n, ½): at least the level asked for */
  coverage: number;
  n: number;
}

/**
 * Distribution-free confidence interval for a population median from the order statistics
 * (Conover 1999, Practical Nonparametric Statistics, 3rd ed., §3.2; Campbell & Gardner 1988,
 * BMJ 296:1454): [x₍ᵣ₎, x₍ₙ₋ᵣ₊₁₎] with r the largest rank for which P(B ≤ r − 1) ≤ (1 − level)/2,
 * B ~ Binomial(n, ½) the number of values below the median. It assumes only independent values
 * of a continuous distribution; the coverage is exact (and at least `level`). The binomial
 * tail is summed in log space (no underflow for large n). O(n log n).
 *
 * @param level confidence level (default 0.95)
 * @returns null when n is too small for any interval of that level (n < 6 at 95 %)
 * @throws when a value is not finite or level is not in (0, 1)
 */
export function medianInterval(values: readonly number[], level = 0.95): MedianInterval | null {
  if (!(level > 0 && level < 1)) throw new Error(`medianInterval requires a level in (0, 1) (got ${level})`);
  if (values.some((v) => !Number.isFinite(v))) throw new Error('medianInterval requires finite values');
  const n = values.length;
  const tail = (1 - level) / 2;
  // r = number of k = 0, 1, … with P(B ≤ k) ≤ tail; P(B = k) = C(n, k)/2ⁿ.
  let logPmf = -n * Math.LN2;
  let cdf = 0;
  let r = 0;
  while (r < n) {
    const next = cdf + Math.exp(logPmf);
    if (next > tail) break;
    cdf = next;
    logPmf += Math.log((n - r) / (r + 1));
    r++;
  }
  if (r === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  return { lower: sorted[r - 1]!, upper: sorted[n - r]!, lowerRank: r, upperRank: n - r + 1, coverage: 1 - 2 * cdf, n };
}
